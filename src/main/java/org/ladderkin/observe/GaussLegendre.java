package org.ladderkin.observe;

import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * The 24-point Gauss–Legendre rule on [−1, 1] (Hipparchus), shared by the instrument-response convolutions of the
 * fitter and the design so both integrate the same way.
 */
public final class GaussLegendre {

    private static final double[] NODES;
    private static final double[] WEIGHTS;

    static {
        var rule = new GaussIntegratorFactory().legendre(24);
        NODES = new double[rule.getNumberOfPoints()];
        WEIGHTS = new double[rule.getNumberOfPoints()];
        for (int i = 0; i < NODES.length; i++) {
            NODES[i] = rule.getPoint(i);
            WEIGHTS[i] = rule.getWeight(i);
        }
    }

    private GaussLegendre() {
    }

    /** The 24 nodes (a copy). */
    public static double[] nodes24() {
        return NODES.clone();
    }

    /** The 24 weights, summing to 2 (a copy). */
    public static double[] weights24() {
        return WEIGHTS.clone();
    }
}
