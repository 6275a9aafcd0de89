package org.ladderkin.sample;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.material.BandAlignment;
import org.ladderkin.material.Material;
import org.ladderkin.units.PhysicalConstants;

class CoreShellTest {

    static final MaterialLibrary LIB = MaterialLibrary.load(Path.of(System.getProperty("ladderkin.home", ".")));
    static final Material CDSE = LIB.material("CdSe");
    static final double MEV = 1e-3 * PhysicalConstants.ELECTRONVOLT_J;

    static Shell shell(String core, String shell, Shell.Thickness t, BandAlignment given, boolean alloyed) {
        return Shell.of(LIB.material(core), LIB.material(shell), t, Optional.ofNullable(given), alloyed, Double.NaN, Double.NaN,
                Double.NaN);
    }

    static Sample sample(Shell shell, double diameterM) {
        return Sample.resolve(new SampleSpec("t", CDSE, new SampleSpec.ByDiameter(diameterM), 0.05,
                new SampleSpec.Concentration(1e-3), 1e-3, Optional.empty(), Refresh.stationary(), Optional.empty(),
                Optional.empty(), Optional.ofNullable(shell)));
    }

    @Test
    void monolayersBecomeLengthsThroughTheLatticeConstant() {
        Shell cds = shell("CdSe", "CdS", new Shell.Monolayers(16), null, false);
        assertThat(cds.thicknessM()).isCloseTo(16 * 0.336e-9, offset(1e-15));
        assertThat(cds.monolayers()).isEqualTo(16);
        Shell zns = shell("CdSe", "ZnS", new Shell.Monolayers(2), null, false);
        assertThat(zns.thicknessM()).isCloseTo(2 * 0.312e-9, offset(1e-15));
        assertThatThrownBy(() -> shell("CdSe", "PbSe", new Shell.Monolayers(2), BandAlignment.TYPE_I, false))
                .hasMessageContaining("no lattice constant for PbSe");
    }

    @Test
    void alignmentDefaultsFollowTheBandEdges() {
        assertThat(shell("CdSe", "ZnS", new Shell.Length(1e-9), null, false).alignment()).isEqualTo(BandAlignment.TYPE_I);
        assertThat(shell("CdSe", "CdS", new Shell.Length(1e-9), null, false).alignment()).isEqualTo(BandAlignment.QUASI_TYPE_II);
        assertThat(shell("CdSe", "CdTe", new Shell.Length(1e-9), null, false).alignment()).isEqualTo(BandAlignment.TYPE_II);
        assertThat(shell("CdS", "ZnSe", new Shell.Length(1e-9), null, false).alignment()).isEqualTo(BandAlignment.TYPE_II);
        Shell cds = shell("CdSe", "CdS", new Shell.Length(1e-9), null, false);
        assertThat(cds.alignmentBasis()).contains("conduction-band step +0.16 eV").contains("from memory");
        assertThat(cds.alignmentWarning()).isEmpty();
        assertThatThrownBy(() -> shell("CdSe", "PbSe", new Shell.Length(1e-9), null, false))
                .hasMessageContaining("no band edges for CdSe/PbSe").hasMessageContaining("give \"alignment\"");
    }

    @Test
    void anAlignmentThatContradictsTheBandEdgesIsAWarningNotAnError() {
        Shell s = shell("CdSe", "ZnS", new Shell.Length(1e-9), BandAlignment.TYPE_II, false);
        assertThat(s.alignment()).isEqualTo(BandAlignment.TYPE_II);
        assertThat(s.alignmentWarning()).contains("type-II, contradicts the type-I");
        Sample sample = sample(s, 4e-9);
        assertThat(sample.advisories()).anySatisfy(a -> assertThat(a.kind()).isEqualTo(Advisory.Kind.SHELL_ALIGNMENT));
        assertThat(sample(shell("CdSe", "ZnS", new Shell.Length(1e-9), BandAlignment.TYPE_I, false), 4e-9).advisories())
                .noneSatisfy(a -> assertThat(a.kind()).isEqualTo(Advisory.Kind.SHELL_ALIGNMENT));
    }

    @Test
    void thicknessBeyondTwentyNanometresIsRefused() {
        assertThatThrownBy(() -> shell("CdSe", "CdS", new Shell.Length(21e-9), null, false))
                .hasMessageContaining("shell thickness must be in (0, 20 nm]");
    }

