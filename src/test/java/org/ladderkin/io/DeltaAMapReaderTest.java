package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.ladderkin.io.InputAssertions.input;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.map.DeltaAMap;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Units;

class DeltaAMapReaderTest {

    @TempDir
    Path dir;

    private static final MapOptions PS = MapOptions.defaults(Units.of("ps"));

    /** Rows are delays; one empty and one NaN cell. */
    private static final String DOWN = "delay (ps) \\ wavelength (nm) [mOD],500,520,540\n"
            + "-1,0.1,0.2,0.3\n"
            + "0,1,,3\n"
            + "# a comment line\n"
            + "10,4,5,NaN\n";

    /** The same map written the other way round. */
    private static final String ACROSS = "wavelength (nm) \\ delay (ps) [mOD];-1;0;10\n"
            + "500;0,1;1;4\n"
            + "520;0,2;;5\n"
            + "540;0,3;3;NaN\n";

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    private DeltaAMap read(String text) throws IOException {
        return DeltaAMapReader.read(write("m.csv", text), "m.csv", PS);
    }

    @Test
    void readsAMapWithDelaysDownInOdKeepingMissingCells() throws IOException {
        DeltaAMap m = read(DOWN);
        assertThat(m.wavelengthsM()).containsExactly(new double[] {500e-9, 520e-9, 540e-9}, within(1e-20));
        assertThat(m.delaysS()).containsExactly(new double[] {-1e-12, 0, 10e-12}, within(1e-25));
        assertThat(m.value(0, 2)).isCloseTo(0.3e-3, within(1e-15));
        assertThat(m.value(2, 1)).isCloseTo(5e-3, within(1e-15));
        assertThat(m.missing(1, 1)).isTrue();
        assertThat(m.missing(2, 2)).isTrue();
        assertThat(m.missing(1, 0)).isFalse();
        assertThat(m.missingCount()).isEqualTo(2);
        assertThat(m.deltaAOd()).hasSize(9);
    }

    @Test
    void theTransposeIsReadToTheSameMapByItsCornerOrByOption() throws IOException {
        DeltaAMap down = read(DOWN);
        assertThat(read(ACROSS)).isEqualTo(down);
        // no units in the corner: the first row's numbers (delays spanning decades) tell the layout
        String bare = ACROSS.replace("wavelength (nm) \\ delay (ps) [mOD]", "mOD");
        assertThat(read(bare)).isEqualTo(down);
        // a first row that looks like neither is read as told
        String ambiguous = "mOD,1,2,3\n600,1,2,3\n700,4,5,6\n";
        assertThatThrownBy(() -> read(ambiguous)).satisfies(input(InputProblem.WRONG_UNIT, "m.csv:1", null));
        DeltaAMap t = DeltaAMapReader.read(write("t.csv", ambiguous), "t.csv", PS.transposed());
        assertThat(t.delaysS()).containsExactly(new double[] {1e-12, 2e-12, 3e-12}, within(1e-25));
        assertThat(t.wavelengthsM()).containsExactly(new double[] {600e-9, 700e-9}, within(1e-20));
        assertThat(t.value(2, 1)).isCloseTo(6e-3, within(1e-15));
    }

    @Test
    void photonEnergiesBecomeAscendingWavelengthsWithTheirColumns() throws IOException {
        DeltaAMap m = read("delay (ps) \\ energy (eV),2.0,2.5\n0,1,2\n5,3,4\n");
        double hc = PhysicalConstants.HC_J_M / PhysicalConstants.ELECTRONVOLT_J;
        assertThat(m.wavelengthsM()[0]).isCloseTo(hc / 2.5, within(1e-18));
        assertThat(m.wavelengthsM()[1]).isCloseTo(hc / 2.0, within(1e-18));
        assertThat(m.value(1, 0)).isEqualTo(4);
        assertThat(m.value(1, 1)).isEqualTo(3);
    }

    @Test
    void transmissionChangesAreStoredAsAbsorbanceChanges() throws IOException {
        DeltaAMap m = read("delay (ps) \\ wavelength (nm) ΔT/T,500,510\n0,0.1,-0.05\n1,0,0.02\n");
        // ΔA = −log10(T/T0) with T/T0 = 1 + ΔT/T
        assertThat(m.value(0, 0)).isCloseTo(-Math.log10(1.1), within(1e-15));
        assertThat(m.value(0, 1)).isCloseTo(-Math.log10(0.95), within(1e-15));
        DeltaAMap told = DeltaAMapReader.read(write("o.csv", "delay (ps),500,510\n0,0.1,-0.05\n1,0,0.02\n"), "o.csv",
                PS.withSignal(MapOptions.Signal.DELTA_T_OVER_T));
        assertThat(told).isEqualTo(m);
        assertThatThrownBy(() -> read("delay (ps) \\ wavelength (nm) dT/T,500,510\n0,0.1,-1\n1,0,0.02\n"))
                .satisfies(input(InputProblem.OUT_OF_RANGE, "m.csv:2:7", "ΔT/T"));
    }

