package org.ladderkin.units;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A number with its unit, exactly as the user wrote it ("50 ps", "0.3 mJ/cm²"). Engines take {@link #si()};
 * the unit is kept so that a value read from a file is written back the way it was given.
 *
 * @param value the number in {@code unit}
 * @param unit  its unit
 */
public record Quantity(double value, Unit unit) {

    private static final Pattern NUMBER_THEN_UNIT = Pattern.compile(
            "^\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*$");

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
        Matcher m = NUMBER_THEN_UNIT.matcher(text);
        String wanted = expected == null ? "a quantity such as 50 ps" : article(expected.label()) + " such as " + expected.example();
        if (!m.matches()) {
            throw new QuantityFormatException(text, QuantityFormatException.Reason.BAD_NUMBER, "cannot read a number in '" + text + "': expected " + wanted);
        }
        double number = Double.parseDouble(m.group(1));
        if (!Double.isFinite(number)) {
            throw new QuantityFormatException(text, QuantityFormatException.Reason.OUT_OF_RANGE, "number out of range in '" + text + "'");
        }
        String unitText = m.group(2);
        if (unitText.isEmpty()) {
            if (expected == null || expected == Dimension.DIMENSIONLESS) {
                return new Quantity(number, Units.of(""));
            }
            if (expected == Dimension.ABSORBANCE) {
                return new Quantity(number, Units.of("OD"));
            }
            throw new QuantityFormatException(text, QuantityFormatException.Reason.MISSING_UNIT, "missing unit in '" + text + "': expected " + wanted
                    + " (units: " + Units.accepted(expected) + ")");
        }
        Unit unit = Units.find(unitText);
        if (unit == null && unitText.matches(",\\d.*")) {
            // "1,5 nJ": a decimal comma; unlike a table cell, a quantity's comma may separate list items
            throw new QuantityFormatException(text, QuantityFormatException.Reason.BAD_NUMBER, "decimal comma in '" + text
                    + "': write the decimal with a point (" + m.group(1) + "." + unitText.substring(1) + ")");
        }
        if (unit == null) {
            String list = expected == null ? "see 'ladderkin --help'" : Units.accepted(expected);
            throw new QuantityFormatException(text, QuantityFormatException.Reason.UNKNOWN_UNIT, "unknown unit '" + unitText + "' in '" + text + "': expected "
                    + (expected == null ? "a known unit" : article(expected.label()) + " in " + list));
        }
        if (expected != null && unit.dimension() != expected) {
            throw new QuantityFormatException(text, QuantityFormatException.Reason.WRONG_DIMENSION, "'" + text + "' is " + article(unit.dimension().label()) + ", expected "
                    + wanted + " (units: " + Units.accepted(expected) + ")");
        }
        return new Quantity(number, unit);
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
