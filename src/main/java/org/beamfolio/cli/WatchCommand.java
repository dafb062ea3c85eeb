package org.beamfolio.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code watch JOB [--out DIR]}: rebuilds the job's package each time the job file is saved. */
@Command(name = "watch", mixinStandardHelpOptions = true,
        description = "Build the job's package, then rebuild it each time the job file is saved, printing the summary "
                + "and any mistakes with their places; a save with a mistake leaves the last good package. Ctrl-C stops.")
final class WatchCommand implements Callable<Integer> {
    @Parameters(paramLabel = "JOB", description = "the job file")
    Path job;

    @Option(names = "--out", paramLabel = "DIR", description = "where to write the package (default: the current folder)")
    Path out = Path.of(".");

    @Option(names = "--no-pdfa", description = "write a plain PDF rather than PDF/A-3b")
    boolean noPdfa;

    /** For scripts that time rebuilds: stop after this many builds (the first included). */
    @Option(names = "--stop-after", paramLabel = "N", hidden = true)
    int stopAfter;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException, InterruptedException {
        if (!Files.isRegularFile(job)) {
            spec.commandLine().getErr().println("beamfolio: " + job + " is not a job file");
            return Main.BAD_INPUT;
        }
        if (Files.exists(out) && !Files.isDirectory(out)) {
            spec.commandLine().getErr().println("beamfolio: --out " + out + " is a file, not a folder");
            return Main.BAD_INPUT;
        }
        JobWatch watch = new JobWatch(job, out, !noPdfa, spec.commandLine().getOut(), spec.commandLine().getErr());
        return watch.run(stopAfter, (count, outcome) -> { });
    }
}
