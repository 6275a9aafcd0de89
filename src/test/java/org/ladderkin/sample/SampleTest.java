package org.ladderkin.sample;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.material.Material;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class SampleTest {

    static Material m(String key) {
        return MaterialLibrary.fromHome().material(key);
    }

    static SampleSpec spec(String key, SampleSpec.Size size, SampleSpec.Amount amount) {
        return new SampleSpec("t", m(key), size, 0.05, amount, 1e-3, Optional.empty(), Refresh.stirred(), Optional.empty(), Optional.empty());
    }

    @Test
    void sizeAndPeakTogether() {
        // a material without a sizing curve: the peak sets E₁S, the size the volume, nothing is NaN
        Sample inp = Sample.resolve(spec("InP", new SampleSpec.ByDiameterAndPeak(3.2e-9, 560e-9), new SampleSpec.Concentration(1e-3)));
        assertThat(inp.sizeM()).isEqualTo(3.2e-9);
        assertThat(inp.firstExcitonWavelengthM()).isCloseTo(560e-9, org.assertj.core.data.Offset.offset(1e-18));
        assertThat(inp.dotVolumeM3()).isCloseTo(Math.PI / 6 * Math.pow(3.2e-9, 3), org.assertj.core.data.Percentage.withPercentage(1e-9));
        assertThat(inp.advisories()).noneMatch(a -> a.kind() == Advisory.Kind.SIZE_PEAK_DISAGREE);
        // with a sizing curve a size far from the curve's is used as given, with a word about it
        double curveM = Sample.resolve(spec("CdSe", new SampleSpec.ByFirstPeak(580e-9), new SampleSpec.Concentration(1e-3))).sizeM();
        Sample close = Sample.resolve(spec("CdSe", new SampleSpec.ByDiameterAndPeak(curveM * 1.1, 580e-9), new SampleSpec.Concentration(1e-3)));
        assertThat(close.advisories()).noneMatch(a -> a.kind() == Advisory.Kind.SIZE_PEAK_DISAGREE);
        Sample far = Sample.resolve(spec("CdSe", new SampleSpec.ByDiameterAndPeak(curveM * 1.3, 580e-9), new SampleSpec.Concentration(1e-3)));
        assertThat(far.sizeM()).isEqualTo(curveM * 1.3);
        assertThat(far.firstExcitonWavelengthM()).isCloseTo(580e-9, org.assertj.core.data.Offset.offset(1e-18));
        assertThat(far.advisories()).filteredOn(a -> a.kind() == Advisory.Kind.SIZE_PEAK_DISAGREE).singleElement()
                .satisfies(a -> assertThat(a.message()).contains("+30 %"));
    }

    @Test
    void diameterOutsideTheSizingCurveRange() {
        assertThatThrownBy(() -> Sample.resolve(spec("CdSe", new SampleSpec.ByDiameter(9e-9), new SampleSpec.Concentration(1e-3))))
                .isInstanceOf(SampleException.class)
                .hasMessageStartingWith("CdSe: diameter 9 nm is outside the sizing curve's validity range 1.55–7.76 nm (Yu, Qu, Guo, Peng")
                .hasMessageEndingWith("; check the size: the curve is not extrapolated");
        assertThatThrownBy(() -> Sample.resolve(spec("PbS", new SampleSpec.ByDiameter(2e-9), new SampleSpec.Concentration(1e-3))))
                .hasMessageStartingWith("PbS: diameter 2 nm is outside the sizing curve's validity range 3–10 nm");
    }

    @Test
    void peakNoSizeCanProduce() {
        // 750 nm is below the 1.74 eV bulk gap of CdSe (712.6 nm): confinement only blue-shifts
        assertThatThrownBy(() -> Sample.resolve(spec("CdSe", new SampleSpec.ByFirstPeak(750e-9), new SampleSpec.Concentration(1e-3))))
                .hasMessage("CdSe: no dot size gives a first-exciton peak at 750 nm: it lies at or beyond the bulk band gap (712.6 nm); "
                        + "confinement only moves the peak to shorter wavelengths");
        assertThatThrownBy(() -> Sample.resolve(spec("PbS", new SampleSpec.ByFirstPeak(3300e-9), new SampleSpec.Concentration(1e-3))))
                .hasMessageStartingWith("PbS: no dot size gives a first-exciton peak at 0.3757 eV: it lies at or below the large-size limit 0.41 eV");
        ((SampleException) catchIt(() -> Sample.resolve(spec("PbS", new SampleSpec.ByFirstPeak(3300e-9), new SampleSpec.Concentration(1e-3)))))
                .part().equals(SampleException.Part.SIZE);
    }

    private static Throwable catchIt(Runnable r) {
        try {
            r.run();
        } catch (RuntimeException e) {
            return e;
        }
        throw new AssertionError("no exception");
    }

    @Test
    void peakAboveTheGapButOutsideTheValidityRange() {
        assertThatThrownBy(() -> Sample.resolve(spec("CdSe", new SampleSpec.ByFirstPeak(680e-9), new SampleSpec.Concentration(1e-3))))
                .hasMessageStartingWith("CdSe: first-exciton peak 680 nm is outside the sizing curve's validity range 400–650 nm");
        assertThatThrownBy(() -> Sample.resolve(spec("PbSe", new SampleSpec.ByFirstPeak(1000e-9), new SampleSpec.Concentration(1e-3))))
                .hasMessageStartingWith("PbSe: a first-exciton peak at 1.24 eV means a diameter of 2.39 nm, outside the sizing curve's validity range 3–10 nm");
    }

    @Test
    void inpNeedsAMeasuredSize() {
        assertThatThrownBy(() -> Sample.resolve(spec("InP", new SampleSpec.ByFirstPeak(560e-9), new SampleSpec.Concentration(1e-3))))
                .hasMessageStartingWith("InP has no published sizing curve in the library; give the diameter measured on your sample");
        Sample s = Sample.resolve(spec("InP", new SampleSpec.ByDiameter(3e-9), new SampleSpec.Concentration(1e-3)));
        assertThat(s.firstExcitonEnergyJ()).isNaN();
        assertThatThrownBy(() -> s.crossSectionAt(400e-9))
                .hasMessageStartingWith("no cross-section at 400.0 nm: InP has no absorption law in the library; give a measured cross-section");
    }

    @Test
    @CheckedAgainst(source = "derived: Beer–Lambert A = ε·c·L with ε = 5857·D^2.65 M⁻¹cm⁻¹ (Yu, Qu, Guo, Peng, Chem. Mater. 15, "
            + "2854 (2003), from memory) at the first exciton", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void concentrationFromAbsorbance() {
        Sample s = Sample.resolve(spec("CdSe", new SampleSpec.ByDiameter(4e-9), new SampleSpec.Absorbance(0.2, Double.NaN)));
        double epsPerMPerCm = 5857 * Math.pow(4.0, 2.65);
        double cMolar = 0.2 / (epsPerMPerCm * 0.1); // L = 0.1 cm
        Reference.checkRelative("concentration of 4 nm CdSe at 0.2 OD over 1 mm (µM)", s.concentrationMolPerM3() * 1e3, cMolar * 1e6, 1e-12);
        Reference.checkRelative("absorbance back at the first exciton (OD)", s.absorbanceAt(s.firstExcitonWavelengthM()), 0.2, 1e-12);
        Reference.checkRelative("number density (1/cm³)", s.numberDensityPerM3() * 1e-6,
                cMolar * 1e-3 * PhysicalConstants.AVOGADRO_PER_MOL, 1e-12);
    }

    @Test
    void measuredOdOfThreeOrMoreIsFlagged() {
        Sample s = Sample.resolve(spec("PbSe", new SampleSpec.ByDiameter(5e-9), new SampleSpec.Absorbance(3.0, 400e-9)));
        assertThat(s.advisories()).extracting(Advisory::kind).containsExactly(Advisory.Kind.OPTICALLY_THICK);
        assertThat(Sample.resolve(spec("PbSe", new SampleSpec.ByDiameter(5e-9), new SampleSpec.Absorbance(2.9, 400e-9))).advisories()).isEmpty();
    }

    @Test
    @CheckedAgainst(source = "derived: a cross-section known at λ₀ carried to λ by the measured spectrum, σ(λ) = σ(λ₀)·A(λ)/A(λ₀)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void spectrumScalesTheCrossSection() {
        AbsorptionSpectrum spectrum = new AbsorptionSpectrum(new double[] {340e-9, 350e-9, 400e-9, 500e-9},
                new double[] {1.1, 1.0, 0.6, 0.3}, "demo.csv");
        SampleSpec base = spec("CdSe", new SampleSpec.ByDiameter(4e-9), new SampleSpec.Concentration(1e-3)).withSpectrum(Optional.of(spectrum));
        Sample s = Sample.resolve(base);
        double sigma350 = 5.501e5 * Math.pow(2e-7, 3) * 1e-4;
        CrossSection at400 = s.crossSectionAt(400e-9);
        assertThat(at400.approximate()).isFalse();
        Reference.checkRelative("σ(400 nm) from σ(350 nm)·A(400)/A(350) (m²)", at400.crossSectionM2(), sigma350 * 0.6, 1e-12);
        Reference.checkRelative("σ(450 nm), interpolated spectrum (m²)", s.crossSectionAt(450e-9).crossSectionM2(), sigma350 * 0.45, 1e-12);
        assertThatThrownBy(() -> s.crossSectionAt(600e-9)).hasMessageContaining("lies on the red side of the first-exciton peak");
    }

    @Test
    void givenCrossSectionOverridesTheLaw() {
        SampleSpec sp = spec("InP", new SampleSpec.ByDiameter(3e-9), new SampleSpec.Absorbance(0.3, 400e-9))
                .withGivenCrossSection(Optional.of(new SampleSpec.GivenCrossSection(2e-19, 400e-9)));
        Sample s = Sample.resolve(sp);
        assertThat(s.crossSectionAt(400e-9).crossSectionM2()).isEqualTo(2e-19);
        assertThat(s.crossSectionAt(400e-9).basis()).isEqualTo("given by the user");
        assertThat(s.crossSectionAt(450e-9).approximate()).isTrue();
    }

    @Test
    void refreshModesValidate() {
        assertThat(Refresh.flowing(5e-6 / 60, 0.5e-6).exchangeTimeS()).isCloseTo(6.0, org.assertj.core.data.Offset.offset(1e-12));
        assertThatThrownBy(() -> Refresh.flowing(0, 1e-6)).hasMessage("flow rate must be > 0, was 0.0 mL/min");
        assertThatThrownBy(() -> new Refresh(Refresh.Mode.STATIC, 1e-6, 0, 0)).hasMessage("flow rate and cell volume apply only to a flowing cell");
    }
}
