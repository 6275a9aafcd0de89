package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.CompoundPoissonSeries;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.LadderSeries;
import org.ladderkin.fit.SyntheticSeries;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.ChargingProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;

/**
 * {@code fit --refreshed-run}: a static 80 MHz series whose trions mimic multiplication, fitted with and without a
 * stirred run of the same sample beside it.
 */
class FitRefreshedRunCommandTest {

    private static final double SIGMA_M2 = 1e-19;
    /** Invented charging: 5 % of Auger events ionise, the charge lives 1 µs, the negative trion decays in 100 ps. */
    private static final LadderModel CHARGING = new LadderModel(List.of(
            new RadiativeProcess(20e-9, RadiativeScaling.STATISTICAL, RadiativeDecay.DEFAULT_CHARGED_FACTOR),
            new AugerProcess(40e-12, AugerScaling.STATISTICAL, 100e-12, Double.POSITIVE_INFINITY),
            new ChargingProcess(Set.of(Charge.NEGATIVE), new AugerIonisation(0.05, Charge.NEGATIVE), 1e-6)), 2, 0);
    private static final double[] FLUENCES_PER_M2 = {0.15 / SIGMA_M2, 0.5 / SIGMA_M2, 1.5 / SIGMA_M2};
    private static final String FLUENCES = "1.5e14,5e14,1.5e15";
    private static final double[] DELAYS = SyntheticSeries.logDelays(0.5e-12, 1e-9, 16);
    /** The same ladder and charging as {@link #CHARGING}, in the command's model flags. */
    private static final List<String> MODEL = List.of("--tau-rad", "20ns", "--radiative-scaling", "statistical",
            "--tau-auger2", "40ps", "--auger-scaling", "statistical", "--charges", "negative", "--ionisation-probability",
            "0.05", "--ionisation-leaves", "negative", "--tau-neutralisation", "1us", "--tau-trion-negative", "100ps",
            "--free", "scale,tau-auger2,multiplication-yield", "--shared-amplitude", "--cross-section", "0.8e-15cm2",
            "--pump", "3.6eV");

    private static Path write(Path file, Dataset d) throws Exception {
        List<String> lines = new ArrayList<>();
        StringBuilder head = new StringBuilder("delay (ps)");
        d.traces().forEach(t -> head.append(",").append(t.label()));
        lines.add(head.toString());
        for (int m = 0; m < DELAYS.length; m++) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%.8g", DELAYS[m] * 1e12));
            for (var t : d.traces()) {
                row.append(',').append(String.format(Locale.ROOT, "%.8g", t.signal()[m]));
            }
            lines.add(row.toString());
        }
        return Files.write(file, lines);
    }

    private static Path staticRun(Path dir) throws Exception {
        LadderBleachModel model = LadderBleachModel.forModel(CHARGING, "crossSectionM2", FLUENCES_PER_M2, 1 / 80e6);
        return write(dir.resolve("static.csv"), LadderSeries.make(model, List.of("crossSectionM2"), new double[] {SIGMA_M2},
                DELAYS, 0.01, 0, 1e-4, 21));
    }

    private static MainTest.Run fit(String... args) {
        List<String> all = new ArrayList<>(List.of("fit"));
        all.addAll(List.of(args));
        all.addAll(MODEL);
        return MainTest.run(all.toArray(String[]::new));
    }

    @Test
    void withAStirredRunTheYieldComesFromItAndIsConsistentWithZero(@TempDir Path dir) throws Exception {
        Path stirred = write(dir.resolve("stirred.csv"), CompoundPoissonSeries.series(SIGMA_M2, 0, FLUENCES_PER_M2, DELAYS,
                0.01, 1e-4, 22));
        Path out = dir.resolve("out");
        MainTest.Run run = fit(staticRun(dir).toString(), "--fluences", FLUENCES, "--rep-rate", "80MHz",
                "--refreshed-run", stirred.toString(), "--refreshed-fluences", FLUENCES, "--format", "json",
                "--out", out.toString());
        assertThat(run.exit()).as(run.err()).isZero();
        JsonNode m = new ObjectMapper().readTree(run.out()).get("multiplicationYield");
        assertThat(m.get("from").asText()).isEqualTo("refreshed run");
        assertThat(m.get("upperBound").asBoolean()).isFalse();
        double eta = m.at("/eta/value").asDouble();
        double se = m.at("/eta/stdError").asDouble(Double.NaN);
        // at the bound η = 0 the delta-method error does not exist: then 0.05, about 1.5 standard errors of η = 0.2
        double tolerance = Double.isFinite(se) ? Math.max(3 * se, 0.02) : 0.05;
        assertThat(eta).as("η = %s ± %s from the stirred run", eta, se).isLessThanOrEqualTo(tolerance);
        assertThat(m.at("/staticRun/chargedFraction").asDouble()).as("the static fit sees the trions").isGreaterThan(0.02);
        assertThat(m.at("/staticRun/repRateMhz").asDouble()).isCloseTo(80, org.assertj.core.data.Offset.offset(1e-6));
        assertThat(Files.readString(out.resolve("fit-report.html"))).contains("Multiplication yield")
                .contains("from the refreshed run").contains("static run at 80 MHz alone").doesNotContain("upper bound");
    }

    @Test
    void aStaticHighRateRunAloneIsAnUpperBoundInTextJsonAndHtml(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("out");
        MainTest.Run run = fit(staticRun(dir).toString(), "--fluences", FLUENCES, "--rep-rate", "80MHz",
                "--out", out.toString());
        assertThat(run.exit()).as(run.err()).isZero();
        // the text summary (no --quiet)
        assertThat(run.out()).contains("η is an upper bound: at 80 MHz in a static sample").contains("stirred or flowed");
        JsonNode m = new ObjectMapper().readTree(Files.readString(out.resolve("fit-result.json"))).get("multiplicationYield");
        assertThat(m.get("upperBound").asBoolean()).isTrue();
        assertThat(m.get("from").asText()).isEqualTo("this run");
        assertThat(m.get("reason").asText()).contains("upper bound").contains("80 MHz");
        assertThat(Files.readString(out.resolve("fit-report.html"))).contains("η is an upper bound: at 80 MHz")
                .contains("class=\"caution\"");
    }

    @Test
    void aRefreshedRunWithoutItsFluencesIsOneLocatedLineWithExitCodeThree(@TempDir Path dir) throws Exception {
        Path stirred = write(dir.resolve("stirred.csv"), CompoundPoissonSeries.series(SIGMA_M2, 0, FLUENCES_PER_M2, DELAYS,
                0.01, 1e-4, 22));
        MainTest.Run run = fit(staticRun(dir).toString(), "--fluences", FLUENCES, "--rep-rate", "80MHz",
                "--refreshed-run", stirred.toString());
        assertThat(run.exit()).isEqualTo(3);
        assertThat(run.err().strip().lines()).singleElement().asString()
                .startsWith("ladderkin: " + stirred + ":1:1: field 'excitation': ")
                .contains("--refreshed-fluences");
    }
}
