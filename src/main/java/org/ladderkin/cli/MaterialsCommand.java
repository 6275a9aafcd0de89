package org.ladderkin.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.material.AbsorptionLaw;
import org.ladderkin.material.Material;
import org.ladderkin.material.SizingCurve;
import org.ladderkin.material.Sourced;
import org.ladderkin.sample.Matrix;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ladderkin materials [KEY]}: lists the material library, or shows one material with every value's source. */
@Command(name = "materials", mixinStandardHelpOptions = true,
        header = "List the materials and hosts, or show one with its sources.",
        description = "List the materials and hosts in models/, or show one with every value and its source. Values"
            + " marked 'from memory' or 'common practice' are defaults to replace with your own.")
final class MaterialsCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(index = "0", arity = "0..1", paramLabel = "KEY", description = "material or host key, e.g. CdSe or toluene")
    String key;

    @Override
    public Integer call() {
        MaterialLibrary lib = MaterialLibrary.fromHome();
        PrintWriter out = quiet.summary();
        if (key == null) {
            list(lib, out);
        } else if (lib.materials().stream().anyMatch(m -> m.key().equalsIgnoreCase(key))) {
            show(lib.material(key), out);
        } else if (lib.matrices().stream().anyMatch(m -> m.key().equalsIgnoreCase(key))) {
            show(lib.matrix(key), out);
        } else {
            throw new IllegalArgumentException("unknown material or host '" + key + "' (materials: "
                    + String.join(", ", lib.materials().stream().map(Material::key).toList()) + "; hosts: "
                    + String.join(", ", lib.matrices().stream().map(Matrix::key).toList()) + ")");
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static void list(MaterialLibrary lib, PrintWriter out) {
        out.println(String.format(Locale.ROOT, "%-9s %-44s %-9s %-20s %s", "key", "name", "bulk gap", "sizing curve", "absorption laws"));
        for (Material m : lib.materials()) {
            String sizing = m.sizing().map(c -> String.format(Locale.ROOT, "%.3g–%.3g nm", c.minDiameterM() * 1e9, c.maxDiameterM() * 1e9))
                    .orElse("none (give size)");
            String laws = (m.firstExcitonAbsorption().isPresent() ? "first exciton" : "")
                    + (m.firstExcitonAbsorption().isPresent() && m.highEnergyAbsorption().isPresent() ? ", " : "")
                    + m.highEnergyAbsorption().map(h -> String.format(Locale.ROOT, "%.0f nm", h.wavelengthM() * 1e9)).orElse("");
            out.println(String.format(Locale.ROOT, "%-9s %-44s %-9s %-20s %s", m.key(), m.name(),
                    m.bulkGapJ().known() ? String.format(Locale.ROOT, "%.3f eV", m.bulkGapJ().value() / PhysicalConstants.ELECTRONVOLT_J) : "?",
                    sizing, laws.isEmpty() ? "none (give σ)" : laws));
        }
        out.println();
        out.println("Hosts: " + String.join(", ", lib.matrices().stream().map(x -> x.key() + " (" + x.kind().name().toLowerCase(Locale.ROOT) + ")").toList()));
        out.println("Show one with its sources: ladderkin materials KEY");
    }

    private static void show(Material m, PrintWriter out) {
        out.println(m.key() + " — " + m.name() + " (" + m.shape().name().toLowerCase(Locale.ROOT) + "s; size means "
                + (m.shape() == org.ladderkin.material.Shape.CUBE ? "the edge" : "the diameter") + ")");
        row(out, "bulk gap", m.bulkGapJ(), v -> String.format(Locale.ROOT, "%.4g eV", v / PhysicalConstants.ELECTRONVOLT_J));
        row(out, "molar mass", m.molarMassKgPerMol(), v -> String.format(Locale.ROOT, "%.6g g/mol", v * 1e3));
        row(out, "density", m.densityKgPerM3(), v -> SampleReport.fmt(v, Dimension.DENSITY));
        row(out, "specific heat", m.specificHeatJPerKgK(), v -> SampleReport.fmt(v, Dimension.SPECIFIC_HEAT));
        row(out, "refractive index", m.refractiveIndex(), v -> SampleReport.num(v, 3));
        row(out, "electron degeneracy", m.electronDegeneracy(), v -> SampleReport.num(v, 3));
        row(out, "hole degeneracy", m.holeDegeneracy(), v -> SampleReport.num(v, 3));
        if (m.sizing().isPresent()) {
            SizingCurve c = m.sizing().get();
            out.println(String.format(Locale.ROOT, "  %-26s %s, valid for %.3g–%.3g nm", "sizing curve", c.formula(),
                    c.minDiameterM() * 1e9, c.maxDiameterM() * 1e9));
            out.println("  " + " ".repeat(27) + "source: " + c.source());
        } else {
            out.println(String.format(Locale.ROOT, "  %-26s none in the library: give the size measured on your sample", "sizing curve"));
        }
        law(out, "absorption, first exciton", m.firstExcitonAbsorption().orElse(null));
        law(out, "absorption, high energy", m.highEnergyAbsorption().orElse(null));
        row(out, "Auger constant τ₂/V", m.augerVolumeConstantSPerM3(), v -> SampleReport.num(v * 1e12 * 1e-27, 3) + " ps/nm³");
        row(out, "single-exciton lifetime", m.singleExcitonLifetimeS(), v -> SampleReport.fmt(v, Dimension.TIME));
        row(out, "trion lifetime", m.trionLifetimeS(), v -> SampleReport.fmt(v, Dimension.TIME));
        if (!m.notes().isEmpty()) {
            out.println("Notes: " + m.notes());
        }
    }

    private static void show(Matrix x, PrintWriter out) {
        out.println(x.key() + " — " + x.name() + " (" + x.kind().name().toLowerCase(Locale.ROOT) + ")");
        row(out, "density", x.densityKgPerM3(), v -> SampleReport.fmt(v, Dimension.DENSITY));
        row(out, "specific heat", x.specificHeatJPerKgK(), v -> SampleReport.fmt(v, Dimension.SPECIFIC_HEAT));
        row(out, "thermal conductivity", x.thermalConductivityWPerMK(), v -> SampleReport.fmt(v, Dimension.THERMAL_CONDUCTIVITY));
        row(out, "boiling point", x.boilingPointK(), v -> String.format(Locale.ROOT, "%.1f °C", v - PhysicalConstants.CELSIUS_ZERO_K));
        if (x.kind() == Matrix.Kind.SOLVENT) {
            out.println("Caution: organic solvents are flammable; laser heating must stay well below the boiling point.");
        }
    }

    private static void law(PrintWriter out, String label, AbsorptionLaw law) {
        if (law == null) {
            out.println(String.format(Locale.ROOT, "  %-26s none in the library", label));
            return;
        }
        String where = law.atFirstExciton() ? "at the first-exciton peak" : String.format(Locale.ROOT, "at %.0f nm", law.wavelengthM() * 1e9);
        String length = law.length().name().toLowerCase(Locale.ROOT);
        String unit = SampleReport.fmt(law.lengthUnitM(), Dimension.LENGTH).replaceFirst("^1 ", "");
        String coefficient = law.publishedAsExtinction()
                ? "ε = " + SampleReport.num(AbsorptionLaw.extinctionM2PerMol(law.coefficientM2()) * 10, 5) + " M⁻¹cm⁻¹"
                : "σ = " + SampleReport.num(law.coefficientM2() * 1e4, 5) + " cm²";
        out.println(String.format(Locale.ROOT, "  %-26s %s × (%s / %s)^%s %s", label, coefficient, length, unit,
                SampleReport.num(law.exponent(), 4), where));
        out.println("  " + " ".repeat(27) + "source: " + law.source());
    }

    private static void row(PrintWriter out, String label, Sourced s, java.util.function.DoubleFunction<String> f) {
        String mark = s.known() && s.unconfirmed() ? "   [unconfirmed: replace with your own value]" : "";
        out.println(String.format(Locale.ROOT, "  %-26s %s%s", label, s.known() ? f.apply(s.value()) : "unknown", mark));
        out.println("  " + " ".repeat(27) + "source: " + s.source());
    }
}
