package org.ladderkin.io;

import org.ladderkin.units.Excerpt;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;
import org.ladderkin.units.Units;

/**
 * Finds the unit a column header declares: {@code delay (ps)}, {@code delay [ns]}, {@code t/ps} or {@code t_ps}.
 * A bracketed unit that is not a known unit of the wanted dimension is an error; a {@code /} or {@code _} suffix that
 * is not a unit is taken as part of the name (so {@code pump_probe} is just a name).
 */
final class HeaderUnit {

    /** Longest header read; a longer cell is refused before it is scanned (no header is that long). */
    static final int MAX_HEADER_LENGTH = 500;

    private HeaderUnit() {
    }

    /**
     * The unit of {@code header}, or {@code fallback} when it names none (which may be null: then it is an error).
     *
     * @param where location of the header cell for messages
     * @param flag  how the user gives a default on the command line, for the message
     */
    static Unit of(String header, Dimension dimension, Unit fallback, SourceLocation where, String flag) {
        String h = header.strip();
        if (h.length() > MAX_HEADER_LENGTH) {
            throw new InputException(where, Excerpt.of(h), InputProblem.OUT_OF_RANGE, "header too long (" + h.length() + " characters, at most "
                    + MAX_HEADER_LENGTH + ")");
        }
        String[] bracketed = bracketed(h);
        if (bracketed != null) {
            String text = bracketed[1];
            Unit u = Units.find(text);
            if (u == null || u.dimension() != dimension) {
                throw new InputException(where, Excerpt.of(h), InputProblem.UNKNOWN_UNIT, "unknown " + dimension.label() + " unit '" + Excerpt.of(text)
                        + "' in header (units: " + Units.accepted(dimension) + ")");
            }
            return u;
        }
        String[] suffixed = suffixed(h);
        if (suffixed != null) {
            Unit u = Units.find(suffixed[1]);
            if (u != null && u.dimension() == dimension) {
                return u;
            }
        }
        if (fallback == null) {
            throw new InputException(where, Excerpt.of(h), InputProblem.WRONG_UNIT, "no " + dimension.label() + " unit in header (write it like '"
                    + exampleName(dimension) + " (" + Units.of(dimension).get(1).symbol() + ")' or give " + flag + ")");
        }
        return fallback;
    }

    /**
     * Where in {@code text} a bracketed unit of {@code dimension} appears, or -1. A corner cell such as
     * "delay (ps) \\ wavelength (nm)" says which axis runs down the first column.
     */
    static int position(String text, Dimension dimension) {
        for (int open = nextOpening(text, 0); open >= 0; open = nextOpening(text, open + 1)) {
            String inner = innerAt(text, open);
            Unit u = inner == null ? null : Units.find(inner);
            if (u != null && u.dimension() == dimension) {
                return open;
            }
        }
        return -1;
    }

    /** The first bracketed unit of {@code dimension} in {@code text}, or null. */
    static Unit find(String text, Dimension dimension) {
        int at = position(text, dimension);
        return at < 0 ? null : Units.find(innerAt(text, at));
    }

    /** The header's name without its unit, e.g. "1 nJ" from "1 nJ" or "delay" from "delay (ps)". */
    static String name(String header) {
        String[] b = bracketed(header.strip());
        return b != null && !b[0].isBlank() ? b[0].strip() : header.strip();
    }

    /** Absorbance-change units a signal header may carry, with their factor to OD. */
    private static final java.util.Map<String, Double> SIGNAL_UNITS = java.util.Map.of("OD", 1.0, "mOD", 1e-3,
            "\u00b5OD", 1e-6, "\u03bcOD", 1e-6, "uOD", 1e-6);

    /**
     * The factor from a signal column's unit to OD when its header names one ({@code ΔA [mOD]}, {@code 1 nJ (µOD)},
     * {@code J1 mOD}, {@code dA/mOD}), or NaN when it names none (the values are then taken as they are). Units are
     * matched as written: "mOD" is milli-OD, "MOD" is not a unit.
     */
    static double signalToOd(String header) {
        String u = signalUnit(header);
        return u == null ? Double.NaN : SIGNAL_UNITS.get(u);
    }

