package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

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
                .satisfies(input(InputProblem.MISSING_FIELD, "a.csv:1", null));
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n450;0.3\n"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "a.csv:3", null));
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n450,abc\n"))
                .satisfies(input(InputProblem.BAD_NUMBER, "a.csv:3:5", "absorbance"));
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n450,0.4\n450,0.3\n"))
                .satisfies(input(InputProblem.BAD_ORDER, "a.csv:4", null));
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n400,0.5\n"))
                .satisfies(input(InputProblem.EMPTY, "a.csv:2", null));
        assertThatThrownBy(() -> parse("wavelength_nm,absorbance\n-400,0.5\n450,0.3\n"))
                .satisfies(input(InputProblem.OUT_OF_RANGE, "a.csv:2:1", "wavelength"));
    }

    @Test
    void outsideTheMeasuredRange() {
        AbsorptionSpectrum s = parse("wavelength_nm,absorbance\n400,0.5\n500,0.25\n");
        assertThatThrownBy(() -> s.absorbanceAt(600e-9)).hasMessage("a.csv covers 400.0–500.0 nm, not 600.0 nm");
    }

    @Test
    void missingFile(@TempDir Path dir) {
        assertThatThrownBy(() -> AbsorptionSpectrumCsv.read(dir.resolve("x.csv"), "x.csv")).satisfies(input(InputProblem.NOT_FOUND, "x.csv", null));
    }
}
