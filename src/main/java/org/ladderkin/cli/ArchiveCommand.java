package org.ladderkin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.ladderkin.archive.ArchiveException;
import org.ladderkin.archive.ArchiveStore;
import org.ladderkin.archive.ArchivedFit;
import org.ladderkin.archive.ArchivedPlan;
import org.ladderkin.archive.ArchivedSample;
import org.ladderkin.archive.DataFileHash;
import org.ladderkin.archive.FitParameter;
import org.ladderkin.archive.FitQuery;
import org.ladderkin.archive.SampleEntry;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Rounded;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ladderkin archive add|list|show|export|supersede}: the sample-series archive from the command line.
 */
@Command(name = "archive", mixinStandardHelpOptions = true,
        header = "Keep every plan and fit of a sample series; list and export them.",
        description = {"The archive keeps samples, plans and fits, linked, and never overwrites a row: a re-fit is a new row "
            + "and an old one can be marked superseded. It is a SQLite file (--archive FILE, else $LADDERKIN_ARCHIVE, else "
            + "~/.ladderkin/archive.sqlite) or a shared PostgreSQL database (--archive jdbc:postgresql://host/db?user=...)."},
        subcommands = {ArchiveCommand.Add.class, ArchiveCommand.ListRows.class, ArchiveCommand.Show.class,
            ArchiveCommand.Export.class, ArchiveCommand.Supersede.class})
