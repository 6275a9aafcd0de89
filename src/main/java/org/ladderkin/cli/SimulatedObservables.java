package org.ladderkin.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Observables;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.observe.DelayTraces;
import org.ladderkin.units.PhysicalConstants;

/**
 * The columns {@code simulate --observable} can print for one ⟨N⟩: band-edge bleach, PL rate, charged fraction, the
 * lattice temperature rise of one dot, and ΔA at chosen photon energies, each a named column of values per delay. The
 * signals are computed by {@link DelayTraces}; this class names the columns and says which flag a signal lacks.
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

    /**
     * The columns for every ⟨N⟩ at once ([⟨N⟩][column]). Bleach, PL and charged fraction of all ⟨N⟩ come from one
     * product of the shared delay grid with all starting distributions; the other signals are computed per ⟨N⟩.
     */
    static List<List<Column>> columnsForAll(List<String> observables, List<String> nLabels, LadderKinetics kin,
                                            List<PulseExcitation> pulses, List<Populations> afters, double[] delaysS,
                                            Inputs in) {
        List<double[]> linear = new ArrayList<>();
        List<String> linearNames = new ArrayList<>();
        for (String o : observables) {
            switch (o) {
                case "bleach" -> linear.add(kin.bleachObservable());
                case "pl" -> linear.add(kin.photoluminescenceObservable());
                case "charged" -> linear.add(Observables.charged(kin.space()));
                default -> {
                    continue;
                }
            }
            linearNames.add(o);
        }
        double[][] starts = new double[afters.size()][];
        for (int i = 0; i < starts.length; i++) {
            starts[i] = afters.get(i).probabilities();
        }
        double[][][] traces = linear.isEmpty() ? null
                : kin.propagator().onGrid(delaysS).observeAll(linear.toArray(double[][]::new), starts);
        List<List<Column>> out = new ArrayList<>();
        for (int i = 0; i < starts.length; i++) {
            List<Column> perN = new ArrayList<>();
            for (String o : observables) {
                int li = linearNames.indexOf(o);
                if (li >= 0) {
                    perN.add(new Column(LINEAR_PREFIX.get(o) + nLabels.get(i), traces[i][li]));
                } else {
                    perN.addAll(columns(List.of(o), nLabels.get(i), kin, pulses.get(i), afters.get(i), delaysS, in));
                }
            }
            out.add(perN);
        }
        return out;
    }

    private static final java.util.Map<String, String> LINEAR_PREFIX = java.util.Map.of(
            "bleach", "bleach@N=", "pl", "pl@N=", "charged", "charged@N=");

    static List<Column> columns(List<String> observables, String nLabel, LadderKinetics kin, PulseExcitation pulse,
                                Populations after, double[] delaysS, Inputs in) {
        List<Column> out = new ArrayList<>();
        DelayTraces traces = new DelayTraces(kin, after, delaysS);
        for (String o : observables) {
            switch (o) {
                case "bleach" -> out.add(new Column("bleach@N=" + nLabel, traces.bleach()));
                case "pl" -> out.add(new Column("pl@N=" + nLabel, traces.photoluminescencePerS()));
                case "charged" -> out.add(new Column("charged@N=" + nLabel, traces.chargedFraction()));
                case "temperature" -> {
                    require(in.photonEnergyJ(), "--pump", "temperature");
                    require(in.firstExcitonJ(), "--first-exciton (or --material with --diameter)", "temperature");
                    require(in.dotHeatCapacityJPerK(), "--material with --diameter", "temperature");
                    try {
                        out.add(new Column("dot_temperature_rise_k@N=" + nLabel, traces.dotTemperatureRiseK(pulse,
                                in.photonEnergyJ(), in.firstExcitonJ(), in.dotHeatCapacityJPerK())));
                    } catch (IllegalArgumentException e) {
                        throw new IllegalArgumentException("--pump: " + e.getMessage(), e);
                    }
                }
                case "spectrum" -> {
                    require(in.firstExcitonJ(), "--first-exciton (or --material with --diameter)", "spectrum");
                    double[][] map = traces.relativeSpectrum(in.firstExcitonJ(), in.lineFwhmJ(), in.biexcitonShiftJ(),
                            in.spectrumEnergiesJ());
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

    private static void require(double v, String flag, String observable) {
        if (Double.isNaN(v)) {
            throw new IllegalArgumentException("--observable " + observable + " needs " + flag);
        }
    }
}
