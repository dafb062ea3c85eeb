package org.beamfolio.properties;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.beamfolio.cli.Main;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Every random valid beam gets its whole package written: no report path fails on an unusual beam. */
class RandomPackagesTest {
    @TempDir
    Path temp;

    @Test
    void everyRandomBeamBuilds() {
        Trials.forAll(31, 30, RandomBeams::next, beam -> {
            try {
                Path job = temp.resolve("random.yaml");
                String loadCase = beam.text().contains("case: D") ? "D" : "L";
                long supports = beam.text().lines().filter(l -> l.startsWith("    - { at:")).count();
                // with two or more spans and live load, half the beams also get the built-in set and pattern loading
                boolean pattern = supports >= 3 && beam.text().contains("case: L") && beam.length() % 2 == 0;
                Files.writeString(job, beam.text() + (pattern ? "combinations: ASCE7-ASD\npattern: [ L ]\n" : "")
                        + "checks:\n  stress: true\n  deflection:\n    - { cases: [ " + loadCase + " ], limit: L/360 }\n");
                java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
                int status = Main.run(new String[] {"build", job.toString(), "--out", temp.resolve("out").toString(), "--csv"},
                        new java.io.PrintStream(java.io.OutputStream.nullOutputStream()), new java.io.PrintStream(err, true));
                // a random beam may well exceed its allowables: the package is then written and flagged
                assertTrue(status == Main.OK || status == Main.CHECKS_FAIL, "status " + status + ": " + err);
                assertTrue(java.nio.file.Files.exists(temp.resolve("out/random.pdf")), "the package is written either way");
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
    }
}
