package org.ladderkin.io;

/**
 * Number text for large tables, without {@link String#format} (whose parsing of the pattern and boxing dominate the
 * time of writing a 40-column, 1000-row sweep). {@link #appendG15} writes exactly what
 * {@code String.format(Locale.ROOT, "%.15g", x)} writes: the formatter rounds the decimal digits of
 * {@link Double#toString} half-up to 15 significant digits, then prints plain notation when the rounded exponent lies
 * in [−4, 15) and scientific notation (at least two exponent digits) otherwise.
 */
public final class NumberText {

    private static final int DIGITS = 15;

    private NumberText() {
    }

    /** {@code String.format(Locale.ROOT, "%.15g", x)}. */
    public static String g15(double x) {
        StringBuilder sb = new StringBuilder(24);
        appendG15(sb, x);
        return sb.toString();
    }

    /** Appends {@code String.format(Locale.ROOT, "%.15g", x)} to {@code sb}. */
    public static void appendG15(StringBuilder sb, double x) {
        if (Double.isNaN(x)) {
            sb.append("NaN");
            return;
        }
        if (Double.isInfinite(x)) {
            sb.append(x > 0 ? "Infinity" : "-Infinity");
            return;
        }
        if (x == 0) {
            if (Double.doubleToRawLongBits(x) != 0) {
                sb.append('-');
            }
            sb.append("0.00000000000000");
            return;
        }
        if (x < 0) {
            sb.append('-');
            x = -x;
        }
        // digits and decimal exponent of Double.toString: value = 0.d1d2d3... × 10^exp
        String s = Double.toString(x);
        char[] d = new char[DIGITS + 3];
        int nd = 0;
        int exp = 0;
        int e = s.indexOf('E');
        int mantissaEnd = e < 0 ? s.length() : e;
        int pointSeen = -1;
        boolean leading = true;
        int leadingZerosAfterPoint = 0;
        int intDigits = 0;
        for (int i = 0; i < mantissaEnd; i++) {
            char c = s.charAt(i);
            if (c == '.') {
                pointSeen = i;
                continue;
            }
            if (leading && c == '0') {
                if (pointSeen >= 0) {
                    leadingZerosAfterPoint++;
                }
                continue;
            }
            leading = false;
            if (pointSeen < 0) {
                intDigits++;
            }
            if (nd < d.length) {
                d[nd++] = c;
            } else if (nd == d.length) {
                break;
            }
        }
        exp = intDigits > 0 ? intDigits : -leadingZerosAfterPoint;
        if (e >= 0) {
            exp += Integer.parseInt(s, e + 1, s.length(), 10);
        }
        // round half-up to DIGITS significant digits
        if (nd > DIGITS) {
            boolean up = d[DIGITS] >= '5';
            nd = DIGITS;
            if (up) {
                int i = DIGITS - 1;
                while (i >= 0 && d[i] == '9') {
                    d[i] = '0';
                    i--;
                }
                if (i >= 0) {
                    d[i]++;
                } else {
                    System.arraycopy(d, 0, d, 1, DIGITS - 1);
                    d[0] = '1';
                    exp++;
                }
            }
        }
        while (nd < DIGITS) {
            d[nd++] = '0';
        }
        int sciExp = exp - 1;
        if (sciExp >= -4 && sciExp < DIGITS) {
            if (exp <= 0) {
                sb.append("0.");
                for (int i = 0; i < -exp; i++) {
                    sb.append('0');
                }
                sb.append(d, 0, DIGITS);
            } else {
                sb.append(d, 0, exp);
                if (exp < DIGITS) {
                    sb.append('.').append(d, exp, DIGITS - exp);
                }
            }
        } else {
            sb.append(d[0]).append('.').append(d, 1, DIGITS - 1).append('e');
            sb.append(sciExp < 0 ? '-' : '+');
            int a = Math.abs(sciExp);
            if (a < 10) {
                sb.append('0');
            }
            sb.append(a);
        }
    }
}
