package org.ladderkin.fuzz;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Valid inputs for the readers no shipped file exercises (photon-counting histograms, integrated PL, TA matrices, text
 * pixel matrices): small invented tables with the shapes the readers document, written once under target/.
 */
final class Seeds {

    private static final Path DIR = InputKinds.HOME.resolve("target/fuzz-seeds");

    static final Path HISTOGRAM = write("tcspc.csv", histogram());
    static final Path INTEGRATED_PL = write("integrated-pl.csv", integratedPl());
    static final Path TA_MATRIX = write("ta-matrix.csv", "delay (ps) \\ wavelength (nm),570,575,580,585,590\n"
            + "-1,9,0,0,0,9\n0,9,1,2,3,9\n10,9,0.5,1,1.5,9\n100,9,0.1,0.2,0.3,9\n");
    static final Path PIXEL_MATRIX = write("frame.tsv", pixels());

    private Seeds() {
    }

    /** Two decays of 20 ns on a background of 2 counts, 0.1 ns bins. */
    private static String histogram() {
        StringBuilder b = new StringBuilder("time (ns),pl0,pl1\n");
        for (int i = 0; i < 200; i++) {
            double t = 0.05 + 0.1 * i;
            b.append(String.format(Locale.ROOT, "%.2f,%d,%d%n", t, Math.round(2 + 900 * Math.exp(-t / 20)), Math.round(2 + 300 * Math.exp(-t / 20))));
        }
        return b.toString();
    }

    /** Saturation 1 − exp(−σj) at σ = 4e-15 cm². */
    private static String integratedPl() {
        StringBuilder b = new StringBuilder("fluence (photons/cm2),pl\n");
        for (int i = 0; i < 10; i++) {
            double j = 1e13 * Math.pow(2, i);
            b.append(String.format(Locale.ROOT, "%.6g,%.8g%n", j, 500 * -Math.expm1(-4e-15 * j)));
        }
        return b.toString();
    }

    /** A round Gaussian spot of 6 px 1/e² radius in a 40 × 30 frame. */
    private static String pixels() {
        StringBuilder b = new StringBuilder("# frame\n");
        for (int r = 0; r < 30; r++) {
            for (int c = 0; c < 40; c++) {
                double rr = (c - 20) * (c - 20) + (r - 15) * (r - 15);
                b.append(c == 0 ? "" : "\t").append(Math.round(20 + 1000 * Math.exp(-2 * rr / 36)));
            }
            b.append('\n');
        }
        return b.toString();
    }

    private static Path write(String name, String text) {
        try {
            Files.createDirectories(DIR);
            return Files.writeString(DIR.resolve(name), text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
