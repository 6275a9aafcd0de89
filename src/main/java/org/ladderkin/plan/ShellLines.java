package org.ladderkin.plan;

import java.util.List;
import java.util.Locale;
import org.ladderkin.material.Heterostructure;
import org.ladderkin.sample.CoreShell;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.Shell;
import org.ladderkin.units.PhysicalConstants;

/**
 * The lines a plan's model basis gains from a shell: which shell effects were applied and where each comes from (the
 * τ₁ and τ₂ lines carry their own shell part). The report and the text output print them with the other bases.
 */
final class ShellLines {

    private static final double MEV = 1e-3 * PhysicalConstants.ELECTRONVOLT_J;

    private ShellLines() {
    }

    static void add(Sample sample, CoreShell c, List<String> bases) {
        Shell sh = c.shell();
        String key = sh.material().key();
        String layers = Double.isNaN(sh.monolayers()) ? "" : String.format(Locale.ROOT, ", %.3g monolayers of %s",
                sh.monolayers(), Heterostructure.monolayer(sh.material()).map(m -> String.format(Locale.ROOT, "%.3g nm (%s)",
                        m.value() * 1e9, m.source())).orElse("?"));
        bases.add(String.format(Locale.ROOT, "shell: %s/%s, %.3g nm thick%s; %s alignment: %s%s", sample.material().key(), key,
                sh.thicknessM() * 1e9, layers, sh.alignment().key(), sh.alignmentBasis(),
                sh.alloyedInterface() ? "; alloyed interface" : ""));
        bases.add(String.format(Locale.ROOT, "shell σ: core and shell each absorb with their bulk intrinsic absorption per "
                + "volume well above both gaps (shell volume ×%.3g the core's); the %s shell adds nothing below its bulk gap; "
                + "the σ basis of the pump says what was added", c.shellVolumeM3() / c.coreVolumeM3(), key));
        bases.add(String.format(Locale.ROOT, "shell biexciton shift: Δ_XX = %+.3g meV (%s; %s), line σ = %.3g meV (%s); the "
                + "gain threshold and the spectra use it", c.biexcitonShiftJ() / MEV,
                c.biexcitonShiftJ() > 0 ? "repulsive" : c.biexcitonShiftJ() < 0 ? "attractive" : "none", c.shiftBasis(),
                c.lineWidthJ() / MEV, c.lineWidthBasis()));
        bases.add(Double.isNaN(sh.firstExcitonPeakM())
                ? String.format(Locale.ROOT, "shell first exciton: no published shift curve for %s/%s in the library, the "
                    + "core's E₁S is used; the shell red-shifts it: give the peak measured on the core/shell "
                    + "(shell.firstExcitonPeak)", sample.material().key(), key)
                : String.format(Locale.ROOT, "shell first exciton: %.1f nm measured on the core/shell", sh.firstExcitonPeakM() * 1e9));
        bases.add(Double.isNaN(c.heatCapacityJPerK())
                ? "shell heat capacity: unknown (a density or specific heat is missing in the library)"
                : String.format(Locale.ROOT, "shell heat capacity: %.3g J/K per dot with the shell, ×%.3g the bare core's "
                    + "(ρ·c_p·V of each material); one dot's temperature jump per absorbed energy falls by that factor",
                    c.heatCapacityJPerK(), c.heatCapacityJPerK() / c.coreHeatCapacityJPerK()));
    }
}
