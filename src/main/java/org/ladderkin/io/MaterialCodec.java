package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.material.AbsorptionLaw;
import org.ladderkin.material.Material;
import org.ladderkin.material.OpticalConstants;
import org.ladderkin.material.ReciprocalQuadraticSizing;
import org.ladderkin.material.Shape;
import org.ladderkin.material.SizingCurve;
import org.ladderkin.material.Sourced;
import org.ladderkin.material.WavelengthPolynomialSizing;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Unit;
import org.ladderkin.units.Units;

/**
 * Reads material files, schema {@code ladderkin.material/1}. Every value is written
 * {@code {"value": ..., "source": "..."}} so its source sits beside it; {@code "value": null} marks a value the library
 * does not know. Laws are written in their published form (coefficient, which length, in which unit, exponent).
 */
public final class MaterialCodec {

    /** Schema name of material files. */
    public static final String SCHEMA = "ladderkin.material";
    /** Newest version read. */
    public static final int VERSION = 1;

    private MaterialCodec() {
    }

    /** Reads one material file. */
    public static Material read(Path file) {
        return read(JsonTree.read(file, file.toString()));
    }

    /** Reads a material from parsed JSON. */
    public static Material read(Node root) {
        root.schema(SCHEMA, VERSION);
        String key = root.field("key").string();
        String name = root.field("name").string();
        Shape shape = root.field("shape").choice("sphere", "cube").equals("sphere") ? Shape.SPHERE : Shape.CUBE;
        Sourced gap = sourced(root.field("bulkGap"), Dimension.ENERGY, true);
        Sourced molar = sourcedNumber(root.field("molarMassGPerMol"), 1e-3);
        Sourced density = sourced(root.field("density"), Dimension.DENSITY, true);
        Sourced heat = sourced(root.field("specificHeat"), Dimension.SPECIFIC_HEAT, true);
        Sourced n = sourcedNumber(root.field("refractiveIndex"), 1);
        Sourced ge = sourcedNumber(root.field("electronDegeneracy"), 1);
        Sourced gh = sourcedNumber(root.field("holeDegeneracy"), 1);
        Optional<SizingCurve> sizing = root.optional("sizing").map(s -> sizing(s, gap));
        Optional<AbsorptionLaw> edge = root.optional("firstExcitonAbsorption").map(a -> law(a, false));
        Optional<AbsorptionLaw> high = root.optional("highEnergyAbsorption").map(a -> law(a, true));
        Optional<OpticalConstants> optical = root.optional("opticalConstants").map(MaterialCodec::optical);
        Sourced auger = sourcedNumber(root.field("augerVolumeConstantPsPerNm3"), 1e-12 / 1e-27);
        Sourced tauX = sourced(root.field("singleExcitonLifetime"), Dimension.TIME, true);
        Sourced tauT = sourced(root.field("trionLifetime"), Dimension.TIME, true);
        String notes = root.optional("notes").map(Node::string).orElse("");
        root.finish();
        try {
            return new Material(key, name, shape, gap, molar, density, heat, n, ge, gh, sizing, edge, high, optical, auger, tauX, tauT, notes);
        } catch (IllegalArgumentException e) {
            throw root.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
    }

    /** {"value": "5.81 g/cm³", "source": "..."}; a null or absent value is unknown. */
    static Sourced sourced(Node n, Dimension dimension, boolean positive) {
        String source = source(n);
        Optional<Node> v = value(n);
        n.finish();
        if (v.isEmpty()) {
            return Sourced.unknown(source);
        }
        double si = positive ? v.get().positive(dimension, null) : v.get().quantity(dimension, null).si();
        return source(n, si, source);
    }

    /** {"value": 191.38, "source": "..."} with the value a bare number in the unit the field name documents. */
    static Sourced sourcedNumber(Node n, double toSi) {
        String source = source(n);
        Optional<Node> v = value(n);
        n.finish();
        if (v.isEmpty()) {
            return Sourced.unknown(source);
        }
        double x = v.get().number();
        if (!(x > 0)) {
            throw v.get().error(InputProblem.OUT_OF_RANGE, "must be > 0, was " + x);
        }
        return source(n, x * toSi, source);
    }

    /**
     * The "value" of a sourced entry: null means unknown, but the field itself must be there, so a value deleted by
     * accident is reported here instead of surfacing later as a material that lacks it.
     */
    private static Optional<Node> value(Node n) {
        if (n.kind() == Node.Kind.OBJECT && !n.json().has("value")) {
            n.field("value");
        }
        return n.optional("value");
    }

    /** The "source" of a sourced entry, refused where it is read when blank: every library value names where it comes from. */
    private static String source(Node n) {
        Node s = n.field("source");
        String text = s.string();
        if (text.isBlank()) {
            throw s.error(InputProblem.INVALID_VALUE, "a value needs its source (write \"from memory\" if it has none)");
        }
        return text;
    }

    private static Sourced source(Node n, double si, String source) {
        try {
            return new Sourced(si, source);
        } catch (IllegalArgumentException e) {
            throw n.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
    }

    private static SizingCurve sizing(Node n, Sourced gap) {
        String form = n.field("form").choice("wavelength-polynomial", "reciprocal-quadratic");
        String source = source(n);
        SizingCurve curve;
        try {
            if (form.equals("wavelength-polynomial")) {
                Node coeffNode = n.field("coefficientsNm");
                List<Double> c = new ArrayList<>();
                for (Node item : coeffNode.items(2)) {
                    c.add(item.number());
                }
                double[] range = range(n.field("validFirstPeak"), Dimension.LENGTH);
                if (!gap.known()) {
                    throw n.error(InputProblem.MISSING_FIELD, "a wavelength polynomial needs the bulk gap to recognise impossible peaks");
                }
                curve = new WavelengthPolynomialSizing(c.stream().mapToDouble(Double::doubleValue).toArray(),
                        range[0], range[1], gap.value(), source);
            } else {
                double offsetEv = n.field("offset").positive(Dimension.ENERGY, null) / PhysicalConstants.ELECTRONVOLT_J;
                double a = nonNegative(n.field("a"));
                double b = nonNegative(n.field("b"));
                double c = nonNegative(n.field("c"));
                double[] range = range(n.field("validDiameter"), Dimension.LENGTH);
                curve = new ReciprocalQuadraticSizing(offsetEv, a, b, c, range[0], range[1], source);
            }
        } catch (IllegalArgumentException e) {
            throw n.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
        n.finish();
        return curve;
    }

    private static double nonNegative(Node n) {
        double x = n.number();
        if (x < 0) {
            throw n.error(InputProblem.OUT_OF_RANGE, "must be >= 0, was " + x);
        }
        return x;
    }

    private static double[] range(Node n, Dimension d) {
        List<Node> ends = n.items(2);
        if (ends.size() != 2) {
            throw n.error(InputProblem.OUT_OF_RANGE, "needs exactly two values [lowest, highest], found " + ends.size());
        }
        double lo = ends.get(0).positive(d, null);
        double hi = ends.get(1).positive(d, null);
        if (!(hi > lo)) {
            throw n.error(InputProblem.BAD_ORDER, "lowest must be below highest (write [lowest, highest])");
        }
        return new double[] {lo, hi};
    }

    private static AbsorptionLaw law(Node n, boolean needsWavelength) {
        double wavelength = Double.NaN;
        if (needsWavelength) {
            wavelength = n.field("wavelength").positive(Dimension.LENGTH, null);
        }
        String which = n.oneOf("extinction", "crossSection");
        boolean asExtinction = which.equals("extinction");
        AbsorptionLaw.Length per = switch (n.field("per").choice("diameter", "radius", "edge")) {
            case "diameter" -> AbsorptionLaw.Length.DIAMETER;
            case "radius" -> AbsorptionLaw.Length.RADIUS;
            default -> AbsorptionLaw.Length.EDGE;
        };
        Node unitNode = n.field("lengthUnit");
        Unit unit = Units.find(unitNode.string());
        if (unit == null || unit.dimension() != Dimension.LENGTH) {
            throw unitNode.error(InputProblem.WRONG_UNIT, "expected a length unit (" + Units.accepted(Dimension.LENGTH) + ")");
        }
        double exponent = n.field("exponent").number();
        double coefficientM2 = asExtinction
                ? AbsorptionLaw.crossSectionM2(n.field("extinction").positive(Dimension.MOLAR_EXTINCTION, null))
                : crossSectionAtUnitM2(n.field("crossSection"), unit.toSi(1), exponent);
        String source = source(n);
        Sourced uncertainty = n.optional("relativeUncertainty").map(MaterialCodec::fraction).orElse(AbsorptionLaw.DEFAULT_UNCERTAINTY);
        n.finish();
        try {
            return new AbsorptionLaw(wavelength, coefficientM2, per, unit.toSi(1), exponent, asExtinction, source, uncertainty);
        } catch (IllegalArgumentException e) {
            throw n.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
    }

    /** A number and a length unit raised to −1: "5.501e5 cm⁻¹" (or cm^-1). */
    private static final java.util.regex.Pattern INVERSE_LENGTH = java.util.regex.Pattern.compile("(\\S+)\\s+(\\S+?)(?:⁻¹|\\^-1)");

    /**
     * The law's σ₁, the cross-section of a dot with x = one length unit (m²). A published σ = C·x³ with x in a length
     * unit has C in area per length³, an inverse length ("5.501e5 cm⁻¹"): σ₁ = C·(1 unit)³. An area is σ₁ itself.
     */
    private static double crossSectionAtUnitM2(Node c, double lengthUnitM, double exponent) {
        java.util.regex.Matcher m = INVERSE_LENGTH.matcher(c.string().strip());
        if (!m.matches()) {
            return c.positive(Dimension.AREA, null);
        }
        Unit per = Units.find(m.group(2));
        if (per == null || per.dimension() != Dimension.LENGTH) {
            throw c.error(InputProblem.UNKNOWN_UNIT, "expected an area such as \"2e-15 cm²\" or, with \"exponent\": 3, "
                    + "an inverse length such as \"5.501e5 cm⁻¹\"");
        }
        if (exponent != 3) {
            throw c.error(InputProblem.WRONG_UNIT, "an inverse length is σ per length³: it needs \"exponent\": 3, found "
                    + exponent + " (or give σ of a dot one length unit in size, an area)");
        }
        double value;
        try {
            value = Double.parseDouble(m.group(1));
        } catch (NumberFormatException e) {
            throw c.error(InputProblem.BAD_NUMBER, "'" + m.group(1) + "' is not a number");
        }
        if (!(value > 0) || Double.isInfinite(value)) {
            throw c.error(InputProblem.OUT_OF_RANGE, "must be > 0, was " + m.group(1));
        }
        return value / per.toSi(1) * lengthUnitM * lengthUnitM * lengthUnitM;
    }

    /** {"value": 0.15, "source": "..."}: a relative uncertainty, a fraction in (0, 10]. */
    private static Sourced fraction(Node n) {
        Sourced s = sourcedNumber(n, 1);
        if (!s.known() || s.value() > 10) {
            throw n.error(InputProblem.OUT_OF_RANGE, "a relative uncertainty must be a fraction in (0, 10], was " + s.value());
        }
        return s;
    }

    /** {"wavelengthsNm": [...], "n": [...], "k": [...], "source": "...", "relativeUncertainty": {...}}. */
    private static OpticalConstants optical(Node n) {
        double[] w = numbers(n.field("wavelengthsNm"), 1e-9);
        Node nNode = n.field("n");
        double[] re = numbers(nNode, 1);
        Node kNode = n.field("k");
        double[] im = numbers(kNode, 1);
        String source = source(n);
        Sourced uncertainty = fraction(n.field("relativeUncertainty"));
        n.finish();
        if (re.length != w.length) {
            throw nNode.error(InputProblem.INVALID_VALUE, "needs one n per wavelength (" + w.length + "), has " + re.length);
        }
        if (im.length != w.length) {
            throw kNode.error(InputProblem.INVALID_VALUE, "needs one k per wavelength (" + w.length + "), has " + im.length);
        }
        try {
            return new OpticalConstants(w, re, im, source, uncertainty);
        } catch (IllegalArgumentException e) {
            throw n.error(InputProblem.INVALID_VALUE, e.getMessage());
        }
    }

    private static double[] numbers(Node n, double toSi) {
        List<Node> items = n.items(2);
        double[] out = new double[items.size()];
        for (int i = 0; i < out.length; i++) {
            double x = items.get(i).number();
            if (!(x > 0)) {
                throw items.get(i).error(InputProblem.OUT_OF_RANGE, "must be > 0, was " + x);
            }
            out[i] = x * toSi;
        }
        return out;
    }
}
