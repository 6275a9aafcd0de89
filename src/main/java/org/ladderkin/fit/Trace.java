package org.ladderkin.fit;

import java.util.Arrays;
import java.util.Objects;

/**
 * One measured kinetic trace: signal against pump–probe delay. Delays increase strictly; a missing signal value is
 * NaN (the importer usually drops such points and counts them in {@code droppedMissing}); uncertainties, when given,
 * are one standard deviation per point and must be &gt; 0 where the signal is present.
 *
 * @param delaysS        delays in s, finite and strictly increasing
 * @param signal         signal in the file's own units; finite or NaN (missing), never infinite
 * @param sigma          per-point standard uncertainty in signal units, or null when unknown
 * @param metadata       label, excitation and photon energy
 * @param droppedMissing how many rows with a missing value the importer dropped from this trace (≥ 0)
 */
public record Trace(double[] delaysS, double[] signal, double[] sigma, TraceMetadata metadata, int droppedMissing) {

    public Trace {
        Objects.requireNonNull(delaysS, "delaysS");
        Objects.requireNonNull(signal, "signal");
        Objects.requireNonNull(metadata, "metadata");
        String name = "trace '" + metadata.label() + "'";
        if (delaysS.length == 0) {
            throw new IllegalArgumentException(name + " has no points");
        }
        if (signal.length != delaysS.length) {
            throw new IllegalArgumentException(name + ": " + signal.length + " signal values for " + delaysS.length + " delays");
        }
        if (droppedMissing < 0) {
            throw new IllegalArgumentException(name + ": dropped count must be >= 0, was " + droppedMissing);
        }
        delaysS = delaysS.clone();
        signal = signal.clone();
        for (int i = 0; i < delaysS.length; i++) {
            if (!Double.isFinite(delaysS[i])) {
                throw new IllegalArgumentException(name + ": delay " + i + " is " + delaysS[i] + " s (must be finite)");
            }
            if (i > 0 && !(delaysS[i] > delaysS[i - 1])) {
                throw new IllegalArgumentException(name + ": delays must increase strictly, but delay " + i + " = "
                        + delaysS[i] + " s follows " + delaysS[i - 1] + " s");
            }
            if (Double.isInfinite(signal[i])) {
                throw new IllegalArgumentException(name + ": signal at delay " + delaysS[i] + " s is infinite");
            }
        }
        if (sigma != null) {
            if (sigma.length != delaysS.length) {
                throw new IllegalArgumentException(name + ": " + sigma.length + " uncertainties for " + delaysS.length + " delays");
            }
            sigma = sigma.clone();
            for (int i = 0; i < sigma.length; i++) {
                if (!Double.isNaN(signal[i]) && !(sigma[i] > 0 && Double.isFinite(sigma[i]))) {
                    throw new IllegalArgumentException(name + ": uncertainty at delay " + delaysS[i] + " s must be finite and > 0, was " + sigma[i]);
                }
            }
        }
    }

    /** A trace without uncertainties and nothing dropped. */
    public static Trace of(String label, double[] delaysS, double[] signal) {
        return new Trace(delaysS, signal, null, TraceMetadata.labelled(label), 0);
    }

    @Override
    public double[] delaysS() {
        return delaysS.clone();
    }

    @Override
    public double[] signal() {
        return signal.clone();
    }

    @Override
    public double[] sigma() {
        return sigma == null ? null : sigma.clone();
    }

    /** Number of points, missing ones included. */
    public int size() {
        return delaysS.length;
    }

    /** Whether per-point uncertainties were given. */
    public boolean hasUncertainty() {
        return sigma != null;
    }

    /** The label, for messages. */
    public String label() {
        return metadata.label();
    }

    /** Number of points whose signal is present (not NaN). */
    public int presentCount() {
        int n = 0;
        for (double v : signal) {
            if (!Double.isNaN(v)) {
                n++;
            }
        }
        return n;
    }

    /** A copy with other metadata. */
    public Trace withMetadata(TraceMetadata newMetadata) {
        return new Trace(delaysS, signal, sigma, newMetadata, droppedMissing);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Trace t && Arrays.equals(delaysS, t.delaysS) && Arrays.equals(signal, t.signal)
                && Arrays.equals(sigma, t.sigma) && metadata.equals(t.metadata) && droppedMissing == t.droppedMissing;
    }

    @Override
    public int hashCode() {
        return Objects.hash(Arrays.hashCode(delaysS), Arrays.hashCode(signal), Arrays.hashCode(sigma), metadata, droppedMissing);
    }

    @Override
    public String toString() {
        return "Trace[" + metadata.label() + ", " + delaysS.length + " points]";
    }
}
