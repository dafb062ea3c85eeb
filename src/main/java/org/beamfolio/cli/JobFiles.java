package org.beamfolio.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/** Expands the command's arguments: a folder stands for every *.yaml file in it, in name order. */
final class JobFiles {
    private JobFiles() {}

    static List<Path> expand(List<Path> arguments) throws IOException {
        List<Path> files = new ArrayList<>();
        for (Path p : arguments) {
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
        return files;
    }
}
