package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import org.ladderkin.excite.QuantumYieldLaw;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.TimeWindows;
import org.ladderkin.units.Photon;

/**
 * Forecast of a carrier-multiplication measurement: the low-fluence early/late ratio A/B at each requested photon
 * energy, ideal (single pulse on fresh dots) and as a pulse train would show it. Residual excitation and trions from
 * photocharging add a fast component that inflates the apparent A/B at high repetition rates — the classic false
 * positive (static versus stirred samples differ several-fold: McGuire et al., Nano Lett. 10, 2049 (2010)).
 */
public final class MultiplicationForecast {

    /** Absorbed photons per dot of the low-fluence measurement. */
    public static final double LOW_FLUENCE_N = 0.05;

    private MultiplicationForecast() {
    }

    /**
     * @param law          quantum-yield law used as the expectation
     * @param firstExcitonJ E₁S (J)
     */
    public static List<MultiplicationPrediction> forecast(KineticModel km, ModelAssumptions model, QuantumYieldLaw law,
                                                          double firstExcitonJ, List<Double> photonEnergiesJ,
                                                          List<Double> offeredWavelengthsM, double chosenPeriodS,
                                                          double fullRatePeriodS) {
        TimeWindows.EarlyLate w = TimeWindows.earlyLate(model.coolingS(), model.tauBiexcitonS(), model.tauSingleExcitonS());
        double[] delays = {w.earlyS(), w.lateS()};
        List<MultiplicationPrediction> out = new ArrayList<>();
        for (double e : photonEnergiesJ) {
            double eta = law.eta(e);
            PulseExcitation pulse = new PulseExcitation.Multiplication(LOW_FLUENCE_N, eta);
            LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
            double[] single = kin.singlePulse(pulse, delays).bleach();
            SteadyState chosen = kin.steadyState(pulse, chosenPeriodS, false);
            SteadyState full = kin.steadyState(pulse, fullRatePeriodS, false);
            boolean offered = offeredWavelengthsM.stream().anyMatch(wl -> Math.abs(Photon.energyJ(wl) / e - 1) < 0.01);
            out.add(new MultiplicationPrediction(e, e / firstExcitonJ, eta, single[0] / single[1],
                    apparent(kin, chosen, delays), apparent(kin, full, delays), chosen.chargedFraction(),
                    full.chargedFraction(), offered));
        }
        return List.copyOf(out);
    }

    /** A/B with the signal just before the pulse (what negative delays show) subtracted from both. */
    private static double apparent(LadderKinetics kin, SteadyState ss, double[] delays) {
        double[] b = kin.trace(ss.afterPulse(), delays).bleach();
        double baseline = ss.beforePulse().expectation(kin.bleachObservable());
        return (b[0] - baseline) / (b[1] - baseline);
    }

    /**
     * The expectation used when the plan gives no law: quantum yield 1 + (ħω − E_th)/ε_eh above E_th, with
     * E_th = 2.5·E₁S and ε_eh = 1.5·E₁S — an illustration of the published threshold-linear shape (Beard et al.,
     * Nano Lett. 10, 3019 (2010), numbers from memory), to be replaced by the user's own expectation.
     */
    public static QuantumYieldLaw defaultLaw(double firstExcitonJ) {
        return new QuantumYieldLaw.ThresholdLinear(2.5 * firstExcitonJ, 1.5 * firstExcitonJ);
    }
}
