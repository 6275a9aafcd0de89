package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.ResolvedJson;

class JsonPathTest {

    @Test
    void setCreatesWhatIsMissingAndGetReadsIt() {
        ObjectNode doc = ResolvedJson.object();
        JsonPath.of("instruments[1].delayRange[1]").set(doc, TextNode.valueOf("3 ns"));
        assertThat(doc.toString()).isEqualTo("{\"instruments\":[\"\",{\"delayRange\":[\"\",\"3 ns\"]}]}");
        assertThat(JsonPath.of("instruments[1].delayRange[1]").get(doc).asText()).isEqualTo("3 ns");
        assertThat(JsonPath.of("instruments[2].kind").get(doc)).isNull();
        assertThat(JsonPath.of("instruments[0].kind").get(doc)).isNull();
    }

    @Test
    void removeDropsAnObjectField() {
        ObjectNode doc = ResolvedJson.object();
        JsonPath.of("sample.diameter").set(doc, TextNode.valueOf("4 nm"));
        JsonPath.of("sample.diameter").remove(doc);
        JsonPath.of("sample.absent.deeper").remove(doc);
        assertThat(doc.toString()).isEqualTo("{\"sample\":{}}");
    }

    @Test
    void aProblemConcernsTheFieldItsItemsAndItsListButNotSiblingsOrParents() {
        JsonPath list = JsonPath.of("laser.pumpWavelengths");
        assertThat(list.concerns("laser.pumpWavelengths")).isTrue();
        assertThat(list.concerns("laser.pumpWavelengths[2]")).isTrue();
        assertThat(list.concerns("laser.pumpWavelengthsX")).isFalse();
        assertThat(list.concerns("laser")).isFalse();
        assertThat(list.concerns(null)).isFalse();
        JsonPath item = JsonPath.of("laser.pulseEnergyRange[0]");
        assertThat(item.concerns("laser.pulseEnergyRange")).isTrue();
        assertThat(item.concerns("laser.pulseEnergyRange[1]")).isFalse();
    }
}
