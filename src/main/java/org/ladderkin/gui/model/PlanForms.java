package org.ladderkin.gui.model;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ladderkin.plan.Goal;
import org.ladderkin.plan.Instrument;
import org.ladderkin.kinetics.process.ParameterKind;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.units.Dimension;

/**
 * The field tables behind the plan editor's forms (schema {@code ladderkin.plan/1}). Each form is a list of
 * {@link FieldSpec}s; when the plan schema changes, these tables change and the views follow.
 */
public final class PlanForms {

    /** Material keys of the library under {@code ladderkin.home}, empty when it cannot be read. */
    private static final List<String> LIBRARY_MATERIALS = libraryKeys(true);
    /** Matrix keys of the library, empty when it cannot be read. */
    private static final List<String> LIBRARY_MATRICES = libraryKeys(false);

    /**
     * A pick list of the library's keys; a plain text field when the library is unavailable (the plan reader still
     * checks the key and names the file, line and field).
     */
    private static FieldSpec libraryChoice(String label, String path, List<String> keys, String help) {
        return keys.isEmpty() ? FieldSpec.text(label, path, false, help) : FieldSpec.choice(label, path, keys, help);
    }

    private static List<String> libraryKeys(boolean materials) {
        try {
            org.ladderkin.io.MaterialLibrary library = org.ladderkin.io.MaterialLibrary.fromHome();
            return materials ? library.materials().stream().map(m -> m.key()).sorted().toList()
                    : library.matrices().stream().map(m -> m.key()).sorted().toList();
        } catch (RuntimeException e) {
            return List.of();
        }
    }

    /** Sample section: a plain table of (label, JSON path, kind) so a schema change is a one-line edit. */
    public static final List<FieldSpec> SAMPLE = List.of(
            FieldSpec.text("Title", "title", false, "one line naming the campaign"),
            FieldSpec.text("Lab", "lab", true, "who runs the campaign"),
            FieldSpec.text("Sample name", "sample.name", false, "your name for the batch"),
            libraryChoice("Material", "sample.material", LIBRARY_MATERIALS, "material from the library (see 'ladderkin materials')"),
            FieldSpec.optionalQuantity("Diameter", "sample.diameter", Dimension.LENGTH,
                    "core diameter (sets the volume); give it, the first-exciton peak, or both"),
            FieldSpec.optionalQuantity("First-exciton peak", "sample.firstExcitonPeak", Dimension.LENGTH,
                    "measured first absorption peak (sets E₁S); alone it needs the material's sizing curve, "
                            + "beside the diameter the peak sets E₁S and the size the volume"),
            FieldSpec.fraction("Size dispersion", "sample.sizeDispersion", true,
                    "relative standard deviation of the diameter, e.g. 6 %"),
            FieldSpec.optionalQuantity("Absorbance", "sample.absorbance.value", Dimension.ABSORBANCE,
                    "measured decadic absorbance over the path length; give either this or the concentration"),
            FieldSpec.text("Absorbance measured at", "sample.absorbance.at", true,
                    "\"first-exciton\" or a wavelength such as \"400 nm\""),
            FieldSpec.optionalQuantity("Concentration", "sample.concentration", Dimension.CONCENTRATION,
                    "dot concentration, if known instead of the absorbance"),
            FieldSpec.file("Absorption spectrum", "sample.absorptionSpectrum", List.of("csv", "tsv", "txt"),
                    "measured spectrum (CSV wavelength_nm,absorbance) that scales σ to the pump wavelength; "
                            + "choose or drop a file, kept relative to the plan's folder"),
            FieldSpec.optionalQuantity("Cross-section", "sample.crossSection.value", Dimension.AREA,
                    "your measured absorption cross-section, overriding the material's law"),
            FieldSpec.optionalQuantity("Cross-section measured at", "sample.crossSection.at", Dimension.LENGTH,
                    "wavelength where your cross-section holds"),
            FieldSpec.quantity("Path length", "sample.pathLength", Dimension.LENGTH, "optical path length of the cell or film"),
            libraryChoice("Matrix", "sample.matrix", LIBRARY_MATRICES, "solvent or film host from the library"),
            FieldSpec.choice("Refresh", "sample.refresh.mode", List.of("static", "stirred", "flowing",
                    "translated"), "how the excited volume is renewed between pulses (a film: translated under the beam)"),
            FieldSpec.optionalQuantity("Flow rate", "sample.refresh.flowRate", Dimension.VOLUMETRIC_FLOW,
                    "volumetric flow, only for a flowing cell"),
            FieldSpec.optionalQuantity("Cell volume", "sample.refresh.cellVolume", Dimension.VOLUME,
                    "volume of the flow cell, only for a flowing cell"),
            FieldSpec.optionalQuantity("Translation speed", "sample.refresh.speed", Dimension.SPEED,
                    "speed the film moves under the beam, only when translated (a fresh spot every pump diameter / speed)"));

