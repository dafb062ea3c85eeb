package org.beamfolio.cli;

import org.beamfolio.checks.CheckedMember;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Instability;
import org.beamfolio.analysis.UnstableBeamException;
import org.beamfolio.checks.Checks;
import org.beamfolio.job.Diagnostic;
import org.beamfolio.job.JobReader;
import org.beamfolio.job.JobReading;
import org.beamfolio.job.RevisionInputs;
import org.beamfolio.report.PackageRenderer;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.report.PreviousRevision;
import org.beamfolio.report.pdf.PdfBytes;
import org.beamfolio.results.ResultsWriter;

/**
 * One job from file to package: read and validate, analyse, check, then write the results file
 * and the PDF. Both are rendered in memory first and moved into place only when both are
 * complete, so bad input or a failure never leaves half a package or replaces a good one.
 */
final class Pipeline {
    /** Null for a pipeline that only checks: it never sets up the report stack. */
    private final PackageRenderer renderer;
    private final boolean archival;

    /** A renderer whose setup began before the build's first pipeline was made, for that pipeline. */
    private static final java.util.concurrent.atomic.AtomicReference<PackageRenderer> EARLY =
            new java.util.concurrent.atomic.AtomicReference<>();

    /**
     * Starts setting up one renderer now, on its own thread, for the first building pipeline
     * made: a one-job build then overlaps that setup with starting its workers as well as with
     * reading and solving the job.
     */
    static void startReportSetUpEarly() {
        EARLY.compareAndSet(null, new PackageRenderer());
    }

    private static PackageRenderer takeEarlyOrNew() {
        PackageRenderer early = EARLY.getAndSet(null);
        return early != null ? early : new PackageRenderer();
    }

    private Pipeline(PackageRenderer renderer, boolean archival) {
        this.renderer = renderer;
        this.archival = archival;
    }

    /** A pipeline that reads, solves and checks jobs and writes nothing; it never sets up the report stack. */
    static Pipeline checking() {
        return new Pipeline(null, true);
    }

    /**
     * A pipeline that builds packages; its report stack is set up in the background from now on.
     *
     * @param archival PDF/A-3b packages (the default) or plain PDF
     */
    static Pipeline building(boolean archival) {
        return new Pipeline(takeEarlyOrNew(), archival);
    }

    /** What building one job gave: its files, sheets, governing check ratio (NaN without checks) and whether all pass. */
    record Outcome(int status, List<String> messages, Path pdf, Path results, int pages, double governingRatio, boolean pass) {
        Outcome(int status, List<String> messages) {
            this(status, messages, null, null, 0, Double.NaN, false);
        }
    }

    /** Pages of a PDF written by the renderer (its page objects are not compressed). */
    static int pages(byte[] pdf) {
        return PdfBytes.pages(pdf);
    }

    /**
     * The job read and solved, or the messages that say why it cannot be. A single-beam job has
     * its result and checks; a job with members has each member's, in the order written, and
     * {@code checks} holds them all.
     */
    record Solved(AnalysisResult result, List<CheckOutcome> checks, List<String> messages, int status,
                  List<CheckedMember> members) {
        Solved(AnalysisResult result, List<CheckOutcome> checks, List<String> messages, int status) {
            this(result, checks, messages, status, List.of());
        }

        /** {@link Main#CHECKS_FAIL} for a solved job with a check that does not meet its limit, else the status. */
        int statusWithChecks() {
            return status == Main.OK && !checks.stream().allMatch(CheckOutcome::pass) ? Main.CHECKS_FAIL : status;
        }

        boolean hasMembers() {
            return !members.isEmpty();
        }

        /** The job's name (its file name without .yaml). */
        String name() {
            return (hasMembers() ? members.get(0).result() : result).job().name();
        }

        /** The one-screen summary: the job's, or each member's under its id. */
        String summary() {
            if (!hasMembers()) {
                return Summary.of(result, checks);
            }
            StringBuilder out = new StringBuilder();
            for (CheckedMember m : members) {
                out.append("member ").append(m.id()).append('\n').append(Summary.of(m.result(), m.checks()));
            }
            return out.toString();
        }
    }

