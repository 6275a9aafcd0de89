package org.ladderkin.kinetics.process;

import java.util.List;
import java.util.Objects;

/**
 * One parameter of a process, declared once beside the process and read by every front end: the model-file codec
 * (its section and {@code key}), the command line ({@code flag}), the desktop planner ({@code label}, and
 * {@code planKey} when a plan's model section may set it), and the fitter ({@code fitName} when it can be fitted).
 *
 * @param key          field name inside the process's section of a model file, e.g. "biexcitonLifetime"
 * @param kind         what the value is
 * @param label        what a person reads, with the trade symbol, e.g. "Biexciton Auger lifetime τ₂"
 * @param flag         command-line flag, e.g. "--tau-auger2"
 * @param help         one line of help for the flag and the form field's tooltip
 * @param tradeUnit    unit a lab writes the value in ("ps", "ns"), or "" for a number
 * @param choices      allowed words for {@link ParameterKind#CHOICE}, {@link ParameterKind#SCALING_LAW} and
 *                     {@link ParameterKind#CHOICE_LIST}; empty otherwise
 * @param defaultText  value used when the process is on and this parameter is not given ("" for an optional lifetime
 *                     or list: off, empty), or null when it must be given
 * @param fitName      name for {@code fit --free} ("tau-auger2"), or null when the parameter cannot be fitted
 * @param fitKey       fit parameter name without its unit suffix ("tauAuger2"), null when not fittable
 * @param fitRank      place among the kinetic fit parameters (lower first), 0 when not fittable
 * @param planKey      key in a plan's {@code model} section when a plan sets it through the registry, or null
 */
public record ProcessParameter(String key, ParameterKind kind, String label, String flag, String help, String tradeUnit,
                               List<String> choices, String defaultText, String fitName, String fitKey, int fitRank,
                               String planKey) {

    public ProcessParameter {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(help, "help");
        if (flag == null || !flag.startsWith("--")) {
            throw new IllegalArgumentException("parameter '" + key + "' needs a command-line flag starting with --");
        }
        choices = List.copyOf(choices);
        boolean needsChoices = kind == ParameterKind.CHOICE || kind == ParameterKind.SCALING_LAW
                || kind == ParameterKind.CHOICE_LIST;
        if (needsChoices == choices.isEmpty()) {
            throw new IllegalArgumentException("parameter '" + key + "': choices go with choice kinds only");
        }
        if ((fitName == null) != (fitKey == null) || (fitName != null && kind != ParameterKind.LIFETIME)) {
            throw new IllegalArgumentException("parameter '" + key + "': only lifetimes are fitted, with a name and a key");
        }
        if (kind == ParameterKind.LIFETIME && tradeUnit.isEmpty()) {
            throw new IllegalArgumentException("lifetime '" + key + "' needs a trade unit");
        }
    }

    /**
     * Shortest lifetime a model may hold: 1 fs, below any carrier process in these dots. With {@link #MAX_FACTOR} and
     * the ladder's largest multiplicities it keeps every rate the engine builds finite.
     */
    public static final double MIN_LIFETIME_S = 1e-15;
    /** Longest lifetime a model may hold: about 32 years; longer is "off", which is written by leaving it out. */
    public static final double MAX_LIFETIME_S = 1e9;
    /** Largest rate factor (e.g. a trion's radiative factor); a factor of 1e300 turned rates into Infinity. */
    public static final double MAX_FACTOR = 1e6;

    /**
     * What is wrong with {@code valueSi} for this parameter (allowed range in the text), or null when it is allowed.
     * Every reader asks this where it reads the value, so the engine's guards are never the first to see it.
     */
    public String problemWith(double valueSi) {
        return switch (kind) {
            case LIFETIME -> valueSi >= MIN_LIFETIME_S && valueSi <= MAX_LIFETIME_S ? null
                    : "must be between 1 fs and 1e9 s, was " + valueSi + " s";
            case PROBABILITY -> valueSi >= 0 && valueSi <= 1 ? null : "must be between 0 and 1, was " + valueSi;
            case FACTOR -> valueSi >= 0 && valueSi <= MAX_FACTOR ? null : "must be between 0 and 1e6, was " + valueSi;
            default -> null;
        };
    }

    /** A lifetime (seconds inside, {@code tradeUnit} at the edges). */
    public static ProcessParameter lifetime(String key, String label, String flag, String help, String tradeUnit) {
        return new ProcessParameter(key, ParameterKind.LIFETIME, label, flag, help, tradeUnit, List.of(), null, null, null,
                0, null);
    }

    /** A number of {@code kind} with a default. */
    public static ProcessParameter number(String key, ParameterKind kind, String label, String flag, String help,
                                          String defaultText) {
        return new ProcessParameter(key, kind, label, flag, help, "", List.of(), defaultText, null, null, 0, null);
    }

    /** A word (or list or law) out of {@code choices}, with a default (null: must be given). */
    public static ProcessParameter choice(String key, ParameterKind kind, String label, String flag, String help,
                                          List<String> choices, String defaultText) {
        return new ProcessParameter(key, kind, label, flag, help, "", choices, defaultText, null, null, 0, null);
    }

    /** This parameter, optional: a lifetime not given is +∞ (its part of the process off), a list not given is empty. */
    public ProcessParameter optional() {
        if (kind != ParameterKind.LIFETIME && kind != ParameterKind.CHOICE_LIST) {
            throw new IllegalStateException("only lifetimes and lists are optional without a default");
        }
        return new ProcessParameter(key, kind, label, flag, help, tradeUnit, choices, "", fitName, fitKey, fitRank, planKey);
    }

    /** This parameter, fittable as {@code fit --free name}. */
    public ProcessParameter fittedAs(String name, String key, int rank) {
        return new ProcessParameter(this.key, kind, label, flag, help, tradeUnit, choices, defaultText, name, key, rank,
                planKey);
    }

    /** This parameter, settable in a plan's {@code model} section under {@code key}. */
    public ProcessParameter inPlanAs(String key) {
        return new ProcessParameter(this.key, kind, label, flag, help, tradeUnit, choices, defaultText, fitName, fitKey,
                fitRank, key);
    }

    /** Whether {@code fit --free} can fit it. */
    public boolean fittable() {
        return fitName != null;
    }

    /** Whether the process needs it (no default). */
    public boolean required() {
        return defaultText == null;
    }
}
