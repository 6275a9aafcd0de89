package org.ladderkin.kinetics;

import java.util.EnumSet;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The Auger rate of charged multiexcitons under the carrier-triplet law, against an explicit count of triplets. */
class ChargedAugerCountingTest {

    private static final double K_MINUS = 1 / 180e-12;
    private static final double K_PLUS = 1 / 420e-12;

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 7})
    @CheckedAgainst(source = "derived: a dot with e electrons and h holes has C(e,2)·h electron-electron-hole triplets"
            + " (each at the negative-trion rate) and C(h,2)·e hole-hole-electron triplets (each at the positive-trion"
            + " rate); X⁻ with N excitons has e = N+1, h = N; X⁺ has e = N, h = N+1; counted here by enumerating the"
            + " carrier sets", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void chargedRatesCountCarrierTriplets(int n) {
        AugerRecombination law = new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, K_MINUS, K_PLUS,
                AugerIonisation.NONE);
        LadderSpace space = new LadderSpace(EnumSet.allOf(Charge.class), 8, false);
        Reference.checkRelative("k(X⁻, N = " + n + ")", law.ratePerS(space, space.index(Charge.NEGATIVE, n, 0)),
                enumerated(n + 1, n), 1e-14);
        Reference.checkRelative("k(X⁺, N = " + n + ")", law.ratePerS(space, space.index(Charge.POSITIVE, n, 0)),
                enumerated(n, n + 1), 1e-14);
    }

    @ParameterizedTest
    @ValueSource(ints = {2, 3})
    @CheckedAgainst(source = "derived: with equal trion rates k, X⁻ with N = 2 has 3·2 + 3·1 = 9 triplets and with N = 3"
            + " 6·3 + 4·3 = 30", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void equalTrionRatesGiveNineAndThirtyTimesTheTrionRate(int n) {
        double k = 1 / 200e-12;
        AugerRecombination law = new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, k, k, AugerIonisation.NONE);
        LadderSpace space = new LadderSpace(EnumSet.of(Charge.NEGATIVE), 4, false);
        Reference.checkRelative("k(X⁻, N = " + n + ") / k_trion", law.ratePerS(space, space.index(Charge.NEGATIVE, n, 0)) / k,
                n == 2 ? 9 : 30, 1e-14);
    }

    /** Every set of three carriers with two of one kind and one of the other, counted one by one. */
    private static double enumerated(int electrons, int holes) {
        double rate = 0;
        for (int a = 0; a < electrons; a++) {
            for (int b = a + 1; b < electrons; b++) {
                rate += holes * K_MINUS;
            }
        }
        for (int a = 0; a < holes; a++) {
            for (int b = a + 1; b < holes; b++) {
                rate += electrons * K_PLUS;
            }
        }
        return rate;
    }
}
