package org.ladderkin.cli;

import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.Option;

/** The options of {@code fit --counts}: photon-counting histograms fitted by Poisson likelihood. */
final class CountingOptions {

    @Option(names = "--counts",
            description = "DATA are photon-counting histograms (time or channel column, one column of whole counts per "
                    + "fluence), fitted by Poisson likelihood with the ladder's emission convolved with the IRF (--irf FWHM "
                    + "or --irf-file from a scatterer)")
    boolean on;

    @Option(names = "--pl-integrated",
            description = "DATA are integrated PL against photon fluence (two columns, 'fluence (photons/cm2),pl'): fits σ "
                    + "from the saturation and, freed, τ₂ and the biexciton emission yield")
    boolean integrated;

    @Option(names = "--channel-width", paramLabel = "TIME", description = "bin width when the histograms' first column is 'channel'")
    String channelWidth;

    @Option(names = "--pile-up-cycles", paramLabel = "N",
            description = "excitation cycles in the acquisition: applies the classical dead-time (pile-up) correction "
                    + "(Coates 1968) to the model")
    Double pileUpCycles;

    @Option(names = "--ta", paramLabel = "FILE", split = ",",
            description = "transient-absorption tables of the same sample, fitted jointly (σ and lifetimes shared)")
    List<Path> taFiles;

    @Option(names = "--ta-fluences", split = ",", paramLabel = "X", description = "photon fluence of each --ta trace, in column order")
    List<String> taFluences;

    /** Whether a photon-counting or integrated-PL fit was asked for. */
    boolean requested() {
        return on || integrated;
    }
}
