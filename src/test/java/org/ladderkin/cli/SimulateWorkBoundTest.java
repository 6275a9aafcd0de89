package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * The inputs that used to hang {@code simulate} (issue: never a hang) are refused up front with one line that names
 * what made the work large and what is allowed. No timing here: the refusal comes from the work estimate, which does
 * not depend on the machine.
 */
class SimulateWorkBoundTest {

    static final String PRESETS = MainTest.HOME.resolve("models/presets/").toString() + "/";

    private static void refusedInOneLine(MainTest.Run r, String... expected) {
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip().lines()).hasSize(1);
        assertThat(r.err()).contains(expected);
        assertThat(r.out()).isEmpty();
    }

    /** Used to spend minutes in a Padé exponential per delay of a 288-state block of crowded rates. */
    @Test
    void quadraticAugerAtNAvg200IsRefusedOnTheDelayGrid() {
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "0.5ps", "--tau-auger2", "200ps", "--auger-scaling",
                "quadratic", "--n-avg", "1,0.1,200");
        refusedInOneLine(r, "the delay grid (1000 delays on 291 states", "block of 288", "fewer delays");
    }

    /** The same ladder on a short grid is within the bound and runs. */
    @Test
    void quadraticAugerAtNAvg200OnFewDelaysRuns() {
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "0.5ps", "--tau-auger2", "200ps", "--auger-scaling",
                "quadratic", "--n-avg", "1,0.1,200", "--delays", "1ps,10ps,100ps");
        assertThat(r.exit()).as(r.err()).isZero();
        assertThat(r.out().strip().lines()).hasSize(4);
    }

    /** Used to run for minutes in the settle rows of a 4830-state hot-resolved ladder at 250 kHz. */
    @Test
    void hotLadderAtNAvg30At250kHzIsRefusedByItsStates() {
        MainTest.Run r = MainTest.run("simulate", PRESETS + "cdse-4nm.model.json", "--n-avg", "30", "--rep-rate",
                "250kHz");
        refusedInOneLine(r, "the ladder needs 4830 states (⟨N⟩ up to 30: Nmax = 68, hot excitons resolved",
                "more than the 1500 the engine supports", "lower ⟨N⟩");
    }

    /** Used to spend minutes in Padé exponentials of a 198-state block (three charges at ⟨N⟩ = 30). */
    @Test
    void chargedLadderAtNAvg30At250kHzIsRefusedOnTheDelayGrid() {
        MainTest.Run r = MainTest.run("simulate", PRESETS + "pbse-5nm.model.json", "--n-avg", "30", "--rep-rate",
                "250kHz");
        refusedInOneLine(r, "the delay grid (1000 delays on 207 states", "fewer delays");
    }

    /**
     * ⟨N⟩ = 200 at 1 GHz on the PbSe preset: 873 states, a note that it will take a while (the decomposition), then
     * the refusal before its steady state is solved.
     */
    @Test
    void presetAtNAvg200At1GHzIsRefused() {
        MainTest.Run r = MainTest.run("simulate", PRESETS + "pbse-5nm.model.json", "--n-avg", "200", "--rep-rate",
                "1GHz");
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        java.util.List<String> lines = r.err().strip().lines().toList();
        assertThat(lines).hasSize(2);
        assertThat(lines.get(0)).matches(
                "ladderkin: note: about 2\\.[0-9]+e9 operations \\(--n-avg, --delays, --rep-rate\\); this may take a while");
        assertThat(lines.get(1)).startsWith("ladderkin: the delay grid (1000 delays on 873 states whose rates crowd")
                .contains("more than the 1.2e10 the engine allows per step; use fewer delays");
    }
}
