package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.ladderkin.excite.Calibration;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.plan.Goal;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.LaserSetup;
import org.ladderkin.plan.Limits;
import org.ladderkin.kinetics.process.ParameterKind;
import org.ladderkin.kinetics.process.ParameterReader;
import org.ladderkin.kinetics.process.ParameterSource;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.kinetics.process.ProcessSpec;
import org.ladderkin.kinetics.process.ProcessType;
import org.ladderkin.kinetics.rate.ExcitonScaling;
import org.ladderkin.plan.ModelAssumptions;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.sample.Sample;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;

/** Reads campaign plan files, schema {@code ladderkin.plan/1}. */
public final class PlanCodec {

    /** Schema name of plan files. */
    public static final String SCHEMA = "ladderkin.plan";
    /**
     * With {@code averagePower}, the lowest pulse energy is this fraction of the highest: a variable neutral-density
     * wheel and a filter span about 4 OD (common practice, no source).
     */
    static final double LOWEST_OF_HIGHEST_ENERGY = 1e-4;
    /** Newest plan schema version this build reads and writes. */
    public static final int VERSION = 1;

    private PlanCodec() {
    }

    /** Reads a plan file; every problem is an {@link InputException} with file, line, column and field. */
    public static PlanInputs read(Path file) {
        return read(JsonTree.read(file, file.toString()));
    }

    /** Reads a plan from parsed JSON with the material library under the ladderkin home. */
    public static PlanInputs read(Node root) {
        return read(root, MaterialLibrary.fromHome());
    }

    /** Reads a plan from parsed JSON, resolving its sample with {@code library}. */
    public static PlanInputs read(Node root, MaterialLibrary library) {
        root.schema(SCHEMA, VERSION);
        String title = root.field("title").string();
        String lab = root.optional("lab").map(Node::string).orElse("");
        Sample sample = sample(root.field("sample"), library);
        LaserSetup laser = laser(root.field("laser"));
        List<Instrument> instruments = root.field("instruments").items(1).stream().map(PlanCodec::instrument).toList();
        Node goalsNode = root.field("goals");
        Set<Goal> goals = EnumSet.noneOf(Goal.class);
        for (Node g : goalsNode.field("measure").items(1)) {
            Goal goal = Goal.byKey(g.string());
            if (goal == null) {
                throw g.error(InputProblem.BAD_CHOICE, "unknown goal '" + g.string() + "' (allowed: " + Goal.keys() + ")");
            }
            if (!goals.add(goal)) {
                throw g.error(InputProblem.DUPLICATE, "goal '" + g.string() + "' is listed twice");
            }
        }
        List<Double> cmEnergies = new ArrayList<>();
        goalsNode.optional("multiplicationPhotonEnergies").ifPresent(n -> {
            for (Node e : n.items(1)) {
                cmEnergies.add(photonEnergyJ(e));
            }
        });
        if (goals.contains(Goal.MULTIPLICATION_YIELD) && cmEnergies.isEmpty()) {
            throw goalsNode.error(InputProblem.MISSING_FIELD, "goal 'multiplication-yield' needs 'multiplicationPhotonEnergies' (e.g. [\"3.1 eV\"])");
        }
        goalsNode.finish();
        Limits limits = limits(root.field("limits"));
        ModelAssumptions.Overrides overrides = root.optional("model").map(PlanCodec::model).orElse(ModelAssumptions.Overrides.NONE);
        PlanSampleChecks.check(root, sample, laser.pumpWavelengthsM(), overrides);
        root.finish();
        return new PlanInputs(title, lab, sample, laser, instruments, goals, cmEnergies, limits, overrides);
    }

    /** The plan's sample section: the same fields as a sample file ({@link SampleCodec}), without a schema. */
    private static Sample sample(Node n, MaterialLibrary library) {
        Path base = SampleCodec.baseDir(Path.of(n.location().file()));
        return SampleCodec.section(n, library, base);
    }

