package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.ladderkin.excite.BeamProfile;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.Pulse;
import org.ladderkin.sample.CrossSection;
import org.ladderkin.sample.Sample;
import org.ladderkin.units.PhysicalConstants;

/**
 * Ranks the laser's pump wavelengths for the goals. For lifetimes and cross-sections: stay below the energy where one
 * photon can make two excitons (ħω ≥ 2·E₁S by energy conservation), keep away from the band edge (absorption
 * saturates and stops being Poissonian), prefer a moderate absorbance (a thick sample puts a fluence gradient through
 * the depth), little excess energy (heat), and enough cross-section to reach ⟨N⟩ ≥ 3. For carrier multiplication:
 * the listed photon energies must be available above the threshold, and a reference below it.
 */
public final class WavelengthRanking {

    /** Photon energy above the first exciton below which pumping counts as band-edge (J): 0.1 eV, common practice. */
    static final double BAND_EDGE_MARGIN_J = 0.1 * PhysicalConstants.ELECTRONVOLT_J;
    /** ⟨N⟩ the series must reach for Auger and cross-section goals. */
    static final double NEEDED_N = 3;

    private WavelengthRanking() {
    }

    /** Every wavelength, best first. */
    public static List<WavelengthOption> rank(Sample sample, List<Double> wavelengthsM, double maxEnergyJ,
                                              double repetitionRateHz, BeamProfile pump, BeamProfile probe, Set<Goal> goals) {
        boolean cm = goals.contains(Goal.MULTIPLICATION_YIELD);
        double e1 = sample.firstExcitonEnergyJ();
        List<WavelengthOption> out = new ArrayList<>();
        for (double w : wavelengthsM) {
            Excitation ex = Excitation.of(sample, new Pulse(maxEnergyJ, w, repetitionRateHz), pump, probe, true);
            CrossSection sigma = ex.crossSection();
            double photon = ex.pulse().photonEnergyJ();
            double od = ex.absorbanceAtPump();
            double nMax = ex.nAvgProbeWeighted();
            double excess = Double.isNaN(e1) ? Double.NaN : photon - e1;
            double ratio = Double.isNaN(e1) ? Double.NaN : photon / e1;
            List<String> reasons = new ArrayList<>();
            double score = 0;
            if (!Double.isNaN(ratio)) {
                if (ratio >= 2) {
                    if (cm) {
                        score += 2;
                        reasons.add(String.format(Locale.ROOT, "ħω = %.2f·E₁S ≥ 2·E₁S, where multiplication is "
                                + "energetically allowed: wanted for the multiplication goal", ratio));
                    } else {
                        score -= 3;
                        reasons.add(String.format(Locale.ROOT, "ħω = %.2f·E₁S ≥ 2·E₁S: carrier multiplication may add "
                                + "excitons and confound the Auger and cross-section analysis", ratio));
                    }
                } else {
                    reasons.add(String.format(Locale.ROOT, "ħω = %.2f·E₁S, below 2·E₁S: no multiplication", ratio));
                    if (cm) {
                        score += 0.5;
                        reasons.add("serves as the no-multiplication reference");
                    }
                }
                if (excess < BAND_EDGE_MARGIN_J) {
                    score -= 2;
                    reasons.add("within 0.1 eV of the band edge: absorption saturates as the level fills (not Poissonian)");
                }
                score -= 0.5 * Math.max(0, excess / e1);
                reasons.add(String.format(Locale.ROOT, "excess energy %.2f eV per photon becomes heat",
                        excess / PhysicalConstants.ELECTRONVOLT_J));
            }
            if (od > 2) {
                score -= 2;
                reasons.add(String.format(Locale.ROOT, "absorbance %.2f OD: strong fluence gradient through the depth", od));
            } else if (od > 1) {
                score -= 1;
                reasons.add(String.format(Locale.ROOT, "absorbance %.2f OD: noticeable fluence gradient through the depth", od));
            } else {
                reasons.add(String.format(Locale.ROOT, "absorbance %.2f OD", od));
            }
            if (nMax < NEEDED_N) {
                score -= 2;
                reasons.add(String.format(Locale.ROOT, "reaches only ⟨N⟩ = %.2g at the highest pulse energy", nMax));
            } else {
                score += 0.2 * Math.log10(nMax / NEEDED_N);
                reasons.add(String.format(Locale.ROOT, "reaches ⟨N⟩ = %.3g at the highest pulse energy", nMax));
            }
            if (sigma.approximate()) {
                score -= 0.5;
                reasons.add("cross-section approximate: " + sigma.basis());
            }
            out.add(new WavelengthOption(w, photon, sigma.crossSectionM2(), sigma.basis(), od, excess, ratio, nMax, score, reasons));
        }
        out.sort(Comparator.comparingDouble(WavelengthOption::score).reversed());
        return List.copyOf(out);
    }
}
