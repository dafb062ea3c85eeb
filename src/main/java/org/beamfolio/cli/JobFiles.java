package org.beamfolio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import picocli.CommandLine.Parameters;

/**
 * The JOB arguments that {@code build} and {@code check} share, mixed into both: a folder stands
 * for every *.yaml file in it, in name order.
 */
final class JobFiles {
    @Parameters(arity = "1..*", paramLabel = "JOB", description = "job files, or folders of *.yaml job files")
    List<Path> jobs;

    /** The job files the arguments name; empty, and said so on {@code stderr}, when there are none. */
    List<Path> expand(PrintWriter stderr) throws IOException {
        List<Path> files = new ArrayList<>();
        for (Path p : jobs) {
            if (Files.isDirectory(p)) {
                try (Stream<Path> listing = Files.list(p)) {
                    listing.filter(f -> f.getFileName().toString().endsWith(".yaml") && Files.isRegularFile(f))
                            .sorted()
                            .forEach(files::add);
                }
            } else {
                files.add(p);
            }
        }
        if (files.isEmpty()) {
            stderr.println("beamfolio: no job files found in " + jobs);
        }
        return files;
    }
}
