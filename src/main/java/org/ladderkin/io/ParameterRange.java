package org.ladderkin.io;

import org.ladderkin.io.json.Node;
import org.ladderkin.kinetics.process.ProcessParameter;

/** A process parameter's value checked against its declared range where a file gives it, so the error names the field. */
final class ParameterRange {

    private ParameterRange() {
    }

    /** {@code x}, or a located error when it is negative or outside what {@code p} allows. */
    static double check(ProcessParameter p, Node v, double x) {
        String problem = x < 0 ? "must be >= 0, was " + x : p.problemWith(x);
        if (problem != null) {
            throw v.error(InputProblem.OUT_OF_RANGE, problem);
        }
        return x;
    }
}
