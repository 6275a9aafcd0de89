package org.ladderkin.validation;

import org.junit.jupiter.api.Test;
import org.ladderkin.excite.QuantumYieldLaw;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.material.Material;
import org.ladderkin.plan.MultiplicationForecast;

/** The default multiplication law of PbSe below its onset; above three gaps it is checked in MultiplicationLiteratureTest. */
class MultiplicationOnsetTest {

    @Test
    @CheckedAgainst(source = "derived: energy conservation; a photon below 2·E₁S cannot leave two band-edge excitons, so "
            + "the extra-exciton yield η is exactly 0 there (checked at 1.5 and 1.9 E₁S of a 5 nm PbSe dot)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void pbseDefaultLawGivesNoSecondExcitonBelowTwoGaps() {
        Material pbse = MaterialLibrary.fromHome().material("PbSe");
        double e1sJ = pbse.sizing().orElseThrow().firstExcitonEnergyJ(5e-9);
        QuantumYieldLaw law = MultiplicationForecast.defaultLaw(e1sJ);
        for (double times : new double[] {1.5, 1.9}) {
            Reference.check("PbSe η at ħω = " + times + "·E₁S", law.eta(times * e1sJ), 0, 0);
        }
    }
}
