package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class NumberTextTest {

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -0.0, 1.0, -1.0, 0.1, 1e-4, 9.99999999999999e-5, 0.000099999999999999995, 1e14,
        99999999999999.95, 999999999999999.5, 1e15, 1e-300, Double.MIN_VALUE, Double.MAX_VALUE, 123.456, 2e-3,
        0.5, 12499.999999999998, 1.0000000000000002, 9.999999999999999, Double.NaN, Double.POSITIVE_INFINITY,
        Double.NEGATIVE_INFINITY, 1e100, 1.5e-5})
    void edgeValuesPrintAsTheFormatterDoes(double x) {
        assertThat(NumberText.g15(x)).isEqualTo(String.format(Locale.ROOT, "%.15g", x));
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void randomValuesOverAllMagnitudesPrintAsTheFormatterDoes(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        for (int i = 0; i < 100_000; i++) {
            double x;
            switch (i % 4) {
                case 0 -> x = Double.longBitsToDouble(r.nextLong()); // any bit pattern
                case 1 -> x = r.nextDouble(-1, 1) * Math.pow(10, r.nextInt(-20, 20));
                case 2 -> x = Math.round(r.nextDouble() * 1e6) / Math.pow(10, r.nextInt(0, 12)); // short decimals, ties
                default -> x = Math.exp(-r.nextDouble() * 50) * (r.nextBoolean() ? 1 : -1);
            }
            String expected = String.format(Locale.ROOT, "%.15g", x);
            assertThat(NumberText.g15(x)).as("bits %x", Double.doubleToRawLongBits(x)).isEqualTo(expected);
        }
    }
}
