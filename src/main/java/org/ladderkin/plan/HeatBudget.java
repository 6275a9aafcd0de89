package org.ladderkin.plan;

import org.ladderkin.excite.Excitation;
import org.ladderkin.observe.Heating;
import org.ladderkin.observe.ThermalMedium;
import org.ladderkin.sample.Matrix;
import org.ladderkin.sample.Sample;

/**
 * Heat the pump leaves at one setting.
 *
 * @param heatFraction      share of the absorbed energy that becomes heat (the rest leaves as PL)
 * @param heatPowerW        average heating power in the excited volume (W)
 * @param steadyRiseK       steady-state temperature rise on the beam axis (K)
 * @param perPulseRiseK     temperature rise of the excited volume from one pulse (K)
 * @param dotJumpK          lattice temperature jump of one dot right after the pulse (K)
 * @param boilingPointK     the solvent's boiling point (K), +∞ for a film
 * @param model             which conduction model gave the steady state
 */
public record HeatBudget(double heatFraction, double heatPowerW, double steadyRiseK, double perPulseRiseK,
                         double dotJumpK, double boilingPointK, String model) {

    /** Distance from the beam to the cell wall that holds ambient temperature: half a 1 cm cuvette (common practice). */
    public static final double WALL_DISTANCE_M = 5e-3;
    /** Fused silica substrate under films: k = 1.38 W/(m·K), ρ = 2.2 g/cm³, c = 0.74 J/(g·K) (CRC Handbook glass table). */
    public static final ThermalMedium FUSED_SILICA = new ThermalMedium(2200, 740, 1.38, Double.POSITIVE_INFINITY);

    /**
     * @param emittedPerAbsorbed PL photons per absorbed photon at this setting (from the engine)
     * @param absorbedPerDot     photons absorbed per dot per pulse (probe-averaged ⟨N⟩)
     */
    public static HeatBudget of(Excitation ex, double emittedPerAbsorbed, double absorbedPerDot) {
        Sample s = ex.sample();
        double photonJ = ex.pulse().photonEnergyJ();
        double emissionJ = Double.isNaN(s.firstExcitonEnergyJ()) ? photonJ : s.firstExcitonEnergyJ();
        double fraction = Math.max(0, 1 - emittedPerAbsorbed * emissionJ / photonJ);
        double power = ex.absorbedPowerW() * fraction;
        double heatPerDot = absorbedPerDot * photonJ * fraction;
        double dotJump = Heating.dotTemperatureJumpK(heatPerDot, s.material().shape() == org.ladderkin.material.Shape.CUBE
                        ? Math.cbrt(6 / Math.PI) * s.sizeM() : s.sizeM(),
                s.material().densityKgPerM3().value(), s.material().specificHeatJPerKgK().value());
        Matrix matrix = s.spec().matrix().orElse(null);
        if (matrix == null) {
            return new HeatBudget(fraction, power, Double.NaN, Double.NaN, dotJump, Double.POSITIVE_INFINITY,
                    "no matrix given: steady-state heating unknown");
        }
        ThermalMedium medium = new ThermalMedium(matrix.densityKgPerM3().value(), matrix.specificHeatJPerKgK().value(),
                matrix.thermalConductivityWPerMK().value(),
                matrix.boilingPointK().known() ? matrix.boilingPointK().value() : Double.POSITIVE_INFINITY);
        // the Gaussian with the same peak fluence: effective area πw²/2
        double radius = ex.geometry().pump() instanceof org.ladderkin.excite.GaussianBeam g ? g.radiusM()
                : Math.sqrt(2 * ex.geometry().pump().effectiveAreaM2() / Math.PI);
        double perPulse = Heating.perPulseVolumeRiseK(heatPerDot, s.numberDensityPerM3(), medium);
        if (matrix.kind() == Matrix.Kind.FILM) {
            double steady = Heating.steadyRiseFilmK(power, radius, FUSED_SILICA);
            double dwellS = s.spec().refresh().translationRefreshS(2 * radius);
            if (Double.isFinite(dwellS)) {
                // a spot under the beam for D/v warms at most as much as that many pulses with no conduction, and never
                // more than a resting spot: either bound holds, so the smaller one does
                double pulses = Math.max(1, ex.pulse().repetitionRateHz() * dwellS);
                double accumulated = perPulse * pulses;
                if (Double.isFinite(accumulated) && accumulated < steady) {
                    return new HeatBudget(fraction, power, accumulated, perPulse, dotJump, Double.POSITIVE_INFINITY,
                            String.format(java.util.Locale.ROOT, "film translated under the beam: %.3g pulses per spot, "
                                    + "each adding the per-pulse rise (no conduction, an upper bound)", pulses));
                }
                return new HeatBudget(fraction, power, steady, perPulse, dotJump, Double.POSITIVE_INFINITY,
                        "film on fused silica, conduction into the substrate (bounds the translated film too)");
            }
            return new HeatBudget(fraction, power, steady, perPulse, dotJump,
                    Double.POSITIVE_INFINITY, "film on fused silica, conduction into the substrate");
        }
        double rise = Heating.steadyRiseLiquidK(power, radius, s.spec().pathLengthM(), WALL_DISTANCE_M, medium);
        return new HeatBudget(fraction, power, rise, perPulse, dotJump, medium.boilingPointK(),
                "liquid, radial conduction to a wall 5 mm away");
    }
}
