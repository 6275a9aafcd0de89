package org.ladderkin.observe;

/**
 * Heat left in the sample by the pump, from one dot to the steady state of the whole excited volume.
 * Every formula is derived in docs/physics.md ("Heating"); all quantities SI.
 */
public final class Heating {

    private Heating() {
    }

    /**
     * Heat deposited in one dot per pulse: absorbed photon energy minus the energy that leaves as photoluminescence.
     *
     * @param absorbedPhotonsPerDot   mean photons absorbed per dot per pulse (⟨N⟩ for one exciton per photon)
     * @param photonEnergyJ           pump photon energy (J)
     * @param emittedPhotonsPerDot    mean PL photons emitted per dot per pulse
     * @param emissionEnergyJ         mean energy of an emitted photon (J), about the first-exciton energy
     */
    public static double heatPerDotJ(double absorbedPhotonsPerDot, double photonEnergyJ, double emittedPhotonsPerDot,
                                     double emissionEnergyJ) {
        ThermalMedium.positive(photonEnergyJ, "photon energy", "J");
        if (absorbedPhotonsPerDot < 0 || emittedPhotonsPerDot < 0 || emittedPhotonsPerDot > absorbedPhotonsPerDot * 2 + 1e-12) {
            throw new IllegalArgumentException("photon counts per dot must be >= 0 (absorbed " + absorbedPhotonsPerDot
                    + ", emitted " + emittedPhotonsPerDot + ")");
        }
        return Math.max(0, absorbedPhotonsPerDot * photonEnergyJ - emittedPhotonsPerDot * emissionEnergyJ);
    }

    /**
     * Heat one absorbed photon leaves once the {@code excitonsPerPhoton} excitons it made have cooled to the band edge:
     * ħω − m·E₁S. A photon below m·E₁S cannot make m excitons, so that input is refused rather than turned into
     * negative heat (docs/physics.md, "Heating": energy conservation).
     *
     * @param excitonsPerPhoton excitons made by one photon: 1, or 2 and more with carrier multiplication
     * @param firstExcitonJ     first-exciton (band-edge) energy E₁S (J)
     */
    public static double heatPerAbsorbedPhotonJ(double photonEnergyJ, int excitonsPerPhoton, double firstExcitonJ) {
        ThermalMedium.positive(photonEnergyJ, "photon energy", "J");
        ThermalMedium.positive(firstExcitonJ, "first-exciton energy", "J");
        if (excitonsPerPhoton < 1) {
            throw new IllegalArgumentException("excitons per photon must be >= 1, was " + excitonsPerPhoton);
        }
        double ratio = photonEnergyJ / firstExcitonJ;
        // a relative 1e-12 keeps ħω = 2·E₁S, typed in eV, on the allowed side of its own threshold
        if (ratio < excitonsPerPhoton * (1 - 1e-12)) {
            double ev = org.ladderkin.units.PhysicalConstants.ELECTRONVOLT_J;
            throw new IllegalArgumentException(excitonsPerPhoton == 1
                    ? "energy conservation: the pump photon (" + short4(photonEnergyJ / ev) + " eV) is below the first "
                    + "exciton (" + short4(firstExcitonJ / ev) + " eV), ħω = " + short4(ratio) + "·E₁S: it makes no "
                    + "band-edge exciton of this model (allowed: ħω ≥ E₁S)"
                    : "energy conservation: " + excitonsPerPhoton + " excitons per photon need ħω ≥ " + excitonsPerPhoton
                    + "·E₁S = " + short4(excitonsPerPhoton * firstExcitonJ / ev) + " eV, the pump has "
                    + short4(photonEnergyJ / ev) + " eV (ħω = " + short4(ratio) + "·E₁S): carrier multiplication is "
                    + "impossible at this pump (allowed: ħω ≥ " + excitonsPerPhoton + "·E₁S, or no multiplication)");
        }
        return Math.max(0, photonEnergyJ - excitonsPerPhoton * firstExcitonJ);
    }

