package org.ladderkin.fuzz;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import org.ladderkin.cli.Main;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/**
 * Random command lines: a working line of each command with one or a few flags changed, dropped, repeated or added,
 * or a line of random flags of a random command. The flags are the commands' own (read from picocli), so a new
 * flag is fuzzed without a change here.
 */
final class CommandLines {

    /** Commands that open windows, run benchmarks or write the user's archive are left out. */
    private static final List<String> COMMANDS = List.of("plan", "simulate", "fit", "excite", "beam", "materials", "fit-yields");
    private static final List<String> SKIPPED_OPTIONS = List.of("--archive", "--help", "-h", "--version", "-V", "--out", "--quiet", "-q");

    private static final List<String> NUMBERS = List.of("1", "0.5", "50", "400", "2", "1e-3", "3e14", "20", "0.1");
    private static final List<String> UNITS = List.of("ps", "ns", "fs", "ms", "s", "nm", "um", "µm", "mm", "eV", "kHz", "MHz", "GHz",
            "Hz", "nJ", "uJ", "µJ", "mJ", "mW", "uW", "cm2", "cm²", "photons/cm2", "mJ/cm2", "uM", "%", "K", "");
    private static final List<String> WORDS = List.of("statistical", "pairs", "quadratic", "negative", "positive", "on-axis",
            "first-exciton", "json", "text", "csv", "scale", "tau-auger2", "time-zero", "n-avg", "bleach", "pl", "CdSe", "PbSe",
            "toluene", "neutral", "ionised", "cross-section", "0..1ns:20lin", "0.1ps..1ms:50log", "1ps..0ps:3lin", "1.9..2.2:5");

    private final Random rnd;
    private final Path dir;
    private final Map<String, List<String>> options = new TreeMap<>();

    CommandLines(Random rnd, Path dir) {
        this.rnd = rnd;
        this.dir = dir;
        CommandLine root = Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
        for (String c : COMMANDS) {
            List<String> names = new ArrayList<>();
            for (OptionSpec o : root.getSubcommands().get(c).getCommandSpec().options()) {
                if (SKIPPED_OPTIONS.stream().noneMatch(s -> List.of(o.names()).contains(s))) {
                    names.add(o.longestName() + (o.arity().max() == 0 ? "" : "="));
                }
            }
            options.put(c, names);
        }
    }

    private static String demo(String name) {
        return InputKinds.PLANS.resolve(name).toString();
    }

    /** Working lines to start from. */
    private List<List<String>> bases() {
        String out = dir.resolve("out").toString();
        return List.of(
                List.of("simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--n-avg", "0.1,1,3", "--rep-rate", "1kHz",
                        "--delays", "0.1ps..1ms:50log"),
                List.of("simulate", InputKinds.HOME.resolve("models/presets/cdse-4nm.model.json").toString(), "--n-avg", "0.5,2",
                        "--delays", "0.1ps..1ns:30log", "--observable", "bleach,pl"),
                List.of("excite", demo("fh-pbse-17.sample.json"), "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um",
                        "--probe-radius", "50um", "--pump", "400nm"),
                List.of("excite", "--material", "PbSe", "--diameter", "5nm", "--od", "3.5", "--path", "1mm", "--pump", "400nm",
                        "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um"),
                List.of("beam", demo("fh-pump-knife-edge.csv")),
                List.of("beam", demo("fh-probe-camera.png"), "--pixel-pitch", "5.5um", "--wavelength", "400nm"),
                List.of("plan", demo("cdse-auger-1khz.plan.json"), "--out", out, "--what-if", "rate=500Hz"),
                List.of("fit", demo("fh-cdse-ta-series.csv"), "--traces-json", demo("fh-cdse-ta-series.traces.json"), "--tau-rad",
                        "20ns", "--tau-auger2", "50ps", "--free", "scale", "--cross-section", "5e-15cm2", "--out", out),
                List.of("materials"));
    }

    /** One random command line (without --quiet, which the caller adds). */
    List<String> next() {
        if (rnd.nextInt(4) == 0) {
            return random();
        }
        List<List<String>> bases = bases();
        // the plan and the fit are slow when they succeed: drawn less often
        int b = rnd.nextInt(40) == 0 ? 6 + rnd.nextInt(2) : List.of(0, 1, 2, 3, 4, 5, 8).get(rnd.nextInt(7));
        List<String> line = new ArrayList<>(bases.get(b));
        int changes = 1 + rnd.nextInt(rnd.nextInt(4) == 0 ? 4 : 1);
        for (int i = 0; i < changes; i++) {
            change(line);
        }
        return line;
    }

