package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.sample.CoreShell;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The planner's gain mode with a core/shell's biexciton shift, and the other shell effects in the plan's model. */
class CoreShellGainTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));

    static CampaignPlan plan(Path dir, String shellFrom, String shellTo) throws Exception {
        String text = Files.readString(HOME.resolve("experiments-plan/cdse-cdte-gain-type2.plan.json")).replace(shellFrom, shellTo);
        assertThat(text).contains(shellTo);
        Path file = dir.resolve("p.plan.json");
        Files.writeString(file, text);
        return Planner.plan(PlanCodec.read(file), Planner.Progress.NONE);
    }

    private static double root(java.util.function.DoubleUnaryOperator f, double lo, double hi) {
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (Math.signum(f.applyAsDouble(mid)) == Math.signum(f.applyAsDouble(lo))) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    @CheckedAgainst(source = "derived: g = 2, Poisson P(N) = e^{−n}nᴺ/N!; a plain dot reaches transparency at (2 + n)e^{−n} = 1; "
            + "with a repulsive biexciton shift far beyond the line width (here Δ_XX = 400 meV against a 10 meV standard "
            + "deviation) the best probe sits at E₁ + Δ, where gain needs 2P(≥2) ≥ P(1), (2 + 3n)e^{−n} = 2",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void aRepulsiveShiftBeyondTheLineWidthLowersThePlannedGainThreshold(@TempDir Path dir) throws Exception {
        // 23.548 meV FWHM is a 10.000 meV standard deviation
        CampaignPlan p = plan(dir, "\"thickness\": \"1.2 nm\"", "\"thickness\": \"1.2 nm\", \"biexcitonShift\": \"400 meV\", "
                + "\"lineWidth\": \"23.5482 meV\"");
        GainPlan g = p.gain();
        double plain = root(n -> (2 + n) * Math.exp(-n) - 1, 0.1, 5);
        double far = root(n -> (2 + 3 * n) * Math.exp(-n) - 2, 0.1, 5);
        Reference.check("Δ_XX over the line's standard deviation", g.shiftOverWidth(), 40, 1e-3);
        Reference.check("plain-dot gain threshold ⟨N⟩, g = 2", g.thresholdN(), plain, 1e-9);
        Reference.check("core/shell gain threshold ⟨N⟩ with Δ_XX = 40 line widths", g.thresholdShiftedN(), far, 1e-4);
        assertThat(g.thresholdShiftedN()).isLessThan(g.thresholdN());
        // the planned pulse energy is the one for the shifted threshold
        double nPerJ = p.fluences().get(0).nProbeAveraged() / p.fluences().get(0).pulseEnergyJ();
        assertThat(g.thresholdEnergyJ() * nPerJ).isCloseTo(far, org.assertj.core.data.Offset.offset(1e-3));
        assertThat(g.notPlanned()).noneMatch(s -> s.contains("the biexciton shift"));
    }

    @Test
    void theTwoLevelThresholdDependsOnTheShiftsSizeNotItsSign(@TempDir Path dir) throws Exception {
        // mirror image about E₁: an attractive Δ puts XX emission and X→XX absorption as far below E₁ as a repulsive one
        // puts them above, so the lowest threshold over probe energies is the same
        GainPlan attractive = plan(dir, "\"thickness\": \"1.2 nm\"", "\"thickness\": \"1.2 nm\", \"biexcitonShift\": \"-400 meV\", "
                + "\"lineWidth\": \"23.5482 meV\"").gain();
        assertThat(attractive.shiftOverWidth()).isCloseTo(-40, org.assertj.core.data.Offset.offset(1e-3));
        assertThat(attractive.thresholdShiftedN()).isCloseTo(
                org.ladderkin.observe.GainThreshold.poissonThreshold(2, 40), org.assertj.core.data.Offset.offset(1e-6));
    }

    @Test
    void theModelSaysWhichShellEffectsItAppliedAndWhere(@TempDir Path dir) throws Exception {
        CampaignPlan p = plan(dir, "\"thickness\": \"1.2 nm\"", "\"thickness\": \"1.2 nm\"");
        ModelAssumptions m = p.model();
        CoreShell c = CoreShell.of(p.inputs().sample()).orElseThrow();
        var cdse = p.inputs().sample().material();
        assertThat(m.tauBiexcitonS()).isCloseTo(cdse.augerVolumeConstantSPerM3().value() * c.totalVolumeM3(),
                org.assertj.core.data.Percentage.withPercentage(1e-9));
        assertThat(m.tauSingleExcitonS()).isCloseTo(cdse.singleExcitonLifetimeS().value() / c.overlap(),
                org.assertj.core.data.Percentage.withPercentage(1e-9));
        assertThat(m.biexcitonShiftJ()).isEqualTo(c.biexcitonShiftJ()).isPositive();
        assertThat(m.bases()).anyMatch(b -> b.startsWith("shell: CdSe/CdTe, 1.20 nm thick; type-II alignment: bulk band edges"))
                .anyMatch(b -> b.startsWith("shell σ:"))
                .anyMatch(b -> b.startsWith("shell biexciton shift: Δ_XX = +30.0 meV (repulsive; default for type II"))
                .anyMatch(b -> b.startsWith("shell first exciton:"))
                .anyMatch(b -> b.startsWith("shell heat capacity:"))
                .anyMatch(b -> b.startsWith("τ₂:") && b.contains("core/shell: τ₂ scales with the whole core/shell volume"))
                .anyMatch(b -> b.startsWith("τ₁:") && b.contains("core/shell: type-II: overlap |⟨e|h⟩|² = V_core/V_total"));
    }
}
