package org.beamfolio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.beamfolio.job.JobReader;
import org.beamfolio.units.Numbers;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code build JOB... [--out DIR]}: writes a PDF package and a results file for each job. */
@Command(name = "build", mixinStandardHelpOptions = true,
        description = "Solve each job and write DIR/<job>.pdf and DIR/<job>.results.json.")
final class BuildCommand implements Callable<Integer> {
    @CommandLine.Mixin
    JobFiles jobs;

    @Option(names = "--out", paramLabel = "DIR", description = "where to write the packages (default: the current folder)")
    Path out = Path.of(".");

    @Option(names = "--csv", description = "also write DIR/<job>.csv: diagram ordinates per combination and for the envelope")
    boolean csv;

    @Option(names = "--previous", paramLabel = "OLD.yaml",
            description = "the previous revision of the job: the package gets a sheet of what changed (one job only)")
    Path previous;

    @Option(names = "--no-pdfa", description = "write a plain PDF rather than PDF/A-3b")
    boolean noPdfa;

    @Option(names = "--combine", paramLabel = "NAME",
            description = "gather every job given into one package, DIR/NAME.pdf, each job a member under its own name")
    String combine;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter stderr = spec.commandLine().getErr();
        List<Path> files = jobs.expand(stderr);
        if (files.isEmpty()) {
            return Main.BAD_INPUT;
        }
        if (Files.exists(out) && !Files.isDirectory(out)) {
            stderr.println("beamfolio: --out " + out + " is a file, not a folder");
            return Main.BAD_INPUT;
        }
        if (previous != null && files.size() != 1) {
            stderr.println("beamfolio: --previous compares one job with its previous revision; give exactly one job");
            return Main.BAD_INPUT;
        }
        if (combine != null) {
            return combine(files, stdout, stderr);
        }
        Pipeline.startReportSetUpEarly();
        ExitStatus status = new ExitStatus();
        boolean terminal = System.console() != null;
        List<String[]> table = new ArrayList<>();
        // Jobs are built side by side, one worker per core, each with its own pipeline: the PDF
        // layout and its fonts are not thread-safe. Output is reported in job order.
        int workers = Math.max(1, Math.min(files.size(), Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(workers);
        ThreadLocal<Pipeline> pipelines = ThreadLocal.withInitial(() -> Pipeline.building(!noPdfa));
        try {
            List<Future<Timed>> futures = new ArrayList<>();
            for (Path file : files) {
                futures.add(pool.submit(() -> {
                    long start = System.nanoTime();
                    Pipeline.Outcome outcome = pipelines.get().build(file, out, csv, previous);
                    return new Timed(outcome, (System.nanoTime() - start) / 1_000_000);
                }));
            }
            for (int i = 0; i < files.size(); i++) {
                Path file = files.get(i);
                if (terminal && files.size() > 1) {
                    stderr.print("\r[" + (i + 1) + "/" + files.size() + "] " + file.getFileName() + "\u001b[K");
                    stderr.flush();
                }
                Timed timed = get(futures.get(i));
                Pipeline.Outcome outcome = timed.outcome();
                if (terminal && files.size() > 1 && !outcome.messages().isEmpty()) {
                    stderr.print("\r\u001b[K");
                }
                outcome.messages().forEach(stderr::print);
                if (outcome.pdf() != null) {
                    stdout.println("wrote " + outcome.pdf() + " and " + outcome.results());
                    table.add(new String[] {JobReader.jobName(file), Integer.toString(outcome.pages()),
                            Double.isNaN(outcome.governingRatio()) ? "-" : Numbers.format(outcome.governingRatio()),
                            Double.isNaN(outcome.governingRatio()) ? "no checks" : outcome.pass() ? "pass" : "FAIL", timed.millis() + " ms"});
                } else {
                    table.add(new String[] {JobReader.jobName(file), "-", "-", outcome.status() == Main.BAD_INPUT ? "bad input" : "failed",
                            timed.millis() + " ms"});
                }
                status.add(outcome.status());
            }
        } finally {
            pool.shutdownNow();
        }
        if (terminal && files.size() > 1) {
            stderr.print("\r\u001b[K");
        }
        if (files.size() > 1) {
            stdout.print(ResultTable.of(List.of("job", "sheets", "governing ratio", "result", "time"), table));
        }
        stdout.flush();
        stderr.flush();
        return status.get();
    }

    private Integer combine(List<Path> files, PrintWriter stdout, PrintWriter stderr) {
        if (previous != null) {
            stderr.println("beamfolio: --previous compares one job with its previous revision; it does not combine with --combine");
            return Main.BAD_INPUT;
        }
        if (!combine.matches("[\\w][\\w.-]*")) {
            stderr.println("beamfolio: --combine " + combine + ": a package name is letters, digits, '.', '-' and '_', without a folder");
            return Main.BAD_INPUT;
        }
        Pipeline.Outcome outcome = Pipeline.building(!noPdfa).combine(files, combine, out, csv);
        outcome.messages().forEach(stderr::print);
        if (outcome.pdf() != null) {
            stdout.println("wrote " + outcome.pdf() + " and " + outcome.results() + " (" + files.size() + " jobs, "
                    + outcome.pages() + " sheets)");
        }
        stdout.flush();
        stderr.flush();
        return outcome.status();
    }

    private record Timed(Pipeline.Outcome outcome, long millis) {}

    private static Timed get(Future<Timed> future) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while building", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a worker failed: " + e.getCause(), e.getCause());
        }
    }
}
