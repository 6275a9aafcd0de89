package org.ladderkin.gui.model;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.FitIdentifiability;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.LadderFitSetup;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.PlanFitBasis;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * The one place the fit tab meets how a ladder fit is set up ({@link LadderFitSetup}, {@link LadderParameter},
 * {@link PlanFitBasis} and the model parameters inside it). The run and preview models hand it a {@link FitRequest}
 * and get back a {@link Result}; they name parameters by key. When the set-up types change, only this class does.
 * One instance is shared by the run and the preview so the plan's ladder is computed once per plan state.
 */
final class FitJobs {

    /**
     * A finished fit or preview and what it was computed from.
     *
     * @param pushBack what "Use fitted values in the plan" would write, worked out with the job (it needs the plan's
     *                 ladder and the freed parameters, which stay in here)
     */
    record Result(LadderFit.Outcome outcome, Dataset data, PushBack pushBack) {
    }

    /** Freed in a new session: the two values a fluence series is measured for. */
    static final Set<String> DEFAULT_FREE = Set.of(LadderParameter.SCALE.key(), LadderParameter.TAU_AUGER2.key());

    /** Offered as checkboxes; the IRF width is left out because it needs a start value the view does not ask for. */
    static final List<FitOptions.FreeParameter> OFFERED = LadderParameter.values().stream()
            .filter(p -> !p.equals(LadderParameter.IRF) && !p.equals(LadderParameter.MULTIPLICATION_YIELD))
            .map(p -> new FitOptions.FreeParameter(p.key(), p.label())).toList();

    private record CachedBasis(PlanInputs inputs, PlanFitBasis basis) {
    }

    /** Written by whichever worker computed last; a duplicate computation after a race is harmless. */
    private volatile CachedBasis basisCache;

    /** Throws unless {@code key} names a parameter the ladder fit can free. */
    static String checkKey(String key) {
        return LadderParameter.of(key).key();
    }

    /** Runs the ladder fit {@code request} asks for; on a worker thread (it plans the campaign and fits). */
    Result compute(FitRequest request, FitProgress progress) {
        PlanFitBasis basis = basis(request.plan());
        Set<LadderParameter> free = new LinkedHashSet<>();
        request.options().free().forEach(k -> free.add(LadderParameter.of(k)));
        LadderFit.Outcome outcome = LadderFit.fit(request.data(), setup(request, basis, free), progress);
        PushBack push = outcome.result().converged() ? PushBack.of(outcome, request.data(), basis, free)
                : PushBack.nothing(outcome.result().ok() ? "the fit did not converge: its best point so far is shown, not "
                + "written into the plan" : "the fit failed");
        return new Result(outcome, request.data(), push);
    }

    /**
     * Whether the data can tell apart the parameters {@code request} frees, at the plan's values (the fit's start):
     * one Jacobian, on a worker thread.
     */
    FitIdentifiability identifiability(FitRequest request) {
        PlanFitBasis basis = basis(request.plan());
        Set<LadderParameter> free = new LinkedHashSet<>();
        request.options().free().forEach(k -> free.add(LadderParameter.of(k)));
        return LadderFit.identifiability(request.data(), setup(request, basis, free));
    }

    private static LadderFitSetup setup(FitRequest request, PlanFitBasis basis, Set<LadderParameter> free) {
        Instrument ta = request.options().instrumentResponse() ? taInstrument(request.plan()).orElse(null) : null;
        double fwhm = ta == null || ta.measuredIrf() != null ? Double.NaN : ta.irfFwhmS();
        return new LadderFitSetup(basis.base(), request.options().pulseTrain() ? basis.periodS() : Double.NaN,
                free, planScale(kindOf(request.data()), basis), 0, fwhm, false, false, ta == null ? null : ta.measuredIrf());
    }

    /** The plan's chosen repetition rate, once a job has computed the plan's ladder. */
    Optional<Double> planRepetitionRateHz() {
        CachedBasis c = basisCache;
        return c == null ? Optional.empty() : Optional.of(c.basis().repetitionRateHz());
    }

    /** The multiplication yield's check box, shown only when {@link #multiplicationYieldOffered} says so. */
    static final FitOptions.FreeParameter YIELD = new FitOptions.FreeParameter(LadderParameter.MULTIPLICATION_YIELD.key(),
            LadderParameter.MULTIPLICATION_YIELD.label());

    /**
     * Whether the plan's chosen pump is above twice the first-exciton energy, the least a second exciton costs (known
     * once a job has computed the plan's ladder); below it a freed yield could only fit noise.
     */
    boolean multiplicationYieldOffered() {
        CachedBasis c = basisCache;
        return c != null && pumpAboveTwiceGap(c.inputs(), c.basis());
    }

    /** Whether {@code basis}'s pump photon is above twice the first-exciton energy of {@code inputs}'s sample. */
    static boolean pumpAboveTwiceGap(PlanInputs inputs, PlanFitBasis basis) {
        double gapJ = inputs.sample().firstExcitonEnergyJ();
        return gapJ > 0 && org.ladderkin.units.Photon.energyJ(basis.pumpWavelengthM()) > 2 * gapJ;
    }

    /** What the plan's TA instrument response is, for the option's label ("Gaussian, FWHM 200 fs"), if it has one. */
    static Optional<String> planResponse(PlanInputs plan) {
        return taInstrument(plan).map(i -> i.measuredIrf() != null
                ? "measured (" + i.measuredIrf().origin() + "), FWHM " + formatTime(i.irfFwhmS())
                : "Gaussian, FWHM " + formatTime(i.irfFwhmS()));
    }

    private static String formatTime(double s) {
        return Quantity.formatBest(s, Dimension.TIME, 3);
    }

    private static Optional<Instrument> taInstrument(PlanInputs plan) {
        return plan.instruments().stream().filter(i -> i.kind() == Instrument.Kind.TRANSIENT_ABSORPTION).findFirst();
    }

    private PlanFitBasis basis(PlanInputs inputs) {
        CachedBasis c = basisCache;
        if (c != null && c.inputs().equals(inputs)) {
            return c.basis();
        }
        PlanFitBasis b = PlanFitBasis.of(inputs);
        basisCache = new CachedBasis(inputs, b);
        return b;
    }

    /** The plan's value of the excitation scale: σ for photon fluences, ⟨N⟩ per J for pulse energies, 1 for ⟨N⟩. */
    private static double planScale(Excitation.Kind kind, PlanFitBasis basis) {
        return switch (kind) {
            case PHOTON_FLUENCE_PER_M2 -> basis.crossSectionM2();
            case PULSE_ENERGY_J -> basis.occupancyPerJ();
            case MEAN_OCCUPANCY -> 1;
        };
    }

    private static Excitation.Kind kindOf(Dataset d) {
        return d.traces().get(0).metadata().excitation().orElseThrow().kind();
    }
}
