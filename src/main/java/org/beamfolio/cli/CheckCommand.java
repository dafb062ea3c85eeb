package org.beamfolio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code check JOB...}: validates and solves each job and prints a summary; writes nothing. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Validate and solve each job and print a one-screen summary; no files are written.")
final class CheckCommand implements Callable<Integer> {
    @CommandLine.Mixin
    JobFiles jobs;

    @CommandLine.Option(names = "--candidates", description = "for a job that leaves a section to choose (choose:), print"
            + " every candidate tried with its weight, governing check and ratio instead of the summary")
    boolean candidates;

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
        ExitStatus status = new ExitStatus();
        Pipeline pipeline = Pipeline.checking();
        for (Path file : files) {
            Pipeline.Solved solved = pipeline.solve(file);
            solved.messages().forEach(stderr::print);
            if (solved.status() == Main.OK) {
                stdout.print(candidates ? CandidatesTable.of(solved) : solved.summary());
            }
            status.add(solved.statusWithChecks());
        }
        stdout.flush();
        stderr.flush();
        return status.get();
    }
}
