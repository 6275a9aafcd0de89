package org.ladderkin.fuzz;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.reflect.Array;
import java.lang.reflect.RecordComponent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.ladderkin.cli.Main;
import org.ladderkin.io.InputException;

/**
 * How one fuzz case ended, and the rules that judge it. A located one-line error with the documented exit code passes;
 * an accepted input passes only when every number that came out is finite; anything else fails.
 */
final class FuzzCase {

    enum Verdict {
        /** A one-line error naming where the problem is, with the documented exit code. */
        LOCATED,
        /** The input was taken and everything that came out is finite. */
        ACCEPTED,
        /** One of the two simulate hangs the issue names, owned by the engine's work bounds. */
        KNOWN_ENGINE,
        /** A crash, a hang, an unlocated or multi-line error, a non-finite output. */
        FAIL
    }

    record Outcome(Verdict verdict, String detail) {
        static Outcome fail(String detail) {
            return new Outcome(Verdict.FAIL, detail);
        }
    }

    /** What a command run in process printed and returned. */
    record Run(int exit, String out, String err) {
    }

    private FuzzCase() {
    }

    static Run run(List<String> args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit;
        try {
            exit = Main.commandLine(new PrintWriter(out), new PrintWriter(err)).execute(args.toArray(String[]::new));
        } catch (VirtualMachineError e) {
            // Main.main turns these into one line and exit 1, which the judge counts as a failure either way
            return new Run(1, out.toString(), err + "ladderkin: " + e);
        }
        return new Run(exit, out.toString(), err.toString());
    }

    // ---- readers called directly ----------------------------------------------------------------------------------

    /** A reader's result or the exception it threw, judged; {@code fileName} must appear in an error's message. */
    static Outcome judgeReader(Object result, Throwable thrown, String fileName) {
        if (thrown == null) {
            String bad = nonFinite(result);
            return bad == null ? new Outcome(Verdict.ACCEPTED, "") : Outcome.fail("accepted with a non-finite value at " + bad);
        }
        if (thrown instanceof InputException e) {
            return judgeLine(e.getMessage(), fileName, true);
        }
        return Outcome.fail("untyped " + describe(thrown));
    }

    /** One line, short, naming the file (and, when {@code needFile}, nothing less). */
    static Outcome judgeLine(String line, String fileName, boolean needFile) {
        if (line == null || line.isBlank()) {
            return Outcome.fail("an empty error message");
        }
        if (line.indexOf('\n') >= 0 || line.indexOf('\r') >= 0 || line.indexOf('\u2028') >= 0) {
            return Outcome.fail("an error of more than one line: " + Mutator.escape(line));
        }
        if (hasControl(line)) {
            return Outcome.fail("an error with a raw control character: " + Mutator.escape(line));
        }
        if (line.length() > 1_500) {
            return Outcome.fail("an error of " + line.length() + " characters: " + Mutator.escape(line));
        }
        if (line.contains("Exception") || line.contains("\tat ")) {
            return Outcome.fail("an error showing an exception: " + Mutator.escape(line));
        }
        if (needFile && fileName != null && !line.contains(fileName)) {
            return Outcome.fail("an error that does not name the file " + fileName + ": " + Mutator.escape(line));
        }
        return new Outcome(Verdict.LOCATED, line);
    }

