package org.ladderkin.material;

import java.util.Objects;
import org.ladderkin.units.PhysicalConstants;

/**
 * A size law for the absorption cross-section of one dot, in the form it is published:
 * σ = σ₁·(x/x₁)^p where x is the dot's diameter, radius or cube edge measured in the unit x₁.
 * Laws published as a molar decadic extinction ε are stored as σ through σ = ln(10)·ε/N_A (Beer–Lambert),
 * so that σ[cm²] = 3.8235e-21·ε[M⁻¹cm⁻¹].
 *
 * @param wavelengthM      wavelength the law holds at (m), or NaN for "at the first-exciton peak"
 * @param coefficientM2    σ₁: the cross-section of a dot with x = x₁ (m²)
 * @param length           which length x is
 * @param lengthUnitM      x₁ (m): the unit the published law measures x in
 * @param exponent         p
 * @param publishedAsExtinction whether the paper gives ε (so it is shown back as ε)
 * @param source           where the law comes from
 * @param relativeUncertainty relative standard uncertainty of a value from this law, with where that figure comes from
 */
public record AbsorptionLaw(double wavelengthM, double coefficientM2, Length length, double lengthUnitM, double exponent,
                            boolean publishedAsExtinction, String source, Sourced relativeUncertainty) {

    /** Relative uncertainty used for a law whose file states none. */
    public static final Sourced DEFAULT_UNCERTAINTY = new Sourced(0.3,
            "common practice, no source: 30 % for a size law whose file states no scatter");

    /** Which length of the dot the law is written in. */
    public enum Length {
        DIAMETER, RADIUS, EDGE;

        /** The length of this kind for a dot of "size" {@code sizeM} (diameter of a sphere, edge of a cube). */
        double of(double sizeM) {
            return this == RADIUS ? sizeM / 2 : sizeM;
        }
    }

    /** Converts a molar decadic extinction coefficient (m²/mol) to a cross-section (m²): σ = ln(10)·ε/N_A. */
    public static double crossSectionM2(double extinctionM2PerMol) {
        return Math.log(10) * extinctionM2PerMol / PhysicalConstants.AVOGADRO_PER_MOL;
    }

    /** Converts a cross-section (m²) to a molar decadic extinction coefficient (m²/mol). */
    public static double extinctionM2PerMol(double crossSectionM2) {
        return crossSectionM2 * PhysicalConstants.AVOGADRO_PER_MOL / Math.log(10);
    }

    public AbsorptionLaw {
        Objects.requireNonNull(length, "length");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(relativeUncertainty, "relativeUncertainty");
        if (!relativeUncertainty.known() || !(relativeUncertainty.value() > 0)) {
            throw new IllegalArgumentException("a law's relative uncertainty must be known and > 0, was " + relativeUncertainty.value());
        }
        if (!(coefficientM2 > 0) || !Double.isFinite(coefficientM2)) {
            throw new IllegalArgumentException("absorption law coefficient must be > 0, was " + coefficientM2 + " m²");
        }
        if (!(lengthUnitM > 0)) {
            throw new IllegalArgumentException("length unit must be > 0, was " + lengthUnitM + " m");
        }
        if (!(exponent > 0) || exponent > 6) {
            throw new IllegalArgumentException("size exponent must be in (0, 6], was " + exponent);
        }
        if (!Double.isNaN(wavelengthM) && !(wavelengthM > 0)) {
            throw new IllegalArgumentException("wavelength must be > 0 or NaN (first exciton), was " + wavelengthM + " m");
        }
    }

    /** A law without a stated uncertainty: {@link #DEFAULT_UNCERTAINTY}. */
    public AbsorptionLaw(double wavelengthM, double coefficientM2, Length length, double lengthUnitM, double exponent,
                         boolean publishedAsExtinction, String source) {
        this(wavelengthM, coefficientM2, length, lengthUnitM, exponent, publishedAsExtinction, source, DEFAULT_UNCERTAINTY);
    }

    /** Whether the law holds at the first-exciton peak rather than at a fixed wavelength. */
    public boolean atFirstExciton() {
        return Double.isNaN(wavelengthM);
    }

    /** Cross-section (m²) of a dot of size {@code sizeM} (diameter, or cube edge). */
    public double crossSectionM2At(double sizeM) {
        if (!(sizeM > 0)) {
            throw new IllegalArgumentException("dot size must be > 0, was " + sizeM * 1e9 + " nm");
        }
        return coefficientM2 * Math.pow(length.of(sizeM) / lengthUnitM, exponent);
    }

    /** Molar decadic extinction (m²/mol) of a dot of size {@code sizeM}. */
    public double extinctionM2PerMolAt(double sizeM) {
        return extinctionM2PerMol(crossSectionM2At(sizeM));
    }
}