    Solved solve(Path file) {
        JobReading reading = JobReader.read(file);
        if (!reading.ok()) {
            return new Solved(null, List.of(), List.of(reading.report()), Main.BAD_INPUT);
        }
        if (reading.hasMembers()) {
            return MemberSolver.solve(reading);
        }
        try {
            AnalysisResult result = Analysis.run(org.beamfolio.selection.Selection.resolve(reading.job()));
            return new Solved(result, Checks.run(result), List.of(), Main.OK);
        } catch (UnstableBeamException e) {
            Instability i = e.instability();
            return badInput(reading, new Diagnostic(reading.file(), i.where(), i.keyPath(), i.message()));
        } catch (org.beamfolio.checks.timber.TimberInputException e) {
            return badInput(reading, new Diagnostic(reading.file(), e.where(), e.keyPath(), e.getMessage()));
        }
    }

    static Solved badInput(JobReading reading, Diagnostic d) {
        return new Solved(null, List.of(), List.of(d.render(reading.source()) + "\n"), Main.BAD_INPUT);
    }

    /** With {@code previous}, the package compares this job with that earlier revision of it. */
    Outcome build(Path file, Path outDir, boolean csv, Path previous) {
        return write(file, solve(file), outDir, csv, previous);
    }

    /** Writes the package of a job solved already (or returns why it cannot be written). */
    Outcome write(Path file, Solved solved, Path outDir, boolean csv, Path previous) {
        if (renderer == null) {
            throw new IllegalStateException("a checking pipeline writes no package");
        }
        if (solved.status() != Main.OK) {
            return new Outcome(solved.status(), solved.messages());
        }
        if (solved.hasMembers()) {
            if (previous != null) {
                return new Outcome(Main.BAD_INPUT, List.of(file + ": --previous compares single-beam jobs; a job with members"
                        + " keeps its revisions in project.history\n"));
            }
            return writeMembers(file, solved, solved.name(), solved.members().get(0).result().job().sha256(), outDir, csv);
        }
        Solved before = null;
        if (previous != null) {
            before = solve(previous);
            if (before.status() == Main.OK && before.hasMembers()) {
                return new Outcome(Main.BAD_INPUT, List.of(previous + ": the previous revision (--previous) is a job with members;"
                        + " it compares only with a single-beam job; nothing was written\n"));
            }
            if (before.status() != Main.OK) {
                List<String> messages = new ArrayList<>(before.messages());
                messages.add(previous + ": the previous revision (--previous) must itself be a valid job; nothing was written\n");
                return new Outcome(before.status(), messages);
            }
        }
        Solved earlier = before;
        String name = solved.name();
        return writeAll(file, outDir, name, solved.checks(), failing(solved.checks(), ""), () -> {
            PreviousRevision previousRevision = earlier == null ? null : new PreviousRevision(earlier.result(), earlier.checks(),
                    RevisionInputs.between(earlier.result().job().sourceText(), solved.result().job().sourceText()));
            Map<String, byte[]> csvs = new LinkedHashMap<>();
            if (csv) {
                csvs.put(name + ".csv", org.beamfolio.results.CsvExport.write(solved.result()).getBytes(StandardCharsets.UTF_8));
            }
            return new PackageFiles(ResultsWriter.write(solved.result(), solved.checks()).getBytes(StandardCharsets.UTF_8),
                    renderer.render(solved.result(), solved.checks(), previousRevision, archival), csvs);
        });
    }

    /**
     * Gathers single-beam jobs into one package named {@code name}, each job a member under its
     * own name; nothing is written unless every job reads and solves.
     */
    Outcome combine(List<Path> files, String name, Path outDir, boolean csv) {
        List<String> messages = new ArrayList<>();
        List<CheckedMember> members = new ArrayList<>();
        List<CheckOutcome> checks = new ArrayList<>();
        java.util.Set<String> names = new java.util.HashSet<>();
        for (Path file : files) {
            Solved solved = solve(file);
            if (solved.status() != Main.OK) {
                messages.addAll(solved.messages());
            } else if (solved.hasMembers()) {
                messages.add(file + ": a job with members is a package of its own; --combine gathers single-beam jobs\n");
            } else if (!names.add(solved.name())) {
                messages.add(file + ": another job given is also named " + solved.name() + "; the members of one package need"
                        + " different names\n");
            } else {
                members.add(new CheckedMember(solved.name(), solved.result(), solved.checks()));
                checks.addAll(solved.checks());
            }
        }
        if (!messages.isEmpty()) {
            messages.add(name + ": nothing was written (--combine writes the package only when every job reads and solves)\n");
            return new Outcome(Main.BAD_INPUT, messages);
        }
        return writeMembers(Path.of(name), new Solved(null, checks, List.of(), Main.OK, members), name, null, outDir, csv);
    }

