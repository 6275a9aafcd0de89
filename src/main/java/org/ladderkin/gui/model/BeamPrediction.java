package org.ladderkin.gui.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.TimeWindows;
import org.ladderkin.observe.Verdict;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.LaserSetup;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.Cautions;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;

/**
 * What the plan's laser, geometry and instruments imply without any kinetic model: on-axis peak photon fluence over
 * the pulse-energy range, pulse periods against the detection windows, and the delay points of each instrument.
 * Honest about its limits: it knows nothing about the sample's response (⟨N⟩, Auger decay, heating); the engine-based
 * planner replaces it when it exists.
 */
public final class BeamPrediction implements PredictionSource {

    /** Points of the fluence curve. */
    static final int ENERGY_POINTS = 41;
    /** Density of the log-spaced transient-absorption delay points (a common starting grid; no source). */
    static final int DELAYS_PER_DECADE = 10;
    /** Below this share of the peak fluence, the probe averages over a strongly varying pump (common practice). */
    static final double UNIFORM_PROBE_WARN = 0.9;
    static final double UNIFORM_PROBE_FAIL = 0.5;
    private static final double PER_CM2 = 1e-4;

    @Override
    public Prediction predict(PlanInputs plan) {
        LaserSetup laser = plan.laser();
        List<ChartSpec> charts = List.of(fluenceChart(laser), periodChart(plan), delayChart(plan));
        List<Risk> risks = new ArrayList<>();
        risks.add(probeUniformity(laser));
        for (int i = 0; i < plan.instruments().size(); i++) {
            Instrument inst = plan.instruments().get(i);
            if (inst.kind() == Instrument.Kind.TCSPC) {
                risks.add(tcspcWithinPeriod(inst, i, laser));
            }
        }
        List<String> cautions = new ArrayList<>();
        cautions.add(Cautions.LASER);
        if (Cautions.heavyMetal(plan.sample().material())) {
            cautions.add(Cautions.HEAVY_METALS);
        }
        return new Prediction(charts, risks, derived(plan), cautions,
                "beam geometry and instrument windows only — no kinetic model yet (⟨N⟩, decays and heating need the engine)");
    }

    /** On-axis peak photon fluence of a Gaussian pump: j = 2E/(πw²) / (hc/λ), in photons/m². */
    public static double peakPhotonFluencePerM2(double pulseEnergyJ, double radiusM, double wavelengthM) {
        return peakEnergyFluenceJPerM2(pulseEnergyJ, radiusM) / Photon.energyJ(wavelengthM);
    }

    /** On-axis peak energy fluence of a Gaussian beam of 1/e² intensity radius w: F = 2E/(πw²), in J/m². */
    public static double peakEnergyFluenceJPerM2(double pulseEnergyJ, double radiusM) {
        return 2 * pulseEnergyJ / (Math.PI * radiusM * radiusM);
    }

    /**
     * Probe-weighted mean of a Gaussian pump fluence, as a share of its peak, for a Gaussian probe on the same axis:
     * ∫F·I dA / ∫I dA with F ∝ exp(−2r²/w_pump²), I ∝ exp(−2r²/w_probe²) gives w_pump²/(w_pump² + w_probe²).
     */
    public static double probeAveragedShare(double pumpRadiusM, double probeRadiusM) {
        double p2 = pumpRadiusM * pumpRadiusM;
        return p2 / (p2 + probeRadiusM * probeRadiusM);
    }

    private static ChartSpec fluenceChart(LaserSetup laser) {
        double[] energies = energies(laser);
        double[] energiesNj = new double[energies.length];
        for (int i = 0; i < energies.length; i++) {
            energiesNj[i] = energies[i] * 1e9;
        }
        List<ChartSpec.Series> series = new ArrayList<>();
        for (double wl : laser.pumpWavelengthsM()) {
            double[] j = new double[energies.length];
            for (int i = 0; i < energies.length; i++) {
                j[i] = peakPhotonFluencePerM2(energies[i], laser.pumpRadiusM(), wl) * PER_CM2;
            }
            series.add(ChartSpec.Series.line(fmt(wl, Dimension.LENGTH), energiesNj, j));
        }
        return new ChartSpec("Pump peak photon fluence (on axis, Gaussian beam)", "pulse energy (nJ)",
                "peak photon fluence (photons/cm²)", true, true, series);
    }

    private static double[] energies(LaserSetup laser) {
        double lo = laser.minPulseEnergyJ();
        double hi = laser.maxPulseEnergyJ();
        return hi > lo ? TimeWindows.logSpaced(lo, hi, ENERGY_POINTS) : new double[] {lo};
    }