    /** Laser and geometry. */
    public static final List<FieldSpec> LASER = List.of(
            FieldSpec.quantityList("Pump wavelengths", "laser.pumpWavelengths", Dimension.LENGTH,
                    "comma-separated, e.g. 400 nm, 515 nm"),
            FieldSpec.quantity("Repetition rate", "laser.repetitionRate", Dimension.FREQUENCY, "amplifier or oscillator rate"),
            FieldSpec.integerList("Pulse picker ÷", "laser.pulsePickerDivisions", true,
                    "divisions of the repetition rate the picker offers, e.g. 1, 2, 5, 10"),
            FieldSpec.quantity("Pulse width", "laser.pulseWidth", Dimension.TIME, "pump intensity FWHM"),
            FieldSpec.quantity("Lowest pulse energy", "laser.pulseEnergyRange[0]", Dimension.ENERGY,
                    "lowest pump pulse energy that can be set"),
            FieldSpec.quantity("Highest pulse energy", "laser.pulseEnergyRange[1]", Dimension.ENERGY,
                    "highest pump pulse energy available"),
            FieldSpec.optionalQuantity("Pump radius", "laser.pumpRadius", Dimension.LENGTH,
                    "pump 1/e² intensity radius at the sample; blank when a pump beam file measures it"),
            FieldSpec.file("Pump beam file", "laser.pumpBeamFile", List.of("csv", "tsv", "txt", "png"),
                    "knife-edge scan or camera frame that measures the pump radius and its uncertainty; choose or drop a file"),
            FieldSpec.optionalQuantity("Probe radius", "laser.probeRadius", Dimension.LENGTH,
                    "probe 1/e² intensity radius at the sample; blank when a probe beam file measures it"),
            FieldSpec.file("Probe beam file", "laser.probeBeamFile", List.of("csv", "tsv", "txt", "png"),
                    "knife-edge scan or camera frame that measures the probe radius and its uncertainty; choose or drop a file"),
            FieldSpec.optionalQuantity("Camera pixel pitch", "laser.beamPixelPitch", Dimension.LENGTH,
                    "needed when a beam file is a camera frame, e.g. 5.5 µm"),
            FieldSpec.fraction("Pulse-energy uncertainty", "laser.pulseEnergyUncertainty", true,
                    "relative uncertainty of the pulse energy (power meter); blank: 5 %"),
            FieldSpec.fraction("Pump-radius uncertainty", "laser.pumpRadiusUncertainty", true,
                    "relative uncertainty of the pump radius; blank: 5 %, or a beam file's own"),
            FieldSpec.fraction("Probe-radius uncertainty", "laser.probeRadiusUncertainty", true,
                    "relative uncertainty of the probe radius; blank: the pump's, or a beam file's own"),
            FieldSpec.fraction("Cross-section uncertainty", "laser.crossSectionUncertainty", true,
                    "relative uncertainty of σ at the pump; blank: what σ's law or measurement states"),
            FieldSpec.fraction("Pump fluctuation", "laser.pumpFluctuation", true,
                    "rms shot-to-shot fluctuation of the pump per averaged point; blank: the default"),
            FieldSpec.fraction("Pump drift per hour", "laser.pumpDriftPerHour", true,
                    "slow drift of the pump between scans; blank: the default"));

