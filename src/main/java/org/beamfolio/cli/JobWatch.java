package org.beamfolio.cli;

import static java.nio.file.StandardWatchEventKinds.ENTRY_CREATE;
import static java.nio.file.StandardWatchEventKinds.ENTRY_MODIFY;
import static java.nio.file.StandardWatchEventKinds.OVERFLOW;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.ClosedWatchServiceException;
import java.nio.file.Path;
import java.nio.file.WatchEvent;
import java.nio.file.WatchKey;
import java.nio.file.WatchService;
import java.util.concurrent.TimeUnit;
import org.beamfolio.units.Numbers;

/**
 * Rebuilds one job's package each time its file is saved, in one process, so every build after
 * the first runs on a warm runtime with the report stack already set up. A save that does not
 * read or solve writes nothing (the pipeline moves files into place only when a package is
 * complete), so the last good package stays until the next good save.
 */
final class JobWatch {
    /**
     * Saves closer together than this are one save: editors write a file in several steps
     * (truncate, write, rename), and a build per step would only repeat the work.
     */
    static final long SETTLE_MILLIS = 100;

    /** Told of each build, before the next save is awaited. */
    interface AfterBuild {
        void built(int count, Pipeline.Outcome outcome) throws IOException;
    }

    /** The job as given, so messages name it as the user wrote it. */
    private final Path job;
    private final Path watched;
    private final Path out;
    private final Pipeline pipeline;
    private final PrintWriter stdout;
    private final PrintWriter stderr;

    JobWatch(Path job, Path out, boolean archival, PrintWriter stdout, PrintWriter stderr) {
        this.job = job;
        this.watched = job.toAbsolutePath().normalize();
        this.out = out;
        this.pipeline = Pipeline.building(archival);
        this.stdout = stdout;
        this.stderr = stderr;
    }

    /**
     * Builds now and after every save, {@code maxBuilds} times in all ({@code 0}: until the
     * process is stopped). Returns the status of the last build.
     */
    int run(int maxBuilds, AfterBuild after) throws IOException, InterruptedException {
        Path folder = watched.getParent();
        String name = watched.getFileName().toString();
        // watching starts before the first build, so a save made during it is not missed
        try (WatchService watcher = folder.getFileSystem().newWatchService()) {
            folder.register(watcher, ENTRY_CREATE, ENTRY_MODIFY);
            stderr.println("watching " + job + "; the package is rebuilt on every save (Ctrl-C to stop)");
            stderr.flush();
            for (int builds = 1;; builds++) {
                Pipeline.Outcome outcome = buildOnce();
                after.built(builds, outcome);
                if (maxBuilds > 0 && builds >= maxBuilds) {
                    return outcome.status();
                }
                awaitSave(watcher, name);
            }
        } catch (ClosedWatchServiceException e) {
            throw new IOException("the watch on " + folder + " was closed", e);
        }
    }

    private Pipeline.Outcome buildOnce() {
        long start = System.nanoTime();
        Pipeline.Solved solved = pipeline.solve(job);
        Pipeline.Outcome outcome = pipeline.write(job, solved, out, false, null);
        long millis = (System.nanoTime() - start) / 1_000_000;
        if (solved.status() == Main.OK) {
            stdout.print(solved.summary());
        }
        outcome.messages().forEach(stderr::print);
        if (outcome.pdf() != null) {
            stdout.println("wrote " + outcome.pdf() + " and " + outcome.results() + ": " + outcome.pages() + " sheets, "
                    + (Double.isNaN(outcome.governingRatio()) ? "no checks"
                            : "governing ratio " + Numbers.format(outcome.governingRatio()) + (outcome.pass() ? ", pass" : ", FAIL"))
                    + ", " + millis + " ms");
        } else {
            stderr.println("nothing written; the last good package is unchanged (" + millis + " ms)");
        }
        stdout.flush();
        stderr.flush();
        return outcome;
    }

    /** Waits for the job file to be saved, then for the saving to settle. */
    private static void awaitSave(WatchService watcher, String name) throws IOException, InterruptedException {
        while (!savedIn(watcher.take(), name)) {
            // another file in the folder changed
        }
        WatchKey more;
        while ((more = watcher.poll(SETTLE_MILLIS, TimeUnit.MILLISECONDS)) != null) {
            savedIn(more, name);
        }
    }

    private static boolean savedIn(WatchKey key, String name) throws IOException {
        boolean saved = false;
        for (WatchEvent<?> event : key.pollEvents()) {
            // an overflow lost the events, so the job may have been saved among them
            saved |= event.kind() == OVERFLOW || name.equals(String.valueOf(event.context()));
        }
        if (!key.reset()) {
            throw new IOException("the folder being watched is gone");
        }
        return saved;
    }
}
