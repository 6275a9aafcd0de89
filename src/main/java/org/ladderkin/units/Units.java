package org.ladderkin.units;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The table of units ladderkin reads and writes, as practitioners write them.
 * Lookup is case-sensitive (ms ≠ Ms) after {@link #normalise(String) normalisation}: µ, μ and u are the same prefix;
 * ², ^2 and 2 are the same power; spaces, parentheses and multiplication dots are ignored.
 */
public final class Units {

    private static final double MICRO = 1e-6;
    private static final double CM2 = 1e-4;
    private static final double CM3 = 1e-6;

    private static final Map<String, Unit> BY_KEY = new LinkedHashMap<>();
    private static final Map<Dimension, List<Unit>> BY_DIMENSION = new EnumMap<>(Dimension.class);

    static {
        add("fs", Dimension.TIME, 1e-15);
        add("ps", Dimension.TIME, 1e-12);
        add("ns", Dimension.TIME, 1e-9);
        add("µs", Dimension.TIME, MICRO);
        add("ms", Dimension.TIME, 1e-3);
        add("s", Dimension.TIME, 1, "sec");
        add("min", Dimension.TIME, 60);
        add("h", Dimension.TIME, 3600, "hr");

        add("Hz", Dimension.FREQUENCY, 1);
        add("kHz", Dimension.FREQUENCY, 1e3);
        add("MHz", Dimension.FREQUENCY, 1e6);
        add("GHz", Dimension.FREQUENCY, 1e9);

        add("meV", Dimension.ENERGY, 1e-3 * PhysicalConstants.ELECTRONVOLT_J);
        add("eV", Dimension.ENERGY, PhysicalConstants.ELECTRONVOLT_J);
        add("fJ", Dimension.ENERGY, 1e-15);
        add("pJ", Dimension.ENERGY, 1e-12);
        add("nJ", Dimension.ENERGY, 1e-9);
        add("µJ", Dimension.ENERGY, MICRO);
        add("mJ", Dimension.ENERGY, 1e-3);
        add("J", Dimension.ENERGY, 1);

        add("nW", Dimension.POWER, 1e-9);
        add("µW", Dimension.POWER, MICRO);
        add("mW", Dimension.POWER, 1e-3);
        add("W", Dimension.POWER, 1);

        add("pm", Dimension.LENGTH, 1e-12);
        add("Å", Dimension.LENGTH, 1e-10, "Ångström", "angstrom");
        add("nm", Dimension.LENGTH, 1e-9);
        add("µm", Dimension.LENGTH, MICRO, "micron");
        add("mm", Dimension.LENGTH, 1e-3);
        add("cm", Dimension.LENGTH, 1e-2);
        add("m", Dimension.LENGTH, 1);

        add("nm²", Dimension.AREA, 1e-18);
        add("µm²", Dimension.AREA, 1e-12);
        add("mm²", Dimension.AREA, 1e-6);
        add("cm²", Dimension.AREA, CM2);
        add("m²", Dimension.AREA, 1);

        add("nm³", Dimension.VOLUME, 1e-27);
        add("µm³", Dimension.VOLUME, 1e-18);
        add("µL", Dimension.VOLUME, 1e-9, "µl");
        add("mm³", Dimension.VOLUME, 1e-9);
        add("mL", Dimension.VOLUME, CM3, "ml");
        add("cm³", Dimension.VOLUME, CM3, "cc");
        add("L", Dimension.VOLUME, 1e-3, "l");
        add("m³", Dimension.VOLUME, 1);

        add("nJ/cm²", Dimension.ENERGY_FLUENCE, 1e-9 / CM2);
        add("µJ/cm²", Dimension.ENERGY_FLUENCE, MICRO / CM2);
        add("mJ/cm²", Dimension.ENERGY_FLUENCE, 1e-3 / CM2);
        add("J/cm²", Dimension.ENERGY_FLUENCE, 1 / CM2);
        add("J/m²", Dimension.ENERGY_FLUENCE, 1);

        add("photons/cm²", Dimension.PHOTON_FLUENCE, 1 / CM2, "photon/cm²", "ph/cm²", "cm⁻²", "cm^-2", "cm-2");
        add("photons/m²", Dimension.PHOTON_FLUENCE, 1, "ph/m²", "m⁻²", "m-2");

        add("K", Dimension.TEMPERATURE, 1);
        add("°C", Dimension.TEMPERATURE, 1, PhysicalConstants.CELSIUS_ZERO_K, "degC", "℃");

        add("nM", Dimension.CONCENTRATION, 1e-6);
        add("µM", Dimension.CONCENTRATION, 1e-3);
        add("mM", Dimension.CONCENTRATION, 1);
        add("M", Dimension.CONCENTRATION, 1e3, "mol/L");
        add("mol/m³", Dimension.CONCENTRATION, 1);

        add("OD", Dimension.ABSORBANCE, 1, "od", "A");

        add("g/cm³", Dimension.DENSITY, 1e3, "g/mL");
        add("kg/m³", Dimension.DENSITY, 1);

        add("J/(g·K)", Dimension.SPECIFIC_HEAT, 1e3, "J/g/K", "J g⁻¹ K⁻¹");
        add("J/(kg·K)", Dimension.SPECIFIC_HEAT, 1, "J/kg/K", "J kg⁻¹ K⁻¹");

        add("W/(m·K)", Dimension.THERMAL_CONDUCTIVITY, 1, "W/m/K", "W m⁻¹ K⁻¹");
        add("mW/(m·K)", Dimension.THERMAL_CONDUCTIVITY, 1e-3, "mW/m/K");

        // 1 M⁻¹cm⁻¹ = 1 L mol⁻¹ cm⁻¹ = 1e-3 m³ / (mol · 1e-2 m) = 0.1 m²/mol
        add("M⁻¹cm⁻¹", Dimension.MOLAR_EXTINCTION, 0.1, "M^-1cm^-1", "M-1cm-1", "L/(mol·cm)", "/M/cm", "1/(M·cm)");
        add("µM⁻¹cm⁻¹", Dimension.MOLAR_EXTINCTION, 1e5, "µM^-1cm^-1", "µM-1cm-1", "/µM/cm", "1/(µM·cm)");
        add("m²/mol", Dimension.MOLAR_EXTINCTION, 1);

        add("µL/min", Dimension.VOLUMETRIC_FLOW, 1e-9 / 60);
        add("mL/min", Dimension.VOLUMETRIC_FLOW, CM3 / 60, "ml/min");
        add("mL/s", Dimension.VOLUMETRIC_FLOW, CM3, "ml/s");
        add("L/min", Dimension.VOLUMETRIC_FLOW, 1e-3 / 60);
        add("m³/s", Dimension.VOLUMETRIC_FLOW, 1);

        add("µm/s", Dimension.SPEED, MICRO);
        add("mm/s", Dimension.SPEED, 1e-3);
        add("cm/s", Dimension.SPEED, 1e-2);
        add("m/s", Dimension.SPEED, 1);

        add("", Dimension.DIMENSIONLESS, 1);
        add("%", Dimension.DIMENSIONLESS, 0.01);
    }

    private Units() {
    }

    private static void add(String symbol, Dimension dim, double factor, String... aliases) {
        add(symbol, dim, factor, 0.0, aliases);
    }

    private static void add(String symbol, Dimension dim, double factor, double offset, String... aliases) {
        Unit unit = new Unit(symbol, dim, factor, offset, List.of(aliases));
        register(normalise(symbol), unit);
        for (String alias : aliases) {
            register(normalise(alias), unit);
        }
        BY_DIMENSION.computeIfAbsent(dim, d -> new ArrayList<>()).add(unit);
    }

    private static void register(String key, Unit unit) {
        Unit previous = BY_KEY.putIfAbsent(key, unit);
        if (previous != null && previous != unit) {
            throw new IllegalStateException("unit spelling '" + key + "' is ambiguous: " + previous.symbol() + " and " + unit.symbol());
        }
    }

    /**
     * Canonical lookup key: µ (micro sign), μ (Greek mu) and u become one prefix; superscript and caret powers become
     * plain digits; spaces, parentheses and multiplication dots are dropped.
     */
    static String normalise(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            switch (ch) {
                case '\u00B5', '\u03BC' -> b.append('u');
                case '\u00B2' -> b.append('2');
                case '\u00B3' -> b.append('3');
                case '\u00B9' -> b.append('1');
                case '\u207B', '\u2212' -> b.append('-');
                case '^', ' ', '\t', '(', ')', '\u00B7', '\u22C5', '*' -> { }
                default -> b.append(ch);
            }
        }
        return b.toString();
    }

    /** The unit written as {@code text}, or null when the table has no such spelling. */
    public static Unit find(String text) {
        return BY_KEY.get(normalise(text.strip()));
    }

    /** The unit with canonical symbol {@code symbol}; throws when there is none (a programming error). */
    public static Unit of(String symbol) {
        Unit u = find(symbol);
        if (u == null) {
            throw new IllegalArgumentException("no unit '" + symbol + "'");
        }
        return u;
    }

    /** Units of one dimension, smallest first, in the order they are listed in messages. */
    public static List<Unit> of(Dimension dimension) {
        return Collections.unmodifiableList(BY_DIMENSION.getOrDefault(dimension, List.of()));
    }

    /** "fs, ps, ns, µs, ms, s, min, h": the canonical symbols accepted for a dimension. */
    public static String accepted(Dimension dimension) {
        return of(dimension).stream().map(u -> u.symbol().isEmpty() ? "(none)" : u.symbol()).collect(Collectors.joining(", "));
    }
}
