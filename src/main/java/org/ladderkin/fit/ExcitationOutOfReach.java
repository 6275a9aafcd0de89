package org.ladderkin.fit;

import java.util.Locale;

/**
 * The fit asked the model for an excitation beyond what it evaluates. An optimiser step can wander to σ·j ≈ 10⁸, where
 * the Poisson ladder would need hundreds of millions of states; the step is refused instead of exhausting the heap.
 */
public final class ExcitationOutOfReach extends RuntimeException {

    private final double occupancy;

    public ExcitationOutOfReach(double occupancy, double limit) {
        super(String.format(Locale.ROOT, "⟨N⟩ = %.3g on the pump axis is beyond the %.0f the fit's model evaluates", occupancy, limit));
        this.occupancy = occupancy;
    }

    /** The on-axis ⟨N⟩ that was asked for. */
    public double occupancy() {
        return occupancy;
    }
}
