package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.ladderkin.units.Rounded;

/**
 * What a fit that freed the multiplication yield reports beside it: the photon energy η belongs to, the early/late
 * estimate side by side with the full fit's, and whether η is only an upper bound (a static high-rate run).
 *
 * @param photonEnergyJ the pump photon energy shared by the series, when known
 * @param eta           the full fit's η
 * @param etaStdError   its standard error (NaN at a bound)
 * @param earlyLate     the early/late estimate, when the traces allow one
 * @param earlyLateNote why there is none (empty when there is)
 * @param upperBound    whether η is only an upper bound
 * @param reason        why (empty when it is not)
 * @param staticRun     when η comes from a refreshed run: what the static run beside it gave
 */
public record YieldSummary(OptionalDouble photonEnergyJ, double eta, double etaStdError,
                           Optional<EarlyLateYield.Estimate> earlyLate, String earlyLateNote, boolean upperBound,
                           String reason, Optional<StaticRun> staticRun) {

    /**
     * The static run fitted beside a refreshed one: its own η (too high by whatever charging added) and the charged
     * fraction before a pulse its fit implies, which say how much a static run alone would have misled.
     *
     * @param eta             η of the static run alone (NaN when its fit failed)
     * @param chargedFraction charged fraction before a pulse of its strongest trace (NaN when unknown)
     * @param periodS         its pulse period (NaN for a single pulse)
     */
    public record StaticRun(double eta, double chargedFraction, double periodS) {
    }

    /** This summary, of a refreshed run, with the static run's numbers beside it (a refreshed run is no bound). */
    public YieldSummary withStaticRun(ChargingAwareYield.Verdict verdict, double staticPeriodS) {
        return new YieldSummary(photonEnergyJ, eta, etaStdError, earlyLate, earlyLateNote, false, "",
                Optional.of(new StaticRun(verdict.staticEta(), verdict.chargedFraction(), staticPeriodS)));
    }

    /** The late delay in biexciton lifetimes: long enough for Auger decay to be over (e^−10). */
    private static final double LATE_IN_TAU2 = 10;

    /**
     * The photon energy of the series: every trace's own (which must agree, η being shared at one photon energy),
     * else {@code pumpJ}.
     */
    public static OptionalDouble photonEnergyJ(Dataset data, OptionalDouble pumpJ) {
        OptionalDouble found = OptionalDouble.empty();
        for (Trace t : data.traces()) {
            OptionalDouble e = t.metadata().photonEnergyJ();
            if (e.isPresent() && found.isPresent() && Math.abs(e.getAsDouble() - found.getAsDouble()) > 1e-6 * found.getAsDouble()) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "the multiplication yield is shared at one photon "
                        + "energy, but trace '%s' was pumped at %.4g eV and an earlier one at %.4g eV (fit each photon energy "
                        + "on its own, then combine them with fit-yields)", t.label(), e.getAsDouble() / org.ladderkin.units.PhysicalConstants.ELECTRONVOLT_J,
                        found.getAsDouble() / org.ladderkin.units.PhysicalConstants.ELECTRONVOLT_J));
            }
            found = found.isPresent() ? found : e;
        }
        return found.isPresent() ? found : pumpJ;
    }

    /** The summary of a converged fit that freed η. */
    public static YieldSummary of(Dataset data, LadderFitSetup setup, LadderFit.Outcome outcome, OptionalDouble pumpJ) {
        FitResult r = outcome.result();
        ParameterEstimate eta = r.estimate(LadderBleachModel.MULTIPLICATION_YIELD);
        double tau2 = r.find(LadderBleachModel.TAU_AUGER2, -1).map(ParameterEstimate::value).orElse(Double.NaN);
        double t0 = r.find(LadderBleachModel.TIME_ZERO, -1).map(ParameterEstimate::value).orElse(0.0);
        double irf = r.find(LadderBleachModel.IRF_FWHM, -1).map(ParameterEstimate::value).orElse(0.0);
        double early = Double.NaN;
        double last = Double.NEGATIVE_INFINITY;
        for (Trace t : data.traces()) {
            for (double d : t.delaysS()) {
                if (d > t0 + 2 * irf && (Double.isNaN(early) || d < early)) {
                    early = d;
                }
                last = Math.max(last, d);
            }
        }
        Optional<EarlyLateYield.Estimate> el = Optional.empty();
        String note = "";
        double late = Double.isNaN(tau2) ? last : Math.min(last, t0 + LATE_IN_TAU2 * tau2);
        if (Double.isNaN(early) || !(late > early * 5)) {
            note = "no early/late estimate: the delays do not reach past the Auger decay";
        } else {
            try {
                el = Optional.of(EarlyLateYield.of(data, outcome.meanN(), early - t0, late - t0));
            } catch (IllegalArgumentException e) {
                note = "no early/late estimate: " + e.getMessage();
            }
        }
        boolean bound = ChargingAwareYield.exposed(setup);
        return new YieldSummary(photonEnergyJ(data, pumpJ), eta.value(), eta.stdError(), el, note, bound,
                bound ? ChargingAwareYield.upperBoundReason(setup.periodS()) : "", Optional.empty());
    }

    /** Lines for the terminal summary. */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        String pump = photonEnergyJ.isPresent() ? String.format(Locale.ROOT, " at ħω = %.4g eV",
                photonEnergyJ.getAsDouble() / org.ladderkin.units.PhysicalConstants.ELECTRONVOLT_J) : " (photon energy not given: --pump or the sidecar)";
        out.add(String.format(Locale.ROOT, "  multiplication yield%s: full fit η = %s%s", pump, Rounded.pm(eta, etaStdError),
                staticRun.isPresent() ? " (from the refreshed run)" : ""));
        staticRun.ifPresent(s -> out.add(String.format(Locale.ROOT, "  static run%s alone: η = %.3g, charged fraction before "
                + "a pulse %.3g (trions from earlier pulses; its η is not the yield)", Double.isNaN(s.periodS()) ? ""
                : " at " + new java.math.BigDecimal(1e-6 / s.periodS()).round(new java.math.MathContext(3)).stripTrailingZeros()
                .toPlainString() + " MHz", s.eta(), s.chargedFraction())));
        earlyLate.ifPresent(e -> out.add(String.format(Locale.ROOT, "  early/late A/B → 1 + η = %s (η = %s; A at "
                + "%.3g ps, B at %.3g ps, %d weakest traces)", Rounded.pm(e.limit(), e.limitStdError()),
                Rounded.value(e.eta(), e.limitStdError()), e.earlyS() * 1e12,
                e.lateS() * 1e12, e.x().length)));
        if (!earlyLateNote.isEmpty()) {
            out.add("  " + earlyLateNote);
        }
        if (upperBound) {
            out.add("! " + reason);
        }
        return out;
    }
}
