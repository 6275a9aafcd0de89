package org.ladderkin.cli;

import java.util.ArrayList;
import java.util.List;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.Spacing;

/**
 * Delay lists as typed on the command line: {@code 0.1ps..1ms:1000log} (log-spaced, ends included),
 * {@code 0..500ps:51lin} (evenly spaced), or a comma list {@code 1ps,10ps,1ns}.
 */
final class DelayGrid {

    private DelayGrid() {
    }

    /** Delays in seconds, ascending. */
    static double[] parse(String text) {
        String t = text.trim();
        if (t.contains("..")) {
            int colon = t.lastIndexOf(':');
            if (colon < 0) {
                throw new IllegalArgumentException("delay range '" + text + "' needs a count, e.g. 0.1ps..1ms:1000log");
            }
            String[] ends = t.substring(0, colon).split("\\.\\.", -1);
            if (ends.length != 2) {
                throw new IllegalArgumentException("delay range '" + text + "' must read FROM..TO:COUNTlog or FROM..TO:COUNTlin");
            }
            double from = Quantity.parseSi(ends[0].trim(), Dimension.TIME);
            double to = Quantity.parseSi(ends[1].trim(), Dimension.TIME);
            String spec = t.substring(colon + 1).trim();
            boolean log = spec.endsWith("log");
            if (!log && !spec.endsWith("lin")) {
                throw new IllegalArgumentException("delay count '" + spec + "' must end in 'log' or 'lin', e.g. 1000log");
            }
            int count;
            try {
                count = Integer.parseInt(spec.substring(0, spec.length() - 3));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("delay count '" + spec + "' must be a whole number followed by log or lin");
            }
            if (count < 2 || count > 1_000_000) {
                throw new IllegalArgumentException("delay count must be between 2 and 1000000, was " + count);
            }
            if (!(to > from) || from < 0) {
                throw new IllegalArgumentException("delay range must run from >= 0 up to a later delay, was " + text);
            }
            if (log && !(from > 0)) {
                throw new IllegalArgumentException("a log-spaced delay range must start above 0, was " + ends[0].trim());
            }
            return log ? Spacing.log(from, to, count) : Spacing.linear(from, to, count);
        }
        List<Double> list = new ArrayList<>();
        for (String part : t.split(",")) {
            double x = Quantity.parseSi(part.trim(), Dimension.TIME);
            if (x < 0) {
                throw new IllegalArgumentException("delays must be >= 0, was " + part.trim());
            }
            if (!list.isEmpty() && x <= list.get(list.size() - 1)) {
                throw new IllegalArgumentException("delays must increase, '" + part.trim() + "' does not");
            }
            list.add(x);
        }
        return list.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
