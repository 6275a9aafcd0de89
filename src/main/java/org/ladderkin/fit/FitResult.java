package org.ladderkin.fit;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What a global fit found, or why it could not. Never carries a NaN without saying so: a failed fit has status
 * {@link Status#FAILED}, a message, no estimates and NaN statistics; a fit whose covariance could not be formed has
 * status {@link Status#UNCERTAINTY_UNAVAILABLE}, a message naming the parameters at fault, and NaN standard errors; an
 * optimiser stopped at its limit leaves status {@link Status#NOT_CONVERGED} with the best point it met, NaN standard
 * errors and a message saying why it stopped.
 *
 * @param status            outcome
 * @param message           what happened, one line (empty when converged cleanly)
 * @param estimates         every parameter (fixed ones too), then amplitude/baseline per trace
 * @param correlationKeys   free parameters in the order of {@code correlation} (per-trace ones as "key[i]")
 * @param correlation       correlation matrix of the free parameters (empty unless CONVERGED)
 * @param chiSquare         Σ ((data − fit)/σ)² over all points, σ = 1 where no uncertainty was given
 * @param points            number of data points used
 * @param freeParameters    free nonlinear plus linear parameters
 * @param reducedChiSquare  χ² / (points − freeParameters)
 * @param aic               Akaike information criterion (lower is better; compare only fits of the same data)
 * @param bic               Bayesian information criterion
 * @param residuals         per trace: data − fit, in signal units, at the points used
 * @param autocorrelation   per trace: residual autocorrelation at lags 1..k
 * @param iterations        Levenberg–Marquardt iterations of the best start
 * @param evaluations       model evaluations of the best start
 * @param startsTried       how many start vectors were tried
 * @param startsFailed      how many of them failed
 * @param profiles          profile-likelihood intervals requested
 * @param warnings          things the user should know that did not stop the fit
 */
public record FitResult(Status status, String message, List<ParameterEstimate> estimates, List<String> correlationKeys,
                        double[][] correlation, double chiSquare, int points, int freeParameters, double reducedChiSquare,
                        double aic, double bic, List<double[]> residuals, List<double[]> autocorrelation, int iterations,
                        int evaluations, int startsTried, int startsFailed, List<ProfileInterval> profiles, List<String> warnings) {

    /** Outcome of a fit. */
    public enum Status {
        /** Converged; estimates and uncertainties are available. */
        CONVERGED,
        /** Converged, but the covariance is singular: estimates are available, standard errors are not. */
        UNCERTAINTY_UNAVAILABLE,
        /**
         * The optimiser stopped at a limit before converging: the estimates are the best point it met (lowest χ²),
         * without standard errors, and the message says why it stopped and what to change.
         */
        NOT_CONVERGED,
        /** No usable fit; see the message. */
        FAILED
    }

    public FitResult {
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(message, "message");
        estimates = List.copyOf(estimates);
        correlationKeys = List.copyOf(correlationKeys);
        residuals = List.copyOf(residuals);
        autocorrelation = List.copyOf(autocorrelation);
        profiles = List.copyOf(profiles);
        warnings = List.copyOf(warnings);
        correlation = deepCopy(Objects.requireNonNull(correlation, "correlation"));
        residuals = residuals.stream().map(double[]::clone).toList();
        autocorrelation = autocorrelation.stream().map(double[]::clone).toList();
        if (status != Status.CONVERGED && message.isBlank()) {
            throw new IllegalArgumentException("a " + status + " result needs a message");
        }
    }

    /** A copy of the correlation matrix (rows in the order of {@link #correlationKeys()}). */
    @Override
    public double[][] correlation() {
        return deepCopy(correlation);
    }

    private static double[][] deepCopy(double[][] m) {
        double[][] c = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            c[i] = m[i].clone();
        }
        return c;
    }

    /** A failed fit with its reason. */
    public static FitResult failed(String message, int startsTried, List<String> warnings) {
        return new FitResult(Status.FAILED, message, List.of(), List.of(), new double[0][0], Double.NaN, 0, 0, Double.NaN,
                Double.NaN, Double.NaN, List.of(), List.of(), 0, 0, startsTried, startsTried, List.of(), warnings);
    }

    /** Whether estimates are available (for a {@link Status#NOT_CONVERGED} fit: the best point met, not an optimum). */
    public boolean ok() {
        return status != Status.FAILED;
    }

    /** Whether the optimiser converged (estimates are an optimum, not just the best point met). */
    public boolean converged() {
        return status == Status.CONVERGED || status == Status.UNCERTAINTY_UNAVAILABLE;
    }

    /** "converged", "uncertainty unavailable", "not converged" or "failed", for people. */
    public String statusText() {
        return status.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
    }

    /** The shared estimate with key {@code key}. */
    public ParameterEstimate estimate(String key) {
        return find(key, -1).orElseThrow(() -> new IllegalArgumentException("no shared estimate '" + key + "' ("
                + status + (message.isEmpty() ? "" : ": " + message) + ")"));
    }

    /** The estimate with key {@code key} for {@code trace} (-1 for shared). */
    public Optional<ParameterEstimate> find(String key, int trace) {
        return estimates.stream().filter(e -> e.key().equals(key) && e.trace() == trace).findFirst();
    }

    /** The profile interval of {@code key}, if one was requested and found. */
    public Optional<ProfileInterval> profile(String key) {
        return profiles.stream().filter(p -> p.key().equals(key)).findFirst();
    }
}
