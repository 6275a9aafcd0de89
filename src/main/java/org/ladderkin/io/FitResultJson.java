package org.ladderkin.io;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ParameterNaming;
import org.ladderkin.fit.ParameterNaming.TradeKey;
import org.ladderkin.fit.ProfileInterval;

/**
 * The result of a ladder fit as JSON (schema {@code ladderkin.fit-result/1}): every shared parameter keyed by name
 * with its trade unit ({@link ParameterNaming}: {@code tauAuger2Ps}, {@code crossSectionCm2}, {@code tauRadNs}) holding {@code value},
 * {@code stdError} (statistical, null when unavailable), {@code totalStdError} (with the fluence calibration, when one
 * was given) and {@code fixed}; per-trace ⟨N⟩ (probe-averaged), amplitude and baseline; fit statistics (the reduced χ²
 * against the data's own noise, with its basis), correlations, diagnostics, checks and warnings.
 */
public final class FitResultJson {

    /** Schema name. */
    public static final String SCHEMA = "ladderkin.fit-result/1";

    private FitResultJson() {
    }

    /** The JSON tree of {@code outcome}. */
    public static ObjectNode of(Dataset data, LadderFit.Outcome outcome, ObjectNode planComparison) {
        FitResult r = outcome.result();
        ObjectNode root = ResolvedJson.object();
        root.put("schema", SCHEMA);
        root.put("status", r.status().name().toLowerCase(java.util.Locale.ROOT));
        root.put("message", r.message());
        ArrayNode files = root.putArray("dataFiles");
        data.sourceFiles().forEach(files::add);
        root.put("excitationGivenAs", switch (outcome.kind()) {
            case PHOTON_FLUENCE_PER_M2 -> "photonFluence";
            case PULSE_ENERGY_J -> "pulseEnergy";
            case MEAN_OCCUPANCY -> "meanOccupancy";
        });
        if (outcome.measuredIrf() != null) {
            ObjectNode irf = root.putObject("measuredIrf");
            irf.put("file", outcome.measuredIrf().origin());
            irf.put("fwhmFs", outcome.measuredIrf().fwhmS() * 1e15);
            irf.put("samples", outcome.measuredIrf().size());
        }
        ObjectNode params = root.putObject("parameters");
        for (ParameterEstimate e : r.estimates()) {
            if (!e.shared() || e.key().equals("amplitude") || e.key().equals("baseline")) {
                continue;
            }
            TradeKey t = ParameterNaming.trade(e.key());
            ObjectNode p = params.putObject(t.key());
            p.put("value", e.value() * t.factor());
            putNumber(p, "stdError", e.stdError() * t.factor());
            outcome.totalStdError(e.key()).ifPresent(v -> putNumber(p, "totalStdError", v * t.factor()));
            p.put("fixed", e.fixed());
            if (!e.fixed() && !Double.isFinite(e.stdError())) {
                // a free parameter without an error is not a result: say so where a script reads it
                p.put("determined", false);
            }
            r.profile(e.key()).ifPresent(pi -> addProfile(p, pi, t.factor()));
        }
        ArrayNode traces = root.putArray("traces");
        for (int i = 0; i < data.size(); i++) {
            ObjectNode t = traces.addObject();
            t.put("label", data.traces().get(i).label());
            if (outcome.meanN().length > i) {
                t.put("nAvg", outcome.meanN()[i]);
            }
            if (outcome.quality() != null) {
                putNumber(t, "noise", outcome.quality().noisePerTrace()[i]);
            }
            int trace = i;
            r.find("amplitude", i).ifPresent(e -> estimate(t.putObject("amplitude"), e));
            r.find("baseline", i).ifPresent(e -> estimate(t.putObject("baseline"), e));
            if (r.autocorrelation().size() > i) {
                ArrayNode a = t.putArray("residualAutocorrelation");
                for (double v : r.autocorrelation().get(trace)) {
                    a.add(v);
                }
            }
        }
        if (outcome.fluenceScaleUncertainty() > 0) {
            root.put("fluenceScaleUncertainty", outcome.fluenceScaleUncertainty());
        }
        ObjectNode stats = root.putObject("statistics");
        // the fitter's own χ² weighs points by their given uncertainties, or by 1 (then it is a sum of squares in the
        // file's units); the reduced χ² written is against the data's noise, so that 1 means a fit within the noise
        putNumber(stats, "chiSquare", r.chiSquare());
        if (outcome.quality() != null) {
            putNumber(stats, "reducedChiSquare", outcome.quality().reducedChiSquare());
            stats.put("noiseFrom", outcome.quality().noiseBasis());
            putNumber(stats, "residualRunsZ", outcome.quality().runsZ());
            putNumber(stats, "residualLag1Autocorrelation", outcome.quality().lag1());
            putNumber(stats, "meanSquareResidualScale", r.reducedChiSquare());
        } else {
            putNumber(stats, "reducedChiSquare", r.reducedChiSquare());
        }
        stats.put("points", r.points());
        stats.put("freeParameters", r.freeParameters());
        putNumber(stats, "aic", r.aic());
        putNumber(stats, "bic", r.bic());
        stats.put("iterations", r.iterations());
        stats.put("evaluations", r.evaluations());
        stats.put("startsTried", r.startsTried());
        stats.put("startsFailed", r.startsFailed());
        ObjectNode corr = root.putObject("correlation");
        ArrayNode keys = corr.putArray("keys");
        r.correlationKeys().forEach(k -> keys.add(ParameterNaming.trade(k).key()));
        ArrayNode rows = corr.putArray("matrix");
        for (double[] row : r.correlation()) {
            ArrayNode a = rows.addArray();
            for (double v : row) {
                a.add(v);
            }
        }
        strings(root.putArray("diagnostics"), outcome.diagnostics());
        strings(root.putArray("checks"), outcome.checks());
        strings(root.putArray("warnings"), r.warnings());
        if (planComparison != null) {
            root.set("planComparison", planComparison);
        }
        return root;
    }

    private static void addProfile(ObjectNode p, ProfileInterval pi, double factor) {
        ObjectNode o = p.putObject("profile68");
        o.put("lower", pi.lower() * factor);
        o.put("upper", pi.upper() * factor);
        o.put("lowerOpen", pi.lowerOpen());
        o.put("upperOpen", pi.upperOpen());
    }

    private static void estimate(ObjectNode o, ParameterEstimate e) {
        o.put("value", e.value());
        putNumber(o, "stdError", e.stdError());
    }

    /** NaN is not JSON: it is written as null. */
    private static void putNumber(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    private static void strings(ArrayNode a, List<String> values) {
        values.forEach(a::add);
    }
}
