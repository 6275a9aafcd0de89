package org.ladderkin.excite;

import java.util.ArrayList;
import java.util.List;

/**
 * How the calibration's uncertainties reach ⟨N⟩ and the photon fluence: first-order propagation with the logarithmic
 * sensitivities of the excitation model itself (∂ln⟨N⟩/∂ln x by central differences of {@link Excitation}), so a
 * probe larger or smaller than the pump, a flat top or an optically thick sample weigh each input as they should.
 * The absorbance is a measurement, so a different σ scale changes the concentration inferred from it, not the
 * pump's attenuation: only ⟨N⟩ ∝ σ moves.
 */
public final class OccupancyUncertainty {

    private static final double STEP = 1e-4;

    private OccupancyUncertainty() {
    }

    /**
     * The two budgets of one excitation.
     *
     * @param nAvgProbeWeighted probe- and depth-averaged ⟨N⟩
     * @param photonFluencePeak peak photon fluence on the axis
     */
    public record Result(RelativeBudget nAvgProbeWeighted, RelativeBudget photonFluencePeak) {
    }

    /**
     * @param e   the excitation
     * @param cal stated uncertainties (use {@link Calibration#orDefaults()} first for defaults)
     * @param crossSectionRel σ's relative uncertainty to use when {@code cal} states none (NaN: leave σ out)
     */
    public static Result of(Excitation e, Calibration cal, double crossSectionRel) {
        ExcitationGeometry g = e.geometry();
        double pumpSens = logSlope(r -> nAvg(e, scaled(g.pump(), r), g.probe()));
        double probeSens = logSlope(r -> nAvg(e, g.pump(), scaled(g.probe(), r)));
        double fluenceSens = logSlope(r -> scaled(g.pump(), r).peakFluencePerJoule());
        List<RelativeBudget.Item> n = new ArrayList<>();
        List<RelativeBudget.Item> j = new ArrayList<>();
        add(n, "pulse energy", cal.pulseEnergyRel(), 1);
        add(j, "pulse energy", cal.pulseEnergyRel(), 1);
        add(n, "pump radius", cal.pumpRadiusRel(), pumpSens);
        add(j, "pump radius", cal.pumpRadiusRel(), fluenceSens);
        add(n, "probe radius", cal.probeRadiusRel(), probeSens);
        double sigmaRel = Double.isNaN(cal.crossSectionRel()) ? crossSectionRel : cal.crossSectionRel();
        add(n, "cross-section σ", sigmaRel, 1);
        return new Result(new RelativeBudget(n), new RelativeBudget(j));
    }

    private static void add(List<RelativeBudget.Item> out, String source, double rel, double sensitivity) {
        if (!Double.isNaN(rel)) {
            out.add(new RelativeBudget.Item(source, Math.abs(sensitivity) * rel));
        }
    }

    private static double nAvg(Excitation e, BeamProfile pump, BeamProfile probe) {
        ExcitationGeometry g = new ExcitationGeometry(pump, probe, e.geometry().absorbance(), e.geometry().depthAveraged());
        return e.nAvgPeak() / e.geometry().pump().peakFluencePerJoule() * pump.peakFluencePerJoule() * g.linearFactor();
    }

    private static double logSlope(java.util.function.DoubleUnaryOperator f) {
        double up = f.applyAsDouble(1 + STEP);
        double down = f.applyAsDouble(1 - STEP);
        return (Math.log(up) - Math.log(down)) / (Math.log1p(STEP) - Math.log1p(-STEP));
    }

    static BeamProfile scaled(BeamProfile b, double factor) {
        if (b instanceof GaussianBeam) {
            return new GaussianBeam(b.radiusM() * factor);
        }
        return new FlatTopBeam(b.radiusM() * factor);
    }
}
