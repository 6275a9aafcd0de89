package org.ladderkin.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class QuantityTest {

    static Stream<Arguments> everyFamily() {
        return Stream.of(
                Arguments.of("120 fs", Dimension.TIME, 120e-15),
                Arguments.of("50 ps", Dimension.TIME, 50e-12),
                Arguments.of("20ns", Dimension.TIME, 20e-9),
                Arguments.of("1.5 µs", Dimension.TIME, 1.5e-6),
                Arguments.of("1.5 μs", Dimension.TIME, 1.5e-6),
                Arguments.of("1.5 us", Dimension.TIME, 1.5e-6),
                Arguments.of("3 ms", Dimension.TIME, 3e-3),
                Arguments.of("2 s", Dimension.TIME, 2.0),
                Arguments.of("8 h", Dimension.TIME, 28800.0),
                Arguments.of("1 Hz", Dimension.FREQUENCY, 1.0),
                Arguments.of("1 kHz", Dimension.FREQUENCY, 1e3),
                Arguments.of("80 MHz", Dimension.FREQUENCY, 80e6),
                Arguments.of("3.1 eV", Dimension.ENERGY, 3.1 * PhysicalConstants.ELECTRONVOLT_J),
                Arguments.of("35 meV", Dimension.ENERGY, 35e-3 * PhysicalConstants.ELECTRONVOLT_J),
                Arguments.of("1 J", Dimension.ENERGY, 1.0),
                Arguments.of("2 mJ", Dimension.ENERGY, 2e-3),
                Arguments.of("2.5 µJ", Dimension.ENERGY, 2.5e-6),
                Arguments.of("2.5 μJ", Dimension.ENERGY, 2.5e-6),
                Arguments.of("2.5 uJ", Dimension.ENERGY, 2.5e-6),
                Arguments.of("50 nJ", Dimension.ENERGY, 50e-9),
                Arguments.of("7 pJ", Dimension.ENERGY, 7e-12),
                Arguments.of("1 W", Dimension.POWER, 1.0),
                Arguments.of("10 mW", Dimension.POWER, 10e-3),
                Arguments.of("300 µW", Dimension.POWER, 300e-6),
                Arguments.of("300 uW", Dimension.POWER, 300e-6),
                Arguments.of("400 nm", Dimension.LENGTH, 400e-9),
                Arguments.of("100 µm", Dimension.LENGTH, 100e-6),
                Arguments.of("100 um", Dimension.LENGTH, 100e-6),
                Arguments.of("100 μm", Dimension.LENGTH, 100e-6),
                Arguments.of("1 mm", Dimension.LENGTH, 1e-3),
                Arguments.of("1 cm", Dimension.LENGTH, 1e-2),
                Arguments.of("0.5 m", Dimension.LENGTH, 0.5),
                Arguments.of("0.3 mJ/cm²", Dimension.ENERGY_FLUENCE, 0.3e-3 / 1e-4),
                Arguments.of("0.3 mJ/cm2", Dimension.ENERGY_FLUENCE, 0.3e-3 / 1e-4),
                Arguments.of("0.3 mJ/cm^2", Dimension.ENERGY_FLUENCE, 0.3e-3 / 1e-4),
                Arguments.of("1 J/cm²", Dimension.ENERGY_FLUENCE, 1e4),
                Arguments.of("40 µJ/cm²", Dimension.ENERGY_FLUENCE, 40e-6 / 1e-4),
                Arguments.of("40 uJ/cm2", Dimension.ENERGY_FLUENCE, 40e-6 / 1e-4),
                Arguments.of("1e14 photons/cm²", Dimension.PHOTON_FLUENCE, 1e18),
                Arguments.of("1e14 photons/cm2", Dimension.PHOTON_FLUENCE, 1e18),
                Arguments.of("2e-15 cm²", Dimension.AREA, 2e-19),
                Arguments.of("2e-15 cm2", Dimension.AREA, 2e-19),
                Arguments.of("3 nm²", Dimension.AREA, 3e-18),
                Arguments.of("295 K", Dimension.TEMPERATURE, 295.0),
                Arguments.of("25 °C", Dimension.TEMPERATURE, 298.15),
                Arguments.of("25 degC", Dimension.TEMPERATURE, 298.15),
                Arguments.of("1 M", Dimension.CONCENTRATION, 1000.0),
                Arguments.of("2 mM", Dimension.CONCENTRATION, 2.0),
                Arguments.of("2 µM", Dimension.CONCENTRATION, 2e-3),
                Arguments.of("2 uM", Dimension.CONCENTRATION, 2e-3),
                Arguments.of("50 nM", Dimension.CONCENTRATION, 50e-6),
                Arguments.of("0.3 OD", Dimension.ABSORBANCE, 0.3),
                Arguments.of("0.3", Dimension.ABSORBANCE, 0.3),
                Arguments.of("5.81 g/cm³", Dimension.DENSITY, 5810.0),
                Arguments.of("0.49 J/(g·K)", Dimension.SPECIFIC_HEAT, 490.0),
                Arguments.of("0.13 W/(m K)", Dimension.THERMAL_CONDUCTIVITY, 0.13),
                Arguments.of("1e5 M⁻¹cm⁻¹", Dimension.MOLAR_EXTINCTION, 1e4),
                Arguments.of("1e5 M-1cm-1", Dimension.MOLAR_EXTINCTION, 1e4),
                Arguments.of("5 mL/min", Dimension.VOLUMETRIC_FLOW, 5e-6 / 60),
                Arguments.of("3 mL", Dimension.VOLUME, 3e-6),
                Arguments.of("6 %", Dimension.DIMENSIONLESS, 0.06));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("everyFamily")
    void parsesEveryUnitFamily(String text, Dimension dim, double expectedSi) {
        Quantity q = Quantity.parse(text, dim);
        assertThat(q.dimension()).isEqualTo(dim);
        assertThat(q.si()).isCloseTo(expectedSi, org.assertj.core.data.Percentage.withPercentage(1e-12));
    }

    @Test
    void microSignGreekMuAndUAreTheSamePrefix() {
        Unit a = Quantity.parse("1 \u00B5s").unit();
        Unit b = Quantity.parse("1 \u03BCs").unit();
        Unit c = Quantity.parse("1 us").unit();
        assertThat(a).isSameAs(b).isSameAs(c);
        assertThat(a.symbol()).isEqualTo("µs");
    }

    @ParameterizedTest
    @EnumSource(Dimension.class)
    void everyDimensionHasUnitsAndAParsableExample(Dimension d) {
        assertThat(Units.of(d)).isNotEmpty();
        assertThat(Quantity.parse(d.example(), d).dimension()).isEqualTo(d);
    }

    /** Property: for every unit and seeded random values, parse(format(q)) gives back q exactly. */
    @ParameterizedTest
    @ValueSource(longs = {1L, 42L, 20261202L})
    void formatThenParseReadsBackEqual(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        for (Dimension d : Dimension.values()) {
            for (Unit u : Units.of(d)) {
                for (int i = 0; i < 200; i++) {
                    double magnitude = Math.pow(10, rnd.nextDouble(-20, 20));
                    double v = rnd.nextBoolean() ? magnitude : -magnitude;
                    if (rnd.nextInt(20) == 0) {
                        v = rnd.nextInt(-1000, 1000);
                    }
                    Quantity q = new Quantity(v, u);
                    Quantity back = Quantity.parse(q.format(), d);
                    assertThat(back).as("round trip of %s", q.format()).isEqualTo(q);
                }
            }
        }
    }

    @Test
    void formatsReadably() {
        assertThat(Quantity.of(50, "ps").format()).isEqualTo("50 ps");
        assertThat(Quantity.of(2.5, "µJ").format()).isEqualTo("2.5 µJ");
        assertThat(Quantity.of(1e14, "photons/cm²").format()).isEqualTo("100000000000000 photons/cm²");
        assertThat(Quantity.of(1.5e-20, "cm²").format()).isEqualTo("1.5e-20 cm²");
        assertThat(Quantity.formatBest(2.5e-11, Dimension.TIME, 3)).isEqualTo("25 ps");
        assertThat(Quantity.formatBest(1.2e-3, Dimension.TIME, 3)).isEqualTo("1.2 ms");
        assertThat(Quantity.formatBest(8e4, Dimension.FREQUENCY, 3)).isEqualTo("80 kHz");
        assertThat(Quantity.formatBest(4e-7, Dimension.LENGTH, 4)).isEqualTo("400 nm");
    }

    @Test
    void unknownUnitNamesTheTextAndListsAcceptedUnits() {
        assertThatThrownBy(() -> Quantity.parse("50 pz", Dimension.TIME))
                .isInstanceOf(QuantityFormatException.class)
                .hasMessage("unknown unit 'pz' in '50 pz': expected a time in fs, ps, ns, µs, ms, s, min, h");
    }

    @Test
    void missingUnitIsRejectedWhereOneIsRequired() {
        assertThatThrownBy(() -> Quantity.parse("50", Dimension.TIME))
                .isInstanceOf(QuantityFormatException.class)
                .hasMessage("missing unit in '50': expected a time such as 50 ps (units: fs, ps, ns, µs, ms, s, min, h)");
    }

    @Test
    void wrongDimensionSaysWhatItIs() {
        assertThatThrownBy(() -> Quantity.parse("5 nJ", Dimension.TIME))
                .hasMessage("'5 nJ' is an energy, expected a time such as 50 ps (units: fs, ps, ns, µs, ms, s, min, h)");
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "ps", "abc", "1..2 ns", "NaN ns", "Infinity ps", "1e999 ps", "--3 ps"})
    void garbageIsRejectedWithTheText(String text) {
        assertThatThrownBy(() -> Quantity.parse(text, Dimension.TIME))
                .isInstanceOf(QuantityFormatException.class)
                .hasMessageContaining("'" + text + "'");
    }

    @Test
    void convertsBetweenUnitsOfOneDimension() {
        assertThat(Quantity.of(1, "ns").in(Units.of("ps")).value()).isCloseTo(1000.0, org.assertj.core.data.Offset.offset(1e-9));
        assertThatThrownBy(() -> Quantity.of(1, "ns").in(Units.of("nm"))).isInstanceOf(IllegalArgumentException.class);
    }

    /** A 60,000-character value used to hang every reader of quantities (a lazy regular expression backtracked). */
    @Test
    void longTextIsRefusedAtOnceWithAShortOneLineMessage() {
        String longValue = "1" + " ".repeat(60_000) + "\nx";
        org.junit.jupiter.api.Assertions.assertTimeoutPreemptively(java.time.Duration.ofSeconds(20), () ->
                assertThatThrownBy(() -> Quantity.parse(longValue, Dimension.TIME))
                        .isInstanceOf(QuantityFormatException.class)
                        .hasMessageStartingWith("text too long to be a quantity (60003 characters, at most 200)")
                        .satisfies(e -> assertThat(e.getMessage()).doesNotContain("\n").hasSizeLessThan(200)));
    }

    @Test
    void echoedTextIsEscapedAndCut() {
        assertThatThrownBy(() -> Quantity.parse("5 p\ns", Dimension.TIME))
                .hasMessage("unknown unit 'p\\ns' in '5 p\\ns': expected a time in " + Units.accepted(Dimension.TIME));
        assertThat(Excerpt.of("a".repeat(100))).isEqualTo("a".repeat(Excerpt.MAX_SHOWN) + "…");
        assertThat(Excerpt.of("tab\there\u0000")).isEqualTo("tab\\there\\u0000");
    }

    /** The hand-written number scan reads what the regular expression it replaced read, on random short texts. */
    @Test
    void numberScanAgreesWithTheRegularExpressionItReplaced() {
        java.util.regex.Pattern old = java.util.regex.Pattern.compile(
                "^\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*$");
        String[] pieces = {" ", "1", "0", ".", "e", "E", "+", "-", "5", "ps", "ns", "nJ", "\t", "x", ","};
        SplittableRandom random = new SplittableRandom(7);
        for (int k = 0; k < 20_000; k++) {
            StringBuilder b = new StringBuilder();
            for (int i = 0, n = 1 + random.nextInt(8); i < n; i++) {
                b.append(pieces[random.nextInt(pieces.length)]);
            }
            String text = b.toString();
            java.util.regex.Matcher m = old.matcher(text);
            String expected;
            if (!m.matches()) {
                expected = "BAD_NUMBER";
            } else if (!Double.isFinite(Double.parseDouble(m.group(1)))) {
                expected = "OUT_OF_RANGE";
            } else if (m.group(2).isEmpty()) {
                expected = "value " + Double.parseDouble(m.group(1));
            } else {
                expected = Units.find(m.group(2)) == null ? (m.group(2).matches(",\\d.*") ? "BAD_NUMBER" : "UNKNOWN_UNIT")
                        : "value " + Double.parseDouble(m.group(1)) + " " + Units.find(m.group(2)).symbol();
            }
            String actual;
            try {
                Quantity q = Quantity.parse(text);
                actual = "value " + q.value() + (q.unit().symbol().isEmpty() ? "" : " " + q.unit().symbol());
            } catch (QuantityFormatException e) {
                actual = e.reason().name();
            }
            assertThat(actual).as("'%s'", text).isEqualTo(expected);
        }
    }

    /** A plan's irfFwhm of "1e308 h" used to pass the > 0 check as Infinity seconds and give a delay of -9.2e14 ps. */
    @Test
    void aValueThatOverflowsInSiIsRefused() {
        assertThatThrownBy(() -> Quantity.parse("1e308 h", Dimension.TIME))
                .isInstanceOf(QuantityFormatException.class)
                .hasMessage("number out of range in '1e308 h': it overflows in SI units")
                .extracting(e -> ((QuantityFormatException) e).reason()).isEqualTo(QuantityFormatException.Reason.OUT_OF_RANGE);
        assertThat(Quantity.parse("1e300 h", Dimension.TIME).si()).isEqualTo(3.6e303);
    }
}