    private static ChartSpec periodChart(PlanInputs plan) {
        LaserSetup laser = plan.laser();
        List<Integer> divisions = laser.pulsePickerDivisions().stream().sorted().distinct().toList();
        double[] d = divisions.stream().mapToDouble(Integer::doubleValue).toArray();
        double[] periodNs = new double[d.length];
        for (int i = 0; i < d.length; i++) {
            periodNs[i] = d[i] / laser.repetitionRateHz() * 1e9;
        }
        List<ChartSpec.Series> series = new ArrayList<>();
        series.add(new ChartSpec.Series("time between pulses", d, periodNs, true));
        double[] span = d.length == 1 ? d : new double[] {d[0], d[d.length - 1]};
        for (int i = 0; i < plan.instruments().size(); i++) {
            Instrument inst = plan.instruments().get(i);
            double[] level = new double[span.length];
            java.util.Arrays.fill(level, inst.maxDelayS() * 1e9);
            String name = inst.kind() == Instrument.Kind.TCSPC
                    ? "TCSPC time range (instrument " + (i + 1) + ")"
                    : "longest TA delay (instrument " + (i + 1) + ")";
            series.add(new ChartSpec.Series(name, span, level, span.length == 1));
        }
        return new ChartSpec("Time between pulses and detection windows", "pulse-picker division",
                "time (ns)", false, true, series);
    }

    private static ChartSpec delayChart(PlanInputs plan) {
        List<ChartSpec.Series> series = new ArrayList<>();
        for (int i = 0; i < plan.instruments().size(); i++) {
            Instrument inst = plan.instruments().get(i);
            double[] delaysS;
            String name;
            if (inst.kind() == Instrument.Kind.TCSPC) {
                int bins = (int) Math.min(100_000, Math.floor(inst.maxDelayS() / inst.minDelayS()));
                delaysS = new double[bins];
                for (int k = 0; k < bins; k++) {
                    delaysS[k] = (k + 1) * inst.minDelayS();
                }
                name = "TCSPC bin ends (instrument " + (i + 1) + ")";
            } else {
                double decades = Math.log10(inst.maxDelayS() / inst.minDelayS());
                int n = Math.max(2, (int) Math.ceil(decades * DELAYS_PER_DECADE) + 1);
                delaysS = TimeWindows.logSpaced(inst.minDelayS(), inst.maxDelayS(), n);
                name = "TA, log-spaced " + DELAYS_PER_DECADE + "/decade (instrument " + (i + 1) + ")";
            }
            double[] index = new double[delaysS.length];
            double[] ps = new double[delaysS.length];
            for (int k = 0; k < delaysS.length; k++) {
                index[k] = k + 1;
                ps[k] = delaysS[k] * 1e12;
            }
            series.add(new ChartSpec.Series(name, index, ps, inst.kind() != Instrument.Kind.TCSPC));
        }
        return new ChartSpec("Delay points per instrument (starting grid, before kinetics)", "point number",
                "delay (ps)", false, true, series);
    }

    private static Risk probeUniformity(LaserSetup laser) {
        double share = probeAveragedShare(laser.pumpRadiusM(), laser.probeRadiusM());
        Verdict v = share >= UNIFORM_PROBE_WARN ? Verdict.PASS : share >= UNIFORM_PROBE_FAIL ? Verdict.WARN : Verdict.FAIL;
        return new Risk("probe sees a uniform pump", v, share, UNIFORM_PROBE_WARN, "fraction",
                String.format(Locale.ROOT, "the probe averages %.0f %% of the peak pump fluence (w_pump²/(w_pump²+w_probe²));"
                        + " %.0f %% or more keeps ⟨N⟩ nearly uniform (common practice, no source) — shrink the probe"
                        + " or widen the pump", share * 100, UNIFORM_PROBE_WARN * 100));
    }

    private static Risk tcspcWithinPeriod(Instrument inst, int index, LaserSetup laser) {
        double period = 1 / laser.repetitionRateHz();
        double ratio = inst.maxDelayS() / period;
        // a range equal to a period, up to rounding, just fits
        double fits = ratio * (1 - 1e-9);
        int maxDivision = laser.pulsePickerDivisions().stream().mapToInt(Integer::intValue).max().orElse(1);
        Verdict v;
        String why;
        if (fits <= 1) {
            v = Verdict.PASS;
            why = String.format(Locale.ROOT, "the %s histogram ends before the next pulse (%s apart)",
                    fmt(inst.maxDelayS(), Dimension.TIME), fmt(period, Dimension.TIME));
        } else if (fits <= maxDivision) {
            v = Verdict.WARN;
            int needed = laser.pulsePickerDivisions().stream().mapToInt(Integer::intValue).filter(d -> d >= fits).min()
                    .orElse(maxDivision);
            why = String.format(Locale.ROOT, "the %s histogram is longer than the %s pulse period: pick pulses at ÷%d or"
                    + " shorten the range", fmt(inst.maxDelayS(), Dimension.TIME), fmt(period, Dimension.TIME), needed);
        } else {
            v = Verdict.FAIL;
            why = String.format(Locale.ROOT, "the %s histogram overlaps the next pulse even at ÷%d (%s): shorten the range",
                    fmt(inst.maxDelayS(), Dimension.TIME), maxDivision, fmt(period * maxDivision, Dimension.TIME));
        }
        return new Risk("TCSPC range within the pulse period (instrument " + (index + 1) + ")", v, ratio, 1, "periods", why);
    }

