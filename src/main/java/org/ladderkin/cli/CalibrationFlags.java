package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.ladderkin.excite.Calibration;
import org.ladderkin.excite.OccupancyUncertainty;
import org.ladderkin.excite.RelativeBudget;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Option;

/** The calibration flags (how well energy, radii and σ are known) and how their ⟨N⟩ budget is printed. */
final class CalibrationFlags {

    @Option(names = "--energy-uncertainty", paramLabel = "REL", description = "relative standard uncertainty of the pulse "
            + "energy or power reading, e.g. 5%% (default 5 %%, common practice)")
    String energyUncertainty;

    @Option(names = "--radius-uncertainty", paramLabel = "REL", description = "relative standard uncertainty of the pump and "
            + "probe radii, e.g. 5%% (default 5 %%, common practice)")
    String radiusUncertainty;

    @Option(names = "--probe-radius-uncertainty", paramLabel = "REL", description = "relative uncertainty of the probe radius "
            + "when it differs from the pump's")
    String probeRadiusUncertainty;

    @Option(names = "--cross-section-uncertainty", paramLabel = "REL", description = "relative standard uncertainty of σ at "
            + "the pump, e.g. 20%% (default: σ's own, where the law or measurement states one)")
    String crossSectionUncertainty;

    Calibration calibration() {
        double radius = rel(radiusUncertainty, "--radius-uncertainty");
        double probe = probeRadiusUncertainty == null ? radius : rel(probeRadiusUncertainty, "--probe-radius-uncertainty");
        return new Calibration(rel(energyUncertainty, "--energy-uncertainty"), radius, probe,
                rel(crossSectionUncertainty, "--cross-section-uncertainty"));
    }

    /** A relative uncertainty written as "5%" or "0.05", or NaN when the flag is absent. */
    private static double rel(String text, String flag) {
        if (text == null) {
            return Double.NaN;
        }
        double v;
        try {
            v = Quantity.parseSi(text, Dimension.DIMENSIONLESS);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(flag + ": " + e.getMessage(), e);
        }
        if (!(v >= 0 && v < 1)) {
            throw new IllegalArgumentException(flag + ": must be a relative uncertainty from 0 to below 100 %, was " + text);
        }
        return v;
    }

    static ObjectNode json(OccupancyUncertainty.Result u) {
        ObjectNode node = ResolvedJson.object();
        node.put("nAvgProbeWeightedRel", u.nAvgProbeWeighted().totalRel());
        node.put("photonFluencePeakRel", u.photonFluencePeak().totalRel());
        var budget = node.putArray("budget");
        for (RelativeBudget.Item i : u.nAvgProbeWeighted().items()) {
            ObjectNode item = budget.addObject();
            item.put("source", i.source());
            item.put("rel", i.rel());
        }
        return node;
    }

    /** ⟨N⟩ ± and its largest contribution; σ's share is its own stated uncertainty unless a flag gives one. */
    static String line(double nAvgProbeWeighted, OccupancyUncertainty.Result u) {
        RelativeBudget n = u.nAvgProbeWeighted();
        return "         probe-weighted ⟨N⟩ " + SampleReport.num(nAvgProbeWeighted, 3) + " ± "
                + SampleReport.num(100 * n.totalRel(), 2) + " %"
                + n.dominant().map(d -> ", largest: " + d.source() + " (" + SampleReport.num(100 * d.rel(), 2) + " %)").orElse("")
                + "; peak photon fluence ± " + SampleReport.num(100 * u.photonFluencePeak().totalRel(), 2) + " %";
    }
}
