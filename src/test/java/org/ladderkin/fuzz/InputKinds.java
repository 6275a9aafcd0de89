package org.ladderkin.fuzz;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.ladderkin.fuzz.Mutator.Format;
import org.ladderkin.io.AbsorptionSpectrumCsv;
import org.ladderkin.io.BeamFiles;
import org.ladderkin.io.BeamImageReader;
import org.ladderkin.io.HistogramReader;
import org.ladderkin.io.IntegratedPlReader;
import org.ladderkin.io.IrfFileReader;
import org.ladderkin.io.KnifeEdgeReader;
import org.ladderkin.io.MaterialCodec;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.MatrixCodec;
import org.ladderkin.io.MatrixOptions;
import org.ladderkin.io.ModelCodec;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.SampleCodec;
import org.ladderkin.io.TaMatrixReader;
import org.ladderkin.io.TableOptions;
import org.ladderkin.io.TraceSidecarCodec;
import org.ladderkin.io.TraceTableReader;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.plan.ModelAssumptions;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.units.Units;

/**
 * Every kind of input ladderkin reads, with the shipped example files (or, where none ships, a small valid one) it
 * is mutated from, and how a mutant is fed in: to the reader directly, or on a command line run in process.
 */
final class InputKinds {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", ".")).toAbsolutePath().normalize();
    static final Path PLANS = HOME.resolve("experiments-plan");

    /** Feeds one mutant, written at {@code file} inside a fresh folder {@code dir}, to a reader; returns what it read. */
    interface ReaderTarget {
        Object read(Path file, Path dir) throws Exception;
    }

    /** The command line that feeds a mutant at {@code file} (in {@code dir}, with the other demo files beside it). */
    interface CommandTarget {
        List<String> args(Path file, Path dir);
    }

    /**
     * One input kind. {@code seeds} are valid inputs; the mutant of a seed is written under the seed's own file name
     * (plans name their neighbours by relative path, so the other demo files are copied beside it).
     */
    record Kind(String name, Format format, List<Path> seeds, double weight, ReaderTarget reader, CommandTarget command) {
    }

    private InputKinds() {
    }

