package org.ladderkin.archive;

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
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;

/**
 * Five sizes of an invented CdSe series (fictional Fernhollow batches), each a simulated noisy TA fluence series with
 * τ₂ = γ·V (γ = 0.05 ps/nm³, invented) and a 6 % sample-to-sample spread, fitted with {@code fit --archive}; then
 * {@code trend} recovers the exponent 1 within its stated error and γ within its own.
 */
class SizeSeriesEndToEndTest {

    static final double[] DIAMETERS_NM = {3.0, 3.6, 4.3, 5.1, 6.0};
    static final double GAMMA_PS_PER_NM3 = 0.05;
    static final double SIGMA_CM2 = 3e-15;
    static final double[] MEAN_N = {0.15, 0.4, 1.0, 2.5};

    @TempDir
    Path dir;

    /** Writes the simulated table for one size; returns its path and the true τ₂ (ps). */
    static double writeSeries(Path csv, double diameterNm, SplittableRandom rng) throws Exception {
        double volume = Math.PI * Math.pow(diameterNm, 3) / 6;
        double tau2Ps = GAMMA_PS_PER_NM3 * volume * Math.exp(0.06 * gaussian(rng));
        double sigmaM2 = SIGMA_CM2 * 1e-4;
        double[] j = new double[MEAN_N.length];
        for (int i = 0; i < j.length; i++) {
            j[i] = MEAN_N[i] / sigmaM2;
        }
        LadderModel truth = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, tau2Ps * 1e-12,
                AugerScaling.STATISTICAL, 2);
        LadderBleachModel maker = LadderBleachModel.forModel(truth, "crossSectionM2", j, Double.NaN);
        int n = 40;
        double[] t = new double[n];
        for (int m = 0; m < n; m++) {
            t[m] = 0.3e-12 * Math.pow(1e4, m / (n - 1.0));
        }
        List<double[]> cols = new ArrayList<>();
        for (int i = 0; i < j.length; i++) {
            double[] y = maker.predict(i, t, ParameterValues.shared(List.of("crossSectionM2"), new double[] {sigmaM2}));
            for (int m = 0; m < n; m++) {
                y[m] = 0.01 * y[m] + 1e-4 * gaussian(rng);
            }
            cols.add(y);
        }
        StringBuilder b = new StringBuilder("# invented data: simulated bleach of a fictional CdSe batch\ndelay (ps)");
        for (int i = 0; i < j.length; i++) {
            b.append(",F").append(i + 1);
        }
        b.append('\n');
        for (int m = 0; m < n; m++) {
            b.append(String.format(Locale.ROOT, "%.6g", t[m] * 1e12));
            for (double[] y : cols) {
                b.append(String.format(Locale.ROOT, ",%.5e", y[m]));
            }
            b.append('\n');
        }
        Files.writeString(csv, b.toString());
        return tau2Ps;
    }

    static String fluences() {
        List<String> f = new ArrayList<>();
        for (double n : MEAN_N) {
            f.add(String.format(Locale.ROOT, "%.6g", n / SIGMA_CM2));
        }
        return String.join(",", f);
    }

    @Test
    void fiveSizesFittedIntoTheArchiveGiveBackTheVolumeScaling() throws Exception {
        String archive = dir.resolve("series.sqlite").toString();
        SplittableRandom rng = new SplittableRandom(20261203L);
        for (int k = 0; k < DIAMETERS_NM.length; k++) {
            Path csv = dir.resolve("fh-cdse-s" + k + ".csv");
            writeSeries(csv, DIAMETERS_NM[k], rng);
            Cli.Run fit = Cli.run("fit", csv.toString(), "--fluences", fluences(), "--tau-rad", "20ns",
                    "--tau-auger2", "20ps", "--cross-section", "2e-15cm2", "--quiet",
                    "--sample-name", "FH-CdSe-S" + k, "--material", "CdSe", "--diameter", DIAMETERS_NM[k] + "nm",
                    "--out", dir.resolve("fit-" + k).toString(), "--archive", archive);
            assertThat(fit.exit()).as(fit.err()).isZero();
        }
        assertThat(Cli.run("archive", "list", "--archive", archive).out()).contains("5 samples", "FH-CdSe-S4");

        Path out = dir.resolve("trend");
        Cli.Run trend = Cli.run("trend", "--x", "volume", "--y", "tauAuger2", "--archive", archive, "--out", out.toString(),
                "--format", "json");
        assertThat(trend.exit()).as(trend.err()).isZero();
        JsonNode j = new ObjectMapper().readTree(trend.out());
        double p = j.path("exponent").path("value").asDouble();
        double se = j.path("exponent").path("stdError").asDouble();
        double gamma = j.path("augerVolumeConstantPsPerNm3").path("value").asDouble();
        double gammaSe = j.path("augerVolumeConstantPsPerNm3").path("stdError").asDouble();
        System.out.printf(Locale.ROOT, "five-size series: exponent %.3f ± %.3f, τ₂/V %.4f ± %.4f ps/nm³ (true 1, %.3f)%n",
                p, se, gamma, gammaSe, GAMMA_PS_PER_NM3);
        assertThat(se).isBetween(0.005, 0.3);
        assertThat(Math.abs(p - 1)).as("exponent within two stated errors").isLessThanOrEqualTo(2 * se);
        assertThat(Math.abs(gamma - GAMMA_PS_PER_NM3)).as("τ₂/V within two stated errors").isLessThanOrEqualTo(2 * gammaSe);
        assertThat(j.path("points")).hasSize(5);
        assertThat(j.path("points").get(0).path("sample").asText()).isEqualTo("FH-CdSe-S0");
        assertThat(j.path("points").get(0).path("fitId").asLong()).isPositive();
        assertThat(j.path("reference").path("exponent").asDouble()).isEqualTo(1.0);
        String html = Files.readString(out.resolve("trend-report.html"));
        assertThat(html).contains("<svg", "FH-CdSe-S3", "fit-report.html", "library scaling");
        assertThat(out.resolve("trend.json")).isNotEmptyFile();
    }

    static double gaussian(SplittableRandom rnd) {
        double u1 = rnd.nextDouble();
        double u2 = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u1)) * Math.cos(2 * Math.PI * u2);
    }
}
