package org.ladderkin;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * A value and its standard error are printed through units/Rounded only: a format pattern such as "%.4g ± %.2g" sets
 * the value's digits without looking at the error, which is how "39.064 ± 0.9814" or "1.000 ± 0.3" reach a report.
 * Relative errors in per cent ("± %.2g %%") are a different number and stay formatted directly.
 */
class OneWayToPrintAnErrorTest {

    /** A numeric conversion, "±", another numeric conversion not followed by a per-cent sign. */
    static final Pattern BARE_VALUE_AND_ERROR = Pattern.compile("%[-+ 0-9.]*[efgEG] ?± ?%[-+ 0-9.]*[efgEG](?! ?%%)");

    @Test
    void thePatternCatchesWhatItIsMeantFor() {
        assertThat(BARE_VALUE_AND_ERROR.matcher("\"η = %.3g ± %.2g%s\"").find()).isTrue();
        assertThat(BARE_VALUE_AND_ERROR.matcher("\"ratio %.3f ± %.3f at zero\"").find()).isTrue();
        assertThat(BARE_VALUE_AND_ERROR.matcher("\"⟨N⟩ = %.3g ± %.2g %%\"").find()).isFalse();
        assertThat(BARE_VALUE_AND_ERROR.matcher("\"η = %s\"").find()).isFalse();
    }

    @Test
    void noMainSourceFormatsAValueAndItsErrorByHand() throws IOException {
        Path root = Path.of(System.getProperty("ladderkin.home", ".")).resolve("src/main/java");
        List<String> found = new ArrayList<>();
        try (Stream<Path> files = Files.walk(root)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).sorted().toList()) {
                List<String> lines = Files.readAllLines(f);
                for (int i = 0; i < lines.size(); i++) {
                    if (BARE_VALUE_AND_ERROR.matcher(lines.get(i)).find()) {
                        found.add(root.relativize(f) + ":" + (i + 1) + ": " + lines.get(i).strip());
                    }
                }
            }
        }
        assertThat(found).as("value ± error formatted without units/Rounded").isEmpty();
    }
}
