package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Trace;
import org.ladderkin.units.Units;

class TaMatrixReaderTest {

    @TempDir
    Path dir;

    private static final MatrixOptions WINDOW = MatrixOptions.window(575e-9, 585e-9, Units.of("ps"));

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    /** Rows are delays, columns 570, 575, 580, 585, 590 nm; the window averages the middle three. */
    private static final String DOWN = "delay (ps) \\ wavelength (nm),570,575,580,585,590\n"
            + "-1,9,0,0,0,9\n0,9,1,2,3,9\n10,9,0.5,1,1.5,9\n100,9,0.1,0.2,0.3,9\n";

    @Test
    void averagesTheWindowWhenDelaysRunDown() throws IOException {
        Trace t = TaMatrixReader.read(write("m.csv", DOWN), "m.csv", WINDOW);
        assertThat(t.delaysS()).containsExactly(-1e-12, 0, 10e-12, 100e-12);
        assertThat(t.signal()[1]).isCloseTo(2.0, within(1e-12));
        assertThat(t.signal()[3]).isCloseTo(0.2, within(1e-12));
        assertThat(t.label()).isEqualTo("m");
    }

    @Test
    void transposedMatrixGivesTheSameTrace() throws IOException {
        String across = "wavelength (nm) \\ delay (ps),-1,0,10,100\n570,9,9,9,9\n575,0,1,0.5,0.1\n580,0,2,1,0.2\n"
                + "585,0,3,1.5,0.3\n590,9,9,9,9\n";
        Trace down = TaMatrixReader.read(write("a.csv", DOWN), "a.csv", WINDOW);
        Trace acrossT = TaMatrixReader.read(write("b.csv", across), "b.csv", WINDOW);
        assertThat(acrossT.delaysS()).containsExactly(down.delaysS());
        for (int i = 0; i < down.size(); i++) {
            assertThat(acrossT.signal()[i]).isCloseTo(down.signal()[i], within(1e-12));
        }
    }

    @Test
    void orientationIsGuessedFromNumbersWhenTheCornerSaysNothing() throws IOException {
        String downBare = DOWN.replace("delay (ps) \\ wavelength (nm)", "");
        assertThat(TaMatrixReader.read(write("c.csv", downBare), "c.csv", WINDOW).signal()[1]).isCloseTo(2.0, within(1e-12));
        String acrossBare = "x;-1;0;10;100\n580;0;2;1;0,2\n600;1;1;1;1\n";
        Trace t = TaMatrixReader.read(write("d.csv", acrossBare), "d.csv", WINDOW);
        assertThat(t.signal()).containsExactly(0, 2, 1, 0.2);
    }

    @Test
    void ambiguousOrientationAsksForTheFlag() throws IOException {
        // 1, 2, 5: too short for wavelengths in nm, too narrow a span to be sure they are delays
        Path p = write("e.csv", ",1,2,5\n580,1,2,3\n590,1,2,3\n600,3,2,1\n");
        assertThatThrownBy(() -> TaMatrixReader.read(p, "e.csv", WINDOW))
                .satisfies(input(InputProblem.WRONG_UNIT, "e.csv:1", null));
        Trace t = TaMatrixReader.read(p, "e.csv", WINDOW.withOrientation(MatrixOptions.Orientation.DELAYS_ACROSS));
        assertThat(t.delaysS()).containsExactly(1e-12, 2e-12, 5e-12);
    }

    @Test
    void missingCellsInTheWindowAreIgnoredInTheAverage() throws IOException {
        String text = "delay (ps) \\ wavelength (nm),575,580,585\n0,1,NaN,3\n1,,,\n2,1,1,1\n3,0.5,0.5,0.5\n";
        Trace t = TaMatrixReader.read(write("f.csv", text), "f.csv", WINDOW);
        assertThat(t.delaysS()).containsExactly(0, 2e-12, 3e-12);
        assertThat(t.signal()[0]).isEqualTo(2.0);
        assertThat(t.droppedMissing()).isEqualTo(1);
    }

