package org.ladderkin.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import org.ladderkin.fit.ChargingAwareYield;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.LadderFitSetup;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.fit.YieldSummary;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.io.TableOptions;
import org.ladderkin.io.TraceArguments;
import org.ladderkin.io.TraceSidecarCodec;
import org.ladderkin.io.TraceTableReader;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Option;

/**
 * {@code fit}'s second run of the same sample for a photocharging-aware yield: a run on refreshed dots (stirred or
 * flowed, or pulsed slowly) whose η is the one reported, with the static run's own η and charged fraction beside it.
 * Kept out of {@link FitCommand} so that command only hands over its run.
 */
final class RefreshedRunOptions {

    @Option(names = "--refreshed-run", paramLabel = "FILE",
            description = "a run of the same sample on refreshed dots (stirred or flowed, or at a low repetition rate): "
                    + "with --free multiplication-yield, η is fitted from it and the static run's charged fraction shown beside")
    Path file;

    @Option(names = "--refreshed-fluences", split = ",", paramLabel = "X",
            description = "excitation per trace of the refreshed run, in column order (read as --fluences)")
    List<String> fluences;

    @Option(names = "--refreshed-traces-json", paramLabel = "FILE",
            description = "per-trace metadata of the refreshed run instead of --refreshed-fluences")
    Path sidecar;

    @Option(names = "--refreshed-rep-rate", paramLabel = "FREQ",
            description = "repetition rate of the refreshed run when it was refreshed by a low rate (below 1 MHz); omit for a "
                    + "stirred or flowed run, fitted pulse by pulse on fresh dots")
    String repRate;

    private Dataset data;
    private String pump;

    /**
     * Reads the refreshed run, before the static run's fit so bad input stops at once; nothing without
     * {@code --refreshed-run}.
     */
    void load(Set<LadderParameter> freed, TableOptions table, String bare, String pumpText) {
        if (file == null) {
            if (fluences != null || sidecar != null || repRate != null) {
                throw new IllegalArgumentException("--refreshed-fluences, --refreshed-traces-json and --refreshed-rep-rate "
                        + "describe the run given by --refreshed-run, which is missing");
            }
            return;
        }
        if (!freed.contains(LadderParameter.MULTIPLICATION_YIELD)) {
            throw new IllegalArgumentException("--refreshed-run is for the multiplication yield: add multiplication-yield to --free");
        }
        pump = pumpText;
        data = metadata(TraceTableReader.readAll(List.of(file), table), bare, pumpText);
    }

    /**
     * With a refreshed run loaded, fits it with the static run's set-up (but its own repetition rate) and returns its
     * yield summary with the static run's η and charged fraction beside it; else {@code staticYields}.
     */
    YieldSummary analyse(Dataset staticData, LadderFitSetup staticSetup, LadderFit.Outcome staticFit,
                         YieldSummary staticYields, FitProgress progress) {
        if (data == null || staticYields == null) {
            return staticYields;
        }
        double periodS = repRate == null ? Double.NaN : 1 / positive(repRate);
        LadderFitSetup setup = new LadderFitSetup(staticSetup.base(), periodS, staticSetup.free(), staticSetup.scaleStart(),
                staticSetup.timeZeroStartS(), staticSetup.irfFwhmS(), staticSetup.sharedAmplitude(), staticSetup.profile(),
                staticSetup.measuredIrf(), staticSetup.geometry(), staticSetup.fluenceScaleUncertainty());
        if (ChargingAwareYield.exposed(setup)) {
            throw new InputException(SourceLocation.of("--refreshed-rep-rate"), null, InputProblem.OUT_OF_RANGE,
                    "a refreshed run at " + repRate + " keeps charge from pulse to pulse: give a stirred or flowed run "
                            + "(no --refreshed-rep-rate) or one below 1 MHz");
        }
        ChargingAwareYield.Verdict v = ChargingAwareYield.analyse(staticData, staticSetup, staticFit, data, setup, progress);
        LadderFit.Outcome ref = v.refreshedRun().orElseThrow();
        if (!ref.result().ok()) {
            throw new IllegalArgumentException("the fit of the refreshed run " + file + " failed: " + ref.result().message());
        }
        OptionalDouble pumpJ = pump == null ? OptionalDouble.empty() : OptionalDouble.of(org.ladderkin.units.Photon.parseEnergyJ(pump));
        return YieldSummary.of(data, setup, ref, pumpJ).withStaticRun(v, staticSetup.periodS());
    }

    private Dataset metadata(Dataset data, String bare, String pump) {
        if (sidecar != null) {
            if (fluences != null) {
                throw new IllegalArgumentException("give either --refreshed-traces-json or --refreshed-fluences, not both");
            }
            return TraceSidecarCodec.applyForFit(sidecar, data);
        }
        if (fluences == null) {
            if (data.traces().stream().allMatch(t -> t.metadata().excitation().isPresent())) {
                return data;
            }
            throw new InputException(new SourceLocation(file.toString(), 1, 1), "excitation", InputProblem.MISSING_VALUE,
                    "no excitation for the refreshed run's traces (" + String.join(", ", data.labels())
                            + "): give --refreshed-fluences in column order or --refreshed-traces-json");
        }
        List<String> values = new ArrayList<>();
        for (String f : fluences) {
            String v = f.trim();
            boolean number = v.matches("[-+]?[0-9.]+([eE][-+]?[0-9]+)?");
            values.add(!number || bare.equals("n-avg") ? v : v + " photons/cm²");
        }
        return TraceArguments.apply(data, values, pump, "--refreshed-fluences");
    }

    private static double positive(String text) {
        double x = Quantity.parseSi(text, Dimension.FREQUENCY);
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException("--refreshed-rep-rate must be > 0, was " + text);
        }
        return x;
    }
}
