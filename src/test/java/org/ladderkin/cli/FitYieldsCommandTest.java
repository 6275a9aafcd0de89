package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code ladderkin fit-yields}: fit results in, the threshold law out as JSON, HTML and text; bad results located. */
class FitYieldsCommandTest {

    static Path result(Path dir, String name, double photonEv, String eta, String se) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, String.format(Locale.ROOT, """
                {
                  "schema": "ladderkin.fit-result/1",
                  "photonEnergyEv": %s,
                  "parameters": {
                    "multiplicationYield": {"value": %s, "stdError": %s, "fixed": false}
                  }
                }
                """, photonEv, eta, se));
        return f;
    }

    @Test
    void fitsTheThresholdLawAndWritesJsonAndAChart(@TempDir Path dir) throws Exception {
        // invented yields on the law E_th = 2.5 E_g, ε_eh = 1.6 E_g at E_g = 2 eV
        double[] x = {2.0, 2.6, 3.0, 3.4, 3.8, 4.2};
        List<String> args = new ArrayList<>(List.of("fit-yields"));
        for (int i = 0; i < x.length; i++) {
            double eta = Math.max(0, (x[i] - 2.5) / 1.6) + (i % 2 == 0 ? 0.01 : -0.01);
            args.add(result(dir, "r" + i + ".json", 2 * x[i], Double.toString(Math.max(eta, 0.001)), "0.03").toString());
        }
        Path out = dir.resolve("out");
        args.addAll(List.of("--gap", "2eV", "--out", out.toString(), "--format", "json", "--quiet"));
        MainTest.Run run = MainTest.run(args.toArray(String[]::new));
        assertThat(run.exit()).as(run.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(run.out());
        assertThat(root.get("schema").asText()).isEqualTo("ladderkin.fit-yields/1");
        assertThat(root.at("/thresholdOverGap/value").asDouble()).isCloseTo(2.5, org.assertj.core.data.Offset.offset(0.15));
        assertThat(root.at("/pairCreationEnergyOverGap/value").asDouble()).isCloseTo(1.6, org.assertj.core.data.Offset.offset(0.2));
        assertThat(root.at("/thresholdOverGap/stdError").asDouble()).isPositive();
        assertThat(root.at("/pairCreationEnergyOverGap/stdError").asDouble()).isPositive();
        assertThat(root.at("/energyConservationLimit/thresholdOverGap").asDouble()).isEqualTo(2.0);
        assertThat(root.get("points")).hasSize(6);
        String html = Files.readString(out.resolve("fit-yields.html"));
        assertThat(html).contains("<svg").contains("energy conservation").contains("η_CM");
        assertThat(new ObjectMapper().readTree(Files.readString(out.resolve("fit-yields.json")))).isEqualTo(root);
    }

    @Test
    void aYieldWithoutAnErrorIsOneLocatedLineWithExitCodeThree(@TempDir Path dir) throws Exception {
        Path a = result(dir, "a.json", 5, "0.2", "0.03");
        Path b = result(dir, "b.json", 6, "0.4", "null");
        Path c = result(dir, "c.json", 7, "0.6", "0.03");
        MainTest.Run run = MainTest.run("fit-yields", a.toString(), b.toString(), c.toString(), "--gap", "2eV");
        assertThat(run.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err().strip()).startsWith("ladderkin: " + b + ":5:").contains("stdError").contains("cannot be weighted");
        assertThat(run.err().strip().lines()).hasSize(1);
    }

    @Test
    void aResultWithARefreshedRunGivesTheRefreshedRunsYield(@TempDir Path dir) throws Exception {
        Path charged = dir.resolve("charged.json");
        // 'parameters' hold the static run's η, inflated by trions; the reported η is the refreshed run's
        Files.writeString(charged, """
                {
                  "schema": "ladderkin.fit-result/1",
                  "photonEnergyEv": 7,
                  "parameters": {"multiplicationYield": {"value": 0.9, "stdError": 0.03, "fixed": false}},
                  "multiplicationYield": {"eta": {"value": 0.3, "stdError": 0.05}, "from": "refreshed run"}
                }
                """);
        MainTest.Run run = MainTest.run("fit-yields", result(dir, "a.json", 5, "0.05", "0.03").toString(),
                result(dir, "b.json", 6, "0.2", "0.03").toString(), charged.toString(), "--gap", "2eV", "--format", "json",
                "--quiet");
        assertThat(run.exit()).as(run.err()).isZero();
        JsonNode point = new ObjectMapper().readTree(run.out()).get("points").get(2);
        assertThat(point.get("result").asText()).isEqualTo("charged.json");
        assertThat(point.get("quantumYield").asDouble()).isEqualTo(1.3);
        assertThat(point.get("stdError").asDouble()).isEqualTo(0.05);
    }
}
