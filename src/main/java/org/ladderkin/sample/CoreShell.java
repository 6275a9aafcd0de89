package org.ladderkin.sample;

import java.util.Locale;
import java.util.Optional;
import org.ladderkin.material.BandAlignment;
import org.ladderkin.material.Material;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;

/**
 * What a shell does to a dot, each effect with its basis in words (docs/physics.md, "Core/shell dots"). The core's
 * size is the sample's size; the shell adds {@code 2h} to the diameter (edge for cubes).
 *
 * @param shell               the shell
 * @param coreVolumeM3        core volume (m³)
 * @param totalVolumeM3       core + shell volume (m³)
 * @param augerVolumeM3       the volume the biexciton Auger lifetime scales with, τ₂ = C·V (m³)
 * @param augerBasis          why that volume
 * @param overlap             electron–hole overlap |⟨e|h⟩|² relative to the bare core, in (0, 1]
 * @param overlapBasis        why that overlap
 * @param biexcitonShiftJ     Δ_XX (J), positive for repulsion
 * @param shiftBasis          where Δ_XX comes from
 * @param lineWidthJ          standard deviation of the band-edge line (J) the gain threshold compares Δ_XX with
 * @param lineWidthBasis      where the line width comes from
 * @param heatCapacityJPerK   heat capacity of one core/shell dot (J/K), NaN when a density or specific heat is unknown
 * @param coreHeatCapacityJPerK heat capacity of the bare core (J/K), NaN when unknown
 */
