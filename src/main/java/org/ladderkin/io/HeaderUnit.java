package org.ladderkin.io;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;
import org.ladderkin.units.Units;

/**
 * Finds the unit a column header declares: {@code delay (ps)}, {@code delay [ns]}, {@code t/ps} or {@code t_ps}.
 * A bracketed unit that is not a known unit of the wanted dimension is an error; a {@code /} or {@code _} suffix that
 * is not a unit is taken as part of the name (so {@code pump_probe} is just a name).
 */
final class HeaderUnit {

    private static final Pattern BRACKETED = Pattern.compile("^(.*?)\\s*[(\\[]\\s*([^()\\[\\]]*?)\\s*[)\\]]\\s*$");
    private static final Pattern ANY_BRACKETED = Pattern.compile("[(\\[]\\s*([^()\\[\\]]*?)\\s*[)\\]]");
    private static final Pattern SUFFIXED = Pattern.compile("^(.*?)\\s*[/_]\\s*([^/_]+?)\\s*$");

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
        Matcher m = BRACKETED.matcher(h);
        if (m.matches()) {
            String text = m.group(2);
            Unit u = Units.find(text);
            if (u == null || u.dimension() != dimension) {
                throw new InputException(where, h, InputProblem.UNKNOWN_UNIT, "unknown " + dimension.label() + " unit '" + text + "' in header (units: "
                        + Units.accepted(dimension) + ")");
            }
            return u;
        }
        Matcher s = SUFFIXED.matcher(h);
        if (s.matches()) {
            Unit u = Units.find(s.group(2));
            if (u != null && u.dimension() == dimension) {
                return u;
            }
        }
        if (fallback == null) {
            throw new InputException(where, h, InputProblem.WRONG_UNIT, "no " + dimension.label() + " unit in header (write it like '"
                    + exampleName(dimension) + " (" + Units.of(dimension).get(1).symbol() + ")' or give " + flag + ")");
        }
        return fallback;
    }

    /**
     * Where in {@code text} a bracketed unit of {@code dimension} appears, or -1. A corner cell such as
     * "delay (ps) \\ wavelength (nm)" says which axis runs down the first column.
     */
    static int position(String text, Dimension dimension) {
        Matcher m = ANY_BRACKETED.matcher(text);
        while (m.find()) {
            Unit u = Units.find(m.group(1));
            if (u != null && u.dimension() == dimension) {
                return m.start();
            }
        }
        return -1;
    }

    /** The first bracketed unit of {@code dimension} in {@code text}, or null. */
    static Unit find(String text, Dimension dimension) {
        Matcher m = ANY_BRACKETED.matcher(text);
        while (m.find()) {
            Unit u = Units.find(m.group(1));
            if (u != null && u.dimension() == dimension) {
                return u;
            }
        }
        return null;
    }

    /** The header's name without its unit, e.g. "1 nJ" from "1 nJ" or "delay" from "delay (ps)". */
    static String name(String header) {
        Matcher m = BRACKETED.matcher(header.strip());
        return m.matches() && !m.group(1).isBlank() ? m.group(1).strip() : header.strip();
    }

    /** Absorbance-change units a signal header may carry, with their factor to OD. */
    private static final java.util.Map<String, Double> SIGNAL_UNITS = java.util.Map.of("OD", 1.0, "mOD", 1e-3,
            "\u00b5OD", 1e-6, "\u03bcOD", 1e-6, "uOD", 1e-6);
    private static final Pattern SIGNAL_SUFFIX = Pattern.compile("^(.*?)[\\s/_]+([^\\s/_()\\[\\]]+)\\s*$");

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
        Matcher m = BRACKETED.matcher(h);
        String name = m.matches() ? m.group(1) : SIGNAL_SUFFIX.matcher(h).replaceAll("$1");
        return name.isBlank() ? h : name.strip();
    }

    private static String signalUnit(String header) {
        String h = header.strip();
        Matcher m = BRACKETED.matcher(h);
        if (m.matches()) {
            return SIGNAL_UNITS.containsKey(m.group(2)) ? m.group(2) : null;
        }
        Matcher s = SIGNAL_SUFFIX.matcher(h);
        return s.matches() && SIGNAL_UNITS.containsKey(s.group(2)) ? s.group(2) : null;
    }

    private static String exampleName(Dimension dimension) {
        return dimension == Dimension.TIME ? "delay" : dimension == Dimension.LENGTH ? "wavelength" : "value";
    }
}
