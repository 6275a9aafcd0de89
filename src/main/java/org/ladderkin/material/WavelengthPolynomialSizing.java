package org.ladderkin.material;

import java.util.Arrays;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.ladderkin.units.Photon;

/**
 * Sizing curve giving the diameter as a polynomial of the first-exciton peak wavelength,
 * D[nm] = Σ cᵢ·λ[nm]ⁱ, the form of Yu, Qu, Guo and Peng (2003) for CdSe, CdTe and CdS. It is valid over a range
 * of peak wavelengths; the constructor checks that D rises monotonically over that range, so the inverse
 * (diameter → peak) is unique and is found with a bracketing root finder.
 *
 * @param coefficients   c₀, c₁, ... (D in nm for λ in nm)
 * @param minPeakM       shortest peak wavelength covered (m)
 * @param maxPeakM       longest peak wavelength covered (m)
 * @param bulkGapJ       bulk band gap (J): a peak below it cannot come from any size
 * @param source         where the curve and its range come from
 */
public record WavelengthPolynomialSizing(double[] coefficients, double minPeakM, double maxPeakM, double bulkGapJ,
                                         String source) implements SizingCurve {

    private static final int MONOTONIC_SAMPLES = 400;

    public WavelengthPolynomialSizing {
        coefficients = coefficients.clone();
        if (coefficients.length < 2) {
            throw new IllegalArgumentException("a sizing polynomial needs at least two coefficients");
        }
        if (!(minPeakM > 0) || !(maxPeakM > minPeakM)) {
            throw new IllegalArgumentException("peak range must satisfy 0 < min < max, was " + minPeakM * 1e9 + "–"
                    + maxPeakM * 1e9 + " nm");
        }
        double previous = Double.NEGATIVE_INFINITY;
        for (int i = 0; i <= MONOTONIC_SAMPLES; i++) {
            double lambdaNm = (minPeakM + (maxPeakM - minPeakM) * i / MONOTONIC_SAMPLES) * 1e9;
            double d = eval(coefficients, lambdaNm);
            if (!(d > previous) || !(d > 0)) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                        "the sizing polynomial is not a positive, rising function of wavelength over %.0f–%.0f nm "
                                + "(fails near %.1f nm); shorten the validity range", minPeakM * 1e9, maxPeakM * 1e9, lambdaNm));
            }
            previous = d;
        }
    }

    @Override
    public double[] coefficients() {
        return coefficients.clone();
    }

    /** Diameter (m) for a peak wavelength (m), without range checks. */
    private double diameterAtPeakM(double peakM) {
        return eval(coefficients, peakM * 1e9) * 1e-9;
    }

    private static double eval(double[] c, double x) {
        double sum = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            sum = sum * x + c[i];
        }
        return sum;
    }

    @Override
    public double minDiameterM() {
        return diameterAtPeakM(minPeakM);
    }

    @Override
    public double maxDiameterM() {
        return diameterAtPeakM(maxPeakM);
    }

    @Override
    public double firstExcitonEnergyJ(double diameterM) {
        requireDiameterInRange(diameterM);
        double lo = minPeakM;
        double hi = maxPeakM;
        double dMin = minDiameterM();
        double dMax = maxDiameterM();
        if (diameterM <= dMin) {
            return Photon.energyJ(lo);
        }
        if (diameterM >= dMax) {
            return Photon.energyJ(hi);
        }
        double peakNm = new BrentSolver(1e-12, 1e-12).solve(200,
                x -> diameterAtPeakM(x * 1e-9) - diameterM, lo * 1e9, hi * 1e9);
        return Photon.energyJ(peakNm * 1e-9);
    }

    @Override
    public double diameterM(double energyJ) {
        double peakM = Photon.wavelengthM(energyJ);
        if (!(energyJ > bulkGapJ)) {
            throw new IllegalArgumentException("no dot size gives a first-exciton peak at " + Numbers.sig(peakM * 1e9, 4)
                    + " nm: it lies at or beyond the bulk band gap (" + Numbers.sig(Photon.wavelengthM(bulkGapJ) * 1e9, 4)
                    + " nm); confinement only moves the peak to shorter wavelengths");
        }
        double tol = 1e-9 * maxPeakM;
        if (peakM < minPeakM - tol || peakM > maxPeakM + tol) {
            throw new IllegalArgumentException("first-exciton peak " + Numbers.sig(peakM * 1e9, 4)
                    + " nm is outside the sizing curve's validity range " + Numbers.sig(minPeakM * 1e9, 4) + "–"
                    + Numbers.sig(maxPeakM * 1e9, 4) + " nm (" + source + ")");
        }
        return diameterAtPeakM(peakM);
    }

    @Override
    public String formula() {
        StringBuilder b = new StringBuilder("D = ");
        for (int i = coefficients.length - 1; i >= 0; i--) {
            double c = coefficients[i];
            if (i < coefficients.length - 1) {
                b.append(c < 0 ? " − " : " + ");
                c = Math.abs(c);
            }
            b.append(new java.math.BigDecimal(Double.toString(c)).stripTrailingZeros().toString().replace("E", "e"));
            if (i >= 1) {
                b.append(" λ");
            }
            if (i >= 2) {
                b.append(i == 2 ? "²" : i == 3 ? "³" : i == 4 ? "⁴" : "^" + i);
            }
        }
        return b.append(" nm, λ in nm").toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WavelengthPolynomialSizing w && Arrays.equals(coefficients, w.coefficients)
                && minPeakM == w.minPeakM && maxPeakM == w.maxPeakM && bulkGapJ == w.bulkGapJ && source.equals(w.source);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(coefficients) * 31 + Double.hashCode(minPeakM) + source.hashCode();
    }

    @Override
    public String toString() {
        return "WavelengthPolynomialSizing[" + formula() + ", " + source + "]";
    }
}
