package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.ladderkin.excite.BeamProfile;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.OccupancyUncertainty;
import org.ladderkin.excite.FlatTopBeam;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.excite.Pulse;
import org.ladderkin.io.AbsorptionSpectrumCsv;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.io.SampleCodec;
import org.ladderkin.material.Material;
import org.ladderkin.sample.AbsorptionSpectrum;
import org.ladderkin.sample.Matrix;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.SampleException;
import org.ladderkin.sample.SampleSpec;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Quantity;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ladderkin excite}: from pulse energy to ⟨N⟩ on the axis and as the probe sees it, and back.
 */
@Command(name = "excite", mixinStandardHelpOptions = true,
        header = "Fluence and ⟨N⟩ from the pulse, the spots and the sample.",
        description = "Photon fluence, ⟨N⟩ = σ·j on the pump axis and as the probe sees it (averaged over its spot and"
            + " the sample depth), absorbed fraction and power. With --target-n: the pulse energy giving that"
            + " ⟨N⟩. The sample comes from SAMPLE.json (schema ladderkin.sample/1) or from flags: --material,"
            + " --diameter or --first-peak, --od or --concentration, --path. Radii are 1/e² intensity radii (or"
            + " use --*-fwhm).",
        footer = {"", "Example: ladderkin excite --material PbSe --diameter 5nm --od 0.3 --path 1mm --pump 800nm \\",
            "           --energy 50nJ --rep-rate 1kHz --pump-radius 100um --probe-radius 40um --target-n 1.5"})
