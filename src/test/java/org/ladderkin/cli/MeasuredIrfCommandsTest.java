package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A measured instrument response through the command line: {@code plan} with {@code irfFile}, {@code fit --irf-file}. */
class MeasuredIrfCommandsTest {

    private static final Path DEMO_IRF = MainTest.HOME.resolve("experiments-plan/fh-ta-irf.csv");

    @Test
    void planWithAnIrfFileEchoesItAndItsWidth(@TempDir Path dir) throws Exception {
        Files.copy(DEMO_IRF, dir.resolve("fh-ta-irf.csv"));
        String demo = Files.readString(MainTest.HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json"));
        Path plan = dir.resolve("p.plan.json");
        Files.writeString(plan, demo.replace("\"irfFwhm\": \"200 fs\"", "\"irfFile\": \"fh-ta-irf.csv\""));
        Path out = dir.resolve("out");
        MainTest.Run r = MainTest.run("plan", plan.toString(), "--out", out.toString());
        assertThat(r.exit()).as(r.err()).isZero();
        assertThat(r.out()).contains("transient-absorption: 100 fs to 3 ns, IRF 109 fs (measured, fh-ta-irf.csv)");
        JsonNode resolved = new ObjectMapper().readTree(Files.readString(out.resolve("plan-resolved.json")));
        JsonNode ta = resolved.at("/delayPlans/0");
        assertThat(ta.get("instrument").asText()).isEqualTo("transient-absorption");
        assertThat(ta.get("irfFile").asText()).isEqualTo("fh-ta-irf.csv");
        assertThat(ta.get("irfFwhmPs").asDouble()).isBetween(0.100, 0.115);
        assertThat(resolved.at("/delayPlans/1").has("irfFile")).isFalse();
    }

    @Test
    void fitWithAMeasuredIrfFileReportsItAndFreesOnlyTimeZero(@TempDir Path dir) throws Exception {
        Path csv = FitCommandTest.simulatedSeries(dir, 11);
        Path out = dir.resolve("out");
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "70ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--free", "scale,tau-auger2,time-zero", "--irf-file", DEMO_IRF.toString(),
                "--out", out.toString(), "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        assertThat(root.get("status").asText()).isEqualTo("converged");
        assertThat(root.at("/measuredIrf/file").asText()).isEqualTo(DEMO_IRF.toString());
        assertThat(root.at("/measuredIrf/fwhmFs").asDouble()).isBetween(100.0, 115.0);
        assertThat(root.at("/measuredIrf/samples").asInt()).isEqualTo(101);
        assertThat(root.get("parameters").has("irfFwhmPs")).isFalse();
        assertThat(root.at("/parameters/timeZeroPs/fixed").asBoolean()).isFalse();
        JsonNode tau = root.at("/parameters/tauAuger2Ps");
        assertThat(Math.abs(tau.get("value").asDouble() - 40)).isLessThan(4 * tau.get("stdError").asDouble());
        assertThat(Files.readString(out.resolve("fit-report.html"))).contains("Instrument response: measured IRF from");

        MainTest.Run text = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--free", "scale", "--irf-file", DEMO_IRF.toString());
        assertThat(text.exit()).as(text.err()).isZero();
        assertThat(text.out()).containsPattern("measured IRF from .*fh-ta-irf\\.csv, FWHM 1[01][0-9](\\.[0-9])? fs \\(centroid at time zero\\)");
    }

    @Test
    void conflictingIrfOptionsAreOneLineOfBadInput(@TempDir Path dir) throws Exception {
        Path csv = FitCommandTest.simulatedSeries(dir, 3);
        MainTest.Run both = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--irf", "0.2ps", "--irf-file", DEMO_IRF.toString(), "--quiet");
        assertThat(both.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(both.err().strip().lines()).as(both.err()).hasSize(1);
        assertThat(both.err()).contains("give either --irf (a Gaussian width) or --irf-file (a measured IRF), not both");

        MainTest.Run freed = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--free", "scale,irf", "--irf-file", DEMO_IRF.toString(), "--quiet");
        assertThat(freed.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(freed.err().strip().lines()).as(freed.err()).hasSize(1);
        assertThat(freed.err()).contains("the IRF width cannot be fitted with a measured IRF");

        MainTest.Run missing = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--irf-file", dir.resolve("none.csv").toString(), "--quiet");
        assertThat(missing.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(missing.err().strip()).endsWith("none.csv: file not found");
    }
}