    @Test
    void rejections() throws IOException {
        Path outside = write("g.csv", DOWN);
        assertThatThrownBy(() -> TaMatrixReader.read(outside, "g.csv", MatrixOptions.window(400e-9, 410e-9, null)))
                .satisfies(input(InputProblem.EMPTY, "g.csv:1", "first row"));
        Path unsorted = write("h.csv", "delay (ps) \\ wavelength (nm),580\n0,1\n2,0.5\n1,0.2\n");
        assertThatThrownBy(() -> TaMatrixReader.read(unsorted, "h.csv", WINDOW))
                .satisfies(input(InputProblem.BAD_ORDER, "h.csv:4:1", "delay"));
        Path ragged = write("i.csv", "delay (ps) \\ wavelength (nm),580,590\n0,1,1\n1,0.5\n2,0.2,0.1\n");
        assertThatThrownBy(() -> TaMatrixReader.read(ragged, "i.csv", WINDOW))
                .satisfies(input(InputProblem.BAD_SYNTAX, "i.csv:3", null));
        Path text = write("j.csv", "delay (ps) \\ wavelength (nm),580\n0,1\n1,x\n2,0.2\n");
        assertThatThrownBy(() -> TaMatrixReader.read(text, "j.csv", WINDOW))
                .satisfies(input(InputProblem.BAD_NUMBER, "j.csv:3:3", "column 2"));
        Path two = write("k.csv", "delay (ps) \\ wavelength (nm),580\n0,1\n1,0.5\n");
        assertThatThrownBy(() -> TaMatrixReader.read(two, "k.csv", WINDOW))
                .satisfies(input(InputProblem.EMPTY, "k.csv:3", null));
        Path flat = write("l.csv", "delay (ps) \\ wavelength (nm),580\n0,1\n1,1\n2,1\n");
        assertThatThrownBy(() -> TaMatrixReader.read(flat, "l.csv", WINDOW))
                .satisfies(input(InputProblem.INVALID_VALUE, "l.csv:1", "window 575–585 nm"));
        Path nan = write("m.csv", "delay (ps) \\ wavelength (nm),580\n0,NaN\n1,\n2,nan\n");
        assertThatThrownBy(() -> TaMatrixReader.read(nan, "m.csv", WINDOW))
                .satisfies(input(InputProblem.EMPTY, "m.csv:1", "window 575–585 nm"));
        Path dupAcross = write("n.csv", "wavelength (nm) \\ delay (ps),0,1,1\n580,1,2,3\n");
        assertThatThrownBy(() -> TaMatrixReader.read(dupAcross, "n.csv", WINDOW))
                .satisfies(input(InputProblem.BAD_ORDER, "n.csv:1:34", "first row"));
        Path noUnit = write("o.csv", ",570,580,590\n-1,0,0,0\n0,1,2,3\n10,0.5,1,1.5\n");
        assertThatThrownBy(() -> TaMatrixReader.read(noUnit, "o.csv", MatrixOptions.window(575e-9, 585e-9, null)))
                .satisfies(input(InputProblem.WRONG_UNIT, "o.csv:1:1", "corner cell"));
    }

    @Test
    void oneMatrixPerFluenceMakesADataset() throws IOException {
        Dataset d = TaMatrixReader.readAll(List.of(write("low.csv", DOWN), write("high.csv", DOWN.replace("0,9,1,2,3,9", "0,9,2,4,6,9"))), WINDOW);
        assertThat(d.labels()).containsExactly("low", "high");
        assertThat(d.traces().get(1).signal()[1]).isCloseTo(4.0, within(1e-12));
    }

    @Test
    void semicolonMatrixWithDecimalCommaAndRefusedMissingCells() throws IOException {
        String text = "delay (ps) \\ wavelength (nm);579,5;580,5\n0;1,5;2,5\n1;0,5;1,5\n2;0,25;0,75\n";
        Trace t = TaMatrixReader.read(write("s.csv", text), "s.csv", WINDOW);
        assertThat(t.signal()).containsExactly(2.0, 1.0, 0.5);
        Path missing = write("r.csv", "delay (ps) \\ wavelength (nm),580\n0,1\n1,\n2,0.2\n");
        MatrixOptions strict = new MatrixOptions(MatrixOptions.Orientation.DETECT, 575e-9, 585e-9, Units.of("ps"), Units.of("nm"),
                MissingValuePolicy.REJECT);
        assertThatThrownBy(() -> TaMatrixReader.read(missing, "r.csv", strict))
                .satisfies(input(InputProblem.MISSING_VALUE, "r.csv:3:3", "column 2"));
    }
}
