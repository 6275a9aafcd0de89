package org.ladderkin.sample;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.material.AbsorptionLaw;
import org.ladderkin.material.Material;
import org.ladderkin.material.OpticalConstants;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.sample.CrossSection.Regime;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** σ(λ): its regimes, its uncertainties and one σ for concentration and pump. */
class CrossSectionModelTest {

    private static Material m(String key) {
        return MaterialLibrary.fromHome().material(key);
    }

    private static Sample sample(String key, SampleSpec.Size size, SampleSpec.Amount amount) {
        return Sample.resolve(new SampleSpec("t", m(key), size, 0.05, amount, 1e-3, Optional.empty(), Refresh.stirred(),
                Optional.empty(), Optional.empty()));
    }

    private static Sample cdse580() {
        return sample("CdSe", new SampleSpec.ByFirstPeak(580e-9), new SampleSpec.Absorbance(0.1, Double.NaN));
    }

    @Test
    @CheckedAgainst(source = "derived: quasi-static absorption of a small sphere (ε = (n+ik)²) in a host of index n_s, "
            + "σ = k_s·Im α with α = 3V(ε−n_s²)/(ε+2n_s²), k_s = 2πn_s/λ, gives σ/V = (2π/λ)(1/n_s)|3n_s²/(ε+2n_s²)|²·2nk",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void intrinsicAbsorptionIsTheSmallSpherePolarisability() {
        OpticalConstants oc = m("CdSe").opticalConstants().orElseThrow();
        double lambda = 400e-9;
        double n = 2.90;
        double k = 0.55;
        double ns = 1.45;
        // α = 3V(ε − ε_s)/(ε + 2ε_s) by complex arithmetic, written out independently of the production form
        double epsRe = n * n - k * k;
        double epsIm = 2 * n * k;
        double numRe = 3 * (epsRe - ns * ns);
        double numIm = 3 * epsIm;
        double denRe = epsRe + 2 * ns * ns;
        double denIm = epsIm;
        double imAlphaPerV = (numIm * denRe - numRe * denIm) / (denRe * denRe + denIm * denIm);
        double expected = 2 * Math.PI * ns / lambda * imAlphaPerV;
        Reference.checkRelative("μ_i of CdSe (n = 2.90, k = 0.55) at 400 nm in n_s = 1.45 (1/m)",
                oc.intrinsicAbsorptionPerM(lambda, ns), expected, 1e-12);
        Reference.check("σ/V of a non-absorbing sphere is zero: k → 0 limit (relative to k = 0.55)",
                new OpticalConstants(new double[] {399e-9, 401e-9}, new double[] {n, n}, new double[] {1e-9, 1e-9}, "t",
                        AbsorptionLaw.DEFAULT_UNCERTAINTY).intrinsicAbsorptionPerM(lambda, ns) / expected, 0, 1e-8);
    }

    @Test
    @CheckedAgainst(source = "Leatherdale, Woo, Mikulec, Bawendi, J. Phys. Chem. B 106, 7619 (2002), abstract: σ(350 nm) = "
            + "5.501e5·a³ cm², i.e. μ_i = 5.501e5/(4π/3) = 1.313e5 cm⁻¹; the bulk CdSe n, k of the library are from memory, so the "
            + "check is against the law with the optical constants' 20 % uncertainty", kind = CheckedAgainst.Kind.PUBLISHED)
    void cdseOpticalConstantsReproduceTheLeatherdaleLaw() {
        OpticalConstants oc = m("CdSe").opticalConstants().orElseThrow();
        double muPerCm = oc.intrinsicAbsorptionPerM(350e-9, CrossSectionModel.HOST_INDEX) / 100;
        Reference.checkRelative("CdSe μ_i(350 nm) from bulk n, k and the local-field factor (cm⁻¹)", muPerCm,
                5.501e5 / (4 * Math.PI / 3), 0.2);
    }

    @Test
    @CheckedAgainst(source = "Moreels et al., Chem. Mater. 19, 6101 (2007) (PbSe) and ACS Nano 3, 3023 (2009) (PbS): ε(400 nm) = "
            + "0.0277·d³ and 0.0233·d³ µM⁻¹cm⁻¹ (coefficients from memory; the PbS abstract states the d³ scaling and its "
            + "Maxwell-Garnett agreement); bulk n, k from memory, 30 % (neither paper's table nor an optical-constant table for PbS or PbSe is stored here)", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void leadChalcogenideOpticalConstantsReproduceTheMoreelsLaws() {
        double sigmaPerVolumePerCm = 1e6 * 1000 * Math.log(10) / 6.02214076e23 / (Math.PI / 6 * 1e-21);
        Reference.checkRelative("PbSe μ_i(400 nm) from bulk n, k (cm⁻¹)",
                m("PbSe").opticalConstants().orElseThrow().intrinsicAbsorptionPerM(400e-9, CrossSectionModel.HOST_INDEX) / 100,
                0.0277 * sigmaPerVolumePerCm, 0.3);
        Reference.checkRelative("PbS μ_i(400 nm) from bulk n, k (cm⁻¹)",
                m("PbS").opticalConstants().orElseThrow().intrinsicAbsorptionPerM(400e-9, CrossSectionModel.HOST_INDEX) / 100,
                0.0233 * sigmaPerVolumePerCm, 0.3);
    }

    @Test
    @CheckedAgainst(source = "Leatherdale, Woo, Mikulec, Bawendi, J. Phys. Chem. B 106, 7619 (2002), abstract: σ(350 nm) = "
            + "5.501e5·a³ cm², a = radius in cm; σ(λ) of a resolved sample meets the law at its own wavelength",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void cdseShapeMeetsTheLeatherdaleLawAt350nm() {
        Sample s = cdse580();
        double aCm = s.sizeM() / 2 * 100;
        CrossSection at350 = s.crossSectionAt(350e-9);
        assertThat(at350.regime()).isEqualTo(Regime.HIGH_ENERGY_LAW);
        Reference.checkRelative("CdSe σ(350 nm) of the 580 nm dot (cm²)", at350.crossSectionM2() * 1e4, 5.501e5 * Math.pow(aCm, 3), 1e-12);
    }

    @Test
    @CheckedAgainst(source = "Yu, Qu, Guo, Peng, Chem. Mater. 15, 2854 (2003), ε = 5857·D^2.65 at the first exciton (from "
            + "memory: only the abstract is stored here): σ(λ) of a resolved sample meets the law at its peak",
            kind = CheckedAgainst.Kind.FROM_MEMORY)
    void cdseShapeMeetsTheYuLawAtItsPeak() {
        Sample s = cdse580();
        CrossSection atPeak = s.crossSectionAt(580e-9);
        assertThat(atPeak.regime()).isEqualTo(Regime.FIRST_EXCITON);
        double dNm = s.sizeM() * 1e9;
        Reference.checkRelative("CdSe ε(first exciton) of the 580 nm dot (M⁻¹cm⁻¹)", atPeak.extinctionM2PerMol() * 10,
                5857 * Math.pow(dNm, 2.65), 1e-12);
    }

    @Test
    void cdseRegimesAlongTheSpectrum() {
        Sample s = cdse580();
        CrossSection at400 = s.crossSectionAt(400e-9);
        CrossSection at515 = s.crossSectionAt(515e-9);
        CrossSection at565 = s.crossSectionAt(565e-9);
        CrossSection at350 = s.crossSectionAt(350e-9);
        CrossSection atPeak = s.crossSectionAt(580e-9);
        assertThat(at400.regime()).isEqualTo(Regime.INTRINSIC);
        assertThat(at400.approximate()).isFalse();
        assertThat(at515.regime()).isEqualTo(Regime.INTERPOLATED);
        assertThat(at515.approximate()).isTrue();
        assertThat(at565.regime()).isEqualTo(Regime.INTERPOLATED);
        // absorption falls from the intrinsic region toward the band edge: the ranking now sees a difference
        assertThat(at350.crossSectionM2()).isGreaterThan(at400.crossSectionM2());
        assertThat(at400.crossSectionM2()).isGreaterThan(at515.crossSectionM2());
        assertThat(at515.crossSectionM2()).isGreaterThan(at565.crossSectionM2());
        assertThat(at565.crossSectionM2()).isGreaterThan(atPeak.crossSectionM2());
        assertThat(at350.relativeUncertainty()).isEqualTo(0.15);
        assertThat(at400.relativeUncertainty()).isEqualTo(Math.hypot(0.15, 0.2));
        assertThat(at515.relativeUncertainty()).isEqualTo(0.5);
        assertThat(atPeak.relativeUncertainty()).isEqualTo(0.3);
        assertThat(at515.basis()).startsWith("approximate: interpolated");
        assertThat(at515.uncertaintySource()).startsWith("common practice, no source");
        assertThatThrownBy(() -> s.crossSectionAt(600e-9)).hasMessageContaining("red side of the first-exciton peak");
    }

    @Test
    void pbseRegimesWithoutABandEdgeLaw() {
        Sample s = sample("PbSe", new SampleSpec.ByFirstPeak(1450e-9), new SampleSpec.Absorbance(0.3, 400e-9));
        assertThat(s.crossSectionAt(400e-9).regime()).isEqualTo(Regime.HIGH_ENERGY_LAW);
        assertThat(s.crossSectionAt(600e-9).regime()).isEqualTo(Regime.INTRINSIC);
        CrossSection at800 = s.crossSectionAt(800e-9);
        CrossSection at1300 = s.crossSectionAt(1300e-9);
        assertThat(at800.regime()).isEqualTo(Regime.CARRIED);
        assertThat(at800.relativeUncertainty()).isEqualTo(1.0);
        assertThat(at800.crossSectionM2()).isLessThan(s.crossSectionAt(400e-9).crossSectionM2() / 2);
        assertThat(at1300.crossSectionM2()).isEqualTo(at800.crossSectionM2());
    }

    @Test
    void materialWithoutOpticalConstantsKeepsItsLawsAndInterpolatesNothingItCannot() {
        Sample cdte = sample("CdTe", new SampleSpec.ByFirstPeak(620e-9), new SampleSpec.Absorbance(0.1, Double.NaN));
        assertThat(cdte.crossSectionAt(620e-9).regime()).isEqualTo(Regime.FIRST_EXCITON);
        assertThatThrownBy(() -> cdte.crossSectionAt(400e-9)).hasMessageContaining("has only a first-exciton absorption law");
    }

    @Test
    void spectrumCarriesOneAnchorToEveryWavelengthItCovers() {
        AbsorptionSpectrum spectrum = new AbsorptionSpectrum(new double[] {340e-9, 350e-9, 400e-9, 580e-9},
                new double[] {1.1, 1.0, 0.6, 0.12}, "demo.csv");
        Sample s = Sample.resolve(cdse580().spec().withSpectrum(Optional.of(spectrum)));
        CrossSection atPeak = s.crossSectionAt(580e-9);
        CrossSection at400 = s.crossSectionAt(400e-9);
        assertThat(atPeak.regime()).isEqualTo(Regime.MEASURED);
        assertThat(atPeak.basis()).contains("high-energy law at 350.0 nm");
        assertThat(at400.crossSectionM2() / atPeak.crossSectionM2()).isCloseTo(0.6 / 0.12, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(s.absorbanceAt(580e-9)).isCloseTo(0.1, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(s.absorbanceAt(400e-9)).isCloseTo(0.5, org.assertj.core.data.Offset.offset(1e-12));
    }

    static Stream<String> demoPlans() {
        return Stream.of("cdse-auger-1khz.plan.json", "pbse-multiplication-80mhz.plan.json");
    }

    @ParameterizedTest
    @MethodSource("demoPlans")
    @CheckedAgainst(source = "derived: Beer–Lambert with one σ(λ) per sample, A(λ) = A(given)·σ(λ)/σ(given)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void demoPlansUseOneCrossSectionForConcentrationAndPump(String plan) {
        PlanInputs in = PlanCodec.read(Path.of(System.getProperty("ladderkin.home", ".")).resolve("experiments-plan").resolve(plan));
        Sample s = in.sample();
        SampleSpec.Absorbance given = (SampleSpec.Absorbance) s.spec().amount();
        double givenM = given.atFirstExciton() ? s.firstExcitonWavelengthM() : given.wavelengthM();
        Reference.checkRelative(plan + ": absorbance back at " + Sample.nm(givenM) + " (OD)", s.absorbanceAt(givenM), given.od(), 1e-12);
        double sigmaGiven = s.crossSectionAt(givenM).crossSectionM2();
        assertThat(s.concentrationBasis()).contains(s.crossSectionAt(givenM).basis()).contains(Sample.nm(givenM));
        for (double pumpM : in.laser().pumpWavelengthsM()) {
            Reference.checkRelative(plan + ": absorbance at the " + Sample.nm(pumpM) + " pump (OD)", s.absorbanceAt(pumpM),
                    given.od() * s.crossSectionAt(pumpM).crossSectionM2() / sigmaGiven, 1e-12);
        }
    }
}