    private static LaserSetup laser(Node n) {
        List<Double> wavelengths = n.field("pumpWavelengths").items(1).stream()
                .map(w -> w.positive(Dimension.LENGTH, null)).toList();
        double rep = n.field("repetitionRate").positive(Dimension.FREQUENCY, null);
        List<Integer> divisions = n.optional("pulsePickerDivisions")
                .map(d -> d.items(1).stream().map(i -> i.integer(1, 1_000_000_000)).toList())
                .orElse(List.of(1));
        double fwhm = n.field("pulseWidth").positive(Dimension.TIME, null);
        double lo;
        double hi;
        Node power = n.optional("averagePower").orElse(null);
        Node range = n.optional("pulseEnergyRange").orElse(null);
        if (power != null && range != null) {
            throw power.error(InputProblem.CONFLICT, "give either 'averagePower' or 'pulseEnergyRange', not both "
                    + "(the average power at the full repetition rate sets the highest pulse energy)");
        }
        if (power != null) {
            hi = power.positive(Dimension.POWER, null) / rep;
            lo = hi * LOWEST_OF_HIGHEST_ENERGY;
        } else {
            if (range == null) {
                throw new InputException(n.location(), n.path() + ".pulseEnergyRange", InputProblem.MISSING_FIELD,
                        "missing required field in '" + n.path() + "' (add \"pulseEnergyRange\": [lowest, highest], or "
                                + "\"averagePower\": ... measured at the full repetition rate)");
            }
            List<Node> ends = range.items(2);
            if (ends.size() != 2) {
                throw range.error(InputProblem.OUT_OF_RANGE, "needs exactly two energies [lowest, highest], found " + ends.size());
            }
            lo = ends.get(0).positive(Dimension.ENERGY, null);
            hi = ends.get(1).positive(Dimension.ENERGY, null);
            if (lo > hi) {
                throw range.error(InputProblem.BAD_ORDER, "lowest energy is above the highest (write [lowest, highest])");
            }
        }
        double pitch = n.optional("beamPixelPitch").map(x -> x.positive(Dimension.LENGTH, null)).orElse(Double.NaN);
        Spot pumpSpot = spot(n, "pumpRadius", "pumpBeamFile", pitch);
        Spot probeSpot = spot(n, "probeRadius", "probeBeamFile", pitch);
        double pump = pumpSpot.radiusM();
        double probe = probeSpot.radiusM();
        Node meter = n.optional("powerMeterUncertainty").orElse(null);
        Node energyRel = n.optional("pulseEnergyUncertainty").orElse(null);
        if (meter != null && energyRel != null) {
            throw meter.error(InputProblem.CONFLICT, "give either 'powerMeterUncertainty' or 'pulseEnergyUncertainty', not both "
                    + "(a pulse energy read from a power meter has the meter's relative uncertainty)");
        }
        double energy = meter != null ? relative(meter) : energyRel != null ? relative(energyRel) : Double.NaN;
        double pumpRel = optionalRelative(n, "pumpRadiusUncertainty");
        double probeRel = optionalRelative(n, "probeRadiusUncertainty");
        Calibration cal = new Calibration(energy, Double.isNaN(pumpRel) ? pumpSpot.measuredRel() : pumpRel,
                Double.isNaN(probeRel) ? probeSpot.measuredRel() : probeRel, optionalRelative(n, "crossSectionUncertainty"));
        double fluctuation = optionalRelative(n, "pumpFluctuation");
        double drift = optionalRelative(n, "pumpDriftPerHour");
        n.finish();
        return new LaserSetup(wavelengths, rep, divisions, fwhm, lo, hi, pump, probe, cal, fluctuation, drift);
    }

    /** A spot radius (m) and, when it was measured from a beam file, that measurement's relative standard error. */
    private record Spot(double radiusM, double measuredRel) {
    }

