package org.ladderkin.observe;

import java.util.TreeSet;
import org.ladderkin.units.PhysicalConstants;

/**
 * Delay windows and grids from a model's time scales, and what the delay stage must provide.
 */
public final class TimeWindows {

    /** How many time constants a process needs to be over (e^{−5} < 1 %): common practice, no source. */
    public static final double SETTLE_FACTOR = 5;

    private TimeWindows() {
    }

    /**
     * The early/late analysis windows.
     *
     * @param earlyS    delay after cooling and before Auger decay has begun in earnest (s)
     * @param lateS     delay after Auger decay and before radiative decay (s)
     * @param separated whether the windows are separated as required (cooling ≪ Auger ≪ radiative)
     */
    public record EarlyLate(double earlyS, double lateS, boolean separated) {
    }

    /**
     * Early delay: {@link #SETTLE_FACTOR} cooling times, but no later than a tenth of τ2. Late delay: the settle
     * factor times the slowest Auger lifetime of interest (τ2), but no later than a tenth of τ1.
     */
    public static EarlyLate earlyLate(double coolingS, double tauBiexcitonS, double tauSingleS) {
        positive(coolingS, "cooling time");
        positive(tauBiexcitonS, "biexciton lifetime");
        positive(tauSingleS, "single-exciton lifetime");
        double early = SETTLE_FACTOR * coolingS;
        double late = SETTLE_FACTOR * tauBiexcitonS;
        boolean separated = early <= tauBiexcitonS / 10 && late <= tauSingleS / 10;
        return new EarlyLate(Math.min(early, tauBiexcitonS / 10), Math.min(late, tauSingleS / 10), separated);
    }

    /**
     * A delay grid: linear steps from {@code startS} up to {@code linearUntilS} (resolving the rise and cooling near
     * zero), then {@code pointsPerDecade} log-spaced points up to {@code endS}. Sorted, no duplicates.
     */
    public static double[] grid(double startS, double linearStepS, double linearUntilS, double endS, int pointsPerDecade) {
        if (!(endS > linearUntilS) || !(linearUntilS > startS) || !(linearStepS > 0) || pointsPerDecade < 1) {
            throw new IllegalArgumentException("delay grid needs start < linear end < end, step > 0 and >= 1 point per decade");
        }
        TreeSet<Double> points = new TreeSet<>();
        int nLinear = (int) Math.floor((linearUntilS - startS) / linearStepS + 1e-9);
        for (int i = 0; i <= nLinear; i++) {
            points.add(startS + i * linearStepS);
        }
        double logStart = Math.log10(linearUntilS);
        double logEnd = Math.log10(endS);
        int n = (int) Math.ceil((logEnd - logStart) * pointsPerDecade);
        for (int i = 1; i <= n; i++) {
            points.add(Math.pow(10, logStart + (logEnd - logStart) * i / n));
        }
        return points.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** {@code count} delays log-spaced from {@code firstS} to {@code lastS} inclusive. */
    public static double[] logSpaced(double firstS, double lastS, int count) {
        positive(firstS, "first delay");
        if (!(lastS > firstS) || count < 2) {
            throw new IllegalArgumentException("log-spaced delays need first < last and at least 2 points");
        }
        double[] t = new double[count];
        double a = Math.log(firstS);
        double b = Math.log(lastS);
        for (int i = 0; i < count; i++) {
            t[i] = Math.exp(a + (b - a) * i / (count - 1));
        }
        t[0] = firstS;
        t[count - 1] = lastS;
        return t;
    }

    /**
     * Travel of a retro-reflecting delay stage for a delay: the beam passes the moving stage twice, so a displacement
     * d adds a path 2d and a delay 2d/c; d = c·t/2.
     */
    public static double stageTravelM(double delayS) {
        return PhysicalConstants.SPEED_OF_LIGHT_M_PER_S * delayS / 2;
    }

    /** Whether a TCSPC time range (or the repetition period) covers a decay: ≥ {@link #SETTLE_FACTOR} lifetimes. */
    public static Risk decayCovered(String name, double rangeS, double lifetimeS) {
        double ratio = rangeS / lifetimeS;
        Verdict v = ratio >= SETTLE_FACTOR ? Verdict.PASS : ratio >= 3 ? Verdict.WARN : Verdict.FAIL;
        return new Risk(name, v, ratio, SETTLE_FACTOR, "lifetimes",
                String.format(java.util.Locale.ROOT, "the window spans %.3g lifetimes; %.0f or more lets the decay finish"
                        + " (common practice, no source)", ratio, SETTLE_FACTOR));
    }

    /**
     * TCSPC pile-up: the detected photon rate should stay below a few percent of the repetition rate so that the
     * first-photon bias stays small (common practice, no source).
     */
    public static Risk pileUp(double detectedRateHz, double repetitionRateHz, double maxFraction) {
        double fraction = detectedRateHz / repetitionRateHz;
        return new Risk("TCSPC pile-up", Verdict.against(fraction, maxFraction, 0.5), fraction, maxFraction, "fraction",
                String.format(java.util.Locale.ROOT, "detected %.3g photons per pulse; keep below %.3g (common practice,"
                        + " no source) or attenuate the emission", fraction, maxFraction));
    }

    private static void positive(double v, String what) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be > 0 and finite, was " + v + " s");
        }
    }
}