final class ArchiveCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.USAGE;
    }

    /** The {@code --archive} option every subcommand takes. */
    static final class Where {
        @Option(names = "--archive", paramLabel = "FILE|JDBC-URL",
                description = "archive: a SQLite file or a jdbc:postgresql: URL (default $LADDERKIN_ARCHIVE, else ~/.ladderkin/archive.sqlite)")
        String archive;

        ArchiveLocation location() {
            return ArchiveLocation.resolve(archive);
        }
    }

    @Command(name = "add", mixinStandardHelpOptions = true, header = "Add plan or fit output folders to the archive.",
            description = {"Adds each folder (a plan's --out or a fit's --out) in one transaction of its own: a folder is "
                + "archived whole or not at all. A fit's data files are checked against the SHA-256 the fit wrote; a file "
                + "changed since is reported and the row kept with that warning."})
    static final class Add implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Mixin
        QuietOption quiet;

        @Mixin
        Where where;

        @Mixin
        SampleOptions sample;

        @Parameters(arity = "1..*", paramLabel = "DIR", description = "plan or fit output folders")
        List<Path> dirs;

        @Override
        public Integer call() {
            ArchiveLocation loc = where.location();
            SampleEntry given = sample.entry();
            // read every folder first: a bad one stops the command before anything is written
            List<ArchiveInputs.Addition> additions = dirs.stream().map(d -> ArchiveInputs.read(d, given)).toList();
            PrintWriter out = quiet.summary();
            PrintWriter err = spec.commandLine().getErr();
            try (ArchiveStore store = loc.open()) {
                for (int i = 0; i < additions.size(); i++) {
                    out.println(add(store, additions.get(i), dirs.get(i), err));
                }
            } catch (ArchiveException e) {
                throw loc.located(e);
            }
            out.flush();
            err.flush();
            return ExitCodes.OK;
        }
    }

    /** Adds one folder's rows; returns the line to print. Warnings go to {@code err}. */
    static String add(ArchiveStore store, ArchiveInputs.Addition a, Path dir, PrintWriter err) {
        if (a instanceof ArchiveInputs.PlanAddition p) {
            long id = store.addPlan(p.sample(), p.plan());
            return "added plan P" + id + " (sample " + p.sample().name() + ") from " + dir;
        }
        ArchiveInputs.FitAddition f = (ArchiveInputs.FitAddition) a;
        long id = store.addFit(f.sample(), f.fit());
        if (!f.fit().warning().isEmpty()) {
            err.println("warning: fit F" + id + " from " + dir + ": " + f.fit().warning());
        }
        return "added fit F" + id + " (sample " + f.sample().name() + ") from " + dir;
    }

    @Command(name = "list", mixinStandardHelpOptions = true, header = "List the archive's samples, plans and fits.",
            description = {"One line per fit and plan, newest last, with the sample, its size and the main parameters. "
                + "Superseded fits are left out unless --all is given."})
    static final class ListRows implements Callable<Integer> {
        @Mixin
        QuietOption quiet;

        @Mixin
        Where where;

        @Option(names = "--material", paramLabel = "KEY", description = "only this material (repeatable)")
        List<String> materials;

        @Option(names = "--sample", paramLabel = "NAME", description = "only this sample")
        String sampleName;

        @Option(names = "--all", description = "also superseded fits")
        boolean all;

        @Override
        public Integer call() {
            ArchiveLocation loc = where.location();
            FitQuery q = new FitQuery(materials, sampleName, all);
            PrintWriter out = quiet.data();
            try (ArchiveStore store = loc.open()) {
                List<ArchivedSample> samples = store.samples(q);
                out.println(String.format(Locale.ROOT, "%d samples in %s", samples.size(), loc.where()));
                for (ArchivedSample s : samples) {
                    out.println(String.format(Locale.ROOT, "  %-28s %-8s d = %s nm, E1 = %s eV, %d plans, %d fits", s.sample().name(),
                            s.sample().material(), num(s.sample().sizeM() * 1e9), num(s.sample().firstExcitonJ()
                                    / PhysicalConstants.ELECTRONVOLT_J), s.plans(), s.fits()));
                }
                for (ArchivedPlan p : store.plans(q)) {
                    out.println(String.format(Locale.ROOT, "P%-5d %s  %-28s %s", p.id(), p.addedAt(), p.sample().name(), p.plan().title()));
                }
                for (ArchivedFit f : store.fits(q)) {
                    out.println(String.format(Locale.ROOT, "F%-5d %s  %-28s %s%s%s", f.id(), f.addedAt(), f.sample().name(),
                            f.parameter("tauAuger2Ps").map(p -> "τ₂ = " + Rounded.pm(p.value(), p.bestStdError()) + " ps")
                                    .orElse(f.fit().status()), f.superseded() ? "  (superseded)" : "",
                            f.fit().warning().isEmpty() ? "" : "  (warning)"));
                }
            } catch (ArchiveException e) {
                throw loc.located(e);
            }
            out.flush();
            return ExitCodes.OK;
        }
    }

    @Command(name = "show", mixinStandardHelpOptions = true, header = "Show one archived fit or plan.",
            description = {"ID is a fit (F12, or a bare number) or a plan (P3), as 'archive list' prints it. "
                + "Prints the sample, every parameter with its errors and whether it was held, the data files with their "
                + "SHA-256, and the stored document with --format json."})
    static final class Show implements Callable<Integer> {
        @Mixin
        QuietOption quiet;

        @Mixin
        Where where;

        @Parameters(paramLabel = "ID", description = "F<n> (fit, the default) or P<n> (plan)")
        String id;

        @Option(names = "--format", paramLabel = "text|json", defaultValue = "text", description = "output (default ${DEFAULT-VALUE})")
        String format;

        @Override
        public Integer call() {
            if (!format.equals("text") && !format.equals("json")) {
                throw new IllegalArgumentException("--format must be text or json, was " + format);
            }
            boolean plan = id.toUpperCase(Locale.ROOT).startsWith("P");
            String digits = id.replaceFirst("^[FfPp]", "");
            if (!digits.matches("[0-9]{1,18}")) {
                throw new IllegalArgumentException("ID must be F<number> or P<number> as 'archive list' prints it, was " + id);
            }
            long n = Long.parseLong(digits);
            ArchiveLocation loc = where.location();
            PrintWriter out = quiet.data();
            try (ArchiveStore store = loc.open()) {
                if (plan) {
                    ArchivedPlan p = store.plan(n);
                    out.println(format.equals("json") ? p.plan().resolvedJson().strip() : "P" + p.id() + "  " + p.plan().title()
                            + "\n  sample " + p.sample().name() + " (" + p.sample().material() + ")\n  added " + p.addedAt()
                            + " from " + p.plan().sourceDir());
                } else {
                    ArchivedFit f = store.fit(n);
                    out.println(format.equals("json") ? f.fit().resultJson().strip() : describe(f));
                }
            } catch (ArchiveException e) {
                throw loc.located(e);
            }
            out.flush();
            return ExitCodes.OK;
        }
    }

    static String describe(ArchivedFit f) {
        StringBuilder b = new StringBuilder();
        b.append("F").append(f.id()).append("  ").append(f.fit().status()).append(f.superseded() ? " (superseded)" : "").append('\n');
        SampleEntry s = f.sample();
        b.append("  sample ").append(s.name()).append(" (").append(s.material()).append(", d = ").append(num(s.sizeM() * 1e9))
                .append(" nm, V = ").append(num(s.volumeM3() * 1e27)).append(" nm³)\n");
        b.append("  added ").append(f.addedAt()).append(" from ").append(f.fit().sourceDir()).append(", ladderkin ")
                .append(f.fit().toolVersion()).append('\n');
        b.append("  model ").append(f.fit().model()).append(", χ² ").append(num(f.fit().chiSquare())).append('\n');
        for (FitParameter p : f.fit().parameters()) {
            b.append(String.format(Locale.ROOT, "  %-18s %-12s %s%n", p.key(), p.fixed() ? num(p.value()) : Rounded.value(p.value(), p.stdError()),
                    p.fixed() ? "(fixed)" : "± " + Rounded.error(p.stdError())
                            + (Double.isNaN(p.totalStdError()) ? "" : " (stat), ± " + Rounded.error(p.totalStdError()) + " total")));
        }
        for (DataFileHash d : f.fit().dataFiles()) {
            b.append("  data ").append(d.path()).append("  sha256 ").append(d.sha256().isEmpty() ? "unknown" : d.sha256()).append('\n');
        }
        if (!f.fit().warning().isEmpty()) {
            b.append("  warning: ").append(f.fit().warning()).append('\n');
        }
        return b.toString().stripTrailing();
    }

    @Command(name = "export", mixinStandardHelpOptions = true, header = "Export the archive's fits as CSV or JSON.",
            description = {"One row (CSV) or object (JSON) per fit: sample, material, size, volume, first-exciton energy, "
                + "every parameter with value, standard error, total error and whether it was held, the fit's status and "
                + "warning. Written to standard output, or to --out FILE."})
    static final class Export implements Callable<Integer> {
        @Mixin
        QuietOption quiet;

        @Mixin
        Where where;

        @Option(names = "--format", paramLabel = "csv|json", defaultValue = "csv", description = "format (default ${DEFAULT-VALUE})")
        String format;

        @Option(names = "--material", paramLabel = "KEY", description = "only this material (repeatable)")
        List<String> materials;

        @Option(names = "--all", description = "also superseded fits")
        boolean all;

        @Option(names = "--out", paramLabel = "FILE", description = "write to this file instead of standard output")
        Path outFile;

        @Override
        public Integer call() throws Exception {
            if (!format.equals("csv") && !format.equals("json")) {
                throw new IllegalArgumentException("--format must be csv or json, was " + format);
            }
            ArchiveLocation loc = where.location();
            List<ArchivedFit> fits;
            try (ArchiveStore store = loc.open()) {
                fits = store.fits(new FitQuery(materials, null, all));
            } catch (ArchiveException e) {
                throw loc.located(e);
            }
            String text = format.equals("csv") ? ArchiveExport.csv(fits) : ResolvedJson.toText(ArchiveExport.json(fits));
            if (outFile != null) {
                org.ladderkin.io.AtomicFiles.writeString(outFile, text);
            } else {
                quiet.data().print(text);
                quiet.data().flush();
            }
            return ExitCodes.OK;
        }
    }

    @Command(name = "supersede", mixinStandardHelpOptions = true, header = "Mark an archived fit superseded.",
            description = {"The row stays; listings, exports and trends leave it out unless asked for (--all)."})
    static final class Supersede implements Callable<Integer> {
        @Mixin
        QuietOption quiet;

        @Mixin
        Where where;

        @Parameters(paramLabel = "ID", description = "F<n>: the fit to mark")
        String id;

        @Override
        public Integer call() {
            String digits = id.replaceFirst("^[Ff]", "");
            if (!digits.matches("[0-9]{1,18}")) {
                throw new IllegalArgumentException("ID must be F<number> as 'archive list' prints it, was " + id);
            }
            ArchiveLocation loc = where.location();
            try (ArchiveStore store = loc.open()) {
                store.markSuperseded(Long.parseLong(digits));
            } catch (ArchiveException e) {
                throw loc.located(e);
            }
            quiet.summary().println("fit F" + digits + " marked superseded");
            quiet.summary().flush();
            return ExitCodes.OK;
        }
    }

    static String num(double v) {
        return Double.isNaN(v) ? "?" : String.format(Locale.ROOT, "%.4g", v);
    }
}
