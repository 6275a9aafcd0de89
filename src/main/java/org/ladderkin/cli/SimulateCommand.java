package org.ladderkin.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.ladderkin.io.JsonStream;
import org.ladderkin.io.NumberText;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.ensemble.PumpPulse;
import org.ladderkin.kinetics.propagate.WorkBound;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.DelayTraces;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ladderkin simulate [MODEL.json] --n-avg 0.1,1,3 [--rep-rate 1kHz] [--delays 0.1ps..1ms:1000log]}: bleach
 * and PL traces in the periodic steady state of a pulse train (or after one pulse on fresh dots without
 * {@code --rep-rate}). The model comes from a file or entirely from flags.
 */
@Command(name = "simulate", mixinStandardHelpOptions = true,
        header = "Bleach and PL traces of the exciton ladder for given ⟨N⟩.",
        description = "Band-edge bleach (normalised to one filled level) and PL rate (photons/s per dot) after a pump"
            + " pulse, for each ⟨N⟩, in the periodic steady state of the pulse train when --rep-rate is given."
            + " The model is MODEL.json (schema ladderkin.model/1) or built from the model flags (--tau-rad ..."
            + " --degeneracy).")
final class SimulateCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(index = "0", arity = "0..1", paramLabel = "MODEL.json", description = "model file (omit to build the model from flags; the model flags do not combine with it)")
    Path modelFile;

    @Option(names = "--n-avg", split = ",", paramLabel = "N", defaultValue = "1",
            description = "mean excitons per dot per pulse ⟨N⟩ (with --multiplication-eta: mean absorbed photons), comma list")
    List<String> nAvg;

    @Option(names = "--rep-rate", paramLabel = "FREQ", description = "pulse repetition rate, e.g. 1kHz; omit for a single pulse on fresh dots")
    String repRate;

    @Option(names = "--delays", paramLabel = "GRID", defaultValue = "0.1ps..1ms:1000log",
            description = "delays: FROM..TO:COUNTlog, FROM..TO:COUNTlin or a comma list (default ${DEFAULT-VALUE})")
    String delays;

    @Option(names = "--format", paramLabel = "csv|json", defaultValue = "csv", description = "output format (default csv)")
    String format;

    @Option(names = "--multiplication-eta", paramLabel = "ETA",
            description = "carrier multiplication: probability that one absorbed photon gives two excitons")
    Double eta;

    @Option(names = "--observable", split = ",", paramLabel = "NAME", defaultValue = "bleach,pl",
            description = "columns to print: bleach, pl, spectrum, charged, temperature (default ${DEFAULT-VALUE})")
    List<String> observables;

    @Option(names = "--pump", paramLabel = "PHOTON", description = "pump wavelength or photon energy (temperature)")
    String pump;

    @Option(names = "--first-exciton", paramLabel = "PHOTON", description = "first-exciton peak, wavelength or energy (spectrum, temperature)")
    String firstExciton;

    @Option(names = "--material", paramLabel = "KEY", description = "material for the dot's heat capacity and sizing curve (temperature, spectrum)")
    String material;

    @Option(names = "--diameter", paramLabel = "LENGTH", description = "dot diameter, with --material")
    String diameter;

    @Option(names = "--spectrum", paramLabel = "A..B:N", defaultValue = "",
            description = "photon energies of the spectrum columns, e.g. 1.9eV..2.3eV:41 (default: E₁S ± 0.25 eV, 51 points)")
    String spectrumGrid;

    @Option(names = "--line-width", paramLabel = "ENERGY", defaultValue = "100 meV", description = "1S line FWHM (spectrum)")
    String lineWidth;

    @Option(names = "--biexciton-shift", paramLabel = "ENERGY", defaultValue = "0 meV",
            description = "red shift of the 1S line in a dot holding a cold exciton (spectrum)")
    String biexcitonShift;

    @Option(names = "--dispersion", paramLabel = "FRACTION", defaultValue = "0",
            description = "relative size dispersion σ_d/d̄, e.g. 10%%: average over the sizes (σ and ⟨N⟩ ∝ V, Auger rates ∝ 1/V);"
                    + " --n-avg is the mean size's")
    String dispersion;

    @Option(names = "--pulse-width", paramLabel = "TIME",
            description = "pump FWHM, e.g. 150fs: the pulse is propagated through its width when it is not short against"
                    + " the fastest populated process, or when --pump is within --line-width of --first-exciton")
    String pulseWidth;

    @Mixin
    ModelOptions modelOptions;

    @Override
    public Integer call() throws Exception {
        if (!format.equals("csv") && !format.equals("json")) {
            throw new IllegalArgumentException("--format must be csv or json, was " + format);
        }
        KineticModel model = model();
        double[] delaysS;
        try {
            delaysS = DelayGrid.parse(delays);
        } catch (IllegalArgumentException e) {
            // the grid is parsed here, not by a converter: name the option as every other bad flag value does
            throw new IllegalArgumentException("option '--delays': " + e.getMessage(), e);
        }
        double periodS = Double.NaN;
        if (repRate != null) {
            periodS = 1 / positive(repRate, Dimension.FREQUENCY, "--rep-rate");
        }
        List<PulseExcitation> pulses = new ArrayList<>();
        for (String n : nAvg) {
            double mean;
            try {
                mean = Double.parseDouble(n.trim());
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("--n-avg value '" + n + "' is not a number");
            }
            if (!(mean >= 0) || mean > 200) {
                throw new IllegalArgumentException("--n-avg values must be between 0 and 200, was " + n);
            }
            pulses.add(eta == null ? new PulseExcitation.Poisson(mean) : new PulseExcitation.Multiplication(mean, eta));
        }
        // |λ₂| and pulses-to-1 % cost a dense eigen-decomposition per ⟨N⟩ and only the JSON output prints them
        boolean convergence = format.equals("json");
        double work;
        try {
            work = LadderKinetics.checkWork(model, delaysS.length, !Double.isNaN(periodS), convergence,
                    pulses.toArray(PulseExcitation[]::new));
        } catch (org.ladderkin.kinetics.propagate.WorkLimitException e) {
            // the options the estimate rests on, so the line says what to change
            throw new IllegalArgumentException("--n-avg " + String.join(",", nAvg) + " with " + delaysS.length + " --delays: "
                    + e.getMessage(), e);
        }
        if (work > WorkBound.WARN_OPERATIONS && !quiet.on()) {
            spec.commandLine().getErr().println("ladderkin: note: about " + WorkBound.sci(work) + " operations (--n-avg, --delays, --rep-rate);"
                    + " this may take a while");
        }
        LadderKinetics kinetics = LadderKinetics.forPulses(model, pulses.toArray(PulseExcitation[]::new));
        // the grid's own bound (it depends on how the rates crowd) is checked before the steady states are solved;
        // the modal grid is kept by the propagator, so the traces below reuse it
        kinetics.propagator().onGrid(delaysS);
        List<SteadyState> states = new ArrayList<>();
        List<Populations> afters = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        SimulatedObservables.Inputs extra = extraInputs();
        for (int i = 0; i < pulses.size(); i++) {
            PulseExcitation p = pulses.get(i);
            SteadyState ss = null;
            if (Double.isNaN(periodS)) {
                afters.add(kinetics.applyPulse(Populations.ground(kinetics.space()), p));
            } else {
                ss = kinetics.steadyState(p, periodS, convergence);
                afters.add(ss.afterPulse());
            }
            states.add(ss);
            labels.add(nAvg.get(i).trim());
        }
        List<List<SimulatedObservables.Column>> columns;
        PumpPulse pump = pump(extra);
        double width = Quantity.parseSi(dispersion, Dimension.DIMENSIONLESS);
        if (!(width >= 0 && width < 0.5)) {
            throw new IllegalArgumentException("--dispersion must be at least 0 and below 50 %, was " + dispersion);
        }
        if (width == 0 && pump.fwhmS() == 0) {
            columns = SimulatedObservables.columnsForAll(observables, labels, kinetics, pulses, afters, delaysS, extra);
        } else {
            EnsembleSimulation.Result r = EnsembleSimulation.run(model, pulses, labels, periodS, delaysS, observables, extra,
                    width, pump, convergence);
            columns = r.columns();
            states = r.states();
            PrintWriter err = spec.commandLine().getErr();
            if (!quiet.on()) {
                err.printf(java.util.Locale.ROOT, "note: size dispersion %.3g %% (%d quadrature nodes); %s%n", 100 * width,
                        r.nodes(), r.pulseNote());
                err.flush();
            }
        }
        PrintWriter out = quiet.data();
        if (format.equals("csv")) {
            writeCsv(out, delaysS, columns);
        } else {
            writeJson(out, kinetics, periodS, delaysS, labels, states, columns);
        }
        out.flush();
        return ExitCodes.OK;
    }

    /** The pump as the kinetics see it; resonant when --pump lies within --line-width of --first-exciton. */
    private PumpPulse pump(SimulatedObservables.Inputs in) {
        if (pulseWidth == null) {
            return PumpPulse.INSTANT;
        }
        double fwhm = positive(pulseWidth, Dimension.TIME, "--pulse-width");
        boolean resonant = !Double.isNaN(in.photonEnergyJ()) && !Double.isNaN(in.firstExcitonJ())
                && Math.abs(in.photonEnergyJ() - in.firstExcitonJ()) <= in.lineFwhmJ();
        return new PumpPulse(fwhm, resonant);
    }

    private SimulatedObservables.Inputs extraInputs() {
        double photon = pump == null ? Double.NaN : photonEnergy(pump, "--pump");
        double first = firstExciton == null ? Double.NaN : photonEnergy(firstExciton, "--first-exciton");
        double heatCapacity = Double.NaN;
        if (material != null) {
            if (diameter == null) {
                throw new IllegalArgumentException("--material needs --diameter");
            }
            var m = org.ladderkin.io.MaterialLibrary.fromHome().material(material);
            double d = positive(diameter, Dimension.LENGTH, "--diameter");
            heatCapacity = DelayTraces.dotHeatCapacityJPerK(m, d);
            if (Double.isNaN(first) && m.sizing().isPresent()) {
                first = m.sizing().get().firstExcitonEnergyJ(d);
            }
        }
        double[] energies;
        if (spectrumGrid.isBlank()) {
            energies = Double.isNaN(first) ? new double[0] : linspace(first - 0.25 * EV, first + 0.25 * EV, 51);
        } else {
            String[] range = spectrumGrid.split("\\.\\.|:");
            if (range.length != 3) {
                throw new IllegalArgumentException("--spectrum must look like 1.9eV..2.3eV:41, was " + spectrumGrid);
            }
            int count;
            try {
                count = Integer.parseInt(range[2].trim());
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("--spectrum point count '" + range[2] + "' is not a whole number");
            }
            energies = linspace(photonEnergy(range[0], "--spectrum"), photonEnergy(range[1], "--spectrum"), Math.max(2, count));
        }
        return new SimulatedObservables.Inputs(photon, first, heatCapacity, energies,
                positive(lineWidth, Dimension.ENERGY, "--line-width"),
                org.ladderkin.units.Quantity.parseSi(biexcitonShift, Dimension.ENERGY));
    }

    private static final double EV = org.ladderkin.units.PhysicalConstants.ELECTRONVOLT_J;

    private static double[] linspace(double a, double b, int n) {
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = a + (b - a) * i / (n - 1);
        }
        return out;
    }

    private static double photonEnergy(String text, String flag) {
        try {
            return org.ladderkin.units.Photon.parseEnergyJ(text.trim());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(flag + ": " + e.getMessage());
        }
    }
    /** Characters gathered before they go to the output: the table streams, it is never held whole. */
    private static final int CHUNK = 1 << 16;

    private static void writeCsv(PrintWriter out, double[] delaysS, List<List<SimulatedObservables.Column>> columns) {
        String nl = System.lineSeparator();
        StringBuilder buf = new StringBuilder(CHUNK + 4096);
        buf.append("delay_ps");
        List<double[]> values = new ArrayList<>();
        for (List<SimulatedObservables.Column> perN : columns) {
            for (SimulatedObservables.Column c : perN) {
                buf.append(',').append(c.name().contains(",") ? "\"" + c.name() + "\"" : c.name());
                values.add(c.values());
            }
        }
        buf.append(nl);
        for (int j = 0; j < delaysS.length; j++) {
            NumberText.appendG15(buf, delaysS[j] * 1e12);
            for (double[] v : values) {
                buf.append(',');
                NumberText.appendG15(buf, v[j]);
            }
            buf.append(nl);
            if (buf.length() >= CHUNK) {
                out.append(buf);
                buf.setLength(0);
            }
        }
        out.append(buf);
    }

    /** The ladderkin.simulation/1 document, streamed (same text as building it as a tree and printing that). */
    private static void writeJson(PrintWriter out, LadderKinetics kinetics, double periodS, double[] delaysS,
                                  List<String> labels, List<SteadyState> states,
                                  List<List<SimulatedObservables.Column>> columns) throws IOException {
        try (JsonGenerator g = JsonStream.open(out)) {
            g.writeStartObject();
            g.writeStringField("schema", "ladderkin.simulation/1");
            g.writeNumberField("states", kinetics.space().size());
            g.writeNumberField("nMax", kinetics.space().nMax());
            if (!Double.isNaN(periodS)) {
                g.writeNumberField("repetitionRateHz", 1 / periodS);
            }
            g.writeArrayFieldStart("delaysPs");
            for (double x : delaysS) {
                g.writeNumber(x * 1e12);
            }
            g.writeEndArray();
            g.writeArrayFieldStart("series");
            for (int i = 0; i < labels.size(); i++) {
                g.writeStartObject();
                g.writeStringField("nAvg", labels.get(i));
                SteadyState ss = states.get(i);
                if (ss != null) {
                    g.writeObjectFieldStart("steadyState");
                    // one name per quantity, each defined once in docs/physics.md §10
                    g.writeNumberField("excitedFractionAtNextPulse", ss.residualExcitedFraction());
                    g.writeNumberField("chargedFractionAtNextPulse", ss.chargedFraction());
                    g.writeNumberField("excitedOrChargedFractionAtNextPulse", ss.beforePulse().expectation(
                            org.ladderkin.kinetics.Observables.excitedOrCharged(kinetics.space())));
                    g.writeNumberField("secondEigenvalueModulus", ss.secondEigenvalueModulus());
                    g.writeNumberField("pulsesToWithinOnePercent", ss.pulsesToOnePercent());
                    g.writeNumberField("timeToWithinOnePercentS", ss.timeToOnePercentS());
                    g.writeEndObject();
                }
                g.writeObjectFieldStart("columns");
                for (SimulatedObservables.Column c : columns.get(i)) {
                    g.writeArrayFieldStart(c.name());
                    for (double x : c.values()) {
                        g.writeNumber(x);
                    }
                    g.writeEndArray();
                }
                g.writeEndObject();
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        // the tree printer ended the text with a line separator and println added one more
        out.print(System.lineSeparator());
        out.print(System.lineSeparator());
    }

    /** 15 significant digits, locale-independent. */
    static String num(double x) {
        return NumberText.g15(x);
    }

    private KineticModel model() {
        return modelOptions.model(modelFile);
    }

    private static double positive(String text, Dimension d, String flag) {
        double x = Quantity.parseSi(text, d);
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException(flag + " must be > 0, was " + text);
        }
        return x;
    }
}
