package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.excite.QuantumYieldLaw;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.TimeWindows;
import org.ladderkin.observe.Verdict;
import org.ladderkin.units.Photon;

/**
 * The carrier-multiplication goal planned as its own measurement: a reference pump below 2·E₁S (where energy
 * conservation forbids multiplication) and every pump the laser offers above the assumed threshold, each recorded as a
 * short low-⟨N⟩ series of early/late pairs; A/B at each ⟨N⟩ is fitted with a straight line whose intercept (⟨N⟩ → 0)
 * is the quantum yield's signature. The series is chosen to minimise the intercept's total error: its white-noise
 * scatter (weighted least squares) and the bias a straight line leaves on the curved A/B(⟨N⟩) the model predicts.
 *
 * @param reference      the reference pump, or null when the laser offers none below 2·E₁S
 * @param pumps          the pumps above the threshold
 * @param nSeries        the ⟨N⟩ values every pump is recorded at
 * @param timePerPointS  averaging time of each early and each late point (s)
 * @param noiseOdPerSqrtS the TA noise floor the errors assume (OD per √s)
 * @param twoRate        the photocharging check: A/B of the first pump's top point at the chosen rate and at a ten
 *                       times slower one
 * @param risks          the mode's risks
 * @param notPlanned     what the plan does not cover, in words
 */
