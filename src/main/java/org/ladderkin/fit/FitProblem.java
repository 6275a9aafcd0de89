package org.ladderkin.fit;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A global fit to set up: the data, the model, its nonlinear parameters and the per-trace linear terms.
 *
 * @param data       the traces (missing points, NaN, are left out of the fit)
 * @param model      predicts one shape per trace
 * @param parameters nonlinear parameters, unique keys
 * @param linear     per-trace amplitude/baseline handling
 */
public record FitProblem(Dataset data, TraceModel model, List<ParameterSpec> parameters, LinearTerms linear) {

    public FitProblem {
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(linear, "linear");
        parameters = List.copyOf(Objects.requireNonNull(parameters, "parameters"));
        if (model.traceCount() != data.size()) {
            throw new IllegalArgumentException("model describes " + model.traceCount() + " traces but the data has " + data.size());
        }
        Set<String> keys = new HashSet<>();
        for (ParameterSpec p : parameters) {
            if (!keys.add(p.key())) {
                throw new IllegalArgumentException("parameter '" + p.key() + "' is declared twice");
            }
        }
    }

    /** The spec with key {@code key}. */
    public ParameterSpec parameter(String key) {
        return parameters.stream().filter(p -> p.key().equals(key)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no parameter '" + key + "' (have: "
                        + parameters.stream().map(ParameterSpec::key).toList() + ")"));
    }

    /** A copy with {@code key}'s spec replaced. */
    public FitProblem with(ParameterSpec replacement) {
        parameter(replacement.key());
        return new FitProblem(data, model, parameters.stream().map(p -> p.key().equals(replacement.key()) ? replacement : p).toList(), linear);
    }
}
