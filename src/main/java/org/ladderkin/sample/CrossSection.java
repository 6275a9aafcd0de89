package org.ladderkin.sample;

/**
 * The absorption cross-section of one dot at one wavelength, with how it was obtained.
 *
 * @param crossSectionM2 σ (m²)
 * @param wavelengthM    where it holds (m)
 * @param basis          how it was obtained, in words (law, scaling, user value)
 * @param approximate    true when it was carried to this wavelength without a spectrum
 */
public record CrossSection(double crossSectionM2, double wavelengthM, String basis, boolean approximate) {

    public CrossSection {
        if (!(crossSectionM2 > 0) || !Double.isFinite(crossSectionM2)) {
            throw new IllegalArgumentException("cross-section must be > 0, was " + crossSectionM2 * 1e4 + " cm²");
        }
    }

    /** Molar decadic extinction (m²/mol) equivalent to this cross-section. */
    public double extinctionM2PerMol() {
        return org.ladderkin.material.AbsorptionLaw.extinctionM2PerMol(crossSectionM2);
    }
}
