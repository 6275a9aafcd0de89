package org.ladderkin.report;

import java.util.List;
import java.util.Locale;
import org.ladderkin.plan.Caution;

/**
 * The wording of the safety cautions that {@code plan} decides, as every report and the desktop planner show them.
 * They are general reminders, not a risk assessment: each defers to the institution's laser safety officer, local rules
 * and licensed practice.
 */
public final class Cautions {

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

    /** The text of one caution. */
    public static String text(Caution caution) {
        if (caution instanceof Caution.Laser) {
            return LASER;
        }
        if (caution instanceof Caution.HighFluence c) {
            return highFluence(c.peakFluenceJPerM2());
        }
        if (caution instanceof Caution.HotSample c) {
            return hotSample(c.riseK(), c.sampleK(), c.boilingPointK());
        }
        if (caution instanceof Caution.FlammableSolvent c) {
            return solventHeating(c.matrix(), c.riseK(), c.boilingPointK());
        }
        if (caution instanceof Caution.HeavyMetals) {
            return HEAVY_METALS;
        }
        throw new IllegalArgumentException("no wording for " + caution);
    }

    /** The texts of several cautions, in their order. */
    public static List<String> texts(List<Caution> cautions) {
        return cautions.stream().map(Cautions::text).toList();
    }
}
