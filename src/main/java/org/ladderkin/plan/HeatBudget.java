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
 * @param hottest           the same per-pulse numbers for the hottest dots: on the pump axis at the front face
 */
public record HeatBudget(double heatFraction, double heatPowerW, double steadyRiseK, double perPulseRiseK,
                         double dotJumpK, double boilingPointK, String model, Hottest hottest) {

    /**
     * Heat of the dots on the pump axis at the front face, where ⟨N⟩ is highest: the averages above are taken over the
     * probe spot and the depth, so they understate what these dots and the liquid around them see.
     *
     * @param nAvg          ⟨N⟩ on the pump axis at the front face
     * @param heatFraction  share of their absorbed energy left as heat (more Auger, less PL than on average)
     * @param perPulseRiseK rise of the liquid (or film) around them from one pulse (K)
     * @param dotJumpK      lattice temperature jump of one of them right after the pulse (K)
     */
    public record Hottest(double nAvg, double heatFraction, double perPulseRiseK, double dotJumpK) {
    }

    /**
     * Highest temperature rise the sample reaches: the steady rise on the beam axis plus one pulse's rise of the
     * hottest (front-face, on-axis) volume; the heating risk and the rate verdicts are judged on it. NaN when the
     * steady rise is unknown (no matrix).
     */
    public double peakRiseK() {
        return steadyRiseK + (Double.isFinite(hottest.perPulseRiseK()) ? hottest.perPulseRiseK() : 0);
    }

    /** Distance from the beam to the cell wall that holds ambient temperature: half a 1 cm cuvette (common practice). */
    public static final double WALL_DISTANCE_M = 5e-3;
    /** Fused silica substrate under films: k = 1.38 W/(m·K), ρ = 2.2 g/cm³, c = 0.74 J/(g·K) (CRC Handbook glass table). */
    public static final ThermalMedium FUSED_SILICA = new ThermalMedium(2200, 740, 1.38, Double.POSITIVE_INFINITY);

    /**
     * The heating risk, judged on the hottest volume ({@link #peakRiseK()}) against the user's limit and the boiling
     * point; its sentence gives the steady part, the hottest pulse and the dot jumps at the maximum and on average.
     */
    public org.ladderkin.observe.Risk risk(double ambientK, double limitRiseK) {
        org.ladderkin.observe.Risk r = Heating.risk(RISK_NAME, peakRiseK(), ambientK, limitRiseK, boilingPointK);
        if (Double.isNaN(steadyRiseK)) {
            return r;
        }
        return new org.ladderkin.observe.Risk(r.name(), r.verdict(), r.value(), r.limit(), r.unit(), r.why()
                + String.format(java.util.Locale.ROOT, "; the rise is the steady %.3g K on the beam axis plus %.3g K from "
                        + "one pulse at the hottest dots (pump axis, front face, ⟨N⟩ = %.3g; each dot's lattice jumps "
                        + "%.3g K there, %.3g K and %.3g K per pulse at the probe- and depth-averaged ⟨N⟩)", steadyRiseK,
                        hottest.perPulseRiseK(), hottest.nAvg(), hottest.dotJumpK(), dotJumpK, perPulseRiseK));
    }

    /** Name of the heating risk row. */
    public static final String RISK_NAME = "heating (steady rise + hottest pulse)";

    /**
     * @param emittedPerAbsorbed        PL photons per absorbed photon at this setting (from the engine)
     * @param absorbedPerDot            photons absorbed per dot per pulse (probe-averaged ⟨N⟩)
     * @param emittedPerAbsorbedHottest the same on the pump axis at the front face, at ⟨N⟩ = {@code ex.nAvgPeak()}
     */
    public static HeatBudget of(Excitation ex, double emittedPerAbsorbed, double absorbedPerDot,
                                double emittedPerAbsorbedHottest) {
        Sample s = ex.sample();
        double photonJ = ex.pulse().photonEnergyJ();
        double emissionJ = Double.isNaN(s.firstExcitonEnergyJ()) ? photonJ : s.firstExcitonEnergyJ();
        double fraction = heatFraction(photonJ, emissionJ, emittedPerAbsorbed);
        double power = ex.absorbedPowerW() * fraction;
        double heatPerDot = absorbedPerDot * photonJ * fraction;
        double diameter = s.material().shape() == org.ladderkin.material.Shape.CUBE ? Math.cbrt(6 / Math.PI) * s.sizeM() : s.sizeM();
        double density = s.material().densityKgPerM3().value();
        double specificHeat = s.material().specificHeatJPerKgK().value();
        // a shell takes up the heat with its core: the whole dot's heat capacity when the sample has one
        double shellCapacity = org.ladderkin.sample.CoreShell.of(s).map(org.ladderkin.sample.CoreShell::heatCapacityJPerK)
                .filter(c -> Double.isFinite(c) && c > 0).orElse(Double.NaN);
        double dotJump = Double.isNaN(shellCapacity) ? Heating.dotTemperatureJumpK(heatPerDot, diameter, density, specificHeat)
                : heatPerDot / shellCapacity;
        double nHot = ex.nAvgPeak();
        double fractionHot = heatFraction(photonJ, emissionJ, emittedPerAbsorbedHottest);
        double heatPerHotDot = nHot * photonJ * fractionHot;
        double hotJump = Double.isNaN(shellCapacity) ? Heating.dotTemperatureJumpK(heatPerHotDot, diameter, density, specificHeat)
                : heatPerHotDot / shellCapacity;
        Matrix matrix = s.spec().matrix().orElse(null);
        if (matrix == null) {
            return new HeatBudget(fraction, power, Double.NaN, Double.NaN, dotJump, Double.POSITIVE_INFINITY,
                    "no matrix given: steady-state heating unknown", new Hottest(nHot, fractionHot, Double.NaN, hotJump));
        }
        ThermalMedium medium = new ThermalMedium(matrix.densityKgPerM3().value(), matrix.specificHeatJPerKgK().value(),
                matrix.thermalConductivityWPerMK().value(),
                matrix.boilingPointK().known() ? matrix.boilingPointK().value() : Double.POSITIVE_INFINITY);
        // the Gaussian with the same peak fluence: effective area πw²/2
        double radius = ex.geometry().pump() instanceof org.ladderkin.excite.GaussianBeam g ? g.radiusM()
                : Math.sqrt(2 * ex.geometry().pump().effectiveAreaM2() / Math.PI);
        double perPulse = Heating.perPulseVolumeRiseK(heatPerDot, s.numberDensityPerM3(), medium);
        Hottest hot = new Hottest(nHot, fractionHot, Heating.perPulseVolumeRiseK(heatPerHotDot, s.numberDensityPerM3(), medium),
                hotJump);
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
                                    + "each adding the per-pulse rise (no conduction, an upper bound)", pulses), hot);
                }
                return new HeatBudget(fraction, power, steady, perPulse, dotJump, Double.POSITIVE_INFINITY,
                        "film on fused silica, conduction into the substrate (bounds the translated film too)", hot);
            }
            return new HeatBudget(fraction, power, steady, perPulse, dotJump,
                    Double.POSITIVE_INFINITY, "film on fused silica, conduction into the substrate", hot);
        }
        double rise = Heating.steadyRiseLiquidK(power, radius, s.spec().pathLengthM(), WALL_DISTANCE_M, medium);
        org.ladderkin.sample.Refresh refresh = s.spec().refresh();
        if (refresh.mode() == org.ladderkin.sample.Refresh.Mode.FLOWING) {
            double speed = refresh.flowSpeedMPerS(s.spec().pathLengthM());
            double flowRise = Heating.flowRiseK(power, radius, s.spec().pathLengthM(), speed, medium);
            // flow and conduction each remove heat; either estimate ignores the other path, so the smaller one bounds
            if (flowRise < rise) {
                return new HeatBudget(fraction, power, flowRise, perPulse, dotJump, medium.boilingPointK(),
                        String.format(java.util.Locale.ROOT, "flowing liquid: a parcel crosses the beam at %.3g mm/s "
                                + "(flow / cell cross-section) and leaves with 4P/(π·w·L·v·ρc)", speed * 1e3), hot);
            }
            return new HeatBudget(fraction, power, rise, perPulse, dotJump, medium.boilingPointK(), String.format(
                    java.util.Locale.ROOT, "flowing liquid, but slower (%.3g mm/s) than radial conduction to a wall 5 mm "
                            + "away removes the heat: conduction bounds the rise", speed * 1e3), hot);
        }
        return new HeatBudget(fraction, power, rise, perPulse, dotJump, medium.boilingPointK(),
                "liquid, radial conduction to a wall 5 mm away", hot);
    }

    /**
     * Share of the absorbed energy left as heat: per photon ħω − E₁S at once (never negative, {@link
     * Heating#heatPerAbsorbedPhotonJ}) plus E₁S for each exciton that does not leave as PL.
     */
    private static double heatFraction(double photonJ, double emissionJ, double emittedPerAbsorbed) {
        double prompt = Heating.heatPerAbsorbedPhotonJ(photonJ, 1, emissionJ);
        return Math.min(1, (prompt + Math.max(0, 1 - emittedPerAbsorbed) * emissionJ) / photonJ);
    }
}
