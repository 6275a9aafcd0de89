package org.ladderkin.units;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Objects;

/**
 * A number with its unit, exactly as the user wrote it ("50 ps", "0.3 mJ/cm²"). Engines take {@link #si()};
 * the unit is kept so that a value read from a file is written back the way it was given.
 *
 * @param value the number in {@code unit}
 * @param unit  its unit
 */
public record Quantity(double value, Unit unit) {

    /** Longest text read as a quantity; longer text is refused before any scanning (no value or unit is that long). */
    public static final int MAX_TEXT_LENGTH = 200;

    public Quantity {
        Objects.requireNonNull(unit, "unit");
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("quantity value must be finite, was " + value + " " + unit.symbol());
        }
    }

    /** A quantity in the unit spelled {@code symbol}. */
    public static Quantity of(double value, String symbol) {
        return new Quantity(value, Units.of(symbol));
    }

    /** The SI value (s, Hz, J, W, m, m², K, mol/m³ ...). */
    public double si() {
        return unit.toSi(value);
    }

    /** What this quantity measures. */
    public Dimension dimension() {
        return unit.dimension();
    }

    /** The same quantity expressed in another unit of the same dimension. */
    public Quantity in(Unit other) {
        if (other.dimension() != unit.dimension()) {
            throw new IllegalArgumentException("cannot express " + format() + " in " + other.symbol());
        }
        return new Quantity(other.fromSi(si()), other);
    }

    /**
     * Reads "number unit" where the unit may be any in the table; a bare number is dimensionless.
     *
     * @throws QuantityFormatException naming the text and the accepted units
     */
    public static Quantity parse(String text) {
        return parse(text, null);
    }

    /**
     * Reads "number unit" and requires the unit to measure {@code expected}. A bare number is accepted only for
     * dimensions where the unit is optional (absorbance, dimensionless).
     *
     * @throws QuantityFormatException naming the text and listing the units accepted for {@code expected}
     */
    public static Quantity parse(String text, Dimension expected) {
        Objects.requireNonNull(text, "text");
        String wanted = expected == null ? "a quantity such as 50 ps" : article(expected.label()) + " such as " + expected.example();
        String shown = Excerpt.of(text);
        if (text.length() > MAX_TEXT_LENGTH) {
            throw new QuantityFormatException(text, QuantityFormatException.Reason.BAD_NUMBER, "text too long to be a quantity ("
                    + text.length() + " characters, at most " + MAX_TEXT_LENGTH + "): '" + shown + "'");
        }
        String[] numberAndUnit = splitNumber(text);
        if (numberAndUnit == null) {
            throw new QuantityFormatException(text, QuantityFormatException.Reason.BAD_NUMBER, "cannot read a number in '" + shown + "': expected " + wanted);
        }
        double number = Double.parseDouble(numberAndUnit[0]);
        if (!Double.isFinite(number)) {
            throw new QuantityFormatException(text, QuantityFormatException.Reason.OUT_OF_RANGE, "number out of range in '" + shown + "'");
        }
        String unitText = numberAndUnit[1];
        if (unitText.isEmpty()) {
            if (expected == null || expected == Dimension.DIMENSIONLESS) {
                return new Quantity(number, Units.of(""));
            }
            if (expected == Dimension.ABSORBANCE) {
                return new Quantity(number, Units.of("OD"));
            }
            throw new QuantityFormatException(text, QuantityFormatException.Reason.MISSING_UNIT, "missing unit in '" + shown + "': expected " + wanted
                    + " (units: " + Units.accepted(expected) + ")");
        }
        Unit unit = Units.find(unitText);
        if (unit == null && unitText.matches(",\\d.*")) {
            // "1,5 nJ": a decimal comma; unlike a table cell, a quantity's comma may separate list items
            throw new QuantityFormatException(text, QuantityFormatException.Reason.BAD_NUMBER, "decimal comma in '" + shown
                    + "': write the decimal with a point (" + numberAndUnit[0] + "." + Excerpt.of(unitText.substring(1)) + ")");
        }
        if (unit == null) {
            String list = expected == null ? "see 'ladderkin --help'" : Units.accepted(expected);
            throw new QuantityFormatException(text, QuantityFormatException.Reason.UNKNOWN_UNIT, "unknown unit '" + Excerpt.of(unitText) + "' in '" + shown + "': expected "
                    + (expected == null ? "a known unit" : article(expected.label()) + " in " + list));
        }
        if (expected != null && unit.dimension() != expected) {
            throw new QuantityFormatException(text, QuantityFormatException.Reason.WRONG_DIMENSION, "'" + shown + "' is " + article(unit.dimension().label()) + ", expected "
                    + wanted + " (units: " + Units.accepted(expected) + ")");
        }
        if (!Double.isFinite(unit.toSi(number))) {
            // "1e308 h" is a finite number but an infinite number of seconds: every later check would see Infinity
            throw new QuantityFormatException(text, QuantityFormatException.Reason.OUT_OF_RANGE, "number out of range in '" + shown
                    + "': it overflows in SI units");
        }
        return new Quantity(number, unit);
    }

    /**
     * The leading number and the rest with surrounding whitespace removed, or null when the text does not start with a
     * number. A hand-written scan rather than a regular expression: it is linear in the length whatever the text holds.
     */
    private static String[] splitNumber(String text) {
        int n = text.length();
        int i = skipSpace(text, 0);
        int start = i;
        if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
            i++;
        }
        int intDigits = digits(text, i);
        i += intDigits;
        int fracDigits = 0;
        if (i < n && text.charAt(i) == '.') {
            fracDigits = digits(text, i + 1);
            if (intDigits == 0 && fracDigits == 0) {
                return null;
            }
            i += 1 + fracDigits;
        } else if (intDigits == 0) {
            return null;
        }
        if (i < n && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
            int j = i + 1;
            if (j < n && (text.charAt(j) == '+' || text.charAt(j) == '-')) {
                j++;
            }
            int expDigits = digits(text, j);
            if (expDigits > 0) {
                i = j + expDigits;
            }
        }
        String number = text.substring(start, i);
        int end = n;
        while (end > i && isSpace(text.charAt(end - 1))) {
            end--;
        }
        return new String[] {number, text.substring(skipSpace(text, i), Math.max(end, skipSpace(text, i)))};
    }

    private static int digits(String text, int from) {
        int i = from;
        while (i < text.length() && text.charAt(i) >= '0' && text.charAt(i) <= '9') {
            i++;
        }
        return i - from;
    }

    private static int skipSpace(String text, int from) {
        int i = from;
        while (i < text.length() && isSpace(text.charAt(i))) {
            i++;
        }
        return i;
    }

    /** The whitespace a regular expression's \\s matches, so inputs read exactly as before. */
    private static boolean isSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r';
    }

    /** Reads {@code text} as {@code expected} and returns its SI value. */
    public static double parseSi(String text, Dimension expected) {
        return parse(text, expected).si();
    }

    /**
     * Canonical text: the shortest decimal that reads back to the same double, then the unit symbol.
     * {@code parse(q.format())} equals {@code q} exactly.
     */
    public String format() {
        String number = plain(value);
        return unit.symbol().isEmpty() ? number : number + " " + unit.symbol();
    }

    /** Human text with {@code significant} digits in the unit of this dimension that reads best (e.g. "12.5 ns"). */
    public static String formatBest(double valueSi, Dimension dimension, int significant) {
        Unit best = bestUnit(valueSi, dimension);
        double v = best.fromSi(valueSi);
        String number = String.format(Locale.ROOT, "%." + significant + "g", v);
        number = trimNumber(number);
        return best.symbol().isEmpty() ? number : number + " " + best.symbol();
    }

    /** The unit of a dimension that puts |value| in [1, 1000) where possible; temperatures stay in K. */
    static Unit bestUnit(double valueSi, Dimension dimension) {
        if (dimension == Dimension.TEMPERATURE) {
            return Units.of("K");
        }
        if (dimension == Dimension.DIMENSIONLESS || dimension == Dimension.ABSORBANCE) {
            return Units.of(dimension).get(0);
        }
        Unit chosen = null;
        double mag = Math.abs(valueSi);
        for (Unit u : Units.of(dimension)) {
            // per-m² units read badly next to the per-cm² ones the trade uses; temperatures in °C have an offset
            if (u.offsetSi() != 0 || (u.symbol().endsWith("/m²") && dimension != Dimension.MOLAR_EXTINCTION)) {
                continue;
            }
            if (chosen == null) {
                chosen = u;
            }
            if (mag == 0) {
                break;
            }
            double v = mag / u.factorToSi();
            if (v >= 1 && (chosen.factorToSi() <= u.factorToSi())) {
                chosen = u;
            }
        }
        return chosen;
    }

    @Override
    public String toString() {
        return format();
    }

    private static String plain(double v) {
        if (v == 0) {
            return "0";
        }
        String shortest = Double.toString(v);
        BigDecimal bd = new BigDecimal(shortest).stripTrailingZeros();
        int magnitude = bd.precision() - bd.scale();
        if (magnitude > -5 && magnitude < 16) {
            return bd.toPlainString();
        }
        return shortest.replace("E", "e");
    }

    private static String trimNumber(String s) {
        int e = s.indexOf('e');
        String mant = e < 0 ? s : s.substring(0, e);
        String exp = e < 0 ? "" : s.substring(e);
        if (mant.contains(".")) {
            mant = mant.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mant + exp;
    }

    private static String article(String label) {
        return ("aeiou".indexOf(label.charAt(0)) >= 0 ? "an " : "a ") + label;
    }
}
