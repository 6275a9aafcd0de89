package org.ladderkin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The safety cautions every report and the desktop planner show. They are general reminders, not a risk assessment:
 * each defers to the institution's laser safety officer, local rules and licensed practice.
 */
public final class Cautions {

    /** Solvents whose vapour burns (flash point below room temperature or near it). */
    private static final Set<String> FLAMMABLE = Set.of("toluene", "hexane", "n-hexane", "heptane", "octane", "n-octane",
            "cyclohexane", "ethanol", "methanol", "acetone", "tetrahydrofuran", "thf");

    /** Peak fluence of one pulse from which the high-fluence caution shows (J/m², = 1 mJ/cm²): this project's threshold, not a standard (no source). */
    public static final double HIGH_FLUENCE_J_PER_M2 = 10;
    /** Steady-state temperature rise from which the hot-sample caution shows (K): this project's threshold, not a standard (no source). */
    public static final double HOT_RISE_K = 10;
    /** Margin to the boiling point within which the hot-sample caution shows whatever the rise (K): this project's threshold (no source). */
    public static final double BOILING_MARGIN_K = 20;

    public static final String LASER = "Laser hazard: ultrafast pump-probe sources are Class 4 lasers. Direct and "
            + "scattered beams can cause permanent eye injury and skin burns and can ignite materials. Wear eyewear rated "
            + "for every wavelength in use (including harmonics and OPA outputs), enclose beam paths, and follow your "
            + "institution's laser safety officer and local rules; ladderkin's numbers do not replace that assessment.";

    public static final String HEAVY_METALS = "Toxic materials: cadmium and lead compounds (CdSe, CdS, CdTe, PbS, PbSe, "
            + "lead-halide perovskites) are toxic and some are carcinogenic. Handle nanocrystal solutions and films with "
            + "gloves in a fume hood, avoid aerosols and dust, and dispose of waste as hazardous following your "
            + "institution's chemical-safety rules and local law.";

    private Cautions() {
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

    /** Caution about heating a flammable solvent with the pump, with the predicted steady-state rise. */
    public static String solventHeating(String matrix, double riseK, double boilingPointK) {
        return String.format(Locale.ROOT, "Flammable solvent: %s boils at %.0f °C and its vapour can ignite. The pump is "
                + "predicted to raise the sample temperature by %.2g K in the steady state; an absorbing spot can heat "
                + "locally beyond this estimate. Keep open flames and hot surfaces away, keep cells closed, and follow "
                + "your institution's fire-safety rules.", matrix, boilingPointK - 273.15, riseK);
    }

    /** Caution for a strong pump: the highest pulse's peak fluence at the sample. */
    public static String highFluence(double peakFluenceJPerM2) {
        return String.format(Locale.ROOT, "High pump fluence: the strongest pulse of the series reaches %.2g mJ/cm² at the "
                + "beam centre. At such fluences films and cell windows can be damaged, and reflections from the cell carry "
                + "a hazardous share of the beam. Block and dump every reflection, check the sample for damage between "
                + "series, and follow the advice of your institution's laser safety officer.", peakFluenceJPerM2 * 0.1);
    }

    /** Caution for a sample the pump heats strongly or close to its solvent's boiling point. */
    public static String hotSample(double riseK, double sampleK, double boilingPointK) {
        String boiling = Double.isFinite(boilingPointK)
                ? String.format(Locale.ROOT, "; the solvent boils at %.0f °C", boilingPointK - 273.15) : "";
        return String.format(Locale.ROOT, "Hot sample: the pump is predicted to raise the excited volume by %.2g K in the "
                + "steady state, to about %.0f °C%s. Hot samples degrade, outgas and can boil in the beam, and hot cells "
                + "burn. Lower the average power (rate, pulse picker, larger spot) or flow the sample, and follow your "
                + "institution's safety rules.", riseK, sampleK + riseK - 273.15, boiling);
    }

    /**
     * Every caution that applies to a campaign.
     *
     * @param steadyRiseK       predicted steady-state rise of the excited volume (K; NaN when unknown)
     * @param sampleK           sample temperature before the pump (K)
     * @param boilingPointK     the solvent's boiling point (K; infinite for films or when unknown)
     * @param peakFluenceJPerM2 peak fluence of the strongest pulse of the series (J/m²)
     */
    public static List<String> forCampaign(String material, String matrix, double steadyRiseK, double sampleK,
                                           double boilingPointK, double peakFluenceJPerM2) {
        List<String> out = new ArrayList<>();
        out.add(LASER);
        if (peakFluenceJPerM2 >= HIGH_FLUENCE_J_PER_M2) {
            out.add(highFluence(peakFluenceJPerM2));
        }
        if (steadyRiseK >= HOT_RISE_K || sampleK + steadyRiseK >= boilingPointK - BOILING_MARGIN_K) {
            out.add(hotSample(steadyRiseK, sampleK, boilingPointK));
        }
        if (flammable(matrix)) {
            out.add(solventHeating(matrix, steadyRiseK, boilingPointK));
        }
        if (heavyMetal(material)) {
            out.add(HEAVY_METALS);
        }
        return List.copyOf(out);
    }
}
