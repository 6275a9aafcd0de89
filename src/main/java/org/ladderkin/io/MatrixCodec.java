package org.ladderkin.io;

import java.nio.file.Path;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.material.Sourced;
import org.ladderkin.sample.Matrix;
import org.ladderkin.units.Dimension;

/** Reads host (solvent or film) descriptions, schema {@code ladderkin.matrix/1}, and inline matrix objects in samples. */
public final class MatrixCodec {

    /** Schema name of matrix files. */
    public static final String SCHEMA = "ladderkin.matrix";
    /** Newest version read. */
    public static final int VERSION = 1;

    private MatrixCodec() {
    }

    /** Reads one matrix file. */
    public static Matrix read(Path file) {
        Node root = JsonTree.read(file, file.toString());
        root.schema(SCHEMA, VERSION);
        return body(root);
    }

    /** Reads the fields of a matrix object (a file without its schema field, or an inline object). */
    static Matrix body(Node n) {
        String key = n.field("key").string();
        String name = n.field("name").string();
        Matrix.Kind kind = n.field("kind").choice("solvent", "film").equals("solvent") ? Matrix.Kind.SOLVENT : Matrix.Kind.FILM;
        Sourced density = MaterialCodec.sourced(n.field("density"), Dimension.DENSITY, true);
        Sourced heat = MaterialCodec.sourced(n.field("specificHeat"), Dimension.SPECIFIC_HEAT, true);
        Sourced k = MaterialCodec.sourced(n.field("thermalConductivity"), Dimension.THERMAL_CONDUCTIVITY, true);
        Sourced bp = n.optional("boilingPoint").map(b -> MaterialCodec.sourced(b, Dimension.TEMPERATURE, true))
                .orElse(Sourced.unknown("not applicable"));
        n.finish();
        try {
            return new Matrix(key, name, kind, density, heat, k, bp);
        } catch (IllegalArgumentException e) {
            throw n.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
    }
}
