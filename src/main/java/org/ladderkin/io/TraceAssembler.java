package org.ladderkin.io;

import org.ladderkin.fit.Trace;
import org.ladderkin.fit.TraceMetadata;

/**
 * Turns one column's values into a {@link Trace}: drops missing points (counting them), and refuses columns that
 * cannot carry kinetics (all missing, constant, fewer than {@link #MIN_POINTS} points).
 */
final class TraceAssembler {

    /** Fewest points a trace may have: two points cannot distinguish a decay from a baseline offset. */
    static final int MIN_POINTS = 3;

    private TraceAssembler() {
    }

    /**
     * @param where  location of the column's header, for messages
     * @param field  the column's header, for messages
     * @param sigma  uncertainties or null; a point whose uncertainty is missing counts as missing
     */
    static Trace assemble(SourceLocation where, String field, String label, GrowableDoubles delaysS,
                          GrowableDoubles signal, GrowableDoubles sigma) {
        int n = delaysS.size();
        int present = 0;
        for (int i = 0; i < n; i++) {
            if (!Double.isNaN(signal.get(i)) && (sigma == null || !Double.isNaN(sigma.get(i)))) {
                present++;
            }
        }
        if (present == 0) {
            throw new InputException(where, field, InputProblem.EMPTY, "no numeric values in this column (all " + n + " are missing)");
        }
        if (present < MIN_POINTS) {
            throw new InputException(where, field, InputProblem.EMPTY, "only " + present + " numeric value" + (present == 1 ? "" : "s")
                    + " in this column (a trace needs at least " + MIN_POINTS + ")");
        }
        double[] t = new double[present];
        double[] y = new double[present];
        double[] s = sigma == null ? null : new double[present];
        int k = 0;
        for (int i = 0; i < n; i++) {
            double v = signal.get(i);
            double e = sigma == null ? 1 : sigma.get(i);
            if (Double.isNaN(v) || Double.isNaN(e)) {
                continue;
            }
            if (s != null && !(e > 0)) {
                throw new InputException(where, field, InputProblem.OUT_OF_RANGE, "uncertainty " + e + " at delay " + delaysS.get(i)
                        + " s is not > 0 (uncertainties must be positive)");
            }
            t[k] = delaysS.get(i);
            y[k] = v;
            if (s != null) {
                s[k] = e;
            }
            k++;
        }
        boolean constant = true;
        for (int i = 1; i < present && constant; i++) {
            constant = y[i] == y[0];
        }
        if (constant) {
            throw new InputException(where, field, InputProblem.INVALID_VALUE, "all " + present + " values equal " + y[0]
                    + " (a constant column carries no kinetics: wrong column, or a detector that was off?)");
        }
        return new Trace(t, y, s, TraceMetadata.labelled(label), n - present);
    }
}