    private static List<Prediction.DerivedNumber> derived(PlanInputs plan) {
        LaserSetup l = plan.laser();
        List<Prediction.DerivedNumber> out = new ArrayList<>();
        double w = l.pumpRadiusM();
        String wText = fmt(w, Dimension.LENGTH);
        for (double wl : l.pumpWavelengthsM()) {
            String wlText = fmt(wl, Dimension.LENGTH);
            double eph = Photon.energyJ(wl);
            out.add(new Prediction.DerivedNumber("photon energy at " + wlText,
                    String.format(Locale.ROOT, "%.4g eV", Photon.energyEv(wl)),
                    "E_ph = hc/λ with λ = " + wlText));
            double jLo = peakPhotonFluencePerM2(l.minPulseEnergyJ(), w, wl) * PER_CM2;
            double jHi = peakPhotonFluencePerM2(l.maxPulseEnergyJ(), w, wl) * PER_CM2;
            out.add(new Prediction.DerivedNumber("peak photon fluence at " + wlText,
                    String.format(Locale.ROOT, "%.3g to %.3g photons/cm²", jLo, jHi),
                    "j = 2E/(πw²) / (hc/λ) with E = " + fmt(l.minPulseEnergyJ(), Dimension.ENERGY) + " to "
                            + fmt(l.maxPulseEnergyJ(), Dimension.ENERGY) + ", w = " + wText + ", hc/λ = "
                            + fmt(eph, Dimension.ENERGY)));
        }
        double fHi = peakEnergyFluenceJPerM2(l.maxPulseEnergyJ(), w);
        out.add(new Prediction.DerivedNumber("peak energy fluence at the highest energy",
                fmt(fHi, Dimension.ENERGY_FLUENCE),
                "F = 2E/(πw²) with E = " + fmt(l.maxPulseEnergyJ(), Dimension.ENERGY) + ", w = " + wText));
        out.add(new Prediction.DerivedNumber("probe-averaged share of the peak fluence",
                String.format(Locale.ROOT, "%.3g %%", probeAveragedShare(w, l.probeRadiusM()) * 100),
                "w_pump²/(w_pump² + w_probe²) with w_pump = " + wText + ", w_probe = " + fmt(l.probeRadiusM(), Dimension.LENGTH)));
        out.add(new Prediction.DerivedNumber("time between pulses", fmt(1 / l.repetitionRateHz(), Dimension.TIME),
                "T = 1/f with f = " + fmt(l.repetitionRateHz(), Dimension.FREQUENCY)));
        out.add(new Prediction.DerivedNumber("mean pump power at the highest energy",
                fmt(l.maxPulseEnergyJ() * l.repetitionRateHz(), Dimension.POWER),
                "P = E·f with E = " + fmt(l.maxPulseEnergyJ(), Dimension.ENERGY) + ", f = "
                        + fmt(l.repetitionRateHz(), Dimension.FREQUENCY) + " (no pulse picking)"));
        for (int i = 0; i < plan.instruments().size(); i++) {
            Instrument inst = plan.instruments().get(i);
            if (inst.kind() == Instrument.Kind.TRANSIENT_ABSORPTION) {
                out.add(new Prediction.DerivedNumber("delay-stage travel for the longest delay (instrument " + (i + 1) + ")",
                        fmt(TimeWindows.stageTravelM(inst.maxDelayS()), Dimension.LENGTH),
                        "d = c·t/2 (retro-reflector: path 2d) with t = " + fmt(inst.maxDelayS(), Dimension.TIME)));
            } else {
                out.add(new Prediction.DerivedNumber("TCSPC histogram bins (instrument " + (i + 1) + ")",
                        String.format(Locale.ROOT, "%.0f", Math.floor(inst.maxDelayS() / inst.minDelayS())),
                        "n = range / bin with range = " + fmt(inst.maxDelayS(), Dimension.TIME) + ", bin = "
                                + fmt(inst.minDelayS(), Dimension.TIME)));
            }
        }
        return out;
    }

    private static String fmt(double si, Dimension d) {
        return Quantity.formatBest(si, d, 4);
    }
}
