package org.ladderkin.kinetics.ensemble;

/**
 * The default size law: σ ∝ d³ (absorption far above the gap scales with volume) and τ₂ ∝ d³ (volume scaling of
 * Auger lifetimes, Klimov et al., Science 287, 1011 (2000), as recalled), anchored at a reference diameter. Material
 * laws can replace it through {@link SizeScaling}.
 *
 * @param referenceDiameterM diameter at which the reference values hold (m)
 * @param referenceCrossSectionM2 σ at the reference diameter (m²)
 * @param referenceAugerRatePerS 1/τ₂ at the reference diameter (1/s)
 */
public record VolumeScaling(double referenceDiameterM, double referenceCrossSectionM2, double referenceAugerRatePerS)
        implements SizeScaling {

    public VolumeScaling {
        if (!(referenceDiameterM > 0) || !(referenceCrossSectionM2 > 0) || !(referenceAugerRatePerS > 0)) {
            throw new IllegalArgumentException("volume scaling needs a diameter > 0 m, σ > 0 m² and 1/τ₂ > 0 1/s; were "
                    + referenceDiameterM + ", " + referenceCrossSectionM2 + ", " + referenceAugerRatePerS);
        }
    }

    @Override
    public double crossSectionM2(double diameterM) {
        double r = diameterM / referenceDiameterM;
        return referenceCrossSectionM2 * r * r * r;
    }

    @Override
    public double biexcitonAugerRatePerS(double diameterM) {
        double r = diameterM / referenceDiameterM;
        return referenceAugerRatePerS / (r * r * r);
    }
}