    @Test
    void augerVolumeFollowsAlignmentAndInterface() {
        double d = 4e-9;
        double h = 1e-9;
        double core = Math.PI / 6 * d * d * d;
        double total = Math.PI / 6 * Math.pow(d + 2 * h, 3);
        CoreShell typeI = CoreShell.of(sample(shell("CdSe", "ZnS", new Shell.Length(h), null, false), d)).orElseThrow();
        CoreShell alloyed = CoreShell.of(sample(shell("CdSe", "ZnS", new Shell.Length(h), null, true), d)).orElseThrow();
        CoreShell quasi = CoreShell.of(sample(shell("CdSe", "CdS", new Shell.Length(h), null, false), d)).orElseThrow();
        assertThat(typeI.augerVolumeM3()).isCloseTo(core, offset(core * 1e-12));
        assertThat(alloyed.augerVolumeM3()).isCloseTo(total, offset(total * 1e-12));
        assertThat(quasi.augerVolumeM3()).isCloseTo(total, offset(total * 1e-12));
        assertThat(typeI.overlap()).isEqualTo(1);
        assertThat(quasi.overlap()).isCloseTo(core / total, offset(1e-12));
        CoreShell giant = CoreShell.of(sample(shell("CdSe", "CdS", new Shell.Monolayers(19), null, false), 3e-9)).orElseThrow();
        assertThat(giant.overlap()).as("a giant shell's overlap is held at the quasi-type-II floor")
                .isEqualTo(CoreShell.QUASI_MIN_OVERLAP);
        assertThat(typeI.biexcitonShiftJ()).isNegative();
        assertThat(CoreShell.of(sample(shell("CdSe", "CdTe", new Shell.Length(h), null, false), d)).orElseThrow()
                .biexcitonShiftJ()).isPositive();
    }

    @Test
    void everyCoreShellPresetResolvesInTheFictionalLab() throws Exception {
        Path dir = Path.of(System.getProperty("ladderkin.home", ".")).resolve("models/presets/core-shell");
        java.util.Map<String, BandAlignment> expected = java.util.Map.of("cdse-zns-thin.sample.json", BandAlignment.TYPE_I,
                "cdse-cds-thick.sample.json", BandAlignment.QUASI_TYPE_II, "cdse-cdte-type2.sample.json", BandAlignment.TYPE_II);
        try (var files = java.nio.file.Files.list(dir)) {
            assertThat(files.map(f -> f.getFileName().toString()).sorted().toList())
                    .containsExactlyInAnyOrderElementsOf(expected.keySet());
        }
        for (var e : expected.entrySet()) {
            Sample s = org.ladderkin.io.SampleCodec.read(dir.resolve(e.getKey()), LIB);
            assertThat(s.spec().name()).contains("Fernhollow").contains("fictional");
            assertThat(s.spec().shell().orElseThrow().alignment()).isEqualTo(e.getValue());
            assertThat(s.crossSectionAt(400e-9).crossSectionM2()).isPositive();
        }
    }

    @Test
    void heatCapacityAddsTheShellsOwn() {
        double d = 3e-9;
        double h = 2e-9;
        CoreShell c = CoreShell.of(sample(shell("CdSe", "CdS", new Shell.Length(h), null, false), d)).orElseThrow();
        Material cds = LIB.material("CdS");
        double vCore = Math.PI / 6 * d * d * d;
        double vShell = Math.PI / 6 * Math.pow(d + 2 * h, 3) - vCore;
        double expected = CDSE.densityKgPerM3().value() * CDSE.specificHeatJPerKgK().value() * vCore
                + cds.densityKgPerM3().value() * cds.specificHeatJPerKgK().value() * vShell;
        assertThat(c.heatCapacityJPerK()).isCloseTo(expected, offset(expected * 1e-12));
        assertThat(c.heatCapacityJPerK() / c.coreHeatCapacityJPerK()).isGreaterThan(5);
    }

    @Test
    void crossSectionAddsTheShellsIntrinsicAbsorptionAboveItsGapOnly() {
        double d = 3e-9;
        Sample plain = sample(null, d);
        Sample cds = sample(shell("CdSe", "CdS", new Shell.Length(2e-9), null, false), d);
        Sample zns = sample(shell("CdSe", "ZnS", new Shell.Length(2e-9), null, false), d);
        double at = 400e-9;
        double vShell = Math.PI / 6 * (Math.pow(7e-9, 3) - Math.pow(3e-9, 3));
        double muShell = LIB.material("CdS").opticalConstants().orElseThrow().intrinsicAbsorptionPerM(at, 1.45);
        assertThat(cds.crossSectionAt(at).crossSectionM2() - plain.crossSectionAt(at).crossSectionM2())
                .isCloseTo(muShell * vShell, offset(muShell * vShell * 1e-9));
        assertThat(cds.crossSectionAt(at).basis()).contains("CdS shell's intrinsic absorption");
        // ZnS (3.68 eV gap) is transparent at 400 nm (3.10 eV)
        assertThat(zns.crossSectionAt(at).crossSectionM2()).isEqualTo(plain.crossSectionAt(at).crossSectionM2());
        assertThat(zns.crossSectionAt(at).basis()).contains("transparent below its bulk gap");
    }

    @Test
    void aMeasuredShiftAndWidthAreUsedAsGiven() {
        Shell s = Shell.of(CDSE, LIB.material("CdTe"), new Shell.Length(1e-9), Optional.empty(), false, 50 * MEV, 40 * MEV,
                700e-9);
        Sample sample = sample(s, 3.6e-9);
        CoreShell c = CoreShell.of(sample).orElseThrow();
        assertThat(c.biexcitonShiftJ()).isEqualTo(50 * MEV);
        assertThat(c.lineWidthJ() * CoreShell.FWHM_PER_SIGMA).isCloseTo(40 * MEV, offset(1e-30));
        assertThat(sample.firstExcitonWavelengthM()).isCloseTo(700e-9, offset(1e-15));
    }
}
