package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.counting.CountHistogram;
import org.ladderkin.fit.counting.JointFitTest;

/** {@code fit --counts}: histograms fitted by likelihood, and one clear line for each kind of bad histogram. */
class CountingFitCommandTest {

    /** The joint-fit test's three histograms as one table, 'time (ns)' at bin centres. */
    static Path table(Path dir) throws Exception {
        List<CountHistogram> hs = JointFitTest.histograms(3);
        StringBuilder b = new StringBuilder("time (ns),pl0,pl1,pl2\n");
        for (int i = 0; i < hs.get(0).bins(); i++) {
            b.append(String.format(Locale.ROOT, "%.4f", hs.get(0).centreS(i) * 1e9));
            for (CountHistogram h : hs) {
                b.append(',').append((long) h.counts()[i]);
            }
            b.append('\n');
        }
        Path f = dir.resolve("tcspc.csv");
        Files.writeString(f, b.toString());
        return f;
    }

    @Test
    void histogramsAreFittedByLikelihoodAndTheJsonCarriesTheDeviance(@TempDir Path dir) throws Exception {
        Path csv = table(dir);
        // the histograms were simulated at ⟨N⟩ = 0.3, 1, 3 with σ = 5e-15 cm², τ₂ = 200 ps, τ_rad = 20 ns, IRF 80 ps
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--counts", "--irf", "80ps", "--tau-rad", "20ns",
                "--tau-auger2", "150ps", "--fluences", "6e13,2e14,6e14", "--format", "json", "--quiet",
                "--out", dir.resolve("out").toString());
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        assertThat(root.get("status").asText()).isEqualTo("converged");
        JsonNode tau = root.at("/parameters/tauAuger2Ps");
        assertThat(Math.abs(tau.get("value").asDouble() - 200)).isLessThan(3 * tau.get("stdError").asDouble());
        JsonNode sigma = root.at("/parameters/crossSectionCm2");
        assertThat(Math.abs(sigma.get("value").asDouble() - 5e-15)).isLessThan(3 * sigma.get("stdError").asDouble());
        int dof = root.get("degreesOfFreedom").asInt();
        assertThat(dof).isEqualTo(1200 - root.get("freeParameters").asInt());
        double d = root.get("poissonDeviance").asDouble();
        // a right model: the deviance is near its degrees of freedom
        assertThat(d).isBetween(dof - 5 * Math.sqrt(2.0 * dof), dof + 5 * Math.sqrt(2.0 * dof));
        assertThat(root.get("histograms")).hasSize(3);
        assertThat(Files.exists(dir.resolve("out/fit-result.json"))).isTrue();
        String report = Files.readString(dir.resolve("out/fit-report.html"));
        assertThat(report).contains("Poisson deviance", "Histograms and fit", "tcspc.csv").doesNotContain("NaN");
    }

    @Test
    void aJointFitWritesAReportWithBothDataSetsAndEscapedHeaders(@TempDir Path dir) throws Exception {
        Path csv = table(dir);
        Files.writeString(csv, Files.readString(csv).replaceFirst(",pl0,", ",<script>pl0</script>,"));
        org.ladderkin.fit.Dataset ta = JointFitTest.ta(4);
        StringBuilder b = new StringBuilder("delay (ps)");
        for (org.ladderkin.fit.Trace t : ta.traces()) {
            b.append(',').append(t.label()).append(',').append(t.label()).append(" err");
        }
        b.append('\n');
        for (int m = 0; m < ta.traces().get(0).delaysS().length; m++) {
            b.append(String.format(Locale.ROOT, "%.6g", ta.traces().get(0).delaysS()[m] * 1e12));
            for (org.ladderkin.fit.Trace t : ta.traces()) {
                b.append(String.format(Locale.ROOT, ",%.8g,%.8g", t.signal()[m], t.sigma()[m]));
            }
            b.append('\n');
        }
        Path taFile = dir.resolve("ta.csv");
        Files.writeString(taFile, b.toString());
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--counts", "--irf", "80ps", "--tau-rad", "15ns",
                "--tau-auger2", "150ps", "--free", "scale,tau-rad,tau-auger2", "--fluences", "6e13,2e14,6e14",
                "--ta", taFile.toString(), "--ta-fluences", "6e13,2e14,6e14", "--quiet", "--out", dir.resolve("out").toString());
        assertThat(fit.exit()).as(fit.err()).isZero();
        String html = Files.readString(dir.resolve("out/fit-report.html"));
        assertThat(html).contains("Joint fit of TA traces and photon-counting histograms", "Histograms and fit",
                "TA traces and fit", "ta.csv", "tcspc.csv", "Shared by both data sets: σ (cm²)", "histograms only");
        assertThat(html).doesNotContain("<script").contains("&lt;script&gt;pl0&lt;/script&gt;");
        assertThat(html).doesNotContain("NaN").doesNotContain("Infinity");
        assertThat(Files.exists(dir.resolve("out/fit-result.json"))).isTrue();
    }

    private static MainTest.Run fitCounts(Path dir, String table, String... more) throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, table);
        List<String> args = new java.util.ArrayList<>(List.of("fit", f.toString(), "--counts", "--irf", "80ps",
                "--fluences", "1e14", "--quiet"));
        args.addAll(List.of(more));
        return MainTest.run(args.toArray(String[]::new));
    }

    private static void oneLine(MainTest.Run r, String contains) {
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).doesNotContain("\n").contains(contains);
    }

    @Test
    void badHistogramsAreOneClearLineAndExitThree(@TempDir Path dir) throws Exception {
        oneLine(fitCounts(dir, "time (ns),pl\n0.05,3\n0.15,-2\n0.25,1\n"), "bad.csv:3:");
        oneLine(fitCounts(dir, "time (ns),pl\n0.05,3\n0.15,2.5\n0.25,1\n"), "not a whole number");
        oneLine(fitCounts(dir, "time (ns),pl\n"), "no bins");
        oneLine(fitCounts(dir, "time (ns),pl\n0.05,0\n0.15,0\n0.25,0\n"), "holds no counts");
        Path irf = dir.resolve("irf.csv");
        StringBuilder b = new StringBuilder("time (ns),counts\n");
        for (int i = 0; i < 20; i++) {
            b.append(String.format(Locale.ROOT, "%.2f,%d%n", 0.1 * i, 100 - Math.abs(10 - i) * 9));
        }
        Files.writeString(irf, b.toString());
        MainTest.Run longIrf = fitCounts(dir, "time (ns),pl\n0.05,3\n0.15,2\n0.25,1\n0.35,1\n", "--irf-file", irf.toString());
        // --irf and --irf-file together are refused first; without --irf the window check speaks
        assertThat(longIrf.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        Path f = dir.resolve("short.csv");
        Files.writeString(f, "time (ns),pl\n0.05,3\n0.15,2\n0.25,1\n0.35,1\n");
        oneLine(MainTest.run("fit", f.toString(), "--counts", "--irf-file", irf.toString(), "--fluences", "1e14", "--quiet"),
                "longer than the window");
    }

    @Test
    void integratedPlSaturationGivesTheCrossSection(@TempDir Path dir) throws Exception {
        // 1 − e^{−σj} at σ = 4e-15 cm² (fast Auger: one photon per excited dot), no noise
        StringBuilder b = new StringBuilder("fluence (photons/cm2),pl\n");
        for (int i = 0; i < 10; i++) {
            double j = 1e13 * Math.pow(2, i);
            b.append(String.format(Locale.ROOT, "%.6g,%.8g%n", j, 500 * -Math.expm1(-4e-15 * j) * (1 + 0.002 * ((i % 3) - 1))));
        }
        Path f = dir.resolve("ipl.csv");
        Files.writeString(f, b.toString());
        MainTest.Run fit = MainTest.run("fit", f.toString(), "--pl-integrated", "--tau-rad", "20ns", "--tau-auger2", "1ps",
                "--free", "scale", "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        assertThat(root.at("/parameters/crossSectionCm2/value").asDouble()).isCloseTo(4e-15,
                org.assertj.core.data.Percentage.withPercentage(2));
        assertThat(root.get("biexcitonEmissionYield").asDouble()).isBetween(0.0, 1e-3);
        Files.writeString(f, "fluence (photons/cm2),pl\n1e13,1\n");
        oneLine(MainTest.run("fit", f.toString(), "--pl-integrated", "--quiet"), "at least 3 fluences");
    }
}
