package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.excite.Excitation;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.observe.GainThreshold;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * The optical-gain goal: the ⟨N⟩ and fluence at which the band edge turns from absorption to gain (Poisson excitation,
 * two-level filling of the g-fold edge), how long the gain lasts at the series' top against the Auger lifetime, and the
 * heating of one pulse and of the train.
 *
 * @param degeneracy            g of the band edge
 * @param thresholdN            probe-averaged ⟨N⟩ at transparency without a biexciton shift (a plain dot)
 * @param thresholdShiftedN     the same with the sample's biexciton shift Δ_XX over its line width when the sample
 *                              gives one beyond the line width (a core/shell dot), else with a repulsive biexciton
 *                              shifted far beyond the line width (a lower bound)
 * @param shiftOverWidth        the sample's Δ_XX over the line's standard deviation, NaN for a plain dot; applied to the
 *                              threshold only when larger than 1 in size
 * @param thresholdEnergyJ      pump pulse energy for the planned threshold: {@code thresholdShiftedN} when the sample
 *                              gives Δ_XX, else {@code thresholdN} (J)
 * @param thresholdFluenceJPerM2 peak pump fluence for the planned threshold (J/m²)
 * @param thresholdReachable    whether the laser reaches it
 * @param gainAtN               ⟨N⟩ the gain lifetime is evaluated at (the series' top, at least twice the threshold)
 * @param gainLifetimeS         how long the band edge stays above transparency after that pulse (s)
 * @param augerLifetimeS        the biexciton Auger lifetime τ₂ (s)
 * @param perPulseRiseK         temperature rise of the excited volume from one pulse at the series' top (K)
 * @param steadyRiseK           steady-state rise at the chosen rate (K)
 * @param risks                 the gain mode's risks
 * @param notPlanned            what the plan does not cover, in words
 */
public record GainPlan(int degeneracy, double thresholdN, double thresholdShiftedN, double shiftOverWidth, double thresholdEnergyJ,
                       double thresholdFluenceJPerM2, boolean thresholdReachable, double gainAtN, double gainLifetimeS,
                       double augerLifetimeS, double perPulseRiseK, double steadyRiseK, List<Risk> risks,
                       List<String> notPlanned) {

    /** Δ/w standing for a biexciton shift far beyond the line width. */
    static final double FAR_SHIFT = 40;

    public GainPlan {
        risks = List.copyOf(risks);
        notPlanned = List.copyOf(notPlanned);
        if (!(thresholdN > 0) || !(thresholdEnergyJ > 0) || !(gainAtN > 0)) {
            throw new IllegalArgumentException("a gain plan needs positive threshold ⟨N⟩, energy and evaluation ⟨N⟩");
        }
    }

    /** Whether the planned threshold rests on the sample's biexciton shift (|Δ_XX| beyond the line width). */
    public boolean shiftApplied() {
        return Math.abs(shiftOverWidth) > 1;
    }

    static GainPlan of(int g, KineticModel km, ModelAssumptions model, Excitation atChosenRate, LaserSetup laser,
                       double nTop, HeatBudget heat, Limits limits, boolean film) {
        double nPlain = GainThreshold.poissonThreshold(g);
        double shiftOverWidth = model.hasBiexcitonShift() ? model.biexcitonShiftJ() / model.lineWidthJ() : Double.NaN;
        // within the line width the shifted lines overlap their unshifted partners and the lowering would rest on the
        // far tails of the assumed Gaussian lines alone
        boolean shifted = Math.abs(shiftOverWidth) > 1;
        double nShift = GainThreshold.poissonThreshold(g, shifted ? shiftOverWidth : FAR_SHIFT);
        // a core/shell's own Δ_XX sets the threshold the plan aims at; a plain dot keeps the unshifted one
        double nTh = shifted ? nShift : nPlain;
        double nPerJ = atChosenRate.nAvgProbeWeighted() / atChosenRate.pulse().energyJ();
        double energy = nTh / nPerJ;
        Excitation atTh = atChosenRate.withEnergyJ(energy);
        double fluence = atTh.photonFluencePeakPerM2() * atTh.pulse().photonEnergyJ();
        boolean reachable = energy <= laser.maxPulseEnergyJ() * (1 + 1e-9) && energy >= laser.minPulseEnergyJ() * (1 - 1e-9);
        double at = Math.max(nTop, 2 * nTh);
        PulseExcitation pulse = new PulseExcitation.Poisson(at);
        LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
        Populations after = kin.applyPulse(Populations.ground(kin.space()), pulse);
        double life = GainThreshold.gainLifetimeS(kin, after, g);
        List<Risk> risks = new ArrayList<>();
        risks.add(new Risk("gain threshold within the laser's range", reachable ? Verdict.PASS : Verdict.FAIL, energy,
                laser.maxPulseEnergyJ(), "J", String.format(Locale.ROOT, "transparency at ⟨N⟩ = %.3g needs %s per pulse "
                        + "(%.3g µJ/cm² peak)", nTh, fmt(energy, Dimension.ENERGY), fluence * 100)));
        if (nTop < nTh) {
            risks.add(new Risk("series reaches the gain threshold", Verdict.FAIL, nTop, nTh, "⟨N⟩", String.format(Locale.ROOT,
                    "the series stops at ⟨N⟩ = %.3g, below the threshold %.3g", nTop, nTh)));
        }
        double tau2 = model.tauBiexcitonS();
        risks.add(new Risk("gain lifetime vs Auger", life < tau2 ? Verdict.WARN : Verdict.PASS, life, tau2, "s",
                String.format(Locale.ROOT, "at ⟨N⟩ = %.3g the gain lasts %s against τ₂ = %s%s", at, fmt(life, Dimension.TIME),
                        fmt(tau2, Dimension.TIME), life < tau2 ? ": Auger recombination ends the gain; probe within it "
                                + "(a delay grid dense below τ₂)" : "")));
        double perPulse = heat.perPulseRiseK();
        if (Double.isFinite(perPulse)) {
            Verdict v = Verdict.against(perPulse, limits.maxTemperatureRiseK(), 0.5);
            risks.add(new Risk("per-pulse heating", v, perPulse, limits.maxTemperatureRiseK(), "K", String.format(Locale.ROOT,
                    "one pulse at the series' top raises the excited %s by %.3g K (limit %.3g K)%s", film ? "film" : "volume",
                    perPulse, limits.maxTemperatureRiseK(), v == Verdict.PASS ? "" : film
                            ? ": lower the top fluence, or spread the pump over a larger spot and translate the film"
                            : ": lower the top fluence")));
        }
        List<String> notPlanned = new ArrayList<>();
        if (model.hasBiexcitonShift() && !shifted) {
            notPlanned.add(String.format(Locale.ROOT, "the core/shell's biexciton shift (%.2g line widths, within the line): "
                    + "the threshold is the unshifted one; a shift beyond the line width would lower it towards ⟨N⟩ = %.3g",
                    shiftOverWidth, nShift));
        } else if (!shifted) {
            notPlanned.add(String.format(Locale.ROOT, "the biexciton shift (no value in the library; a repulsive shift far "
                    + "beyond the line width lowers the threshold to ⟨N⟩ = %.3g): measure it and give the threshold again",
                    nShift));
        }
        notPlanned.add("losses: a lasing threshold lies above this transparency point by the cavity or waveguide loss");
        if (film && !Double.isFinite(model.refreshS())) {
            notPlanned.add("refresh of a static film: give \"refresh\": {\"mode\": \"translated\", \"speed\": ...} "
                    + "if it is moved under the beam (the plan models it as static)");
        }
        return new GainPlan(g, nPlain, nShift, shiftOverWidth, energy, fluence, reachable, at, life, tau2, perPulse, heat.steadyRiseK(), risks,
                notPlanned);
    }

    private static String fmt(double si, Dimension d) {
        return Quantity.formatBest(si, d, 3);
    }
}