    private List<String> random() {
        String c = rnd.nextInt(20) == 0 ? "no-such-command" : COMMANDS.get(rnd.nextInt(COMMANDS.size()));
        List<String> line = new ArrayList<>(List.of(c));
        int n = rnd.nextInt(8);
        for (int i = 0; i < n; i++) {
            addOption(line, c);
        }
        if (rnd.nextBoolean()) {
            line.add(path());
        }
        return line;
    }

    private void change(List<String> line) {
        List<Integer> values = new ArrayList<>();
        for (int i = 1; i < line.size(); i++) {
            if (!line.get(i).startsWith("--")) {
                values.add(i);
            }
        }
        int k = rnd.nextInt(10);
        if (k < 5 && !values.isEmpty()) {
            int at = values.get(rnd.nextInt(values.size()));
            line.set(at, line.get(at - 1).startsWith("--") ? value() : path());
        } else if (k < 6 && line.size() > 2) {
            int at = 1 + rnd.nextInt(line.size() - 1);
            line.remove(at);
        } else if (k < 7 && line.size() > 2) {
            int at = 1 + rnd.nextInt(line.size() - 1);
            line.add(at, line.get(at));
        } else {
            addOption(line, line.get(0));
        }
    }

    private void addOption(List<String> line, String command) {
        List<String> names = options.getOrDefault(command, List.of("--x="));
        String name = names.isEmpty() ? "--x=" : names.get(rnd.nextInt(names.size()));
        if (rnd.nextInt(20) == 0) {
            name = name.substring(0, Math.max(3, name.length() - 2)) + "=";
        }
        if (name.endsWith("=")) {
            String v = name.contains("file") || name.contains("json") || name.contains("sample") || name.contains("model")
                    || name.contains("plan") || name.contains("spectrum") || name.contains("run") || name.contains("ta=") ? path() : value();
            if (rnd.nextBoolean()) {
                line.add(name + v);
            } else {
                line.add(name.substring(0, name.length() - 1));
                line.add(v);
            }
        } else {
            line.add(name);
        }
    }

    /** A flag value: a quantity, a list, a word, or something hostile. */
    String value() {
        int k = rnd.nextInt(12);
        String number = rnd.nextInt(3) == 0 ? pick(Mutator.NASTY_NUMBERS) : pick(NUMBERS);
        return switch (k) {
            case 0, 1, 2, 3 -> number + (rnd.nextBoolean() ? "" : " ") + pick(UNITS);
            case 4 -> number + pick(Mutator.NASTY_UNITS);
            case 5 -> number + "," + pick(NUMBERS) + "," + pick(Mutator.NASTY_NUMBERS);
            case 6 -> pick(WORDS);
            case 7 -> pick(WORDS) + pick(Mutator.NASTY_TEXT);
            case 8 -> number;
            case 9 -> rnd.nextInt(10) == 0 ? "1".repeat(60_000) + "ps" : "x".repeat(300);
            case 10 -> pick(Mutator.NASTY_TEXT);
            default -> "30," + pick(NUMBERS) + "," + (rnd.nextBoolean() ? "200" : "1e6");
        };
    }

    /** A file argument: a demo file of another kind, a missing file, a folder, a path with a NUL, a system file. */
    String path() {
        return switch (rnd.nextInt(9)) {
            case 0 -> demo("cdse-auger-1khz.plan.json");
            case 1 -> demo("fh-cdse-ta-series.csv");
            case 2 -> demo("fh-pbse-17.sample.json");
            case 3 -> dir.resolve("absent.json").toString();
            case 4 -> dir.toString();
            case 5 -> dir + "/a\u0000b.json";
            case 6 -> rnd.nextBoolean() ? "/proc/self/environ" : "/etc/passwd";
            case 7 -> demo("fh-probe-camera.png");
            default -> "";
        };
    }

    private <T> T pick(List<T> from) {
        return from.get(rnd.nextInt(from.size()));
    }
}
