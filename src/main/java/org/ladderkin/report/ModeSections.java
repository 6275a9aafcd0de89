package org.ladderkin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.DelayPlan;
import org.ladderkin.plan.MultiplicationPlan;
import org.ladderkin.sample.CrossSection;
import org.ladderkin.sample.SampleSpec;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/** The rows each campaign mode adds (photon counting, multiplication, gain), worded once for the report and the text. */
public final class ModeSections {

    private ModeSections() {
    }

    /** The photon-counting decay in one sentence; the text output prints the same numbers. */
    public static String countingLine(DelayPlan d) {
        var c = d.counting();
        return String.format(Locale.ROOT, "TCSPC: %s bins over %s (decay window %s); one decay at ⟨N⟩ = %.3g (%s per pulse), "
                        + "%.3g detected photons per pulse%s, %.3g counts/s; %.3g counts for τ₁ to ± %.2g %% (F = %.3g) take %s "
                        + "(%s available).", q(d.instrument().minDelayS(), Dimension.TIME),
                q(d.instrument().maxDelayS(), Dimension.TIME), q(c.windowS(), Dimension.TIME), c.nAvg(),
                q(c.pulseEnergyJ(), Dimension.ENERGY), c.detectedPerPulse(), c.detectionAttenuation() > 1
                        ? String.format(Locale.ROOT, " after attenuating the detected emission %.3g× (ND %.1f)",
                        c.detectionAttenuation(), Math.log10(c.detectionAttenuation())) : "",
                c.countRateHz(), c.counts(), 100 * c.targetRel(), c.precisionFactor(), q(c.acquisitionS(), Dimension.TIME),
                q(c.availableS(), Dimension.TIME));
    }

    /** The multiplication measurement in sentences; the text output prints the same lines. */
    public static List<String> multiplicationLines(CampaignPlan plan) {
        var m = plan.multiplicationPlan();
        List<String> lines = new ArrayList<>();
        double[] n = m.nSeries();
        lines.add(String.format(Locale.ROOT, "Series for A/B at every pump: %d points, ⟨N⟩ = %.3g to %.3g evenly spaced, early "
                        + "and late point averaged %s each (noise %.2g OD per √s); A/B against ⟨N⟩ fitted with a straight line, "
                        + "its intercept (⟨N⟩ → 0) compared with the reference's.", n.length, n[0], n[n.length - 1],
                q(m.timePerPointS(), Dimension.TIME), m.noiseOdPerSqrtS()));
        List<MultiplicationPlan.Pump> all = new ArrayList<>();
        if (m.reference() != null) {
            all.add(m.reference());
        }
        all.addAll(m.pumps());
        for (var p : all) {
            lines.add(String.format(Locale.ROOT, "%s %s (ħω = %.2f·E₁S): assumed η = %.3g (range %.3g–%.3g); A/B at ⟨N⟩ → 0 = "
                            + "%.4g, expected error ± %.2g (statistical %.2g, straight-line bias %+.2g).",
                    p == m.reference() ? "Reference" : "Pump", q(p.wavelengthM(), Dimension.LENGTH), p.overGap(), p.eta(),
                    p.etaLow(), p.etaHigh(), p.interceptRatio(), p.totalError(), p.statisticalError(), p.bias()));
        }
        if (m.twoRate() != null) {
            lines.add(String.format(Locale.ROOT, "Photocharging check: A/B at the series' top %.4g at the chosen rate against "
                            + "%.4g at %s (charged fraction %.3g at the chosen rate).", m.twoRate().ratioChosen(),
                    m.twoRate().ratioSlow(), q(m.twoRate().slowRateHz(), Dimension.FREQUENCY), m.twoRate().chargedChosen()));
        }
        lines.add("Yield prior: " + MultiplicationPlan.priorSource() + ".");
        m.notPlanned().forEach(x -> lines.add("Not planned: " + x + "."));
        lines.add(defaultsLine(plan, Mode.MULTIPLICATION));
        return lines;
    }