    /** Four significant digits without trailing zeros, for messages. */
    private static String short4(double x) {
        return new java.math.BigDecimal(x).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString();
    }

    /**
     * Temperature jump of one dot's lattice right after the energy has turned into heat, before any reaches the
     * surroundings: ΔT = Q / (ρ·c·V).
     *
     * @param dotDiameterM          dot diameter (m), sphere assumed
     * @param dotDensityKgPerM3     density of the dot material (kg/m³)
     * @param dotSpecificHeatJPerKgK specific heat of the dot material (J/(kg·K))
     */
    public static double dotTemperatureJumpK(double heatPerDotJ, double dotDiameterM, double dotDensityKgPerM3,
                                             double dotSpecificHeatJPerKgK) {
        ThermalMedium.positive(dotDiameterM, "dot diameter", "m");
        ThermalMedium.positive(dotDensityKgPerM3, "dot density", "kg/m³");
        ThermalMedium.positive(dotSpecificHeatJPerKgK, "dot specific heat", "J/(kg·K)");
        double volume = Math.PI / 6 * dotDiameterM * dotDiameterM * dotDiameterM;
        return heatPerDotJ / (dotDensityKgPerM3 * dotSpecificHeatJPerKgK * volume);
    }

    /**
     * Temperature rise of the excited volume of a solution after one pulse, once the heat has spread through the
     * solvent between the dots but not yet out of the beam: ΔT = (heat per unit volume) / (ρc of the solvent).
     *
     * @param heatPerDotJ          heat per dot per pulse (J)
     * @param dotsPerM3            dot number density (1/m³)
     */
    public static double perPulseVolumeRiseK(double heatPerDotJ, double dotsPerM3, ThermalMedium medium) {
        if (heatPerDotJ < 0 || dotsPerM3 < 0) {
            throw new IllegalArgumentException("heat per dot and dot density must be >= 0");
        }
        return heatPerDotJ * dotsPerM3 / medium.volumetricHeatCapacityJPerM3K();
    }

    /**
     * Steady-state temperature rise on the beam axis of a liquid sample heated by a Gaussian beam (1/e² radius w)
     * absorbed over a path L, with the heat leaving radially to a wall at distance R held at ambient temperature.
     * Solving the radial heat equation for the Gaussian source gives
     * ΔT = P/(4πκL)·Ein(2R²/w²), Ein(u) = ∫₀ᵘ (1 − e^{−s})/s ds = γ + ln u + E₁(u).
     *
     * @param absorbedPowerW average absorbed power that turns into heat (W)
     * @param beamRadiusM    1/e² intensity radius w (m)
     * @param pathLengthM    heated length L (m)
     * @param wallDistanceM  distance R from the beam axis to the cell wall (m), > w
     */
    public static double steadyRiseLiquidK(double absorbedPowerW, double beamRadiusM, double pathLengthM,
                                           double wallDistanceM, ThermalMedium medium) {
        ThermalMedium.positive(beamRadiusM, "beam radius", "m");
        ThermalMedium.positive(pathLengthM, "path length", "m");
        if (!(wallDistanceM > beamRadiusM)) {
            throw new IllegalArgumentException("wall distance must exceed the beam radius, was " + wallDistanceM + " m");
        }
        double u = 2 * wallDistanceM * wallDistanceM / (beamRadiusM * beamRadiusM);
        return absorbedPowerW / (4 * Math.PI * medium.conductivityWPerMK() * pathLengthM) * ein(u);
    }

    /**
     * Steady-state temperature rise at the centre of a Gaussian beam (1/e² radius w) absorbed in a thin film on a thick
     * substrate that conducts the heat away (semi-infinite body, surface source, no loss to air):
     * ΔT = P/(√(2π)·κ·w), from integrating the point-source kernel 1/(2πκr) over the Gaussian flux.
     */
    public static double steadyRiseFilmK(double absorbedPowerW, double beamRadiusM, ThermalMedium substrate) {
        ThermalMedium.positive(beamRadiusM, "beam radius", "m");
        return absorbedPowerW / (Math.sqrt(2 * Math.PI) * substrate.conductivityWPerMK() * beamRadiusM);
    }

