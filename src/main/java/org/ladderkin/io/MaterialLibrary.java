package org.ladderkin.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.ladderkin.material.Material;
import org.ladderkin.sample.Matrix;

/**
 * The materials in {@code models/materials/*.json} and the hosts in {@code models/matrices/*.json} under the ladderkin
 * home (system property {@code ladderkin.home}, set by the launcher and by the test runner; the working directory
 * otherwise). Each file's key must equal its file name, so a user can find the file from the key.
 */
public final class MaterialLibrary {

    private static volatile MaterialLibrary fromHome;

    private final Map<String, Material> materials;
    private final Map<String, Matrix> matrices;

    private MaterialLibrary(Map<String, Material> materials, Map<String, Matrix> matrices) {
        this.materials = Collections.unmodifiableMap(materials);
        this.matrices = Collections.unmodifiableMap(matrices);
    }

    /** The library under the ladderkin home, read once. */
    public static MaterialLibrary fromHome() {
        MaterialLibrary lib = fromHome;
        if (lib == null) {
            synchronized (MaterialLibrary.class) {
                lib = fromHome;
                if (lib == null) {
                    lib = load(home());
                    fromHome = lib;
                }
            }
        }
        return lib;
    }

    /** The ladderkin home directory. */
    public static Path home() {
        return Path.of(System.getProperty("ladderkin.home", "."));
    }

    /** Reads every material and matrix under {@code home}/models. */
    public static MaterialLibrary load(Path home) {
        Map<String, Material> materials = new TreeMap<>(String.CASE_INSENSITIVE_ORDER);
        for (Path f : jsonFiles(home.resolve("models/materials"))) {
            Material m = MaterialCodec.read(f);
            checkKey(f, m.key());
            materials.put(m.key(), m);
        }
        Map<String, Matrix> matrices = new TreeMap<>(String.CASE_INSENSITIVE_ORDER);
        for (Path f : jsonFiles(home.resolve("models/matrices"))) {
            Matrix m = MatrixCodec.read(f);
            checkKey(f, m.key());
            matrices.put(m.key(), m);
        }
        return new MaterialLibrary(materials, matrices);
    }

    private static void checkKey(Path f, String key) {
        String stem = f.getFileName().toString().replaceFirst("\\.json$", "");
        if (!stem.equals(key)) {
            throw new InputException(SourceLocation.of(f.toString()), "key", InputProblem.MISMATCH,
                    "key '" + key + "' differs from the file name '" + stem + "' (they must match)");
        }
    }

    private static List<Path> jsonFiles(Path dir) {
        if (!Files.isDirectory(dir)) {
            throw new InputException(SourceLocation.of(dir.toString()), null, InputProblem.NOT_FOUND,
                    "library folder not found (is ladderkin.home set to the ladderkin folder?)");
        }
        try (Stream<Path> s = Files.list(dir)) {
            List<Path> files = new ArrayList<>(s.filter(p -> p.getFileName().toString().endsWith(".json")).sorted().toList());
            return files;
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(dir.toString()), null, InputProblem.UNREADABLE, "cannot list folder: " + e.getMessage());
        }
    }

    /** All materials, by key. */
    public List<Material> materials() {
        return List.copyOf(materials.values());
    }

    /** All matrices, by key. */
    public List<Matrix> matrices() {
        return List.copyOf(matrices.values());
    }

    /** The material with this key (case-insensitive). */
    public Material material(String key) {
        Material m = materials.get(key);
        if (m == null) {
            throw new IllegalArgumentException("unknown material '" + key + "' (library has: "
                    + String.join(", ", materials.keySet()) + ")");
        }
        return m;
    }

    /** The matrix with this key (case-insensitive). */
    public Matrix matrix(String key) {
        Matrix m = matrices.get(key);
        if (m == null) {
            throw new IllegalArgumentException("unknown matrix '" + key + "' (library has: "
                    + String.join(", ", matrices.keySet()) + "; or describe it inline)");
        }
        return m;
    }
}
