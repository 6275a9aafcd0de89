package org.ladderkin.fit.counting;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ProfileInterval;

/**
 * The outcome of a likelihood fit.
 *
 * @param status           how it ended
 * @param message          why it failed or why errors are missing; empty otherwise
 * @param estimates        shared values (trace −1) and each part's own (trace = part index); standard errors from the
 *                         observed information (the Hessian of −2 ln L at the optimum), NaN when it was singular
 * @param minus2LnL        −2 ln L at the optimum up to a constant: the Poisson deviance plus χ² of the other parts
 * @param poissonDeviance  the Poisson deviance of the count parts (0 without any)
 * @param countBins        bins in the count parts
 * @param chiSquare        χ² of the parts with Gaussian noise (0 without any)
 * @param points           all residuals
 * @param freeParameters   parameters fitted
 * @param degreesOfFreedom points − free parameters
 * @param fitted           each part's prediction at the optimum
 * @param profiles         profile-likelihood intervals asked for
 * @param evaluations      evaluations of the whole problem, Hessian included
 */
public record LikelihoodResult(Status status, String message, List<ParameterEstimate> estimates, double minus2LnL,
                               double poissonDeviance, int countBins, double chiSquare, int points, int freeParameters,
                               int degreesOfFreedom, List<double[]> fitted, List<ProfileInterval> profiles, int evaluations) {

    /** How a fit ended. */
    public enum Status {
        /** Converged, errors from the observed information. */
        CONVERGED,
        /** Converged, but the information matrix is singular: no errors. */
        UNCERTAINTY_UNAVAILABLE,
        /** No result. */
        FAILED
    }

    public LikelihoodResult {
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(message, "message");
        estimates = List.copyOf(estimates);
        fitted = List.copyOf(fitted);
        profiles = List.copyOf(profiles);
    }

    static LikelihoodResult failed(String message) {
        return new LikelihoodResult(Status.FAILED, message, List.of(), Double.NaN, Double.NaN, 0, Double.NaN, 0, 0, 0,
                List.of(), List.of(), 0);
    }

    /** Whether there is a result to show. */
    public boolean ok() {
        return status != Status.FAILED;
    }

    /** A shared estimate. */
    public ParameterEstimate estimate(String key) {
        return find(key, -1).orElseThrow(() -> new IllegalArgumentException("no shared parameter '" + key + "' in this result"));
    }

    /** A part's own estimate, or a shared one with trace −1. */
    public Optional<ParameterEstimate> find(String key, int part) {
        return estimates.stream().filter(e -> e.key().equals(key) && e.trace() == part).findFirst();
    }

    /** The profile interval of {@code key}, if one was asked for and found. */
    public Optional<ProfileInterval> profile(String key) {
        return profiles.stream().filter(p -> p.key().equals(key)).findFirst();
    }

    /**
     * The probability of a deviance at least this large if the model were right (χ² with the count bins' degrees of
     * freedom), NaN without count data.
     */
    public double goodnessOfFit() {
        int dof = countBins - (countBins == points ? freeParameters : 0);
        if (countBins == 0 || dof <= 0) {
            return Double.NaN;
        }
        return 1 - new org.hipparchus.distribution.continuous.ChiSquaredDistribution(dof).cumulativeProbability(poissonDeviance);
    }
}
