package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Saving keeps the file's own text and changes only what the user changed: one edited field is one changed line
 * against the original file (what {@code diff} shows), for every demo plan.
 */
class MinimalDiffSaveTest {

    static final Path PLANS = Path.of(System.getProperty("ladderkin.home", ".")).resolve("experiments-plan");

    @TempDir
    Path dir;

    /** Lines removed and added from {@code a} to {@code b}, as a line diff counts them (longest common subsequence). */
    static int[] lineDiff(String a, String b) {
        List<String> x = a.lines().toList();
        List<String> y = b.lines().toList();
        int[][] lcs = new int[x.size() + 1][y.size() + 1];
        for (int i = x.size() - 1; i >= 0; i--) {
            for (int j = y.size() - 1; j >= 0; j--) {
                lcs[i][j] = x.get(i).equals(y.get(j)) ? lcs[i + 1][j + 1] + 1 : Math.max(lcs[i + 1][j], lcs[i][j + 1]);
            }
        }
        return new int[] {x.size() - lcs[0][0], y.size() - lcs[0][0]};
    }

    static Stream<Arguments> oneFieldOfEachDemo() {
        List<Arguments> cases = new java.util.ArrayList<>();
        for (String plan : List.of("cdse-auger-1khz.plan.json", "pbse-multiplication-80mhz.plan.json")) {
            cases.add(Arguments.of(plan, "laser.repetitionRate", "2 kHz"));
            cases.add(Arguments.of(plan, "laser.pulseEnergyRange[1]", "1 µJ"));
            cases.add(Arguments.of(plan, "laser.pumpWavelengths", "400 nm, 600 nm"));
            cases.add(Arguments.of(plan, "laser.pulsePickerDivisions", "1, 3"));
            cases.add(Arguments.of(plan, "sample.absorbance.value", "0.2 OD"));
            cases.add(Arguments.of(plan, "instruments[0].irfFwhm", "180 fs"));
            cases.add(Arguments.of(plan, "goals.measure", "biexciton-auger"));
            cases.add(Arguments.of(plan, "title", "A \"quoted\" title, with µ and ⟨N⟩"));
            cases.add(Arguments.of(plan, "limits.beamTime", "12 h"));
        }
        return cases.stream();
    }

    @ParameterizedTest(name = "{0}: {1} = {2}")
    @MethodSource("oneFieldOfEachDemo")
    void oneChangedFieldIsOneChangedLine(String plan, String path, String value) throws Exception {
        Path copy = dir.resolve(plan);
        Files.copy(PLANS.resolve(plan), copy);
        String original = Files.readString(copy);
        PlanEditor editor = new PlanEditor();
        editor.open(copy);
        editor.edit(field(editor, path), value);
        editor.save();

        String saved = Files.readString(copy);
        assertThat(lineDiff(original, saved)).as("lines removed, added").containsExactly(1, 1);
        PlanEditor reopened = new PlanEditor();
        reopened.open(copy);
        assertThat(reopened.text(field(reopened, path))).isEqualTo(value.replace(" ,", ","));
        assertThat(reopened.document()).isEqualTo(editor.document());
    }

    @Test
    void theDemoSavedToAnotherFolderDiffersInTheEditedLineAlone() throws Exception {
        // no relative data-file path in the demo, so nothing else is re-expressed for the new folder
        Path demo = PLANS.resolve("cdse-auger-1khz.plan.json");
        PlanEditor editor = new PlanEditor();
        editor.open(demo);
        editor.edit(field(editor, "laser.pumpRadius"), "120 µm");
        Path elsewhere = dir.resolve("copy.plan.json");
        editor.saveAs(elsewhere);
        assertThat(lineDiff(Files.readString(demo), Files.readString(elsewhere))).containsExactly(1, 1);
        assertThat(Files.readString(elsewhere)).contains("\"pumpRadius\": \"120 µm\",\n");
    }

