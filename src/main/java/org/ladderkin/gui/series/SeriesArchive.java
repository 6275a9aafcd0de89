package org.ladderkin.gui.series;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.ladderkin.archive.ArchiveStore;
import org.ladderkin.archive.ArchivedFit;
import org.ladderkin.archive.FitQuery;
import org.ladderkin.archive.SampleEntry;
import org.ladderkin.archive.Trend;
import org.ladderkin.archive.TrendAxis;
import org.ladderkin.archive.TrendQuantity;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.material.Material;
import org.ladderkin.material.Shape;

/**
 * What the Sample series view shows, read without Swing: the archive's current fits and a trend over them. The
 * archive is the command line's default ({@code LADDERKIN_ARCHIVE}, else {@code ~/.ladderkin/archive.sqlite}); the system
 * property {@code ladderkin.archive} overrides both.
 */
final class SeriesArchive {

    private SeriesArchive() {
    }

    /** The archive the command line would use without {@code --archive}: a JDBC URL and how to name it. */
    static String[] defaultLocation() {
        // a system property first, so a test (or a launcher) can point the window at an archive of its own
        String env = System.getProperty("ladderkin.archive", System.getenv("LADDERKIN_ARCHIVE"));
        String given = env == null || env.isBlank() ? Path.of(System.getProperty("user.home"), ".ladderkin", "archive.sqlite")
                .toString() : env.trim();
        if (given.startsWith("jdbc:")) {
            int q = given.indexOf('?');
            return new String[] {given, q < 0 ? given : given.substring(0, q)};
        }
        String file = Path.of(given).toAbsolutePath().toString();
        return new String[] {ArchiveStore.sqliteUrl(file), file};
    }

    /** The current fits in the archive at {@code jdbcUrl}. */
    static List<ArchivedFit> fits(String jdbcUrl, String where) {
        try (ArchiveStore store = ArchiveStore.open(jdbcUrl, where)) {
            return store.fits(FitQuery.all());
        }
    }

    /** The trend of {@code y} against {@code x} over {@code fits}, with the library's τ₂ scaling where it has one. */
    static Trend trend(List<ArchivedFit> fits, TrendAxis x, TrendQuantity y) {
        MaterialLibrary library = MaterialLibrary.fromHome();
        return Trend.of(fits, x, y, m -> reference(library, m, x, y));
    }

    private static Optional<Trend.ReferenceLine> reference(MaterialLibrary library, String material, TrendAxis x, TrendQuantity y) {
        if (y != TrendQuantity.TAU_AUGER2 || (x != TrendAxis.VOLUME && x != TrendAxis.DIAMETER)) {
            return Optional.empty();
        }
        Material m;
        try {
            m = library.material(material);
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
        double psPerNm3 = m.augerVolumeConstantSPerM3().value() * 1e12 * 1e-27;
        if (!(psPerNm3 > 0)) {
            return Optional.empty();
        }
        String source = m.augerVolumeConstantSPerM3().source();
        return Optional.of(x == TrendAxis.VOLUME ? new Trend.ReferenceLine(psPerNm3, 1, source)
                : new Trend.ReferenceLine(psPerNm3 * (m.shape() == Shape.SPHERE ? Math.PI / 6 : 1), 3, source));
    }

    /**
     * The next diameter of a series (nm): one step beyond the largest, the step being the mean ratio between
     * successive archived sizes of that material (15 % with a single size), so the series stays evenly spaced in log.
     */
    static double nextDiameterNm(List<SampleEntry> samples, String material) {
        double[] d = samples.stream().filter(s -> s.material().equalsIgnoreCase(material) && s.sizeM() > 0)
                .mapToDouble(s -> s.sizeM() * 1e9).distinct().sorted().toArray();
        if (d.length == 0) {
            return Double.NaN;
        }
        double ratio = d.length == 1 ? 1.15 : Math.pow(d[d.length - 1] / d[0], 1.0 / (d.length - 1));
        return d[d.length - 1] * ratio;
    }
}