    /**
     * Writes the one package and results file of a job with members, or of jobs gathered into one.
     *
     * @param sha256 the job file's digest, or null for jobs gathered from several files
     */
    private Outcome writeMembers(Path file, Solved solved, String name, String sha256, Path outDir, boolean csv) {
        List<String> failing = new ArrayList<>();
        solved.members().forEach(m -> failing.addAll(failing(m.checks(), m.id() + "/")));
        return writeAll(file, outDir, name, solved.checks(), failing, () -> {
            Map<String, byte[]> csvs = new LinkedHashMap<>();
            if (csv) {
                for (CheckedMember m : solved.members()) {
                    csvs.put(name + "." + m.id() + ".csv", org.beamfolio.results.CsvExport.write(m.result()).getBytes(StandardCharsets.UTF_8));
                }
            }
            return new PackageFiles(ResultsWriter.writeMembers(sha256, solved.members()).getBytes(StandardCharsets.UTF_8),
                    renderer.renderMembers(solved.members(), archival), csvs);
        });
    }

    /** A package's files, made in memory before any is written: results, PDF, and CSV files by name. */
    private record PackageFiles(byte[] results, byte[] pdf, Map<String, byte[]> csvs) {}

    /** Something that makes a package's files in memory. */
    private interface PackageMaker {
        PackageFiles make() throws IOException;
    }

    /**
     * Makes a package's files and moves them into place together as {@code name}.pdf,
     * {@code name}.results.json and its CSV files; on a failure nothing is written.
     */
    private Outcome writeAll(Path file, Path outDir, String name, List<CheckOutcome> checks, List<String> failing,
                             PackageMaker maker) {
        Path pdf = outDir.resolve(name + ".pdf");
        Path results = outDir.resolve(name + ".results.json");
        PackageFiles made;
        try {
            made = maker.make();
            Files.createDirectories(outDir);
            List<Path> targets = new ArrayList<>(List.of(results, pdf));
            List<byte[]> contents = new ArrayList<>(List.of(made.results(), made.pdf()));
            made.csvs().forEach((csvName, bytes) -> {
                targets.add(outDir.resolve(csvName));
                contents.add(bytes);
            });
            AtomicFiles.writeTogether(targets, contents);
        } catch (IOException | RuntimeException e) {
            return new Outcome(Main.INTERNAL_FAILURE, List.of(file + ": internal failure while writing the package: " + e + "\n"
                    + "  nothing was written; an earlier package of the same name is unchanged\n"));
        }
        return finished(file, checks, failing, pdf, results, made.pdf());
    }

    /** Each check that does not meet its limit, named (under its member's id in a package of several) with its ratio. */
    private static List<String> failing(List<CheckOutcome> checks, String prefix) {
        return checks.stream().filter(c -> !c.pass())
                .map(c -> prefix + c.id() + " (ratio " + org.beamfolio.units.Numbers.format(c.ratio()) + ")").toList();
    }

    /** The outcome of a package written: its status, and what the terminal is told of failing checks. */
    private static Outcome finished(Path file, List<CheckOutcome> checks, List<String> failing, Path pdf, Path results,
                                    byte[] document) {
        List<String> messages = new ArrayList<>();
        double ratio = checks.stream().mapToDouble(CheckOutcome::ratio).max().orElse(Double.NaN);
        boolean pass = checks.stream().allMatch(CheckOutcome::pass);
        if (!pass) {
            messages.add(file + ": the package was written, but it DOES NOT MEET " + String.join(", ", failing)
                    + "; it is marked as failing\n");
        }
        return new Outcome(pass ? Main.OK : Main.CHECKS_FAIL, messages, pdf, results, pages(document), ratio, pass);
    }
}