public record MultiplicationPlan(Pump reference, List<Pump> pumps, double[] nSeries, double timePerPointS,
                                 double noiseOdPerSqrtS, TwoRate twoRate, List<Risk> risks, List<String> notPlanned) {

    /** Candidate series: tops and point counts (the lowest point is top/count, spacing even). */
    static final double[] TOPS = {0.05, 0.1, 0.2, 0.3};
    static final int[] COUNTS = {4, 6, 8};

    /**
     * One pump of the multiplication measurement.
     *
     * @param wavelengthM       its wavelength (m)
     * @param overGap           ħω/E₁S
     * @param etaLow            the yield prior's lower end (η)
     * @param eta               the expected η (the plan's law)
     * @param etaHigh           the prior's upper end (η)
     * @param earlyOd           early bleach |ΔA| at each ⟨N⟩ of the series (OD)
     * @param lateOd            late bleach |ΔA| at each ⟨N⟩ (OD)
     * @param interceptRatio    A/B at ⟨N⟩ → 0 the model predicts
     * @param statisticalError  the intercept's white-noise standard error
     * @param bias              straight-line fit of the noiseless A/B minus the true intercept
     */
    public record Pump(double wavelengthM, double overGap, double etaLow, double eta, double etaHigh, double[] earlyOd,
                       double[] lateOd, double interceptRatio, double statisticalError, double bias) {

        /** The intercept's expected total error. */
        public double totalError() {
            return Math.hypot(statisticalError, bias);
        }
    }

    /**
     * @param slowRateHz     the slower rate compared (Hz)
     * @param ratioChosen    apparent A/B at the chosen rate, top ⟨N⟩ of the series
     * @param ratioSlow      the same at the slower rate
     * @param chargedChosen  charged fraction at the chosen rate
     */
    public record TwoRate(double slowRateHz, double ratioChosen, double ratioSlow, double chargedChosen) {
    }

    public MultiplicationPlan {
        pumps = List.copyOf(pumps);
        nSeries = nSeries.clone();
        risks = List.copyOf(risks);
        notPlanned = List.copyOf(notPlanned);
    }

    /** The law behind the expected η and its range, with its source. */
    public static String priorSource() {
        return "expected η: quantum yield 1 + (ħω − 2.5·E₁S)/(1.5·E₁S), capped at 2 (the threshold-linear shape of Beard "
                + "et al., Nano Lett. 10, 3019 (2010), numbers from memory); range: η = 0 (no multiplication) to the "
                + "energy-conservation staircase floor(ħω/E₁S) − 1, capped at 1 (derived)";
    }

    static MultiplicationPlan of(KineticModel km, ModelAssumptions model, double firstExcitonJ, List<Double> offeredM,
                                 double bandEdgeOd, double noiseOdPerSqrtS, double budgetS, double chosenRateHz,
                                 Limits limits) {
        QuantumYieldLaw expected = MultiplicationForecast.defaultLaw(firstExcitonJ);
        QuantumYieldLaw high = new QuantumYieldLaw.Staircase(firstExcitonJ);
        TimeWindows.EarlyLate w = TimeWindows.earlyLate(model.coolingS(), model.tauBiexcitonS(), model.tauSingleExcitonS());
        double period = 1 / chosenRateHz;
        Double refM = null;
        List<Double> above = new ArrayList<>();
        for (double m : offeredM) {
            double ratio = Photon.energyJ(m) / firstExcitonJ;
            if (ratio < 2 && ratio > 1.1 && (refM == null || Photon.energyJ(m) > Photon.energyJ(refM))) {
                refM = m;
            } else if (expected.eta(Photon.energyJ(m)) > 0) {
                above.add(m);
            }
        }
        int measured = above.size() + (refM == null ? 0 : 1);
        double[] best = null;
        double bestObjective = Double.POSITIVE_INFINITY;
        double bestTime = 0;
        for (double top : TOPS) {
            for (int k : COUNTS) {
                double[] n = series(top, k);
                double t = budgetS / Math.max(1, measured) / (2.0 * k);
                double objective = 0;
                for (double m : above) {
                    Pump p = pump(km, w, period, m, firstExcitonJ, expected, high, bandEdgeOd, n, noiseOdPerSqrtS, t);
                    objective = Math.max(objective, p.totalError() / p.interceptRatio());
                }
                if (above.isEmpty() && refM != null) {
                    Pump p = pump(km, w, period, refM, firstExcitonJ, expected, high, bandEdgeOd, n, noiseOdPerSqrtS, t);
                    objective = p.totalError() / p.interceptRatio();
                }
                if (objective < bestObjective) {
                    bestObjective = objective;
                    best = n;
                    bestTime = t;
                }
            }
        }
        double[] n = best;
        double t = bestTime;
        List<Pump> pumps = new ArrayList<>();
        for (double m : above) {
            pumps.add(pump(km, w, period, m, firstExcitonJ, expected, high, bandEdgeOd, n, noiseOdPerSqrtS, t));
        }
        Pump reference = refM == null ? null
                : pump(km, w, period, refM, firstExcitonJ, expected, high, bandEdgeOd, n, noiseOdPerSqrtS, t);
        List<Risk> risks = new ArrayList<>();
        if (reference == null) {
            risks.add(new Risk("multiplication reference pump", Verdict.FAIL, 0, 1, "pumps", "the laser offers no pump "
                    + "between 1.1·E₁S and 2·E₁S: without a below-threshold reference A/B cannot be told from the "
                    + "ladder's own low-fluence ratio"));
        }
        if (pumps.isEmpty()) {
            risks.add(new Risk("multiplication pump above threshold", Verdict.FAIL, 0, 1, "pumps",
                    "the laser offers no pump above the assumed threshold 2.5·E₁S"));
        }
        TwoRate twoRate = null;
        Pump first = pumps.isEmpty() ? reference : pumps.get(0);
        if (first != null) {
            double eta = first.eta();
            PulseExcitation pulse = new PulseExcitation.Multiplication(n[n.length - 1], eta);
            LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
            SteadyState chosen = kin.steadyState(pulse, period, false);
            SteadyState slow = kin.steadyState(pulse, 10 * period, false);
            twoRate = new TwoRate(chosenRateHz / 10, apparent(kin, chosen, w), apparent(kin, slow, w), chosen.chargedFraction());
            double shift = Math.abs(twoRate.ratioChosen() / twoRate.ratioSlow() - 1);
            Verdict v = chosen.chargedFraction() > limits.maxChargedFraction() ? Verdict.FAIL
                    : shift > first.totalError() / first.interceptRatio() ? Verdict.WARN : Verdict.PASS;
            risks.add(new Risk("multiplication photocharging check", v, chosen.chargedFraction(), limits.maxChargedFraction(),
                    "charged", String.format(Locale.ROOT, "at the series' top ⟨N⟩ = %.3g the charged fraction is %.3g; "
                            + "record the %.0f nm series again at a ten times slower rate (or static against stirred): A/B "
                            + "should agree within %.2g %% (predicted %.4g against %.4g)", n[n.length - 1],
                            chosen.chargedFraction(), first.wavelengthM() * 1e9,
                            100 * first.totalError() / first.interceptRatio(), twoRate.ratioChosen(), twoRate.ratioSlow())));
        }
        List<String> notPlanned = new ArrayList<>();
        notPlanned.add("yields above 2 per photon (the ladder keeps at most two excitons per absorbed photon)");
        notPlanned.add("pump-fluence fluctuations between the early and late points (recorded in the same scan, they cancel "
                + "in A/B to first order)");
        return new MultiplicationPlan(reference, pumps, n, t, noiseOdPerSqrtS, twoRate, risks, notPlanned);
    }

    static double[] series(double top, int k) {
        double[] n = new double[k];
        for (int i = 0; i < k; i++) {
            n[i] = top * (i + 1) / k;
        }
        return n;
    }

    static Pump pump(KineticModel km, TimeWindows.EarlyLate w, double period, double wavelengthM, double firstExcitonJ,
                     QuantumYieldLaw expected, QuantumYieldLaw high, double bandEdgeOd, double[] n, double noise,
                     double timePerPointS) {
        double photon = Photon.energyJ(wavelengthM);
        double eta = expected.eta(photon);
        double[] early = new double[n.length];
        double[] late = new double[n.length];
        double[] delays = {w.earlyS(), w.lateS()};
        for (int i = 0; i < n.length; i++) {
            PulseExcitation pulse = new PulseExcitation.Multiplication(n[i], eta);
            LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
            double[] b = kin.trace(kin.steadyState(pulse, period, false).afterPulse(), delays).bleach();
            early[i] = bandEdgeOd * b[0];
            late[i] = bandEdgeOd * b[1];
        }
        PulseExcitation tiny = new PulseExcitation.Multiplication(1e-5, eta);
        LadderKinetics kin0 = LadderKinetics.forPulses(km, tiny);
        double[] b0 = kin0.singlePulse(tiny, delays).bleach();
        double intercept = b0[0] / b0[1];
        double sigma = noise / Math.sqrt(timePerPointS);
        double[] fit = Line.fit(n, early, late, sigma);
        return new Pump(wavelengthM, photon / firstExcitonJ, 0, eta, high.eta(photon), early, late, intercept, fit[1],
                fit[0] - intercept);
    }

    /** A/B with the signal just before the pulse subtracted, as negative delays show it. */
    private static double apparent(LadderKinetics kin, SteadyState ss, TimeWindows.EarlyLate w) {
        double[] b = kin.trace(ss.afterPulse(), new double[] {w.earlyS(), w.lateS()}).bleach();
        double baseline = ss.beforePulse().expectation(kin.bleachObservable());
        return (b[0] - baseline) / (b[1] - baseline);
    }

    /** The straight-line analysis of A/B against ⟨N⟩, shared by the plan and its check. */
    public static final class Line {

        private Line() {
        }

        /**
         * Weighted least-squares line through A/B(⟨N⟩) with weights from the propagated white noise of A and B.
         *
         * @return {intercept, its standard error}
         */
        public static double[] fit(double[] n, double[] early, double[] late, double sigma) {
            double sw = 0;
            double swx = 0;
            double swxx = 0;
            double swy = 0;
            double swxy = 0;
            for (int i = 0; i < n.length; i++) {
                double r = early[i] / late[i];
                double var = r * r * (Math.pow(sigma / early[i], 2) + Math.pow(sigma / late[i], 2));
                double wi = 1 / var;
                sw += wi;
                swx += wi * n[i];
                swxx += wi * n[i] * n[i];
                swy += wi * r;
                swxy += wi * n[i] * r;
            }
            double det = sw * swxx - swx * swx;
            double intercept = (swxx * swy - swx * swxy) / det;
            return new double[] {intercept, Math.sqrt(swxx / det)};
        }

        /** The intercept of the same weighted line through measured ratios, the weights from the planned signals. */
        public static double intercept(double[] n, double[] ratios, double[] early, double[] late, double sigma) {
            double sw = 0;
            double swx = 0;
            double swxx = 0;
            double swy = 0;
            double swxy = 0;
            for (int i = 0; i < n.length; i++) {
                double r = early[i] / late[i];
                double wi = 1 / (r * r * (Math.pow(sigma / early[i], 2) + Math.pow(sigma / late[i], 2)));
                sw += wi;
                swx += wi * n[i];
                swxx += wi * n[i] * n[i];
                swy += wi * ratios[i];
                swxy += wi * n[i] * ratios[i];
            }
            return (swxx * swy - swx * swxy) / (sw * swxx - swx * swx);
        }
    }
}
