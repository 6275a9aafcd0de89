package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Values that would give the engine non-finite rates are refused where the model file is read, with their field. */
class ModelCodecRangeTest {

    private static final Path PRESET = Path.of(System.getProperty("ladderkin.home", "."), "models/presets/cdse-4nm.model.json");

    private static Path variant(Path dir, String from, String to) throws Exception {
        String text = Files.readString(PRESET);
        assertThat(text).contains(from);
        Path file = dir.resolve("m.model.json");
        Files.writeString(file, text.replace(from, to));
        return file;
    }

    /** A chargedFactor of 1e300 used to reach GeneratorBuilder as "rate ... must be finite, was Infinity 1/s". */
    @Test
    void aHugeFactorIsRefusedWithItsField(@TempDir Path dir) throws Exception {
        Path file = variant(dir, "\"chargedFactor\": 2", "\"chargedFactor\": 1e300");
        assertThatThrownBy(() -> ModelCodec.read(file)).satisfies(input(InputProblem.OUT_OF_RANGE, file + ":4:82", "radiative.chargedFactor"))
                .hasMessageEndingWith("must be between 0 and 1e6, was 1.0E300");
    }

    @Test
    void lifetimesOutsideFemtosecondsToYearsAreRefused(@TempDir Path dir) throws Exception {
        Path tiny = variant(dir, "\"biexcitonLifetime\": \"50 ps\"", "\"biexcitonLifetime\": \"1e-10 fs\"");
        assertThatThrownBy(() -> ModelCodec.read(tiny)).satisfies(input(InputProblem.OUT_OF_RANGE, tiny + ":5:35", "auger.biexcitonLifetime"))
                .hasMessageContaining("must be between 1 fs and 1e9 s");
        Path huge = variant(dir, "\"lifetime\": \"20 ns\"", "\"lifetime\": \"1e300 s\"");
        assertThatThrownBy(() -> ModelCodec.read(huge)).satisfies(input(InputProblem.OUT_OF_RANGE, huge + ":4:30", "radiative.lifetime"));
    }

    @Test
    void thePresetStillReads() {
        assertThat(ModelCodec.read(PRESET).model()).isNotNull();
    }
}
