package org.ladderkin.sample;

import java.util.Objects;

/**
 * The absorption cross-section of one dot at one wavelength, with how it was obtained and how well it is known.
 *
 * @param crossSectionM2      σ (m²)
 * @param wavelengthM         where it holds (m)
 * @param basis               how it was obtained, in words (law, scaling, user value)
 * @param regime              which part of σ(λ) it comes from
 * @param relativeUncertainty relative standard uncertainty of σ (0.3 means ±30 %)
 * @param uncertaintySource   where that uncertainty comes from (a paper's scatter, or "common practice, no source")
 */
public record CrossSection(double crossSectionM2, double wavelengthM, String basis, Regime regime, double relativeUncertainty,
                           String uncertaintySource) {

    /** Where on the wavelength axis a value comes from, best supported first. */
    public enum Regime {
        /** The user's own cross-section at its wavelength. */
        USER,
        /** A law or user value carried to this wavelength by the user's measured absorption spectrum. */
        MEASURED,
        /** A published size law at the wavelength it was measured at. */
        HIGH_ENERGY_LAW,
        /** Far above the band edge: bulk optical constants with the local-field factor (size-independent per volume). */
        INTRINSIC,
        /** A published size law at the first-exciton peak. */
        FIRST_EXCITON,
        /** Between the intrinsic region and the first-exciton peak: interpolated, approximate. */
        INTERPOLATED,
        /** A value carried to a wavelength nothing covers, unchanged: approximate. */
        CARRIED
    }

    public CrossSection {
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(regime, "regime");
        Objects.requireNonNull(uncertaintySource, "uncertaintySource");
        if (!(crossSectionM2 > 0) || !Double.isFinite(crossSectionM2)) {
            throw new IllegalArgumentException("cross-section must be > 0, was " + crossSectionM2 * 1e4 + " cm²");
        }
        if (!(relativeUncertainty > 0) || !Double.isFinite(relativeUncertainty)) {
            throw new IllegalArgumentException("relative uncertainty must be > 0 and finite, was " + relativeUncertainty);
        }
    }

    /** Whether the value was carried or interpolated without a law or spectrum that holds here. */
    public boolean approximate() {
        return regime == Regime.INTERPOLATED || regime == Regime.CARRIED;
    }

    /** Molar decadic extinction (m²/mol) equivalent to this cross-section. */
    public double extinctionM2PerMol() {
        return org.ladderkin.material.AbsorptionLaw.extinctionM2PerMol(crossSectionM2);
    }
}
