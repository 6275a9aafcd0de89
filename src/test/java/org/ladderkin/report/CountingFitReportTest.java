package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.counting.CountHistogram;
import org.ladderkin.fit.counting.CountingFit;
import org.ladderkin.fit.counting.JointFitTest;
import org.ladderkin.fit.counting.LikelihoodResult;

/** fit-report.html of a counting fit: both data sets of a joint fit, what they share, finite numbers, escaped names. */
class CountingFitReportTest {

    private static final String HOSTILE = "<script>alert(1)</script>";

    @Test
    void aJointReportShowsBothDataSetsTheSharedParametersAndEscapesUserText() {
        List<CountHistogram> read = JointFitTest.histograms(3);
        List<CountHistogram> histograms = new ArrayList<>();
        // a header as a user may write it: the report must show it as text, never run it
        CountHistogram h0 = read.get(0);
        histograms.add(CountHistogram.of(HOSTILE, h0.startS(), h0.binWidthS(), h0.counts()).withExcitation(h0.excitation()));
        histograms.addAll(read.subList(1, read.size()));
        Dataset ta = JointFitTest.ta(4);
        LikelihoodResult r = CountingFit.fit(histograms, ta, JointFitTest.setup());
        assertThat(r.status()).as(r.message()).isEqualTo(LikelihoodResult.Status.CONVERGED);

        String html = CountingFitReport.html(new CountingFitReport.Input(List.of("tcspc & more.csv", "ta<1>.csv"), histograms,
                ta, r, List.of("Instrument response: Gaussian; its shift is fitted.")));

        assertThat(html).doesNotContain("<script").contains("&lt;script&gt;alert(1)&lt;/script&gt;")
                .contains("tcspc &amp; more.csv").contains("ta&lt;1&gt;.csv").doesNotContain("ta<1>");
        assertThat(html).doesNotContain("NaN").doesNotContain("Infinity").doesNotContain("unavailable");
        // both data sets: the histograms with their model and deviance residuals, the TA traces with their fit
        assertThat(html).contains("Histograms and fit", "Deviance residuals", "TA traces and fit", "TA residuals (data − fit)");
        assertThat(html.split("<svg", -1)).hasSize(5);
        assertThat(html).contains(">pl1<", ">pl2<", ">ta0<", ">ta1<", ">ta2<");
        assertThat(html).contains("Shared by both data sets: σ (cm²), τ₂ (ps), τ_rad (ns).")
                .contains("histograms only").contains("IRF shift (ps)");
        assertThat(html).contains(String.format(java.util.Locale.ROOT, "Poisson deviance %.4g over %d bins; %d degrees of freedom",
                r.poissonDeviance(), r.countBins(), r.degreesOfFreedom()));
        assertThat(html).contains("goodness of fit P = ").contains("TA traces: χ²");
    }
}
