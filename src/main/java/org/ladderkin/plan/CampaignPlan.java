package org.ladderkin.plan;

import java.util.List;
import org.ladderkin.observe.Risk;

/**
 * A campaign plan: the settings to dial in, the evidence behind them and the risks.
 *
 * @param inputs        what the plan file said
 * @param model         the kinetic model the predictions assume
 * @param wavelengths   every pump wavelength, judged (best first)
 * @param rates         every repetition rate the picker offers, judged at the series' highest ⟨N⟩
 * @param chosenRate    the fastest rate within the limits (or the slowest available when none is)
 * @param rateChoice    how the rate was chosen (the rule and what it did for this plan), one or two sentences
 * @param fluences      the fluence series at the chosen wavelength
 * @param heat          heating at the series' highest ⟨N⟩ and the chosen rate
 * @param design        optimal-design search, or null when no TA goal parameter applies
 * @param delayPlans    per instrument
 * @param multiplication carrier-multiplication forecast per requested photon energy (empty without that goal)
 * @param predictions   predicted signals
 * @param risks         risk table
 * @param advisories    concerns about the inputs (probe larger than pump, approximate cross-section ...)
 * @param cautions      safety cautions that apply (worded by the report)
 * @param gain          the optical-gain goal's threshold, gain lifetime and heating; null when gain is not a goal
 * @param multiplicationPlan the carrier-multiplication measurement (reference, pumps, A/B series and its errors); null
 *                      when multiplication is not a goal or there is no transient absorption
 */
public record CampaignPlan(PlanInputs inputs, ModelAssumptions model, List<WavelengthOption> wavelengths,
                           List<RateOption> rates, RateOption chosenRate, String rateChoice, List<FluencePoint> fluences, HeatBudget heat,
                           DesignSearch.Result design, List<DelayPlan> delayPlans,
                           List<MultiplicationPrediction> multiplication, Predictions predictions,
                           List<Risk> risks, List<String> advisories, List<Caution> cautions, GainPlan gain,
                           MultiplicationPlan multiplicationPlan) {

    public CampaignPlan {
        java.util.Objects.requireNonNull(rateChoice, "rateChoice");
        if (fluences.isEmpty()) {
            throw new IllegalArgumentException("a campaign plan needs at least one fluence");
        }
        wavelengths = List.copyOf(wavelengths);
        rates = List.copyOf(rates);
        fluences = List.copyOf(fluences);
        delayPlans = List.copyOf(delayPlans);
        multiplication = List.copyOf(multiplication);
        risks = List.copyOf(risks);
        advisories = List.copyOf(advisories);
        cautions = List.copyOf(cautions);
    }

    /** The series' highest setting: the fluence every "at the highest fluence" number is evaluated at. */
    public FluencePoint highestFluence() {
        return fluences.get(fluences.size() - 1);
    }

    /** The chosen pump wavelength (the best-ranked). */
    public WavelengthOption chosenWavelength() {
        return wavelengths.get(0);
    }
}
