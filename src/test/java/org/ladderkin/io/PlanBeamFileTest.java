package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.excite.beam.BeamRadius;
import org.ladderkin.plan.PlanInputs;

/** A plan's spots measured by beam files: the radius and its standard error come from the measurement. */
class PlanBeamFileTest {

    private static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    private static final String SPOTS = "\"pumpRadius\": \"150 µm\",\n    \"probeRadius\": \"50 µm\"";

    private static Path planWith(Path dir, String spots) throws Exception {
        Files.copy(HOME.resolve("experiments-plan/fh-pump-knife-edge.csv"), dir.resolve("pump.csv"));
        Files.copy(HOME.resolve("experiments-plan/fh-probe-camera.png"), dir.resolve("probe.png"));
        String text = Files.readString(HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json"));
        assertThat(text).as("test setup").contains(SPOTS);
        Path plan = dir.resolve("p.plan.json");
        Files.writeString(plan, text.replace(SPOTS, spots));
        return plan;
    }

    @Test
    void knifeEdgeAndCameraFilesGiveTheRadiiAndTheirUncertainties(@TempDir Path dir) throws Exception {
        Path plan = planWith(dir, "\"pumpBeamFile\": \"pump.csv\", \"probeBeamFile\": \"probe.png\", \"beamPixelPitch\": \"5.5 µm\"");
        PlanInputs in = PlanCodec.read(plan);
        BeamRadius pump = BeamFiles.radius(dir.resolve("pump.csv"));
        BeamRadius probe = BeamFiles.radius(dir.resolve("probe.png"), 5.5e-6);
        assertThat(in.laser().pumpRadiusM()).isEqualTo(pump.radiusM());
        assertThat(in.laser().probeRadiusM()).isEqualTo(probe.radiusM());
        assertThat(in.laser().calibration().pumpRadiusRel()).isEqualTo(pump.stdErrorM() / pump.radiusM());
        assertThat(in.laser().calibration().probeRadiusRel()).isEqualTo(probe.stdErrorM() / probe.radiusM());
        // the demo scans were drawn at 96 µm (x) and 88 µm (y): the spot is their geometric mean
        assertThat(in.laser().pumpRadiusM()).isBetween(90e-6, 94e-6);
    }

    @Test
    void aStatedUncertaintyWinsOverTheMeasurementsOwn(@TempDir Path dir) throws Exception {
        Path plan = planWith(dir, "\"pumpBeamFile\": \"pump.csv\", \"pumpRadiusUncertainty\": \"4 %\", \"probeRadius\": \"50 µm\"");
        assertThat(PlanCodec.read(plan).laser().calibration().pumpRadiusRel()).isEqualTo(0.04);
    }

    @Test
    void aRadiusAndAFileConflictAndACameraFrameNeedsItsPitch(@TempDir Path dir) throws Exception {
        Path both = planWith(dir, "\"pumpRadius\": \"150 µm\", \"pumpBeamFile\": \"pump.csv\", \"probeRadius\": \"50 µm\"");
        assertThatThrownBy(() -> PlanCodec.read(both)).satisfies(e -> assertThat(((InputException) e).key())
                .isEqualTo(InputProblem.CONFLICT));
        Path noPitch = dir.resolve("q.plan.json");
        Files.writeString(noPitch, Files.readString(both).replace("\"pumpRadius\": \"150 µm\", \"pumpBeamFile\": \"pump.csv\"",
                "\"pumpRadius\": \"150 µm\"").replace("\"probeRadius\": \"50 µm\"", "\"probeBeamFile\": \"probe.png\""));
        assertThatThrownBy(() -> PlanCodec.read(noPitch)).satisfies(e -> assertThat(((InputException) e).key())
                .isEqualTo(InputProblem.MISSING_FIELD)).hasMessageContaining("laser.probeBeamFile");
        Path missing = dir.resolve("r.plan.json");
        Files.writeString(missing, Files.readString(noPitch).replace("probe.png", "nowhere.png"));
        assertThatThrownBy(() -> PlanCodec.read(missing)).satisfies(e -> assertThat(((InputException) e).key())
                .isEqualTo(InputProblem.NOT_FOUND));
    }
}
