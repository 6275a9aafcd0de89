package org.ladderkin.excite;

import java.util.Optional;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.SampleSpec;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** Pulse energy → ⟨N⟩ → pulse energy, over seeded random samples, spots, wavelengths and energies. */
class PulseEnergyRoundTripTest {

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    @CheckedAgainst(source = "derived: ⟨N⟩ = σ·2E/(πw²·hν) is inverted by the Brent root finder; the energy found must give back "
            + "the starting energy", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void energyToNToEnergy(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        boolean lead = rnd.nextBoolean();
        var material = MaterialLibrary.fromHome().material(lead ? "PbSe" : "CdSe");
        double size = lead ? rnd.nextDouble(3.2e-9, 9e-9) : rnd.nextDouble(2e-9, 7e-9);
        double pumpM = lead ? 400e-9 : 350e-9;
        SampleSpec spec = new SampleSpec("random", material, new SampleSpec.ByDiameter(size), 0,
                new SampleSpec.Absorbance(rnd.nextDouble(0.01, 2.5), pumpM), rnd.nextDouble(0.1e-3, 10e-3),
                Optional.empty(), Refresh.stirred(), Optional.empty(), Optional.empty());
        Sample sample = Sample.resolve(spec);
        double energy = Math.exp(rnd.nextDouble(Math.log(1e-12), Math.log(1e-5)));
        BeamProfile pump = rnd.nextBoolean() ? new GaussianBeam(rnd.nextDouble(20e-6, 500e-6)) : new FlatTopBeam(rnd.nextDouble(20e-6, 500e-6));
        BeamProfile probe = new GaussianBeam(rnd.nextDouble(10e-6, 300e-6));
        Excitation x = Excitation.of(sample, new Pulse(energy, pumpM, 1e3), pump, probe, rnd.nextBoolean());

        double back = x.pulseEnergyForTargetJ(x.nAvgPeak(), Excitation.TargetMode.ON_AXIS);
        Reference.checkRelative("seed " + seed + ": energy back from on-axis ⟨N⟩ (J)", back, energy, 1e-10);
        double backProbe = x.pulseEnergyForTargetJ(x.nAvgProbeWeighted(), Excitation.TargetMode.PROBE_AVERAGED);
        Reference.checkRelative("seed " + seed + ": energy back from probe-averaged ⟨N⟩ (J)", backProbe, energy, 1e-10);
        double fraction = x.excitedFractionProbeWeighted();
        double backFraction = x.pulseEnergyForTargetResponseJ(n -> -Math.expm1(-n), fraction);
        Reference.checkRelative("seed " + seed + ": energy back from probe-weighted excited fraction (J)",
                backFraction, energy, 1e-6);
        Reference.checkRelative("seed " + seed + ": on-axis ⟨N⟩ against σ·2E/(πw²)/hν by hand",
                x.nAvgPeak(), x.crossSection().crossSectionM2() * energy * pump.peakFluencePerJoule() / x.pulse().photonEnergyJ(), 1e-14);
    }
}
