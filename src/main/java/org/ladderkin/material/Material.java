package org.ladderkin.material;

import java.util.Objects;
import java.util.Optional;

/**
 * A semiconductor as the library describes it: bulk constants, the empirical sizing curve, size laws for the absorption
 * cross-section, and typical decay constants, each with its source. Immutable; unknown values are
 * {@link Sourced#unknown(String)}, never invented.
 *
 * @param key                     library key, e.g. "CdSe" (the file name without .json)
 * @param name                    full name, e.g. "cadmium selenide"
 * @param shape                   what the size of a dot means (sphere diameter or cube edge)
 * @param bulkGapJ                bulk band gap at room temperature (J)
 * @param molarMassKgPerMol       molar mass of the formula unit (kg/mol)
 * @param densityKgPerM3          bulk density (kg/m³)
 * @param specificHeatJPerKgK     specific heat near 298 K (J/(kg·K))
 * @param refractiveIndex         bulk refractive index (dimensionless; the source says at which wavelength)
 * @param electronDegeneracy      degeneracy of the lowest electron level, spin included
 * @param holeDegeneracy          degeneracy of the highest hole level, spin included
 * @param sizing                  first-exciton peak versus size, if one is published
 * @param firstExcitonAbsorption  cross-section law at the first-exciton peak, if one is published
 * @param highEnergyAbsorption    cross-section law at a fixed high-energy reference wavelength, if one is published
 * @param opticalConstants        bulk n and k well above the band edge, if the library has them (σ's wavelength shape)
 * @param augerVolumeConstantSPerM3 biexciton Auger lifetime per unit dot volume, τ₂ = C·V (s/m³)
 * @param singleExcitonLifetimeS  typical single-exciton lifetime (s)
 * @param trionLifetimeS          typical (negative) trion lifetime (s)
 * @param notes                   free text shown with the material (e.g. why a curve is missing)
 */
public record Material(String key, String name, Shape shape, Sourced bulkGapJ, Sourced molarMassKgPerMol,
                       Sourced densityKgPerM3, Sourced specificHeatJPerKgK, Sourced refractiveIndex,
                       Sourced electronDegeneracy, Sourced holeDegeneracy, Optional<SizingCurve> sizing,
                       Optional<AbsorptionLaw> firstExcitonAbsorption, Optional<AbsorptionLaw> highEnergyAbsorption,
                       Optional<OpticalConstants> opticalConstants, Sourced augerVolumeConstantSPerM3, Sourced singleExcitonLifetimeS, Sourced trionLifetimeS,
                       String notes) {

    public Material {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(shape, "shape");
        Objects.requireNonNull(sizing, "sizing");
        Objects.requireNonNull(firstExcitonAbsorption, "firstExcitonAbsorption");
        Objects.requireNonNull(highEnergyAbsorption, "highEnergyAbsorption");
        Objects.requireNonNull(opticalConstants, "opticalConstants");
        Objects.requireNonNull(notes, "notes");
        requirePositiveIfKnown(bulkGapJ, "bulk gap", "J");
        requirePositiveIfKnown(molarMassKgPerMol, "molar mass", "kg/mol");
        requirePositiveIfKnown(densityKgPerM3, "density", "kg/m³");
        requirePositiveIfKnown(specificHeatJPerKgK, "specific heat", "J/(kg·K)");
        requirePositiveIfKnown(refractiveIndex, "refractive index", "");
        requirePositiveIfKnown(electronDegeneracy, "electron degeneracy", "");
        requirePositiveIfKnown(holeDegeneracy, "hole degeneracy", "");
        requirePositiveIfKnown(augerVolumeConstantSPerM3, "Auger volume constant", "s/m³");
        requirePositiveIfKnown(singleExcitonLifetimeS, "single-exciton lifetime", "s");
        requirePositiveIfKnown(trionLifetimeS, "trion lifetime", "s");
        if (firstExcitonAbsorption.isPresent() && !firstExcitonAbsorption.get().atFirstExciton()) {
            throw new IllegalArgumentException("the first-exciton absorption law must not name a fixed wavelength");
        }
        if (highEnergyAbsorption.isPresent() && highEnergyAbsorption.get().atFirstExciton()) {
            throw new IllegalArgumentException("the high-energy absorption law needs its reference wavelength");
        }
    }

    private static void requirePositiveIfKnown(Sourced s, String what, String unit) {
        Objects.requireNonNull(s, what);
        if (s.known() && !(s.value() > 0)) {
            throw new IllegalArgumentException(what + " must be > 0, was " + s.value() + (unit.isEmpty() ? "" : " " + unit));
        }
    }

    /** Volume (m³) of one dot of size {@code sizeM} (diameter, or edge for cubes). */
    public double volumeM3(double sizeM) {
        return shape.volumeM3(sizeM);
    }

    /** Typical biexciton Auger lifetime (s) of a dot of size {@code sizeM}, or NaN when the constant is unknown. */
    public double biexcitonAugerLifetimeS(double sizeM) {
        return augerVolumeConstantSPerM3.value() * volumeM3(sizeM);
    }
}
