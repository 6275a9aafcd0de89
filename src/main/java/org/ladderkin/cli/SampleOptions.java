package org.ladderkin.cli;

import java.nio.file.Path;
import org.ladderkin.archive.SampleEntry;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.SampleCodec;
import org.ladderkin.material.Material;
import org.ladderkin.material.SizingCurve;
import org.ladderkin.sample.Sample;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Option;

/**
 * Which sample a fit belongs to, for the archive: a sample file, or a name with material and size (diameter or
 * first-exciton peak). Shared by {@code fit} and {@code archive add}.
 */
final class SampleOptions {

    @Option(names = "--sample", paramLabel = "SAMPLE.json", description = "the sample (schema ladderkin.sample/1), for the archive")
    Path sampleFile;

    @Option(names = "--sample-name", paramLabel = "NAME", description = "the sample's name, for the archive (with --material and --diameter or --first-peak)")
    String name;

    @Option(names = "--material", paramLabel = "KEY", description = "the sample's material (with --sample-name)")
    String material;

    @Option(names = "--diameter", paramLabel = "LENGTH", description = "the dots' diameter, e.g. 4.2nm (with --sample-name)")
    String diameter;

    @Option(names = "--first-peak", paramLabel = "PHOTON", description = "the first-exciton peak, e.g. 580nm (with --sample-name)")
    String firstPeak;

    /** Whether any of the options was given. */
    boolean given() {
        return sampleFile != null || name != null || material != null || diameter != null || firstPeak != null;
    }

    /** The sample the options describe, or null when none was given. */
    SampleEntry entry() {
        if (!given()) {
            return null;
        }
        if (sampleFile != null) {
            if (name != null || material != null || diameter != null || firstPeak != null) {
                throw new IllegalArgumentException("give either --sample or --sample-name with --material and a size, not both");
            }
            return of(SampleCodec.read(sampleFile));
        }
        if (name == null || material == null || (diameter == null) == (firstPeak == null)) {
            throw new IllegalArgumentException("a sample for the archive needs --sample-name, --material and one of --diameter "
                    + "or --first-peak (or --sample FILE)");
        }
        Material m = MaterialLibrary.fromHome().material(material.trim());
        java.util.Optional<SizingCurve> sizing = m.sizing();
        double sizeM;
        double energyJ;
        if (diameter != null) {
            sizeM = Quantity.parseSi(diameter, Dimension.LENGTH);
            if (!(sizeM > 0)) {
                throw new IllegalArgumentException("--diameter must be > 0, was " + diameter);
            }
            energyJ = sizing.map(s -> s.firstExcitonEnergyJ(sizeM)).orElse(Double.NaN);
        } else {
            energyJ = Photon.parseEnergyJ(firstPeak);
            sizeM = sizing.map(s -> s.diameterM(energyJ)).orElse(Double.NaN);
        }
        return SampleEntry.of(name.trim(), m.key(), sizeM, Double.isNaN(sizeM) ? Double.NaN : m.volumeM3(sizeM), energyJ);
    }

    /** The archive's view of a resolved sample (from a sample file or a plan). */
    static SampleEntry of(Sample s) {
        double size = s.sizeM();
        return new SampleEntry(s.spec().name(), s.material().key(), size, s.material().volumeM3(size), s.firstExcitonEnergyJ(),
                s.spec().sizeDispersion(), "", "", "", "");
    }
}
