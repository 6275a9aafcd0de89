package org.ladderkin.kinetics.process;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.state.Charge;

/**
 * Photocharging: the excess charges the ladder holds, Auger ionisation that creates them ({@link AugerIonisation},
 * a refinement of the Auger law) and {@link Neutralisation} that removes them.
 *
 * @param charges          excess charges that exist (not empty)
 * @param ionisation       probability and outcome of an ionising Auger event
 * @param neutralisationS  lifetime of the excess charge (s), +∞ when charged dots never neutralise within the model
 */
public record ChargingProcess(Set<Charge> charges, AugerIonisation ionisation, double neutralisationS)
        implements ProcessSpec {

    private static final List<String> CHARGES = List.of("negative", "positive");

    public static final ProcessParameter CHARGE_LIST = ProcessParameter.choice("charges", ParameterKind.CHOICE_LIST,
            "Excess charges", "--charges", "excess charges that exist", CHARGES, null);
    public static final ProcessParameter IONISATION_PROBABILITY = ProcessParameter.number("ionisationProbability",
            ParameterKind.PROBABILITY, "Auger ionisation probability", "--ionisation-probability",
            "probability that an Auger event ejects a carrier", "0");
    public static final ProcessParameter IONISATION_LEAVES = ProcessParameter.choice("ionisationLeaves",
            ParameterKind.CHOICE, "Charge left by ionisation", "--ionisation-leaves",
            "charge left on the dot after ejection", CHARGES, "negative");
    public static final ProcessParameter NEUTRALISATION_TIME = ProcessParameter.lifetime("neutralisationTime",
            "Photocharge lifetime", "--tau-neutralisation", "time for a charged dot to lose its excess carrier", "s")
            .optional();

    /** The registry entry. */
    public static final ProcessType<ChargingProcess> TYPE = ProcessType.of("charging", false,
            List.of(CHARGE_LIST, IONISATION_PROBABILITY, IONISATION_LEAVES, NEUTRALISATION_TIME),
            ChargingProcess::read);

    public ChargingProcess {
        charges = charges.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(charges));
        if (charges.isEmpty() || charges.contains(Charge.NEUTRAL)) {
            throw new IllegalArgumentException("list the excess charges that exist (negative, positive); neutral always exists");
        }
        if (ionisation.probability() > 0 && !charges.contains(ionisation.leftCharge())) {
            throw new IllegalArgumentException("Auger ionisation leaves " + ionisation.leftCharge().name().toLowerCase()
                    + " dots, but that charge is not in the model's charges");
        }
        Lifetimes.require("photocharge lifetime", neutralisationS, true);
    }

    private static ChargingProcess read(ParameterReader in) {
        Set<Charge> cs = EnumSet.noneOf(Charge.class);
        for (String c : in.choices(CHARGE_LIST)) {
            cs.add(charge(c));
        }
        Charge left = charge(in.choice(IONISATION_LEAVES));
        double p = in.number(IONISATION_PROBABILITY);
        if (p > 0 && !cs.contains(left)) {
            throw in.error(IONISATION_LEAVES, "ionisation leaves " + in.choice(IONISATION_LEAVES)
                    + " dots but '" + CHARGE_LIST.key() + "' does not list them");
        }
        return new ChargingProcess(cs, new AugerIonisation(p, left), in.seconds(NEUTRALISATION_TIME));
    }

    private static Charge charge(String word) {
        return word.equals("negative") ? Charge.NEGATIVE : Charge.POSITIVE;
    }

    @Override
    public ProcessType<?> type() {
        return TYPE;
    }

    @Override
    public void addTo(LadderBuilder ladder) {
        for (Charge c : charges) {
            ladder.allowCharge(c);
        }
        ladder.change(AugerRecombination.class, a -> {
            if (charges.contains(Charge.NEGATIVE) && a.negativeTrionRatePerS() == 0) {
                throw new IllegalArgumentException("negative dots need a negative-trion Auger lifetime ('"
                        + AugerProcess.NEGATIVE_TRION_LIFETIME.key() + "' in 'auger', "
                        + AugerProcess.NEGATIVE_TRION_LIFETIME.flag() + ")");
            }
            if (charges.contains(Charge.POSITIVE) && a.positiveTrionRatePerS() == 0) {
                throw new IllegalArgumentException("positive dots need a positive-trion Auger lifetime ('"
                        + AugerProcess.POSITIVE_TRION_LIFETIME.key() + "' in 'auger', "
                        + AugerProcess.POSITIVE_TRION_LIFETIME.flag() + ")");
            }
            return a.withIonisation(ionisation);
        }, "photocharging");
        if (Double.isFinite(neutralisationS)) {
            ladder.add(new Neutralisation(1 / neutralisationS));
        }
    }

    @Override
    public double seconds(ProcessParameter p) {
        if (p == NEUTRALISATION_TIME) {
            return neutralisationS;
        }
        throw ProcessSpec.notMine(this, p);
    }

    @Override
    public ChargingProcess withSeconds(ProcessParameter p, double seconds) {
        if (p == NEUTRALISATION_TIME) {
            return new ChargingProcess(charges, ionisation, seconds);
        }
        throw ProcessSpec.notMine(this, p);
    }
}
