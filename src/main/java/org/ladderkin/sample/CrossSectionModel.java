package org.ladderkin.sample;

import java.util.Locale;
import java.util.Optional;
import org.ladderkin.material.AbsorptionLaw;
import org.ladderkin.material.Material;
import org.ladderkin.material.Numbers;
import org.ladderkin.material.OpticalConstants;
import org.ladderkin.sample.CrossSection.Regime;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;

/**
 * σ(λ) of one sample: one function of wavelength per sample, so that the concentration (from the absorbance at its
 * wavelength) and the pump σ always come from the same curve. See docs/physics.md, "Absorption cross-section".
 */
final class CrossSectionModel {

    /** Host index for the local-field factor; the matrix records carry no index. */
    static final double HOST_INDEX = 1.45;
    static final String HOST_INDEX_SOURCE = "common practice, no source: host index 1.45, between hexane (1.375) and "
            + "toluene (1.50)";
    /** The intrinsic region starts this far above the first-exciton peak (J). */
    static final double INTRINSIC_MARGIN_J = 0.8 * PhysicalConstants.ELECTRONVOLT_J;
    static final double USER_UNCERTAINTY = 0.10;
    static final String USER_UNCERTAINTY_SOURCE = "common practice, no source: 10 % for a cross-section the user measured "
            + "(the plan states none)";
    static final double SPECTRUM_UNCERTAINTY = 0.03;
    static final double INTERPOLATED_UNCERTAINTY = 0.5;
    static final String INTERPOLATED_SOURCE = "common practice, no source: 50 % for a log-linear interpolation across "
            + "the structured absorption between the first exciton and the intrinsic region";
    static final double CARRIED_UNCERTAINTY = 1.0;
    static final String CARRIED_SOURCE = "common practice, no source: 100 % for a value carried unchanged to a wavelength "
            + "no law covers";

    private CrossSectionModel() {
    }

    /** A value of the material's model at one wavelength, before any spectrum or user value. */
    private record Point(double sigmaM2, double wavelengthM, double uncertainty, String uncertaintySource, String label) {
    }

    static CrossSection at(Sample s, double wavelengthM) {
        SampleSpec spec = s.spec();
        Optional<AbsorptionSpectrum> spectrum = spec.spectrum();
        if (spec.givenCrossSection().isPresent()) {
            SampleSpec.GivenCrossSection g = spec.givenCrossSection().get();
            if (Double.isNaN(g.wavelengthM()) || same(g.wavelengthM(), wavelengthM)) {
                return new CrossSection(g.crossSectionM2(), wavelengthM, "given by the user", Regime.USER, USER_UNCERTAINTY,
                        USER_UNCERTAINTY_SOURCE);
            }
            if (spectrum.isPresent() && spectrum.get().covers(g.wavelengthM()) && spectrum.get().covers(wavelengthM)) {
                return scaled(new Point(g.crossSectionM2(), g.wavelengthM(), USER_UNCERTAINTY, USER_UNCERTAINTY_SOURCE,
                        "the user's value at "), wavelengthM, spectrum.get());
            }
            return new CrossSection(g.crossSectionM2(), wavelengthM, String.format(Locale.ROOT,
                    "the user's value at %.1f nm used at %.1f nm (load an absorption spectrum to scale it)",
                    g.wavelengthM() * 1e9, wavelengthM * 1e9), Regime.CARRIED, CARRIED_UNCERTAINTY, CARRIED_SOURCE);
        }
        Material m = s.material();
        if (spectrum.isPresent() && spectrum.get().covers(wavelengthM)) {
            Optional<Point> anchor = spectrumAnchor(s, spectrum.get());
            if (anchor.isPresent()) {
                return scaled(anchor.get(), wavelengthM, spectrum.get());
            }
        }
        return model(s, m, wavelengthM);
    }

    /** The one law point the measured spectrum carries to every wavelength it covers: the high-energy law, else the edge. */
    private static Optional<Point> spectrumAnchor(Sample s, AbsorptionSpectrum spectrum) {
        Material m = s.material();
        Optional<AbsorptionLaw> high = m.highEnergyAbsorption();
        if (high.isPresent() && spectrum.covers(high.get().wavelengthM())) {
            AbsorptionLaw h = high.get();
            return Optional.of(new Point(h.crossSectionM2At(s.sizeM()), h.wavelengthM(), h.relativeUncertainty().value(),
                    h.relativeUncertainty().source(), m.key() + " high-energy law at "));
        }
        Optional<AbsorptionLaw> edge = m.firstExcitonAbsorption();
        double firstM = s.firstExcitonWavelengthM();
        if (edge.isPresent() && !Double.isNaN(firstM) && spectrum.covers(firstM)) {
            AbsorptionLaw e = edge.get();
            return Optional.of(new Point(e.crossSectionM2At(s.sizeM()), firstM, e.relativeUncertainty().value(),
                    e.relativeUncertainty().source(), m.key() + " first-exciton law at "));
        }
        return Optional.empty();
    }

