package org.ladderkin.io;

import java.util.List;
import org.ladderkin.io.json.Node;
import org.ladderkin.material.Material;
import org.ladderkin.observe.Heating;
import org.ladderkin.plan.ModelAssumptions;
import org.ladderkin.sample.Sample;
import org.ladderkin.units.Photon;

/**
 * Checks that tie a plan's fields to its sample's material, made while the plan is read so each problem is reported
 * at the field that can fix it: the planner itself would find them later, with no file or line to point at.
 */
final class PlanSampleChecks {

    private PlanSampleChecks() {
    }

    /** {@code root} is the plan, {@code pumpWavelengthsM} its pumps in the order of 'laser.pumpWavelengths'. */
    static void check(Node root, Sample sample, List<Double> pumpWavelengthsM, ModelAssumptions.Overrides overrides) {
        Material m = sample.material();
        Node material = root.field("sample").field("material");
        if (Double.isNaN(overrides.tauSingleExcitonS()) && !m.singleExcitonLifetimeS().known()) {
            throw missing(root, material, m, "singleExcitonLifetime", "a single-exciton lifetime");
        }
        if (Double.isNaN(overrides.tauBiexcitonS()) && !m.augerVolumeConstantSPerM3().known()) {
            throw missing(root, material, m, "biexcitonLifetime", "an Auger volume constant ('augerVolumeConstantPsPerNm3')");
        }
        List<Node> pumps = root.field("laser").field("pumpWavelengths").items(1);
        double gapJ = sample.firstExcitonEnergyJ();
        for (int i = 0; i < pumpWavelengthsM.size() && i < pumps.size(); i++) {
            try {
                if (!Double.isNaN(gapJ)) {
                    // energy conservation first: a sub-gap pump deposits no heat of its own and makes no exciton
                    Heating.heatPerAbsorbedPhotonJ(Photon.energyJ(pumpWavelengthsM.get(i)), 1, gapJ);
                }
                sample.crossSectionAt(pumpWavelengthsM.get(i));
            } catch (IllegalArgumentException e) { // SampleException included
                throw pumps.get(i).error(InputProblem.OUT_OF_RANGE, e.getMessage());
            }
        }
    }

    /** Located at the plan's model section when it has one (where the value belongs), else at the sample's material. */
    private static InputException missing(Node root, Node material, Material m, String planKey, String what) {
        Node at = root.optional("model").orElse(material);
        return at.error(InputProblem.MISSING_FIELD, "the material " + m.key() + " (models/materials/" + m.key() + ".json) gives "
                + "no " + what + ": give \"" + planKey + "\" in the plan's \"model\" section");
    }
}
