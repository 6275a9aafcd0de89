package org.ladderkin.material;

/** Shape of a dot, which fixes what its "size" means and how its volume follows from it. */
public enum Shape {
    /** Size is the diameter; V = π·d³/6. */
    SPHERE,
    /** Size is the edge length; V = a³ (lead-halide perovskite nanocubes). */
    CUBE;

    /** Volume (m³) of a dot of size {@code sizeM} (m). */
    public double volumeM3(double sizeM) {
        return this == SPHERE ? Math.PI * sizeM * sizeM * sizeM / 6 : sizeM * sizeM * sizeM;
    }
}
