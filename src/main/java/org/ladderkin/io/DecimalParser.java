package org.ladderkin.io;

/**
 * Fast path for the plain decimals that fill measurement tables ("0.0123", "-1.5e-3", "12,5" with a decimal comma).
 * When the number has at most 15 significant digits and a decimal exponent within ±22, the mantissa and the power of
 * ten are both exact doubles and one multiplication or division rounds correctly (Clinger's fast path, 1990), so the
 * result equals {@link Double#parseDouble}. Anything else returns NaN and the caller falls back to the slow path.
 */
final class DecimalParser {

    private static final double[] POWERS = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POWERS.length; i++) {
            POWERS[i] = p;
            p *= 10;
        }
    }

    private DecimalParser() {
    }

    /**
     * The value of {@code s[from, to)}, or NaN when the text is not a plain decimal this path can do exactly.
     *
     * @param decimalComma whether ',' is accepted as the decimal mark
     */
    static double tryParse(String s, int from, int to, boolean decimalComma) {
        int i = from;
        if (i >= to) {
            return Double.NaN;
        }
        boolean negative = false;
        char c = s.charAt(i);
        if (c == '-' || c == '+') {
            negative = c == '-';
            i++;
        }
        long mantissa = 0;
        int significant = 0;
        int exponent = 0;
        int digits = 0;
        boolean point = false;
        for (; i < to; i++) {
            c = s.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
                if (mantissa == 0 && c == '0') {
                    if (point) {
                        exponent--;
                    }
                    continue;
                }
                if (++significant > 15) {
                    return Double.NaN;
                }
                mantissa = mantissa * 10 + (c - '0');
                if (point) {
                    exponent--;
                }
            } else if ((c == '.' || c == ',' && decimalComma) && !point) {
                point = true;
            } else {
                break;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        if (i < to) {
            c = s.charAt(i);
            if (c != 'e' && c != 'E') {
                return Double.NaN;
            }
            i++;
            boolean expNegative = false;
            if (i < to && (s.charAt(i) == '-' || s.charAt(i) == '+')) {
                expNegative = s.charAt(i) == '-';
                i++;
            }
            int e = 0;
            int expDigits = 0;
            for (; i < to; i++) {
                c = s.charAt(i);
                if (c < '0' || c > '9' || ++expDigits > 4) {
                    return Double.NaN;
                }
                e = e * 10 + (c - '0');
            }
            if (expDigits == 0) {
                return Double.NaN;
            }
            exponent += expNegative ? -e : e;
        }
        double value;
        if (mantissa == 0) {
            value = 0;
        } else if (exponent >= 0 && exponent < POWERS.length) {
            value = mantissa * POWERS[exponent];
        } else if (exponent < 0 && -exponent < POWERS.length) {
            value = mantissa / POWERS[-exponent];
        } else {
            return Double.NaN;
        }
        return negative ? -value : value;
    }
}
