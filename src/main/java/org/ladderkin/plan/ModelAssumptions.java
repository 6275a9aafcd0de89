package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.process.LadderBuilder;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.kinetics.process.ProcessSpec;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.rate.SampleRefresh;
import org.ladderkin.kinetics.rate.Trapping;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.sample.CoreShell;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;

/**
 * The kinetic model a plan predicts with, built from the sample's material and size unless the plan overrides a value.
 * Every number carries the basis it rests on, so the report can say what the predictions assume.
 *
 * @param tauSingleExcitonS      single-exciton lifetime τ₁ (s)
 * @param plQuantumYield         single-exciton PL quantum yield; k_rad = QY/τ₁, the rest is trapping
 * @param tauBiexcitonS          biexciton Auger lifetime τ₂ (s)
 * @param augerScaling           Auger N-scaling law
 * @param radiativeScaling       radiative N-scaling law
 * @param tauTrionNegativeS      negative-trion Auger lifetime (s)
 * @param tauTrionPositiveS      positive-trion Auger lifetime (s)
 * @param ionisationProbability  probability that an Auger event ejects a carrier
 * @param neutralisationS        lifetime of the photocharge (s)
 * @param refreshS               time in which stirring or flow replaces the excited volume (s), +∞ for a static sample
 * @param coolingS               intraband cooling time (s), used for delay windows
 * @param bases                  one line per value saying where it comes from
 * @param processes              further processes the plan sets through {@link ProcessRegistry#planParameters()}
 *                               (e.g. a measured triexciton lifetime), added after the plan's own ladder
 * @param biexcitonShiftJ        biexciton interaction Δ_XX (J), positive for repulsion; NaN when the sample says nothing
 *                               (a plain dot)
 * @param lineWidthJ             standard deviation of the band-edge line Δ_XX is compared with (J); NaN with Δ_XX
 */
