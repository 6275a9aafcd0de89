package org.ladderkin.fit;

import java.util.Map;

/**
 * The parameter values a {@link TraceModel} is evaluated at: shared ones have one value, per-trace ones one per trace.
 * Models may look values up by key ("tau1S") or, in hot loops, by the index from {@link #indexOf(String)}.
 */
public final class ParameterValues {

    private final Map<String, Integer> index;
    private final double[][] values;

    ParameterValues(Map<String, Integer> index, double[][] values) {
        this.index = index;
        this.values = values;
    }

    /** Shared values by key, in the given order, e.g. to evaluate a model at known parameters. */
    public static ParameterValues shared(java.util.List<String> keys, double[] values) {
        if (keys.size() != values.length) {
            throw new IllegalArgumentException(keys.size() + " keys but " + values.length + " values");
        }
        Map<String, Integer> index = new java.util.LinkedHashMap<>();
        double[][] v = new double[values.length][];
        for (int i = 0; i < values.length; i++) {
            index.put(keys.get(i), i);
            v[i] = new double[] {values[i]};
        }
        return new ParameterValues(index, v);
    }

    /** Index of the parameter with key {@code key}, or -1 when the problem has no such parameter. */
    public int indexOf(String key) {
        Integer i = index.get(key);
        return i == null ? -1 : i;
    }

    /** Number of parameters. */
    public int size() {
        return values.length;
    }

    /** Value of parameter {@code key} for {@code trace} (shared parameters ignore the trace). */
    public double get(String key, int trace) {
        int i = indexOf(key);
        if (i < 0) {
            throw new IllegalArgumentException("no parameter '" + key + "' in this problem (have: " + index.keySet() + ")");
        }
        return value(i, trace);
    }

    /** Value of shared parameter {@code key}; a per-trace parameter must be asked with its trace. */
    public double get(String key) {
        int i = indexOf(key);
        if (i >= 0 && values[i].length > 1) {
            throw new IllegalArgumentException("parameter '" + key + "' has one value per trace: ask get(key, trace)");
        }
        return get(key, 0);
    }

    /** Value of parameter number {@code parameter} for {@code trace}. */
    public double value(int parameter, int trace) {
        double[] v = values[parameter];
        return v.length == 1 ? v[0] : v[trace];
    }
}
