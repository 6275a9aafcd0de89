package org.ladderkin.kinetics.state;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * The states of one dot and their index: charge c, exciton number N = 0..Nmax and, when cooling is resolved, the
 * number of hot excitons h ≤ N.
 *
 * <p>States are ordered lexicographically by (N, h, charged), neutral before charged. Every process that acts
 * between pulses lowers that key (decay lowers N, cooling lowers h, neutralisation clears the charge, refresh goes to
 * the neutral ground state, index 0), so in this order the generator is upper triangular: Q[to][from] ≠ 0 only for
 * to &lt; from. The propagators rely on that.
 */
public final class LadderSpace {

    private final List<Charge> charges;
    private final int nMax;
    private final boolean hotResolved;
    private final int[] blockStart;
    private final int[] chargeSlot = new int[Charge.values().length];
    private final Charge[] chargeOf;
    private final int[] nOf;
    private final int[] hotOf;

    /**
     * @param charges charges that exist (neutral is always included)
     * @param nMax highest exciton number kept
     * @param hotResolved whether hot excitons are counted separately (intraband cooling on)
     */
    public LadderSpace(Set<Charge> charges, int nMax, boolean hotResolved) {
        if (nMax < 1 || nMax > 400) {
            throw new IllegalArgumentException("Nmax must be between 1 and 400, was " + nMax);
        }
        EnumSet<Charge> all = EnumSet.of(Charge.NEUTRAL);
        all.addAll(charges);
        this.charges = List.copyOf(all);
        this.nMax = nMax;
        this.hotResolved = hotResolved;
        java.util.Arrays.fill(chargeSlot, -1);
        for (int i = 0; i < this.charges.size(); i++) {
            chargeSlot[this.charges.get(i).ordinal()] = i;
        }
        int nc = this.charges.size();
        blockStart = new int[nMax + 2];
        for (int n = 0; n <= nMax; n++) {
            blockStart[n + 1] = blockStart[n] + (hotResolved ? n + 1 : 1) * nc;
        }
        int size = blockStart[nMax + 1];
        chargeOf = new Charge[size];
        nOf = new int[size];
        hotOf = new int[size];
        for (int n = 0; n <= nMax; n++) {
            for (int h = 0; h <= (hotResolved ? n : 0); h++) {
                for (Charge c : this.charges) {
                    int i = index(c, n, h);
                    chargeOf[i] = c;
                    nOf[i] = n;
                    hotOf[i] = h;
                }
            }
        }
    }

    /** A space with neutral dots only and no hot excitons. */
    public static LadderSpace neutral(int nMax) {
        return new LadderSpace(EnumSet.of(Charge.NEUTRAL), nMax, false);
    }

    /** Number of states. */
    public int size() {
        return chargeOf.length;
    }

    public int nMax() {
        return nMax;
    }

    public boolean hotResolved() {
        return hotResolved;
    }

    /** The charges present, neutral first. */
    public List<Charge> charges() {
        return charges;
    }

    public boolean has(Charge c) {
        return chargeSlot[c.ordinal()] >= 0;
    }

    /** Index of state (c, n, hot), or -1 if it does not exist. */
    public int index(Charge c, int n, int hot) {
        if (n < 0 || n > nMax || hot < 0 || hot > n || (!hotResolved && hot != 0) || chargeSlot[c.ordinal()] < 0) {
            return -1;
        }
        return blockStart[n] + hot * charges.size() + chargeSlot[c.ordinal()];
    }

    /** Index of the neutral ground state (always 0). */
    public int ground() {
        return 0;
    }

    public Charge charge(int state) {
        return chargeOf[state];
    }

    /** Total exciton number N of a state. */
    public int excitons(int state) {
        return nOf[state];
    }

    /** Hot excitons h of a state (0 when cooling is not resolved). */
    public int hot(int state) {
        return hotOf[state];
    }

    /** Cold (band-edge) excitons N − h. */
    public int cold(int state) {
        return nOf[state] - hotOf[state];
    }

    /**
     * The state left when one exciton disappears from {@code state} by recombination. Assumption: a decay removes a
     * cold exciton while one exists and a hot one only when all are hot; the charge is unchanged.
     */
    public int afterDecay(int state) {
        int n = nOf[state];
        int h = hotOf[state];
        return index(chargeOf[state], n - 1, n - 1 >= h ? h : h - 1);
    }

    /** Human-readable name of a state, used in error messages, e.g. "N=3 (1 hot), negative". */
    public String describe(int state) {
        StringBuilder sb = new StringBuilder("N=").append(nOf[state]);
        if (hotResolved) {
            sb.append(" (").append(hotOf[state]).append(" hot)");
        }
        sb.append(", ").append(chargeOf[state].name().toLowerCase(java.util.Locale.ROOT));
        return sb.toString();
    }

    @Override
    public String toString() {
        List<String> cs = new ArrayList<>();
        charges.forEach(c -> cs.add(c.name().toLowerCase(java.util.Locale.ROOT)));
        return "LadderSpace[Nmax=" + nMax + ", charges=" + cs + ", hot=" + hotResolved + ", states=" + size() + "]";
    }
}
