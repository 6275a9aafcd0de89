package org.ladderkin.gui.model;

import java.util.HashSet;
import java.util.Objects;
import java.util.Set;

/**
 * How the next fit runs, as the user chose it. Freed parameters are named by their key ("tau-auger2", as the
 * {@code fit} command's {@code --free} takes them) rather than by the fit package's own type, so that only
 * {@link FitJobs} changes when the ladder fit's parameters do.
 *
 * @param free               keys of the shared parameters the fit varies
 * @param pulseTrain         the pulse-train steady state at the plan's chosen rate, else one pulse on fresh dots
 * @param instrumentResponse convolve with the plan's transient-absorption instrument response
 */
public record FitOptions(Set<String> free, boolean pulseTrain, boolean instrumentResponse) {

    /** A parameter the fit view offers to free. */
    public record FreeParameter(String key, String label) {
        public FreeParameter {
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(label, "label");
        }
    }

    public FitOptions {
        free = Set.copyOf(free);
    }

    /** What a new session starts with. */
    static FitOptions initial() {
        return new FitOptions(FitJobs.DEFAULT_FREE, false, false);
    }

    FitOptions withFree(String key, boolean isFree) {
        Set<String> f = new HashSet<>(free);
        if (isFree) {
            f.add(key);
        } else {
            f.remove(key);
        }
        return new FitOptions(f, pulseTrain, instrumentResponse);
    }

    FitOptions withPulseTrain(boolean on) {
        return new FitOptions(free, on, instrumentResponse);
    }

    FitOptions withInstrumentResponse(boolean on) {
        return new FitOptions(free, pulseTrain, on);
    }

    /** The same model with every shared parameter held: the plan's own prediction. */
    FitOptions allHeld() {
        return new FitOptions(Set.of(), pulseTrain, instrumentResponse);
    }
}