    /** The signal header without its unit ("1 nJ" from "1 nJ [mOD]"), or the header when it names none. */
    static String signalName(String header) {
        String h = header.strip();
        if (signalUnit(h) == null) {
            return h;
        }
        String[] b = bracketed(h);
        String name = b != null ? b[0] : signalSuffixed(h)[0];
        return name.isBlank() ? h : name.strip();
    }

    private static String signalUnit(String header) {
        String h = header.strip();
        String[] b = bracketed(h);
        if (b != null) {
            return SIGNAL_UNITS.containsKey(b[1]) ? b[1] : null;
        }
        String[] s = signalSuffixed(h);
        return s != null && SIGNAL_UNITS.containsKey(s[1]) ? s[1] : null;
    }

    // Hand-written scans instead of regular expressions: headers come from user files, and the lazy patterns these
    // replace backtracked quadratically on long runs of spaces (a 60,000-character cell took minutes).

    /** {name, unit} for a stripped header ending in a bracketed unit ("delay (ps)", "t [ns]"), or null. */
    private static String[] bracketed(String h) {
        int n = h.length();
        if (n == 0 || !isClosing(h.charAt(n - 1))) {
            return null;
        }
        int i = n - 2;
        while (i >= 0 && !isBracket(h.charAt(i))) {
            i--;
        }
        if (i < 0 || !isOpening(h.charAt(i))) {
            return null;
        }
        return new String[] {stripRegexSpace(h.substring(0, i)), stripRegexSpace(h.substring(i + 1, n - 1))};
    }

    /** {name, unit} for a stripped header whose last {@code /} or {@code _} is followed by a non-blank suffix, or null. */
    private static String[] suffixed(String h) {
        int i = Math.max(h.lastIndexOf('/'), h.lastIndexOf('_'));
        if (i < 0) {
            return null;
        }
        String unit = stripRegexSpace(h.substring(i + 1));
        return unit.isEmpty() ? null : new String[] {stripRegexSpace(h.substring(0, i)), unit};
    }

    /** {name, unit} where the last token (no blank, slash, underscore or bracket) follows a run of those separators, or null. */
    private static String[] signalSuffixed(String h) {
        int end = h.length();
        int i = end;
        while (i > 0 && !isSeparator(h.charAt(i - 1)) && !isBracket(h.charAt(i - 1))) {
            i--;
        }
        if (i == end || i == 0 || !isSeparator(h.charAt(i - 1))) {
            return null;
        }
        int j = i;
        while (j > 0 && isSeparator(h.charAt(j - 1))) {
            j--;
        }
        return new String[] {h.substring(0, j), h.substring(i, end)};
    }

    private static int nextOpening(String text, int from) {
        for (int i = from; i < text.length(); i++) {
            if (isOpening(text.charAt(i))) {
                return i;
            }
        }
        return -1;
    }

    /** The stripped text between the opening bracket at {@code open} and the next bracket, when that one closes. */
    private static String innerAt(String text, int open) {
        for (int i = open + 1; i < text.length(); i++) {
            char c = text.charAt(i);
            if (isBracket(c)) {
                return isClosing(c) ? stripRegexSpace(text.substring(open + 1, i)) : null;
            }
        }
        return null;
    }

    private static boolean isOpening(char c) {
        return c == '(' || c == '[';
    }

    private static boolean isClosing(char c) {
        return c == ')' || c == ']';
    }

    private static boolean isBracket(char c) {
        return isOpening(c) || isClosing(c);
    }

    private static boolean isSeparator(char c) {
        return isRegexSpace(c) || c == '/' || c == '_';
    }

    private static boolean isRegexSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r';
    }

    private static String stripRegexSpace(String s) {
        int a = 0;
        int b = s.length();
        while (a < b && isRegexSpace(s.charAt(a))) {
            a++;
        }
        while (b > a && isRegexSpace(s.charAt(b - 1))) {
            b--;
        }
        return s.substring(a, b);
    }

    private static String exampleName(Dimension dimension) {
        return dimension == Dimension.TIME ? "delay" : dimension == Dimension.LENGTH ? "wavelength" : "value";
    }
}