    /** The gain goal's numbers in sentences; the text output prints the same lines. */
    public static List<String> gainLines(CampaignPlan plan) {
        var g = plan.gain();
        List<String> lines = new ArrayList<>();
        if (!g.shiftApplied()) {
            lines.add(String.format(Locale.ROOT, "Gain threshold (transparency of the %d-fold band edge, Poisson excitation, "
                            + "no biexciton shift): ⟨N⟩ = %.3g, %s per pulse, %.3g µJ/cm² peak%s.", g.degeneracy(),
                    g.thresholdN(), q(g.thresholdEnergyJ(), Dimension.ENERGY), g.thresholdFluenceJPerM2() * 100,
                    g.thresholdReachable() ? "" : " — outside the laser's range"));
            lines.add(String.format(Locale.ROOT, "With a repulsive biexciton shifted far beyond the line width the threshold "
                    + "falls to ⟨N⟩ = %.3g.", g.thresholdShiftedN()));
        } else {
            lines.add(String.format(Locale.ROOT, "Gain threshold (the %d-fold band edge, Poisson excitation, the core/shell's "
                            + "biexciton shift Δ_XX = %.3g line widths): ⟨N⟩ = %.3g, %s per pulse, %.3g µJ/cm² peak%s.",
                    g.degeneracy(), g.shiftOverWidth(), g.thresholdShiftedN(), q(g.thresholdEnergyJ(), Dimension.ENERGY),
                    g.thresholdFluenceJPerM2() * 100, g.thresholdReachable() ? "" : " — outside the laser's range"));
            lines.add(String.format(Locale.ROOT, "Without the biexciton shift (a plain dot) the threshold would be ⟨N⟩ = %.3g%s.",
                    g.thresholdN(), g.thresholdShiftedN() < g.thresholdN() ? "; the shift beyond the line width lowers it: dots "
                            + "holding one exciton no longer absorb at their own emission" : ""));
        }
        lines.add(String.format(Locale.ROOT, "Gain lifetime at ⟨N⟩ = %.3g: %s, against the biexciton Auger lifetime τ₂ = %s.",
                g.gainAtN(), q(g.gainLifetimeS(), Dimension.TIME), q(g.augerLifetimeS(), Dimension.TIME)));
        lines.add(String.format(Locale.ROOT, "Heating at the series' top: %.3g K per pulse, %.3g K steady.", g.perPulseRiseK(),
                g.steadyRiseK()));
        g.notPlanned().forEach(n -> lines.add("Not planned: " + n + "."));
        lines.add(defaultsLine(plan, Mode.GAIN));
        return lines;
    }

    /** The campaign modes whose rows name the library values they rest on. */
    public enum Mode { TRANSIENT_ABSORPTION, COUNTING, MULTIPLICATION, GAIN }

    /**
     * The library values {@code mode} rests on that the plan did not give, each with its source: a reader sees which
     * numbers are the library's guesses for their sample before trusting the mode's rows.
     */
    public static String defaultsLine(CampaignPlan plan, Mode mode) {
        List<String> used = new ArrayList<>();
        var sample = plan.inputs().sample();
        var material = sample.material();
        double pumpM = plan.chosenWavelength().wavelengthM();
        var sigma = sample.crossSectionAt(pumpM);
        if (sigma.regime() != CrossSection.Regime.USER && sigma.regime() != CrossSection.Regime.MEASURED) {
            used.add("σ at " + q(pumpM, Dimension.LENGTH) + ": " + sigma.basis());
        }
        var size = sample.spec().size();
        if (!(size instanceof SampleSpec.ByDiameterAndPeak)) {
            material.sizing().ifPresent(c -> used.add((size instanceof SampleSpec.ByDiameter ? "E₁S from the size"
                    : "size from the peak") + " by the sizing curve: " + c.source()));
        }
        // the charging and residual judgements of every mode rest on the ionisation and the photocharge lifetime too
        List<String> lifetimes = switch (mode) {
            case TRANSIENT_ABSORPTION -> List.of("τ₁", "τ₂", "negative-trion lifetime", "positive-trion lifetime",
                    "Auger ionisation probability", "photocharge lifetime");
            case COUNTING -> List.of("τ₁", "PL quantum yield", "Auger ionisation probability", "photocharge lifetime");
            case MULTIPLICATION -> List.of("τ₁", "τ₂", "negative-trion lifetime", "positive-trion lifetime",
                    "Auger ionisation probability", "photocharge lifetime");
            case GAIN -> List.of("τ₂", "Auger ionisation probability", "photocharge lifetime");
        };
        for (String b : plan.model().bases()) {
            for (String what : lifetimes) {
                if (b.startsWith(what + ": ") && !b.equals(what + ": plan")) {
                    used.add(b);
                }
            }
            // a flowing cell's refresh rests on a default only when its cross-section was not given
            if (b.startsWith("refresh: stirred") || b.startsWith("shell")
                    || b.startsWith("refresh: flowing") && b.contains("no source")) {
                used.add(b);
            }
        }
        if (mode != Mode.MULTIPLICATION) {
            sample.spec().matrix().ifPresent(m -> used.add(m.name() + " heat capacity: density "
                    + m.densityKgPerM3().source() + ", specific heat " + m.specificHeatJPerKgK().source()));
        }
        if (mode == Mode.MULTIPLICATION) {
            used.add("yield law: " + MultiplicationPlan.priorSource());
        }
        if (mode == Mode.GAIN) {
            used.add(String.format(Locale.ROOT, "band-edge degeneracy %.0f: %s", material.electronDegeneracy().value(),
                    material.electronDegeneracy().source()));
            used.add("dot heat capacity: density " + material.densityKgPerM3().source() + ", specific heat "
                    + material.specificHeatJPerKgK().source());
        }
        return used.isEmpty() ? "Defaults used: none (every value this mode rests on was given in the plan)."
                : "Defaults used: " + String.join("; ", used) + ".";
    }

    private static String q(double si, Dimension d) {
        return Double.isFinite(si) ? Quantity.formatBest(si, d, 4) : "—";
    }
}