    @Test
    void aRemovedKeyIsOneRemovedLineAndAnAddedKeyOneNewLine() throws Exception {
        Path copy = dir.resolve("p.plan.json");
        Files.copy(PLANS.resolve("cdse-auger-1khz.plan.json"), copy);
        String original = Files.readString(copy);
        PlanEditor editor = new PlanEditor();
        editor.open(copy);

        editor.edit(field(editor, "lab"), "");
        editor.save();
        String withoutLab = Files.readString(copy);
        assertThat(lineDiff(original, withoutLab)).containsExactly(1, 0);
        assertThat(withoutLab).doesNotContain("\"lab\"").startsWith("{\n  \"schema\": \"ladderkin.plan/1\",\n  \"title\"");

        // added after the last key of its object: that line gains a comma, the new key is one new line
        editor.edit(field(editor, "laser.pulseEnergyUncertainty"), "3 %");
        editor.save();
        String withUncertainty = Files.readString(copy);
        assertThat(lineDiff(withoutLab, withUncertainty)).containsExactly(1, 2);
        assertThat(withUncertainty).contains("\"probeRadius\": \"50 µm\",\n    \"pulseEnergyUncertainty\": \"3 %\"\n  },");

        // a key added to a one-line object stays on that line
        editor.edit(field(editor, "instruments[1].maxCountFraction"), "1 %");
        editor.edit(field(editor, "sample.crossSection.value"), "3e-15 cm²");
        editor.save();
        String withSigma = Files.readString(copy);
        assertThat(withSigma).contains("\"maxCountFraction\": \"1 %\" }");
        assertThat(withSigma).contains("\"refresh\": { \"mode\": \"stirred\" },\n    \"crossSection\": { \"value\": \"3e-15 cm²\" }\n  },");
        PlanEditor reopened = new PlanEditor();
        reopened.open(copy);
        assertThat(reopened.document()).isEqualTo(editor.document());
    }

    @Test
    void windowsLineEndingsAndTabsAreKept() throws Exception {
        Path copy = dir.resolve("crlf.plan.json");
        String original = Files.readString(PLANS.resolve("cdse-auger-1khz.plan.json")).replace("  ", "\t").replace("\n", "\r\n");
        Files.writeString(copy, original);
        PlanEditor editor = new PlanEditor();
        editor.open(copy);
        editor.edit(field(editor, "lab"), "");
        editor.edit(field(editor, "laser.pumpDriftPerHour"), "1 %");
        editor.save();
        String saved = Files.readString(copy);
        assertThat(saved.replace("\r\n", "")).doesNotContain("\n");
        assertThat(saved).contains("\r\n\t\t\"pumpDriftPerHour\": \"1 %\"\r\n\t},");
        assertThat(lineDiff(original, saved)).containsExactly(2, 2);
    }

    @Test
    void aRestoredPlanSavedChangesOnlyWhatTheRecoveryChanged() throws Exception {
        Path copy = dir.resolve("p.plan.json");
        Files.copy(PLANS.resolve("pbse-multiplication-80mhz.plan.json"), copy);
        String original = Files.readString(copy);
        PlanEditor before = new PlanEditor();
        before.open(copy);
        before.edit(field(before, "laser.repetitionRate"), "40 MHz");
        PlanEditor restored = new PlanEditor();
        restored.restore(before.document(), copy);
        restored.save();
        assertThat(lineDiff(original, Files.readString(copy))).containsExactly(1, 1);
    }

    @Test
    void anUntitledPlanIsWrittenWhole() throws Exception {
        PlanEditor editor = new PlanEditor();
        editor.edit(field(editor, "title"), "new campaign");
        Path target = dir.resolve("new.plan.json");
        editor.saveAs(target);
        assertThat(Files.readString(target)).isEqualTo(editor.text());
    }

    static FieldSpec field(PlanEditor editor, String path) {
        return editor.fields().stream().filter(f -> f.path().toString().equals(path)).findFirst()
                .orElseThrow(() -> new AssertionError("no field " + path));
    }
}
