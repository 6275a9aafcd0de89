package org.ladderkin;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The package table of ../shared/ARCHITECTURE.md ("knows about"), checked on every source file under src/main/java.
 *
 * <p>The rule: a package may use itself, the packages it knows about, and transitively what those know about. Knowing a
 * room (a top-level package) means knowing all of its sub-packages. Inside one room the sub-packages form their own
 * order ({@link #INSIDE}); the few class-level exceptions ({@link #EXCEPTIONS}) say why they exist. Below {@code io}
 * no package draws windows, parses command lines, prints or touches files.
 *
 * <p>References are {@code import} lines and fully qualified names in code; comments and string literals are blanked
 * first, so a Javadoc link or a resource name does not count.
 */
class ArchitectureTest {

    private static final String ROOT = "org.ladderkin";

    /** Rooms and what each knows about directly, in the order of ARCHITECTURE.md. */
    static final Map<String, List<String>> ROOMS = new LinkedHashMap<>();

    static {
        ROOMS.put("units", List.of());
        ROOMS.put("material", List.of("units"));
        ROOMS.put("sample", List.of("material", "units"));
        ROOMS.put("excite", List.of("sample", "units"));
        ROOMS.put("kinetics", List.of("excite", "sample"));
        ROOMS.put("observe", List.of("kinetics"));
        ROOMS.put("fit", List.of("observe", "kinetics", "excite"));
        ROOMS.put("plan", List.of("observe", "fit"));
        ROOMS.put("archive", List.of("plan", "fit"));
        ROOMS.put("report", List.of("archive", "plan", "fit"));
        // "all value types": everything up to archive, but not report, cli or gui.
        ROOMS.put("io", List.of("units", "material", "sample", "excite", "kinetics", "observe", "fit", "plan", "archive"));
        // cli and gui both sit on top. gui never uses cli; cli starts the planner (`gui` command) and times its
        // prediction (`bench --planner`), so cli knows gui and not the other way round.
        ROOMS.put("gui", List.of("report", "io"));
        ROOMS.put("cli", List.of("report", "io", "gui"));
    }

    /** Sub-packages of a room ("" is the room's own package) and which sibling each knows about directly. */
    static final Map<String, Map<String, List<String>>> INSIDE = new LinkedHashMap<>();

    static {
        for (String room : ROOMS.keySet()) {
            INSIDE.put(room, Map.of("", List.of()));
        }
        // state < rate < propagate < train < facade (root) < ensemble, process: ensemble averages whole facade runs;
        // process describes models by their processes and assembles the facade's KineticModel from them.
        INSIDE.put("kinetics", Map.of("state", List.of(), "rate", List.of("state"), "propagate", List.of("rate"),
                "train", List.of("propagate"), "", List.of("train"), "ensemble", List.of(""), "process", List.of("")));
        // model (no Swing) < chart < view < app (start-up opens the main frame).
        // series (the Sample series view) draws its trend on chart; the main frame (view) opens it.
        INSIDE.put("gui", Map.of("model", List.of(), "chart", List.of("model"), "series", List.of("chart"),
                "view", List.of("chart", "series"), "app", List.of("view")));
        INSIDE.put("io", Map.of("json", List.of(), "", List.of("json")));
        // beam measurement (knife edge, camera second moments, caustic) stands alone: it needs no profile or pulse.
        INSIDE.put("excite", Map.of("", List.of(), "beam", List.of()));
        // photon-counting likelihood fits build on the fit room's parameters and estimates; nothing there uses them.
        INSIDE.put("fit", Map.of("", List.of(), "counting", List.of(""), "map", List.of("")));
    }

    /** Single classes a sub-package may use against its room's order; key is the using package, value the classes. */
    static final Map<String, Set<String>> EXCEPTIONS = Map.of(
            // The population value types live beside the facade; train returns them.
            "kinetics.train", Set.of("kinetics.Populations", "kinetics.PopulationGuard"),
            // Preferences and theme are settings the main frame reads and writes; they live with start-up.
            "gui.view", Set.of("gui.app.GuiPrefs", "gui.app.Theme"),
            // A JSON error carries the same located error type as every other input error.
            "io.json", Set.of("io.InputException", "io.InputProblem", "io.SourceLocation"));

    /** Rooms below io: no windows, no command line, no printing, no files. */
    static final Set<String> ENGINE = Set.of("units", "material", "sample", "excite", "kinetics", "observe", "fit", "plan",
            "archive", "report");

    private static final List<String> UI = List.of("javax.swing", "java.awt", "org.jfree", "net.miginfocom", "com.formdev");

    /** JFreeSVG draws report charts through Java2D: these drawing types (and FontMetrics, to space tick labels) are allowed in report, windows are not. */
    private static final Set<String> REPORT_DRAWING = Set.of("java.awt.BasicStroke", "java.awt.Color", "java.awt.Font",
            "java.awt.Rectangle", "java.awt.Shape", "java.awt.Stroke", "java.awt.Paint", "java.awt.Graphics2D", "java.awt.FontMetrics",
            "java.awt.RenderingHints", "java.awt.geom");

    /** In-memory java.io types; everything else in java.io reaches files or streams. */
    private static final Set<String> IN_MEMORY_IO = Set.of("java.io.IOException", "java.io.UncheckedIOException",
            "java.io.Serializable", "java.io.StringWriter", "java.io.StringReader", "java.io.ByteArrayOutputStream",
            "java.io.ByteArrayInputStream");

    record Violation(String file, int line, String reference, String reason) {
        @Override
        public String toString() {
            return file + ":" + line + ": " + reference + " (" + reason + ")";
        }
    }

    @Test
    void everySourceFileFollowsThePackageTable() throws IOException {
        Path home = Path.of(System.getProperty("ladderkin.home", "."));
        Path sources = home.resolve("src/main/java");
        List<Path> files;
        try (Stream<Path> walk = Files.walk(sources.resolve("org/ladderkin"))) {
            files = walk.filter(p -> p.toString().endsWith(".java")).sorted().toList();
        }
        assertThat(files).as("source files found").hasSizeGreaterThan(100);
        List<Violation> violations = new ArrayList<>();
        for (Path f : files) {
            violations.addAll(check(home.relativize(f).toString(), Files.readString(f)));
        }
        assertThat(violations).as(violations.size() + " architecture violations:\n"
                + violations.stream().map(Violation::toString).collect(Collectors.joining("\n"))).isEmpty();
    }

    @Test
    void theCheckerReportsForbiddenReferences() {
        assertThat(check("Synthetic.java", "package org.ladderkin.kinetics;\nimport javax.swing.JFrame;\n"))
                .extracting(Violation::toString)
                .containsExactly("Synthetic.java:2: javax.swing.JFrame (kinetics is below io: no windows)");
        assertThat(check("Up.java", "package org.ladderkin.plan;\n\nimport org.ladderkin.report.Cautions;\n"))
                .extracting(Violation::toString)
                .containsExactly("Up.java:3: org.ladderkin.report.Cautions (plan may not use report)");
        assertThat(check("Code.java", "package org.ladderkin.observe;\nclass A {\n  void f() {\n"
                + "    System.out.println(org.ladderkin.cli.Main.class);\n  }\n}\n"))
                .extracting(Violation::reference).containsExactly("System.out", "org.ladderkin.cli.Main");
        assertThat(check("Inner.java", "package org.ladderkin.kinetics.state;\nimport org.ladderkin.kinetics.rate.Rates;\n"))
                .hasSize(1);
        assertThat(check("Nowhere.java", "package org.ladderkin.kinetics.spare;\nclass A {}\n"))
                .extracting(Violation::reason).containsExactly("package not in the architecture table");
    }

    @Test
    void allowedReferencesCommentsAndStringsPass() {
        String source = """
                package org.ladderkin.kinetics.train;
                import org.ladderkin.excite.Pulse;
                import org.ladderkin.units.Quantity;
                import org.ladderkin.kinetics.state.LadderSpace;
                import org.ladderkin.kinetics.Populations;
                /** Not {@link org.ladderkin.cli.Main}, and no System.out here. */
                class A {
                    // import javax.swing.JFrame;
                    String s = "org.ladderkin.gui.Theme System.err";
                }
                """;
        assertThat(check("Ok.java", source)).isEmpty();
        assertThat(check("Report.java", "package org.ladderkin.report;\nimport java.awt.geom.Ellipse2D;\n"
                + "import org.jfree.svg.SVGGraphics2D;\n")).isEmpty();
        assertThat(check("Report.java", "package org.ladderkin.report;\nimport java.awt.Frame;\n")).hasSize(1);
        assertThat(check("Cli.java", "package org.ladderkin.cli;\nimport org.ladderkin.gui.app.PlannerApp;\n"
                + "import picocli.CommandLine;\n")).isEmpty();
        assertThat(check("Gui.java", "package org.ladderkin.gui.view;\nimport org.ladderkin.cli.Main;\n")).hasSize(1);
        assertThat(check("Model.java", "package org.ladderkin.gui.model;\nimport java.awt.Color;\n")).hasSize(1);
    }

    // ---- the checker

    private static final Pattern PACKAGE = Pattern.compile("^\\s*package\\s+([\\w.]+)\\s*;");
    private static final Pattern IMPORT = Pattern.compile("^\\s*import\\s+(?:static\\s+)?([\\w.]+(?:\\.\\*)?)\\s*;");
    /** A dotted lower-case package path ending in a class name, not itself preceded by a dot (so not a field chain). */
    private static final Pattern QUALIFIED = Pattern.compile(
            "(?<![\\w.])((?:org|java|javax|com|net|picocli)(?:\\.[a-z][a-z0-9_]*)*\\.[A-Z]\\w*)");
    private static final Pattern PRINTING = Pattern.compile("\\bSystem\\s*\\.\\s*(out|err)\\b");

    static List<Violation> check(String file, String source) {
        String[] lines = blankCommentsAndStrings(source).split("\n", -1);
        List<Violation> out = new ArrayList<>();
        String pkg = null;
        int pkgLine = 0;
        for (int i = 0; i < lines.length && pkg == null; i++) {
            Matcher m = PACKAGE.matcher(lines[i]);
            if (m.find()) {
                pkg = m.group(1);
                pkgLine = i + 1;
            }
        }
        if (pkg == null || !(pkg.equals(ROOT) || pkg.startsWith(ROOT + "."))) {
            return out;
        }
        String from = pkg.equals(ROOT) ? "" : pkg.substring(ROOT.length() + 1);
        if (!known(from)) {
            out.add(new Violation(file, pkgLine, pkg, "package not in the architecture table"));
            return out;
        }
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (PACKAGE.matcher(line).find()) {
                continue;
            }
            Matcher imp = IMPORT.matcher(line);
            Set<String> refs = new LinkedHashSet<>();
            if (imp.find()) {
                refs.add(imp.group(1));
            } else {
                Matcher q = QUALIFIED.matcher(line);
                while (q.find()) {
                    refs.add(q.group(1));
                }
            }
            Matcher p = PRINTING.matcher(line);
            while (p.find()) {
                if (ENGINE.contains(room(from))) {
                    out.add(new Violation(file, i + 1, "System." + p.group(1), room(from) + " is below io: no printing"));
                }
            }
            for (String ref : refs) {
                String reason = forbidden(from, ref);
                if (reason != null) {
                    out.add(new Violation(file, i + 1, ref, reason));
                }
            }
        }
        return out;
    }

    /** Why {@code from} (relative to org.ladderkin) may not use {@code ref}, or null when it may. */
    private static String forbidden(String from, String ref) {
        String room = room(from);
        if (ref.startsWith(ROOT + ".")) {
            String to = packageOf(ref.substring(ROOT.length() + 1));
            if (!known(to)) {
                return "package not in the architecture table";
            }
            String toRoom = room(to);
            if (!toRoom.equals(room)) {
                return closure(room).contains(toRoom) ? null : room + " may not use " + toRoom;
            }
            String fromSub = sub(from);
            String toSub = sub(to);
            if (toSub.equals(fromSub) || insideClosure(room, fromSub).contains(toSub)) {
                return null;
            }
            String cls = classOf(ref.substring(ROOT.length() + 1));
            if (EXCEPTIONS.getOrDefault(from, Set.of()).contains(cls)) {
                return null;
            }
            return "inside " + room + ", " + label(fromSub) + " may not use " + label(toSub);
        }
        if (ENGINE.contains(room)) {
            for (String ui : UI) {
                if (startsWithPackage(ref, ui)) {
                    if (room.equals("report") && (ui.equals("org.jfree") || REPORT_DRAWING.stream()
                            .anyMatch(d -> startsWithPackage(ref, d)))) {
                        return null;
                    }
                    return room + " is below io: no windows";
                }
            }
            if (startsWithPackage(ref, "picocli")) {
                return room + " is below io: no command line";
            }
            if (startsWithPackage(ref, "java.nio.file") || startsWithPackage(ref, "java.nio.channels")
                    || (startsWithPackage(ref, "java.io") && !IN_MEMORY_IO.contains(ref))) {
                return room + " is below io: no files";
            }
        }
        if (from.equals("gui.model")) {
            for (String ui : UI) {
                if (startsWithPackage(ref, ui)) {
                    return "gui.model stays testable without a display";
                }
            }
        }
        return null;
    }

    private static boolean startsWithPackage(String ref, String prefix) {
        return ref.equals(prefix) || ref.startsWith(prefix + ".");
    }

    /** "kinetics.train.SteadyState" → "kinetics.train"; a static import or nested class stops at the first class. */
    private static String packageOf(String relative) {
        List<String> parts = new ArrayList<>();
        for (String s : relative.split("\\.")) {
            if (s.equals("*") || Character.isUpperCase(s.charAt(0))) {
                break;
            }
            parts.add(s);
        }
        return String.join(".", parts);
    }

    private static String classOf(String relative) {
        String pkg = packageOf(relative);
        String rest = relative.substring(pkg.isEmpty() ? 0 : pkg.length() + 1);
        return (pkg.isEmpty() ? "" : pkg + ".") + rest.split("\\.")[0];
    }

    private static String room(String relative) {
        return relative.split("\\.")[0];
    }

    private static String sub(String relative) {
        int dot = relative.indexOf('.');
        return dot < 0 ? "" : relative.substring(dot + 1);
    }

    private static String label(String sub) {
        return sub.isEmpty() ? "the room's own package" : sub;
    }

    private static boolean known(String relative) {
        Map<String, List<String>> inside = INSIDE.get(room(relative));
        return inside != null && inside.containsKey(sub(relative));
    }

    static Set<String> closure(String room) {
        Set<String> seen = new LinkedHashSet<>();
        List<String> todo = new ArrayList<>(ROOMS.get(room));
        while (!todo.isEmpty()) {
            String r = todo.remove(todo.size() - 1);
            if (seen.add(r)) {
                todo.addAll(ROOMS.get(r));
            }
        }
        return seen;
    }

    private static Set<String> insideClosure(String room, String sub) {
        Map<String, List<String>> inside = INSIDE.get(room);
        Set<String> seen = new LinkedHashSet<>();
        List<String> todo = new ArrayList<>(inside.get(sub));
        while (!todo.isEmpty()) {
            String s = todo.remove(todo.size() - 1);
            if (seen.add(s)) {
                todo.addAll(inside.get(s));
            }
        }
        return seen;
    }

    /** Replaces comments, string, text-block and char literals by spaces, keeping line breaks and so line numbers. */
    static String blankCommentsAndStrings(String src) {
        StringBuilder b = new StringBuilder(src.length());
        int n = src.length();
        int i = 0;
        while (i < n) {
            char c = src.charAt(i);
            if (c == '/' && i + 1 < n && src.charAt(i + 1) == '/') {
                while (i < n && src.charAt(i) != '\n') {
                    b.append(' ');
                    i++;
                }
            } else if (c == '/' && i + 1 < n && src.charAt(i + 1) == '*') {
                int end = src.indexOf("*/", i + 2);
                end = end < 0 ? n : end + 2;
                blank(src, i, end, b);
                i = end;
            } else if (src.startsWith("\"\"\"", i)) {
                int end = src.indexOf("\"\"\"", i + 3);
                while (end > 0 && src.charAt(end - 1) == '\\') {
                    end = src.indexOf("\"\"\"", end + 1);
                }
                end = end < 0 ? n : end + 3;
                blank(src, i, end, b);
                i = end;
            } else if (c == '"' || c == '\'') {
                int j = i + 1;
                while (j < n && src.charAt(j) != c && src.charAt(j) != '\n') {
                    j += src.charAt(j) == '\\' ? 2 : 1;
                }
                int end = Math.min(n, j + 1);
                blank(src, i, end, b);
                i = end;
            } else {
                b.append(c);
                i++;
            }
        }
        return b.toString();
    }

    private static void blank(String src, int from, int to, StringBuilder b) {
        for (int k = from; k < to; k++) {
            b.append(src.charAt(k) == '\n' ? '\n' : ' ');
        }
    }
}
