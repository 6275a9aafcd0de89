package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every text a user writes that can reach an HTML report (plan and sample fields, table headers and comments, sidecar
 * labels, data file names, archive sample names) is escaped there: a report opened in a browser never runs what a
 * shared plan or data file smuggled in.
 */
class ReportInjectionTest {

    private static final String SCRIPT = "<script>alert(1)</script>";
    /** No slash, so it can also be a file name. */
    private static final String TAG = "\"'><img src=x onerror=alert(2)>";
    private static final ObjectMapper JSON = new ObjectMapper();

    private static void assertInert(String html, String where) {
        assertThat(html).as("report after %s", where).doesNotContain("<script>alert").doesNotContain("<img src=x");
    }

    /** Every string leaf of a JSON tree, as a JSON pointer. */
    private static void strings(JsonNode node, String pointer, List<String> into) {
        if (node.isTextual()) {
            into.add(pointer);
        }
        if (node.isObject()) {
            node.fields().forEachRemaining(e -> strings(e.getValue(), pointer + "/" + e.getKey(), into));
        }
        if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                strings(node.get(i), pointer + "/" + i, into);
            }
        }
    }

    @Test
    void everyStringFieldOfAPlanIsEscapedInTheReportOrRefusedOnOneLine(@TempDir Path dir) throws Exception {
        Path home = MainTest.HOME.resolve("experiments-plan").toAbsolutePath();
        JsonNode plan = JSON.readTree(home.resolve("inp-zns-tcspc-5mhz.plan.json").toFile());
        ((ObjectNode) plan.get("sample")).put("absorptionSpectrum", home.resolve("fh-inp-0031.absorption.csv").toString());
        List<String> fields = new ArrayList<>();
        strings(plan, "", fields);
        List<String> reached = new ArrayList<>();
        for (String field : fields) {
            for (String payload : List.of(SCRIPT, TAG)) {
                JsonNode copy = plan.deepCopy();
                int slash = field.lastIndexOf('/');
                JsonNode parent = copy.at(field.substring(0, slash));
                String key = field.substring(slash + 1);
                String value = copy.at(field).asText() + " " + payload;
                if (parent.isArray()) {
                    ((com.fasterxml.jackson.databind.node.ArrayNode) parent).set(Integer.parseInt(key), TextNode.valueOf(value));
                } else {
                    ((ObjectNode) parent).put(key, value);
                }
                Path file = dir.resolve("plan.json");
                JSON.writeValue(file.toFile(), copy);
                Path out = dir.resolve("out");
                MainTest.Run r = MainTest.run("plan", file.toString(), "--out", out.toString(), "--quiet");
                if (r.exit() == 0) {
                    String html = Files.readString(out.resolve("report.html"));
                    assertInert(html, field);
                    if (html.contains(escaped(payload))) {
                        reached.add(field);
                    }
                } else {
                    assertThat(r.exit()).as("%s: %s", field, r.err()).isEqualTo(ExitCodes.BAD_INPUT);
                    assertThat(r.err().strip()).as("error for %s", field).doesNotContain("\n").doesNotContain("<script>alert(1)</script>\n");
                }
            }
        }
        // the free-text fields did reach the report, so the check above saw them
        assertThat(reached).contains("/title", "/lab", "/sample/name");
    }

    private static String escaped(String payload) {
        return payload.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;").replace("'", "&#39;");
    }

    @Test
    void headersCommentsLabelsAndFileNamesOfAFitAreEscaped(@TempDir Path dir) throws Exception {
        Path series = FitCommandTest.simulatedSeries(dir, 9);
        List<String> lines = new ArrayList<>(Files.readAllLines(series));
        String[] labels = {"F0 " + SCRIPT, "F1 " + TAG.replace(",", ""), "F2 " + SCRIPT, "F3"};
        lines.set(0, "delay (ps)," + String.join(",", labels));
        lines.add(0, "# sample " + SCRIPT);
        Path csv = dir.resolve(TAG + ".csv");
        Files.write(csv, lines);
        Path sidecar = dir.resolve("labels.traces.json");
        List<Map<String, String>> traces = new ArrayList<>();
        String[] fluences = {"1e13", "3e13", "1e14", "3e14"};
        for (int i = 0; i < fluences.length; i++) {
            traces.add(Map.of("label", labels[i], "photonFluence", fluences[i] + " photons/cm²"));
        }
        JSON.writeValue(sidecar.toFile(), Map.of("schema", "ladderkin.traces/1", "traces", traces));
        Path out = dir.resolve("out");
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--traces-json", sidecar.toString(), "--tau-rad", "20ns",
                "--tau-auger2", "70ps", "--out", out.toString(), "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        String html = Files.readString(out.resolve("fit-report.html"));
        assertInert(html, "fit");
        // the file name and the sidecar's labels are shown, escaped
        assertThat(html).contains(escaped(TAG)).contains("F0 " + escaped(SCRIPT));
    }

    @Test
    void archivedSampleNamesAreEscapedInTheTrendReport(@TempDir Path dir) throws Exception {
        Path series = FitCommandTest.simulatedSeries(dir, 13);
        String archive = dir.resolve("a.sqlite").toString();
        String[] diameters = {"3nm", "4nm", "5nm"};
        for (int k = 0; k < diameters.length; k++) {
            MainTest.Run fit = MainTest.run("fit", series.toString(), "--tau-rad", "20ns", "--tau-auger2", "70ps",
                    "--fluences", "1e13,3e13,1e14,3e14", "--out", dir.resolve("fit" + k).toString(), "--quiet",
                    "--sample-name", "FH-" + k + " " + (k == 0 ? SCRIPT : TAG), "--material", "CdSe", "--diameter", diameters[k],
                    "--archive", archive);
            assertThat(fit.exit()).as(fit.err()).isZero();
        }
        Path out = dir.resolve("trend");
        MainTest.Run trend = MainTest.run("trend", "--x", "volume", "--y", "tauAuger2", "--archive", archive, "--out", out.toString(),
                "--quiet");
        assertThat(trend.exit()).as(trend.err()).isZero();
        try (var files = Files.list(out)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".html")).toList()) {
                String html = Files.readString(f);
                assertInert(html, "trend " + f.getFileName());
                assertThat(html).contains("FH-0 " + escaped(SCRIPT));
            }
        }
    }

    @Test
    void resultFileNamesAreEscapedInTheYieldReport(@TempDir Path dir) throws Exception {
        List<String> args = new ArrayList<>(List.of("fit-yields"));
        double[] x = {2.0, 2.6, 3.0, 3.4, 3.8, 4.2};
        for (int i = 0; i < x.length; i++) {
            double eta = Math.max(0.001, (x[i] - 2.5) / 1.6 + (i % 2 == 0 ? 0.01 : -0.01));
            args.add(FitYieldsCommandTest.result(dir, "r" + i + " " + TAG + ".json", 2 * x[i], Double.toString(eta), "0.03").toString());
        }
        Path out = dir.resolve("out");
        args.addAll(List.of("--gap", "2eV", "--out", out.toString(), "--quiet"));
        MainTest.Run run = MainTest.run(args.toArray(String[]::new));
        assertThat(run.exit()).as(run.err()).isZero();
        String html = Files.readString(out.resolve("fit-yields.html"));
        assertInert(html, "fit-yields");
        assertThat(html).contains("r0 " + escaped(TAG));
    }
}
