package org.ladderkin.observe;

import java.util.List;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Observables;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.propagate.Propagator;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.material.Material;

/**
 * The signals of one excitation on a delay grid: band-edge bleach, PL rate, charged fraction, the lattice temperature
 * rise of one dot, and the relative ΔA at chosen photon energies. The populations just after the pulse are propagated
 * once onto the grid and every signal reads that grid.
 */
public final class DelayTraces {

    private final LadderKinetics kin;
    private final Populations after;
    private final double[] delaysS;
    private final Propagator.TraceGrid grid;

    /**
     * @param kin     the engine the populations belong to
     * @param after   populations just after the pulse (delay zero)
     * @param delaysS delays after the pulse (s)
     */
    public DelayTraces(LadderKinetics kin, Populations after, double[] delaysS) {
        this.kin = kin;
        this.after = after;
        this.delaysS = delaysS.clone();
        this.grid = kin.propagator().onGrid(this.delaysS);
    }

    /** Band-edge bleach per delay. */
    public double[] bleach() {
        return observe(kin.bleachObservable());
    }

    /** PL rate per dot per delay (1/s). */
    public double[] photoluminescencePerS() {
        return observe(kin.photoluminescenceObservable());
    }

    /** Fraction of dots holding a charge, per delay. */
    public double[] chargedFraction() {
        return observe(Observables.charged(kin.space()));
    }

    /**
     * Lattice temperature rise of one dot since the pulse (K), before heat leaves the dot: prompt cooling deposits
     * ħω − m·E₁S per photon that made m excitons (refused when negative: {@link Heating#heatPerAbsorbedPhotonJ}), and
     * every non-radiative recombination since the pulse deposits E₁S; the recombinations are the drop in the mean
     * exciton number minus the photons emitted (exact, from the generator).
     *
     * @param pulse                the pulse that made {@code after} (its photons, and excitons per photon)
     * @param photonEnergyJ        pump photon energy ħω (J)
     * @param firstExcitonJ        first-exciton energy E₁S (J)
     * @param dotHeatCapacityJPerK heat capacity of one dot (J/K), e.g. {@link #dotHeatCapacityJPerK}
     */
    public double[] dotTemperatureRiseK(PulseExcitation pulse, double photonEnergyJ, double firstExcitonJ,
                                        double dotHeatCapacityJPerK) {
        double prompt;
        if (pulse instanceof PulseExcitation.Multiplication m && m.eta() > 0) {
            // a share η of the photons makes two excitons, the rest one: each share left its own non-negative heat
            prompt = m.meanPhotons() * ((1 - m.eta()) * Heating.heatPerAbsorbedPhotonJ(photonEnergyJ, 1, firstExcitonJ)
                    + m.eta() * Heating.heatPerAbsorbedPhotonJ(photonEnergyJ, 2, firstExcitonJ));
        } else {
            double photons = pulse instanceof PulseExcitation.Multiplication m ? m.meanPhotons() : pulse.meanExcitons();
            prompt = photons * Heating.heatPerAbsorbedPhotonJ(photonEnergyJ, 1, firstExcitonJ);
        }
        double[] excitons = new double[kin.space().size()];
        for (int s = 0; s < excitons.length; s++) {
            excitons[s] = kin.space().excitons(s);
        }
        double n0 = after.expectation(excitons);
        double[] nT = observe(excitons);
        double[] out = new double[delaysS.length];
        for (int j = 0; j < delaysS.length; j++) {
            double emitted = delaysS[j] == 0 ? 0 : Photoluminescence.emittedPerPulse(kin, after, delaysS[j]);
            double nonRadiative = Math.max(0, n0 - nT[j] - emitted);
            out[j] = (prompt + nonRadiative * firstExcitonJ) / dotHeatCapacityJPerK;
        }
        return out;
    }

    /** Heat capacity of one dot of {@code material} with diameter {@code diameterM} (J/K): ρ·c·V. */
    public static double dotHeatCapacityJPerK(Material material, double diameterM) {
        return material.densityKgPerM3().value() * material.specificHeatJPerKgK().value() * material.volumeM3(diameterM);
    }

    /**
     * ΔA relative to the unexcited 1S line, one row per photon energy: a single 1S transition of the ladder's
     * degeneracy, filled by electrons, red-shifted by {@code biexcitonShiftJ} in a dot that holds a cold exciton.
     *
     * @param firstExcitonJ   1S line centre (J)
     * @param lineFwhmJ       1S line width (J)
     * @param biexcitonShiftJ red shift of the line in a dot holding a cold exciton (J)
     * @param energiesJ       photon energies of the rows (J)
     */
    public double[][] relativeSpectrum(double firstExcitonJ, double lineFwhmJ, double biexcitonShiftJ, double[] energiesJ) {
        SpectralModel model = new SpectralModel(List.of(new Transition("1S", firstExcitonJ, lineFwhmJ, 1,
                Transition.Role.BAND_EDGE)), BandEdgeFilling.electronsOnly(kin.model().degeneracy()), 6, biexcitonShiftJ, 0);
        return model.map(kin, after, energiesJ, delaysS);
    }

    private double[] observe(double[] observable) {
        return grid.observe(new double[][] {observable}, after.probabilities())[0];
    }
}
