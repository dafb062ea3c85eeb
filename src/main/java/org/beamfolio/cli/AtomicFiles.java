package org.beamfolio.cli;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes a set of files as one: each to a temporary in the same folder, then every earlier file
 * aside, then each new file into place. If any step fails the earlier files are put back, so a
 * package and its results file are either both new or both as they were.
 */
final class AtomicFiles {
    private AtomicFiles() {}

    static void writeTogether(List<Path> targets, List<byte[]> contents) throws IOException {
        for (Path target : targets) {
            if (Files.isDirectory(target, LinkOption.NOFOLLOW_LINKS)) {
                throw new IOException(target + " is a folder; it is left as it is");
            }
        }
        List<Path> temporaries = new ArrayList<>();
        List<Path> backups = new ArrayList<>();
        List<Path> placed = new ArrayList<>();
        boolean done = false;
        try {
            for (int i = 0; i < targets.size(); i++) {
                temporaries.add(write(sibling(targets.get(i), "part"), contents.get(i)));
            }
            for (Path target : targets) {
                if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                    Path backup = sibling(target, "previous");
                    move(target, backup);
                    backups.add(backup);
                } else {
                    backups.add(null);
                }
            }
            for (int i = 0; i < targets.size(); i++) {
                move(temporaries.get(i), targets.get(i));
                placed.add(targets.get(i));
            }
            done = true;
        } finally {
            if (!done) {
                for (Path p : placed) {
                    Files.deleteIfExists(p);
                }
                for (int i = 0; i < backups.size(); i++) {
                    if (backups.get(i) != null) {
                        move(backups.get(i), targets.get(i));
                    }
                }
            } else {
                for (Path b : backups) {
                    if (b != null) {
                        Files.deleteIfExists(b);
                    }
                }
            }
            for (Path t : temporaries) {
                Files.deleteIfExists(t);
            }
        }
    }

    /** A hidden file beside the target, named so no two runs collide. */
    private static Path sibling(Path target, String kind) {
        return target.toAbsolutePath().resolveSibling("." + target.getFileName() + "." + ProcessHandle.current().pid() + "."
                + System.nanoTime() + "." + kind);
    }

    private static Path write(Path path, byte[] bytes) throws IOException {
        // created here rather than by createTempFile, so the file gets the usual permissions
        Files.write(path, bytes, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
        return path;
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