final class ExciteCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(index = "0", arity = "0..1", paramLabel = "SAMPLE.json", description = "sample file (or describe it by flags)")
    Path sampleFile;

    @Option(names = "--pump", required = true, paramLabel = "WAVELENGTH", description = "pump wavelength, e.g. 400nm")
    String pump;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    EnergyOrPower energy;

    static final class EnergyOrPower {
        @Option(names = "--energy", paramLabel = "E", description = "pulse energy at the sample, e.g. 50nJ")
        String energy;
        @Option(names = "--power", paramLabel = "P", description = "average power at the sample, e.g. 50uW")
        String power;
    }

    @Option(names = "--rep-rate", required = true, paramLabel = "F", description = "repetition rate at the sample, e.g. 1kHz")
    String repRate;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Spot pumpSpot;

    static final class Spot {
        @Option(names = "--pump-radius", paramLabel = "W", description = "pump 1/e² intensity radius (flat-top radius with --pump-flat-top)")
        String radius;
        @Option(names = "--pump-fwhm", paramLabel = "FWHM", description = "pump intensity FWHM (Gaussian)")
        String fwhm;
    }

    @Option(names = "--pump-flat-top", description = "the pump is a flat top of radius --pump-radius")
    boolean pumpFlatTop;

    @ArgGroup(exclusive = true, multiplicity = "1")
    ProbeSpot probeSpot;

    static final class ProbeSpot {
        @Option(names = "--probe-radius", paramLabel = "W", description = "probe 1/e² intensity radius (flat-top radius with --probe-flat-top)")
        String radius;
        @Option(names = "--probe-fwhm", paramLabel = "FWHM", description = "probe intensity FWHM (Gaussian)")
        String fwhm;
    }

    @Option(names = "--probe-flat-top", description = "the probe is a flat top of radius --probe-radius")
    boolean probeFlatTop;

    @Option(names = "--target-n", paramLabel = "N", description = "print the pulse energy giving this ⟨N⟩")
    Double targetN;

    @Option(names = "--target-mode", paramLabel = "MODE", defaultValue = "on-axis",
            description = "what --target-n refers to: on-axis (front face, pump axis) or probe-averaged (spot and depth)")
    String targetMode;

    @Option(names = "--no-depth-average", description = "take the front face only (ignore pump attenuation through the sample)")
    boolean noDepthAverage;

    @Option(names = "--material", paramLabel = "KEY", description = "material key (see 'ladderkin materials')")
    String material;

    @Option(names = "--diameter", paramLabel = "D", description = "dot diameter (cube edge for perovskites)")
    String diameter;

    @Option(names = "--first-peak", paramLabel = "WAVELENGTH", description = "measured first-exciton absorption peak")
    String firstPeak;

    @Option(names = "--dispersion", paramLabel = "FRACTION", description = "relative size dispersion, e.g. 8%%")
    String dispersion;

    @Option(names = "--od", paramLabel = "A", description = "measured absorbance over the path (at --od-at, default the pump)")
    String od;

    @Option(names = "--od-at", paramLabel = "WAVELENGTH", description = "where --od was measured, or 'first-exciton'")
    String odAt;

    @Option(names = "--concentration", paramLabel = "C", description = "dot concentration, e.g. 2uM")
    String concentration;

    @Option(names = "--path", paramLabel = "L", description = "optical path length, e.g. 1mm")
    String path;

    @Option(names = "--matrix", paramLabel = "KEY", description = "solvent or film key (see 'ladderkin materials')")
    String matrix;

    @Option(names = "--cross-section", paramLabel = "SIGMA", description = "measured cross-section at the pump, e.g. 2e-15cm2 (overrides the law)")
    String crossSection;

    @Option(names = "--spectrum", paramLabel = "CSV", description = "measured absorption spectrum (wavelength_nm,absorbance) to scale σ to the pump")
    Path spectrumFile;

    @Mixin
    CalibrationFlags calibrationFlags;

    @Option(names = "--format", paramLabel = "FMT", defaultValue = "text", description = "text or json")
    String format;

    @Override
    public Integer call() {
        if (!format.equals("text") && !format.equals("json")) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--format must be text or json, was '" + format + "'");
        }
        if (!targetMode.equals("on-axis") && !targetMode.equals("probe-averaged")) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--target-mode must be on-axis or probe-averaged, was '" + targetMode + "'");
        }
        if (energy == null && targetN == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "give --energy or --power (or --target-n to find the energy)");
        }
        double pumpM = si(pump, Dimension.LENGTH, "--pump");
        double repHz = si(repRate, Dimension.FREQUENCY, "--rep-rate");
        Sample sample = sample(pumpM);
        BeamProfile pumpBeam = beam(pumpSpot.radius, pumpSpot.fwhm, pumpFlatTop, "--pump");
        BeamProfile probeBeam = beam(probeSpot.radius, probeSpot.fwhm, probeFlatTop, "--probe");
        double energyJ;
        if (energy == null) {
            energyJ = 1e-9;
        } else if (energy.energy != null) {
            energyJ = si(energy.energy, Dimension.ENERGY, "--energy");
        } else {
            energyJ = si(energy.power, Dimension.POWER, "--power") / repHz;
        }
        Excitation x = Excitation.of(sample, new Pulse(energyJ, pumpM, repHz), pumpBeam, probeBeam, !noDepthAverage);
        Double targetJ = null;
        Excitation.TargetMode mode = targetMode.equals("on-axis") ? Excitation.TargetMode.ON_AXIS : Excitation.TargetMode.PROBE_AVERAGED;
        if (targetN != null) {
            if (!(targetN > 0) || targetN.isInfinite()) {
                throw new IllegalArgumentException("--target-n must be > 0, was " + targetN);
            }
            targetJ = x.pulseEnergyForTargetJ(targetN, mode);
            if (energy == null) {
                x = x.withEnergyJ(targetJ);
            }
        }
        OccupancyUncertainty.Result u = OccupancyUncertainty.of(x, calibrationFlags.calibration().orDefaults(), x.crossSection().relativeUncertainty());
        PrintWriter out = format.equals("json") ? quiet.data() : quiet.summary();
        if (format.equals("json")) {
            ObjectNode root = json(x, targetJ);
            root.set("uncertainty", CalibrationFlags.json(u));
            out.print(ResolvedJson.toText(root));
        } else {
            text(x, targetJ, u, out);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private Sample sample(double pumpM) {
        Optional<SampleSpec.GivenCrossSection> given = Optional.ofNullable(crossSection)
                .map(c -> new SampleSpec.GivenCrossSection(si(c, Dimension.AREA, "--cross-section"), pumpM));
        MaterialLibrary library = MaterialLibrary.fromHome();
        Optional<AbsorptionSpectrum> spectrum = Optional.ofNullable(spectrumFile)
                .map(f -> AbsorptionSpectrumCsv.read(f, f.toString()));
        if (sampleFile != null) {
            for (String[] flag : new String[][] {{"--material", material}, {"--diameter", diameter}, {"--first-peak", firstPeak},
                    {"--od", od}, {"--od-at", odAt}, {"--concentration", concentration}, {"--path", path},
                    {"--matrix", matrix}, {"--dispersion", dispersion}}) {
                if (flag[1] != null) {
                    throw new CommandLine.ParameterException(spec.commandLine(), flag[0]
                            + " describes the sample, which already comes from " + sampleFile + " (use one or the other)");
                }
            }
            Sample fromFile = SampleCodec.read(sampleFile, library);
            if (given.isEmpty() && spectrum.isEmpty()) {
                return fromFile;
            }
            SampleSpec s = fromFile.spec();
            if (given.isPresent()) {
                s = s.withGivenCrossSection(given);
            }
            if (spectrum.isPresent()) {
                s = s.withSpectrum(spectrum);
            }
            return resolve(s);
        }
        if (material == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "give SAMPLE.json or describe the sample with --material");
        }
        Material m = library.material(material);
        if ((diameter == null) == (firstPeak == null)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "give exactly one of --diameter and --first-peak");
        }
        SampleSpec.Size size = diameter != null
                ? new SampleSpec.ByDiameter(si(diameter, Dimension.LENGTH, "--diameter"))
                : new SampleSpec.ByFirstPeak(si(firstPeak, Dimension.LENGTH, "--first-peak"));
        if ((od == null) == (concentration == null)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "give exactly one of --od and --concentration");
        }
        if (odAt != null && od == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--od-at needs --od");
        }
        SampleSpec.Amount amount;
        if (od != null) {
            double a = Quantity.parseSi(od, Dimension.ABSORBANCE);
            double at = odAt == null ? pumpM : odAt.equals("first-exciton") ? Double.NaN : si(odAt, Dimension.LENGTH, "--od-at");
            amount = new SampleSpec.Absorbance(a, at);
        } else {
            amount = new SampleSpec.Concentration(si(concentration, Dimension.CONCENTRATION, "--concentration"));
        }
        if (path == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "give the optical path length with --path (e.g. 1mm)");
        }
        double dispersionFraction = dispersion == null ? 0 : Quantity.parseSi(dispersion, Dimension.DIMENSIONLESS);
        Optional<Matrix> host = Optional.ofNullable(matrix).map(library::matrix);
        SampleSpec s = new SampleSpec(m.key() + " (from flags)", m, size, dispersionFraction, amount,
                si(path, Dimension.LENGTH, "--path"), host, Refresh.stationary(), spectrum, given);
        return resolve(s);
    }

    private static Sample resolve(SampleSpec s) {
        try {
            return Sample.resolve(s);
        } catch (SampleException e) {
            String flags = switch (e.part()) {
                case SIZE -> "--diameter/--first-peak";
                case AMOUNT -> "--od/--concentration";
                case CROSS_SECTION -> "--cross-section";
            };
            throw new IllegalArgumentException(flags + ": " + e.getMessage(), e);
        }
    }

    private BeamProfile beam(String radius, String fwhm, boolean flatTop, String prefix) {
        if (fwhm != null) {
            if (flatTop) {
                throw new CommandLine.ParameterException(spec.commandLine(), prefix + "-flat-top needs " + prefix + "-radius, not a FWHM");
            }
            return GaussianBeam.fromFwhm(si(fwhm, Dimension.LENGTH, prefix + "-fwhm"));
        }
        double r = si(radius, Dimension.LENGTH, prefix + "-radius");
        return flatTop ? new FlatTopBeam(r) : new GaussianBeam(r);
    }

    /** Energy fluence in the per-cm² unit that reads best (the lab never writes J/m²). */
    private static String fluence(double jPerM2) {
        double jPerCm2 = jPerM2 * 1e-4;
        String[] units = {"J/cm²", "mJ/cm²", "µJ/cm²", "nJ/cm²"};
        double scale = 1;
        for (String u : units) {
            if (jPerCm2 * scale >= 1 || u.equals("nJ/cm²")) {
                return SampleReport.num(jPerCm2 * scale, 4) + " " + u;
            }
            scale *= 1e3;
        }
        throw new AssertionError();
    }

    private static double si(String text, Dimension d, String flag) {
        double v;
        try {
            v = Quantity.parseSi(text, d);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(flag + ": " + e.getMessage(), e);
        }
        if (!(v > 0)) {
            throw new IllegalArgumentException(flag + ": must be > 0, was " + text);
        }
        return v;
    }

    private ObjectNode json(Excitation x, Double targetJ) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.excitation/1");
        ObjectNode sample = root.putObject("sample");
        SampleReport.json(x.sample(), sample);
        Sample s = x.sample();
        root.put("diameterNm", s.sizeM() * 1e9);
        double firstEv = s.firstExcitonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J;
        if (Double.isFinite(firstEv)) {
            root.put("firstExcitonEv", firstEv);
        } else {
            root.putNull("firstExcitonEv");
        }
        root.put("pumpWavelengthNm", x.pulse().wavelengthM() * 1e9);
        root.put("pumpPhotonEnergyEv", Photon.energyEv(x.pulse().wavelengthM()));
        root.put("pulseEnergyJ", x.pulse().energyJ());
        root.put("repetitionRateHz", x.pulse().repetitionRateHz());
        root.put("averagePowerW", x.pulse().averagePowerW());
        root.put("pumpProfile", x.geometry().pump().describe());
        root.put("probeProfile", x.geometry().probe().describe());
        root.put("pumpEffectiveAreaCm2", x.geometry().pump().effectiveAreaM2() * 1e4);
        root.put("crossSectionCm2", x.crossSection().crossSectionM2() * 1e4);
        root.put("extinctionPerMPerCm", x.crossSection().extinctionM2PerMol() * 10);
        root.put("crossSectionBasis", x.crossSection().basis());
        root.put("crossSectionApproximate", x.crossSection().approximate());
        root.put("energyFluencePeakJPerCm2", x.energyFluencePeakJPerM2() * 1e-4);
        root.put("photonFluencePeakPerCm2", x.photonFluencePeakPerM2() * 1e-4);
        root.put("nAvgPeak", x.nAvgPeak());
        root.put("nAvgProbeWeightedFrontFace", x.nAvgProbeWeightedFrontFace());
        root.put("nAvgOnAxisDepthAveraged", x.nAvgOnAxisDepthAveraged());
        root.put("nAvgProbeWeighted", x.nAvgProbeWeighted());
        root.put("excitedFractionProbeWeighted", x.excitedFractionProbeWeighted());
        root.put("depthAveraged", x.geometry().depthAveraged());
        root.put("absorbanceAtPumpOd", x.absorbanceAtPump());
        root.put("absorbedFraction", x.absorbedFraction());
        root.put("absorbedEnergyPerPulseJ", x.absorbedEnergyPerPulseJ());
        root.put("absorbedPowerW", x.absorbedPowerW());
        root.put("dotsInExcitedVolume", x.dotsInExcitedVolume());
        root.put("dotsInProbedVolume", x.dotsInProbedVolume());
        if (targetJ != null) {
            root.put("targetN", targetN);
            root.put("targetMode", targetMode);
            root.put("pulseEnergyForTargetJ", targetJ);
            root.put("averagePowerForTargetW", targetJ * x.pulse().repetitionRateHz());
        }
        SampleReport.advisoriesJson(x.advisories(), root.putArray("advisories"));
        return root;
    }

    private void text(Excitation x, Double targetJ, OccupancyUncertainty.Result u, PrintWriter out) {
        SampleReport.print(x.sample(), out);
        Pulse p = x.pulse();
        out.println("Pump     " + SampleReport.fmt(p.wavelengthM(), Dimension.LENGTH) + " (" + SampleReport.num(Photon.energyEv(p.wavelengthM()), 4)
                + " eV), " + SampleReport.fmt(p.energyJ(), Dimension.ENERGY) + " per pulse at "
                + SampleReport.fmt(p.repetitionRateHz(), Dimension.FREQUENCY) + " (" + SampleReport.fmt(p.averagePowerW(), Dimension.POWER)
                + "), " + x.geometry().pump().describe());
        out.println("Probe    " + x.geometry().probe().describe());
        out.println("σ        " + SampleReport.num(x.crossSection().crossSectionM2() * 1e4, 4) + " cm² (ε = "
                + SampleReport.num(x.crossSection().extinctionM2PerMol() * 10, 4) + " M⁻¹cm⁻¹): " + x.crossSection().basis());
        out.println("Fluence  peak " + fluence(x.energyFluencePeakJPerM2()) + " = "
                + SampleReport.num(x.photonFluencePeakPerM2() * 1e-4, 4) + " photons/cm²");
        out.println("⟨N⟩      " + SampleReport.num(x.nAvgPeak(), 4) + " on the pump axis (front face); probe-weighted "
                + SampleReport.num(x.nAvgProbeWeightedFrontFace(), 4) + " (front face), "
                + SampleReport.num(x.nAvgProbeWeighted(), 4) + (x.geometry().depthAveraged() ? " (spot and depth)" : " (no depth average)"));
        out.println(CalibrationFlags.line(x.nAvgProbeWeighted(), u));
        out.println("Excited  " + SampleReport.pct(x.excitedFractionProbeWeighted()) + " of the probed dots hold at least one exciton "
                + "(probe-weighted 1 − e^−⟨N⟩)");
        out.println("Absorbed " + SampleReport.num(x.absorbanceAtPump(), 3) + " OD at the pump: " + SampleReport.pct(x.absorbedFraction())
                + " of each pulse, " + SampleReport.fmt(x.absorbedEnergyPerPulseJ(), Dimension.ENERGY) + " per pulse, "
                + SampleReport.fmt(x.absorbedPowerW(), Dimension.POWER) + " average");
        out.println("Dots     " + SampleReport.num(x.dotsInExcitedVolume(), 3) + " in the excited volume, "
                + SampleReport.num(x.dotsInProbedVolume(), 3) + " in the probed volume");
        if (targetJ != null) {
            out.println(String.format(Locale.ROOT, "Target   ⟨N⟩ = %s %s needs %s per pulse (%s at %s)", SampleReport.num(targetN, 4),
                    targetMode.equals("on-axis") ? "on the pump axis" : "averaged over the probe",
                    SampleReport.fmt(targetJ, Dimension.ENERGY), SampleReport.fmt(targetJ * p.repetitionRateHz(), Dimension.POWER),
                    SampleReport.fmt(p.repetitionRateHz(), Dimension.FREQUENCY)));
        }
        SampleReport.printAdvisories(x.advisories(), out);
        out.println("Safety   Class 4 pulsed lasers can blind and burn: follow your institution's laser safety officer and local rules."
                + (x.sample().spec().matrix().map(m -> m.kind() == Matrix.Kind.SOLVENT).orElse(false)
                ? " Absorbed power heats the solvent; keep flammable solvents well below their boiling point." : ""));
    }
}
