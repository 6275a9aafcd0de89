package org.ladderkin.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * A value and its standard error as a lab writes them: the error with two significant digits, the value rounded to
 * the error's last digit ("39.06 ± 0.98", not "39.064 ± 0.9814"). More digits claim a precision the fit does not have.
 */
public final class Rounded {

    /** Significant digits a standard error carries. */
    public static final int ERROR_DIGITS = 2;

    private Rounded() {
    }

    /** The error with {@value #ERROR_DIGITS} significant digits; "?" when it is not finite. */
    public static String error(double stdError) {
        if (!Double.isFinite(stdError)) {
            return "?";
        }
        return plain(new BigDecimal(stdError).round(new MathContext(ERROR_DIGITS, RoundingMode.HALF_UP)));
    }

    /**
     * The value rounded to the last digit the error keeps; with no usable error (not finite or zero), four significant
     * digits.
     */
    public static String value(double value, double stdError) {
        if (!Double.isFinite(value)) {
            return Double.isNaN(value) ? "?" : value > 0 ? "∞" : "-∞";
        }
        if (!Double.isFinite(stdError) || stdError <= 0 || value == 0) {
            return plain(new BigDecimal(value).round(new MathContext(4, RoundingMode.HALF_UP)));
        }
        BigDecimal err = new BigDecimal(stdError).round(new MathContext(ERROR_DIGITS, RoundingMode.HALF_UP));
        int lastDigit = err.precision() - err.scale() - ERROR_DIGITS; // power of ten of the error's last kept digit
        int valueMagnitude = (int) Math.floor(Math.log10(Math.abs(value)));
        int digits = Math.max(1, valueMagnitude - lastDigit + 1);
        return plain(new BigDecimal(value).round(new MathContext(Math.min(digits, 17), RoundingMode.HALF_UP)));
    }

    /** "value ± error", both rounded as above. */
    public static String pm(double value, double stdError) {
        return value(value, stdError) + " ± " + error(stdError);
    }

    /** Plain digits for ordinary magnitudes, scientific notation (e.g. "2.45e-15") outside 1e-4 … 1e6. */
    private static String plain(BigDecimal d) {
        double abs = Math.abs(d.doubleValue());
        if (abs != 0 && (abs < 1e-4 || abs >= 1e6)) {
            int precision = d.precision();
            return String.format(Locale.ROOT, "%." + Math.max(0, precision - 1) + "e", d.doubleValue());
        }
        return d.toPlainString();
    }
}
