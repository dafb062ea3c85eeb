package org.beamfolio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
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
        ExitStatus status = new ExitStatus();
        Pipeline pipeline = new Pipeline();
        for (Path file : files) {
            Pipeline.Outcome outcome = pipeline.build(file, out);
            outcome.messages().forEach(stderr::print);
            if (outcome.status() == Main.OK) {
                stdout.println("wrote " + outcome.pdf() + " and " + outcome.results());
            }
            status.add(outcome.status());
        }
        stdout.flush();
        stderr.flush();
        return status.get();
    }
}
