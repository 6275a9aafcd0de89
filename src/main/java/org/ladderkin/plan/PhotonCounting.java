package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.excite.Excitation;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.PhotonCountingStatistics;
import org.ladderkin.observe.Photoluminescence;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.TimeWindows;
import org.ladderkin.observe.Verdict;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * A photon-counting (TCSPC) decay planned from its count rate: the pump ⟨N⟩ well below 0.05 so that the decay is the
 * single exciton's, the detected photons per pulse held at the pile-up limit (by attenuating the detected emission
 * when the sample gives more), and the counts and acquisition time a target τ₁ precision needs from the Poisson
 * statistics of a mono-exponential decay ({@link PhotonCountingStatistics}).
 *
 * @param nAvg                 probe-averaged ⟨N⟩ the decay is recorded at
 * @param pulseEnergyJ         pump pulse energy for it (J)
 * @param reachable            whether the laser's energy range holds that pulse energy
 * @param emittedPerPulse      photons the sample would send to the detector per pulse without attenuation
 * @param detectionAttenuation factor the detected emission is attenuated by (1 = none)
 * @param detectedPerPulse     detected photons per pulse after attenuation (≤ the pile-up limit)
 * @param countRateHz          detected count rate (1/s)
 * @param windowS              decay window: the TCSPC range or the pulse period, whichever is shorter (s)
 * @param targetRel            relative τ₁ precision planned for
 * @param precisionFactor      F = (σ_τ/τ)·√counts for this window
 * @param counts               counts one decay needs
 * @param acquisitionS         acquisition time of one decay (s)
 * @param availableS           beam time available for it (s)
 * @param risks                the photon-counting risks (pile-up, time, window, IRF)
 * @param notPlanned           what this decay does not measure, in words
 */