    @Test
    void badMapsAreRefusedAtTheirLine() {
        assertThatThrownBy(() -> read("delay (ps),500,520,540\n0,1,2,3\n1,1,2\n"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "m.csv:3", null));
        assertThatThrownBy(() -> read("delay (ps),500,520,510\n0,1,2,3\n1,1,2,3\n"))
                .satisfies(input(InputProblem.BAD_ORDER, "m.csv:1:20", "first row"));
        assertThatThrownBy(() -> read("delay (ps),500,520,520\n0,1,2,3\n1,1,2,3\n"))
                .satisfies(input(InputProblem.DUPLICATE, "m.csv:1:20", "first row"));
        assertThatThrownBy(() -> read("delay (ps),500,520,540\n0,1,2,3\n1,1,2,3\n1,4,5,6\n"))
                .satisfies(input(InputProblem.DUPLICATE, "m.csv:4:1", "delay"));
        assertThatThrownBy(() -> read("delay (ps),500,520,540\n0,1,,3\n1,1,NaN,3\n"))
                .satisfies(input(InputProblem.EMPTY, "m.csv:1:16", "column 3"));
        assertThatThrownBy(() -> read("delay (ps),500,520,540\n0,1,2,3\n1,1,x2,3\n"))
                .satisfies(input(InputProblem.BAD_NUMBER, "m.csv:3:5", "column 3"));
        // the transposed layout finds the same faults on its rows
        assertThatThrownBy(() -> read("wavelength (nm) \\ delay (ps),0,1\n500,1,2\n520,1,2\n510,1,2\n"))
                .satisfies(input(InputProblem.BAD_ORDER, "m.csv:4:1", "first column"));
        assertThatThrownBy(() -> read("wavelength (nm) \\ delay (ps),0,1\n500,1,2\n520,,NaN\n"))
                .satisfies(input(InputProblem.EMPTY, "m.csv:3:1", "first column"));
        assertThatThrownBy(() -> read("wavelength (nm) \\ delay (ps),0,1,1\n500,1,2,3\n"))
                .satisfies(input(InputProblem.DUPLICATE, "m.csv:1:34", "delay"));
    }

    @Test
    void aSeriesSharesOneWavelengthAxisOrIsRefusedAtTheMapThatDiffers() throws IOException {
        Path a = write("a.csv", DOWN);
        Path b = write("b.csv", ACROSS);
        Path c = write("c.csv", "# fluence 3\ndelay (ps),500,521,540\n0,1,2,3\n1,1,2,3\n");
        assertThat(DeltaAMapReader.readAll(java.util.List.of(a, b), PS)).hasSize(2);
        assertThatThrownBy(() -> DeltaAMapReader.readAll(java.util.List.of(a, b, c), PS))
                .satisfies(input(InputProblem.MISMATCH, c + ":2", "wavelengths"))
                .hasMessageContaining("wavelength 2 is 521 nm here but 520 nm in " + a);
    }

    @Test
    void aBroadbandMapOf1024WavelengthsBy300DelaysStreamsIntoFlatArrays() throws IOException {
        int nw = 1024;
        int nt = 300;
        Path p = dir.resolve("big.tsv");
        try (BufferedWriter w = Files.newBufferedWriter(p, StandardCharsets.UTF_8)) {
            StringBuilder line = new StringBuilder("delay (ps)");
            for (int i = 0; i < nw; i++) {
                line.append('\t').append(400 + 0.5 * i);
            }
            w.write(line.append('\n').toString());
            for (int t = 0; t < nt; t++) {
                line.setLength(0);
                line.append(String.format(Locale.ROOT, "%.3f", -2 + 0.1 * t));
                for (int i = 0; i < nw; i++) {
                    line.append('\t').append(i == 7 && t == 11 ? "" : String.format(Locale.ROOT, "%.5e", 1e-3 * i + t));
                }
                w.write(line.append('\n').toString());
            }
        }
        DeltaAMap m = DeltaAMapReader.read(p, "big.tsv", PS);
        assertThat(m.wavelengthsM()).hasSize(nw);
        assertThat(m.delaysS()).hasSize(nt);
        assertThat(m.deltaAOd()).hasSize(nw * nt);
        assertThat(m.missingCount()).isEqualTo(1);
        assertThat(m.value(299, 1023)).isCloseTo(1.023 + 299, within(1e-9));
    }
}
