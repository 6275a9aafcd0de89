package org.ladderkin.gui.model;

import org.ladderkin.io.InputException;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.plan.PlanInputs;

/**
 * The outcome of reading the current document with the same reader the command line uses: either the plan or the
 * first problem, with the dotted path of the field it concerns (null when it concerns no single field).
 *
 * @param inputs  the plan, or null when the document has a problem
 * @param field   path of the offending field, or null
 * @param problem what is wrong, or null when the plan is valid
 */
public record PlanCheck(PlanInputs inputs, String field, String problem) {

    /** Whether the document reads as a plan. */
    public boolean valid() {
        return inputs != null;
    }

    /** Reads {@code jsonText} with {@link PlanCodec}; {@code displayName} names the document in messages. */
    public static PlanCheck of(String jsonText, String displayName) {
        try {
            return new PlanCheck(PlanCodec.read(JsonTree.parse(jsonText, displayName)), null, null);
        } catch (InputException e) {
            return new PlanCheck(null, e.field(), e.problem());
        } catch (IllegalArgumentException e) {
            // A record constructor refused a combination of values the reader let through.
            return new PlanCheck(null, null, e.getMessage());
        }
    }
}
