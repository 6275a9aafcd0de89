package org.ladderkin.sample;

import java.util.Arrays;

/**
 * A measured linear absorption spectrum of the user's own sample: decadic absorbance at rising wavelengths.
 * Used only through ratios, A(λ₁)/A(λ₂), to carry a cross-section known at one wavelength to another; the ratio of the
 * user's own spectrum beats any table.
 *
 * @param wavelengthsM strictly rising wavelengths (m), at least two
 * @param absorbance   absorbance (OD) at each wavelength
 * @param origin       where the spectrum came from (file name), for messages
 */
public record AbsorptionSpectrum(double[] wavelengthsM, double[] absorbance, String origin) {

    public AbsorptionSpectrum {
        wavelengthsM = wavelengthsM.clone();
        absorbance = absorbance.clone();
        if (wavelengthsM.length != absorbance.length) {
            throw new IllegalArgumentException("spectrum needs as many absorbances as wavelengths");
        }
        if (wavelengthsM.length < 2) {
            throw new IllegalArgumentException("spectrum needs at least two points, has " + wavelengthsM.length);
        }
        for (int i = 0; i < wavelengthsM.length; i++) {
            if (!(wavelengthsM[i] > 0) || !Double.isFinite(absorbance[i])) {
                throw new IllegalArgumentException("spectrum point " + (i + 1) + " is not a positive wavelength with a finite absorbance");
            }
            if (i > 0 && !(wavelengthsM[i] > wavelengthsM[i - 1])) {
                throw new IllegalArgumentException("spectrum wavelengths must rise strictly; point " + (i + 1) + " does not");
            }
        }
    }

    @Override
    public double[] wavelengthsM() {
        return wavelengthsM.clone();
    }

    @Override
    public double[] absorbance() {
        return absorbance.clone();
    }

    /** Whether {@code wavelengthM} lies within the measured range. */
    public boolean covers(double wavelengthM) {
        // a relative slack of 1e-9 absorbs the last-bit differences between "400 nm" parsed two ways
        return wavelengthM >= wavelengthsM[0] * (1 - 1e-9) && wavelengthM <= wavelengthsM[wavelengthsM.length - 1] * (1 + 1e-9);
    }

    /** Absorbance at {@code wavelengthM}, linearly interpolated; throws outside the measured range. */
    public double absorbanceAt(double wavelengthM) {
        if (!covers(wavelengthM)) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "%s covers %.1f–%.1f nm, not %.1f nm", origin, wavelengthsM[0] * 1e9,
                    wavelengthsM[wavelengthsM.length - 1] * 1e9, wavelengthM * 1e9));
        }
        double w = Math.min(Math.max(wavelengthM, wavelengthsM[0]), wavelengthsM[wavelengthsM.length - 1]);
        int i = Arrays.binarySearch(wavelengthsM, w);
        if (i >= 0) {
            return absorbance[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = (w - wavelengthsM[lo]) / (wavelengthsM[hi] - wavelengthsM[lo]);
        return absorbance[lo] + t * (absorbance[hi] - absorbance[lo]);
    }

    /** A(to)/A(from): the factor that carries a cross-section from {@code fromM} to {@code toM}. */
    public double ratio(double toM, double fromM) {
        double from = absorbanceAt(fromM);
        if (!(from > 0)) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "%s has absorbance %.3g at %.1f nm: cannot scale a cross-section from there", origin, from, fromM * 1e9));
        }
        double to = absorbanceAt(toM);
        if (to < 0) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "%s has negative absorbance %.3g at %.1f nm (baseline?)", origin, to, toM * 1e9));
        }
        return to / from;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof AbsorptionSpectrum s && Arrays.equals(wavelengthsM, s.wavelengthsM)
                && Arrays.equals(absorbance, s.absorbance) && origin.equals(s.origin);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(wavelengthsM) * 31 + Arrays.hashCode(absorbance);
    }

    @Override
    public String toString() {
        return "AbsorptionSpectrum[" + origin + ", " + wavelengthsM.length + " points]";
    }
}
