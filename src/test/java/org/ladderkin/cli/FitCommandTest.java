package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.ladderkin.fit.SyntheticSeries;

/** {@code ladderkin fit}: a round trip from {@code simulate} output and one clear line for each kind of bad data. */
class FitCommandTest {

    /** simulate → noisy CSV (ΔA in OD, signed like a bleach) → fit. */
    static Path simulatedSeries(Path dir, long seed) throws Exception {
        MainTest.Run sim = MainTest.run("simulate", "--tau-rad", "20ns", "--tau-auger2", "40ps", "--n-avg", "0.1,0.3,1,3",
                "--observable", "bleach", "--delays", "0.2ps..3ns:60log");
        assertThat(sim.exit()).as(sim.err()).isZero();
        SplittableRandom rng = new SplittableRandom(seed);
        List<String> lines = new ArrayList<>();
        String[] in = sim.out().split("\\R");
        lines.add("delay (ps),a,b,c,d");
        for (int j = 1; j < in.length; j++) {
            String[] f = in[j].split(",");
            StringBuilder row = new StringBuilder(f[0]);
            for (int c = 1; c < f.length; c++) {
                row.append(',').append(-0.01 * Double.parseDouble(f[c]) + 1e-4 * SyntheticSeries.gaussian(rng));
            }
            lines.add(row.toString());
        }
        Path csv = dir.resolve("series.csv");
        Files.write(csv, lines);
        return csv;
    }

    @Test
    void simulatedSeriesRoundTripsThroughCsvAndRecoversTauAuger2AndCrossSection(@TempDir Path dir) throws Exception {
        Path csv = simulatedSeries(dir, 11);
        Path out = dir.resolve("out");
        // ⟨N⟩ = σ·J: the simulated 0.1 … 3 are 1e13 … 3e14 photons/cm² at σ = 1e-14 cm²
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "70ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--out", out.toString(), "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        assertThat(root.get("schema").asText()).isEqualTo("ladderkin.fit-result/1");
        assertThat(root.get("status").asText()).isEqualTo("converged");
        JsonNode tau = root.at("/parameters/tauAuger2Ps");
        JsonNode sigma = root.at("/parameters/crossSectionCm2");
        assertThat(tau.get("fixed").asBoolean()).isFalse();
        assertThat(root.at("/parameters/tauRadNs/fixed").asBoolean()).isTrue();
        assertThat(Math.abs(tau.get("value").asDouble() - 40)).isLessThan(4 * tau.get("stdError").asDouble());
        assertThat(Math.abs(sigma.get("value").asDouble() - 1e-14)).isLessThan(4 * sigma.get("stdError").asDouble());
        assertThat(tau.get("value").asDouble()).isBetween(34.0, 46.0);
        assertThat(root.get("traces")).hasSize(4);
        assertThat(root.get("diagnostics")).isEmpty();
        assertThat(new ObjectMapper().readTree(Files.readString(out.resolve("fit-result.json")))).isEqualTo(root);
        String html = Files.readString(out.resolve("fit-report.html"));
        assertThat(html).contains("<svg").contains("τ₂ (ps)").doesNotContain("tauAuger2Ps").contains("Residuals");
        assertThat(fit.err()).as("σ and τ₂ on a fluence series are told apart").doesNotContain("warning:");
    }

