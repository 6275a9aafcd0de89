package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;
import static org.ladderkin.io.PlanCodecRejectionTest.at;
import static org.ladderkin.io.PlanCodecRejectionTest.demoText;
import static org.ladderkin.io.PlanCodecRejectionTest.read;

import java.io.IOException;
import org.junit.jupiter.api.Test;
import org.ladderkin.plan.PlanInputs;

/** The laser's calibration and stability fields and the TA instrument's time-zero and IRF-width uncertainties. */
class PlanCodecCalibrationTest {

    private static final String RADII = "\"probeRadius\": \"50 µm\"";

    @Test
    void statedUncertaintiesAreBoundAndUnstatedOnesStayNaN() throws IOException {
        String t = demoText().replace(RADII, RADII + ", \"pulseEnergyUncertainty\": \"3 %\", \"pumpRadiusUncertainty\": \"4 %\", "
                + "\"crossSectionUncertainty\": \"12 %\", \"pumpFluctuation\": \"2 %\", \"pumpDriftPerHour\": \"0.5 %\"")
                .replace("\"irfFwhm\": \"200 fs\"", "\"irfFwhm\": \"200 fs\", \"timeZeroUncertainty\": \"30 fs\", \"irfWidthUncertainty\": \"8 %\"");
        PlanInputs p = read(t);
        var c = p.laser().calibration();
        assertThat(c.pulseEnergyRel()).isEqualTo(0.03);
        assertThat(c.pumpRadiusRel()).isEqualTo(0.04);
        assertThat(c.probeRadiusRel()).isNaN();
        assertThat(c.orDefaults().probeRadiusRel()).isEqualTo(0.04);
        assertThat(c.crossSectionRel()).isEqualTo(0.12);
        assertThat(p.laser().pumpFluctuationOrDefault()).isEqualTo(0.02);
        assertThat(p.laser().driftPerHourOrDefault()).isEqualTo(0.005);
        assertThat(p.instruments().get(0).timeZeroUncertaintyOrDefault()).isCloseTo(30e-15, org.assertj.core.data.Offset.offset(1e-20));
        assertThat(p.instruments().get(0).irfWidthRelOrDefault()).isEqualTo(0.08);
        PlanInputs plain = read(demoText());
        assertThat(plain.laser().calibration().pulseEnergyRel()).isNaN();
        assertThat(plain.instruments().get(0).timeZeroUncertaintyOrDefault()).isCloseTo(50e-15, org.assertj.core.data.Offset.offset(1e-20));
    }

    @Test
    void averagePowerSetsTheHighestPulseEnergyAndTheMeterItsUncertainty() throws IOException {
        String t = demoText().replace("\"pulseEnergyRange\": [\"1 nJ\", \"2 µJ\"]", "\"averagePower\": \"2 mW\", \"powerMeterUncertainty\": \"3 %\"");
        PlanInputs p = read(t);
        // 2 mW at 1 kHz is 2 µJ per pulse
        assertThat(p.laser().maxPulseEnergyJ()).isCloseTo(2e-6, org.assertj.core.data.Offset.offset(1e-15));
        assertThat(p.laser().minPulseEnergyJ()).isCloseTo(2e-10, org.assertj.core.data.Offset.offset(1e-19));
        assertThat(p.laser().calibration().pulseEnergyRel()).isEqualTo(0.03);
    }

    @Test
    void powerAndRangeTogetherConflict() throws IOException {
        String t = demoText().replace(RADII, RADII + ", \"averagePower\": \"2 mW\"");
        assertThatThrownBy(() -> read(t)).satisfies(input(InputProblem.CONFLICT, at(t, "\"2 mW\"", 0), "laser.averagePower"));
    }

    @Test
    void meterAndEnergyUncertaintyTogetherConflict() throws IOException {
        String t = demoText().replace(RADII, RADII + ", \"powerMeterUncertainty\": \"3 %\", \"pulseEnergyUncertainty\": \"4 %\"");
        assertThatThrownBy(() -> read(t)).satisfies(input(InputProblem.CONFLICT, at(t, "\"3 %\"", 0), "laser.powerMeterUncertainty"));
    }

    @Test
    void anUncertaintyOfAHundredPercentIsRejected() throws IOException {
        String t = demoText().replace(RADII, RADII + ", \"pumpRadiusUncertainty\": \"100 %\"");
        assertThatThrownBy(() -> read(t)).satisfies(input(InputProblem.OUT_OF_RANGE, at(t, "\"100 %\"", 0), "laser.pumpRadiusUncertainty"));
    }
}
