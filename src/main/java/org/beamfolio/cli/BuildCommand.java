package org.beamfolio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.beamfolio.job.JobReader;
import org.beamfolio.units.Numbers;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code build JOB... [--out DIR]}: writes a PDF package and a results file for each job. */
@Command(name = "build", mixinStandardHelpOptions = true,
        description = "Solve each job and write DIR/<job>.pdf and DIR/<job>.results.json.")
final class BuildCommand implements Callable<Integer> {
    @Parameters(arity = "1..*", paramLabel = "JOB", description = "job files, or folders of *.yaml job files")
    List<Path> jobs;

    @Option(names = "--out", paramLabel = "DIR", description = "where to write the packages (default: the current folder)")
    Path out = Path.of(".");

    @Option(names = "--csv", description = "also write DIR/<job>.csv: diagram ordinates per combination and for the envelope")
    boolean csv;

    @Option(names = "--previous", paramLabel = "OLD.yaml",
            description = "the previous revision of the job: the package gets a sheet of what changed (one job only)")
    Path previous;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter stderr = spec.commandLine().getErr();
        List<Path> files = JobFiles.expand(jobs);
        if (files.isEmpty()) {
            stderr.println("beamfolio: no job files found in " + jobs);
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
        ExitStatus status = new ExitStatus();
        Pipeline pipeline = new Pipeline();
        boolean terminal = System.console() != null;
        List<String[]> table = new ArrayList<>();
        for (int i = 0; i < files.size(); i++) {
            Path file = files.get(i);
            if (terminal && files.size() > 1) {
                stderr.print("\r[" + (i + 1) + "/" + files.size() + "] " + file.getFileName() + "\u001b[K");
                stderr.flush();
            }
            long start = System.nanoTime();
            Pipeline.Outcome outcome = pipeline.build(file, out, csv, previous);
            long millis = (System.nanoTime() - start) / 1_000_000;
            if (terminal && files.size() > 1 && !outcome.messages().isEmpty()) {
                stderr.print("\r\u001b[K");
            }
            outcome.messages().forEach(stderr::print);
            if (outcome.status() == Main.OK) {
                stdout.println("wrote " + outcome.pdf() + " and " + outcome.results());
                table.add(new String[] {JobReader.jobName(file), Integer.toString(outcome.pages()),
                        Double.isNaN(outcome.governingRatio()) ? "-" : Numbers.format(outcome.governingRatio()),
                        Double.isNaN(outcome.governingRatio()) ? "no checks" : outcome.pass() ? "pass" : "FAIL", millis + " ms"});
            } else {
                table.add(new String[] {JobReader.jobName(file), "-", "-", outcome.status() == Main.BAD_INPUT ? "bad input" : "failed",
                        millis + " ms"});
            }
            status.add(outcome.status());
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
}
