package org.ladderkin.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Observables;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.observe.BandEdgeFilling;
import org.ladderkin.observe.Photoluminescence;
import org.ladderkin.observe.SpectralModel;
import org.ladderkin.observe.Transition;
import org.ladderkin.units.PhysicalConstants;

/**
 * The columns {@code simulate --observable} can print for one ⟨N⟩: band-edge bleach, PL rate, charged fraction, the
 * lattice temperature rise of one dot, and ΔA at chosen photon energies. Each is a named column of values per delay.
 */
final class SimulatedObservables {

    /** Observable names as the command line takes them. */
    static final List<String> NAMES = List.of("bleach", "pl", "spectrum", "charged", "temperature");

    /** One output column. */
    record Column(String name, double[] values) {
    }

    /**
     * Extra inputs some observables need.
     *
     * @param photonEnergyJ       pump photon energy (J), NaN if not given (needed by temperature)
     * @param firstExcitonJ       first-exciton energy (J), NaN if not given (needed by temperature and spectrum)
     * @param dotHeatCapacityJPerK heat capacity of one dot (J/K), NaN if not given (needed by temperature)
     * @param spectrumEnergiesJ   photon energies of the spectrum columns (J)
     * @param lineFwhmJ           width of the 1S line (J)
     * @param biexcitonShiftJ     red shift of the line in a dot holding a cold exciton (J)
     */
    record Inputs(double photonEnergyJ, double firstExcitonJ, double dotHeatCapacityJPerK, double[] spectrumEnergiesJ,
                  double lineFwhmJ, double biexcitonShiftJ) {
    }

    private SimulatedObservables() {
    }

    static List<Column> columns(List<String> observables, String nLabel, LadderKinetics kin, PulseExcitation pulse,
                                Populations before, Populations after, double[] delaysS, Inputs in) {
        List<Column> out = new ArrayList<>();
        var grid = kin.propagator().onGrid(delaysS);
        for (String o : observables) {
            switch (o) {
                case "bleach" -> out.add(new Column("bleach@N=" + nLabel,
                        grid.observe(new double[][] {kin.bleachObservable()}, after.probabilities())[0]));
                case "pl" -> out.add(new Column("pl@N=" + nLabel,
                        grid.observe(new double[][] {kin.photoluminescenceObservable()}, after.probabilities())[0]));
                case "charged" -> out.add(new Column("charged@N=" + nLabel,
                        grid.observe(new double[][] {Observables.charged(kin.space())}, after.probabilities())[0]));
                case "temperature" -> out.add(new Column("dot_temperature_rise_k@N=" + nLabel,
                        temperature(kin, pulse, before, after, delaysS, in)));
                case "spectrum" -> {
                    require(in.firstExcitonJ(), "--first-exciton (or --material with --diameter)", "spectrum");
                    SpectralModel model = new SpectralModel(List.of(new Transition("1S", in.firstExcitonJ(), in.lineFwhmJ(), 1,
                            Transition.Role.BAND_EDGE)), BandEdgeFilling.electronsOnly(kin.model().degeneracy()), 6,
                            in.biexcitonShiftJ(), 0);
                    double[][] map = model.map(kin, after, in.spectrumEnergiesJ(), delaysS);
                    for (int e = 0; e < map.length; e++) {
                        out.add(new Column(String.format(Locale.ROOT, "dA_rel@N=%s,E=%.4feV", nLabel,
                                in.spectrumEnergiesJ()[e] / PhysicalConstants.ELECTRONVOLT_J), map[e]));
                    }
                }
                default -> throw new IllegalArgumentException("unknown --observable '" + o + "' (known: "
                        + String.join(", ", NAMES) + ")");
            }
        }
        return out;
    }

    /**
     * Lattice temperature rise of one dot since the pulse, before heat leaves the dot: prompt cooling deposits
     * (photons·ħω − added excitons·E₁S), and every non-radiative recombination since the pulse deposits E₁S; the
     * recombinations are the drop in the mean exciton number minus the photons emitted (exact, from the generator).
     */
    private static double[] temperature(LadderKinetics kin, PulseExcitation pulse, Populations before, Populations after,
                                        double[] delaysS, Inputs in) {
        require(in.photonEnergyJ(), "--pump", "temperature");
        require(in.firstExcitonJ(), "--first-exciton (or --material with --diameter)", "temperature");
        require(in.dotHeatCapacityJPerK(), "--material with --diameter", "temperature");
        double photons = pulse instanceof PulseExcitation.Multiplication m ? m.meanPhotons() : pulse.meanExcitons();
        double prompt = photons * in.photonEnergyJ() - pulse.meanExcitons() * in.firstExcitonJ();
        double[] excitons = new double[kin.space().size()];
        for (int s = 0; s < excitons.length; s++) {
            excitons[s] = kin.space().excitons(s);
        }
        double n0 = after.expectation(excitons);
        double[] nT = kin.propagator().onGrid(delaysS).observe(new double[][] {excitons}, after.probabilities())[0];
        double[] out = new double[delaysS.length];
        for (int j = 0; j < delaysS.length; j++) {
            double emitted = delaysS[j] == 0 ? 0 : Photoluminescence.emittedPerPulse(kin, after, delaysS[j]);
            double nonRadiative = Math.max(0, n0 - nT[j] - emitted);
            out[j] = (prompt + nonRadiative * in.firstExcitonJ()) / in.dotHeatCapacityJPerK();
        }
        return out;
    }

    private static void require(double v, String flag, String observable) {
        if (Double.isNaN(v)) {
            throw new IllegalArgumentException("--observable " + observable + " needs " + flag);
        }
    }
}
