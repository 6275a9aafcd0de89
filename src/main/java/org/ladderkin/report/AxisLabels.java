package org.ladderkin.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Tick labels in one format per axis: plain decimals when every label fits between 0.001 and 99 999 (0.02, 0.5, 10),
 * powers of ten otherwise (2×10⁻⁵, 10⁸), never a mixture and never computer notation such as "1E8" or "0E0".
 */
final class AxisLabels {

    private static final String SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    private AxisLabels() {
    }

    /** Labels of log-axis ticks, each a 1, 2 or 5 times a power of ten. */
    static List<String> log(List<Double> values) {
        boolean plain = values.stream().allMatch(v -> v >= 1e-3 && v < 1e5);
        List<String> out = new ArrayList<>();
        for (double v : values) {
            if (plain) {
                out.add(new BigDecimal(v).round(new MathContext(3)).stripTrailingZeros().toPlainString());
            } else {
                int e = (int) Math.floor(Math.log10(v) + 1e-9);
                long m = Math.round(v / Math.pow(10, e));
                out.add((m == 1 ? "" : m + "×") + "10" + superscript(e));
            }
        }
        return out;
    }

    /** Labels of linear-axis ticks {@code step} apart: the same number of decimals, or one power of ten, for all. */
    static List<String> linear(List<Double> values, double step) {
        double largest = values.stream().mapToDouble(Math::abs).max().orElse(0);
        int stepExponent = (int) Math.floor(Math.log10(step) + 1e-9);
        boolean plain = stepExponent >= -4 && largest < 1e6;
        List<String> out = new ArrayList<>();
        if (plain) {
            int decimals = Math.max(0, -stepExponent);
            for (double v : values) {
                out.add(minus(String.format(Locale.ROOT, "%." + decimals + "f", zeroed(v, step))));
            }
            return out;
        }
        int e = (int) Math.floor(Math.log10(largest) + 1e-9);
        int decimals = Math.max(0, e - stepExponent);
        for (double v : values) {
            double z = zeroed(v, step);
            out.add(z == 0 ? "0" : minus(String.format(Locale.ROOT, "%." + decimals + "f", z / Math.pow(10, e))) + "×10" + superscript(e));
        }
        return out;
    }

    /** A tick that should be zero but carries rounding noise ("−0.00") is zero. */
    private static double zeroed(double v, double step) {
        return Math.abs(v) < 1e-9 * step ? 0 : v;
    }

    private static String minus(String s) {
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }

    static String superscript(int e) {
        StringBuilder b = new StringBuilder();
        if (e < 0) {
            b.append('⁻');
        }
        for (char c : Integer.toString(Math.abs(e)).toCharArray()) {
            b.append(SUPERSCRIPT.charAt(c - '0'));
        }
        return b.toString();
    }
}