    /**
     * A spot as a radius or as a beam file (knife-edge table or camera frame, {@link BeamFiles}, the path taken from
     * the plan file's folder as for {@code irfFile}); exactly one of them. A camera frame needs {@code beamPixelPitch}.
     */
    private static Spot spot(Node laser, String radiusKey, String fileKey, double pixelPitchM) {
        Node radius = laser.optional(radiusKey).orElse(null);
        Node file = laser.optional(fileKey).orElse(null);
        if (file == null) {
            if (radius == null) {
                throw new InputException(laser.location(), laser.path() + "." + radiusKey, InputProblem.MISSING_FIELD,
                        "missing required field in '" + laser.path() + "' (add \"" + radiusKey + "\": ... , or \"" + fileKey
                                + "\": ... with a knife-edge scan or a camera frame)");
            }
            return new Spot(radius.positive(Dimension.LENGTH, null), Double.NaN);
        }
        if (radius != null) {
            throw file.error(InputProblem.CONFLICT, "give either '" + radiusKey + "' or '" + fileKey + "', not both (the file "
                    + "measures the radius)");
        }
        if (file.string().isBlank()) {
            throw file.error(InputProblem.MISSING_VALUE, "expected the path of a knife-edge table or a camera frame");
        }
        Path p = file.path(SampleCodec.baseDir(Path.of(file.location().file())));
        if (!java.nio.file.Files.isRegularFile(p)) {
            throw file.error(InputProblem.NOT_FOUND, "beam file not found: " + p + " (relative paths start at the plan file's folder)");
        }
        if (Double.isNaN(pixelPitchM) && BeamFiles.isImage(p, file.string())) {
            throw file.error(InputProblem.MISSING_FIELD, "a camera frame needs the camera's pixel pitch: add \"beamPixelPitch\": "
                    + "\"5.5 µm\" to 'laser'");
        }
        var r = BeamFiles.radius(p, pixelPitchM);
        return new Spot(r.radiusM(), r.stdErrorM() / r.radiusM());
    }

    /** An optional relative uncertainty such as "5 %", NaN when absent. */
    private static double optionalRelative(Node n, String field) {
        return n.optional(field).map(PlanCodec::relative).orElse(Double.NaN);
    }

    /** A relative uncertainty in [0, 1) such as "5 %" or 0.05. */
    private static double relative(Node n) {
        double v = n.probability();
        if (v >= 1) {
            throw n.error(InputProblem.OUT_OF_RANGE, "a relative uncertainty must be below 100 % (e.g. \"5 %\")");
        }
        return v;
    }

    private static Instrument instrument(Node n) {
        String kind = n.field("kind").choice(Instrument.Kind.TRANSIENT_ABSORPTION.key(), Instrument.Kind.TCSPC.key());
        Instrument inst;
        if (kind.equals(Instrument.Kind.TCSPC.key())) {
            double bin = n.field("timeBin").positive(Dimension.TIME, null);
            Node rangeNode = n.field("timeRange");
            double range = rangeNode.positive(Dimension.TIME, null);
            Response irf = response(n);
            double countFraction = n.optional("maxCountFraction").map(Node::probability).orElse(0.05);
            if (bin >= range) {
                throw rangeNode.error(InputProblem.OUT_OF_RANGE, "time range must exceed the time bin");
            }
            inst = new Instrument(Instrument.Kind.TCSPC, bin, range, 0, irf.fwhmS(), countFraction, irf.measured());
        } else {
            Node range = n.field("delayRange");
            List<Node> ends = range.items(2);
            if (ends.size() != 2) {
                throw range.error(InputProblem.OUT_OF_RANGE, "needs exactly two delays [shortest, longest], found " + ends.size());
            }
            double lo = ends.get(0).positive(Dimension.TIME, null);
            double hi = ends.get(1).positive(Dimension.TIME, null);
            if (lo >= hi) {
                throw range.error(InputProblem.BAD_ORDER, "shortest delay must be below the longest (write [shortest, longest])");
            }
            double noise = n.field("noiseFloor").positive(Dimension.ABSORBANCE, null);
            Response irf = response(n);
            double t0 = n.optional("timeZeroUncertainty").map(t -> t.nonNegative(Dimension.TIME, null)).orElse(Double.NaN);
            double irfRel = optionalRelative(n, "irfWidthUncertainty");
            inst = new Instrument(Instrument.Kind.TRANSIENT_ABSORPTION, lo, hi, noise, irf.fwhmS(), 0, irf.measured(), t0, irfRel);
        }
        n.finish();
        return inst;
    }

