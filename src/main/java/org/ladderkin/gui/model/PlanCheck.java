package org.ladderkin.gui.model;

import com.fasterxml.jackson.databind.JsonNode;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.io.json.Node;
import org.ladderkin.io.json.SourcePositions;
import org.ladderkin.plan.PlanInputs;

/**
 * The outcome of reading the current document with the same reader the command line uses: either the plan or the
 * first problem, with the dotted path of the field it concerns (null when it concerns no single field).
 *
 * @param inputs   the plan, or null when the document has a problem
 * @param location where the problem is: file, line and column for a value as read from the file; the file alone for
 *                 a value edited since (it has no line yet), or null when the plan is valid
 * @param field    path of the offending field, or null
 * @param key      what kind of problem, or null when the plan is valid
 * @param problem  what is wrong, or null when the plan is valid
 */
public record PlanCheck(PlanInputs inputs, SourceLocation location, String field, InputProblem key, String problem) {

    /** Whether the document reads as a plan. */
    public boolean valid() {
        return inputs != null;
    }

    /**
     * Reads the document tree itself with {@link PlanCodec}: no text is written or parsed, so the check after every
     * keystroke costs only the reading. Values the editor changed since the file was read have no position in
     * {@code positions}; a problem with one names the field and the file without a line.
     *
     * @param document    the plan document
     * @param positions   where its values stood in the file it was read from
     * @param displayName names the document in messages; also the base of relative data-file paths
     */
    public static PlanCheck of(JsonNode document, SourcePositions positions, String displayName) {
        try {
            return new PlanCheck(PlanCodec.read(Node.of(document, positions, displayName)), null, null, null, null);
        } catch (InputException e) {
            return new PlanCheck(null, e.location(), e.field(), e.key(), e.problem());
        } catch (IllegalArgumentException e) {
            // A record constructor refused a combination of values the reader let through.
            return new PlanCheck(null, SourceLocation.of(displayName), null, InputProblem.INVALID_VALUE,
                    e.getMessage());
        }
    }
}
