package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.process.TrappingProcess;

/** The warning before a fit that freed parameters cannot be told apart by the data. */
class FitIdentifiabilityTest {

    private static final double SIGMA_M2 = 1e-19;

    /** τ_rad and τ_trap both 40 ns, τ₂ 40 ps. */
    static final LadderModel SLOW_PAIR = LadderSeries.BASE.withSeconds(RadiativeProcess.LIFETIME, 40e-9)
            .with(new TrappingProcess(40e-9));

    /** Six traces from ⟨N⟩ 0.1 up, delays from 0.1 ps to {@code lastS}, each trace at its photon fluence. */
    static Dataset series(LadderModel truth, double lastS) {
        double[] j = LadderSeries.fluencesPerM2(6, SIGMA_M2);
        LadderBleachModel model = LadderBleachModel.forModel(truth, "crossSectionM2", j, Double.NaN);
        Dataset d = LadderSeries.make(model, List.of("crossSectionM2"), new double[] {SIGMA_M2},
                SyntheticSeries.logDelays(0.1e-12, lastS, 60), 1, 0, 2e-4, 11);
        return LadderSeries.withFluences(d, j);
    }

    static LadderFitSetup freeing(LadderModel base, Set<LadderParameter> free) {
        return new LadderFitSetup(base, Double.NaN, free, SIGMA_M2, 0, Double.NaN, false, false);
    }

    @Test
    void twoFortyNanosecondLifetimesWithDataEndingAtThreeNanosecondsAreFlagged() {
        FitIdentifiability id = LadderFit.identifiability(series(SLOW_PAIR, 3e-9), freeing(SLOW_PAIR,
                Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2, LadderParameter.TAU_RAD, LadderParameter.TAU_TRAP)));
        assertThat(id.warns()).as(id.toString()).isTrue();
        assertThat(Set.of(id.first(), id.second())).containsExactlyInAnyOrder("tauRadS", "tauTrapS");
        assertThat(Math.abs(id.correlation())).isGreaterThan(FitIdentifiability.CORRELATION_LIMIT);
        assertThat(id.lastDelayS()).isEqualTo(3e-9);
        assertThat(id.warning()).startsWith("τ_rad and τ_trap cannot be told apart: the data end at 3 ns, far before "
                + "either acts (correlation ").endsWith("; hold one or add later delays");
        assertThat(id.pairPhrase()).startsWith("τ_rad and τ_trap move together (correlation ");
    }

    @Test
    void scaleAndBiexcitonLifetimeOnAFluenceSeriesAreNotFlagged() {
        FitIdentifiability id = LadderFit.identifiability(series(LadderSeries.BASE, 3e-9), freeing(LadderSeries.BASE,
                Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2)));
        assertThat(id.warns()).as(id.toString()).isFalse();
        assertThat(id.warning()).isEmpty();
        assertThat(Set.of(id.first(), id.second())).containsExactlyInAnyOrder("crossSectionM2", "tauAuger2S");
        assertThat(Math.abs(id.correlation())).isLessThan(FitIdentifiability.CORRELATION_LIMIT);
        assertThat(id.conditionNumber()).isFinite();
    }

    @Test
    void aParameterTheDataCannotSeeIsFlaggedAlone() {
        // a 40 ns trap with data ending at 3 ps: τ_trap changes the traces by far less than rounding
        FitIdentifiability id = LadderFit.identifiability(series(SLOW_PAIR, 3e-12), freeing(SLOW_PAIR,
                Set.of(LadderParameter.SCALE, LadderParameter.TAU_TRAP)));
        assertThat(id.warns()).as(id.toString()).isTrue();
        assertThat(id.warning()).contains("τ_trap");
    }

    @Test
    void correlationsArePrintedWithTheDigitsThatMatter() {
        assertThat(FitIdentifiability.corr(0.95)).isEqualTo("0.95");
        assertThat(FitIdentifiability.corr(0.99983)).isEqualTo("0.9998");
        assertThat(FitIdentifiability.corr(-0.999962)).isEqualTo("-0.99996");
        assertThat(FitIdentifiability.corr(-0.9999995931)).isEqualTo("-0.999999");
        assertThat(FitIdentifiability.corr(1.0)).isEqualTo("1");
    }
}
