package org.beamfolio.cli;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;

/** Writes files through temporaries in the same folder, then moves each into place. */
final class AtomicFiles {
    private AtomicFiles() {}

    static void writeTogether(List<Path> targets, List<byte[]> contents) throws IOException {
        List<Path> temporaries = new ArrayList<>();
        try {
            for (int i = 0; i < targets.size(); i++) {
                Path target = targets.get(i);
                // named here rather than by createTempFile, so the file gets the usual permissions
                Path temporary = target.toAbsolutePath().resolveSibling("." + target.getFileName() + "."
                        + ProcessHandle.current().pid() + "." + System.nanoTime() + ".part");
                temporaries.add(temporary);
                Files.write(temporary, contents.get(i), StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
            }
            for (int i = 0; i < targets.size(); i++) {
                move(temporaries.get(i), targets.get(i));
            }
        } finally {
            for (Path t : temporaries) {
                Files.deleteIfExists(t);
            }
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
