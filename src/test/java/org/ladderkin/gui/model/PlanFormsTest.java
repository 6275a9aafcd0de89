package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The forms must cover the plan schema: every value of the demo plan (and of a new blank plan) is shown by some form
 * field, so nothing in a plan file is out of reach of the planner. When the schema changes, this test names the
 * paths the field tables in {@link PlanForms} must learn.
 */
class PlanFormsTest {

    @Test
    void everyValueOfTheDemoPlanIsBoundToAFormField() {
        PlanEditor editor = new PlanEditor();
        editor.open(PlanEditorTest.DEMO);
        assertThat(unbound(editor)).isEmpty();
    }

    @Test
    void everyValueOfANewPlanIsBoundToAFormField() {
        assertThat(unbound(new PlanEditor())).isEmpty();
    }

    @Test
    void materialAndMatrixArePickedFromTheLibrary() {
        var fields = new PlanEditor().fields();
        FieldSpec material = fields.stream().filter(f -> f.path().toString().equals("sample.material")).findFirst().orElseThrow();
        FieldSpec matrix = fields.stream().filter(f -> f.path().toString().equals("sample.matrix")).findFirst().orElseThrow();
        assertThat(material.kind()).isEqualTo(FieldSpec.Kind.CHOICE);
        assertThat(material.choices()).contains("CdSe", "PbSe", "InP").isSorted();
        assertThat(matrix.choices()).contains("toluene", "tetrachloroethylene");
    }

    @Test
    void aMeasuredIrfFileIsBoundToAnOptionalFieldAndReadFromThePlansFolder(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        java.nio.file.Path home = java.nio.file.Path.of(System.getProperty("ladderkin.home", "."));
        java.nio.file.Files.copy(home.resolve("experiments-plan/fh-ta-irf.csv"), dir.resolve("ta-irf.csv"));
        java.nio.file.Path plan = dir.resolve("irf.plan.json");
        java.nio.file.Files.writeString(plan, java.nio.file.Files.readString(PlanEditorTest.DEMO)
                .replace("\"irfFwhm\": \"200 fs\"", "\"irfFile\": \"ta-irf.csv\""));
        PlanEditor editor = new PlanEditor();
        editor.open(plan);
        assertThat(unbound(editor)).isEmpty();
        FieldSpec file = editor.fields().stream().filter(f -> f.path().toString().equals("instruments[0].irfFile"))
                .findFirst().orElseThrow();
        FieldSpec fwhm = editor.fields().stream().filter(f -> f.path().toString().equals("instruments[0].irfFwhm"))
                .findFirst().orElseThrow();
        assertThat(file.optional()).isTrue();
        assertThat(fwhm.optional()).isTrue();
        // relative to the plan's folder, as on the command line (not to the folder the planner was started in)
        assertThat(editor.check().valid()).as(editor.check().problem()).isTrue();
        assertThat(editor.check().inputs().instruments().get(0).measuredIrf().origin()).isEqualTo("ta-irf.csv");
    }

    @Test
    void fieldPathsAreUnique() {
        List<String> paths = new PlanEditor().fields().stream().map(f -> f.path().toString()).toList();
        assertThat(paths).doesNotHaveDuplicates();
    }

    /** Leaf paths of the document no field concerns; "schema" and the instrument kinds are fixed, not edited. */
    private static List<String> unbound(PlanEditor editor) {
        List<String> leaves = new ArrayList<>();
        collect(editor.document(), "", leaves);
        List<String> out = new ArrayList<>();
        for (String leaf : leaves) {
            if (leaf.equals("schema") || leaf.matches("instruments\\[\\d+]\\.kind")) {
                continue;
            }
            boolean bound = editor.fields().stream().anyMatch(f -> f.path().concerns(leaf));
            if (!bound) {
                out.add(leaf);
            }
        }
        return out;
    }

    private static void collect(JsonNode n, String path, List<String> out) {
        if (n.isObject()) {
            for (Map.Entry<String, JsonNode> e : n.properties()) {
                collect(e.getValue(), path.isEmpty() ? e.getKey() : path + "." + e.getKey(), out);
            }
        } else if (n.isArray() && n.size() > 0) {
            for (int i = 0; i < n.size(); i++) {
                collect(n.get(i), path + "[" + i + "]", out);
            }
        } else {
            out.add(path);
        }
    }
}
