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
 */
public record Prediction(List<ChartSpec> charts, List<Risk> risks, List<DerivedNumber> derived, List<String> cautions,
                         String basis) {

    public Prediction {
        charts = List.copyOf(charts);
        risks = List.copyOf(risks);
        derived = List.copyOf(derived);
        cautions = List.copyOf(cautions);
        Objects.requireNonNull(basis, "basis");
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
