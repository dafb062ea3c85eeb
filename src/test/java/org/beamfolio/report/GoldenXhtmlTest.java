package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.Checks;
import org.beamfolio.job.JobReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The package's XHTML, before layout, compared as text with golden files in
 * src/test/resources/golden/ (one per example job named there). Regenerate after an intended
 * change with {@code ./mvnw verify -Dbeamfolio.golden.write=true}: each file that changes is
 * rewritten and its test fails, so that the diff is reviewed; run again without the property.
 */
class GoldenXhtmlTest {
    static final Path GOLDEN = Path.of("src/test/resources/golden");
    static final boolean WRITE = Boolean.getBoolean("beamfolio.golden.write");

    static Stream<String> goldenJobs() throws IOException {
        try (Stream<Path> files = Files.list(GOLDEN)) {
            return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".xhtml"))
                    .map(n -> n.substring(0, n.length() - ".xhtml".length())).sorted().toList().stream();
        }
    }

    @Test
    void atLeastTwoExamplesHaveGoldenFiles() throws IOException {
        assertTrue(goldenJobs().count() >= 2);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("goldenJobs")
    void xhtmlMatchesItsGoldenFile(String name) throws Exception {
        Path job = Path.of("example-jobs", name + ".yaml");
        assertTrue(Files.exists(job), "a golden file needs its example job: " + job);
        var reading = JobReader.read(job);
        AnalysisResult result = Analysis.run(org.beamfolio.selection.Selection.resolve(reading.job()));
        String xhtml = new PackageRenderer().xhtml(result, Checks.run(result));
        Path golden = GOLDEN.resolve(name + ".xhtml");
        String expected = Files.exists(golden) ? Files.readString(golden) : "";
        if (WRITE && !expected.equals(xhtml)) {
            // a rewrite is news to review, never a pass: this run fails, the next one (without the property) compares
            Files.writeString(golden, xhtml);
            fail("rewrote " + golden + ": review its diff, then run the tests again without -Dbeamfolio.golden.write");
        }
        assertEquals(expected, xhtml, "regenerate with -Dbeamfolio.golden.write=true if the change is intended");
    }
}
