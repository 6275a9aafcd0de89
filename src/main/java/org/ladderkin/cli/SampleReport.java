package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.ladderkin.sample.Advisory;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.SampleSpec;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Quantity;

/** How a resolved sample is shown: a few text lines, and JSON keys with the unit in each key. */
final class SampleReport {

    private SampleReport() {
    }

    static void print(Sample s, PrintWriter out) {
        SampleSpec spec = s.spec();
        String size = spec.material().shape() == org.ladderkin.material.Shape.CUBE ? "edge " : "diameter ";
        String sizeText = size + fmt(s.sizeM(), Dimension.LENGTH);
        if (spec.size() instanceof SampleSpec.ByFirstPeak p) {
            sizeText += " (from the first-exciton peak at " + fmt(p.wavelengthM(), Dimension.LENGTH) + " = "
                    + num(s.firstExcitonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J, 4) + " eV)";
        } else if (!Double.isNaN(s.firstExcitonEnergyJ())) {
            sizeText += " (first-exciton peak expected at " + fmt(s.firstExcitonWavelengthM(), Dimension.LENGTH) + ")";
        }
        out.println("Sample   " + spec.name() + " — " + spec.material().key() + ", " + sizeText
                + ", size dispersion " + pct(spec.sizeDispersion()));
        String amount = spec.amount() instanceof SampleSpec.Absorbance a
                ? " (from " + num(a.od(), 3) + " OD at " + (a.atFirstExciton() ? "the first exciton" : fmt(a.wavelengthM(), Dimension.LENGTH)) + ")"
                : "";
        out.println("         concentration " + fmt(s.concentrationMolPerM3(), Dimension.CONCENTRATION) + amount + ", "
                + num(s.numberDensityPerM3() * 1e-6, 3) + " dots/cm³, path " + fmt(spec.pathLengthM(), Dimension.LENGTH)
                + spec.matrix().map(m -> ", in " + m.name()).orElse("") + ", " + spec.refresh().key()
                + (spec.refresh().mode() == org.ladderkin.sample.Refresh.Mode.FLOWING
                ? " at " + fmt(spec.refresh().flowRateM3PerS(), Dimension.VOLUMETRIC_FLOW) + " through "
                + org.ladderkin.material.Numbers.sig(spec.refresh().cellVolumeM3() * 1e6, 4) + " mL"
                : spec.refresh().mode() == org.ladderkin.sample.Refresh.Mode.TRANSLATED
                ? " at " + fmt(spec.refresh().speedMPerS(), Dimension.SPEED) : ""));
        spec.spectrum().ifPresent(sp -> out.println("         absorption spectrum " + sp.origin()));
        if (!spec.material().notes().isEmpty()) {
            out.println("         " + spec.material().notes());
        }
    }

    static void json(Sample s, ObjectNode o) {
        SampleSpec spec = s.spec();
        o.put("name", spec.name());
        o.put("material", spec.material().key());
        o.put("shape", spec.material().shape().name().toLowerCase(Locale.ROOT));
        o.put("sizeGivenBy", spec.size() instanceof SampleSpec.ByDiameter ? "diameter" : "first-exciton-peak");
        o.put("diameterNm", s.sizeM() * 1e9);
        putMaybe(o, "firstExcitonEv", s.firstExcitonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J);
        putMaybe(o, "firstExcitonNm", s.firstExcitonWavelengthM() * 1e9);
        o.put("sizeDispersion", spec.sizeDispersion());
        o.put("dotVolumeNm3", s.dotVolumeM3() * 1e27);
        o.put("concentrationMicroMolar", s.concentrationMolPerM3() * 1e3);
        o.put("dotsPerCm3", s.numberDensityPerM3() * 1e-6);
        if (spec.amount() instanceof SampleSpec.Absorbance a) {
            o.put("measuredAbsorbanceOd", a.od());
            if (a.atFirstExciton()) {
                o.put("measuredAbsorbanceAt", "first-exciton");
            } else {
                o.put("measuredAbsorbanceAtNm", a.wavelengthM() * 1e9);
            }
        }
        o.put("pathLengthMm", spec.pathLengthM() * 1e3);
        spec.matrix().ifPresent(m -> o.put("matrix", m.key()));
        o.put("refresh", spec.refresh().key());
        if (spec.refresh().mode() == org.ladderkin.sample.Refresh.Mode.FLOWING) {
            o.put("flowRateMlPerMin", spec.refresh().flowRateM3PerS() * 6e7);
            o.put("cellVolumeMl", spec.refresh().cellVolumeM3() * 1e6);
            o.put("exchangeTimeS", spec.refresh().exchangeTimeS());
        }
        if (spec.refresh().mode() == org.ladderkin.sample.Refresh.Mode.TRANSLATED) {
            o.put("translationSpeedMmPerS", spec.refresh().speedMPerS() * 1e3);
        }
        spec.spectrum().ifPresent(sp -> o.put("absorptionSpectrum", sp.origin()));
        double tau2 = spec.material().biexcitonAugerLifetimeS(s.sizeM());
        putMaybe(o, "biexcitonAugerLifetimeEstimatePs", tau2 * 1e12);
    }

    static void advisoriesJson(List<Advisory> advisories, ArrayNode arr) {
        for (Advisory a : advisories) {
            ObjectNode n = arr.addObject();
            n.put("kind", a.key());
            n.put("message", a.message());
        }
    }

    static void printAdvisories(List<Advisory> advisories, PrintWriter out) {
        for (Advisory a : advisories) {
            out.println("Note     ! " + a.message());
        }
    }

    private static void putMaybe(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    static String fmt(double si, Dimension d) {
        return Quantity.formatBest(si, d, 4);
    }

    static String num(double v, int significant) {
        String s = String.format(Locale.ROOT, "%." + significant + "g", v);
        if (s.contains("e")) {
            return s;
        }
        return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }

    static String pct(double fraction) {
        return org.ladderkin.material.Numbers.sig(fraction * 100, 3) + " %";
    }
}
