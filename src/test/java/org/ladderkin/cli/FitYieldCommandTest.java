package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.CompoundPoissonSeries;
import org.ladderkin.fit.SyntheticSeries;

/** {@code fit --free multiplication-yield}: η with its photon energy and the early/late estimate beside it. */
class FitYieldCommandTest {

    @Test
    void aFreedYieldComesWithItsPhotonEnergyAndTheEarlyLateEstimate(@TempDir Path dir) throws Exception {
        double[] n = {0.1, 0.25, 0.6, 1.6};
        double[] delays = SyntheticSeries.logDelays(0.5e-12, 1e-9, 30);
        List<double[]> cols = new ArrayList<>();
        SplittableRandom rng = new SplittableRandom(5);
        for (double v : n) {
            double[] b = CompoundPoissonSeries.bleach(v, 0.3, delays);
            for (int m = 0; m < b.length; m++) {
                b[m] = -0.01 * b[m] + 1e-4 * SyntheticSeries.gaussian(rng);
            }
            cols.add(b);
        }
        List<String> lines = new ArrayList<>(List.of("delay (ps),a,b,c,d"));
        for (int m = 0; m < delays.length; m++) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%.6g", delays[m] * 1e12));
            for (double[] c : cols) {
                row.append(',').append(String.format(Locale.ROOT, "%.8g", c[m]));
            }
            lines.add(row.toString());
        }
        Path csv = dir.resolve("cm.csv");
        Files.write(csv, lines);
        // ⟨N_abs⟩ = σ·J with σ = 1e-15 cm²
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--auger-scaling", "statistical", "--fluences", "1e14,2.5e14,6e14,1.6e15", "--cross-section", "0.8e-15cm2",
                "--free", "scale,tau-auger2,multiplication-yield", "--shared-amplitude", "--pump", "3.6eV",
                "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        JsonNode eta = root.at("/parameters/multiplicationYield");
        assertThat(eta.get("fixed").asBoolean()).isFalse();
        assertThat(Math.abs(eta.get("value").asDouble() - 0.3)).isLessThan(3 * eta.get("stdError").asDouble());
        assertThat(root.get("photonEnergyEv").asDouble()).isCloseTo(3.6, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(root.at("/multiplicationYield/upperBound").asBoolean()).isFalse();
        JsonNode limit = root.at("/multiplicationYield/earlyLate/lowFluenceLimit");
        assertThat(limit.get("stdError").asDouble()).isPositive();
        // the weak traces carry few counts of the late bleach: the model-light estimate is much less precise
        assertThat(Math.abs(limit.get("value").asDouble() - 1.3)).isLessThan(3 * limit.get("stdError").asDouble());
        assertThat(limit.get("stdError").asDouble()).isGreaterThan(eta.get("stdError").asDouble());
    }
}
