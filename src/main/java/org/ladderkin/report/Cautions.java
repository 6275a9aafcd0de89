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

    /** Every caution that applies to a campaign. */
    public static List<String> forCampaign(String material, String matrix, double steadyRiseK, double boilingPointK) {
        List<String> out = new ArrayList<>();
        out.add(LASER);
        if (flammable(matrix)) {
            out.add(solventHeating(matrix, steadyRiseK, boilingPointK));
        }
        if (heavyMetal(material)) {
            out.add(HEAVY_METALS);
        }
        return List.copyOf(out);
    }
}
