package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Every starter is a valid job that builds; new never overwrites. */
class NewCommandTest {
    @TempDir
    Path temp;

    @ParameterizedTest(name = "{0} in {1}")
    @CsvSource({"simple-span, US", "simple-span, SI", "overhang, US", "overhang, SI", "cantilever, US", "cantilever, SI",
            "continuous, US", "continuous, SI"})
    void everyStarterBuilds(String layout, String units) throws Exception {
        Path job = temp.resolve(layout + "-" + units + ".yaml");
        Run made = Run.of("new", layout, "--units", units, "--out", job.toString());
        assertEquals(Main.OK, made.status(), made.err());
        String text = Files.readString(job);
        assertTrue(text.contains("# total length"), "keys are explained in comments");
        Run built = Run.of("build", job.toString(), "--out", temp.resolve("out").toString());
        assertEquals(Main.OK, built.status(), built.err());
    }

    @Test
    void newNeverOverwrites() throws Exception {
        Path job = Files.writeString(temp.resolve("mine.yaml"), "my work");
        Run run = Run.of("new", "cantilever", "--out", job.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertEquals("my work", Files.readString(job));
        assertTrue(run.err().contains("exists already"), run.err());
    }

    @Test
    void anUnknownLayoutIsBadInput() {
        Run run = Run.of("new", "arch", "--out", temp.resolve("x.yaml").toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("one of: simple-span, overhang, cantilever, continuous"), run.err());
    }
}
