package org.ladderkin.io;

import java.nio.file.Path;
import java.util.Optional;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.material.Material;
import org.ladderkin.sample.AbsorptionSpectrum;
import org.ladderkin.sample.Matrix;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.SampleException;
import org.ladderkin.sample.SampleSpec;
import org.ladderkin.sample.Shell;
import org.ladderkin.units.Dimension;

/**
 * Reads samples: files of schema {@code ladderkin.sample/1}, and the {@code sample} section of plan files, which has the
 * same fields without {@code schema}. The description is resolved at once (sizing curve, Beer–Lambert), and a
 * description that cannot be resolved is reported at the field responsible.
 */
public final class SampleCodec {

    /** Schema name of sample files. */
    public static final String SCHEMA = "ladderkin.sample";
    /** Newest version read. */
    public static final int VERSION = 1;

    private SampleCodec() {
    }

    /** Reads a sample file with the library under the ladderkin home. */
    public static Sample read(Path file) {
        return read(file, MaterialLibrary.fromHome());
    }

    /** Reads a sample file. Relative spectrum paths are taken from the file's folder. */
    public static Sample read(Path file, MaterialLibrary library) {
        Node root = JsonTree.read(file, file.toString());
        root.schema(SCHEMA, VERSION);
        return section(root, library, baseDir(file));
    }

    /** Reads the fields of a sample object (a sample file after its schema, or a plan's {@code sample} section). */
    public static Sample section(Node n, MaterialLibrary library, Path baseDir) {
        return resolve(spec(n, library, baseDir), n);
    }

    /** The folder relative paths in a document are taken from. */
    public static Path baseDir(Path file) {
        Path parent = file.toAbsolutePath().getParent();
        return parent == null ? Path.of(".") : parent;
    }

    private record Located(SampleSpec spec, Node size, Node amount, Node crossSection) {
    }

    private static Located spec(Node n, MaterialLibrary library, Path baseDir) {
        String name = n.field("name").string();
        Node materialNode = n.field("material");
        Material material;
        try {
            material = library.material(materialNode.string());
        } catch (IllegalArgumentException e) {
            throw materialNode.error(InputProblem.BAD_CHOICE, e.getMessage());
        }
        Node sizeNode;
        SampleSpec.Size size;
        if (n.has("diameter") && n.has("firstExcitonPeak")) {
            // both measured: the peak sets E₁S, the size the volume (materials without a sizing curve need both)
            sizeNode = n.field("diameter");
            size = new SampleSpec.ByDiameterAndPeak(sizeNode.positive(Dimension.LENGTH, null),
                    n.field("firstExcitonPeak").positive(Dimension.LENGTH, null));
        } else {
            String sizeBy = n.oneOf("diameter", "firstExcitonPeak");
            sizeNode = n.field(sizeBy);
            size = sizeBy.equals("diameter")
                    ? new SampleSpec.ByDiameter(sizeNode.positive(Dimension.LENGTH, null))
                    : new SampleSpec.ByFirstPeak(sizeNode.positive(Dimension.LENGTH, null));
        }
        Node dispersionNode = n.optional("sizeDispersion").orElse(null);
        double dispersion = dispersionNode == null ? 0 : dispersionNode.probability();
        if (dispersion >= 1) {
            throw dispersionNode.error(InputProblem.OUT_OF_RANGE, "must be below 100 %, was " + dispersion * 100 + " %");
        }
        String amountBy = n.oneOf("concentration", "absorbance");
        Node amountNode = n.field(amountBy);
        SampleSpec.Amount amount;
        if (amountBy.equals("concentration")) {
            amount = new SampleSpec.Concentration(amountNode.positive(Dimension.CONCENTRATION, null));
        } else {
            double od = amountNode.field("value").positive(Dimension.ABSORBANCE, null);
            Node at = amountNode.field("at");
            double atM = at.kind() == Node.Kind.STRING && at.string().equals("first-exciton")
                    ? Double.NaN : at.positive(Dimension.LENGTH, null);
            amountNode.finish();
            amount = new SampleSpec.Absorbance(od, atM);
        }
        double path = n.field("pathLength").positive(Dimension.LENGTH, null);
        Node matrixNode = n.field("matrix");
        Matrix matrix;
        if (matrixNode.kind() == Node.Kind.OBJECT) {
            matrix = MatrixCodec.body(matrixNode);
        } else {
            try {
                matrix = library.matrix(matrixNode.string());
            } catch (IllegalArgumentException e) {
                throw matrixNode.error(InputProblem.BAD_CHOICE, e.getMessage());
            }
        }
        Refresh refresh = refresh(n.field("refresh"));
        Optional<AbsorptionSpectrum> spectrum = n.optional("absorptionSpectrum").map(s -> {
            Path p = s.path(baseDir);
            if (!java.nio.file.Files.isRegularFile(p)) {
                throw s.error(InputProblem.NOT_FOUND, "spectrum file not found: " + p + " (relative paths start at the sample file's folder)");
            }
            return AbsorptionSpectrumCsv.read(p, s.string());
        });
        Node csNode = n.optional("crossSection").orElse(null);
        Optional<SampleSpec.GivenCrossSection> given = Optional.empty();
        if (csNode != null) {
            double sigma = csNode.field("value").positive(Dimension.AREA, null);
            double at = csNode.field("at").positive(Dimension.LENGTH, null);
            csNode.finish();
            given = Optional.of(new SampleSpec.GivenCrossSection(sigma, at));
        }
        Optional<Shell> shell = n.optional("shell").map(s -> ShellCodec.shell(s, material, library));
        n.finish();
        SampleSpec spec;
        try {
            spec = new SampleSpec(name, material, size, dispersion, amount, path, Optional.of(matrix), refresh, spectrum, given,
                    shell);
        } catch (IllegalArgumentException e) {
            throw n.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
        return new Located(spec, sizeNode, amountNode, csNode == null ? amountNode : csNode);
    }

    private static Sample resolve(Located l, Node whole) {
        try {
            return Sample.resolve(l.spec());
        } catch (SampleException e) {
            Node at = switch (e.part()) {
                case SIZE -> l.size();
                case AMOUNT -> l.amount();
                case CROSS_SECTION -> l.crossSection();
            };
            throw at.error(InputProblem.INVALID_VALUE, e.getMessage());
        } catch (IllegalArgumentException e) {
            throw whole.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
    }


    private static Refresh refresh(Node n) {
        String mode = n.field("mode").choice("static", "stirred", "flowing", "translated");
        Refresh r;
        if (mode.equals("translated")) {
            r = Refresh.translated(n.field("speed").positive(Dimension.SPEED, null));
        } else if (mode.equals("flowing")) {
            double flow = n.field("flowRate").positive(Dimension.VOLUMETRIC_FLOW, null);
            double volume = n.field("cellVolume").positive(Dimension.VOLUME, null);
            double area = n.optional("cellCrossSection").map(a -> a.positive(Dimension.AREA, null)).orElse(Double.NaN);
            r = Refresh.flowing(flow, volume, area);
        } else {
            r = mode.equals("static") ? Refresh.stationary() : Refresh.stirred();
        }
        n.finish();
        return r;
    }
}
