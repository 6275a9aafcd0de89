package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.ladderkin.observe.MeasuredIrf;

/** Measured IRF tables: the demo file, clipping of baseline noise, and one located line for each kind of bad file. */
class IrfFileReaderTest {

    private static final String GOOD = "time (fs),response\n-300,0\n-200,1\n-100,20\n0,100\n100,30\n200,2\n300,0\n";

    static MeasuredIrf read(Path dir, String text) throws Exception {
        Path f = dir.resolve("irf.csv");
        Files.writeString(f, text);
        return IrfFileReader.read(f, "irf.csv");
    }

    @Test
    void readsTheDemoCrossCorrelation() {
        Path home = Path.of(System.getProperty("ladderkin.home", "."));
        MeasuredIrf irf = IrfFileReader.read(home.resolve("experiments-plan/fh-ta-irf.csv"), "fh-ta-irf.csv");
        assertThat(irf.size()).isEqualTo(101);
        // a Gaussian of σ = 40 fs (FWHM 94 fs) with a 30 fs exponential tail is about 109 fs wide
        assertThat(irf.fwhmS()).isBetween(100e-15, 115e-15);
        // the tail pulls the centroid after the peak
        assertThat(irf.centroidS()).isBetween(15e-15, 45e-15);
        assertThat(java.util.Arrays.stream(irf.densityPerS()).min().orElseThrow()).isZero();
        assertThat(irf.origin()).isEqualTo("fh-ta-irf.csv");
    }

    @Test
    void unitsDelimitersAndSmallNegativeNoise(@TempDir Path dir) throws Exception {
        MeasuredIrf fs = read(dir, GOOD);
        MeasuredIrf ps = read(dir, "# cross-correlation\nt [ps];signal\n-0,3;0\n-0,2;-1\n-0,1;20\n0;100\n0,1;30\n0,2;2\n0,3;-4\n");
        assertThat(fs.timesS()[0]).isCloseTo(-300e-15, within(1e-27));
        assertThat(ps.timesS()[0]).isCloseTo(-300e-15, within(1e-27));
        // -1 and -4 are within 5 % of the peak below zero: clipped, so the curves agree except at those two samples
        assertThat(ps.densityPerS()[1]).isZero();
        assertThat(ps.densityPerS()[6]).isZero();
        assertThat(ps.fwhmS()).isCloseTo(fs.fwhmS(), within(1e-18));
    }

    @Test
    void missingFile(@TempDir Path dir) {
        assertThatThrownBy(() -> IrfFileReader.read(dir.resolve("none.csv"), "none.csv")).isInstanceOf(InputException.class)
                .satisfies(input(InputProblem.NOT_FOUND, "none.csv", null));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "non-numeric cell|time (fs),response;-300,0;-200,1;-100,abc;0,100;100,30;200,2;300,0"
            + "|irf.csv:4:6: field 'response': 'abc' is not a number",
        "decreasing times|time (fs),response;-300,0;-200,1;-100,20;0,100;-50,30;200,2;300,0"
            + "|irf.csv:6:1: field 'time (fs)': time -50 fs is smaller than 0 fs at line 5 (times must increase strictly down the file)",
        "duplicate times|time (fs),response;-300,0;-200,1;-100,20;0,100;0,30;200,2;300,0"
            + "|irf.csv:6:1: field 'time (fs)': duplicate time 0 fs (also at line 5)",
        "unknown time unit|time (fortnights),response;-300,0;-200,1;-100,20;0,100;100,30;200,2;300,0"
            + "|irf.csv:1:1: field 'time (fortnights)': unknown time unit 'fortnights' in header",
        "no time unit|time,response;-300,0;-200,1;-100,20;0,100;100,30;200,2;300,0"
            + "|irf.csv:1:1: field 'time': no time unit in the header (write it like 'time (ps)')",
        "strongly negative value|time (fs),response;-300,0;-200,1;-100,20;0,100;100,30;200,-6;300,0"
            + "|irf.csv:7:5: field 'response': -6 is 6.0 % of the peak 100 below zero",
        "three columns|time (fs),a,b;-300,0,0;-200,1,0;-100,20,0;0,100,0;100,30,0;200,2,0;300,0,0"
            + "|irf.csv:1: an IRF file has exactly two columns, time and response; the header has 3",
        "ragged row|time (fs),response;-300,0;-200,1;-100,20,5;0,100;100,30;200,2;300,0"
            + "|irf.csv:4: row has 3 cells but an IRF file has two",
        "empty cell|time (fs),response;-300,0;-200,;-100,20;0,100;100,30;200,2;300,0"
            + "|irf.csv:3:6: field 'response': missing value (an IRF file has no gaps)",
        "too few rows|time (fs),response;-100,0;0,100;100,0"
            + "|irf.csv:4: only 3 data rows (an IRF needs at least 5 samples)",
        "two peaks|time (fs),response;-300,0;-200,90;-100,10;0,100;100,30;200,2;300,0"
            + "|irf.csv:1:11: field 'response': IRF has more than one peak above half maximum",
        "cut-off window|time (fs),response;-300,80;-200,90;-100,95;0,100;100,30;200,2;300,0"
            + "|irf.csv:1:11: field 'response': IRF does not fall below half maximum before its first sample"})
    void badFilesGiveOneLocatedLine(String what, String table, String expected, @TempDir Path dir) {
        assertThatThrownBy(() -> read(dir, table.replace(';', '\n') + "\n")).as(what).isInstanceOf(InputException.class)
                .hasMessageStartingWith(expected)
                .satisfies(e -> assertThat(e.getMessage().lines()).hasSize(1));
    }
}
