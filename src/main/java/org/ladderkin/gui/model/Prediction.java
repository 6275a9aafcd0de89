package org.ladderkin.gui.model;

import java.util.List;
import java.util.Objects;
import org.ladderkin.observe.Risk;
import org.ladderkin.report.ChartSpec;

/**
 * Everything the planner shows for one plan: charts (as data, so export writes exactly what is drawn), risks, derived
 * numbers with their formulas, the safety cautions that apply, and a line saying what produced it.
 *
 * @param charts   named charts, in display order
 * @param risks    pass / warn / fail rows
 * @param derived  numbers derived from the plan, each with the formula behind it
 * @param cautions safety cautions to keep visible
 * @param basis    one line: what this prediction is based on (and what it leaves out)
 * @param designed whether it is the full plan's (the designed series, the report's numbers) rather than the quick
 *                 preview on a log-spaced series
 */
public record Prediction(List<ChartSpec> charts, List<Risk> risks, List<DerivedNumber> derived, List<String> cautions,
                         String basis, boolean designed) {

    public Prediction {
        charts = List.copyOf(charts);
        risks = List.copyOf(risks);
        derived = List.copyOf(derived);
        cautions = List.copyOf(cautions);
        Objects.requireNonNull(basis, "basis");
    }

    /** A preview prediction (not the designed series). */
    public Prediction(List<ChartSpec> charts, List<Risk> risks, List<DerivedNumber> derived, List<String> cautions,
                      String basis) {
        this(charts, risks, derived, cautions, basis, false);
    }

    /**
     * A number derived from the plan, shown with the formula behind it.
     *
     * @param label   what it is
     * @param value   formatted with its unit
     * @param formula the formula and the symbols' values, for the tooltip
     */
    public record DerivedNumber(String label, String value, String formula) {
        public DerivedNumber {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(value, "value");
            Objects.requireNonNull(formula, "formula");
        }
    }
}