    private static boolean hasControl(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isISOControl(c) && c != '\t') {
                return true;
            }
        }
        return false;
    }

    static String describe(Throwable t) {
        StringBuilder b = new StringBuilder(t.getClass().getName()).append(": ").append(Mutator.escape(String.valueOf(t.getMessage())));
        StackTraceElement[] st = t.getStackTrace();
        for (int i = 0; i < Math.min(6, st.length); i++) {
            b.append(" | at ").append(st[i]);
        }
        if (t.getCause() != null && t.getCause() != t) {
            b.append(" | caused by ").append(t.getCause().getClass().getName()).append(": ")
                    .append(Mutator.escape(String.valueOf(t.getCause().getMessage())));
        }
        return b.toString();
    }

    /** Path of the first non-finite double reachable through records, collections, arrays and optionals; null if none. */
    static String nonFinite(Object o) {
        return nonFinite(o, "result", 0, java.util.Collections.newSetFromMap(new IdentityHashMap<>()));
    }

    private static String nonFinite(Object o, String at, int depth, Set<Object> seen) {
        if (o == null || depth > 8) {
            return null;
        }
        if (o instanceof Double d) {
            // NaN is how the domain writes "not given" in optional record fields, and an infinite time "never"
            return Double.isInfinite(d) && !(d > 0 && at.endsWith("S")) ? at : null;
        }
        if (o instanceof Float || o instanceof Number || o instanceof CharSequence || o instanceof Enum<?> || o instanceof Path
                || o instanceof Boolean) {
            return null;
        }
        if (!seen.add(o)) {
            return null;
        }
        if (o instanceof double[] a) {
            for (int i = 0; i < a.length; i++) {
                if (!Double.isFinite(a[i])) {
                    return at + "[" + i + "]";
                }
            }
            return null;
        }
        if (o.getClass().isArray() && !o.getClass().getComponentType().isPrimitive()) {
            for (int i = 0; i < Math.min(Array.getLength(o), 10_000); i++) {
                String r = nonFinite(Array.get(o, i), at + "[" + i + "]", depth + 1, seen);
                if (r != null) {
                    return r;
                }
            }
            return null;
        }
        if (o instanceof Optional<?> opt) {
            return opt.isPresent() ? nonFinite(opt.get(), at, depth + 1, seen) : null;
        }
        if (o instanceof OptionalDouble od) {
            return od.isPresent() && !Double.isFinite(od.getAsDouble()) ? at : null;
        }
        if (o instanceof Collection<?> c) {
            int i = 0;
            for (Object x : c) {
                String r = nonFinite(x, at + "[" + i++ + "]", depth + 1, seen);
                if (r != null) {
                    return r;
                }
            }
            return null;
        }
        if (o instanceof Map<?, ?> m) {
            for (Map.Entry<?, ?> e : m.entrySet()) {
                String r = nonFinite(e.getValue(), at + "." + e.getKey(), depth + 1, seen);
                if (r != null) {
                    return r;
                }
            }
            return null;
        }
        if (o.getClass().isRecord()) {
            for (RecordComponent rc : o.getClass().getRecordComponents()) {
                Object v;
                try {
                    rc.getAccessor().setAccessible(true);
                    v = rc.getAccessor().invoke(o);
                } catch (ReflectiveOperationException | RuntimeException e) {
                    continue;
                }
                String r = nonFinite(v, at + "." + rc.getName(), depth + 1, seen);
                if (r != null) {
                    return r;
                }
            }
        }
        return null;
    }

    // ---- commands run in process ----------------------------------------------------------------------------------

    /** An option named anywhere in the line: on a command line, that is the location. */
    private static final Pattern OPTION_NAMED = Pattern.compile("(^|[ '(])--[a-z]");
    private static final Pattern NON_FINITE = Pattern.compile("(?<![A-Za-z.])(NaN|-?Infinity|∞)(?![A-Za-z])");

    /**
     * A command's run judged: exit 0 with finite outputs (standard output and the files in {@code outDir}), or exit 2
     * or 3 with one line naming one of {@code names} (the file mutated, an option given) or another option.
     */
    static Outcome judgeCommand(Run r, Path outDir, List<String> names) throws IOException {
        if (r.exit() == 0) {
            if (r.err().contains("\tat ") || r.err().contains("Exception")) {
                return Outcome.fail("exit 0 with an exception on stderr: " + Mutator.escape(r.err()));
            }
            var m = NON_FINITE.matcher(r.out());
            if (m.find()) {
                return Outcome.fail("exit 0 with '" + m.group() + "' on stdout near " + Mutator.escape(around(r.out(), m.start())));
            }
            if (outDir != null && Files.isDirectory(outDir)) {
                try (Stream<Path> files = Files.walk(outDir)) {
                    for (Path f : files.filter(Files::isRegularFile).toList()) {
                        String text = Files.readString(f, java.nio.charset.StandardCharsets.ISO_8859_1);
                        var fm = NON_FINITE.matcher(text);
                        if (fm.find() && !f.toString().endsWith(".html")) {
                            return Outcome.fail("exit 0 with '" + fm.group() + "' in " + f.getFileName() + " near "
                                    + Mutator.escape(around(text, fm.start())));
                        }
                    }
                }
            }
            return new Outcome(Verdict.ACCEPTED, "");
        }
        if (r.exit() != 2 && r.exit() != 3) {
            return Outcome.fail("exit " + r.exit() + ": " + Mutator.escape(r.err()));
        }
        List<String> lines = r.err().strip().lines().toList();
        String line = lines.isEmpty() ? "" : lines.get(lines.size() - 1);
        for (String l : lines) {
            if (!l.startsWith("ladderkin") && !l.startsWith("warning: ") && !l.startsWith("note: ")) {
                return Outcome.fail("exit " + r.exit() + " with a stray line on stderr: " + Mutator.escape(r.err()));
            }
        }
        Outcome o = judgeLine(line, null, false);
        if (o.verdict() == Verdict.FAIL) {
            return o;
        }
        if (r.exit() == 3 && names.stream().noneMatch(line::contains) && !OPTION_NAMED.matcher(line).find()) {
            return Outcome.fail("exit 3 naming none of " + names + ": " + Mutator.escape(line));
        }
        return o;
    }

    private static String around(String s, int at) {
        return s.substring(Math.max(0, at - 60), Math.min(s.length(), at + 20));
    }
}
