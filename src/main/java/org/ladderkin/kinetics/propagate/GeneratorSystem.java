package org.ladderkin.kinetics.propagate;

/** dp/dt = Q·p for a constant generator Q, as a {@link StiffSystem} for the implicit integrator. */
public final class GeneratorSystem implements StiffSystem {

    private final double[][] q;

    /** @param q generator (rates in 1/s), copied */
    public GeneratorSystem(double[][] q) {
        this.q = new double[q.length][];
        for (int i = 0; i < q.length; i++) {
            if (q[i].length != q.length) {
                throw new IllegalArgumentException("generator must be square, row " + i + " has " + q[i].length + " entries");
            }
            this.q[i] = q[i].clone();
        }
    }

    @Override
    public int dimension() {
        return q.length;
    }

    @Override
    public void derivatives(double t, double[] y, double[] dydt) {
        for (int i = 0; i < q.length; i++) {
            double s = 0;
            double[] qi = q[i];
            for (int j = 0; j < qi.length; j++) {
                s += qi[j] * y[j];
            }
            dydt[i] = s;
        }
    }

    @Override
    public void jacobian(double t, double[] y, double[][] dfdy) {
        for (int i = 0; i < q.length; i++) {
            System.arraycopy(q[i], 0, dfdy[i], 0, q.length);
        }
    }

    @Override
    public boolean isLinear() {
        return true;
    }
}
