package org.ladderkin.gui.model;

import org.ladderkin.plan.PlanFitBasis;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.fit.SyntheticSeries;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.PlanInputs;

/**
 * Simulated transient-absorption fluence series from a plan's own ladder, with seeded Gaussian noise: the measured
 * data of the fit view's tests and of the demo file {@code experiments-plan/fh-cdse-ta-series.csv} (invented data of
 * the fictional Fernhollow Ultrafast Spectroscopy Group). The "true" sample differs from the plan on purpose — τ₂ is
 * {@link #TAU2_FACTOR} times and σ {@link #SIGMA_FACTOR} times the plan's — so a fit has something to find.
 * Regenerate the demo file (and its sidecar) from the project folder with
 * <pre>
 * mvn -B -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt -Dmdep.includeScope=test
 * java -Dladderkin.home=. -cp target/test-classes:target/classes:$(cat target/cp.txt) org.ladderkin.gui.model.FitDemoSeries
 * </pre>
 * {@code FitSessionTest.theDemoSeriesNextToTheDemoPlanLoadsAndFitsAndAPlanEditKeepsTheFit} checks that the file
 * still fits to the τ₂ it was made with.
 */
public final class FitDemoSeries {

    /** True τ₂ over the plan's τ₂. */
    public static final double TAU2_FACTOR = 1.3;
    /** True σ over the plan's σ at its chosen pump wavelength. */
    public static final double SIGMA_FACTOR = 0.8;
    /** Mean occupancies ⟨N⟩ = σ_true·j of the traces. */
    public static final double[] MEAN_N = {0.15, 0.4, 1.0, 2.5};
    /** Signal scale (OD per unit bleach) and rms noise (OD), like a 1e-4 OD noise floor on a 10 mOD bleach. */
    public static final double AMPLITUDE_OD = 0.01;
    public static final double NOISE_OD = 1e-4;

    /**
     * The simulated series and the truth it was made with.
     *
     * @param fluencesPerM2 photon fluence of each trace (photons/m²)
     * @param tau2S         true τ₂ (s)
     * @param sigmaM2       true σ (m²)
     * @param pumpM         pump wavelength the fluences refer to (m)
     * @param csv           the table text
     * @param sidecar       the {@code ladderkin.traces/1} sidecar text
     */
    public record Series(double[] fluencesPerM2, double tau2S, double sigmaM2, double pumpM, String csv, String sidecar) {
    }

    private FitDemoSeries() {
    }

    /** Simulates the series for {@code plan} (one pulse on fresh dots, as at 1 kHz). */
    public static Series simulate(PlanInputs plan, int delays, long seed) {
        PlanFitBasis basis = PlanFitBasis.of(plan);
        double tau2 = TAU2_FACTOR * basis.model().tauBiexcitonS();
        double sigma = SIGMA_FACTOR * basis.crossSectionM2();
        double[] j = new double[MEAN_N.length];
        for (int i = 0; i < j.length; i++) {
            j[i] = MEAN_N[i] / sigma;
        }
        LadderBleachModel model = LadderBleachModel.forModel(basis.base(), "crossSectionM2", j, Double.NaN);
        ParameterValues truth = ParameterValues.shared(List.of("crossSectionM2", "tauAuger2S"), new double[] {sigma, tau2});
        double[] t = SyntheticSeries.logDelays(0.3e-12, 3e-9, delays);
        SplittableRandom rng = new SplittableRandom(seed);
        List<double[]> columns = new ArrayList<>();
        for (int i = 0; i < j.length; i++) {
            double[] y = model.predict(i, t, truth);
            for (int m = 0; m < y.length; m++) {
                y[m] = AMPLITUDE_OD * y[m] + NOISE_OD * SyntheticSeries.gaussian(rng);
            }
            columns.add(y);
        }
        StringBuilder csv = new StringBuilder();
        csv.append("# Invented demo data: simulated transient-absorption bleach (ΔA, OD) of the FH-CdSe-0412 batch,\n")
                .append("# Fernhollow Ultrafast Spectroscopy Group (fictional scenario; no real sample or lab).\n")
                .append("# Made by src/test/java/org/ladderkin/gui/model/FitDemoSeries.java from the plan cdse-auger-1khz.plan.json\n")
                .append("# with τ₂ ×").append(TAU2_FACTOR).append(" and σ ×").append(SIGMA_FACTOR)
                .append(" of the plan's values, noise ").append(NOISE_OD).append(" OD rms, seed ").append(seed).append(".\n");
        csv.append("delay (ps)");
        for (int i = 0; i < j.length; i++) {
            csv.append(",F").append(i + 1);
        }
        csv.append('\n');
        for (int m = 0; m < t.length; m++) {
            csv.append(String.format(Locale.ROOT, "%.6g", t[m] * 1e12));
            for (double[] y : columns) {
                csv.append(String.format(Locale.ROOT, ",%.4e", y[m]));
            }
            csv.append('\n');
        }
        String pump = org.ladderkin.units.Quantity.formatBest(basis.pumpWavelengthM(), org.ladderkin.units.Dimension.LENGTH, 4);
        StringBuilder side = new StringBuilder("{\n  \"schema\": \"ladderkin.traces/1\",\n  \"pump\": \"" + pump + "\",\n  \"traces\": [\n");
        for (int i = 0; i < j.length; i++) {
            side.append(String.format(Locale.ROOT, "    { \"label\": \"F%d\", \"photonFluence\": \"%.4g photons/cm²\" }%s\n",
                    i + 1, j[i] * 1e-4, i + 1 < j.length ? "," : ""));
        }
        side.append("  ]\n}\n");
        return new Series(j, tau2, sigma, basis.pumpWavelengthM(), csv.toString(), side.toString());
    }

    /** Writes {@code NAME.csv} and {@code NAME.traces.json} into {@code dir}; returns the table's path. */
    public static Path write(Series s, Path dir, String name) throws IOException {
        Path csv = dir.resolve(name + ".csv");
        AtomicFiles.writeString(csv, s.csv());
        AtomicFiles.writeString(dir.resolve(name + FitData.SIDECAR_SUFFIX), s.sidecar());
        return csv;
    }

    /** Writes the demo series next to the CdSe demo plan. */
    public static void main(String[] args) throws IOException {
        Path home = Path.of(System.getProperty("ladderkin.home", "."));
        PlanInputs plan = PlanCodec.read(home.resolve("experiments-plan/cdse-auger-1khz.plan.json"));
        Path out = write(simulate(plan, 48, 20261202L), home.resolve("experiments-plan"), "fh-cdse-ta-series");
        System.out.println("wrote " + out);
    }
}
