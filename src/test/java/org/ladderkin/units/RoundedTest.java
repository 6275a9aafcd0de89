package org.ladderkin.units;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Rounding of a value to its error: two significant digits in the error, common practice, no source. */
class RoundedTest {

    @Test
    void theErrorKeepsTwoDigitsAndTheValueStopsAtTheErrorsLastDigit() {
        assertThat(Rounded.pm(39.064, 0.9814)).isEqualTo("39.06 ± 0.98");
        assertThat(Rounded.pm(39.064, 12.3)).isEqualTo("39 ± 12");
        assertThat(Rounded.pm(1234.5, 67)).isEqualTo("1235 ± 67");
        assertThat(Rounded.pm(0.12344, 0.0042)).isEqualTo("0.1234 ± 0.0042");
    }

    @Test
    void smallAndLargeMagnitudesUseScientificNotationWithTheSameRule() {
        assertThat(Rounded.pm(2.4519e-15, 3.1e-17)).isEqualTo("2.452e-15 ± 3.1e-17");
        assertThat(Rounded.pm(4.894e13, 2.2e12)).isEqualTo("4.89e+13 ± 2.2e+12");
    }

    @Test
    void anErrorLargerThanTheValueStillShowsOneDigitOfTheValue() {
        assertThat(Rounded.pm(0.3, 25)).isEqualTo("0.3 ± 25");
    }

    @Test
    void withoutAUsableErrorTheValueKeepsFourDigitsAndNothingIsNaN() {
        assertThat(Rounded.value(39.0644, Double.NaN)).isEqualTo("39.06");
        assertThat(Rounded.error(Double.NaN)).isEqualTo("?");
        assertThat(Rounded.value(Double.NaN, 1)).isEqualTo("?");
        assertThat(Rounded.value(0, 0.5)).isEqualTo("0");
    }
}
