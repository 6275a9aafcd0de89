package org.ladderkin.material;

import java.util.Arrays;
import java.util.Objects;

/**
 * Bulk complex refractive index n + ik of a material at a few wavelengths, and the absorption it gives a small dot
 * far above its band edge, where confinement no longer changes the absorption per volume.
 *
 * <p>A sphere much smaller than the wavelength, with dielectric function ε = (n + ik)² in a host of index n_s, absorbs
 * σ = (2π/λ)·(1/n_s)·|f_LF|²·Im ε·V with f_LF = 3n_s²/(ε + 2n_s²) (quasi-static dipole absorption of a small sphere; the
 * form the σ-law papers of Leatherdale 2002, Moreels 2007/2009 and Jasieniak 2009 compare their data with). The intrinsic
 * absorption coefficient μ_i = σ/V is therefore size-independent.
 *
 * @param wavelengthsM        strictly rising vacuum wavelengths (m), at least two
 * @param n                   real part of the refractive index at each wavelength
 * @param k                   imaginary part at each wavelength (> 0: the material absorbs there)
 * @param source              where the table comes from
 * @param relativeUncertainty the table's own uncertainty, propagated to the absorption it predicts
 */
public record OpticalConstants(double[] wavelengthsM, double[] n, double[] k, String source, Sourced relativeUncertainty) {

    public OpticalConstants {
        wavelengthsM = wavelengthsM.clone();
        n = n.clone();
        k = k.clone();
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(relativeUncertainty, "relativeUncertainty");
        if (wavelengthsM.length < 2 || n.length != wavelengthsM.length || k.length != wavelengthsM.length) {
            throw new IllegalArgumentException("optical constants need n and k at the same two or more wavelengths");
        }
        for (int i = 0; i < wavelengthsM.length; i++) {
            if (!(wavelengthsM[i] > 0) || !(n[i] > 0) || !(k[i] > 0)) {
                throw new IllegalArgumentException("optical constants point " + (i + 1) + " needs wavelength, n and k > 0");
            }
            if (i > 0 && !(wavelengthsM[i] > wavelengthsM[i - 1])) {
                throw new IllegalArgumentException("optical constants wavelengths must rise strictly; point " + (i + 1) + " does not");
            }
        }
        if (!relativeUncertainty.known() || !(relativeUncertainty.value() > 0)) {
            throw new IllegalArgumentException("optical constants need a known relative uncertainty > 0");
        }
    }

    @Override
    public double[] wavelengthsM() {
        return wavelengthsM.clone();
    }

    @Override
    public double[] n() {
        return n.clone();
    }

    @Override
    public double[] k() {
        return k.clone();
    }

    /** Shortest wavelength in the table (m). */
    public double minWavelengthM() {
        return wavelengthsM[0];
    }

    /** Longest wavelength in the table (m). */
    public double maxWavelengthM() {
        return wavelengthsM[wavelengthsM.length - 1];
    }

    /** Whether the table covers {@code wavelengthM}; it is never extrapolated. */
    public boolean covers(double wavelengthM) {
        return wavelengthM >= minWavelengthM() * (1 - 1e-9) && wavelengthM <= maxWavelengthM() * (1 + 1e-9);
    }

    /**
     * Intrinsic absorption coefficient μ_i (1/m) of the material as a small dot in a host of index {@code hostIndex}:
     * μ_i = (2π/λ)·(1/n_s)·|f_LF|²·2nk, n and k interpolated linearly in wavelength.
     */
    public double intrinsicAbsorptionPerM(double wavelengthM, double hostIndex) {
        if (!covers(wavelengthM)) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "the optical constants cover %.0f–%.0f nm, not %.1f nm (%s)", minWavelengthM() * 1e9,
                    maxWavelengthM() * 1e9, wavelengthM * 1e9, source));
        }
        if (!(hostIndex > 0)) {
            throw new IllegalArgumentException("host refractive index must be > 0, was " + hostIndex);
        }
        double nn = interpolate(n, wavelengthM);
        double kk = interpolate(k, wavelengthM);
        double epsRe = nn * nn - kk * kk;
        double epsIm = 2 * nn * kk;
        double host2 = hostIndex * hostIndex;
        double dRe = epsRe + 2 * host2;
        double localField2 = 9 * host2 * host2 / (dRe * dRe + epsIm * epsIm);
        return 2 * Math.PI / wavelengthM / hostIndex * localField2 * epsIm;
    }

    private double interpolate(double[] values, double wavelengthM) {
        double w = Math.min(Math.max(wavelengthM, minWavelengthM()), maxWavelengthM());
        int i = Arrays.binarySearch(wavelengthsM, w);
        if (i >= 0) {
            return values[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = (w - wavelengthsM[lo]) / (wavelengthsM[hi] - wavelengthsM[lo]);
        return values[lo] + t * (values[hi] - values[lo]);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof OpticalConstants c && Arrays.equals(wavelengthsM, c.wavelengthsM) && Arrays.equals(n, c.n)
                && Arrays.equals(k, c.k) && source.equals(c.source) && relativeUncertainty.equals(c.relativeUncertainty);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(wavelengthsM) * 31 + Arrays.hashCode(n) * 7 + Arrays.hashCode(k) + source.hashCode();
    }

    @Override
    public String toString() {
        return "OpticalConstants[" + Arrays.toString(wavelengthsM) + ", " + source + "]";
    }
}