public record PhotonCounting(double nAvg, double pulseEnergyJ, boolean reachable, double emittedPerPulse,
                             double detectionAttenuation, double detectedPerPulse, double countRateHz, double windowS,
                             double targetRel, double precisionFactor, double counts, double acquisitionS,
                             double availableS, List<Risk> risks, List<String> notPlanned) {

    /**
     * ⟨N⟩ a lifetime decay is recorded at: well below 0.05, so biexcitons come from about ⟨N⟩/2 = 0.5 % of the excited
     * dots (common practice, no source).
     */
    public static final double LIFETIME_N = 0.01;
    /** τ₁ precision planned for when the plan states none: 1 % (common practice, no source). */
    public static final double TARGET_REL = 0.01;
    /**
     * A decay that takes longer than this drifts with the laser power, the alignment and the sample (10 minutes:
     * common practice, no source).
     */
    public static final double SLOW_S = 600;
    /** The IRF should be at most this share of the fastest component fitted without deconvolution (common practice). */
    public static final double IRF_SHARE = 0.1;

    public PhotonCounting {
        risks = List.copyOf(risks);
        notPlanned = List.copyOf(notPlanned);
        if (!(nAvg > 0) || !(countRateHz > 0) || !(counts > 0) || !(acquisitionS > 0)) {
            throw new IllegalArgumentException("a photon-counting plan needs positive ⟨N⟩, count rate, counts and time, were "
                    + nAvg + ", " + countRateHz + " /s, " + counts + ", " + acquisitionS + " s");
        }
    }

    /** ⟨N⟩ a lifetime decay is recorded at with a laser that reaches at most {@code nMax} and at least {@code nMin}. */
    static double lifetimeN(double nMin, double nMax) {
        return Math.max(nMin, Math.min(LIFETIME_N, nMax));
    }

    /**
     * Plans one decay.
     *
     * @param inst        the TCSPC instrument
     * @param model       the plan's model
     * @param km          its kinetic model
     * @param atMax       the excitation at the laser's highest pulse energy and the chosen rate and wavelength
     * @param laser       the laser (energy range)
     * @param nAvg        ⟨N⟩ to record at
     * @param period      pulse period at the chosen rate (s)
     * @param availableS  beam time for this decay (s)
     */
    static PhotonCounting plan(Instrument inst, ModelAssumptions model, KineticModel km, Excitation atMax, LaserSetup laser,
                               double nAvg, double period, double availableS) {
        double nPerJ = atMax.nAvgProbeWeighted() / laser.maxPulseEnergyJ();
        double energy = nAvg / nPerJ;
        boolean reachable = energy <= laser.maxPulseEnergyJ() * (1 + 1e-9) && energy >= laser.minPulseEnergyJ() * (1 - 1e-9);
        PulseExcitation pulse = new PulseExcitation.Poisson(nAvg);
        LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
        SteadyState ss = kin.steadyState(pulse, period, false);
        double emittedPerDot = Photoluminescence.emittedPerPulse(kin, ss.afterPulse(), period);
        double emitted = emittedPerDot * atMax.withEnergyJ(energy).dotsInExcitedVolume() * Planner.TCSPC_COLLECTION_EFFICIENCY;
        double limit = inst.maxCountFraction();
        double attenuation = Math.max(1, emitted / limit);
        double detected = emitted / attenuation;
        double rate = detected / period;
        double window = Math.min(inst.maxDelayS(), period);
        double tau1 = model.tauSingleExcitonS();
        double f = PhotonCountingStatistics.precisionFactor(tau1, window);
        double counts = PhotonCountingStatistics.countsFor(tau1, window, TARGET_REL);
        double time = counts / rate;
        boolean slow = time > availableS || time > SLOW_S;
        List<Risk> risks = new ArrayList<>();
        risks.add(new Risk("TCSPC pile-up", Verdict.PASS, detected, limit, "photons per pulse", String.format(Locale.ROOT,
                "at ⟨N⟩ = %.3g the sample would give about %.3g detected photons per pulse (assuming %.0e collection × "
                        + "detection efficiency)%s; keep below %.3g per pulse (common practice, no source)", nAvg, emitted,
                Planner.TCSPC_COLLECTION_EFFICIENCY, attenuation > 1 ? String.format(Locale.ROOT,
                        ": attenuate the detected emission by %.3g× (ND %.1f), not the pump", attenuation,
                        Math.log10(attenuation)) : "", limit)));
        risks.add(new Risk("TCSPC acquisition time", slow ? Verdict.WARN : Verdict.PASS, time, Math.min(availableS, SLOW_S), "s",
                String.format(Locale.ROOT, "%.3g counts give τ₁ to %.2g %% (F = %.3g for a %s window); at %.3g detected "
                                + "counts/s they take %s of the %s available%s", counts, 100 * TARGET_REL, f,
                        fmt(window, Dimension.TIME), rate, fmt(time, Dimension.TIME),
                        fmt(availableS, Dimension.TIME), slow ? String.format(Locale.ROOT, ": slow (over %s or the time "
                                + "available) — the count rate is capped at %.3g of %s pulses; a faster source (MHz) shortens "
                                + "it", fmt(SLOW_S, Dimension.TIME), limit, fmt(1 / period, Dimension.FREQUENCY)) : "")));
        risks.add(TimeWindows.decayCovered("TCSPC range vs τ₁", inst.maxDelayS(), tau1));
        risks.add(TimeWindows.decayCovered("pulse period vs τ₁", period, tau1));
        double irf = inst.irfFwhmS();
        risks.add(new Risk("IRF vs τ₁", irf > IRF_SHARE * tau1 ? Verdict.WARN : Verdict.PASS, irf / tau1, IRF_SHARE, "τ₁",
                String.format(Locale.ROOT, "IRF %s against τ₁ = %s%s", fmt(irf, Dimension.TIME), fmt(tau1, Dimension.TIME),
                        irf > IRF_SHARE * tau1 ? ": fit with the IRF convolved (reconvolution)" : "; a tail fit after the IRF is enough")));
        if (!reachable) {
            risks.add(new Risk("TCSPC pulse energy within the laser's range", Verdict.FAIL, energy, laser.maxPulseEnergyJ(), "J",
                    "the decay's ⟨N⟩ needs " + fmt(energy, Dimension.ENERGY) + ", outside the laser's range"));
        }
        List<String> notPlanned = new ArrayList<>();
        if (model.tauBiexcitonS() < irf) {
            notPlanned.add(String.format(Locale.ROOT, "the biexciton decay (τ₂ = %s) is shorter than the IRF (%s): not "
                    + "resolved by photon counting; measure it by transient absorption", fmt(model.tauBiexcitonS(), Dimension.TIME),
                    fmt(irf, Dimension.TIME)));
        } else {
            notPlanned.add("a PL fluence series for τ₂ (only the low-⟨N⟩ lifetime decay is planned)");
        }
        return new PhotonCounting(nAvg, energy, reachable, emitted, attenuation, detected, rate, window, TARGET_REL, f, counts,
                time, availableS, risks, notPlanned);
    }

    private static String fmt(double si, Dimension d) {
        return Quantity.formatBest(si, d, 3);
    }
}
