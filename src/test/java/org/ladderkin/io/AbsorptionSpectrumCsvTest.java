package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.sample.AbsorptionSpectrum;

class AbsorptionSpectrumCsvTest {

    static AbsorptionSpectrum parse(String text) {
        return AbsorptionSpectrumCsv.parse(List.of(text.split("\n", -1)), "a.csv");
    }

    @Test
    void readsRisingAndFallingFiles() {
        AbsorptionSpectrum up = parse("# demo\nwavelength_nm,absorbance\n400,0.5\n500,0.25\n");
        AbsorptionSpectrum down = parse("Wavelength_nm, Absorbance\n500,0.25\n400,0.5\n");
        assertThat(down).isEqualTo(new AbsorptionSpectrum(up.wavelengthsM(), up.absorbance(), "a.csv"));
        assertThat(up.absorbanceAt(450e-9)).isCloseTo(0.375, org.assertj.core.data.Offset.offset(1e-15));
        assertThat(up.ratio(500e-9, 400e-9)).isEqualTo(0.5);
    }

    @Test
    void problemsNameFileAndLine() {
        assertThatThrownBy(() -> parse("lambda,A\n400,0.5\n"))
                .hasMessage("a.csv:1: expected the header 'wavelength_nm,absorbance', found 'lambda,A'");
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n450;0.3\n"))
                .hasMessage("a.csv:3: expected two values 'wavelength_nm,absorbance', found 1");
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n450,abc\n"))
                .hasMessage("a.csv:3: absorbance is not a number: 'abc'");
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n450,0.4\n450,0.3\n"))
                .hasMessage("a.csv:4: wavelengths must keep rising without repeats, but 450 nm follows 450 nm");
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n"))
                .hasMessage("a.csv:3: needs at least two data lines, found 1");
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n-400,0.5\n450,0.3\n"))
                .hasMessage("a.csv:2: wavelength must be > 0 nm, was -400");
    }

    @Test
    void outsideTheMeasuredRange() {
        AbsorptionSpectrum s = parse("wavelength_nm,absorbance\n400,0.5\n500,0.25\n");
        assertThatThrownBy(() -> s.absorbanceAt(600e-9)).hasMessage("a.csv covers 400.0–500.0 nm, not 600.0 nm");
    }

    @Test
    void missingFile(@TempDir Path dir) {
        assertThatThrownBy(() -> AbsorptionSpectrumCsv.read(dir.resolve("x.csv"), "x.csv")).hasMessage("x.csv: file not found");
    }
}