    /** Goals and limits. */
    public static final List<FieldSpec> GOALS_AND_LIMITS = List.of(
            FieldSpec.keySet("Measure", "goals.measure", Arrays.stream(Goal.values()).map(Goal::key).toList(),
                    "what the campaign sets out to measure").withChoiceLabels(goalWords()),
            FieldSpec.quantityList("Multiplication photon energies", "goals.multiplicationPhotonEnergies", Dimension.ENERGY,
                    "photon energies for the multiplication yield, e.g. 3.1 eV (only when measuring the carrier-multiplication yield)")
                    .asOptional(),
            FieldSpec.quantity("Max temperature rise", "limits.maxTemperatureRise", Dimension.TEMPERATURE,
                    "highest tolerated steady-state rise, in K"),
            FieldSpec.fraction("Max charged fraction", "limits.maxChargedFraction", false,
                    "highest tolerated fraction of photocharged dots"),
            FieldSpec.fraction("Max residual excitation", "limits.maxResidualExcitation", false,
                    "highest tolerated fraction of dots still excited at the next pulse"),
            FieldSpec.quantity("Beam time", "limits.beamTime", Dimension.TIME, "measurement time available"));

    /**
     * The optional {@code model} section: values that replace the ones the planner derives from the material. Blank
     * means "derive it"; the fit view writes τ₂ (and, where the mapping is exact, τ₁ and σ) here.
     */
    public static final List<FieldSpec> MODEL = withRegistryFields(List.of(
            FieldSpec.optionalQuantity("Single-exciton lifetime τ₁", "model.singleExcitonLifetime", Dimension.TIME,
                    "total single-exciton decay (radiative and trapping); blank: from the material library"),
            FieldSpec.fraction("PL quantum yield", "model.plQuantumYield", true,
                    "splits τ₁ into radiative QY/τ₁ and trapping (1 − QY)/τ₁; blank: the default"),
            FieldSpec.optionalQuantity("Biexciton lifetime τ₂", "model.biexcitonLifetime", Dimension.TIME,
                    "biexciton Auger lifetime; blank: Auger volume scaling of the material"),
            optionalChoice("Auger scaling", "model.augerScaling", List.of("statistical", "pairs", "quadratic"),
                    "how Auger rates grow with the number of excitons; blank: statistical"),
            optionalChoice("Radiative scaling", "model.radiativeScaling", List.of("linear", "statistical"),
                    "how radiative rates grow with the number of excitons; blank: statistical"),
            FieldSpec.optionalQuantity("Negative-trion lifetime", "model.negativeTrionLifetime", Dimension.TIME,
                    "Auger lifetime of X⁻; blank: from the material or 4·τ₂"),
            FieldSpec.optionalQuantity("Positive-trion lifetime", "model.positiveTrionLifetime", Dimension.TIME,
                    "Auger lifetime of X⁺; blank: from 1/τ₂ = 2/τ_X− + 2/τ_X+"),
            FieldSpec.fraction("Auger ionisation probability", "model.ionisationProbability", true,
                    "chance that an Auger event ejects a carrier; blank: the default"),
            FieldSpec.optionalQuantity("Photocharge lifetime", "model.photochargeLifetime", Dimension.TIME,
                    "how long an ejected charge stays away; blank: the default"),
            FieldSpec.optionalQuantity("Cooling time", "model.coolingTime", Dimension.TIME,
                    "intraband cooling time, used for delay windows; blank: the default")));

