package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The open dialog lists plans only, and Open Recent names files by their (home-abbreviated) full path. */
class PlanFilesTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));

    @TempDir
    Path dir;

    @Test
    void theDemoFolderListsItsPlansNotTheTraceSidecarTheSpectraOrTheSample() throws Exception {
        try (Stream<Path> files = Files.list(HOME.resolve("experiments-plan"))) {
            assertThat(files.filter(PlanFiles::listed).map(p -> p.getFileName().toString()))
                    .containsExactlyInAnyOrder("cdse-auger-1khz.plan.json", "pbse-multiplication-80mhz.plan.json",
                            "inp-zns-tcspc-5mhz.plan.json", "cdse-cds-gain-film.plan.json", "cspbbr3-auger-1khz.plan.json",
                            "cdse-cdte-gain-type2.plan.json");
        }
        try (Stream<Path> files = Files.list(HOME.resolve("models/materials"))) {
            assertThat(files.filter(PlanFiles::listed)).as("materials are JSON but no plans").isEmpty();
        }
    }

    @Test
    void aPlanWithoutThePlanSuffixIsFoundByItsSchema() throws Exception {
        Path renamed = dir.resolve("campaign.json");
        Files.copy(HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json"), renamed);
        Path traces = dir.resolve("series.json");
        Files.copy(HOME.resolve("experiments-plan/fh-cdse-ta-series.traces.json"), traces);
        Path notJson = dir.resolve("notes.json");
        Files.write(notJson, new byte[] {(byte) 0xff, (byte) 0xfe, 0, 1});
        assertThat(PlanFiles.listed(renamed)).isTrue();
        assertThat(PlanFiles.listed(traces)).isFalse();
        assertThat(PlanFiles.listed(notJson)).isFalse();
        assertThat(PlanFiles.listed(dir)).as("folders, to walk into").isTrue();
        assertThat(PlanFiles.schema(traces)).contains("ladderkin.traces/1");
    }

    @Test
    void recentFilesAreNamedByTheirFullPathWithTheHomeFolderShortened() {
        Path home = dir.resolve("home/ada");
        assertThat(PlanFiles.menuLabel(home.resolve("plans/cdse.plan.json"), home))
                .isEqualTo("~" + File.separator + "plans" + File.separator + "cdse.plan.json");
        Path elsewhere = dir.resolve("lab/cdse.plan.json");
        assertThat(PlanFiles.menuLabel(elsewhere, home)).isEqualTo(elsewhere.toAbsolutePath().toString());
        assertThat(PlanFiles.menuLabel(elsewhere, null)).isEqualTo(elsewhere.toAbsolutePath().toString());
        assertThat(PlanFiles.menuLabel(dir.resolve("home/adam/x.plan.json"), home))
                .as("a folder whose name merely starts like home").doesNotStartWith("~");
    }
}
