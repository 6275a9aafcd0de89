package org.ladderkin.plan;

import java.util.Objects;

/**
 * A safety caution that applies to a campaign, with the numbers its wording quotes. {@link CautionRules} decides which
 * apply; the report and the desktop planner word and show them. Every caution defers to the institution's laser safety
 * officer, local rules and licensed practice: they are reminders, not a risk assessment.
 */
public sealed interface Caution {

    /** Pump-probe sources are Class 4 lasers: shown for every campaign. */
    record Laser() implements Caution {
    }

    /** The strongest pulse of the series reaches a high peak fluence at the beam centre (J/m²). */
    record HighFluence(double peakFluenceJPerM2) implements Caution {
        public HighFluence {
            if (!(peakFluenceJPerM2 >= 0) || Double.isInfinite(peakFluenceJPerM2)) {
                throw new IllegalArgumentException("peak fluence must be finite and >= 0 J/m², got " + peakFluenceJPerM2);
            }
        }
    }

    /**
     * The pump heats the sample strongly or close to its solvent's boiling point.
     *
     * @param riseK         predicted steady-state rise of the excited volume (K)
     * @param sampleK       sample temperature before the pump (K)
     * @param boilingPointK the solvent's boiling point (K; infinite for films or when unknown)
     */
    record HotSample(double riseK, double sampleK, double boilingPointK) implements Caution {
        public HotSample {
            if (!(sampleK > 0) || Double.isInfinite(sampleK)) {
                throw new IllegalArgumentException("sample temperature must be finite and > 0 K, got " + sampleK);
            }
            if (!(boilingPointK > 0)) {
                throw new IllegalArgumentException("boiling point must be > 0 K (infinite when none), got " + boilingPointK);
            }
        }
    }

    /**
     * The matrix is a flammable organic solvent that the pump heats.
     *
     * @param matrix        the solvent's name as the plan gives it
     * @param riseK         predicted steady-state rise (K; NaN when unknown)
     * @param boilingPointK the solvent's boiling point (K)
     */
    record FlammableSolvent(String matrix, double riseK, double boilingPointK) implements Caution {
        public FlammableSolvent {
            Objects.requireNonNull(matrix, "matrix");
            if (matrix.isBlank()) {
                throw new IllegalArgumentException("the flammable solvent needs a name");
            }
        }
    }

    /** The material contains cadmium or lead. */
    record HeavyMetals() implements Caution {
    }
}
