package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.excite.beam.SyntheticBeams;

class BeamCommandTest {

    @TempDir
    Path dir;

    private static final Path KNIFE = MainTest.HOME.resolve("experiments-plan/fh-pump-knife-edge.csv");
    private static final Path CAMERA = MainTest.HOME.resolve("experiments-plan/fh-probe-camera.png");

    private Path png16(String name, double[] v, int side) throws IOException {
        BufferedImage img = new BufferedImage(side, side, BufferedImage.TYPE_USHORT_GRAY);
        for (int r = 0; r < side; r++) {
            for (int c = 0; c < side; c++) {
                img.getRaster().setSample(c, r, 0, (int) Math.max(0, Math.min(65535, Math.round(v[r * side + c]))));
            }
        }
        Path f = dir.resolve(name);
        ImageIO.write(img, "png", f.toFile());
        return f;
    }

    /** One line on standard error, exit 3, naming the file. */
    private static void badInput(MainTest.Run r, String start, String contains) {
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).startsWith("ladderkin: " + start).contains(contains).doesNotContain("\n");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void demoFilesInText() {
        MainTest.Run r = MainTest.run("beam", KNIFE.toString(), CAMERA.toString(), "--pixel-pitch", "5.5um");
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        assertThat(r.out()).contains("knife edge 'power x z=0mm (µW)'").contains("10–90 % rule").contains("D4σx")
                .contains("1/e² radius").contains("No caustic");
    }

    @Test
    void jsonPerFileAndTheCausticOfSevenFrames() throws Exception {
        double lambda = 400e-9;
        double w0 = 40e-6;
        double zR = Math.PI * w0 * w0 / lambda;
        List<String> args = new ArrayList<>(List.of("beam"));
        StringBuilder zs = new StringBuilder();
        for (int i = 0; i < 7; i++) {
            double z = zR * (-2 + 4.0 * i / 6);
            double w = w0 * Math.sqrt(1 + (z / zR) * (z / zR)) / 5.5e-6;
            args.add(png16("f" + i + ".png", SyntheticBeams.gaussian(170, 170, 85, 84, w, w, 0, 30000, 800, 20, i), 170).toString());
            zs.append(i == 0 ? "" : ",").append(z * 1e3).append("mm");
        }
        args.addAll(List.of("--pixel-pitch", "5.5um", "--z", zs.toString(), "--wavelength", "400nm", "--format", "json"));
        MainTest.Run r = MainTest.run(args.toArray(String[]::new));
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("schema").asText()).isEqualTo("ladderkin.beam/1");
        JsonNode first = j.get("measurements").get(0);
        for (String key : new String[] {"radius1e2Um", "d4SigmaXUm", "d4SigmaYUm", "centroidXUm", "centroidYUm"}) {
            assertThat(first.get(key).get("value").isNumber()).as(key).isTrue();
            assertThat(first.get(key).get("stdError").isNumber()).as(key).isTrue();
        }
        assertThat(first.get("ellipticity").asDouble()).isBetween(0.95, 1.0);
        assertThat(first.get("angleDeg").isNumber()).isTrue();
        assertThat(j.get("caustics")).hasSize(2);
        JsonNode c = j.get("caustics").get(0);
        for (String key : new String[] {"waistRadiusUm", "waistPositionMm", "rayleighRangeMm", "mSquared"}) {
            assertThat(c.get(key).get("value").isNumber()).as(key).isTrue();
            assertThat(c.get(key).get("stdError").isNumber()).as(key).isTrue();
        }
        assertThat(c.get("mSquared").get("value").asDouble()).isBetween(0.97, 1.03);
        assertThat(c.get("waistRadiusUm").get("value").asDouble()).isBetween(39.6, 40.4);
        assertThat(c.get("isoSampling").asBoolean()).isFalse();

        MainTest.Run text = MainTest.run(args.subList(0, args.size() - 2).toArray(String[]::new));
        assertThat(text.out()).contains("Caustic (x, 7 planes)").contains("M² = ").contains("ISO 11146-1 asks for 10");
    }

    @Test
    void badBeamFilesGiveOneLineAndExitThree() throws IOException {
        Path flat = Files.writeString(dir.resolve("flat.csv"), "x (um),P (mW)\n0,1\n10,1.01\n20,0.99\n30,1\n40,1.02\n50,0.98\n60,1\n");
        badInput(MainTest.run("beam", flat.toString()), flat + ":1:8: field 'P (mW)': no edge in the scan", "scan across the whole beam");

        Path order = Files.writeString(dir.resolve("order.csv"), "x (um),P\n0,0\n10,0.1\n20,0.5\n15,0.6\n40,0.9\n50,1\n60,1\n");
        badInput(MainTest.run("beam", order.toString()), order + ":5:1: field 'x (um)': blade position 15 µm turns back from 20 µm at line 4",
                "increase or decrease strictly");

        Path dark = png16("dark.png", SyntheticBeams.gaussian(64, 64, 32, 32, 8, 8, 0, 0, 300, 5, 1), 64);
        badInput(MainTest.run("beam", dark.toString(), "--pixel-pitch", "5.5um"), dark + ": no spot", "rms noise");

        double[] hot = SyntheticBeams.gaussian(64, 64, 32, 32, 8, 8, 0, 90000, 100, 0, 2);
        long clipped = java.util.Arrays.stream(hot).filter(v -> Math.round(v) >= 65535).count();
        Path sat = png16("sat.png", hot, 64);
        badInput(MainTest.run("beam", sat.toString(), "--pixel-pitch", "5.5um"), sat + ": " + clipped + " saturated pixels",
                "at or above 65535");

        StringBuilder m = new StringBuilder();
        double[] v = SyntheticBeams.gaussian(20, 20, 10, 10, 3, 3, 0, 4000, 50, 0, 3);
        for (int r = 0; r < 20; r++) {
            for (int c = 0; c < 20; c++) {
                m.append(c == 0 ? "" : ",").append(Math.round(v[r * 20 + c]));
            }
            m.append('\n');
        }
        Path table = Files.writeString(dir.resolve("frame.csv"), m.toString());
        long over = java.util.Arrays.stream(v).filter(x -> Math.round(x) >= 4000).count();
        badInput(MainTest.run("beam", table.toString(), "--pixel-pitch", "5.5um", "--saturation", "4000"), table + ":",
                over + " saturated pixel");
        assertThat(MainTest.run("beam", table.toString(), "--pixel-pitch", "5.5um").exit()).isZero();
    }

    @Test
    void zMustGiveOnePositionPerFile() {
        MainTest.Run r = MainTest.run("beam", KNIFE.toString(), "--z", "0mm,1mm");
        assertThat(r.exit()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("--z gives 2 positions for 1 file");
    }
}
