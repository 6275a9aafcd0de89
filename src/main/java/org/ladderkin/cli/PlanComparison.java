package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.units.Rounded;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.DesignSearch;
import org.ladderkin.plan.Planner;

/** What the plan assumed and predicted next to what the fit found: τ₂, τ₁, the precision of τ₂ and σ, and ⟨N⟩. */
record PlanComparison(List<List<String>> rows, ObjectNode json) {

    static PlanComparison of(Path planFile, LadderFit.Outcome outcome) {
        CampaignPlan plan = Planner.plan(PlanCodec.read(planFile), Planner.Progress.NONE);
        FitResult r = outcome.result();
        List<List<String>> rows = new ArrayList<>();
        ObjectNode json = ResolvedJson.object();
        json.put("planFile", planFile.toString());
        r.find("tauAuger2S", -1).ifPresent(e -> {
            rows.add(List.of("τ₂ (ps)", num(plan.model().tauBiexcitonS() * 1e12), Rounded.pm(e.value() * 1e12, e.stdError() * 1e12),
                    "ratio fit/plan " + num(e.value() / plan.model().tauBiexcitonS())));
            json.put("tauAuger2PsPlanned", plan.model().tauBiexcitonS() * 1e12);
            json.put("tauAuger2PsFitted", e.value() * 1e12);
        });
        r.find("tauRadS", -1).ifPresent(e -> {
            rows.add(List.of("τ₁ / τ_rad (ns)", num(plan.model().tauSingleExcitonS() * 1e9), e.fixed()
                    ? num(e.value() * 1e9) + " (fixed)" : Rounded.pm(e.value() * 1e9, e.stdError() * 1e9), "the plan's τ₁ includes non-radiative decay"));
            json.put("tauSingleNsPlanned", plan.model().tauSingleExcitonS() * 1e9);
        });
        if (plan.design() != null) {
            DesignSearch.Design d = plan.design().best();
            relative(rows, json, r, "tauAuger2S", "relative error of τ₂", d, DesignSearch.Parameter.TAU_BIEXCITON, "tauAuger2");
            relative(rows, json, r, outcome.scaleKey(), "relative error of σ (scale)", d, DesignSearch.Parameter.CROSS_SECTION, "scale");
        }
        ArrayNode n = json.putArray("nAvg");
        if (plan.fluences().size() == outcome.meanN().length) {
            for (int i = 0; i < outcome.meanN().length; i++) {
                double planned = plan.fluences().get(i).nProbeAveraged();
                rows.add(List.of("⟨N⟩ of trace " + (i + 1), num(planned), num(outcome.meanN()[i]), "probe-averaged in the plan"));
                ObjectNode o = n.addObject();
                o.put("planned", planned);
                o.put("fitted", outcome.meanN()[i]);
            }
        } else {
            rows.add(List.of("⟨N⟩ series", plan.fluences().size() + " points", outcome.meanN().length + " traces",
                    "different counts: not compared point by point"));
        }
        return new PlanComparison(rows, json);
    }

    private static void relative(List<List<String>> rows, ObjectNode json, FitResult r, String key, String label,
                                 DesignSearch.Design d, DesignSearch.Parameter which, String jsonKey) {
        if (!Double.isFinite(d.error(which)) || !(d.error(which) > 0)) {
            return;
        }
        r.find(key, -1).filter(e -> !e.fixed()).ifPresent((ParameterEstimate e) -> {
            double fitted = e.stdError() / e.value();
            rows.add(List.of(label, num(100 * d.error(which)) + " %", num(100 * fitted) + " %",
                    "the plan's figure assumes its own noise level and time budget"));
            json.put(jsonKey + "RelativeErrorPlanned", d.error(which));
            json.put(jsonKey + "RelativeErrorFitted", fitted);
        });
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.3g", v) : "unavailable";
    }
}
