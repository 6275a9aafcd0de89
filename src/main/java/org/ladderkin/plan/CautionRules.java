package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/** Which safety cautions apply to a campaign, and from which thresholds. */
public final class CautionRules {

    /** Solvents whose vapour burns (flash point below room temperature or near it). */
    private static final Set<String> FLAMMABLE = Set.of("toluene", "hexane", "n-hexane", "heptane", "octane", "n-octane",
            "cyclohexane", "ethanol", "methanol", "acetone", "tetrahydrofuran", "thf");

    /** Peak fluence of one pulse from which the high-fluence caution shows (J/m², = 1 mJ/cm²): this project's threshold, not a standard (no source). */
    public static final double HIGH_FLUENCE_J_PER_M2 = 10;
    /** Steady-state temperature rise from which the hot-sample caution shows (K): this project's threshold, not a standard (no source). */
    public static final double HOT_RISE_K = 10;
    /** Margin to the boiling point within which the hot-sample caution shows whatever the rise (K): this project's threshold (no source). */
    public static final double BOILING_MARGIN_K = 20;

    private CautionRules() {
    }

    /** Whether a matrix (solvent) name is a flammable organic solvent. */
    public static boolean flammable(String matrix) {
        return FLAMMABLE.contains(matrix.toLowerCase(Locale.ROOT).strip());
    }

    /** Whether a material name contains cadmium or lead. */
    public static boolean heavyMetal(String material) {
        String m = material.toLowerCase(Locale.ROOT);
        return m.contains("cd") || m.contains("pb");
    }

    /**
     * Every caution that applies to a campaign, the laser caution first.
     *
     * @param steadyRiseK       predicted steady-state rise of the excited volume (K; NaN when unknown)
     * @param sampleK           sample temperature before the pump (K)
     * @param boilingPointK     the solvent's boiling point (K; infinite for films or when unknown)
     * @param peakFluenceJPerM2 peak fluence of the strongest pulse of the series (J/m²)
     */
    public static List<Caution> forCampaign(String material, String matrix, double steadyRiseK, double sampleK,
                                            double boilingPointK, double peakFluenceJPerM2) {
        List<Caution> out = new ArrayList<>();
        out.add(new Caution.Laser());
        if (peakFluenceJPerM2 >= HIGH_FLUENCE_J_PER_M2) {
            out.add(new Caution.HighFluence(peakFluenceJPerM2));
        }
        if (steadyRiseK >= HOT_RISE_K || sampleK + steadyRiseK >= boilingPointK - BOILING_MARGIN_K) {
            out.add(new Caution.HotSample(steadyRiseK, sampleK, boilingPointK));
        }
        if (flammable(matrix)) {
            out.add(new Caution.FlammableSolvent(matrix, steadyRiseK, boilingPointK));
        }
        if (heavyMetal(material)) {
            out.add(new Caution.HeavyMetals());
        }
        return List.copyOf(out);
    }
}