    static List<Kind> all() {
        List<Kind> k = new ArrayList<>();
        List<Path> plans = files(PLANS, ".plan.json");
        List<Path> materials = files(HOME.resolve("models/materials"), ".json");
        List<Path> matrices = files(HOME.resolve("models/matrices"), ".json");
        List<Path> models = files(HOME.resolve("models/presets"), ".model.json");
        Path sample = PLANS.resolve("fh-pbse-17.sample.json");
        Path traces = PLANS.resolve("fh-cdse-ta-series.csv");
        Path sidecar = PLANS.resolve("fh-cdse-ta-series.traces.json");
        Path irf = PLANS.resolve("fh-ta-irf.csv");
        List<Path> spectra = files(PLANS, ".absorption.csv");
        Path knife = PLANS.resolve("fh-pump-knife-edge.csv");
        Path camera = PLANS.resolve("fh-probe-camera.png");
        Path histogram = Seeds.HISTOGRAM;
        Path integrated = Seeds.INTEGRATED_PL;
        Path taMatrix = Seeds.TA_MATRIX;
        Path pixels = Seeds.PIXEL_MATRIX;

        // readers called directly: cheap, so most cases
        k.add(reader("plan", Format.JSON, plans, 12, (f, d) -> PlanCodec.read(f)));
        k.add(reader("sample", Format.JSON, List.of(sample), 6, (f, d) -> SampleCodec.read(f)));
        k.add(reader("material", Format.JSON, materials, 10, InputKinds::materialInUse));
        k.add(reader("matrix", Format.JSON, matrices, 4, (f, d) -> MatrixCodec.read(f)));
        k.add(reader("model", Format.JSON, models, 8, (f, d) -> ModelCodec.read(f)));
        k.add(reader("sidecar", Format.JSON, List.of(sidecar), 6,
                (f, d) -> TraceSidecarCodec.apply(f, TraceTableReader.read(traces, traces.toString(), TableOptions.defaults()))));
        k.add(reader("trace-table", Format.TABLE, List.of(traces), 8,
                (f, d) -> TraceTableReader.read(f, f.toString(), TableOptions.defaults())));
        k.add(reader("irf-table", Format.TABLE, List.of(irf), 6, (f, d) -> IrfFileReader.read(f, f.toString())));
        k.add(reader("spectrum", Format.TABLE, spectra, 4, (f, d) -> AbsorptionSpectrumCsv.read(f, f.toString())));
        // the demo plans that load these spectra, read beside the mutant: the cross-section at the pump comes from it
        k.add(reader("spectrum in plan", Format.TABLE, spectra, 3, (f, d) -> PlanCodec.read(d.resolve(
                f.getFileName().toString().startsWith("fh-cpb") ? "cspbbr3-auger-1khz.plan.json" : "inp-zns-tcspc-5mhz.plan.json"))));
        k.add(reader("knife-edge", Format.TABLE, List.of(knife), 6,
                (f, d) -> BeamFiles.measure(f, f.toString(), BeamFiles.Options.none(), Double.NaN)));
        k.add(reader("knife-edge-table", Format.TABLE, List.of(knife), 3, (f, d) -> KnifeEdgeReader.read(f, f.toString())));
        k.add(reader("beam-png", Format.BINARY, List.of(camera), 4, (f, d) -> BeamImageReader.read(f, f.toString(), Double.NaN)));
        k.add(reader("pixel-matrix", Format.TABLE, List.of(pixels), 3,
                (f, d) -> BeamFiles.measure(f, f.toString(), new BeamFiles.Options(5.5e-6, Double.NaN), Double.NaN)));
        k.add(reader("histogram", Format.TABLE, List.of(histogram), 5, (f, d) -> HistogramReader.read(f, f.toString(), Double.NaN, false)));
        k.add(reader("integrated-pl", Format.TABLE, List.of(integrated), 4, (f, d) -> IntegratedPlReader.read(f, f.toString())));
        k.add(reader("ta-matrix", Format.TABLE, List.of(taMatrix), 4,
                (f, d) -> TaMatrixReader.read(f, f.toString(), MatrixOptions.window(575e-9, 585e-9, Units.of("ps")))));

        // the same inputs through the commands that read them: slower, fewer cases
        k.add(command("cmd plan", Format.JSON, plans, 0.6, (f, d) -> List.of("plan", f.toString(), "--out", d.resolve("out").toString(), "--quiet")));
        k.add(command("cmd simulate model", Format.JSON, models, 3,
                (f, d) -> List.of("simulate", f.toString(), "--n-avg", "0.3,2", "--delays", "0.1ps..1ns:30log", "--quiet")));
        k.add(command("cmd excite sample", Format.JSON, List.of(sample), 3,
                (f, d) -> List.of("excite", f.toString(), "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um",
                        "--probe-radius", "50um", "--pump", "400nm", "--quiet")));
        k.add(command("cmd beam", Format.TABLE, List.of(knife), 2, (f, d) -> List.of("beam", f.toString(), "--quiet")));
        k.add(command("cmd beam png", Format.BINARY, List.of(camera), 1,
                (f, d) -> List.of("beam", f.toString(), "--pixel-pitch", "5.5um", "--quiet")));
        k.add(command("cmd fit sidecar", Format.JSON, List.of(sidecar), 0.5,
                (f, d) -> List.of("fit", d.resolve(traces.getFileName()).toString(), "--traces-json", f.toString(), "--tau-rad", "20ns",
                        "--tau-auger2", "50ps", "--free", "scale", "--cross-section", "5e-15cm2", "--out", d.resolve("out").toString(),
                        "--quiet")));
        k.add(command("cmd fit traces", Format.TABLE, List.of(traces), 0.5,
                (f, d) -> List.of("fit", f.toString(), "--traces-json", d.resolve(sidecar.getFileName()).toString(), "--tau-rad", "20ns",
                        "--tau-auger2", "50ps", "--free", "scale", "--cross-section", "5e-15cm2", "--out", d.resolve("out").toString(),
                        "--quiet")));
        k.add(command("cmd fit irf", Format.TABLE, List.of(irf), 0.5,
                (f, d) -> List.of("fit", d.resolve(traces.getFileName()).toString(), "--traces-json", d.resolve(sidecar.getFileName()).toString(),
                        "--irf-file", f.toString(), "--tau-rad", "20ns", "--tau-auger2", "50ps", "--free", "scale", "--cross-section", "5e-15cm2",
                        "--quiet")));
        return k;
    }

    private static Kind reader(String name, Format format, List<Path> seeds, double weight, ReaderTarget t) {
        return new Kind(name, format, seeds, weight, t, null);
    }

    private static Kind command(String name, Format format, List<Path> seeds, double weight, CommandTarget t) {
        return new Kind(name, format, seeds, weight, null, t);
    }

    /**
     * A material file read, then put to use: the demo plans read against a library holding it and their model
     * assumptions built, which is where a material's missing values used to surface untyped.
     */
    private static Object materialInUse(Path file, Path dir) throws Exception {
        Object material = MaterialCodec.read(file);
        Path home = dir.resolve("home");
        Files.createDirectories(home.resolve("models/materials"));
        for (Path m : files(HOME.resolve("models/materials"), ".json")) {
            if (!m.getFileName().equals(file.getFileName())) {
                Files.copy(m, home.resolve("models/materials").resolve(m.getFileName()));
            }
        }
        Files.copy(file, home.resolve("models/materials").resolve(file.getFileName()));
        Files.createDirectories(home.resolve("models/matrices"));
        for (Path m : files(HOME.resolve("models/matrices"), ".json")) {
            Files.copy(m, home.resolve("models/matrices").resolve(m.getFileName()));
        }
        MaterialLibrary library = MaterialLibrary.load(home);
        List<Object> read = new ArrayList<>(List.of(material));
        for (Path plan : files(dir, ".plan.json")) {
            PlanInputs in = PlanCodec.read(JsonTree.read(plan, plan.toString()), library);
            read.add(ModelAssumptions.forSample(in.sample(), in.modelOverrides(), 2 * in.laser().pumpRadiusM()));
        }
        return read;
    }

    static List<Path> files(Path dir, String suffix) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().endsWith(suffix)).sorted().toList();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
