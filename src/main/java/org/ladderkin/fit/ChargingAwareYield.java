package org.ladderkin.fit;

import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.kinetics.process.RefreshProcess;

/**
 * The multiplication yield with photocharging in mind. In a static sample at a high repetition rate, dots charged by
 * earlier pulses turn later excitons into trions, whose fast Auger decay mimics the biexciton decay that
 * multiplication adds at low fluence, so a yield fitted from such a run alone can be too high. A run on refreshed dots
 * (stirred or flowed, or a low repetition rate) has no accumulated charge: its yield is the one reported, and the
 * static run, fitted with its charged branch and η free, shows how much charging would have added and the charged
 * fraction it implies. With the static run alone the yield is reported as an upper bound, and why.
 */
public final class ChargingAwareYield {

    /** Pulse periods at or below this (s) count as a high repetition rate for accumulated charge (1 MHz and up). */
    public static final double HIGH_RATE_PERIOD_S = 1e-6;

    private ChargingAwareYield() {
    }

    /**
     * The verdict.
     *
     * @param eta                 the reported yield (the refreshed run's when given, else the static run's)
     * @param etaStdError         its standard error (NaN when the fit gives none)
     * @param upperBound          whether η is only an upper bound
     * @param reason              why, in a sentence (empty when it is not a bound)
     * @param staticRun           the static run's fit
     * @param refreshedRun        the refreshed run's fit, when given
     * @param staticEta           η of the static run alone (NaN when its fit failed)
     * @param chargedFraction     charged fraction before a pulse of the static run's strongest trace at its best fit
     */
    public record Verdict(double eta, double etaStdError, boolean upperBound, String reason, LadderFit.Outcome staticRun,
                          Optional<LadderFit.Outcome> refreshedRun, double staticEta, double chargedFraction) {
    }

    /** Whether a fit of this set-up is exposed to accumulated charge: a high-rate pulse train on dots never exchanged. */
    public static boolean exposed(LadderFitSetup setup) {
        return !Double.isNaN(setup.periodS()) && setup.periodS() <= HIGH_RATE_PERIOD_S
                && !setup.base().has(RefreshProcess.EXCHANGE_TIME);
    }

    /** The sentence a report gives when η of an exposed run stands alone. */
    public static String upperBoundReason(double periodS) {
        String mhz = new java.math.BigDecimal(1e-6 / periodS).round(new java.math.MathContext(3)).stripTrailingZeros()
                .toPlainString();
        return String.format(Locale.ROOT, "η is an upper bound: at %s MHz in a static sample, trions made by earlier pulses "
                + "add a fast decay that looks like multiplication; fit a stirred or flowed run (or a run at a much lower "
                + "repetition rate) beside this one to separate the two", mhz);
    }

    /**
     * Fits the static run and, when given, the refreshed run, both with η free.
     *
     * @param refreshed the refreshed (stirred, flowed or low-rate) run and its set-up, or null
     */
    public static Verdict analyse(Dataset staticData, LadderFitSetup staticSetup, Dataset refreshedData,
                                  LadderFitSetup refreshedSetup, FitProgress progress) {
        requireYieldFreed(staticSetup);
        return analyse(staticData, staticSetup, LadderFit.fit(staticData, staticSetup, progress), refreshedData,
                refreshedSetup, progress);
    }

    /** As {@link #analyse(Dataset, LadderFitSetup, Dataset, LadderFitSetup, FitProgress)}, the static run already fitted. */
    public static Verdict analyse(Dataset staticData, LadderFitSetup staticSetup, LadderFit.Outcome st,
                                  Dataset refreshedData, LadderFitSetup refreshedSetup, FitProgress progress) {
        requireYieldFreed(staticSetup);
        double staticEta = etaOf(st).orElse(Double.NaN);
        double charged = Double.NaN;
        if (st.result().ok()) {
            ParameterValues best = LadderFit.valuesAt(st.result(), LadderFit.specs(staticSetup, st.scaleKey(),
                    st.result().estimate(st.scaleKey()).value()));
            LadderBleachModel model = LadderBleachModel.forModel(staticSetup.base(), st.scaleKey(), st.excitation(),
                    staticSetup.periodS(), staticSetup.measuredIrf(), staticSetup.geometry());
            int top = 0;
            for (int i = 1; i < st.excitation().length; i++) {
                top = st.excitation()[i] > st.excitation()[top] ? i : top;
            }
            charged = model.chargedFractionBeforePulse(top, best);
        }
        if (refreshedData == null) {
            boolean bound = exposed(staticSetup);
            return new Verdict(staticEta, stdErrorOf(st), bound, bound ? upperBoundReason(staticSetup.periodS()) : "", st,
                    Optional.empty(), staticEta, charged);
        }
        requireYieldFreed(refreshedSetup);
        if (exposed(refreshedSetup)) {
            throw new IllegalArgumentException("the reference run must be refreshed (stirred or flowed: a 'refresh' process in "
                    + "its model) or at a low repetition rate (below " + 1e-6 / HIGH_RATE_PERIOD_S + " MHz)");
        }
        LadderFit.Outcome ref = LadderFit.fit(refreshedData, refreshedSetup, progress);
        return new Verdict(etaOf(ref).orElse(Double.NaN), stdErrorOf(ref), false, "", st, Optional.of(ref), staticEta, charged);
    }

    private static void requireYieldFreed(LadderFitSetup setup) {
        if (setup == null || !setup.free().contains(LadderParameter.MULTIPLICATION_YIELD)) {
            throw new IllegalArgumentException("free the multiplication yield in both runs' set-ups");
        }
    }

    private static OptionalDouble etaOf(LadderFit.Outcome o) {
        return o.result().ok() ? OptionalDouble.of(o.result().estimate(LadderBleachModel.MULTIPLICATION_YIELD).value())
                : OptionalDouble.empty();
    }

    private static double stdErrorOf(LadderFit.Outcome o) {
        return o.result().ok() ? o.result().estimate(LadderBleachModel.MULTIPLICATION_YIELD).stdError() : Double.NaN;
    }
}
