package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Sees every evaluation of one optimiser run: keeps the lowest χ² met (with the point and the evaluation, so an
 * optimiser stopped at its limit or cancelled still leaves its best), tells the progress listener of each new best
 * (reduced χ² against the data's noise, shared values), and keeps the bests' history to tell which parameters
 * were still moving when the run stopped.
 */
final class BestSoFar {

    private final Projection p;
    private final double[] target;
    private final FitProgress progress;
    private final int[] evaluations;
    private final double reportBelow;
    private final List<double[]> history = new ArrayList<>();
    private final List<Integer> historyAt = new ArrayList<>();
    private int mine;
    double[] bestU;
    Projection.Evaluation bestAt;
    double bestChi2 = Double.POSITIVE_INFINITY;

    /**
     * @param evaluations a counter shared by every start of one fit
     * @param reportBelow a χ² an earlier start reached: only better points are told as the fit's best
     */
    BestSoFar(Projection p, FitProgress progress, int[] evaluations, double reportBelow) {
        this.p = p;
        this.target = p.target();
        this.progress = progress;
        this.evaluations = evaluations;
        this.reportBelow = reportBelow;
    }

    void offer(double[] u, Projection.Evaluation e) {
        evaluations[0]++;
        mine++;
        double c = GlobalFitter.chiSquare(e.value, target);
        if (!(c < bestChi2)) {
            return;
        }
        bestChi2 = c;
        bestU = u.clone();
        bestAt = e;
        history.add(u.clone());
        historyAt.add(mine);
        if (c < reportBelow) {
            progress.improved(new FitProgress.Best(evaluations[0], reduced(e), shared(u)));
        }
    }

    private double reduced(Projection.Evaluation e) {
        double[][] r = new double[p.traces][];
        for (int i = 0; i < p.traces; i++) {
            r[i] = new double[p.offset[i + 1] - p.offset[i]];
            for (int j = 0; j < r[i].length; j++) {
                r[i][j] = target[p.offset[i] + j] - e.value[p.offset[i] + j];
            }
        }
        return FitQuality.reducedChiSquare(r, p.weighted, p.points - p.freeCount());
    }

    private Map<String, Double> shared(double[] u) {
        double[][] phys = p.physical(u);
        Map<String, Double> v = new java.util.LinkedHashMap<>();
        for (int s = 0; s < p.specs.size(); s++) {
            if (p.specs.get(s).scope() == ParameterSpec.Scope.SHARED) {
                v.put(p.specs.get(s).key(), phys[s][0]);
            }
        }
        return v;
    }

    /** The best point as a run (its iteration count is not known: the optimiser stopped without an optimum). */
    GlobalFitter.Run run() {
        return new GlobalFitter.Run(p, bestU, bestAt, bestChi2, 0, mine);
    }

    /**
     * Free shared parameters whose best value changed by more than 1 % over the last fifth of the run's
     * evaluations, as "τ_rad (+35 %)".
     */
    List<String> stillMoving() {
        List<String> moving = new ArrayList<>();
        if (history.size() < 2) {
            return moving;
        }
        int since = (int) Math.floor(0.8 * mine);
        int earlier = 0;
        for (int h = 0; h < history.size(); h++) {
            if (historyAt.get(h) <= since) {
                earlier = h;
            }
        }
        double[][] then = p.physical(history.get(earlier));
        double[][] now = p.physical(bestU);
        for (Projection.Slot slot : p.slots) {
            double a = then[slot.spec()][Math.max(slot.trace(), 0)];
            double b = now[slot.spec()][Math.max(slot.trace(), 0)];
            double change = a != 0 ? (b - a) / Math.abs(a) : b;
            if (Math.abs(change) > 0.01) {
                moving.add(ParameterNaming.label(slot.label()).symbol() + String.format(java.util.Locale.ROOT, " (%+.0f %%)", 100 * change));
            }
        }
        return moving;
    }
}
