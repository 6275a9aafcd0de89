package org.ladderkin.excite;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.sample.Advisory;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.SampleSpec;

class ExcitationTest {

    static Sample pbse(double od) {
        return Sample.resolve(new SampleSpec("t", MaterialLibrary.fromHome().material("PbSe"), new SampleSpec.ByDiameter(5e-9), 0,
                new SampleSpec.Absorbance(od, 400e-9), 1e-3, Optional.empty(), Refresh.stirred(), Optional.empty(), Optional.empty()));
    }

    static Excitation excite(Sample s, double pumpRadius, double probeRadius) {
        return Excitation.of(s, new Pulse(50e-9, 400e-9, 1e3), new GaussianBeam(pumpRadius), new GaussianBeam(probeRadius), true);
    }

    @Test
    void probeLargerThanPumpIsAllowedButFlagged() {
        Excitation x = excite(pbse(0.3), 100e-6, 140e-6);
        assertThat(x.advisories()).extracting(Advisory::kind).containsExactly(Advisory.Kind.PROBE_LARGER_THAN_PUMP);
        assertThat(x.advisories().get(0).message()).contains("is larger than the pump").contains("34 %");
        assertThat(x.nAvgProbeWeighted()).isLessThan(x.nAvgPeak());
    }

    @Test
    void smallProbeAndThinSampleRaiseNothing() {
        assertThat(excite(pbse(0.3), 100e-6, 40e-6).advisories()).isEmpty();
    }

    @Test
    void odOfThreeOrMoreIsFlaggedUnreliable() {
        Excitation x = excite(pbse(3.2), 100e-6, 40e-6);
        assertThat(x.advisories()).extracting(Advisory::kind).contains(Advisory.Kind.OPTICALLY_THICK);
        assertThat(x.advisories()).extracting(Advisory::message)
                .anyMatch(m -> m.startsWith("measured absorbance 3.2 OD is ≥ 3: spectrophotometer readings are unreliable"))
                .anyMatch(m -> m.startsWith("absorbance 3.2 OD at the pump is ≥ 3"));
        assertThat(x.absorbedFraction()).isGreaterThan(0.999);
    }

    @Test
    void resonantPumpIsFlagged() {
        Sample s = pbse(0.3);
        double firstM = s.firstExcitonWavelengthM();
        SampleSpec spec = s.spec().withGivenCrossSection(Optional.of(new SampleSpec.GivenCrossSection(1e-19, Double.NaN)));
        Excitation x = Excitation.of(Sample.resolve(spec), new Pulse(1e-9, firstM, 1e3), new GaussianBeam(1e-4), new GaussianBeam(4e-5), true);
        assertThat(x.advisories()).extracting(Advisory::kind).contains(Advisory.Kind.RESONANT_OR_BELOW_GAP_PUMP);
    }

    @Test
    void approximateCrossSectionIsFlagged() {
        Sample cdse = Sample.resolve(new SampleSpec("t", MaterialLibrary.fromHome().material("CdSe"), new SampleSpec.ByFirstPeak(580e-9), 0,
                new SampleSpec.Absorbance(0.1, Double.NaN), 1e-3, Optional.empty(), Refresh.stirred(), Optional.empty(), Optional.empty()));
        Excitation x = Excitation.of(cdse, new Pulse(50e-9, 515e-9, 1e3), new GaussianBeam(1e-4), new GaussianBeam(4e-5), true);
        assertThat(x.crossSection().approximate()).isTrue();
        assertThat(x.advisories()).extracting(Advisory::kind).containsExactly(Advisory.Kind.CROSS_SECTION_APPROXIMATE);
    }

    @Test
    void absorbedPowerFollowsTheAbsorbance() {
        Excitation x = excite(pbse(1.0), 100e-6, 40e-6);
        assertThat(x.absorbedFraction()).isCloseTo(0.9, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(x.absorbedPowerW()).isCloseTo(0.9 * 50e-9 * 1e3, org.assertj.core.data.Offset.offset(1e-15));
        assertThat(x.absorbanceAtPump()).isCloseTo(1.0, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void unreachableTargetIsAClearError() {
        Excitation x = excite(pbse(0.3), 100e-6, 140e-6);
        assertThatThrownBy(() -> x.pulseEnergyForTargetResponseJ(n -> -Math.expm1(-n), 0.999999))
                .hasMessageContaining("cannot be reached with any pulse energy up to 1 kJ");
    }

    @Test
    void frontFaceOnlyWhenDepthAveragingIsOff() {
        Excitation x = Excitation.of(pbse(1.0), new Pulse(50e-9, 400e-9, 1e3), new GaussianBeam(1e-4), new GaussianBeam(4e-5), false);
        assertThat(x.nAvgProbeWeighted()).isEqualTo(x.nAvgProbeWeightedFrontFace());
        assertThat(x.nAvgOnAxisDepthAveraged()).isEqualTo(x.nAvgPeak());
        Excitation thick = x.withEnergyJ(50e-9);
        assertThat(Excitation.of(pbse(1.0), thick.pulse(), new GaussianBeam(1e-4), new GaussianBeam(4e-5), true).nAvgProbeWeighted())
                .isLessThan(x.nAvgProbeWeighted());
    }

    @Test
    void averagePowerGivesThePulseEnergy() {
        Pulse p = Pulse.fromAveragePower(50e-6, 400e-9, 1e3);
        assertThat(p.energyJ()).isCloseTo(50e-9, org.assertj.core.data.Offset.offset(1e-20));
        assertThatThrownBy(() -> Pulse.fromAveragePower(-1, 400e-9, 1e3)).hasMessage("average power must be > 0 and finite, was -1.0 W");
    }
}
