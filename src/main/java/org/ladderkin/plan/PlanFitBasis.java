package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.ladderkin.excite.ExcitationGeometry;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.excite.Pulse;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.ChargingProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.ProcessSpec;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.process.RefreshProcess;
import org.ladderkin.kinetics.process.TrappingProcess;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.state.Charge;

/**
 * What a fit of measured traces takes from the plan being edited: the plan's ladder as fit parameters, the pulse
 * period at the plan's chosen repetition rate, the chosen pump wavelength, and the excitation scales the plan implies
 * (σ at that wavelength; probe-averaged ⟨N⟩ per joule of pulse energy), so that "before a fit" the traces are drawn
 * over the plan's own prediction.
 *
 * @param base                the plan's ladder as a {@link LadderModel}, the same rate laws as
 *                            {@link ModelAssumptions#kineticModel(int)}
 * @param model               the plan's model values (τ₁, QY, τ₂ …)
 * @param repetitionRateHz    the plan's chosen repetition rate (Hz)
 * @param pumpWavelengthM     the plan's chosen pump wavelength (m)
 * @param crossSectionM2      σ at that wavelength (m²)
 * @param occupancyPerJ       probe-averaged ⟨N⟩ per joule of pulse energy at that wavelength and rate
 * @param geometry            the plan's pump and probe spots (Gaussian) and the sample's absorbance at the chosen pump
 *                            wavelength, depth-averaged as the planner averages
 * @param fluenceScaleRel     relative uncertainty of the fluence scale the plan's calibration implies (pulse energy and
 *                            both radii, as the fluence series' ⟨N⟩ budget counts them, without σ: a fit measures σ,
 *                            so its law's scatter is no error of the fit)
 */
public record PlanFitBasis(LadderModel base, ModelAssumptions model, double repetitionRateHz, double pumpWavelengthM,
                           double crossSectionM2, double occupancyPerJ, ExcitationGeometry geometry,
                           double fluenceScaleRel) {

    public PlanFitBasis {
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(geometry, "geometry");
        Objects.requireNonNull(model, "model");
        if (!(repetitionRateHz > 0) || !(pumpWavelengthM > 0) || !(crossSectionM2 > 0) || !(occupancyPerJ > 0)) {
            throw new IllegalArgumentException("plan basis needs positive rate, wavelength, σ and ⟨N⟩ per J, were "
                    + repetitionRateHz + " Hz, " + pumpWavelengthM + " m, " + crossSectionM2 + " m², " + occupancyPerJ + " /J");
        }
    }

    /** Plans {@code inputs} (without the design search) and reads the basis off the result. */
    public static PlanFitBasis of(PlanInputs inputs) {
        CampaignPlan plan = Planner.plan(inputs, Planner.Progress.NONE, false);
        int g = (int) Math.round(inputs.sample().material().electronDegeneracy().value());
        FluencePoint top = plan.fluences().get(plan.fluences().size() - 1);
        double wavelengthM = plan.chosenWavelength().wavelengthM();
        ExcitationGeometry geometry = org.ladderkin.excite.Excitation.of(inputs.sample(), new Pulse(top.pulseEnergyJ(),
                wavelengthM, plan.chosenRate().repetitionRateHz()), new GaussianBeam(inputs.laser().pumpRadiusM()),
                new GaussianBeam(inputs.laser().probeRadiusM()), true).geometry();
        return new PlanFitBasis(parameters(plan.model(), g), plan.model(), plan.chosenRate().repetitionRateHz(),
                wavelengthM, plan.chosenWavelength().crossSectionM2(), top.nProbeAveraged() / top.pulseEnergyJ(), geometry,
                withoutCrossSection(top));
    }

    /** The ⟨N⟩ budget of {@code top} without σ's share. */
    private static double withoutCrossSection(FluencePoint top) {
        double sum = 0;
        for (var item : top.nAvgBudget().items()) {
            if (!item.source().startsWith("cross-section")) {
                sum += item.rel() * item.rel();
            }
        }
        return Math.sqrt(sum);
    }

    /** Pulse period at the chosen rate (s). */
    public double periodS() {
        return 1 / repetitionRateHz;
    }

    /**
     * The plan's model as flat fit parameters. The plan splits its single-exciton lifetime τ₁ by the PL quantum yield
     * into a radiative rate QY/τ₁ and a trapping rate (1 − QY)/τ₁; hot excitons are not resolved (the plan's model
     * cools instantly).
     */
    static LadderModel parameters(ModelAssumptions m, int degeneracy) {
        List<ProcessSpec> processes = new ArrayList<>();
        processes.add(new RadiativeProcess(m.tauSingleExcitonS() / m.plQuantumYield(), m.radiativeScaling(),
                RadiativeDecay.DEFAULT_CHARGED_FACTOR));
        processes.add(new AugerProcess(m.tauBiexcitonS(), m.augerScaling(), m.tauTrionNegativeS(), m.tauTrionPositiveS()));
        if (m.plQuantumYield() < 1) {
            processes.add(new TrappingProcess(m.tauSingleExcitonS() / (1 - m.plQuantumYield())));
        }
        if (m.ionisationProbability() > 0) {
            processes.add(new ChargingProcess(Set.of(Charge.NEGATIVE),
                    new AugerIonisation(m.ionisationProbability(), Charge.NEGATIVE), m.neutralisationS()));
        }
        if (Double.isFinite(m.refreshS())) {
            processes.add(new RefreshProcess(m.refreshS()));
        }
        processes.addAll(m.processes());
        return new LadderModel(processes, degeneracy, 0);
    }
}
