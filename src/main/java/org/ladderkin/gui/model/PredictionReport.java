package org.ladderkin.gui.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.observe.Risk;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.HtmlPage;

/**
 * The self-contained HTML page behind "Export Report": the plan's title and file, the cautions, the risks, the
 * derived numbers with their formulas and the charts — exactly what the planner shows for the last valid plan.
 */
public final class PredictionReport {

    private PredictionReport() {
    }

    /**
     * @param plan       the plan the prediction was computed for
     * @param planSource where the plan came from (file path, or "untitled plan")
     * @param prediction what the planner shows
     */
    public static String html(PlanInputs plan, String planSource, Prediction prediction) {
        HtmlPage page = new HtmlPage(plan.title());
        if (!plan.lab().isEmpty()) {
            page.paragraph(plan.lab());
        }
        page.block("summary", "Plan: " + planSource + ". Sample: " + plan.sample().spec().name() + " ("
                + plan.sample().material().key() + " in " + plan.sample().spec().matrix().map(m -> m.name()).orElse("no matrix given")
                + ").");
        page.block("note", "Basis of these numbers: " + prediction.basis() + ".");
        page.heading(2, "Safety");
        page.cautions(prediction.cautions());
        page.heading(2, "Risks");
        List<List<String>> rows = new ArrayList<>();
        for (Risk r : prediction.risks()) {
            rows.add(List.of(r.name(), number(r.value(), r.unit()), number(r.limit(), r.unit()), r.why(),
                    r.verdict().name()));
        }
        page.table(List.of("risk", "predicted", "limit", "what it means", "verdict"), rows);
        page.heading(2, "Derived numbers");
        List<List<String>> derived = new ArrayList<>();
        for (Prediction.DerivedNumber d : prediction.derived()) {
            derived.add(List.of(d.label(), d.value(), d.formula()));
        }
        page.table(List.of("quantity", "value", "formula and inputs"), derived);
        page.heading(2, "Charts");
        page.charts(prediction.charts(), 520, 340);
        return page.render();
    }

    private static String number(double v, String unit) {
        if ("fraction".equals(unit)) {
            return String.format(Locale.ROOT, "%.3g %%", v * 100);
        }
        return String.format(Locale.ROOT, "%.3g %s", v, unit).strip();
    }
}
