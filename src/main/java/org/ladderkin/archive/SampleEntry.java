package org.ladderkin.archive;

import java.util.Objects;

/**
 * One sample of a series as the archive keeps it. Sizes are stored resolved (diameter, volume, first-exciton energy
 * and wavelength), so a trend needs no material library to place a sample on its axis; NaN means not known.
 *
 * @param name            the sample's name, unique in an archive (a batch label such as "FH-CdSe-0412")
 * @param material        material key of the library ("CdSe")
 * @param sizeM           diameter (edge for cubes), m, or NaN
 * @param volumeM3        dot volume, m³, or NaN
 * @param firstExcitonJ   first-exciton transition energy, J, or NaN
 * @param sizeDispersion  relative standard deviation of the size (0..1), or NaN
 * @param shell           shell material, or "" for core-only dots
 * @param batch           batch or synthesis label, or ""
 * @param madeOn          synthesis or measurement date as written (ISO date preferred), or ""
 * @param notes           free text, or ""
 */
public record SampleEntry(String name, String material, double sizeM, double volumeM3, double firstExcitonJ,
                          double sizeDispersion, String shell, String batch, String madeOn, String notes) {

    public SampleEntry {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(material, "material");
        if (name.isBlank()) {
            throw new IllegalArgumentException("a sample needs a name");
        }
        if (material.isBlank()) {
            throw new IllegalArgumentException("sample '" + name + "' needs a material");
        }
        positiveOrUnknown(sizeM, "size");
        positiveOrUnknown(volumeM3, "volume");
        positiveOrUnknown(firstExcitonJ, "first-exciton energy");
        if (!Double.isNaN(sizeDispersion) && !(sizeDispersion >= 0 && sizeDispersion < 1)) {
            throw new IllegalArgumentException("size dispersion must be in [0, 1), was " + sizeDispersion);
        }
        shell = shell == null ? "" : shell;
        batch = batch == null ? "" : batch;
        madeOn = madeOn == null ? "" : madeOn;
        notes = notes == null ? "" : notes;
    }

    /** A sample known by name, material and size only. */
    public static SampleEntry of(String name, String material, double sizeM, double volumeM3, double firstExcitonJ) {
        return new SampleEntry(name, material, sizeM, volumeM3, firstExcitonJ, Double.NaN, "", "", "", "");
    }

    private static void positiveOrUnknown(double v, String what) {
        if (!Double.isNaN(v) && !(v > 0 && Double.isFinite(v))) {
            throw new IllegalArgumentException(what + " must be > 0 or unknown, was " + v);
        }
    }
}
