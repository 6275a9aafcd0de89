package org.ladderkin.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.ladderkin.io.InputProblem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.MaterialCodec;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.json.JsonTree;

class MaterialLibraryTest {

    private static final MaterialLibrary LIB = MaterialLibrary.fromHome();

    @Test
    void shipsTheMaterialsTheIssueNames() {
        assertThat(LIB.materials()).extracting(Material::key)
                .contains("CdSe", "CdS", "CdTe", "PbSe", "PbS", "InP", "CsPbBr3");
        assertThat(LIB.matrices()).extracting(m -> m.key()).contains("toluene", "chloroform", "hexane", "octane", "pmma");
    }

    @Test
    void everyValueCarriesASource() {
        for (Material m : LIB.materials()) {
            for (Sourced s : new Sourced[] {m.bulkGapJ(), m.densityKgPerM3(), m.specificHeatJPerKgK(), m.refractiveIndex(),
                    m.electronDegeneracy(), m.holeDegeneracy(), m.augerVolumeConstantSPerM3(), m.singleExcitonLifetimeS(),
                    m.trionLifetimeS()}) {
                assertThat(s.source()).as(m.key()).isNotBlank();
            }
            assertThat(m.bulkGapJ().known()).as(m.key() + " bulk gap").isTrue();
            assertThat(m.densityKgPerM3().known()).as(m.key() + " density").isTrue();
        }
    }

    @Test
    void inpHasNoSizingCurveAndSaysSo() {
        Material inp = LIB.material("InP");
        assertThat(inp.sizing()).isEmpty();
        assertThat(inp.notes()).contains("give the diameter measured on your sample");
    }

    @Test
    void lookupIsCaseInsensitiveAndUnknownListsTheLibrary() {
        assertThat(LIB.material("cdse").key()).isEqualTo("CdSe");
        assertThatThrownBy(() -> LIB.material("GaAs")).hasMessageStartingWith("unknown material 'GaAs' (library has: CdS, CdSe");
    }

    @Test
    void unconfirmedValuesAreRecognised() {
        assertThat(LIB.material("CdSe").bulkGapJ().unconfirmed()).isTrue();
        assertThat(LIB.material("CdSe").electronDegeneracy().unconfirmed()).isTrue();
        assertThat(LIB.material("PbS").singleExcitonLifetimeS().unconfirmed()).isFalse();
    }

    private static String cdseText() throws IOException {
        return Files.readString(MaterialLibrary.home().resolve("models/materials/CdSe.json"));
    }

    @Test
    void unknownFieldIsRejectedWithItsPlace() throws IOException {
        String t = cdseText().replace("\"shape\": \"sphere\",", "\"shape\": \"sphere\", \"colour\": \"red\",");
        assertThatThrownBy(() -> MaterialCodec.read(JsonTree.parse(t, "CdSe.json")))
                .satisfies(input(InputProblem.UNKNOWN_FIELD, "CdSe.json:5:32", "colour"));
    }

    @Test
    void valueWithoutSourceIsRejected() throws IOException {
        String t = cdseText().replaceFirst("\"source\": \"from memory \\(room-temperature bulk wurtzite CdSe\\)\"", "\"note\": \"x\"");
        assertThatThrownBy(() -> MaterialCodec.read(JsonTree.parse(t, "CdSe.json")))
                .satisfies(input(InputProblem.MISSING_FIELD, "CdSe.json:6:14", "bulkGap.source"));
    }

    @Test
    void nonMonotonicSizingPolynomialIsRefused() throws IOException {
        String t = cdseText().replaceFirst("\"400 nm\",", "\"200 nm\",");
        assertThatThrownBy(() -> MaterialCodec.read(JsonTree.parse(t, "CdSe.json")))
                .satisfies(input(InputProblem.INVALID_VALUE, "CdSe.json:34:13", "sizing"));
    }

    @Test
    void keyMustMatchFileName(@TempDir Path home) throws IOException {
        Files.createDirectories(home.resolve("models/materials"));
        Files.createDirectories(home.resolve("models/matrices"));
        Files.writeString(home.resolve("models/materials/Other.json"), cdseText());
        assertThatThrownBy(() -> MaterialLibrary.load(home))
                .hasMessageEndingWith("field 'key': key 'CdSe' differs from the file name 'Other' (they must match)");
    }
}