    /** An instrument's response: its FWHM, and the measured curve when one is given. */
    private record Response(double fwhmS, MeasuredIrf measured) {
    }

    /**
     * {@code irfFwhm} (a Gaussian of that width) or {@code irfFile} (a measured curve, {@link IrfFileReader}, the path
     * taken from the plan file's folder as for {@code sample.absorptionSpectrum}); exactly one of them.
     */
    private static Response response(Node n) {
        Node file = n.optional("irfFile").orElse(null);
        Node fwhm = n.optional("irfFwhm").orElse(null);
        if (file == null) {
            if (fwhm == null) {
                throw new InputException(n.location(), n.path() + ".irfFwhm", InputProblem.MISSING_FIELD, "missing required field in '" + n.path()
                        + "' (add \"irfFwhm\": ... for a Gaussian response, or \"irfFile\": ... for a measured one)");
            }
            return new Response(fwhm.positive(Dimension.TIME, null), null);
        }
        if (fwhm != null) {
            throw file.error(InputProblem.CONFLICT, "give either 'irfFwhm' or 'irfFile', not both (a measured response fixes the width)");
        }
        if (file.string().isBlank()) {
            throw file.error(InputProblem.MISSING_VALUE, "expected the path of an IRF table such as \"fh-ta-irf.csv\"");
        }
        Path p = file.path(SampleCodec.baseDir(Path.of(file.location().file())));
        if (!java.nio.file.Files.isRegularFile(p)) {
            throw file.error(InputProblem.NOT_FOUND, "IRF file not found: " + p + " (relative paths start at the plan file's folder)");
        }
        MeasuredIrf irf = IrfFileReader.read(p, file.string());
        return new Response(irf.fwhmS(), irf);
    }

    private static Limits limits(Node n) {
        Node riseNode = n.field("maxTemperatureRise");
        Quantity rise = riseNode.quantity(Dimension.TEMPERATURE, null);
        if (rise.unit().offsetSi() != 0 || !(rise.si() > 0)) {
            throw riseNode.error(rise.unit().offsetSi() != 0 ? InputProblem.WRONG_UNIT : InputProblem.OUT_OF_RANGE, "a temperature rise must be > 0 and given in K (e.g. \"5 K\"), was " + rise.format());
        }
        double dT = rise.si();
        double charged = n.field("maxChargedFraction").probability();
        double residual = n.field("maxResidualExcitation").probability();
        double beam = n.field("beamTime").positive(Dimension.TIME, null);
        n.finish();
        return new Limits(dT, charged, residual, beam);
    }

