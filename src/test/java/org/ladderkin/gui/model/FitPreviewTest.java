package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.ladderkin.gui.model.FitFixture.waitFor;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.LadderFit;

/** The plan's own prediction over the traces: drawn with everything held, and redrawn when its inputs change. */
class FitPreviewTest {

    @TempDir
    Path dir;
    FitFixture fx;
    FitPreview preview;
    Dataset data;

    @BeforeEach
    void simulateASeries() throws Exception {
        fx = FitFixture.in(dir);
        data = fx.excited();
        preview = new FitPreview(new FitJobs(), FitFixture.DIRECT);
    }

    @AfterEach
    void close() {
        preview.close();
    }

    private LadderFit.Outcome curvesArrive(LadderFit.Outcome older) {
        waitFor("the plan's curves", () -> preview.curves().filter(c -> c.outcome() != older).isPresent());
        return preview.curves().orElseThrow().outcome();
    }

    @Test
    void theTracesAreDrawnOverThePlansModelWithEverySharedParameterHeld() {
        preview.setTraces(Optional.of(data), FitOptions.initial(), true);
        assertThat(preview.hasCurves()).as("nothing without a plan").isFalse();
        preview.setPlan(fx.plan());
        LadderFit.Outcome curves = curvesArrive(null);
        assertThat(preview.problem()).isEmpty();
        assertThat(curves.result().ok()).isTrue();
        List<FitCharts.ParameterRow> rows = FitCharts.rows(curves);
        assertThat(rows).allMatch(r -> !r.free());
        // the plan's τ₂ is held and shown in ps
        assertThat(rows).anyMatch(r -> r.name().startsWith("τ₂") && r.value().endsWith(" ps") && r.error().isEmpty());
        assertThat(preview.plan()).contains(fx.plan());
        assertThat(preview.planResponse()).hasValue("Gaussian, FWHM 200 fs");
    }

    @Test
    void recomputedAfterADataChangeWithTheOldCurvesShownUntilTheNewOnesArrive() {
        preview.setPlan(fx.plan());
        preview.setTraces(Optional.of(data), FitOptions.initial(), true);
        LadderFit.Outcome first = curvesArrive(null);

        FitData typed = new FitData();
        typed.load(List.of(fx.csv()));
        for (int i = 0; i < typed.traceCount(); i++) {
            typed.setExcitation(i, String.format(java.util.Locale.ROOT, "%.4g", 2 * FitDemoSeries.MEAN_N[i]));
        }
        preview.setTraces(typed.excited(), FitOptions.initial(), false);
        LadderFit.Outcome second = curvesArrive(first);
        assertThat(second.excitation()).containsExactly(2 * FitDemoSeries.MEAN_N[0], 2 * FitDemoSeries.MEAN_N[1],
                2 * FitDemoSeries.MEAN_N[2], 2 * FitDemoSeries.MEAN_N[3]);

        // other traces: the old curves go at once, the new ones follow
        preview.setTraces(Optional.of(data), FitOptions.initial(), true);
        assertThat(preview.curves().filter(c -> c.outcome() == second)).isEmpty();
        curvesArrive(second);
        assertThat(preview.curves().orElseThrow().data()).isSameAs(data);
    }

    @Test
    void recomputedAfterAPlanEditAndNotForAnEqualPlan() {
        preview.setPlan(fx.plan());
        preview.setTraces(Optional.of(data), FitOptions.initial(), true);
        LadderFit.Outcome first = curvesArrive(null);
        AtomicInteger told = new AtomicInteger();
        preview.addListener(told::incrementAndGet);
        preview.setPlan(fx.editor().lastValid().orElseThrow());
        assertThat(told.get()).as("an equal plan is no change").isZero();

        fx.editor().edit(PushBack.field("model.biexcitonLifetime"), "60 ps");
        preview.setPlan(fx.editor().lastValid().orElseThrow());
        LadderFit.Outcome second = curvesArrive(first);
        assertThat(second.result().estimate("tauAuger2S").value()).isCloseTo(60e-12, org.assertj.core.data.Offset.offset(1e-15));
    }

    @Test
    void tracesThatCannotBeDrawnClearTheCurves() {
        preview.setPlan(fx.plan());
        preview.setTraces(Optional.of(data), FitOptions.initial(), true);
        curvesArrive(null);
        preview.setTraces(Optional.empty(), FitOptions.initial(), false);
        assertThat(preview.hasCurves()).isFalse();
        assertThat(preview.problem()).isEmpty();
    }
}