    /** Each goal in words, as a sentence starts: "Biexciton Auger lifetime τ2" for "biexciton-auger". */
    private static Map<String, String> goalWords() {
        Map<String, String> words = new LinkedHashMap<>();
        for (Goal g : Goal.values()) {
            String d = g.description();
            words.put(g.key(), Character.toUpperCase(d.charAt(0)) + d.substring(1));
        }
        return words;
    }

    /** The plan's own model fields, then one per process parameter a plan may set through the registry. */
    private static List<FieldSpec> withRegistryFields(List<FieldSpec> own) {
        List<FieldSpec> all = new ArrayList<>(own);
        for (ProcessParameter p : ProcessRegistry.planParameters()) {
            if (p.kind() != ParameterKind.LIFETIME) {
                throw new IllegalStateException("the planner's form shows registry lifetimes only, not " + p.key());
            }
            all.add(FieldSpec.optionalQuantity(p.label(), "model." + p.planKey(), Dimension.TIME, p.help()));
        }
        return List.copyOf(all);
    }

    /** A pick list with a blank first entry that removes the key. */
    private static FieldSpec optionalChoice(String label, String path, List<String> choices, String help) {
        List<String> withBlank = new ArrayList<>();
        withBlank.add("");
        withBlank.addAll(choices);
        return new FieldSpec(label, JsonPath.of(path), FieldSpec.Kind.CHOICE, null, withBlank, true, help);
    }

    private PlanForms() {
    }

    /** The fields of instrument {@code index} of the document, chosen by its {@code kind}. */
    public static List<FieldSpec> instrument(JsonNode document, int index) {
        String p = "instruments[" + index + "].";
        String kind = instrumentKind(document, index);
        List<FieldSpec> fields = new ArrayList<>();
        if (kind.equals(Instrument.Kind.TCSPC.key())) {
            fields.add(FieldSpec.quantity("Time bin", p + "timeBin", Dimension.TIME, "width of one TCSPC histogram bin"));
            fields.add(FieldSpec.quantity("Time range", p + "timeRange", Dimension.TIME, "span of the TCSPC histogram"));
            irf(fields, p);
            fields.add(FieldSpec.fraction("Max count fraction", p + "maxCountFraction", true,
                    "highest detected-photon rate as a fraction of the repetition rate"));
        } else {
            fields.add(FieldSpec.quantity("Shortest delay", p + "delayRange[0]", Dimension.TIME, "first useful delay"));
            fields.add(FieldSpec.quantity("Longest delay", p + "delayRange[1]", Dimension.TIME, "longest delay the stage reaches"));
            fields.add(FieldSpec.quantity("Noise floor", p + "noiseFloor", Dimension.ABSORBANCE, "rms ΔA noise per averaged point"));
            irf(fields, p);
        }
        return List.copyOf(fields);
    }

    /** The instrument response: a Gaussian width or a measured table, one of the two (the reader refuses both). */
    private static void irf(List<FieldSpec> fields, String p) {
        fields.add(FieldSpec.optionalQuantity("IRF FWHM", p + "irfFwhm", Dimension.TIME,
                "instrument response width (a Gaussian); leave empty when an IRF file is given"));
        fields.add(FieldSpec.file("IRF file", p + "irfFile", List.of("csv", "tsv", "txt"),
                "measured response, a table 'time (ps),response' (kept relative to the plan's folder), instead of the "
                        + "FWHM; choose or drop a file"));
    }

    /** How many instruments the document lists (0 when the list is missing). */
    public static int instrumentCount(JsonNode document) {
        JsonNode n = document.get("instruments");
        return n != null && n.isArray() ? n.size() : 0;
    }

    /** The {@code kind} of instrument {@code index}, or "" when missing. */
    public static String instrumentKind(JsonNode document, int index) {
        return document.at(com.fasterxml.jackson.core.JsonPointer.empty().appendProperty("instruments")
                .appendIndex(index).appendProperty("kind")).asText("");
    }
}
