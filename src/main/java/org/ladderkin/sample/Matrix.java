package org.ladderkin.sample;

import java.util.Objects;
import org.ladderkin.material.Sourced;

/**
 * The host the dots sit in: a solvent or a solid film. Its thermal constants decide how much a pulse train heats the
 * excited volume; the boiling point (solvents) bounds what heating is tolerable.
 *
 * @param key                       library key, e.g. "toluene"
 * @param name                      name shown to users
 * @param kind                      solvent or film
 * @param densityKgPerM3            density near 298 K (kg/m³)
 * @param specificHeatJPerKgK       specific heat near 298 K (J/(kg·K))
 * @param thermalConductivityWPerMK thermal conductivity near 298 K (W/(m·K))
 * @param boilingPointK             normal boiling point (K); unknown for films
 */
public record Matrix(String key, String name, Kind kind, Sourced densityKgPerM3, Sourced specificHeatJPerKgK,
                     Sourced thermalConductivityWPerMK, Sourced boilingPointK) {

    /** Solvent or solid host. */
    public enum Kind { SOLVENT, FILM }

    public Matrix {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        requirePositive(densityKgPerM3, "matrix density", "kg/m³");
        requirePositive(specificHeatJPerKgK, "matrix specific heat", "J/(kg·K)");
        requirePositive(thermalConductivityWPerMK, "matrix thermal conductivity", "W/(m·K)");
        Objects.requireNonNull(boilingPointK, "boilingPointK");
        if (kind == Kind.SOLVENT && !boilingPointK.known()) {
            throw new IllegalArgumentException("a solvent needs its boiling point");
        }
        if (boilingPointK.known() && !(boilingPointK.value() > 0)) {
            throw new IllegalArgumentException("boiling point must be > 0 K, was " + boilingPointK.value() + " K");
        }
    }

    private static void requirePositive(Sourced s, String what, String unit) {
        Objects.requireNonNull(s, what);
        if (!s.known() || !(s.value() > 0)) {
            throw new IllegalArgumentException(what + " must be known and > 0, was " + s.value() + " " + unit);
        }
    }

    /** Volumetric heat capacity ρ·c (J/(m³·K)). */
    public double volumetricHeatCapacityJPerM3K() {
        return densityKgPerM3.value() * specificHeatJPerKgK.value();
    }
}
