package org.ladderkin.fit.counting;

import java.util.List;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;

/**
 * One data set in a likelihood fit, with its own noise model: residuals whose squares sum to −2 ln L of this data
 * set, up to a constant that does not depend on the parameters. Parts of one fit share the fit's shared parameters
 * and keep their own (amplitudes, backgrounds) in {@link #localParameters()}.
 */
public interface LikelihoodPart {

    /** Name for messages and reports. */
    String label();

    /** Whether the data are counts (the residuals are signed Poisson deviance residuals). */
    boolean counts();

    /** Number of residuals. */
    int points();

    /** This part's own parameters, keys as the model reads them. */
    List<ParameterSpec> localParameters();

    /** Writes the residuals at {@code p} (shared and this part's own values) to {@code out} from {@code offset}. */
    void residuals(ParameterValues p, double[] out, int offset);

    /** The model's prediction of the data at {@code p}, for reports. */
    double[] fitted(ParameterValues p);

    /** The data, for reports. */
    double[] data();
}
