package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.sample.Matrix;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;

/** Sample files (schema ladderkin.sample/1): what they say, and where a bad one is wrong. */
public class SampleCodecTest {

    public static final String FILE = """
            {
              "schema": "ladderkin.sample/1",
              "name": "FH-PbSe-17 (invented batch)",
              "material": "PbSe",
              "diameter": "5 nm",
              "sizeDispersion": "7 %",
              "absorbance": { "value": "0.3 OD", "at": "400 nm" },
              "pathLength": "2 mm",
              "matrix": "tetrachloroethylene",
              "refresh": { "mode": "flowing", "flowRate": "5 mL/min", "cellVolume": "0.5 mL" }
            }
            """;

    static Sample read(String text) {
        Node root = JsonTree.parse(text, "s.json");
        root.schema(SampleCodec.SCHEMA, SampleCodec.VERSION);
        return SampleCodec.section(root, MaterialLibrary.fromHome(), Path.of("."));
    }

    @Test
    void readsEveryField() {
        Sample s = read(FILE);
        assertThat(s.sizeM()).isEqualTo(5e-9);
        assertThat(s.spec().sizeDispersion()).isEqualTo(0.07);
        assertThat(s.spec().pathLengthM()).isEqualTo(2e-3);
        assertThat(s.spec().matrix().map(Matrix::key)).contains("tetrachloroethylene");
        assertThat(s.spec().refresh().mode()).isEqualTo(Refresh.Mode.FLOWING);
        assertThat(s.spec().refresh().exchangeTimeS()).isCloseTo(6.0, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(s.absorbanceAt(400e-9)).isCloseTo(0.3, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void diameterOutsideTheCurveIsReportedAtTheDiameter() {
        String t = FILE.replace("\"5 nm\"", "\"12 nm\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.INVALID_VALUE, "s.json:5:15", "diameter"));
    }

    @Test
    void impossiblePeakIsReportedAtThePeak() {
        String t = FILE.replace("\"diameter\": \"5 nm\"", "\"firstExcitonPeak\": \"5000 nm\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.INVALID_VALUE, "s.json:5:23", "firstExcitonPeak"));
    }

    @Test
    void unknownMaterialListsTheLibrary() {
        String t = FILE.replace("\"PbSe\"", "\"GaAs\"");
        assertThatThrownBy(() -> read(t)).satisfies(input(InputProblem.BAD_CHOICE, "s.json:4:15", "material"));
    }

    private static final String FLOWING = "{ \"mode\": \"flowing\", \"flowRate\": \"5 mL/min\", \"cellVolume\": \"0.5 mL\" }";

    @Test
    void aTranslatedFilmReadsItsSpeed() {
        Sample s = read(FILE.replace(FLOWING, "{ \"mode\": \"translated\", \"speed\": \"1 mm/s\" }"));
        assertThat(s.spec().refresh().mode()).isEqualTo(Refresh.Mode.TRANSLATED);
        assertThat(s.spec().refresh().speedMPerS()).isEqualTo(1e-3);
        // a 300 µm spot moved at 1 mm/s: a fresh spot every 0.3 s
        assertThat(s.spec().refresh().translationRefreshS(300e-6)).isCloseTo(0.3, org.assertj.core.data.Offset.offset(1e-15));
    }

    @Test
    void aNegativeSpeedIsReportedAtTheSpeed() {
        String t = FILE.replace(FLOWING, "{ \"mode\": \"translated\", \"speed\": \"-1 mm/s\" }");
        assertThatThrownBy(() -> read(t)).satisfies(input(InputProblem.OUT_OF_RANGE, "s.json:10:47", "refresh.speed"));
    }

    @Test
    void aSpeedWithoutUnitIsReportedAtTheSpeed() {
        String t = FILE.replace(FLOWING, "{ \"mode\": \"translated\", \"speed\": \"1\" }");
        assertThatThrownBy(() -> read(t)).satisfies(input(InputProblem.WRONG_UNIT, "s.json:10:47", "refresh.speed"));
    }

    @Test
    void aTranslatedFilmNeedsItsSpeed() {
        String t = FILE.replace(FLOWING, "{ \"mode\": \"translated\" }");
        assertThatThrownBy(() -> read(t)).satisfies(input(InputProblem.MISSING_FIELD, "s.json:10:14", "refresh.speed"));
    }

    @Test
    void flowingNeedsTheCellVolume() {
        String t = FILE.replace(", \"cellVolume\": \"0.5 mL\"", "");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.MISSING_FIELD, "s.json:10:14", "refresh.cellVolume"));
    }

    @Test
    void absorbanceWithoutALawIsReportedAtTheAbsorbance() {
        String t = FILE.replace("\"PbSe\"", "\"InP\"").replace("\"5 nm\"", "\"3 nm\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.INVALID_VALUE, "s.json:7:17", "absorbance"));
        String withSigma = t.replace("\"pathLength\"", "\"crossSection\": { \"value\": \"3e-16 cm²\", \"at\": \"400 nm\" }, \"pathLength\"");
        assertThat(read(withSigma).crossSectionAt(400e-9).crossSectionM2()).isCloseTo(3e-20, org.assertj.core.data.Offset.offset(1e-30));
    }

    @Test
    void inlineMatrixAndSpectrumFile(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("abs.csv"), "# invented demo spectrum\nwavelength_nm,absorbance\n350,1.0\n400,0.8\n500,0.4\n");
        String t = FILE.replace("\"PbSe\"", "\"CdSe\"").replace("\"5 nm\"", "\"4 nm\"")
                .replace("\"at\": \"400 nm\"", "\"at\": \"350 nm\"")
                .replace("\"matrix\": \"tetrachloroethylene\"", """
                        "matrix": { "key": "pmma-x", "name": "PMMA film", "kind": "film",
                          "density": { "value": "1.18 g/cm³", "source": "from memory" },
                          "specificHeat": { "value": "1.42 J/(g·K)", "source": "from memory" },
                          "thermalConductivity": { "value": "0.19 W/(m·K)", "source": "from memory" } },
                        "absorptionSpectrum": "abs.csv\"""");
        Path f = dir.resolve("s.json");
        Files.writeString(f, t);
        Sample s = SampleCodec.read(f, MaterialLibrary.fromHome());
        assertThat(s.spec().matrix().orElseThrow().kind()).isEqualTo(Matrix.Kind.FILM);
        assertThat(s.crossSectionAt(400e-9).approximate()).isFalse();
        assertThat(s.absorbanceAt(400e-9)).isCloseTo(0.3 * 0.8, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void missingSpectrumFileIsReportedAtTheField(@TempDir Path dir) {
        String t = FILE.replace("\"pathLength\"", "\"absorptionSpectrum\": \"none.csv\", \"pathLength\"");
        Node root = JsonTree.parse(t, "s.json");
        assertThatThrownBy(() -> SampleCodec.section(root, MaterialLibrary.fromHome(), dir))
                .satisfies(InputAssertions.input(InputProblem.NOT_FOUND, "s.json:8:25", "absorptionSpectrum"));
    }

    @Test
    void wrongSchemaIsRefused() {
        assertThatThrownBy(() -> read(FILE.replace("ladderkin.sample/1", "ladderkin.plan/1")))
                .satisfies(input(InputProblem.WRONG_SCHEMA, "s.json:2:13", "schema"));
    }
}