    /** The optional "model" section: values that replace the ones derived from the material. */
    private static ModelAssumptions.Overrides model(Node n) {
        double tau1 = optionalTime(n, "singleExcitonLifetime");
        double qy = n.optional("plQuantumYield").map(Node::probability).orElse(Double.NaN);
        if (qy == 0) {
            throw n.field("plQuantumYield").error(InputProblem.OUT_OF_RANGE, "must be > 0 (a dot that never emits has no radiative rate to plan with)");
        }
        double tau2 = optionalTime(n, "biexcitonLifetime");
        AugerScaling auger = n.optional("augerScaling").map(a -> {
            String k = a.choice("statistical", "pairs", "quadratic");
            for (AugerScaling s : AugerScaling.values()) {
                if (s.key().equals(k)) {
                    return s;
                }
            }
            throw a.error(InputProblem.BAD_CHOICE, "unknown Auger scaling");
        }).orElse(null);
        RadiativeScaling rad = n.optional("radiativeScaling").map(a -> {
            String k = a.choice("linear", "statistical");
            for (RadiativeScaling s : RadiativeScaling.values()) {
                if (s.key().equals(k)) {
                    return s;
                }
            }
            throw a.error(InputProblem.BAD_CHOICE, "unknown radiative scaling");
        }).orElse(null);
        double trionNeg = optionalTime(n, "negativeTrionLifetime");
        double trionPos = optionalTime(n, "positiveTrionLifetime");
        double ion = n.optional("ionisationProbability").map(Node::probability).orElse(Double.NaN);
        double neut = optionalTime(n, "photochargeLifetime");
        double cooling = optionalTime(n, "coolingTime");
        List<ProcessSpec> processes = new ArrayList<>();
        for (ProcessType<?> t : ProcessRegistry.types()) {
            if (t.parameters().stream().anyMatch(p -> p.planKey() != null && n.has(p.planKey()))) {
                processes.add(t.read(new ParameterReader(new PlanModelSource(n))));
            }
        }
        n.finish();
        return new ModelAssumptions.Overrides(tau1, qy, tau2, auger, rad, trionNeg, trionPos, ion, neut, cooling, processes);
    }

    /**
     * A plan's model section as the source of a registry process: only parameters with a plan key can be given there;
     * the others take their defaults.
     */
    private record PlanModelSource(Node section) implements ParameterSource {
        @Override
        public boolean has(ProcessParameter p) {
            return p.planKey() != null && section.has(p.planKey());
        }

        @Override
        public double seconds(ProcessParameter p) {
            Node v = section.field(p.planKey());
            return ParameterRange.check(p, v, v.positive(Dimension.TIME, null));
        }

        @Override
        public double number(ProcessParameter p) {
            Node v = section.field(p.planKey());
            return ParameterRange.check(p, v, p.kind() == ParameterKind.PROBABILITY ? v.probability() : v.number());
        }

        @Override
        public String choice(ProcessParameter p) {
            return section.field(p.planKey()).choice(p.choices().toArray(String[]::new));
        }

        @Override
        public List<String> choices(ProcessParameter p) {
            return section.field(p.planKey()).items(1).stream().map(v -> v.choice(p.choices().toArray(String[]::new))).toList();
        }

        @Override
        public ExcitonScaling scaling(ProcessParameter p, int firstN) {
            throw error(p, "a scaling law is set by the plan's own fields");
        }

        @Override
        public RuntimeException missing(ProcessParameter p) {
            return section.error(InputProblem.MISSING_FIELD, "'" + (p.planKey() != null ? p.planKey() : p.key()) + "' is needed with the other "
                    + ProcessRegistry.owner(p).section() + " values");
        }

        @Override
        public RuntimeException error(ProcessParameter p, String problem) {
            return p != null && p.planKey() != null && section.has(p.planKey())
                    ? section.field(p.planKey()).error(InputProblem.CONFLICT, problem) : section.error(InputProblem.CONFLICT, problem);
        }
    }

    private static double optionalTime(Node n, String field) {
        return n.optional(field).map(t -> t.positive(Dimension.TIME, null)).orElse(Double.NaN);
    }

    /** A photon given as an energy ("3.1 eV") or a vacuum wavelength ("400 nm"), returned as energy (J). */
    static double photonEnergyJ(Node n) {
        if (n.kind() != Node.Kind.STRING) {
            throw n.error(InputProblem.WRONG_TYPE, "expected a photon energy or wavelength such as \"3.1 eV\" or \"400 nm\"");
        }
        try {
            return Photon.parseEnergyJ(n.string());
        } catch (IllegalArgumentException e) {
            throw n.error(e instanceof QuantityFormatException q ? InputProblem.of(q) : InputProblem.INVALID_VALUE, e.getMessage());
        }
    }
}
