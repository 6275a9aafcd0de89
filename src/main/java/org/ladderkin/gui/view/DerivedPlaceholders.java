package org.ladderkin.gui.view;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;
import org.ladderkin.gui.model.Prediction;

/**
 * Which of the prediction's derived numbers stands in for which blank form field: the lifetimes from the volume law,
 * the diameter from the first-exciton peak, the concentration from the absorbance, σ at the pump. Numbers are found by
 * the words of their label, so a prediction that does not list one simply leaves that field without a placeholder.
 */
final class DerivedPlaceholders {

    /** One field and how to recognise the derived number that fills it. */
    private record Rule(String fieldPath, Predicate<String> label) {
    }

    private static final List<Rule> RULES = List.of(
            new Rule("model.singleExcitonLifetime", l -> l.contains("τ₁") || l.contains("single-exciton lifetime")),
            new Rule("model.biexcitonLifetime", l -> l.contains("τ₂") || l.contains("biexciton lifetime")),
            new Rule("sample.diameter", l -> l.contains("diameter") && !beam(l)),
            new Rule("sample.concentration", l -> l.contains("concentration")),
            new Rule("sample.crossSection.value", l -> l.contains("pump") && !beam(l)
                    && (l.contains("cross-section") || l.contains("σ"))));

    private DerivedPlaceholders() {
    }

    /** A beam's size (D4σ, spot diameter) is not the dots' diameter nor their cross-section. */
    private static boolean beam(String label) {
        return label.contains("beam") || label.contains("spot") || label.contains("d4σ") || label.contains("radius");
    }

    /** Placeholder texts by field path: the first derived number whose label matches each field's rule. */
    static Map<String, String> of(List<Prediction.DerivedNumber> derived) {
        Map<String, String> out = new LinkedHashMap<>();
        for (Rule rule : RULES) {
            for (Prediction.DerivedNumber n : derived) {
                if (rule.label().test(n.label().toLowerCase(Locale.ROOT))) {
                    out.put(rule.fieldPath(), n.value() + " (derived)");
                    break;
                }
            }
        }
        return out;
    }
}
