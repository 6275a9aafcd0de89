package org.ladderkin.material;

import org.ladderkin.units.PhysicalConstants;

/**
 * Sizing curve of the form E = E₀ + 1/(a·d² + b·d + c) (E in eV, d in nm), the form used for lead chalcogenide dots
 * (Moreels et al. 2007 for PbSe, 2009 for PbS). The inverse is the positive root of a quadratic, so both directions are
 * closed form.
 *
 * @param offsetEv     E₀ (eV), the large-size limit
 * @param aPerNm2      a (1/(eV·nm²)): the coefficient of d²
 * @param bPerNm       b (1/(eV·nm))
 * @param c            c (1/eV)
 * @param minDiameterM smallest diameter covered (m)
 * @param maxDiameterM largest diameter covered (m)
 * @param source       where the curve and its range come from
 */
public record ReciprocalQuadraticSizing(double offsetEv, double aPerNm2, double bPerNm, double c,
                                        double minDiameterM, double maxDiameterM, String source) implements SizingCurve {

    public ReciprocalQuadraticSizing {
        if (!(minDiameterM > 0) || !(maxDiameterM > minDiameterM)) {
            throw new IllegalArgumentException("validity range must satisfy 0 < min < max, was " + minDiameterM * 1e9
                    + "–" + maxDiameterM * 1e9 + " nm");
        }
        if (aPerNm2 < 0 || bPerNm < 0 || c < 0 || aPerNm2 + bPerNm <= 0) {
            throw new IllegalArgumentException("coefficients a, b, c must be >= 0 (a + b > 0) so that E falls with size");
        }
    }

    @Override
    public double firstExcitonEnergyJ(double diameterM) {
        requireDiameterInRange(diameterM);
        double d = diameterM * 1e9;
        return (offsetEv + 1.0 / (aPerNm2 * d * d + bPerNm * d + c)) * PhysicalConstants.ELECTRONVOLT_J;
    }

    @Override
    public double diameterM(double energyJ) {
        double eEv = energyJ / PhysicalConstants.ELECTRONVOLT_J;
        if (!(eEv > offsetEv)) {
            throw new IllegalArgumentException("no dot size gives a first-exciton peak at " + Numbers.sig(eEv, 4)
                    + " eV: it lies at or below the large-size limit " + Numbers.sig(offsetEv, 4) + " eV of " + source);
        }
        double q = c - 1.0 / (eEv - offsetEv);
        double d;
        if (aPerNm2 == 0) {
            d = -q / bPerNm;
        } else {
            d = (-bPerNm + Math.sqrt(bPerNm * bPerNm - 4 * aPerNm2 * q)) / (2 * aPerNm2);
        }
        if (!(d > 0)) {
            throw new IllegalArgumentException("no dot size gives a first-exciton peak at " + Numbers.sig(eEv, 4)
                    + " eV: the curve " + formula() + " never reaches it");
        }
        double diameterM = d * 1e-9;
        requireInRangeForPeak(diameterM, eEv);
        return diameterM;
    }

    private void requireInRangeForPeak(double diameterM, double eEv) {
        double tol = 1e-9 * maxDiameterM;
        if (diameterM < minDiameterM - tol || diameterM > maxDiameterM + tol) {
            throw new IllegalArgumentException("a first-exciton peak at " + Numbers.sig(eEv, 4) + " eV means a diameter of "
                    + Numbers.sig(diameterM * 1e9, 3) + " nm, outside the sizing curve's validity range "
                    + Numbers.sig(minDiameterM * 1e9, 3) + "–" + Numbers.sig(maxDiameterM * 1e9, 3) + " nm (" + source + ")");
        }
    }

    @Override
    public String formula() {
        return String.format(java.util.Locale.ROOT, "E = %s + 1/(%s d² + %s d + %s) eV, d in nm",
                num(offsetEv), num(aPerNm2), num(bPerNm), num(c));
    }

    private static String num(double v) {
        return new java.math.BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString();
    }
}
