package org.ladderkin.kinetics.ensemble;

/** How the per-dot absorption cross-section and biexciton Auger rate depend on the dot diameter. */
public interface SizeScaling {

    /** Absorption cross-section (m²) of a dot of diameter {@code diameterM}. */
    double crossSectionM2(double diameterM);

    /** Biexciton Auger rate 1/τ₂ (1/s) of a dot of diameter {@code diameterM}. */
    double biexcitonAugerRatePerS(double diameterM);
}
