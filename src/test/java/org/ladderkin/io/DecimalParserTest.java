package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class DecimalParserTest {

    @ParameterizedTest
    @ValueSource(strings = {"0", "-0", "1", "1.", ".5", "-1.5e-3", "+2E+5", "123456789012345", "0.000123", "9.99e22",
            "1e-22", "4.9e-5", "0.1", "3.14159265358979", "1000000"})
    void plainDecimalsMatchParseDouble(String text) {
        double v = DecimalParser.tryParse(text, 0, text.length(), false);
        assertThat(Double.doubleToRawLongBits(v)).as(text).isEqualTo(Double.doubleToRawLongBits(Double.parseDouble(text)));
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "-", ".", "e5", "1e", "1.2.3", "1,5", "NaN", "Infinity", "0x10", "1d", "12345678901234567",
            "1e400", "1e-30", "1 2"})
    void anythingElseIsLeftToTheSlowPath(String text) {
        assertThat(DecimalParser.tryParse(text, 0, text.length(), false)).as(text).isNaN();
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5})
    void randomDecimalsMatchParseDoubleBitForBit(long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        for (int k = 0; k < 20_000; k++) {
            int digits = 1 + rng.nextInt(15);
            String text = switch (rng.nextInt(3)) {
                case 0 -> String.format(Locale.ROOT, "%." + digits + "f", rng.nextDouble() * Math.pow(10, rng.nextInt(8)));
                case 1 -> String.format(Locale.ROOT, "%." + (digits - 1) + "e", (rng.nextDouble() - 0.5) * Math.pow(10, rng.nextInt(40) - 20));
                default -> Long.toString(rng.nextLong(1_000_000_000_000_000L));
            };
            double fast = DecimalParser.tryParse(text, 0, text.length(), false);
            if (!Double.isNaN(fast)) {
                assertThat(Double.doubleToRawLongBits(fast)).as(text).isEqualTo(Double.doubleToRawLongBits(Double.parseDouble(text)));
            }
            String comma = text.replace('.', ',');
            double withComma = DecimalParser.tryParse(comma, 0, comma.length(), true);
            assertThat(Double.doubleToRawLongBits(withComma)).as(comma).isEqualTo(Double.doubleToRawLongBits(fast));
        }
    }
}
