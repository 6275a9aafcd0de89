package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.LaserSetup;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.Cautions;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class BeamPredictionTest {

    static final PlanInputs DEMO = RecomputeServiceTest.DEMO;

    @Test
    @CheckedAgainst(source = "derived: a Gaussian beam of 1/e² intensity radius w carrying E has on-axis fluence "
            + "F = 2E/(πw²); dividing by the photon energy hc/λ (h, c exact, SI 2019) gives photons per area. "
            + "E = 1 µJ, w = 100 µm, λ = 400 nm: F = 63.66197724 J/m², hc/λ = 4.966114643e-19 J",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void peakPhotonFluenceOfAGaussianPump() {
        Reference.checkRelative("peak photon fluence, 1 µJ, w = 100 µm, 400 nm (photons/m²)",
                BeamPrediction.peakPhotonFluencePerM2(1e-6, 100e-6, 400e-9), 1.2819272573e20, 1e-9);
    }

    @Test
    @CheckedAgainst(source = "derived: ∫F·I dA / ∫I dA for coaxial Gaussians exp(−2r²/w²) gives "
            + "w_pump²/(w_pump² + w_probe²); equal radii give 1/2, a probe three times smaller 0.9",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void probeAveragedShareOfCoaxialGaussians() {
        Reference.check("share for equal radii", BeamPrediction.probeAveragedShare(50e-6, 50e-6), 0.5, 1e-15);
        Reference.check("share for w_probe = w_pump/3", BeamPrediction.probeAveragedShare(150e-6, 50e-6), 0.9, 1e-15);
    }

    @Test
    void theDemoPlanGivesOneFluenceCurvePerWavelengthAndOneGridPerInstrument() {
        Prediction p = new BeamPrediction().predict(DEMO);
        assertThat(p.charts()).hasSize(3);
        ChartSpec fluence = p.charts().get(0);
        assertThat(fluence.series()).extracting(ChartSpec.Series::name).containsExactly("400 nm", "515 nm", "565 nm");
        ChartSpec.Series s400 = fluence.series().get(0);
        assertThat(s400.x()).hasSize(BeamPrediction.ENERGY_POINTS);
        assertThat(s400.x()[0]).isCloseTo(1.0, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(s400.x()[s400.x().length - 1]).isCloseTo(2000.0, org.assertj.core.data.Offset.offset(1e-9));
        double expectedLast = BeamPrediction.peakPhotonFluencePerM2(2e-6, 150e-6, 400e-9) * 1e-4;
        assertThat(s400.y()[s400.y().length - 1]).isCloseTo(expectedLast, org.assertj.core.data.Offset.offset(expectedLast * 1e-12));
        assertThat(fluence.series().get(1).y()[0]).as("longer wavelength: more photons per joule")
                .isGreaterThan(s400.y()[0]);
        ChartSpec grids = p.charts().get(2);
        assertThat(grids.series()).hasSize(2);
        double[] ta = grids.series().get(0).y();
        assertThat(ta[0]).isCloseTo(0.1, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(ta[ta.length - 1]).isCloseTo(3000, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(grids.series().get(1).y()).hasSize(12500);
        assertThat(p.cautions()).contains(Cautions.LASER, Cautions.HEAVY_METALS);
        assertThat(p.derived()).extracting(Prediction.DerivedNumber::formula).allMatch(f -> f.contains("="));
    }

    @Test
    void aTcspcRangeLongerThanThePeriodNeedsThePicker() {
        LaserSetup l = DEMO.laser();
        LaserSetup mhz = new LaserSetup(l.pumpWavelengthsM(), 10e6, l.pulsePickerDivisions(), l.pulseFwhmS(),
                l.minPulseEnergyJ(), l.maxPulseEnergyJ(), l.pumpRadiusM(), l.probeRadiusM());
        PlanInputs fast = new PlanInputs(DEMO.title(), DEMO.lab(), DEMO.sample(), mhz, DEMO.instruments(), DEMO.goals(),
                DEMO.multiplicationPhotonEnergiesJ(), DEMO.limits());
        Risk atKhz = tcspcRisk(new BeamPrediction().predict(DEMO));
        Risk atMhz = tcspcRisk(new BeamPrediction().predict(fast));
        assertThat(atKhz.verdict()).isEqualTo(Verdict.PASS);
        assertThat(atMhz.verdict()).as("200 ns range, 100 ns period, picker up to ÷10").isEqualTo(Verdict.WARN);
        assertThat(atMhz.why()).contains("÷2");
        assertThat(atMhz.value()).isCloseTo(2.0, org.assertj.core.data.Offset.offset(1e-9));
    }

    private static Risk tcspcRisk(Prediction p) {
        return p.risks().stream().filter(r -> r.name().startsWith("TCSPC")).findFirst().orElseThrow();
    }

    @Test
    void theDemoProbeIsSmallEnough() {
        Risk r = new BeamPrediction().predict(DEMO).risks().get(0);
        assertThat(r.verdict()).isEqualTo(Verdict.PASS);
        assertThat(DEMO.instruments().get(1).kind()).isEqualTo(Instrument.Kind.TCSPC);
    }
}
