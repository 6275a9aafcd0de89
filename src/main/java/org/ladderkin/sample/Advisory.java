package org.ladderkin.sample;

import java.util.Objects;

/**
 * Something the user should know about an input or a result that is allowed but questionable
 * (a probe larger than the pump, an optically thick sample, an approximate cross-section). Shown beside the numbers,
 * never silently dropped.
 *
 * @param kind    what kind of concern, for tests and for machine-readable output
 * @param message one sentence with the values and what to do
 */
public record Advisory(Kind kind, String message) {

    /** Kinds of concern. */
    public enum Kind {
        /** The probe spot is larger than the pump spot: it sees unexcited dots and the average falls. */
        PROBE_LARGER_THAN_PUMP,
        /** Optical density ≥ 3: absorbance readings are unreliable and the pump is strongly attenuated in depth. */
        OPTICALLY_THICK,
        /** The cross-section at the pump wavelength was taken from another wavelength without a spectrum. */
        CROSS_SECTION_APPROXIMATE,
        /** The pump is at or below the first exciton: resonant pumping saturates and is not Poissonian. */
        RESONANT_OR_BELOW_GAP_PUMP,
        /** A library value used here is recalled or unsourced. */
        UNCONFIRMED_VALUE,
        /** The size and the first-exciton peak given disagree with the material's sizing curve. */
        SIZE_PEAK_DISAGREE,
        /** The shell's band alignment given contradicts the library's band edges. */
        SHELL_ALIGNMENT
    }

    public Advisory {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(message, "message");
    }

    /** Key used in JSON output, e.g. "probe-larger-than-pump". */
    public String key() {
        return kind.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
