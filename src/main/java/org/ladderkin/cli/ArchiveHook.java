package org.ladderkin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import org.ladderkin.archive.ArchiveException;
import org.ladderkin.archive.ArchiveStore;
import org.ladderkin.archive.SampleEntry;
import org.ladderkin.io.PlanCodec;

/**
 * What {@code plan --archive} and {@code fit --archive} do after their own work: add the output folder they wrote.
 * Kept here so the two commands each carry a couple of lines for it.
 */
final class ArchiveHook {

    private ArchiveHook() {
    }

    /** Before the work: an archived run needs an output folder to link to (and a fit, a sample). */
    static void check(String archive, Path outDir, SampleOptions sample, Path planFile) {
        if (archive == null) {
            return;
        }
        if (outDir == null) {
            throw new IllegalArgumentException("--archive keeps the output folder's files: give --out DIR too");
        }
        if (sample != null && !sample.given() && planFile == null) {
            throw new IllegalArgumentException("--archive needs the fit's sample: give --plan, --sample FILE, or --sample-name "
                    + "with --material and --diameter or --first-peak");
        }
    }

    /** A fit's provenance (the sample, the model, each data file's SHA-256), written into {@code folder} with its result. */
    static void writeProvenance(Path folder, List<Path> dataFiles, SampleOptions sample, Path planFile, String model) throws IOException {
        SampleEntry entry = sample.given() ? sample.entry()
                : planFile != null ? SampleOptions.of(PlanCodec.read(planFile).sample()) : null;
        ArchiveInputs.writeProvenance(folder, dataFiles, entry, model);
    }

    /** After a fit wrote {@code outDir}: its rows, when {@code archive} is set and the fit succeeded. */
    static void afterFit(String archive, Path outDir, boolean ok, PrintWriter out, PrintWriter err) {
        if (outDir != null && archive != null && ok) {
            add(archive, outDir, out, err);
        }
    }

    /** After a plan wrote {@code outDir}. */
    static void afterPlan(String archive, Path outDir, PrintWriter out, PrintWriter err) {
        if (archive != null) {
            add(archive, outDir, out, err);
        }
    }

    private static void add(String archive, Path outDir, PrintWriter out, PrintWriter err) {
        ArchiveLocation loc = ArchiveLocation.resolve(archive);
        ArchiveInputs.Addition a = ArchiveInputs.read(outDir, null);
        try (ArchiveStore store = loc.open()) {
            out.println(ArchiveCommand.add(store, a, outDir, err) + " to " + loc.where());
        } catch (ArchiveException e) {
            throw loc.located(e);
        }
        err.flush();
    }
}
