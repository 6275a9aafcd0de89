package org.ladderkin.archive;

import java.util.List;

/**
 * Which rows a listing or a trend takes.
 *
 * @param materials          material keys to keep, empty for all
 * @param sampleName         one sample by name, or null for all
 * @param includeSuperseded  also rows marked superseded
 */
public record FitQuery(List<String> materials, String sampleName, boolean includeSuperseded) {

    public FitQuery {
        materials = materials == null ? List.of() : List.copyOf(materials);
    }

    /** Every current (not superseded) row. */
    public static FitQuery all() {
        return new FitQuery(List.of(), null, false);
    }

    boolean accepts(SampleEntry s, boolean superseded) {
        return (materials.isEmpty() || materials.stream().anyMatch(m -> m.equalsIgnoreCase(s.material())))
                && (sampleName == null || sampleName.equals(s.name()))
                && (includeSuperseded || !superseded);
    }
}
