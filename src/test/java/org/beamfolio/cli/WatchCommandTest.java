package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.beamfolio.TestJobs;
import org.beamfolio.job.JobReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/** watch rebuilds on each save in one process, and a bad save leaves the last good package. */
class WatchCommandTest {
    @TempDir
    Path temp;

    private static String job(String title) {
        return TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n").replace("title: Test beam", "title: " + title);
    }

    /** Each save is made after the build before it has finished, so the test waits on no clock. */
    @Test
    @Timeout(value = 10, unit = TimeUnit.MINUTES) // a guard against a watch that never wakes, not a speed limit
    void aBadSaveLeavesTheLastGoodPackageAndTheNextGoodSaveReplacesIt() throws Exception {
        Path folder = Files.createDirectories(temp.resolve("jobs"));
        Path job = Files.writeString(folder.resolve("lintel.yaml"), job("First lintel"));
        String bad = job("Second lintel").replace("type: roller", "type: rocker");
        String good = job("Third lintel");
        Path out = temp.resolve("out");
        StringWriter printed = new StringWriter();
        StringWriter errors = new StringWriter();
        List<Integer> statuses = new ArrayList<>();
        List<byte[]> packages = new ArrayList<>();
        List<byte[]> results = new ArrayList<>();
        JobWatch watch = new JobWatch(job, out, true, new PrintWriter(printed), new PrintWriter(errors));

        int last = watch.run(3, (count, outcome) -> {
            statuses.add(outcome.status());
            packages.add(Files.readAllBytes(out.resolve("lintel.pdf")));
            results.add(Files.readAllBytes(out.resolve("lintel.results.json")));
            Files.writeString(job, count == 1 ? bad : good);
        });

        assertEquals(List.of(Main.OK, Main.BAD_INPUT, Main.OK), statuses, errors.toString());
        assertEquals(Main.OK, last);
        assertArrayEquals(packages.get(0), packages.get(1), "the bad save left the package as it was");
        assertArrayEquals(results.get(0), results.get(1), "and its results file");
        assertFalse(java.util.Arrays.equals(packages.get(0), packages.get(2)), "the good save after it rebuilt the package");
        String sha = new ObjectMapper().readTree(results.get(2)).get("input_sha256").asText();
        assertEquals(JobReader.sha256(good.getBytes(java.nio.charset.StandardCharsets.UTF_8)), sha, "from the last save");
        assertTrue(errors.toString().contains("lintel.yaml:") && errors.toString().contains("unknown value \"rocker\""),
                "the mistake is reported with its place: " + errors);
        assertTrue(errors.toString().contains("the last good package is unchanged"), errors.toString());
        assertTrue(printed.toString().contains("lintel: First lintel"), "the summary of each good build: " + printed);
        assertTrue(printed.toString().contains("lintel: Third lintel"), printed.toString());
        try (var files = Files.list(out)) {
            assertEquals(2, files.count(), "no temporaries left beside the package");
        }
    }

    @Test
    void aMissingJobIsRefused() {
        Run run = Run.of("watch", temp.resolve("none.yaml").toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("is not a job file"), run.err());
    }
}
