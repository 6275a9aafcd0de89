package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.Planner;

/** A flowing cell without a given cross-section rests on the default channel width, and the report says so. */
class FlowingDefaultsLineTest {

    @Test
    void theDefaultCrossSectionIsAmongTheDefaultsUsedAndAGivenOneIsNot(@TempDir Path dir) throws Exception {
        String demo = Files.readString(Path.of(System.getProperty("ladderkin.home", "."))
                .resolve("experiments-plan/cdse-auger-1khz.plan.json"));
        String line = defaults(dir, demo, "\"flowRate\": \"5 mL/min\", \"cellVolume\": \"0.5 mL\"");
        assertThat(line).contains("refresh: flowing, pump 1/e² diameter / flow speed = 0.300 mm / 8.33 mm/s")
                .contains("path length 1.00 mm × 10.0 mm, a flow cuvette's channel width");
        String given = defaults(dir, demo, "\"flowRate\": \"5 mL/min\", \"cellVolume\": \"0.5 mL\", \"cellCrossSection\": \"2 mm2\"");
        assertThat(given).doesNotContain("refresh: flowing");
    }

    private static String defaults(Path dir, String demo, String fields) throws Exception {
        String changed = demo.replace("\"refresh\": { \"mode\": \"stirred\" }", "\"refresh\": { \"mode\": \"flowing\", " + fields + " }");
        assertThat(changed).isNotEqualTo(demo);
        Path p = Files.createTempFile(dir, "flowing", ".plan.json");
        Files.writeString(p, changed);
        CampaignPlan plan = Planner.plan(PlanCodec.read(p), Planner.Progress.NONE, false);
        return ModeSections.defaultsLine(plan, ModeSections.Mode.TRANSIENT_ABSORPTION);
    }
}
