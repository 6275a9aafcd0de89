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
        // the range grows with empty text (the form shows an empty field); a list on the way is padded by Jackson
        assertThat(doc.toString()).isEqualTo("{\"instruments\":[null,{\"delayRange\":[\"\",\"3 ns\"]}]}");
        JsonPath.of("title").set(doc, TextNode.valueOf("t"));
        JsonPath.of("laser.pulseEnergyRange[0]").set(doc, TextNode.valueOf("1 nJ"));
        assertThat(JsonPath.of("laser.pulseEnergyRange").get(doc).toString()).isEqualTo("[\"1 nJ\"]");
        assertThat(doc.get("title").asText()).isEqualTo("t");
        assertThat(JsonPath.of("instruments[1].delayRange[1]").get(doc).asText()).isEqualTo("3 ns");
        assertThat(JsonPath.of("instruments[2].kind").get(doc)).isNull();
        assertThat(JsonPath.of("instruments[0].kind").get(doc)).isNull();
    }

    @Test
    void aScalarInTheWayIsReplacedByTheContainerThePathNeeds() {
        ObjectNode doc = ResolvedJson.object();
        doc.put("sample", "text where an object belongs");
        JsonPath.of("sample.absorbance.value").set(doc, TextNode.valueOf("0.1 OD"));
        assertThat(doc.toString()).isEqualTo("{\"sample\":{\"absorbance\":{\"value\":\"0.1 OD\"}}}");
        assertThat(JsonPath.of("sample.absorbance.value").pointer().toString()).isEqualTo("/sample/absorbance/value");
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