public record ModelAssumptions(double tauSingleExcitonS, double plQuantumYield, double tauBiexcitonS,
                               AugerScaling augerScaling, RadiativeScaling radiativeScaling, double tauTrionNegativeS,
                               double tauTrionPositiveS, double ionisationProbability, double neutralisationS,
                               double refreshS, double coolingS, List<String> bases, List<ProcessSpec> processes,
                               double biexcitonShiftJ, double lineWidthJ) {

    /** Default PL quantum yield of the single exciton (from memory: typical of good colloidal dots). */
    public static final double DEFAULT_QUANTUM_YIELD = 0.5;
    /** Default probability that an Auger event ejects a carrier (order of magnitude, from memory). */
    public static final double DEFAULT_IONISATION = 1e-4;
    /** Default photocharge lifetime in a static solution (order of magnitude, from memory). */
    public static final double DEFAULT_NEUTRALISATION_S = 10;
    /** Default time for a magnetic stirrer to renew the excited volume (common practice, no source). */
    public static final double DEFAULT_STIRRED_REFRESH_S = 0.1;
    /** Where the trion relation 1/τ₂ = 2/τ_X− + 2/τ_X+ comes from. */
    static final String TRION_RELATION = "Park, Bae, Pietryga, Klimov, ACS Nano 8, 7288 (2014), from memory";
    /** Default intraband cooling time: sub-picosecond (Klimov & McBranch, Phys. Rev. Lett. 80, 4028 (1998)). */
    public static final double DEFAULT_COOLING_S = 0.5e-12;

    public ModelAssumptions {
        bases = List.copyOf(bases);
        processes = List.copyOf(processes);
        for (double t : new double[] {tauSingleExcitonS, tauBiexcitonS, tauTrionNegativeS, tauTrionPositiveS,
            neutralisationS, coolingS}) {
            if (!(t > 0)) {
                throw new IllegalArgumentException("model lifetimes must be > 0, got " + t + " s");
            }
        }
        if (!(plQuantumYield > 0 && plQuantumYield <= 1) || !(ionisationProbability >= 0 && ionisationProbability <= 1)) {
            throw new IllegalArgumentException("quantum yield must be in (0, 1] and ionisation probability in [0, 1]");
        }
        if (!(refreshS > 0)) {
            throw new IllegalArgumentException("refresh time must be > 0 (use +∞ for a static sample), was " + refreshS + " s");
        }
        if (Double.isNaN(biexcitonShiftJ) != Double.isNaN(lineWidthJ) || Double.isInfinite(biexcitonShiftJ)
                || !(Double.isNaN(lineWidthJ) || lineWidthJ > 0 && Double.isFinite(lineWidthJ))) {
            throw new IllegalArgumentException("a biexciton shift needs a finite line width > 0 beside it, and neither alone");
        }
    }

    /** Assumptions with further registry processes and no biexciton shift. */
    public ModelAssumptions(double tauSingleExcitonS, double plQuantumYield, double tauBiexcitonS,
                            AugerScaling augerScaling, RadiativeScaling radiativeScaling, double tauTrionNegativeS,
                            double tauTrionPositiveS, double ionisationProbability, double neutralisationS,
                            double refreshS, double coolingS, List<String> bases, List<ProcessSpec> processes) {
        this(tauSingleExcitonS, plQuantumYield, tauBiexcitonS, augerScaling, radiativeScaling, tauTrionNegativeS,
                tauTrionPositiveS, ionisationProbability, neutralisationS, refreshS, coolingS, bases, processes, Double.NaN,
                Double.NaN);
    }

    /** Whether the sample gives a biexciton shift (a core/shell dot). */
    public boolean hasBiexcitonShift() {
        return !Double.isNaN(biexcitonShiftJ);
    }

    /** Assumptions with no further registry processes. */
    public ModelAssumptions(double tauSingleExcitonS, double plQuantumYield, double tauBiexcitonS,
                            AugerScaling augerScaling, RadiativeScaling radiativeScaling, double tauTrionNegativeS,
                            double tauTrionPositiveS, double ionisationProbability, double neutralisationS,
                            double refreshS, double coolingS, List<String> bases) {
        this(tauSingleExcitonS, plQuantumYield, tauBiexcitonS, augerScaling, radiativeScaling, tauTrionNegativeS,
                tauTrionPositiveS, ionisationProbability, neutralisationS, refreshS, coolingS, bases, List.of());
    }

    /**
     * Values overridden by the plan; NaN or null means "derive from the material". {@code processes} are further
     * registry processes the plan switches on.
     */
    public record Overrides(double tauSingleExcitonS, double plQuantumYield, double tauBiexcitonS, AugerScaling augerScaling,
                            RadiativeScaling radiativeScaling, double tauTrionNegativeS, double tauTrionPositiveS,
                            double ionisationProbability, double neutralisationS, double coolingS,
                            List<ProcessSpec> processes) {
        /** Nothing overridden. */
        public static final Overrides NONE = new Overrides(Double.NaN, Double.NaN, Double.NaN, null, null, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN, List.of());

        public Overrides {
            processes = List.copyOf(processes);
        }
    }

    /** As {@link #forSample(Sample, Overrides, double)} for a sample that is not translated under the beam. */
    public static ModelAssumptions forSample(Sample sample, Overrides o) {
        return forSample(sample, o, Double.NaN);
    }

    /**
     * The model for a sample: material values scaled to its size, then the plan's overrides; a translated sample is
     * refreshed once it has moved a pump 1/e² diameter {@code pumpDiameterM}.
     */
    public static ModelAssumptions forSample(Sample sample, Overrides o, double pumpDiameterM) {
        List<String> bases = new ArrayList<>();
        var m = sample.material();
        if (Double.isNaN(o.tauSingleExcitonS()) && !m.singleExcitonLifetimeS().known()) {
            throw new IllegalArgumentException(m.key() + " has no single-exciton lifetime in the library: give "
                    + "\"singleExcitonLifetime\" in the plan's \"model\" section");
        }
        if (Double.isNaN(o.tauBiexcitonS()) && !m.augerVolumeConstantSPerM3().known()) {
            throw new IllegalArgumentException(m.key() + " has no Auger volume constant in the library: give "
                    + "\"biexcitonLifetime\" in the plan's \"model\" section");
        }
        Optional<CoreShell> shell = CoreShell.of(sample);
        double overlap = shell.map(CoreShell::overlap).orElse(1.0);
        double tau1 = pick(o.tauSingleExcitonS(), m.singleExcitonLifetimeS().value() / overlap, "τ₁", "plan",
                "material library: " + m.singleExcitonLifetimeS().source()
                        + shell.map(c -> c.overlap() < 1 ? "; core/shell: " + c.overlapBasis() : "").orElse(""), bases);
        double qy = pick(o.plQuantumYield(), DEFAULT_QUANTUM_YIELD, "PL quantum yield", "plan", "default (from memory)", bases);
        double augerVolume = shell.map(CoreShell::augerVolumeM3).orElse(sample.dotVolumeM3());
        double tau2 = pick(o.tauBiexcitonS(), m.augerVolumeConstantSPerM3().value() * augerVolume, "τ₂", "plan",
                "Auger volume scaling τ₂ = C·V with C from " + m.augerVolumeConstantSPerM3().source()
                        + shell.map(c -> "; core/shell: " + c.augerBasis()).orElse(""), bases);
        AugerScaling auger = o.augerScaling() != null ? o.augerScaling() : AugerScaling.STATISTICAL;
        bases.add("Auger scaling " + auger.key() + (o.augerScaling() != null ? ": plan"
                : ": default, carrier-triplet counting (Klimov, McGuire, Schaller, Rupasov, Phys. Rev. B 77, 195324 (2008))"));
        RadiativeScaling rad = o.radiativeScaling() != null ? o.radiativeScaling() : RadiativeScaling.STATISTICAL;
        bases.add("radiative scaling " + rad.key() + (o.radiativeScaling() != null ? ": plan"
                : ": default, N² (Rajadell, Climente, Planelles, Bertoni, J. Phys. Chem. C 113, 11268 (2009))"));
        // with equal trion rates 1/τ₂ = 2/τ_X− + 2/τ_X+ gives τ_X = 4τ₂ (TRION_RELATION)
        boolean trionKnown = m.trionLifetimeS().known();
        double trionNeg = pick(o.tauTrionNegativeS(), trionKnown ? m.trionLifetimeS().value() : 4 * tau2,
                "negative-trion lifetime", "plan", trionKnown ? "material library: " + m.trionLifetimeS().source()
                        : "4·τ₂, equal trion rates in 1/τ₂ = 2/τ_X− + 2/τ_X+ (" + TRION_RELATION + ")",
                bases);
        // 1/τ_XX = 2/τ_X− + 2/τ_X+: title, authors and year of TRION_RELATION seen in a stored copy of the paper (it was
        // credited to Phys. Rev. Lett. here before); volume and page from memory
        double posRate = (1 / tau2 - 2 / trionNeg) / 2;
        double trionPosDerived = posRate > 0 ? 1 / posRate : trionNeg;
        double trionPos = pick(o.tauTrionPositiveS(), trionPosDerived, "positive-trion lifetime", "plan",
                posRate > 0 ? "from 1/τ₂ = 2/τ_X− + 2/τ_X+ (" + TRION_RELATION + ")"
                        : "taken equal to the negative trion (the trion relation gave no positive rate)", bases);
        double pIon = pick(o.ionisationProbability(), DEFAULT_IONISATION, "Auger ionisation probability", "plan",
                "default order of magnitude (from memory)", bases);
        double neut = pick(o.neutralisationS(), DEFAULT_NEUTRALISATION_S, "photocharge lifetime", "plan",
                "default order of magnitude for solutions (from memory)", bases);
        double cooling = pick(o.coolingS(), DEFAULT_COOLING_S, "cooling time", "plan",
                "default, sub-picosecond (Klimov & McBranch, Phys. Rev. Lett. 80, 4028 (1998))", bases);
        Refresh refresh = sample.spec().refresh();
        double refreshS = switch (refresh.mode()) {
            case STATIC -> Double.POSITIVE_INFINITY;
            case STIRRED -> DEFAULT_STIRRED_REFRESH_S;
            case FLOWING -> refresh.flowRenewalS(pumpDiameterM, sample.spec().pathLengthM());
            case TRANSLATED -> refresh.translationRefreshS(pumpDiameterM);
        };
        bases.add("refresh: " + switch (refresh.mode()) {
            case STATIC -> "static sample, no exchange";
            case STIRRED -> "stirred, excited volume renewed in ~0.1 s (common practice, no source)";
            case FLOWING -> flowingBasis(refresh, pumpDiameterM, sample.spec().pathLengthM());
            case TRANSLATED -> String.format(java.util.Locale.ROOT, "translated, pump 1/e² diameter / speed = %.3g mm / "
                    + "%.3g mm/s", pumpDiameterM * 1e3, refresh.speedMPerS() * 1e3);
        });
        for (ProcessSpec p : o.processes()) {
            for (ProcessParameter pp : p.type().parameters()) {
                if (pp.planKey() != null) {
                    bases.add(pp.label() + ": plan");
                }
            }
        }
        shell.ifPresent(c -> ShellLines.add(sample, c, bases));
        return new ModelAssumptions(tau1, qy, tau2, auger, rad, trionNeg, trionPos, pIon, neut, refreshS, cooling, bases,
                o.processes(), shell.map(CoreShell::biexcitonShiftJ).orElse(Double.NaN),
                shell.map(CoreShell::lineWidthJ).orElse(Double.NaN));
    }

    /** How a flowing cell's refresh time was found, with the default cross-section named when it was used. */
    private static String flowingBasis(Refresh refresh, double pumpDiameterM, double pathLengthM) {
        double area = refresh.flowCrossSectionM2(pathLengthM);
        return String.format(java.util.Locale.ROOT, "flowing, pump 1/e² diameter / flow speed = %.3g mm / %.3g mm/s (flow "
                + "%.3g mL/min through a cross-section of %.3g mm²%s)", pumpDiameterM * 1e3,
                refresh.flowSpeedMPerS(pathLengthM) * 1e3, refresh.flowRateM3PerS() * 6e7, area * 1e6,
                Double.isNaN(refresh.crossSectionM2()) ? String.format(java.util.Locale.ROOT, ": path length %.3g mm × "
                        + "%.3g mm, a flow cuvette's channel width when 'cellCrossSection' is not given (common practice, "
                        + "no source)", pathLengthM * 1e3, Refresh.DEFAULT_FLOW_CELL_WIDTH_M * 1e3) : ", as given");
    }

    /** The ladder model: neutral and negative dots, no hot-exciton resolution (instantaneous cooling). */
    public KineticModel kineticModel(int degeneracy) {
        LadderBuilder laws = new LadderBuilder();
        laws.add(new RadiativeDecay(plQuantumYield / tauSingleExcitonS, radiativeScaling, RadiativeDecay.DEFAULT_CHARGED_FACTOR));
        if (plQuantumYield < 1) {
            laws.add(new Trapping((1 - plQuantumYield) / tauSingleExcitonS));
        }
        laws.add(new AugerRecombination(1 / tauBiexcitonS, augerScaling, 1 / tauTrionNegativeS, 1 / tauTrionPositiveS,
                new AugerIonisation(ionisationProbability, Charge.NEGATIVE)));
        laws.add(new Neutralisation(1 / neutralisationS));
        if (Double.isFinite(refreshS)) {
            laws.add(new SampleRefresh(1 / refreshS));
        }
        if (ionisationProbability > 0) {
            laws.allowCharge(Charge.NEGATIVE);
        }
        for (ProcessSpec p : processes) {
            p.addTo(laws);
        }
        return laws.build(degeneracy, 0);
    }

    /** A copy with the biexciton lifetime changed (the instance is not changed). */
    public ModelAssumptions withTauBiexcitonS(double tau) {
        return new ModelAssumptions(tauSingleExcitonS, plQuantumYield, tau, augerScaling, radiativeScaling, tauTrionNegativeS,
                tauTrionPositiveS, ionisationProbability, neutralisationS, refreshS, coolingS, bases, processes,
                biexcitonShiftJ, lineWidthJ);
    }

    /** A copy with the single-exciton lifetime changed (the instance is not changed). */
    public ModelAssumptions withTauSingleExcitonS(double tau) {
        return new ModelAssumptions(tau, plQuantumYield, tauBiexcitonS, augerScaling, radiativeScaling, tauTrionNegativeS,
                tauTrionPositiveS, ionisationProbability, neutralisationS, refreshS, coolingS, bases, processes,
                biexcitonShiftJ, lineWidthJ);
    }

    /** A copy with a different refresh time (the instance is not changed). */
    public ModelAssumptions withRefreshS(double refresh) {
        return new ModelAssumptions(tauSingleExcitonS, plQuantumYield, tauBiexcitonS, augerScaling, radiativeScaling,
                tauTrionNegativeS, tauTrionPositiveS, ionisationProbability, neutralisationS, refresh, coolingS, bases, processes,
                biexcitonShiftJ, lineWidthJ);
    }

    private static double pick(double override, double derived, String what, String overrideBasis, String derivedBasis,
                               List<String> bases) {
        if (!Double.isNaN(override)) {
            bases.add(what + ": " + overrideBasis);
            return override;
        }
        bases.add(what + ": " + derivedBasis);
        return derived;
    }
}
