package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ExciteCommandTest {

    static final String[] PBSE = {"excite", "--material", "PbSe", "--diameter", "5nm", "--od", "0.3", "--path", "1mm",
        "--pump", "400nm", "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um"};

    static String[] with(String[] base, String... more) {
        String[] all = java.util.Arrays.copyOf(base, base.length + more.length);
        System.arraycopy(more, 0, all, base.length, more.length);
        return all;
    }

    @Test
    void jsonHasEveryKeyTheIssueNames() throws Exception {
        MainTest.Run r = MainTest.run(with(PBSE, "--format", "json", "--target-n", "1.5"));
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        JsonNode j = new ObjectMapper().readTree(r.out());
        for (String key : new String[] {"diameterNm", "firstExcitonEv", "crossSectionCm2", "photonFluencePeakPerCm2", "nAvgPeak",
            "nAvgProbeWeighted", "absorbedFraction", "absorbedPowerW", "pulseEnergyForTargetJ", "dotsInExcitedVolume"}) {
            assertThat(j.has(key)).as(key).isTrue();
        }
        assertThat(j.get("diameterNm").asDouble()).isEqualTo(5.0);
        assertThat(j.get("absorbedFraction").asDouble()).isCloseTo(1 - Math.pow(10, -0.3), org.assertj.core.data.Offset.offset(1e-12));
        // ⟨N⟩ is linear in energy on axis: E(target) = 50 nJ · 1.5 / ⟨N⟩(50 nJ)
        assertThat(j.get("pulseEnergyForTargetJ").asDouble())
                .isCloseTo(50e-9 * 1.5 / j.get("nAvgPeak").asDouble(), org.assertj.core.data.Offset.offset(1e-19));
        assertThat(j.get("advisories").size()).isZero();
    }

    @Test
    void textShowsTheNumbersAndTheCautions() {
        MainTest.Run r = MainTest.run(with(PBSE, "--target-n", "1.5", "--target-mode", "probe-averaged"));
        assertThat(r.exit()).isZero();
        assertThat(r.out()).contains("Fluence  peak 318.3 µJ/cm²").contains("⟨N⟩").contains("Target   ⟨N⟩ = 1.5 averaged over the probe needs")
                .contains("laser safety officer").contains("Lead compounds are toxic");
    }

    @Test
    void powerFwhmAndFlatTopAreAccepted() {
        MainTest.Run r = MainTest.run("excite", "--material", "PbS", "--first-peak", "1200nm", "--concentration", "1uM", "--path", "2mm",
                "--pump", "400nm", "--power", "2mW", "--rep-rate", "1kHz", "--pump-fwhm", "150um", "--probe-radius", "30um",
                "--probe-flat-top", "--format", "json");
        assertThat(r.err()).isEmpty();
        assertThat(r.out()).contains("\"pulseEnergyJ\" : 2.0E-6").contains("flat top, radius 30");
    }

    @Test
    void probeLargerThanPumpIsFlaggedNotRefused() {
        String[] args = PBSE.clone();
        args[args.length - 1] = "150um";
        MainTest.Run r = MainTest.run(args);
        assertThat(r.exit()).isZero();
        assertThat(r.out()).contains("Note     ! the probe (Gaussian, 1/e² radius 150.0 µm");
    }

    @Test
    void thickSampleIsFlagged() {
        MainTest.Run r = MainTest.run("excite", "--material", "PbSe", "--diameter", "5nm", "--od", "3.5", "--path", "1mm",
                "--pump", "400nm", "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um");
        assertThat(r.exit()).isZero();
        assertThat(r.out()).contains("Note     ! measured absorbance 3.5 OD is ≥ 3").contains("Note     ! absorbance 3.5 OD at the pump is ≥ 3");
    }

    @Test
    void diameterOutsideTheCurveIsBadInput() {
        MainTest.Run r = MainTest.run("excite", "--material", "CdSe", "--diameter", "12nm", "--od", "0.3", "--path", "1mm",
                "--pump", "350nm", "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).startsWith("ladderkin: --diameter/--first-peak: CdSe: diameter 12 nm is outside the sizing curve's validity range");
    }

    @Test
    void impossiblePeakIsBadInput() {
        MainTest.Run r = MainTest.run("excite", "--material", "CdSe", "--first-peak", "760nm", "--od", "0.3", "--path", "1mm",
                "--pump", "350nm", "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("no dot size gives a first-exciton peak at 760 nm");
    }

    @Test
    void crossSectionOverrideAndTargetOnly() throws Exception {
        MainTest.Run r = MainTest.run("excite", "--material", "InP", "--diameter", "3nm", "--cross-section", "2e-16cm2", "--od", "0.2",
                "--path", "1mm", "--pump", "400nm", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um",
                "--target-n", "0.1", "--format", "json");
        assertThat(r.err()).isEmpty();
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("crossSectionCm2").asDouble()).isCloseTo(2e-16, org.assertj.core.data.Offset.offset(1e-30));
        assertThat(j.get("nAvgPeak").asDouble()).isCloseTo(0.1, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(j.get("pulseEnergyForTargetJ").asDouble()).isEqualTo(j.get("pulseEnergyJ").asDouble());
    }

    @Test
    void sampleFileAndSampleFlagsDoNotMix(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("s.json");
        Files.writeString(f, org.ladderkin.io.SampleCodecTest.FILE);
        MainTest.Run ok = MainTest.run("excite", f.toString(), "--pump", "400nm", "--energy", "10nJ", "--rep-rate", "1kHz",
                "--pump-radius", "100um", "--probe-radius", "40um");
        assertThat(ok.err()).isEmpty();
        assertThat(ok.out()).contains("FH-PbSe-17").contains("tetrachloroethylene").contains("flowing");
        MainTest.Run bad = MainTest.run("excite", f.toString(), "--material", "CdSe", "--pump", "400nm", "--energy", "10nJ",
                "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um");
        assertThat(bad.exit()).isEqualTo(ExitCodes.USAGE);
        assertThat(bad.err()).contains("--material describes the sample, which already comes from");
    }

    @Test
    void helpListsTheNewCommands() {
        MainTest.Run r = MainTest.run("--help");
        assertThat(r.out()).contains("excite").contains("materials");
    }

    @Test
    void exampleSampleFileRuns() throws Exception {
        MainTest.Run r = MainTest.run("excite", MainTest.HOME.resolve("experiments-plan/fh-pbse-17.sample.json").toString(),
                "--pump", "400nm", "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "40um",
                "--target-n", "1.5", "--format", "json");
        assertThat(r.err()).isEmpty();
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("sample").get("refresh").asText()).isEqualTo("flowing");
        assertThat(j.get("absorbanceAtPumpOd").asDouble()).isCloseTo(0.3, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(j.get("nAvgProbeWeighted").asDouble()).isLessThan(j.get("nAvgPeak").asDouble());
    }

    @Test
    void materialsListAndOne() {
        MainTest.Run list = MainTest.run("materials");
        assertThat(list.exit()).isZero();
        assertThat(list.out()).contains("CdSe").contains("CsPbBr3").contains("InP").contains("none (give size)").contains("toluene");
        MainTest.Run one = MainTest.run("materials", "CdSe");
        assertThat(one.out()).contains("density                    5.81 g/cm³")
                .contains("source: Leatherdale, Woo, Mikulec, Bawendi, J. Phys. Chem. B 106, 7619 (2002)")
                .contains("trion lifetime             unknown");
        MainTest.Run host = MainTest.run("materials", "toluene");
        assertThat(host.out()).contains("boiling point              110.6 °C").contains("flammable");
        MainTest.Run none = MainTest.run("materials", "unobtainium");
        assertThat(none.exit()).isEqualTo(ExitCodes.BAD_INPUT);
    }
}