public record CoreShell(Shell shell, double coreVolumeM3, double totalVolumeM3, double augerVolumeM3, String augerBasis,
                        double overlap, String overlapBasis, double biexcitonShiftJ, String shiftBasis, double lineWidthJ,
                        String lineWidthBasis, double heatCapacityJPerK, double coreHeatCapacityJPerK) {

    private static final double MEV = 1e-3 * PhysicalConstants.ELECTRONVOLT_J;
    /** Gaussian FWHM over standard deviation, 2√(2 ln 2). */
    static final double FWHM_PER_SIGMA = 2 * Math.sqrt(2 * Math.log(2));
    /**
     * Smallest overlap taken for quasi-type II: thick-shell CdSe/CdS radiative lifetimes are a few times the core's
     * (from memory), far from the volume ratio's hundredfold.
     */
    static final double QUASI_MIN_OVERLAP = 0.25;
    /** Line width used when neither a measured width nor a size dispersion with a sizing curve gives one. */
    static final double DEFAULT_FWHM_J = 60 * MEV;

    /**
     * Default Δ_XX by alignment (J): attractive in type I, about zero and thickness-dependent in quasi-type II,
     * repulsive in type II.
     */
    static double defaultShiftJ(BandAlignment a) {
        return switch (a) {
            case TYPE_I -> -10 * MEV;
            case QUASI_TYPE_II -> 0;
            case TYPE_II -> 30 * MEV;
        };
    }

    static String defaultShiftBasis(BandAlignment a) {
        return switch (a) {
            case TYPE_I -> "default for type I, attractive (bound biexciton, red-shifted), about 10 meV as in CdSe dots "
                    + "(from memory)";
            case QUASI_TYPE_II -> "default for quasi-type II: about zero, the sign turns from attractive to repulsive as the "
                    + "shell thickens (from memory); give the measured value";
            case TYPE_II -> "default for type II, repulsive (biexciton blue-shifted): 30 meV, inside the range reported for "
                    + "CdS/ZnSe (Ivanov & Achermann, ACS Nano, 2010 as recalled, abstract: repulsive biexciton interaction; tens to about "
                    + "100 meV from memory)";
        };
    }

    /** The effects of the sample's shell, or empty for a plain dot. */
    public static Optional<CoreShell> of(Sample s) {
        return s.spec().shell().map(sh -> of(s.material(), s.sizeM(), s.spec().sizeDispersion(), s.firstExcitonEnergyJ(), sh));
    }

    /** The effects of {@code shell} on a core of {@code core} of size {@code sizeM}. */
    public static CoreShell of(Material core, double sizeM, double sizeDispersion, double firstExcitonJ, Shell shell) {
        double vCore = core.volumeM3(sizeM);
        double vTotal = core.volumeM3(sizeM + 2 * shell.thicknessM());
        double ratio = vTotal / vCore;
        BandAlignment a = shell.alignment();
        boolean total = a != BandAlignment.TYPE_I || shell.alloyedInterface();
        String augerBasis = total
                ? String.format(Locale.ROOT, "τ₂ scales with the whole core/shell volume (×%.3g the core's): %s", ratio,
                    a == BandAlignment.TYPE_I
                        ? "alloyed interface, the smooth confinement potential suppresses Auger recombination beyond the "
                            + "core-volume law (Cragg & Efros, Nano Lett. 10, 313 (2010), from memory); taking the whole "
                            + "volume is this library's assumption"
                        : "one carrier spreads into the shell, so the Auger rate follows the volume it occupies; thick "
                            + "shells suppress Auger recombination by orders of magnitude (García-Santamaría et al., Nano "
                            + "Lett. 2009, 'giant' CdSe/CdS nanocrystals, abstract, read in a stored copy)")
                : "τ₂ scales with the core volume: type I, both carriers stay in the core (abrupt interface)";
        double spread = vCore / vTotal;
        double overlap = switch (a) {
            case TYPE_I -> 1;
            case QUASI_TYPE_II -> Math.max(spread, QUASI_MIN_OVERLAP);
            case TYPE_II -> spread;
        };
        String overlapBasis = switch (a) {
            case TYPE_I -> "type I: electron and hole both in the core, overlap unchanged";
            case QUASI_TYPE_II -> String.format(Locale.ROOT, "quasi-type-II: overlap |⟨e|h⟩|² = max(V_core/V_total, %.2g) = "
                    + "%.3g (the spread carrier stays bound to the core's carrier, so thick shells lengthen the radiative "
                    + "lifetime a few times, not by the volume ratio: from memory), τ₁ lengthened by 1/%.3g (assumption: the "
                    + "library's τ₁ is mostly radiative)", QUASI_MIN_OVERLAP, overlap, overlap);
            case TYPE_II -> String.format(Locale.ROOT, "type-II: overlap |⟨e|h⟩|² = V_core/V_total = %.3g (the carrier in the "
                    + "shell spread evenly over the dot, the other in the core: an upper bound on the overlap), τ₁ lengthened "
                    + "by 1/%.3g (assumption: the library's τ₁ is mostly radiative)", overlap, overlap);
        };
        double shift = Double.isNaN(shell.biexcitonShiftJ()) ? defaultShiftJ(a) : shell.biexcitonShiftJ();
        String shiftBasis = Double.isNaN(shell.biexcitonShiftJ()) ? defaultShiftBasis(a) : "measured, given in the sample";
        double width;
        String widthBasis;
        if (!Double.isNaN(shell.lineWidthJ())) {
            width = shell.lineWidthJ() / FWHM_PER_SIGMA;
            widthBasis = "measured FWHM given in the sample";
        } else {
            Optional<Double> fromSize = inhomogeneousWidthJ(core, sizeM, sizeDispersion);
            if (fromSize.isPresent() && fromSize.get() > 0) {
                width = fromSize.get();
                widthBasis = String.format(Locale.ROOT, "size dispersion %.3g %% through the core's sizing curve (half the "
                        + "E₁S spread between −1σ and +1σ of the size)", 100 * sizeDispersion);
            } else {
                width = DEFAULT_FWHM_J / FWHM_PER_SIGMA;
                widthBasis = "default 60 meV FWHM (common practice, no source)";
            }
        }
        double cCore = heatCapacity(core, vCore);
        double cTotal = cCore + heatCapacity(shell.material(), vTotal - vCore);
        return new CoreShell(shell, vCore, vTotal, total ? vTotal : vCore, augerBasis, overlap, overlapBasis, shift, shiftBasis,
                width, widthBasis, cTotal, cCore);
    }

    private static Optional<Double> inhomogeneousWidthJ(Material core, double sizeM, double dispersion) {
        if (core.sizing().isEmpty() || !(dispersion > 0)) {
            return Optional.empty();
        }
        try {
            var c = core.sizing().get();
            return Optional.of(Math.abs(c.firstExcitonEnergyJ(sizeM * (1 - dispersion))
                    - c.firstExcitonEnergyJ(sizeM * (1 + dispersion))) / 2);
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    private static double heatCapacity(Material m, double volumeM3) {
        if (!m.densityKgPerM3().known() || !m.specificHeatJPerKgK().known()) {
            return Double.NaN;
        }
        return m.densityKgPerM3().value() * m.specificHeatJPerKgK().value() * volumeM3;
    }

    /** Shell volume (m³). */
    public double shellVolumeM3() {
        return totalVolumeM3 - coreVolumeM3;
    }

    /** Δ_XX over the line's standard deviation, the argument of the gain threshold with a biexciton shift. */
    public double shiftOverWidth() {
        return biexcitonShiftJ / lineWidthJ;
    }

    /**
     * σ of the core/shell from the core's σ: well above both gaps each material absorbs with its own bulk intrinsic
     * absorption per volume, so the shell adds μ_i,shell(λ)·V_shell (each taken as a small particle in the host, the same
     * local-field approximation the core's intrinsic σ uses); below the shell's bulk gap it adds nothing. A σ the user
     * measured, or carried by the user's spectrum, already includes the shell and is returned unchanged.
     *
     * Where the shell absorbs and the library has no optical constants for it, the core's σ comes back as an approximate
     * lower bound (regime CARRIED), which raises the approximate-σ advisory wherever it is used.
     */
    public CrossSection crossSection(CrossSection core) {
        if (core.regime() == CrossSection.Regime.USER || core.regime() == CrossSection.Regime.MEASURED) {
            return core;
        }
        Material m = shell.material();
        double photonJ = Photon.energyJ(core.wavelengthM());
        if (m.bulkGapJ().known() && photonJ < m.bulkGapJ().value()) {
            return new CrossSection(core.crossSectionM2(), core.wavelengthM(), core.basis() + "; the " + m.key()
                    + " shell is transparent below its bulk gap and adds nothing", core.regime(), core.relativeUncertainty(),
                    core.uncertaintySource());
        }
        var oc = m.opticalConstants();
        if (oc.isEmpty() || !oc.get().covers(core.wavelengthM())) {
            // the shell absorbs here but nothing says how much: the core's σ is a lower bound, flagged approximate
            return new CrossSection(core.crossSectionM2(), core.wavelengthM(), String.format(Locale.ROOT, "%s; the %s shell "
                    + "absorbs at %s (above its bulk gap) but the library has no optical constants for it there, so this "
                    + "is the core alone, a lower bound: give a cross-section measured on the core/shell dots",
                    core.basis(), m.key(), Sample.nm(core.wavelengthM())), CrossSection.Regime.CARRIED,
                    Math.max(core.relativeUncertainty(), CrossSectionModel.CARRIED_UNCERTAINTY),
                    "common practice, no source: 100 % while the shell's absorption is missing");
        }
        double sigmaShell = oc.get().intrinsicAbsorptionPerM(core.wavelengthM(), CrossSectionModel.HOST_INDEX) * shellVolumeM3();
        double uShell = oc.get().relativeUncertainty().value();
        double sum = core.crossSectionM2() + sigmaShell;
        double u = Math.hypot(core.crossSectionM2() * core.relativeUncertainty(), sigmaShell * uShell) / sum;
        return new CrossSection(sum, core.wavelengthM(), String.format(Locale.ROOT, "%s; plus the %s shell's intrinsic "
                + "absorption μ_i·V_shell = %.4g cm² (%s)", core.basis(), m.key(), sigmaShell * 1e4, oc.get().source()),
                core.regime(), u, core.uncertaintySource() + "; shell: " + oc.get().relativeUncertainty().source());
    }
}