    /**
     * Temperature rise of a liquid parcel crossing the beam in a flowing cell, when flow (not conduction) removes the
     * heat: the on-axis heating power density 2P/(πw²L) acts for the transit time 2w/v, so ΔT = 4P/(π·w·L·v·ρc).
     *
     * @param flowSpeedMPerS mean flow speed through the beam (m/s)
     */
    public static double flowRiseK(double absorbedPowerW, double beamRadiusM, double pathLengthM, double flowSpeedMPerS,
                                   ThermalMedium medium) {
        ThermalMedium.positive(beamRadiusM, "beam radius", "m");
        ThermalMedium.positive(pathLengthM, "path length", "m");
        ThermalMedium.positive(flowSpeedMPerS, "flow speed", "m/s");
        return 4 * absorbedPowerW / (Math.PI * beamRadiusM * pathLengthM * flowSpeedMPerS
                * medium.volumetricHeatCapacityJPerM3K());
    }

    /**
     * Verdict on a predicted temperature (ambient + rise) against the medium's boiling point and a user limit on the
     * rise: FAIL above the limit or within 10 K of boiling, WARN above half the limit.
     */
    public static Risk risk(String name, double riseK, double ambientK, double limitRiseK, ThermalMedium medium) {
        return risk(name, riseK, ambientK, limitRiseK, medium.boilingPointK());
    }

    /** As {@link #risk(String, double, double, double, ThermalMedium)} with the boiling point given (K, +∞ for films). */
    public static Risk risk(String name, double riseK, double ambientK, double limitRiseK, double boilingPointK) {
        if (Double.isNaN(riseK)) {
            return new Risk(name, Verdict.WARN, riseK, limitRiseK, "K", "heating unknown: give the sample's matrix (solvent or film)");
        }
        double peakK = ambientK + riseK;
        Verdict v = Verdict.against(riseK, limitRiseK, 0.5);
        String why = String.format(java.util.Locale.ROOT, "predicted rise %.3g K (limit %.3g K); sample at %.1f K, %s", riseK,
                limitRiseK, peakK, Double.isFinite(boilingPointK)
                        ? String.format(java.util.Locale.ROOT, "boiling point %.1f K", boilingPointK) : "a film (no boiling point)");
        if (peakK > boilingPointK - 10) {
            v = Verdict.FAIL;
            why += "; within 10 K of boiling: flammable solvent vapour and bubbles — lower the power or flow the sample";
        }
        return new Risk(name, v, riseK, limitRiseK, "K", why);
    }

    /** Ein(u) = ∫₀ᵘ (1 − e^{−s})/s ds, by its series for small u and γ + ln u + E₁(u) otherwise. */
    static double ein(double u) {
        if (u < 2) {
            double term = u;
            double sum = u;
            for (int k = 2; k < 60; k++) {
                term *= -u / k;
                sum += term / k;
            }
            return sum;
        }
        return 0.5772156649015329 + Math.log(u) + expintE1(u);
    }

    /** Exponential integral E₁(u) for u ≥ 2, by its continued fraction (Lentz). */
    static double expintE1(double u) {
        double b = u + 1;
        double c = 1 / Double.MIN_NORMAL;
        double d = 1 / b;
        double h = d;
        for (int i = 1; i < 200; i++) {
            double an = -(double) i * i;
            b += 2;
            d = 1 / (an * d + b);
            c = b + an / c;
            double del = c * d;
            h *= del;
            if (Math.abs(del - 1) < 1e-16) {
                break;
            }
        }
        return h * Math.exp(-u);
    }
}
