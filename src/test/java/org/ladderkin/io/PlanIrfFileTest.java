package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.PlanInputs;

/** A plan's instrument may give its response as a measured table ({@code irfFile}) instead of a width ({@code irfFwhm}). */
class PlanIrfFileTest {

    private static final String TA_FWHM = "\"irfFwhm\": \"200 fs\" },";
    private static final Path DEMO_IRF = Path.of(System.getProperty("ladderkin.home", ".")).resolve("experiments-plan/fh-ta-irf.csv");

    /** The demo plan with its TA instrument's {@code irfFwhm} replaced by {@code replacement}. */
    static String demoWith(String replacement) throws Exception {
        String text = PlanCodecRejectionTest.demoText();
        assertThat(text).as("test setup").contains(TA_FWHM);
        return text.replace(TA_FWHM, replacement + " },");
    }

    @Test
    void irfFileIsReadFromThePlansFolder(@TempDir Path dir) throws Exception {
        Path plans = Files.createDirectories(dir.resolve("plans"));
        Files.createDirectories(plans.resolve("irf"));
        Files.copy(DEMO_IRF, plans.resolve("irf/ta.csv"));
        Path plan = plans.resolve("p.plan.json");
        Files.writeString(plan, demoWith("\"irfFile\": \"irf/ta.csv\""));
        PlanInputs p = PlanCodec.read(plan);
        Instrument ta = p.instruments().get(0);
        MeasuredIrf expected = IrfFileReader.read(DEMO_IRF, "irf/ta.csv");
        assertThat(ta.measuredIrf()).isEqualTo(expected);
        assertThat(ta.irfFwhmS()).isEqualTo(expected.fwhmS());
        // the TCSPC instrument keeps its Gaussian width
        assertThat(p.instruments().get(1).measuredIrf()).isNull();
        assertThat(p.instruments().get(1).irfFwhmS()).isEqualTo(60e-12);
    }

    @Test
    void aTcspcInstrumentTakesAnIrfFileToo(@TempDir Path dir) throws Exception {
        // triangle of half-width 60 ps: FWHM 60 ps
        Files.writeString(dir.resolve("spad.tsv"), "# scattered laser light (demo)\nt_ps\tcounts\n-90\t0\n-60\t0\n0\t5000\n60\t0\n90\t0\n");
        Path plan = dir.resolve("p.plan.json");
        Files.writeString(plan, PlanCodecRejectionTest.demoText().replace("\"irfFwhm\": \"60 ps\"", "\"irfFile\": \"spad.tsv\""));
        Instrument tcspc = PlanCodec.read(plan).instruments().get(1);
        assertThat(tcspc.kind()).isEqualTo(Instrument.Kind.TCSPC);
        assertThat(tcspc.measuredIrf().origin()).isEqualTo("spad.tsv");
        assertThat(tcspc.irfFwhmS()).isCloseTo(60e-12, org.assertj.core.data.Offset.offset(1e-24));
        assertThat(tcspc.measuredIrf().centroidS()).isCloseTo(0, org.assertj.core.data.Offset.offset(1e-24));
    }

    @Test
    void bothIrfFileAndIrfFwhmAreRefusedAtTheFile() throws Exception {
        String t = demoWith("\"irfFwhm\": \"200 fs\", \"irfFile\": \"ta.csv\"");
        assertThatThrownBy(() -> PlanCodecRejectionTest.read(t)).isInstanceOf(InputException.class)
                .satisfies(InputAssertions.input(InputProblem.CONFLICT, PlanCodecRejectionTest.at(t, "\"ta.csv\"", 0),
                        "instruments[0].irfFile"));
    }

    @Test
    void neitherIsRefusedNamingBoth() throws Exception {
        String t = PlanCodecRejectionTest.demoText().replace(", " + TA_FWHM, " },");
        assertThatThrownBy(() -> PlanCodecRejectionTest.read(t)).isInstanceOf(InputException.class)
                .satisfies(InputAssertions.input(InputProblem.MISSING_FIELD,
                        PlanCodecRejectionTest.at(t, "{ \"kind\": \"transient-absorption\"", 0), "instruments[0].irfFwhm"));
    }

    @Test
    void aMissingIrfFileIsLocatedInThePlan(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("p.plan.json");
        String t = demoWith("\"irfFile\": \"nowhere.csv\"");
        Files.writeString(plan, t);
        assertThatThrownBy(() -> PlanCodec.read(plan)).isInstanceOf(InputException.class)
                .satisfies(InputAssertions.input(InputProblem.NOT_FOUND, PlanCodecRejectionTest.at(t, "\"nowhere.csv\"", 0)
                        .replaceFirst("^plan\\.json", java.util.regex.Matcher.quoteReplacement(plan.toString())),
                        "instruments[0].irfFile"));
    }

    @Test
    void aBadIrfFileIsLocatedInThatFile(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("ta.csv"), "time (fs),response\n-200,0\n-100,20\n0,oops\n100,20\n200,0\n");
        Path plan = dir.resolve("p.plan.json");
        Files.writeString(plan, demoWith("\"irfFile\": \"ta.csv\""));
        assertThatThrownBy(() -> PlanCodec.read(plan)).isInstanceOf(InputException.class)
                .satisfies(input(InputProblem.BAD_NUMBER, "ta.csv:4:3", "response"));
    }
}
