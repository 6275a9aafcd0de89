package org.ladderkin.sample;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.ladderkin.material.Material;
import org.ladderkin.material.SizingCurve;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;

/**
 * One sample resolved to numbers: size and first-exciton energy through the sizing curve, concentration through
 * Beer–Lambert, and the absorption cross-section at any wavelength the available information supports.
 *
 * @param spec                  the description it was resolved from
 * @param sizeM                 dot size (diameter, or cube edge) (m)
 * @param firstExcitonEnergyJ   first-exciton peak photon energy (J); NaN when neither measured nor derivable
 * @param concentrationMolPerM3 molar concentration of dots (mol/m³)
 * @param advisories            concerns found while resolving
 */
public record Sample(SampleSpec spec, double sizeM, double firstExcitonEnergyJ, double concentrationMolPerM3,
                     List<Advisory> advisories) {

    /** Pump and reference wavelengths closer than this are taken as the same (m). */
    static final double SAME_WAVELENGTH_M = 0.5e-9;
    /** A pump this close to the first-exciton peak uses the first-exciton law (m). */
    static final double AT_FIRST_EXCITON_M = 2e-9;
    /** Absorbance from which spectrophotometer readings and depth profiles become unreliable (OD). */
    public static final double THICK_OD = 3.0;

    public Sample {
        Objects.requireNonNull(spec, "spec");
        advisories = List.copyOf(advisories);
        if (!(sizeM > 0)) {
            throw new IllegalArgumentException("size must be > 0, was " + sizeM * 1e9 + " nm");
        }
        if (!(concentrationMolPerM3 > 0) || !Double.isFinite(concentrationMolPerM3)) {
            throw new IllegalArgumentException("concentration must be > 0, was " + concentrationMolPerM3 * 1e3 + " µM");
        }
    }

    /**
     * Resolves a description: size from the sizing curve (or the reverse), then concentration from the absorbance.
     *
     * @throws SampleException naming the part of the description at fault
     */
    public static Sample resolve(SampleSpec spec) {
        Material m = spec.material();
        List<Advisory> advisories = new ArrayList<>();
        double sizeM;
        double firstJ;
        Optional<SizingCurve> curve = m.sizing();
        if (spec.size() instanceof SampleSpec.ByDiameter d) {
            sizeM = d.sizeM();
            if (curve.isPresent()) {
                try {
                    firstJ = curve.get().firstExcitonEnergyJ(sizeM);
                } catch (IllegalArgumentException e) {
                    throw new SampleException(SampleException.Part.SIZE, m.key() + ": " + e.getMessage(), e);
                }
            } else {
                firstJ = Double.NaN;
            }
        } else if (spec.size() instanceof SampleSpec.ByDiameterAndPeak both) {
            sizeM = both.sizeM();
            firstJ = Photon.energyJ(both.wavelengthM());
            double peakJ = firstJ;
            curve.ifPresent(c -> disagreement(c, sizeM, peakJ).ifPresent(advisories::add));
        } else {
            SampleSpec.ByFirstPeak p = (SampleSpec.ByFirstPeak) spec.size();
            firstJ = Photon.energyJ(p.wavelengthM());
            if (curve.isEmpty()) {
                throw new SampleException(SampleException.Part.SIZE, m.key() + " has no published sizing curve in the "
                        + "library; give the diameter measured on your sample (e.g. by TEM) instead of the first-exciton peak");
            }
            try {
                sizeM = curve.get().diameterM(firstJ);
            } catch (IllegalArgumentException e) {
                throw new SampleException(SampleException.Part.SIZE, m.key() + ": " + e.getMessage(), e);
            }
        }
        if (spec.shell().isPresent()) {
            Shell shell = spec.shell().get();
            if (!shell.alignmentWarning().isEmpty()) {
                advisories.add(new Advisory(Advisory.Kind.SHELL_ALIGNMENT, shell.alignmentWarning()));
            }
            // the core's size stays; a peak measured on the core/shell sets E₁S (no published shift curve is used)
            if (!Double.isNaN(shell.firstExcitonPeakM())) {
                firstJ = Photon.energyJ(shell.firstExcitonPeakM());
            }
        }
        Sample partial = new Sample(spec, sizeM, firstJ, 1.0, List.of());
        double concentration;
        if (spec.amount() instanceof SampleSpec.Concentration c) {
            concentration = c.molPerM3();
        } else {
            SampleSpec.Absorbance a = (SampleSpec.Absorbance) spec.amount();
            double at;
            if (a.atFirstExciton()) {
                if (Double.isNaN(firstJ)) {
                    throw new SampleException(SampleException.Part.AMOUNT, "the absorbance is given at the first exciton, "
                            + "but its position is unknown (no sizing curve for " + m.key() + "): give its wavelength");
                }
                at = Photon.wavelengthM(firstJ);
            } else {
                at = a.wavelengthM();
            }
            CrossSection sigma;
            try {
                sigma = partial.crossSectionAt(at);
            } catch (SampleException e) {
                throw new SampleException(SampleException.Part.AMOUNT, "cannot turn the absorbance into a concentration: "
                        + e.getMessage(), e);
            }
            if (sigma.approximate()) {
                advisories.add(new Advisory(Advisory.Kind.CROSS_SECTION_APPROXIMATE,
                        "concentration rests on an approximate cross-section: " + sigma.basis()));
            }
            // Beer–Lambert: A = σ·n·L/ln10 with n the number density of dots.
            double numberPerM3 = a.od() * Math.log(10) / (sigma.crossSectionM2() * spec.pathLengthM());
            concentration = numberPerM3 / PhysicalConstants.AVOGADRO_PER_MOL;
            if (a.od() >= THICK_OD) {
                advisories.add(new Advisory(Advisory.Kind.OPTICALLY_THICK, String.format(Locale.ROOT,
                        "measured absorbance %s OD is ≥ %.0f: spectrophotometer readings are unreliable there (stray light); "
                                + "dilute or use a shorter path and measure again", org.ladderkin.material.Numbers.sig(a.od(), 3), THICK_OD)));
            }
        }
        return new Sample(spec, sizeM, firstJ, concentration, advisories);
    }

    /** Relative size difference from the sizing curve above which a measured size and peak are worth a look. */
    static final double SIZE_PEAK_DISAGREEMENT = 0.15;

    private static Optional<Advisory> disagreement(SizingCurve curve, double sizeM, double firstJ) {
        double fromCurve;
        try {
            fromCurve = curve.diameterM(firstJ);
        } catch (IllegalArgumentException e) {
            return Optional.of(new Advisory(Advisory.Kind.SIZE_PEAK_DISAGREE, "the first-exciton peak is outside the sizing "
                    + "curve's range, so the size and the peak given cannot be compared: " + e.getMessage()));
        }
        double rel = sizeM / fromCurve - 1;
        if (Math.abs(rel) <= SIZE_PEAK_DISAGREEMENT) {
            return Optional.empty();
        }
        return Optional.of(new Advisory(Advisory.Kind.SIZE_PEAK_DISAGREE, String.format(Locale.ROOT, "the size given, %.2f nm, "
                + "differs by %+.0f %% from the %.2f nm the sizing curve gives for the peak given; both are used as given "
                + "(the peak sets E₁S, the size the volume): check the size measurement", sizeM * 1e9, 100 * rel,
                fromCurve * 1e9)));
    }

    public Material material() {
        return spec.material();
    }

    /** Number density of dots (1/m³). */
    public double numberDensityPerM3() {
        return concentrationMolPerM3 * PhysicalConstants.AVOGADRO_PER_MOL;
    }

    /** Volume of one dot (m³). */
    public double dotVolumeM3() {
        return material().volumeM3(sizeM);
    }

    /** First-exciton peak wavelength (m), NaN when unknown. */
    public double firstExcitonWavelengthM() {
        return Double.isNaN(firstExcitonEnergyJ) ? Double.NaN : Photon.wavelengthM(firstExcitonEnergyJ);
    }

    /**
     * How the concentration was obtained, in words: the value given, or the absorbance and the part of σ(λ) it went
     * through (the same σ(λ) that gives the pump cross-section).
     */
    public String concentrationBasis() {
        if (!(spec.amount() instanceof SampleSpec.Absorbance a)) {
            return "concentration given";
        }
        double at = a.atFirstExciton() ? firstExcitonWavelengthM() : a.wavelengthM();
        CrossSection sigma = crossSectionAt(at);
        return String.format(Locale.ROOT, "%s OD at %s through σ = %s cm² (%s, ±%.0f %%): %s",
                org.ladderkin.material.Numbers.sig(a.od(), 3), nm(at),
                org.ladderkin.material.Numbers.sig(sigma.crossSectionM2() * 1e4, 4), sigma.regime(),
                100 * sigma.relativeUncertainty(), sigma.basis());
    }

    /** Decadic absorbance of the sample over its path at {@code wavelengthM} (OD), from the cross-section there. */
    public double absorbanceAt(double wavelengthM) {
        return crossSectionAt(wavelengthM).crossSectionM2() * numberDensityPerM3() * spec.pathLengthM() / Math.log(10);
    }

    /**
     * The absorption cross-section of one dot at {@code wavelengthM}, with its regime and relative uncertainty: the
     * user's own value (carried by the user's spectrum where needed); else a material law carried by the spectrum; else
     * the material's σ(λ): a law at its own wavelength, the intrinsic absorption from bulk optical constants far above the
     * band edge, the first-exciton law at the peak, and an approximate interpolation between them. The concentration is
     * derived through this same function, so A(λ) = A(given)·σ(λ)/σ(given) for every λ.
     *
     * @throws SampleException when nothing supports a value at that wavelength
     */
    public CrossSection crossSectionAt(double wavelengthM) {
        if (!(wavelengthM > 0)) {
            throw new IllegalArgumentException("wavelength must be > 0, was " + wavelengthM * 1e9 + " nm");
        }
        CrossSection core = CrossSectionModel.at(this, wavelengthM);
        return spec.shell().isEmpty() ? core : CoreShell.of(this).orElseThrow().crossSection(core);
    }

    static String nm(double m) {
        return String.format(Locale.ROOT, "%.1f nm", m * 1e9);
    }
}
