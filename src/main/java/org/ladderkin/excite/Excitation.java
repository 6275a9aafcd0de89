package org.ladderkin.excite;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.function.DoubleUnaryOperator;
import org.ladderkin.sample.Advisory;
import org.ladderkin.sample.CrossSection;
import org.ladderkin.sample.Sample;

/**
 * What one pump pulse does to a sample: fluence, ⟨N⟩ = σ·j on the axis and as the probe sees it, absorbed energy and
 * power, and how many dots sit in the excited and probed volumes. Built by {@link #of}.
 *
 * @param sample          the sample
 * @param pulse           the pump pulse
 * @param geometry        spots and depth attenuation
 * @param crossSection    σ at the pump wavelength and how it was obtained
 * @param advisories      concerns about these inputs (probe larger than pump, optically thick ...)
 */
public record Excitation(Sample sample, Pulse pulse, ExcitationGeometry geometry, CrossSection crossSection,
                         List<Advisory> advisories) {

    public Excitation {
        Objects.requireNonNull(sample, "sample");
        Objects.requireNonNull(pulse, "pulse");
        Objects.requireNonNull(geometry, "geometry");
        Objects.requireNonNull(crossSection, "crossSection");
        advisories = List.copyOf(advisories);
    }

    /** Which ⟨N⟩ a target refers to. */
    public enum TargetMode {
        /** ⟨N⟩ on the pump axis at the front face. */
        ON_AXIS,
        /** ⟨N⟩ averaged over the probe spot and the depth. */
        PROBE_AVERAGED
    }

    /**
     * Computes the excitation of {@code sample} by {@code pulse} with the given spots.
     *
     * @param depthAveraged average over the depth (Beer–Lambert attenuation of the pump) or take the front face only
     */
    public static Excitation of(Sample sample, Pulse pulse, BeamProfile pump, BeamProfile probe, boolean depthAveraged) {
        CrossSection sigma = sample.crossSectionAt(pulse.wavelengthM());
        double absorbance = sigma.crossSectionM2() * sample.numberDensityPerM3() * sample.spec().pathLengthM() / Math.log(10);
        ExcitationGeometry geometry = new ExcitationGeometry(pump, probe, absorbance, depthAveraged);
        List<Advisory> advisories = new ArrayList<>(sample.advisories());
        double pumpEff = Math.sqrt(pump.effectiveAreaM2() / Math.PI);
        double probeEff = Math.sqrt(probe.effectiveAreaM2() / Math.PI);
        if (probeEff > pumpEff) {
            advisories.add(new Advisory(Advisory.Kind.PROBE_LARGER_THAN_PUMP, String.format(Locale.ROOT,
                    "the probe (%s) is larger than the pump (%s): it also sees weakly excited dots, so the probe-averaged "
                            + "⟨N⟩ is only %.0f %% of the on-axis value; make the probe smaller than the pump if you can",
                    probe.describe(), pump.describe(), 100 * SpotAverage.linearFactor(pump, probe))));
        }
        if (absorbance >= Sample.THICK_OD) {
            advisories.add(new Advisory(Advisory.Kind.OPTICALLY_THICK, String.format(Locale.ROOT,
                    "absorbance %s OD at the pump is ≥ %.0f: the pump hardly reaches the back of the sample, the probe "
                            + "transmits almost nothing, and absorbance-based numbers are unreliable; dilute or shorten the path",
                    org.ladderkin.material.Numbers.sig(absorbance, 3), Sample.THICK_OD)));
        }
        if (sigma.approximate()) {
            advisories.add(new Advisory(Advisory.Kind.CROSS_SECTION_APPROXIMATE, "cross-section at the pump: " + sigma.basis()));
        }
        double firstM = sample.firstExcitonWavelengthM();
        if (!Double.isNaN(firstM) && pulse.wavelengthM() >= firstM - 2e-9) {
            advisories.add(new Advisory(Advisory.Kind.RESONANT_OR_BELOW_GAP_PUMP, String.format(Locale.ROOT,
                    "the pump (%.1f nm) is at or beyond the first-exciton peak (%.1f nm): band-edge absorption saturates "
                            + "as the level fills, so ⟨N⟩ = σ·j and Poisson statistics overestimate the excitation",
                    pulse.wavelengthM() * 1e9, firstM * 1e9)));
        }
        return new Excitation(sample, pulse, geometry, sigma, advisories);
    }

    /** Peak energy fluence on the pump axis (J/m²). */
    public double energyFluencePeakJPerM2() {
        return pulse.energyJ() * geometry.pump().peakFluencePerJoule();
    }

    /** Peak photon fluence on the pump axis (photons/m²). */
    public double photonFluencePeakPerM2() {
        return energyFluencePeakJPerM2() / pulse.photonEnergyJ();
    }

    /** ⟨N⟩ = σ·j on the pump axis at the front face. */
    public double nAvgPeak() {
        return nAvgPeakForEnergy(pulse.energyJ());
    }

    private double nAvgPeakForEnergy(double energyJ) {
        return crossSection.crossSectionM2() * energyJ * geometry.pump().peakFluencePerJoule() / pulse.photonEnergyJ();
    }

    /** ⟨N⟩ averaged over the probe spot at the front face (closed form). */
    public double nAvgProbeWeightedFrontFace() {
        return nAvgPeak() * SpotAverage.linearFactor(geometry.pump(), geometry.probe());
    }

    /** ⟨N⟩ on axis averaged over the depth (closed form). */
    public double nAvgOnAxisDepthAveraged() {
        return nAvgPeak() * (geometry.depthAveraged() ? DepthAverage.linearFactor(geometry.absorbance()) : 1);
    }

    /** ⟨N⟩ as the probe sees it: averaged over the spot and (if enabled) the depth (closed form). */
    public double nAvgProbeWeighted() {
        return nAvgPeak() * geometry.linearFactor();
    }

    /** Probe-weighted average of any response f(⟨N⟩) over spot and depth (quadrature). */
    public double probeWeighted(DoubleUnaryOperator response) {
        return geometry.average(response, nAvgPeak());
    }

    /** Probe-weighted fraction of dots excited at least once, ⟨1 − e^(−⟨N⟩)⟩ (Poisson). */
    public double excitedFractionProbeWeighted() {
        return probeWeighted(n -> -Math.expm1(-n));
    }

    /** Pump absorbance of the sample (OD) from σ, concentration and path. */
    public double absorbanceAtPump() {
        return geometry.absorbance();
    }

    /** Fraction of the pump pulse absorbed, 1 − 10^(−A). */
    public double absorbedFraction() {
        return DepthAverage.absorbedFraction(geometry.absorbance());
    }

    /** Energy absorbed per pulse (J). */
    public double absorbedEnergyPerPulseJ() {
        return pulse.energyJ() * absorbedFraction();
    }

    /** Average absorbed power (W). */
    public double absorbedPowerW() {
        return absorbedEnergyPerPulseJ() * pulse.repetitionRateHz();
    }

    /** Dots in the excited volume: number density × pump effective area × path. */
    public double dotsInExcitedVolume() {
        return sample.numberDensityPerM3() * geometry.pump().effectiveAreaM2() * sample.spec().pathLengthM();
    }

    /** Dots in the probed volume: number density × probe effective area × path. */
    public double dotsInProbedVolume() {
        return sample.numberDensityPerM3() * geometry.probe().effectiveAreaM2() * sample.spec().pathLengthM();
    }

    /** Pulse energy (J) giving {@code targetN} as ⟨N⟩ on axis or probe-averaged. */
    public double pulseEnergyForTargetJ(double targetN, TargetMode mode) {
        DoubleUnaryOperator response = mode == TargetMode.ON_AXIS
                ? this::nAvgPeakForEnergy
                : e -> nAvgPeakForEnergy(e) * geometry.linearFactor();
        return PulseEnergySolver.solve(response, targetN, pulse.energyJ(), 1e-13);
    }

    /** Pulse energy (J) giving a target probe-weighted value of a rising response f(⟨N⟩), e.g. the excited fraction. */
    public double pulseEnergyForTargetResponseJ(DoubleUnaryOperator response, double target) {
        return PulseEnergySolver.solve(e -> geometry.average(response, nAvgPeakForEnergy(e)), target, pulse.energyJ(), 1e-10);
    }

    /** This excitation with another pulse energy (the instance is not changed). */
    public Excitation withEnergyJ(double energyJ) {
        return new Excitation(sample, pulse.withEnergyJ(energyJ), geometry, crossSection, advisories);
    }
}
