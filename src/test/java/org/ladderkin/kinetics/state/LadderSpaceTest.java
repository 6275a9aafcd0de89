package org.ladderkin.kinetics.state;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.GeneratorBuilder;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.PulseMatrix;

class LadderSpaceTest {

    @Test
    void indexRoundTripsAndCountsStates() {
        LadderSpace s = new LadderSpace(EnumSet.of(Charge.NEGATIVE, Charge.POSITIVE), 5, true);
        assertThat(s.size()).isEqualTo(3 * (6 * 7 / 2));
        for (int i = 0; i < s.size(); i++) {
            assertThat(s.index(s.charge(i), s.excitons(i), s.hot(i))).isEqualTo(i);
        }
        assertThat(s.index(Charge.NEUTRAL, 0, 0)).isZero();
        assertThat(s.index(Charge.NEUTRAL, 2, 3)).isEqualTo(-1);
    }

    @Test
    void decayRemovesColdExcitonsFirst() {
        LadderSpace s = new LadderSpace(EnumSet.of(Charge.NEUTRAL), 4, true);
        int twoHotOneCold = s.index(Charge.NEUTRAL, 3, 2);
        assertThat(s.hot(s.afterDecay(twoHotOneCold))).isEqualTo(2);
        int allHot = s.index(Charge.NEUTRAL, 2, 2);
        assertThat(s.hot(s.afterDecay(allHot))).isEqualTo(1);
    }

    @Test
    void coolingGeneratorIsUpperTriangularAndPulsesMakeHotExcitons() {
        LadderSpace s = new LadderSpace(EnumSet.of(Charge.NEUTRAL), 6, true);
        double[][] q = GeneratorBuilder.build(s, List.of(new RadiativeDecay(1e8, RadiativeScaling.LINEAR, 2), new Cooling(1e12)));
        for (int i = 0; i < q.length; i++) {
            for (int j = 0; j < i; j++) {
                assertThat(q[i][j]).isZero();
            }
        }
        double[][] e = PulseMatrix.of(s, new PulseExcitation.Poisson(1));
        int from = s.index(Charge.NEUTRAL, 1, 0);
        assertThat(e[s.index(Charge.NEUTRAL, 3, 2)][from]).isGreaterThan(0);
        assertThat(e[s.index(Charge.NEUTRAL, 3, 0)][from]).isZero();
        // overflow beyond Nmax is lumped into Nmax: every column sums to 1
        for (int j = 0; j < e.length; j++) {
            double sum = 0;
            for (double[] row : e) {
                sum += row[j];
            }
            assertThat(sum).isCloseTo(1.0, org.assertj.core.data.Offset.offset(1e-14));
        }
    }
}
