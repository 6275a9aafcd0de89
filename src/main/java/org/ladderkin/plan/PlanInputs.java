package org.ladderkin.plan;

import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.ladderkin.sample.Sample;

/**
 * Everything a campaign plan file says, resolved to SI.
 *
 * @param title          one line naming the campaign
 * @param lab            who runs it
 * @param sample         the sample, resolved through the material library
 * @param laser          the laser
 * @param instruments    detection instruments, at least one
 * @param goals          what to measure
 * @param multiplicationPhotonEnergiesJ photon energies at which to measure the multiplication yield (J)
 * @param limits         limits to respect
 * @param modelOverrides kinetic-model values the plan sets instead of deriving them from the material
 */
public record PlanInputs(String title, String lab, Sample sample, LaserSetup laser, List<Instrument> instruments,
                         Set<Goal> goals, List<Double> multiplicationPhotonEnergiesJ, Limits limits,
                         ModelAssumptions.Overrides modelOverrides) {

    public PlanInputs {
        Objects.requireNonNull(title, "title");
        instruments = List.copyOf(instruments);
        goals = Set.copyOf(goals);
        multiplicationPhotonEnergiesJ = List.copyOf(multiplicationPhotonEnergiesJ);
        Objects.requireNonNull(modelOverrides, "modelOverrides");
    }
}
