package org.ladderkin.fit.counting;

import java.util.List;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;

/**
 * The emission a count model convolves with the instrument response: photons per unit time after a pulse, in any
 * fixed normalisation (the histogram's amplitude absorbs it).
 */
public interface DecayLaw {

    /**
     * The emission rate at {@code sinceLastPulseS}, each ≥ 0. Under a pulse train ({@code periodS} finite) the times are
     * below the period and the rate includes what earlier pulses left behind (the wrap-around of long lifetimes).
     *
     * @param histogram which histogram (its excitation may matter)
     */
    double[] emission(int histogram, double[] sinceLastPulseS, double periodS, ParameterValues p);

    /** The shared parameters this law reads, with their starts. */
    List<ParameterSpec> parameters();
}
