package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.units.Dimension;

class FieldSpecTest {

    @Test
    void quantityFieldsCheckTheDimension() {
        FieldSpec f = FieldSpec.quantity("Energy", "laser.e", Dimension.ENERGY, "");
        assertThat(f.check("50 nJ")).isEmpty();
        assertThat(f.check("50 uJ")).isEmpty();
        assertThat(f.check("50 ns")).get().asString().contains("is a time");
        assertThat(f.check("-1 nJ")).get().asString().isEqualTo("must be > 0, was -1 nJ");
        assertThat(f.check("0 nJ")).get().asString().as("the plan reader's words and limit").isEqualTo("must be > 0, was 0 nJ");
        assertThat(f.check("")).get().asString().startsWith("required");
        assertThat(f.asOptional().check("  ")).isEmpty();
    }

    @Test
    void listsChoicesAndFractions() {
        FieldSpec wl = FieldSpec.quantityList("λ", "laser.w", Dimension.LENGTH, "");
        assertThat(wl.check("400 nm, 515 nm")).isEmpty();
        assertThat(wl.check("400 nm, 2 eV")).isPresent();
        assertThat(wl.toJson("400 nm; 515 nm").orElseThrow().toString()).isEqualTo("[\"400 nm\",\"515 nm\"]");
        FieldSpec div = FieldSpec.integerList("÷", "laser.d", true, "");
        assertThat(div.toJson("1, 2, 5").orElseThrow().toString()).isEqualTo("[1,2,5]");
        assertThat(div.toJson("1, x").orElseThrow().toString()).as("kept as typed").isEqualTo("[1,\"x\"]");
        assertThat(div.check("1, 0")).get().asString().contains(">= 1");
        assertThat(div.toJson(" ")).isEmpty();
        FieldSpec refresh = FieldSpec.choice("Refresh", "s.r", List.of("static", "flowing"), "");
        assertThat(refresh.check("flowing")).isEmpty();
        assertThat(refresh.check("stirred")).get().asString().contains("not one of");
        FieldSpec goals = FieldSpec.keySet("Goals", "g", List.of("a", "b"), "");
        assertThat(goals.check("a, b")).isEmpty();
        assertThat(goals.check("a, a")).get().asString().contains("twice");
        FieldSpec frac = FieldSpec.fraction("f", "f", false, "");
        assertThat(frac.check("6 %")).isEmpty();
        assertThat(frac.check("120 %")).isPresent();
    }

    @Test
    void readShowsTheDocumentTextAndJoinsLists() {
        ObjectNode doc = ResolvedJson.object();
        FieldSpec wl = FieldSpec.quantityList("λ", "laser.w", Dimension.LENGTH, "");
        assertThat(wl.read(doc)).isEmpty();
        wl.path().set(doc, wl.toJson("400 nm, 515 nm").orElseThrow());
        assertThat(wl.read(doc)).isEqualTo("400 nm, 515 nm");
    }
}