    private static CrossSection model(Sample s, Material m, double wavelengthM) {
        Optional<AbsorptionLaw> high = m.highEnergyAbsorption();
        Optional<AbsorptionLaw> edge = m.firstExcitonAbsorption();
        double firstM = s.firstExcitonWavelengthM();
        boolean firstKnown = !Double.isNaN(firstM);
        if (edge.isPresent() && firstKnown && Math.abs(firstM - wavelengthM) <= Sample.AT_FIRST_EXCITON_M) {
            AbsorptionLaw e = edge.get();
            return new CrossSection(e.crossSectionM2At(s.sizeM()), wavelengthM,
                    m.key() + " first-exciton law (" + e.source() + ")", Regime.FIRST_EXCITON,
                    e.relativeUncertainty().value(), e.relativeUncertainty().source());
        }
        if (high.isPresent() && same(high.get().wavelengthM(), wavelengthM)) {
            AbsorptionLaw h = high.get();
            return new CrossSection(h.crossSectionM2At(s.sizeM()), wavelengthM,
                    m.key() + " law at " + Sample.nm(h.wavelengthM()) + " (" + h.source() + ")", Regime.HIGH_ENERGY_LAW,
                    h.relativeUncertainty().value(), h.relativeUncertainty().source());
        }
        Optional<Point> intrinsic = intrinsic(s, m, wavelengthM);
        if (intrinsic.isPresent()) {
            Point p = intrinsic.get();
            return new CrossSection(p.sigmaM2(), wavelengthM, p.label(), Regime.INTRINSIC, p.uncertainty(), p.uncertaintySource());
        }
        if (firstKnown && wavelengthM > firstM + Sample.AT_FIRST_EXCITON_M) {
            throw new SampleException(SampleException.Part.CROSS_SECTION, String.format(Locale.ROOT,
                    "%s lies on the red side of the first-exciton peak (%s), where no law applies: give a measured "
                            + "cross-section or load an absorption spectrum", Sample.nm(wavelengthM), Sample.nm(firstM)));
        }
        Optional<Point> blue = blueAnchor(s, m);
        if (edge.isPresent() && firstKnown && blue.isPresent() && wavelengthM > blue.get().wavelengthM()) {
            return interpolated(s, m, blue.get(), edge.get(), firstM, wavelengthM);
        }
        if (blue.isPresent()) {
            Point b = blue.get();
            return new CrossSection(b.sigmaM2(), wavelengthM, String.format(Locale.ROOT, "%s carried unchanged to %s, which "
                            + "no law covers (load your absorption spectrum, or give a measured cross-section, for a better value)",
                    b.label(), Sample.nm(wavelengthM)), Regime.CARRIED, CARRIED_UNCERTAINTY, CARRIED_SOURCE);
        }
        String what = edge.isPresent()
                ? m.key() + " has only a first-exciton absorption law (" + (firstKnown ? "peak at " + Sample.nm(firstM) : "peak unknown")
                + "); for " + Sample.nm(wavelengthM) + " load an absorption spectrum or give a measured cross-section"
                : m.key() + " has no absorption law in the library; give a measured cross-section (e.g. --cross-section 2e-15cm2)";
        throw new SampleException(SampleException.Part.CROSS_SECTION, "no cross-section at " + Sample.nm(wavelengthM) + ": " + what);
    }

    /** Where the intrinsic region ends on the red side (m), or NaN when the material has no optical constants. */
    static double intrinsicLimitM(Sample s) {
        Optional<OpticalConstants> oc = s.material().opticalConstants();
        if (oc.isEmpty()) {
            return Double.NaN;
        }
        double limit = oc.get().maxWavelengthM();
        if (!Double.isNaN(s.firstExcitonEnergyJ())) {
            limit = Math.min(limit, Photon.wavelengthM(s.firstExcitonEnergyJ() + INTRINSIC_MARGIN_J));
        }
        return limit < oc.get().minWavelengthM() ? Double.NaN : limit;
    }

