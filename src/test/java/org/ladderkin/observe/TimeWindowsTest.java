package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class TimeWindowsTest {

    @Test
    @CheckedAgainst(source = "derived: a retro-reflector moved by d lengthens the path by 2d, so d = c·t/2 with "
            + "c = 299 792 458 m/s (exact, SI)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void delayStageTravelIsHalfTheLightPath() {
        Reference.check("stage travel for a 1 ns delay (m)", TimeWindows.stageTravelM(1e-9), 0.149896229, 1e-12);
        Reference.check("stage travel for a 3 ns delay (m)", TimeWindows.stageTravelM(3e-9), 0.449688687, 1e-12);
    }

    @Test
    void gridIsLinearNearZeroThenLogSpaced() {
        double[] g = TimeWindows.grid(-1e-12, 0.1e-12, 2e-12, 3e-9, 10);
        assertThat(g[0]).isEqualTo(-1e-12);
        assertThat(g[1] - g[0]).isCloseTo(0.1e-12, org.assertj.core.data.Offset.offset(1e-18));
        assertThat(g[g.length - 1]).isCloseTo(3e-9, org.assertj.core.data.Offset.offset(1e-20));
        for (int i = 1; i < g.length; i++) {
            assertThat(g[i]).isGreaterThan(g[i - 1]);
        }
        double ratio = g[g.length - 1] / g[g.length - 2];
        assertThat(ratio).isCloseTo(Math.pow(10, 0.1), org.assertj.core.data.Offset.offset(0.01));
    }

    @Test
    void earlyLateWindowsAreSeparatedOnlyForSeparatedTimeScales() {
        TimeWindows.EarlyLate ok = TimeWindows.earlyLate(0.5e-12, 50e-12, 20e-9);
        assertThat(ok.separated()).isTrue();
        assertThat(ok.earlyS()).isEqualTo(2.5e-12);
        assertThat(ok.lateS()).isEqualTo(250e-12);
        assertThat(TimeWindows.earlyLate(5e-12, 20e-12, 20e-9).separated()).isFalse();
    }

    @Test
    void tcspcRulesFlagPileUpAndShortRanges() {
        assertThat(TimeWindows.pileUp(1e3, 1e6, 0.02).verdict()).isEqualTo(Verdict.PASS);
        assertThat(TimeWindows.pileUp(5e4, 1e6, 0.02).verdict()).isEqualTo(Verdict.FAIL);
        assertThat(TimeWindows.decayCovered("TCSPC range", 200e-9, 20e-9).verdict()).isEqualTo(Verdict.PASS);
        assertThat(TimeWindows.decayCovered("period", 12.5e-9, 20e-9).verdict()).isEqualTo(Verdict.FAIL);
    }
}
