package org.ladderkin.observe;

/**
 * Thermal properties of what surrounds the dots: the solvent, or the substrate under a film. All SI.
 *
 * @param densityKgPerM3          mass density (kg/m³)
 * @param specificHeatJPerKgK     specific heat at constant pressure (J/(kg·K))
 * @param conductivityWPerMK      thermal conductivity (W/(m·K))
 * @param boilingPointK           boiling point at 1 atm (K), or +∞ for a solid
 */
public record ThermalMedium(double densityKgPerM3, double specificHeatJPerKgK, double conductivityWPerMK,
                            double boilingPointK) {

    public ThermalMedium {
        positive(densityKgPerM3, "density", "kg/m³");
        positive(specificHeatJPerKgK, "specific heat", "J/(kg·K)");
        positive(conductivityWPerMK, "thermal conductivity", "W/(m·K)");
        if (!(boilingPointK > 0)) {
            throw new IllegalArgumentException("boiling point must be > 0 K, was " + boilingPointK + " K");
        }
    }

    /** Volumetric heat capacity ρ·c (J/(m³·K)). */
    public double volumetricHeatCapacityJPerM3K() {
        return densityKgPerM3 * specificHeatJPerKgK;
    }

    static void positive(double v, String what, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be > 0 and finite, was " + v + " " + unit);
        }
    }
}
