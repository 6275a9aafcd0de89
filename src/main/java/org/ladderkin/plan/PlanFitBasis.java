package org.ladderkin.plan;

import java.util.EnumSet;
import java.util.Objects;
import java.util.Set;
import org.ladderkin.kinetics.ModelParameters;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.state.Charge;

/**
 * What a fit of measured traces takes from the plan being edited: the plan's ladder as fit parameters, the pulse
 * period at the plan's chosen repetition rate, the chosen pump wavelength, and the excitation scales the plan implies
 * (σ at that wavelength; probe-averaged ⟨N⟩ per joule of pulse energy), so that "before a fit" the traces are drawn
 * over the plan's own prediction.
 *
 * @param base                the plan's ladder as {@link ModelParameters}, the same rate laws as
 *                            {@link ModelAssumptions#kineticModel(int)}
 * @param model               the plan's model values (τ₁, QY, τ₂ …)
 * @param repetitionRateHz    the plan's chosen repetition rate (Hz)
 * @param pumpWavelengthM     the plan's chosen pump wavelength (m)
 * @param crossSectionM2      σ at that wavelength (m²)
 * @param occupancyPerJ       probe-averaged ⟨N⟩ per joule of pulse energy at that wavelength and rate
 */
public record PlanFitBasis(ModelParameters base, ModelAssumptions model, double repetitionRateHz, double pumpWavelengthM,
                           double crossSectionM2, double occupancyPerJ) {

    public PlanFitBasis {
        Objects.requireNonNull(base, "base");
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
        return new PlanFitBasis(parameters(plan.model(), g), plan.model(), plan.chosenRate().repetitionRateHz(),
                plan.chosenWavelength().wavelengthM(), plan.chosenWavelength().crossSectionM2(),
                top.nProbeAveraged() / top.pulseEnergyJ());
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
    static ModelParameters parameters(ModelAssumptions m, int degeneracy) {
        boolean charged = m.ionisationProbability() > 0;
        Set<Charge> charges = charged ? EnumSet.of(Charge.NEGATIVE) : Set.of();
        return new ModelParameters(m.plQuantumYield() / m.tauSingleExcitonS(), m.radiativeScaling(),
                RadiativeDecay.DEFAULT_CHARGED_FACTOR, 1 / m.tauBiexcitonS(), m.augerScaling(), 1 / m.tauTrionNegativeS(),
                1 / m.tauTrionPositiveS(), (1 - m.plQuantumYield()) / m.tauSingleExcitonS(), 0, charges,
                charged ? new AugerIonisation(m.ionisationProbability(), Charge.NEGATIVE) : AugerIonisation.NONE,
                1 / m.neutralisationS(), Double.isFinite(m.refreshS()) ? 1 / m.refreshS() : 0, degeneracy, 0);
    }
}
