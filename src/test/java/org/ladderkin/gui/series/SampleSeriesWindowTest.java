package org.ladderkin.gui.series;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Condition;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.archive.ArchiveStore;
import org.ladderkin.archive.DataFileHash;
import org.ladderkin.archive.FitEntry;
import org.ladderkin.archive.FitParameter;
import org.ladderkin.archive.SampleEntry;
import org.ladderkin.report.ChartSpec;

/** The Sample series view on an archive of four invented CdSe sizes (needs a display; skipped without one). */
class SampleSeriesWindowTest {

    @TempDir
    Path dir;

    FrameFixture window;

    @AfterEach
    void close() {
        if (window != null) {
            window.cleanUp();
        }
        System.clearProperty("ladderkin.archive");
    }

    static void fill(String url) {
        try (ArchiveStore a = ArchiveStore.open(url, "test")) {
            double[] d = {3.0, 3.6, 4.3, 5.1};
            for (int i = 0; i < d.length; i++) {
                double m = d[i] * 1e-9;
                double v = Math.PI * m * m * m / 6;
                double tau = 0.05 * v * 1e27;
                a.addFit(SampleEntry.of("FH-CdSe-S" + i, "CdSe", m, v, Double.NaN), new FitEntry("{}", "converged", "ladder", 1,
                        List.of(new FitParameter("tauAuger2Ps", tau, 0.05 * tau, Double.NaN, false)),
                        List.of(new DataFileHash("/data/s" + i + ".csv", "")), "/nowhere/fit-" + i, "test", ""));
            }
        }
    }

    @Test
    void theTableTheTrendAndTheNextSize() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "needs a display");
        Path file = dir.resolve("series.sqlite");
        fill(ArchiveStore.sqliteUrl(file.toString()));
        System.setProperty("ladderkin.archive", file.toString());
        AtomicReference<Double> planned = new AtomicReference<>();
        SampleSeriesWindow w = GuiActionRunner.execute(() -> new SampleSeriesWindow(() -> "FH-CdSe-S2", planned::set));
        window = new FrameFixture(w);
        window.show();
        window.moveTo(new java.awt.Point(0, 0));
        window.resizeTo(new java.awt.Dimension(980, 720));
        Pause.pause(new Condition("archive read") {
            @Override
            public boolean test() {
                return w.rows().size() == 4;
            }
        }, Duration.ofSeconds(20).toMillis());
        window.table("series:table").requireRowCount(4);
        // sortable: a click on the τ₂ header orders by it
        window.table("series:table").tableHeader().clickColumn(5);
        window.table("series:table").tableHeader().clickColumn(5);
        assertThat(window.table("series:table").valueAt(org.assertj.swing.data.TableCell.row(0).column(1)))
                .as("largest τ₂ first after two clicks").isEqualTo("FH-CdSe-S3");
        ChartSpec spec = GuiActionRunner.execute(w::chartSpec);
        assertThat(spec.series()).extracting(ChartSpec.Series::name)
                .contains("CdSe samples", "this sample (FH-CdSe-S2)").anyMatch(n -> n.startsWith("CdSe fit, p = 1.00"));
        window.table("series:table").selectRows(0);
        window.button("series:plan-next").click();
        // 3.0 → 5.1 nm in three steps: ratio (5.1/3)^(1/3), the next size one more step
        assertThat(planned.get()).isCloseTo(5.1 * Math.pow(5.1 / 3.0, 1.0 / 3), org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    void theNextSizeStepsEvenlyInLog() {
        List<SampleEntry> s = List.of(SampleEntry.of("a", "CdSe", 3e-9, Double.NaN, Double.NaN),
                SampleEntry.of("b", "CdSe", 4.5e-9, Double.NaN, Double.NaN), SampleEntry.of("c", "PbSe", 9e-9, Double.NaN, Double.NaN));
        assertThat(SeriesArchive.nextDiameterNm(s, "CdSe")).isCloseTo(6.75, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(SeriesArchive.nextDiameterNm(List.of(s.get(2)), "PbSe")).isCloseTo(10.35, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(SeriesArchive.nextDiameterNm(s, "InP")).isNaN();
    }
}
