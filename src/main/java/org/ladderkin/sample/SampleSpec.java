package org.ladderkin.sample;

import java.util.Objects;
import java.util.Optional;
import org.ladderkin.material.Material;

/**
 * A sample as the user describes it, before the sizing curve and the absorption laws turn it into numbers
 * ({@link Sample#resolve}). There is one way to describe a sample, whether it comes from a sample file, a plan file or
 * command-line flags.
 *
 * @param name            the user's name for the sample
 * @param material        the material
 * @param size            diameter (edge for cubes) or measured first-exciton peak
 * @param sizeDispersion  relative standard deviation of the size (0..1)
 * @param amount          concentration, or a measured absorbance at a wavelength
 * @param pathLengthM     optical path length (m)
 * @param matrix          solvent or film host, if known
 * @param refresh         how the excited volume is renewed
 * @param spectrum        measured linear absorption spectrum, if loaded
 * @param givenCrossSection a cross-section measured by the user, overriding the material's laws
 * @param shell           a shell grown on the core (the material and size above describe the core), if any
 */
public record SampleSpec(String name, Material material, Size size, double sizeDispersion, Amount amount,
                         double pathLengthM, Optional<Matrix> matrix, Refresh refresh,
                         Optional<AbsorptionSpectrum> spectrum, Optional<GivenCrossSection> givenCrossSection,
                         Optional<Shell> shell) {

    /** How the size is given. */
    public sealed interface Size permits ByDiameter, ByFirstPeak, ByDiameterAndPeak { }

    /** Size given directly (diameter of a sphere, edge of a cube), m. */
    public record ByDiameter(double sizeM) implements Size {
        public ByDiameter {
            if (!(sizeM > 0) || !Double.isFinite(sizeM)) {
                throw new IllegalArgumentException("diameter must be > 0, was " + sizeM * 1e9 + " nm");
            }
        }
    }

    /** Size given by the measured first-exciton absorption peak (vacuum wavelength, m). */
    public record ByFirstPeak(double wavelengthM) implements Size {
        public ByFirstPeak {
            if (!(wavelengthM > 0) || !Double.isFinite(wavelengthM)) {
                throw new IllegalArgumentException("first-exciton peak must be > 0, was " + wavelengthM * 1e9 + " nm");
            }
        }
    }

    /**
     * Size and first-exciton peak both measured: the peak sets E₁S and the size the volume. The only way to plan a
     * material without a sizing curve in the library, and the better description when both are known (a sizing
     * curve is an average over many batches).
     */
    public record ByDiameterAndPeak(double sizeM, double wavelengthM) implements Size {
        public ByDiameterAndPeak {
            new ByDiameter(sizeM);
            new ByFirstPeak(wavelengthM);
        }
    }

    /** How much material there is. */
    public sealed interface Amount permits Concentration, Absorbance { }

    /** Molar concentration of dots (mol/m³; 1 µM = 1e-3 mol/m³). */
    public record Concentration(double molPerM3) implements Amount {
        public Concentration {
            if (!(molPerM3 > 0) || !Double.isFinite(molPerM3)) {
                throw new IllegalArgumentException("concentration must be > 0, was " + molPerM3 * 1e3 + " µM");
            }
        }
    }

    /**
     * Measured decadic absorbance over the path length, at a wavelength.
     *
     * @param od          absorbance (OD), > 0
     * @param wavelengthM where it was measured (m), or NaN for "at the first-exciton peak"
     */
    public record Absorbance(double od, double wavelengthM) implements Amount {
        public Absorbance {
            if (!(od > 0) || !Double.isFinite(od)) {
                throw new IllegalArgumentException("absorbance must be > 0, was " + od + " OD");
            }
            if (!Double.isNaN(wavelengthM) && !(wavelengthM > 0)) {
                throw new IllegalArgumentException("absorbance wavelength must be > 0, was " + wavelengthM * 1e9 + " nm");
            }
        }

        /** Whether it was read at the first-exciton peak. */
        public boolean atFirstExciton() {
            return Double.isNaN(wavelengthM);
        }
    }

    /**
     * A cross-section the user measured.
     *
     * @param crossSectionM2 σ (m²)
     * @param wavelengthM    where it holds (m), or NaN when it is to be used at any pump wavelength as given
     */
    public record GivenCrossSection(double crossSectionM2, double wavelengthM) {
        public GivenCrossSection {
            if (!(crossSectionM2 > 0) || !Double.isFinite(crossSectionM2)) {
                throw new IllegalArgumentException("cross-section must be > 0, was " + crossSectionM2 * 1e4 + " cm²");
            }
        }
    }

    public SampleSpec {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(size, "size");
        Objects.requireNonNull(amount, "amount");
        Objects.requireNonNull(matrix, "matrix");
        Objects.requireNonNull(refresh, "refresh");
        Objects.requireNonNull(spectrum, "spectrum");
        Objects.requireNonNull(givenCrossSection, "givenCrossSection");
        Objects.requireNonNull(shell, "shell");
        if (!(sizeDispersion >= 0) || sizeDispersion >= 1) {
            throw new IllegalArgumentException("size dispersion must be in [0, 1), was " + sizeDispersion);
        }
        if (!(pathLengthM > 0) || !Double.isFinite(pathLengthM)) {
            throw new IllegalArgumentException("path length must be > 0, was " + pathLengthM * 1e3 + " mm");
        }
    }

    /** A plain dot, without a shell. */
    public SampleSpec(String name, Material material, Size size, double sizeDispersion, Amount amount, double pathLengthM,
                      Optional<Matrix> matrix, Refresh refresh, Optional<AbsorptionSpectrum> spectrum,
                      Optional<GivenCrossSection> givenCrossSection) {
        this(name, material, size, sizeDispersion, amount, pathLengthM, matrix, refresh, spectrum, givenCrossSection,
                Optional.empty());
    }

    /** A copy with another refresh mode (the instance is not changed). */
    public SampleSpec withRefresh(Refresh r) {
        return new SampleSpec(name, material, size, sizeDispersion, amount, pathLengthM, matrix, r, spectrum, givenCrossSection,
                shell);
    }

    /** This description with a different given cross-section (the instance is not changed). */
    public SampleSpec withGivenCrossSection(Optional<GivenCrossSection> given) {
        return new SampleSpec(name, material, size, sizeDispersion, amount, pathLengthM, matrix, refresh, spectrum, given,
                shell);
    }

    /** This description with a different spectrum (the instance is not changed). */
    public SampleSpec withSpectrum(Optional<AbsorptionSpectrum> s) {
        return new SampleSpec(name, material, size, sizeDispersion, amount, pathLengthM, matrix, refresh, s, givenCrossSection,
                shell);
    }

    /** This description with a different shell (the instance is not changed). */
    public SampleSpec withShell(Optional<Shell> s) {
        return new SampleSpec(name, material, size, sizeDispersion, amount, pathLengthM, matrix, refresh, spectrum,
                givenCrossSection, s);
    }
}
