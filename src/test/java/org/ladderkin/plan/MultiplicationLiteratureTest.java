package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.ladderkin.excite.QuantumYieldLaw;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.material.Material;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.SampleSpec;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The planner's default multiexciton assumptions (multiplication, radiative N-scaling) against published values. */
class MultiplicationLiteratureTest {

    @Test
    @CheckedAgainst(source = "Schaller & Klimov, Phys. Rev. Lett. 92, 186601 (2004), abstract: PbSe nanocrystals pumped with "
            + "photons of more than 3 times the band gap form two or more excitons per absorbed photon, with up to 100 % "
            + "efficiency, i.e. a quantum yield above 1 and up to 2; checked at 3.5 and 4 times E₁S of a 5 nm PbSe dot",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void pbseDefaultYieldAboveThreeGapsLiesInThePublishedRange() {
        Material pbse = MaterialLibrary.fromHome().material("PbSe");
        double e1sJ = pbse.sizing().orElseThrow().firstExcitonEnergyJ(5e-9);
        QuantumYieldLaw law = MultiplicationForecast.defaultLaw(e1sJ);
        for (double times : new double[] {3.5, 4.0}) {
            double yield = 1 + law.eta(times * e1sJ);
            // a yield of exactly 1 would mean no multiplication, which the paper reports above 3 E_g
            assertThat(yield).isGreaterThan(1.0);
            Reference.check("PbSe quantum yield at ħω = " + times + "·E₁S (published: > 1, ≤ 2)", yield, 1.5, 0.5);
        }
    }

    @Test
    @CheckedAgainst(source = "Nair & Bawendi, arXiv:0708.3866 (2007), abstract (CdSe and CdTe nanocrystals): biexciton "
            + "radiative rate k_BX > 2·k_X; the upper end 4 of the checked range is the all-pairs count N², derived",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void defaultBiexcitonRadiativeRateExceedsTwiceTheExcitonRate() {
        Material cdse = MaterialLibrary.fromHome().material("CdSe");
        Sample s = Sample.resolve(new SampleSpec("t", cdse, new SampleSpec.ByFirstPeak(580e-9), 0.05,
                new SampleSpec.Absorbance(0.1, Double.NaN), 1e-3, Optional.empty(), Refresh.stirred(), Optional.empty(),
                Optional.empty()));
        ModelAssumptions model = ModelAssumptions.forSample(s, ModelAssumptions.Overrides.NONE);
        double ratio = model.radiativeScaling().factor(2) / model.radiativeScaling().factor(1);
        assertThat(ratio).isGreaterThan(2.0);
        Reference.check("k_XX,rad / k_X,rad of the planner's default scaling, CdSe", ratio, 3, 1);
    }
}
