package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.nio.file.Files;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.material.AbsorptionLaw;
import org.ladderkin.material.Material;

/** A σ = C·a³ coefficient is an inverse length (area per length³), and the CdSe file says so. */
class LeatherdaleCoefficientUnitTest {

    private static String cdse() throws Exception {
        return Files.readString(MaterialLibrary.home().resolve("models/materials/CdSe.json"));
    }

    @Test
    void theCdseFileLabelsTheCoefficientAsAnInverseLength() throws Exception {
        String text = cdse();
        assertThat(text).as("CdSe.json's high-energy law").contains("\"crossSection\": \"5.501e5 cm⁻¹\"")
                .doesNotContain("\"crossSection\": \"5.501e5 cm²\"");
        AbsorptionLaw law = MaterialCodec.read(JsonTree.parse(text, "CdSe.json")).highEnergyAbsorption().orElseThrow();
        // 5.501e5 cm⁻¹ times (1 cm)³ is 5.501e5 cm² = 55.01 m², the cross-section of a dot of radius 1 cm in the law
        assertThat(law.coefficientM2()).as("σ at a = 1 cm (m²)").isCloseTo(55.01, org.assertj.core.data.Percentage.withPercentage(1e-10));
        assertThat(law.lengthUnitM()).isEqualTo(0.01);
        double a = 2e-9;
        assertThat(law.crossSectionM2At(2 * a) * 1e4).as("σ(350 nm) of a 2 nm-radius dot (cm²): 5.501e5 cm⁻¹ · (2e-7 cm)³")
                .isCloseTo(5.501e5 * Math.pow(2e-7, 3), org.assertj.core.data.Percentage.withPercentage(1e-10));
    }

    @Test
    void theSameLawInNanometresGivesTheSameCrossSection() throws Exception {
        // 5.501e5 cm⁻¹ = 5.501e-2 nm⁻¹: with the radius in nm the same dot has the same σ
        String nm = cdse().replace("\"crossSection\": \"5.501e5 cm⁻¹\"", "\"crossSection\": \"5.501e-2 nm^-1\"")
                .replaceFirst("(\"highEnergyAbsorption\": \\{[^}]*\"lengthUnit\": )\"cm\"", "$1\"nm\"");
        Material m = MaterialCodec.read(JsonTree.parse(nm, "CdSe.json"));
        Material cm = MaterialCodec.read(JsonTree.parse(cdse(), "CdSe.json"));
        assertThat(m.highEnergyAbsorption().orElseThrow().lengthUnitM()).isEqualTo(1e-9);
        assertThat(m.highEnergyAbsorption().orElseThrow().crossSectionM2At(4e-9))
                .isCloseTo(cm.highEnergyAbsorption().orElseThrow().crossSectionM2At(4e-9),
                        org.assertj.core.data.Percentage.withPercentage(1e-9));
    }

    @Test
    void anInverseLengthNeedsTheCubeLaw() throws Exception {
        String squared = cdse().replaceFirst("(\"highEnergyAbsorption\": \\{[^}]*\"exponent\": )3", "$12");
        assertThat(squared).isNotEqualTo(cdse());
        assertThatThrownBy(() -> MaterialCodec.read(JsonTree.parse(squared, "CdSe.json")))
                .satisfies(input(InputProblem.WRONG_UNIT, "CdSe.json:62:21", "highEnergyAbsorption.crossSection"))
                .hasMessageContaining("needs \"exponent\": 3");
    }
}