    @Test
    void freedLifetimesTheDataCannotTellApartAreNamedBeforeTheFit(@TempDir Path dir) throws Exception {
        Path csv = simulatedSeries(dir, 11);
        // the data end at 3 ns: a 20 ns radiative and a 40 ns trapping lifetime have hardly begun to act
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-trap", "40ns",
                "--tau-auger2", "40ps", "--free", "tau-rad,tau-trap", "--fluences", "1e13,3e13,1e14,3e14",
                "--cross-section", "1e-14cm2", "--format", "json", "--quiet");
        String warning = fit.err().lines().filter(l -> l.startsWith("warning: ")).findFirst().orElse("");
        assertThat(warning).as(fit.err()).contains("τ_rad").contains("τ_trap");
    }

    @Test
    void planComparisonAndProfileIntervalsAppearInTheResult(@TempDir Path dir) throws Exception {
        Path csv = simulatedSeries(dir, 5);
        Path out = dir.resolve("out");
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "60ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--profile", "--free", "scale,tau-auger2,time-zero", "--irf", "0.3ps",
                "--uniform-pump", "--plan", MainTest.HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json").toString(),
                "--out", out.toString(), "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        JsonNode tau = root.at("/parameters/tauAuger2Ps");
        assertThat(tau.at("/profile68/lower").asDouble()).isLessThan(tau.get("value").asDouble());
        assertThat(tau.at("/profile68/upper").asDouble()).isGreaterThan(tau.get("value").asDouble());
        assertThat(root.at("/parameters/irfFwhmPs/fixed").asBoolean()).isTrue();
        assertThat(root.at("/parameters/timeZeroPs/fixed").asBoolean()).isFalse();
        assertThat(root.at("/planComparison/tauAuger2PsPlanned").asDouble()).isPositive();
        assertThat(root.at("/planComparison/tauAuger2PsFitted").asDouble()).isEqualTo(tau.get("value").asDouble());
        assertThat(Files.readString(out.resolve("fit-report.html"))).contains("Compared with the plan").contains("profile");
    }

    @Test
    void withOnlyAPlanTheFitStartsFromThePlansModelAndFindsTheDemoSeriesTau2(@TempDir Path dir) throws Exception {
        Path plan = MainTest.HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json");
        MainTest.Run fit = MainTest.run("fit", MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.csv").toString(),
                "--traces-json", MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.traces.json").toString(),
                "--plan", plan.toString(), "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        org.ladderkin.plan.PlanFitBasis basis = org.ladderkin.plan.PlanFitBasis.of(org.ladderkin.io.PlanCodec.read(plan));
        // held parameters are the plan's own values
        assertThat(root.at("/parameters/tauRadNs/value").asDouble())
                .isCloseTo(1e9 * basis.base().seconds(org.ladderkin.kinetics.process.RadiativeProcess.LIFETIME), org.assertj.core.data.Percentage.withPercentage(1e-6));
        // the demo series was simulated with a known multiple of the plan's τ₂
        JsonNode tau = root.at("/parameters/tauAuger2Ps");
        double truth = org.ladderkin.gui.model.FitDemoSeries.TAU2_FACTOR * basis.model().tauBiexcitonS() * 1e12;
        assertThat(Math.abs(tau.get("value").asDouble() - truth)).isLessThan(4 * tau.get("stdError").asDouble());
        assertThat(root.at("/planComparison/tauAuger2PsPlanned").asDouble())
                .isCloseTo(basis.model().tauBiexcitonS() * 1e12, org.assertj.core.data.Percentage.withPercentage(1e-6));
    }

    /**
     * The documented demo fit with --shared-amplitude used to end in "OutOfMemoryError: Requested array size exceeds VM
     * limit at Occupancy.poisson": an optimiser step wandered to σ·j ≈ 10⁸. Such steps are now refused like any worse step.
     */
    @Test
    void theDemoSeriesWithASharedAmplitudeConvergesInsteadOfExhaustingTheHeap() throws Exception {
        Path plan = MainTest.HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json");
        MainTest.Run fit = MainTest.run("fit", MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.csv").toString(),
                "--traces-json", MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.traces.json").toString(),
                "--plan", plan.toString(), "--shared-amplitude", "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        assertThat(fit.err()).doesNotContain("starts failed");
        JsonNode root = new ObjectMapper().readTree(fit.out());
        assertThat(root.at("/status").asText()).isEqualTo("converged");
        org.ladderkin.plan.PlanFitBasis basis = org.ladderkin.plan.PlanFitBasis.of(org.ladderkin.io.PlanCodec.read(plan));
        JsonNode tau = root.at("/parameters/tauAuger2Ps");
        double truth = org.ladderkin.gui.model.FitDemoSeries.TAU2_FACTOR * basis.model().tauBiexcitonS() * 1e12;
        assertThat(Math.abs(tau.get("value").asDouble() - truth)).isLessThan(4 * tau.get("stdError").asDouble());
    }

    /** A fit whose errors cannot be computed used to print "± NaN" and exit 0 as if it were a result. */
    @Test
    void unconstrainedParametersAreSaidToBeNotDeterminedNeverNaN() throws Exception {
        String csv = MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.csv").toString();
        String sidecar = MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.traces.json").toString();
        MainTest.Run text = MainTest.run("fit", csv, "--traces-json", sidecar, "--tau-rad", "1ms", "--tau-auger2", "1 fs",
                "--free", "time-zero,scale");
        assertThat(text.exit()).as(text.err()).isZero();
        assertThat(text.out()).doesNotContain("NaN").contains("timeZeroPs       0.0000       not determined (the data do not constrain it)")
                .contains("Fit: uncertainty unavailable");
        MainTest.Run json = MainTest.run("fit", csv, "--traces-json", sidecar, "--tau-rad", "1ms", "--tau-auger2", "1 fs",
                "--free", "time-zero,scale", "--format", "json", "--quiet");
        JsonNode root = new ObjectMapper().readTree(json.out());
        assertThat(root.at("/parameters/timeZeroPs/determined").asBoolean(true)).isFalse();
        assertThat(root.at("/parameters/timeZeroPs/stdError").isNull()).isTrue();
    }

    /** Beside --plan (whose model the fit starts from), a lone --tau-trap used to be dropped without a word. */
    @Test
    void aLoneModelFlagBesideThePlansModelIsRefusedNotIgnored() {
        MainTest.Run fit = MainTest.run("fit", MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.csv").toString(),
                "--traces-json", MainTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.traces.json").toString(),
                "--plan", MainTest.HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json").toString(), "--tau-trap", "1ns");
        assertThat(fit.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(fit.err().strip().lines()).hasSize(1);
        assertThat(fit.err()).contains("--tau-trap does not combine with the plan's model");
    }

    @Test
    void calibrationGivesTotalErrorsAndMilliOdHeadersAreReadInOd(@TempDir Path dir) throws Exception {
        Path csv = simulatedSeries(dir, 11);
        List<String> lines = Files.readAllLines(csv);
        List<String> mod = new ArrayList<>();
        mod.add("delay (ps),a [mOD],b [mOD],c [mOD],d [mOD]");
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            StringBuilder row = new StringBuilder(f[0]);
            for (int c = 1; c < f.length; c++) {
                row.append(',').append(1000 * Double.parseDouble(f[c]));
            }
            mod.add(row.toString());
        }
        Path modCsv = dir.resolve("series-mod.csv");
        Files.write(modCsv, mod);
        MainTest.Run fit = MainTest.run("fit", modCsv.toString(), "--tau-rad", "20ns", "--tau-auger2", "70ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--fluence-uncertainty", "8%", "--format", "json", "--quiet",
                "--out", dir.resolve("out").toString());
        assertThat(fit.exit()).as(fit.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(fit.out());
        JsonNode sigma = root.at("/parameters/crossSectionCm2");
        assertThat(sigma.get("totalStdError").asDouble()).isCloseTo(Math.hypot(sigma.get("stdError").asDouble(),
                0.08 * sigma.get("value").asDouble()), org.assertj.core.data.Percentage.withPercentage(1e-6));
        assertThat(root.at("/traces/0/amplitude/value").asDouble()).as("amplitude in OD").isBetween(0.005, 0.02);
        assertThat(root.at("/statistics/reducedChiSquare").asDouble()).isBetween(0.7, 1.4);
        assertThat(root.at("/statistics/noiseFrom").asText()).contains("scatter");
        // no pre-zero points and free baselines: the photocharging check says it could not look, never an all-clear
        assertThat(root.get("checks").toString()).contains("photocharging: not tested (");
        String html = Files.readString(dir.resolve("out/fit-report.html"));
        assertThat(html).contains("statistical error").contains("total error (with calibration)").contains("photocharging: not tested")
                .doesNotContain("no photocharging signature");

        MainTest.Run text = MainTest.run("fit", modCsv.toString(), "--tau-rad", "20ns", "--tau-auger2", "70ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--fluence-uncertainty", "0.08", "--pump-radius", "300um",
                "--probe-radius", "100um");
        assertThat(text.exit()).as(text.err()).isZero();
        assertThat(text.out()).contains("(stat), ±").contains("total").contains("8% fluence calibration")
                .contains("reduced χ²").contains("photocharging: not tested (");
        MainTest.Run half = MainTest.run("fit", modCsv.toString(), "--tau-rad", "20ns", "--tau-auger2", "70ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--pump-radius", "300um", "--quiet");
        assertThat(half.exit()).isNotZero();
        assertThat(half.err()).contains("--probe-radius");
    }

    @Test
    void withoutAModelAPlanOrFlagsTheFitSaysWhatIsMissing(@TempDir Path dir) throws Exception {
        Path csv = simulatedSeries(dir, 3);
        MainTest.Run r = MainTest.run("fit", csv.toString(), "--fluences", "1e13,3e13,1e14,3e14", "--quiet");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--tau-rad and --tau-auger2 are required").contains("plan");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "non-numeric cell|delay (ps),a,b;1,0.1,0.2;2,zero,0.2;3,0.1,0.1;4,0.1,0.1|series.csv:3",
        "unsorted delays|delay (ps),a,b;1,0.1,0.2;3,0.1,0.2;2,0.1,0.1;4,0.1,0.1|delay",
        "duplicate delays|delay (ps),a,b;1,0.1,0.2;2,0.1,0.2;2,0.1,0.1;4,0.1,0.1|delay",
        "constant column|delay (ps),a,b;1,0.1,0.2;2,0.1,0.15;3,0.1,0.1;4,0.1,0.05;5,0.1,0.02|constant",
        "all-NaN trace|delay (ps),a,b;1,NaN,0.2;2,NaN,0.15;3,NaN,0.1;4,NaN,0.05|'a'",
        "two-row file|delay (ps),a,b;1,0.1,0.2;2,0.05,0.1|only 2 data rows"})
    void badDataGivesOneClearLineAndExitCode3(String what, String table, String expected, @TempDir Path dir) throws Exception {
        Path csv = dir.resolve("series.csv");
        Files.writeString(csv, table.replace(';', '\n') + "\n");
        MainTest.Run r = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,1e14", "--quiet");
        assertThat(r.exit()).as(what + ": " + r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip().lines()).as(r.err()).hasSize(1);
        assertThat(r.err()).as(what).contains(expected).doesNotContain("Exception").doesNotContain("NaN s");
    }

    @Test
    void missingExcitationsAndUnknownParametersAreBadInput(@TempDir Path dir) throws Exception {
        Path csv = simulatedSeries(dir, 3);
        MainTest.Run none = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps", "--quiet");
        assertThat(none.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(none.err()).contains("--fluences");
        MainTest.Run wrongCount = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,3e13", "--quiet");
        assertThat(wrongCount.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(wrongCount.err().strip().lines()).hasSize(1);
        MainTest.Run unknown = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--free", "scale,tau-cool", "--quiet");
        assertThat(unknown.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(unknown.err()).contains("tau-cool");
    }
}
