package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.units.Dimension;

/**
 * What the forms say is in the user's words: grammar, the decimal comma, one wording per problem in the field and in
 * the status line, no file syntax and no file keys.
 */
class FormWordsTest {

    @TempDir
    Path dir;

    static final FieldSpec ENERGY = FieldSpec.quantity("Energy", "laser.e", Dimension.ENERGY, "");

    @Test
    void anEnergyTakesItsArticle() {
        assertThat(ENERGY.check("5")).get().asString().contains("expected an energy such as 2.5 µJ").doesNotContain("a energy");
        assertThat(ENERGY.check("5 nZ")).get().asString().contains("expected an energy in ");
        FieldSpec absorbance = FieldSpec.quantity("A", "a", Dimension.ABSORBANCE, "");
        assertThat(absorbance.check("x")).get().asString().contains("expected an absorbance");
        FieldSpec time = FieldSpec.quantity("t", "t", Dimension.TIME, "");
        assertThat(time.check("5")).get().asString().contains("expected a time");
    }

    @Test
    void aDecimalCommaIsReadInOneValueAndExplainedInAList() {
        assertThat(ENERGY.check("1,5 nJ")).isEmpty();
        assertThat(ENERGY.toJson("1,5 nJ").orElseThrow().asText()).as("stored with a point").isEqualTo("1.5 nJ");
        assertThat(ENERGY.toJson("-2,25e3 pJ").orElseThrow().asText()).isEqualTo("-2.25e3 pJ");
        FieldSpec fraction = FieldSpec.fraction("f", "f", false, "");
        assertThat(fraction.toJson("2,5 %").orElseThrow().asText()).isEqualTo("2.5 %");
        assertThat(fraction.check("2,5 %")).isEmpty();

        FieldSpec list = FieldSpec.quantityList("λ", "l", Dimension.LENGTH, "");
        assertThat(list.check("400,5 nm, 515 nm")).contains(
                "'400,5 nm': commas separate the items of this list; write decimals with a point (400.5 nm)");
        assertThat(list.check("400, 515 nm")).as("a list with a unit missing is not a decimal comma")
                .get().asString().startsWith("missing unit in '400'");
        assertThat(list.toJson("400 nm, 515 nm").orElseThrow().toString()).isEqualTo("[\"400 nm\",\"515 nm\"]");
    }

    @Test
    void theFileReaderSaysSoInsteadOfUnknownUnit() {
        assertThat(org.assertj.core.api.Assertions.catchThrowable(
                () -> org.ladderkin.units.Quantity.parse("1,5 nJ", Dimension.ENERGY)))
                .hasMessage("decimal comma in '1,5 nJ': write the decimal with a point (1.5 nJ)");
    }

    @Test
    void aFieldAndTheStatusLineUseOneWording() throws Exception {
        PlanEditor editor = demo();
        FieldSpec low = field(editor, "laser.pulseEnergyRange[0]");
        for (String value : List.of("-1 nJ", "0 nJ")) {
            editor.edit(low, value);
            assertThat(editor.problem(low)).contains("must be > 0, was " + value);
            assertThat(editor.firstFieldProblem()).contains("Lowest pulse energy: must be > 0, was " + value);
            assertThat(editor.check().problem()).as("the plan reader's own wording").isEqualTo("must be > 0, was " + value);
        }
    }

    @Test
    void aRangeOutOfOrderNamesTheOtherFieldNotTheFileSyntax() throws Exception {
        PlanEditor editor = demo();
        FieldSpec low = field(editor, "laser.pulseEnergyRange[0]");
        FieldSpec high = field(editor, "laser.pulseEnergyRange[1]");
        editor.edit(low, "5 µJ");
        assertThat(editor.problem(low)).contains("must be below the highest pulse energy (2 µJ)");
        assertThat(editor.problem(high)).contains("must be above the lowest pulse energy (5 µJ)");
        FieldSpec shortest = field(editor, "instruments[0].delayRange[0]");
        editor.edit(shortest, "5 ns");
        editor.edit(low, "1 nJ");
        assertThat(editor.problem(shortest)).contains("must be below the longest delay (3 ns)");
        for (FieldSpec f : editor.fields()) {
            editor.problem(f).ifPresent(p -> assertThat(p).doesNotContain("[").doesNotContain("write"));
        }
    }

    /** A camelCase file key ("biexcitonLifetime"), not a unit ("eV", "kHz"). */
    static final Pattern CODE_NAME = Pattern.compile("\\b[a-z]{2,}[A-Z][a-z]+[A-Za-z]*\\b");

    @Test
    void labelsTooltipsAndChoicesCarryNoFileKeys() {
        PlanEditor editor = new PlanEditor();
        for (FieldSpec f : editor.fields()) {
            assertThat(f.label()).as(f.path().toString()).doesNotContainPattern(CODE_NAME);
            assertThat(f.help()).as(f.path().toString()).doesNotContain(f.path().toString())
                    .doesNotContainPattern(CODE_NAME);
        }
        FieldSpec goals = field(editor, "goals.measure");
        assertThat(goals.choices()).contains("biexciton-auger");
        assertThat(goals.choiceLabel("biexciton-auger")).isEqualTo("Biexciton Auger lifetime τ2");
        for (String c : goals.choices()) {
            // a key is hyphenated words; the box shows the goal as a phrase
            assertThat(goals.choiceLabel(c)).as(c).isNotEqualTo(c).contains(" ");
            assertThat(goals.help()).doesNotContain(c);
        }
    }

    private PlanEditor demo() throws Exception {
        Path plan = dir.resolve("demo.plan.json");
        Files.copy(PlanEditorTest.DEMO, plan);
        PlanEditor editor = new PlanEditor();
        editor.open(plan);
        return editor;
    }

    static FieldSpec field(PlanEditor editor, String path) {
        return MinimalDiffSaveTest.field(editor, path);
    }
}
