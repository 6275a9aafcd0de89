package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.ExcitonScaling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;

/**
 * Radiative recombination ({@link RadiativeDecay}).
 *
 * @param tauRadS       single-exciton radiative lifetime τ_rad (s)
 * @param scaling       f(N)
 * @param chargedFactor k_rad(charged)/k_rad(neutral)
 */
public record RadiativeProcess(double tauRadS, ExcitonScaling scaling, double chargedFactor) implements ProcessSpec {

    public static final ProcessParameter LIFETIME = ProcessParameter.lifetime("lifetime", "Radiative lifetime τ_rad",
            "--tau-rad", "single-exciton radiative lifetime (flag model)", "ns").fittedAs("tau-rad", "tauRad", 2);
    public static final ProcessParameter SCALING = ProcessParameter.choice("scaling", ParameterKind.SCALING_LAW,
            "Radiative scaling", "--radiative-scaling", "radiative N-scaling", List.of("linear", "statistical"),
            "statistical");
    public static final ProcessParameter CHARGED_FACTOR = ProcessParameter.number("chargedFactor", ParameterKind.FACTOR,
            "Charged radiative factor", "--charged-radiative-factor", "k_rad(charged)/k_rad(neutral)",
            "2");

    /** The registry entry. */
    public static final ProcessType<RadiativeProcess> TYPE = ProcessType.of("radiative", true,
            List.of(LIFETIME, SCALING, CHARGED_FACTOR),
            in -> new RadiativeProcess(in.seconds(LIFETIME), in.scaling(SCALING, 1, RadiativeProcess::law),
                    in.number(CHARGED_FACTOR)));

    public RadiativeProcess {
        Lifetimes.require("radiative lifetime", tauRadS, false);
        new RadiativeDecay(1 / tauRadS, scaling, chargedFactor);
    }

    /** A radiative law by name: linear or statistical. */
    public static RadiativeScaling law(String key) {
        for (RadiativeScaling s : RadiativeScaling.values()) {
            if (s.key().equals(key)) {
                return s;
            }
        }
        throw new IllegalArgumentException("radiative scaling '" + key + "' is not one of: linear, statistical (or a table)");
    }

    @Override
    public ProcessType<?> type() {
        return TYPE;
    }

    @Override
    public void addTo(LadderBuilder ladder) {
        ladder.add(new RadiativeDecay(1 / tauRadS, scaling, chargedFactor));
    }

    @Override
    public double seconds(ProcessParameter p) {
        if (p == LIFETIME) {
            return tauRadS;
        }
        throw ProcessSpec.notMine(this, p);
    }

    @Override
    public RadiativeProcess withSeconds(ProcessParameter p, double seconds) {
        if (p == LIFETIME) {
            return new RadiativeProcess(seconds, scaling, chargedFactor);
        }
        throw ProcessSpec.notMine(this, p);
    }
}
