package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.beamfolio.TestJobs;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The limits that protect the machine, each with a clear message; and a large beam within them works. */
class LimitsTest {
    @TempDir
    Path temp;

    private Run check(String name, String text) throws Exception {
        Path job = temp.resolve(name + ".yaml");
        Files.writeString(job, text);
        return Run.of("check", job.toString());
    }

    @Test
    void fiveHundredSpansAndTenThousandLoadsStillWork() throws Exception {
        StringBuilder supports = new StringBuilder("    - { at: 0 m, type: pin }\n");
        for (int i = 1; i <= 500; i++) {
            supports.append("    - { at: ").append(i * 4).append(" m, type: roller }\n");
        }
        StringBuilder loads = new StringBuilder();
        for (int i = 0; i < 10_000; i++) {
            double x = (i * 0.1999) % 2000;
            loads.append(i % 2 == 0
                    ? "  - { case: D, type: point, P: 2 kN, at: " + String.format(java.util.Locale.ROOT, "%.4f", x) + " m }\n"
                    : "  - { case: L, type: uniform, w: 3 kN/m, from: " + String.format(java.util.Locale.ROOT, "%.4f", x) + " m, to: "
                            + String.format(java.util.Locale.ROOT, "%.4f", Math.min(2000, x + 1.5)) + " m }\n");
        }
        Run run = check("long", TestJobs.text("2000 m", supports.toString(), loads.toString()) + "combinations: ASCE7-ASD\n");
        assertEquals(Main.OK, run.status(), run.err());
        assertTrue(run.out().contains("span 500"), "all 500 spans are there");
    }

    @Test
    void tooManyLoadsAreRefused() throws Exception {
        StringBuilder loads = new StringBuilder();
        for (int i = 0; i <= 20_000; i++) {
            loads.append("  - { case: D, type: point, P: 1 kN, at: 1 m }\n");
        }
        Run run = check("many", TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n", loads.toString()));
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("loads: too many loads: 20001 (at most 20000)"), run.err());
    }

    @Test
    void deepNestingIsRefused() throws Exception {
        String deep = "a: " + "[".repeat(200) + "]".repeat(200) + "\n";
        Run run = check("deep", deep);
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("(file): YAML"), run.err());
    }

    @Test
    void anOversizedFileIsRefusedBeforeParsing() throws Exception {
        Path job = temp.resolve("big.yaml");
        Files.write(job, new byte[(int) org.beamfolio.job.JobReader.MAX_FILE_BYTES + 1]);
        Run run = Run.of("check", job.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("job files are limited to"), run.err());
    }
}