    /**
     * σ far above the band edge. With a published high-energy law inside the table, the law fixes the magnitude and the
     * optical constants only the wavelength shape; without one, σ = μ_i·V.
     */
    private static Optional<Point> intrinsic(Sample s, Material m, double wavelengthM) {
        double limit = intrinsicLimitM(s);
        if (Double.isNaN(limit) || wavelengthM > limit * (1 + 1e-12)) {
            return Optional.empty();
        }
        OpticalConstants oc = m.opticalConstants().orElseThrow();
        if (!oc.covers(wavelengthM)) {
            return Optional.empty();
        }
        double mu = oc.intrinsicAbsorptionPerM(wavelengthM, HOST_INDEX);
        Optional<AbsorptionLaw> high = m.highEnergyAbsorption();
        if (high.isPresent() && oc.covers(high.get().wavelengthM())) {
            AbsorptionLaw h = high.get();
            double ratio = mu / oc.intrinsicAbsorptionPerM(h.wavelengthM(), HOST_INDEX);
            double u = Math.hypot(h.relativeUncertainty().value(), oc.relativeUncertainty().value());
            return Optional.of(new Point(h.crossSectionM2At(s.sizeM()) * ratio, wavelengthM, u,
                    "law: " + h.relativeUncertainty().source() + "; shape: " + oc.relativeUncertainty().source(),
                    String.format(Locale.ROOT, "%s law at %s carried to %s by the intrinsic absorption of bulk %s "
                                    + "(μ_i(%s)/μ_i(%s) = %s; optical constants: %s; %s)", m.key(), Sample.nm(h.wavelengthM()),
                            Sample.nm(wavelengthM), m.key(), Sample.nm(wavelengthM), Sample.nm(h.wavelengthM()),
                            Numbers.sig(ratio, 4), oc.source(), HOST_INDEX_SOURCE)));
        }
        return Optional.of(new Point(mu * s.dotVolumeM3(), wavelengthM, oc.relativeUncertainty().value(),
                oc.relativeUncertainty().source(), String.format(Locale.ROOT, "intrinsic absorption of bulk %s times the dot "
                        + "volume, μ_i = %s cm⁻¹ (optical constants: %s; %s)", m.key(), Numbers.sig(mu / 100, 4), oc.source(),
                HOST_INDEX_SOURCE)));
    }

    /** The reddest value the blue side supports: the intrinsic value at the end of its region, else the high-energy law. */
    private static Optional<Point> blueAnchor(Sample s, Material m) {
        double limit = intrinsicLimitM(s);
        if (!Double.isNaN(limit)) {
            Optional<Point> p = intrinsic(s, m, limit);
            if (p.isPresent()) {
                Point q = p.get();
                return Optional.of(new Point(q.sigmaM2(), limit, q.uncertainty(), q.uncertaintySource(),
                        "the intrinsic value at " + Sample.nm(limit) + " (" + q.label() + ")"));
            }
        }
        return m.highEnergyAbsorption().map(h -> new Point(h.crossSectionM2At(s.sizeM()), h.wavelengthM(),
                h.relativeUncertainty().value(), h.relativeUncertainty().source(),
                m.key() + " law at " + Sample.nm(h.wavelengthM())));
    }

    /** log σ linear in photon energy between the blue anchor and the first-exciton law: approximate. */
    private static CrossSection interpolated(Sample s, Material m, Point blue, AbsorptionLaw edge, double firstM, double wavelengthM) {
        double eBlue = Photon.energyJ(blue.wavelengthM());
        double eEdge = Photon.energyJ(firstM);
        double e = Photon.energyJ(wavelengthM);
        double t = (eBlue - e) / (eBlue - eEdge);
        double sigmaEdge = edge.crossSectionM2At(s.sizeM());
        double sigma = Math.exp((1 - t) * Math.log(blue.sigmaM2()) + t * Math.log(sigmaEdge));
        return new CrossSection(sigma, wavelengthM, String.format(Locale.ROOT, "approximate: interpolated (log σ linear in "
                        + "photon energy) between %s, σ = %s cm², and the %s first-exciton law at %s, σ = %s cm² (load your "
                        + "absorption spectrum, or give a measured cross-section, for a better value)", blue.label(),
                Numbers.sig(blue.sigmaM2() * 1e4, 4), m.key(), Sample.nm(firstM), Numbers.sig(sigmaEdge * 1e4, 4)),
                Regime.INTERPOLATED, INTERPOLATED_UNCERTAINTY, INTERPOLATED_SOURCE);
    }

    private static CrossSection scaled(Point from, double toM, AbsorptionSpectrum s) {
        double ratio = s.ratio(toM, from.wavelengthM());
        if (!(ratio > 0)) {
            throw new SampleException(SampleException.Part.CROSS_SECTION, String.format(Locale.ROOT,
                    "%s shows no absorbance at %s: the sample does not absorb there", s.origin(), Sample.nm(toM)));
        }
        return new CrossSection(from.sigmaM2() * ratio, toM, String.format(Locale.ROOT, "%s%s scaled by the measured spectrum "
                        + "%s (A(%s)/A(%s) = %.4g)", from.label(), Sample.nm(from.wavelengthM()), s.origin(), Sample.nm(toM),
                Sample.nm(from.wavelengthM()), ratio), Regime.MEASURED,
                Math.hypot(from.uncertainty(), SPECTRUM_UNCERTAINTY), from.uncertaintySource()
                        + "; plus 3 % for the spectrum ratio (common practice, no source)");
    }

    private static boolean same(double aM, double bM) {
        return Math.abs(aM - bM) <= Sample.SAME_WAVELENGTH_M;
    }
}
