package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The threshold-linear law across photon energies, against a straight-line weighted least squares done by hand. */
class ThresholdLawFitTest {

    /** Invented truth for the simulation: threshold 2.6 E_g, 1.5 E_g per further pair. */
    private static final double A = 2.6;
    private static final double B = 1.5;
    private static final double[] X = {1.9, 2.4, 2.9, 3.3, 3.7, 4.1};
    private static final double[] SE = {0.03, 0.03, 0.04, 0.04, 0.05, 0.06};

    static List<ThresholdLawFit.Point> simulated(long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<ThresholdLawFit.Point> pts = new ArrayList<>();
        for (int i = 0; i < X.length; i++) {
            double qy = ThresholdLawFit.law(A, B, X[i]) + SE[i] * SyntheticSeries.gaussian(rng);
            pts.add(new ThresholdLawFit.Point(X[i], qy, SE[i], "e" + i));
        }
        return pts;
    }

    @Test
    @CheckedAgainst(source = "closed form derived here: weighted straight line through the points above the threshold "
            + "(centred normal equations: slope = Σw(x−x̄)(y−ȳ)/Σw(x−x̄)², var(slope) = 1/Σw(x−x̄)², var(ȳ) = 1/Σw), "
            + "carried to E_th = x̄ + (1 − ȳ)/slope and ε_eh = 1/slope by the delta method",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void matchesAStraightLineFitByHandInTheLinearRegion() {
        List<ThresholdLawFit.Point> pts = simulated(3);
        ThresholdLawFit.Result r = ThresholdLawFit.fit(pts);
        List<ThresholdLawFit.Point> above = pts.stream().filter(p -> p.photonEnergyOverGap() >= r.thresholdOverGap()).toList();
        assertThat(above).hasSize(r.pointsAbove());
        double sw = 0;
        double swx = 0;
        double swy = 0;
        for (ThresholdLawFit.Point p : above) {
            double w = 1 / (p.stdError() * p.stdError());
            sw += w;
            swx += w * p.photonEnergyOverGap();
            swy += w * p.quantumYield();
        }
        double xBar = swx / sw;
        double yBar = swy / sw;
        double sxx = 0;
        double sxy = 0;
        for (ThresholdLawFit.Point p : above) {
            double w = 1 / (p.stdError() * p.stdError());
            sxx += w * (p.photonEnergyOverGap() - xBar) * (p.photonEnergyOverGap() - xBar);
            sxy += w * (p.photonEnergyOverGap() - xBar) * (p.quantumYield() - yBar);
        }
        double slope = sxy / sxx;
        double threshold = xBar + (1 - yBar) / slope;
        // ȳ and the slope are uncorrelated in the centred form: a = x̄ + (1 − ȳ)/c₁
        double varSlope = 1 / sxx;
        double varYBar = 1 / sw;
        double seThreshold = Math.sqrt(varYBar / (slope * slope) + Math.pow((1 - yBar) / (slope * slope), 2) * varSlope);
        double sePair = Math.sqrt(varSlope) / (slope * slope);
        Reference.checkRelative("E_th/E_g against the hand-made straight-line fit", r.thresholdOverGap(), threshold, 1e-10);
        Reference.checkRelative("ε_eh/E_g against the hand-made straight-line fit", r.pairEnergyOverGap(), 1 / slope, 1e-10);
        Reference.checkRelative("standard error of E_th/E_g", r.thresholdStdError(), seThreshold, 1e-8);
        Reference.checkRelative("standard error of ε_eh/E_g", r.pairEnergyStdError(), sePair, 1e-8);
        Reference.checkRelative("η_CM = E_g/ε_eh", r.efficiency(), slope, 1e-10);
    }

    @Test
    @CheckedAgainst(source = "closed form: yields simulated from the threshold-linear law itself with Gaussian errors; a "
            + "normal estimate lies within 3 standard errors with probability 0.997", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void recoversThresholdAndPairCreationEnergyFromSixEnergiesWithinThreeStandardErrors() {
        ThresholdLawFit.Result r = ThresholdLawFit.fit(simulated(5));
        Reference.check("E_th/E_g from six simulated yields", r.thresholdOverGap(), A, 3 * r.thresholdStdError());
        Reference.check("ε_eh/E_g from six simulated yields", r.pairEnergyOverGap(), B, 3 * r.pairEnergyStdError());
        assertThat(r.thresholdStdError()).isLessThan(0.3);
        assertThat(r.points()).hasSize(6);
        assertThat(r.quantumYield(1.9)).isEqualTo(1.0);
    }

    @Test
    void yieldsThatDoNotRiseAreRefusedWithAReason() {
        List<ThresholdLawFit.Point> flat = List.of(new ThresholdLawFit.Point(2, 1.2, 0.05, "a"),
                new ThresholdLawFit.Point(3, 1.1, 0.05, "b"), new ThresholdLawFit.Point(4, 1.0, 0.05, "c"));
        assertThatThrownBy(() -> ThresholdLawFit.fit(flat)).hasMessageContaining("do not rise");
        assertThatThrownBy(() -> ThresholdLawFit.fit(flat.subList(0, 2))).hasMessageContaining("three or more");
    }
}
