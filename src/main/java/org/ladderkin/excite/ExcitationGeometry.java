package org.ladderkin.excite;

import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

/**
 * Pump and probe spots and the pump's attenuation through the sample: everything that turns ⟨N⟩ on the pump axis at the
 * front face into what the probe sees.
 *
 * @param pump          pump profile
 * @param probe         probe profile (its weight over the pump spot)
 * @param absorbance    decadic absorbance of the sample at the pump wavelength over the path (OD)
 * @param depthAveraged whether to average over depth (false: front face only, the optically thin picture)
 */
public record ExcitationGeometry(BeamProfile pump, BeamProfile probe, double absorbance, boolean depthAveraged) {

    public ExcitationGeometry {
        Objects.requireNonNull(pump, "pump");
        Objects.requireNonNull(probe, "probe");
        if (!(absorbance >= 0) || !Double.isFinite(absorbance)) {
            throw new IllegalArgumentException("absorbance must be >= 0 and finite, was " + absorbance + " OD");
        }
    }

    /** Probe-weighted ⟨N⟩ over the spot and (if enabled) the depth, per unit on-axis front-face ⟨N⟩; closed form. */
    public double linearFactor() {
        return SpotAverage.linearFactor(pump, probe) * (depthAveraged ? DepthAverage.linearFactor(absorbance) : 1);
    }

    /**
     * Probe-weighted average of a response f(N) over the spot and (if enabled) the depth, by quadrature. Use it for
     * nonlinear responses such as the excited fraction 1 − e^(−N); for f(N) = N it equals {@code nPeak·linearFactor()}.
     */
    public double average(DoubleUnaryOperator f, double nPeak) {
        if (!depthAveraged || absorbance == 0) {
            return SpotAverage.average(pump, probe, f, nPeak);
        }
        return UnitQuadrature.integrate(t -> SpotAverage.average(pump, probe, f, nPeak * Math.pow(10, -absorbance * t)));
    }
}
