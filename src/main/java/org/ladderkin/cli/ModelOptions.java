package org.ladderkin.cli;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.ladderkin.io.ModelCodec;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.ModelParameters;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Option;

/** The flags that describe a ladder model without a model file; shared by every command that takes a model. */
final class ModelOptions {

    @Option(names = "--tau-rad", paramLabel = "TIME", description = "single-exciton radiative lifetime (flag model)")
    String tauRad;

    @Option(names = "--radiative-scaling", paramLabel = "LAW", defaultValue = "statistical",
            description = "radiative N-scaling: linear | statistical (default ${DEFAULT-VALUE})")
    String radiativeScaling;

    @Option(names = "--charged-radiative-factor", paramLabel = "X", defaultValue = "2",
            description = "k_rad(charged)/k_rad(neutral) (default ${DEFAULT-VALUE})")
    double chargedRadiativeFactor;

    @Option(names = "--tau-auger2", paramLabel = "TIME", description = "biexciton Auger lifetime (flag model)")
    String tauAuger2;

    @Option(names = "--auger-scaling", paramLabel = "LAW", defaultValue = "statistical",
            description = "Auger N-scaling: statistical | pairs | quadratic (default ${DEFAULT-VALUE})")
    String augerScaling;

    @Option(names = "--tau-trion-negative", paramLabel = "TIME", description = "negative-trion Auger lifetime")
    String tauTrionNegative;

    @Option(names = "--tau-trion-positive", paramLabel = "TIME", description = "positive-trion Auger lifetime")
    String tauTrionPositive;

    @Option(names = "--tau-trap", paramLabel = "TIME", description = "trapping lifetime per exciton (off when omitted)")
    String tauTrap;

    @Option(names = "--tau-cool", paramLabel = "TIME", description = "intraband cooling time per hot exciton (off when omitted)")
    String tauCool;

    @Option(names = "--charges", split = ",", paramLabel = "CHARGE", description = "excess charges that exist: negative, positive")
    List<String> charges;

    @Option(names = "--ionisation-probability", paramLabel = "P", defaultValue = "0",
            description = "probability that an Auger event ejects a carrier (default ${DEFAULT-VALUE})")
    double ionisationProbability;

    @Option(names = "--ionisation-leaves", paramLabel = "CHARGE", defaultValue = "negative",
            description = "charge left on the dot after ejection: negative | positive (default ${DEFAULT-VALUE})")
    String ionisationLeaves;

    @Option(names = "--tau-neutralisation", paramLabel = "TIME", description = "time for a charged dot to lose its excess carrier")
    String tauNeutralisation;

    @Option(names = "--tau-refresh", paramLabel = "TIME", description = "sample exchange time by stirring or flow")
    String tauRefresh;

    @Option(names = "--degeneracy", paramLabel = "G", defaultValue = "2", description = "band-edge degeneracy g (default ${DEFAULT-VALUE})")
    int degeneracy;

    @Option(names = "--nmax", paramLabel = "N", description = "highest exciton number kept (default: automatic, tail < 1e-9)")
    Integer nMax;

    /** The kinetic model from {@code modelFile} or, when it is null, from the flags. */
    KineticModel model(Path modelFile) {
        ModelParameters p = parameters(modelFile);
        return modelFile != null && nMax != null ? p.toModel().withFixedNMax(nMax) : p.toModel();
    }

    /** Whether the flags describe a model (a model file or the flags are then the model, not a plan's). */
    boolean given() {
        return tauRad != null || tauAuger2 != null;
    }

    /** The model's parameters from {@code modelFile} or, when it is null, from the flags. */
    ModelParameters parameters(Path modelFile) {
        boolean anyModelFlag = tauRad != null || tauAuger2 != null;
        if (modelFile != null) {
            if (anyModelFlag) {
                throw new IllegalArgumentException("give either a model file or --tau-rad/--tau-auger2, not both");
            }
            return ModelCodec.read(modelFile).parameters();
        }
        if (tauRad == null || tauAuger2 == null) {
            throw new IllegalArgumentException("without a model file (or a plan for fit), --tau-rad and --tau-auger2 are required");
        }
        Set<Charge> cs = EnumSet.noneOf(Charge.class);
        if (charges != null) {
            for (String c : charges) {
                cs.add(charge(c, "--charges"));
            }
        }
        AugerIonisation ion = ionisationProbability > 0
                ? new AugerIonisation(ionisationProbability, charge(ionisationLeaves, "--ionisation-leaves"))
                : AugerIonisation.NONE;
        double negTrion = rateOf(tauTrionNegative, "--tau-trion-negative");
        double posTrion = rateOf(tauTrionPositive, "--tau-trion-positive");
        if (cs.contains(Charge.NEGATIVE) && negTrion == 0 || cs.contains(Charge.POSITIVE) && posTrion == 0) {
            throw new IllegalArgumentException("charged dots need --tau-trion-negative / --tau-trion-positive for their charges");
        }
        ModelParameters p = new ModelParameters(rateOf(tauRad, "--tau-rad"), ModelParameters.radiativeScaling(radiativeScaling),
                chargedRadiativeFactor >= 0 ? chargedRadiativeFactor : RadiativeDecay.DEFAULT_CHARGED_FACTOR,
                rateOf(tauAuger2, "--tau-auger2"), ModelParameters.augerScaling(augerScaling), negTrion, posTrion,
                rateOf(tauTrap, "--tau-trap"), rateOf(tauCool, "--tau-cool"), cs, ion,
                rateOf(tauNeutralisation, "--tau-neutralisation"), rateOf(tauRefresh, "--tau-refresh"), degeneracy,
                nMax == null ? 0 : nMax);
        return p;
    }

    private static Charge charge(String text, String flag) {
        return switch (text.trim()) {
            case "negative" -> Charge.NEGATIVE;
            case "positive" -> Charge.POSITIVE;
            default -> throw new IllegalArgumentException(flag + " must be negative or positive, was " + text);
        };
    }

    /** 1/lifetime, or 0 when the flag is absent. */
    private static double rateOf(String lifetime, String flag) {
        return lifetime == null ? 0 : 1 / positive(lifetime, Dimension.TIME, flag);
    }

    private static double positive(String text, Dimension d, String flag) {
        double x = Quantity.parseSi(text, d);
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException(flag + " must be > 0, was " + text);
        }
        return x;
    }
}
