package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every example job builds, and the README's quick start names jobs that exist. */
class ExampleJobsTest {
    @TempDir
    Path temp;

    static Stream<Path> examples() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("example-jobs"))) {
            return files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @Test
    void thereAreAtLeastFourExamples() throws IOException {
        assertTrue(examples().count() >= 4);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void exampleBuildsAndPassesItsChecks(Path job) {
        Run run = Run.of("build", job.toString(), "--out", temp.toString());
        assertEquals(Main.OK, run.status(), run.err());
        Run check = Run.of("check", job.toString());
        assertEquals(Main.OK, check.status(), check.err());
        assertTrue(!check.out().contains("FAIL"), "the examples are designed to pass:\n" + check.out());
    }

    @Test
    void readmeListsEveryExampleAndNothingElse() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        java.util.Set<String> listed = new java.util.TreeSet<>();
        Matcher m = Pattern.compile("\\| `([\\w-]+\\.yaml)` \\|").matcher(readme);
        while (m.find()) {
            listed.add(m.group(1));
        }
        java.util.Set<String> present = new java.util.TreeSet<>(examples().map(p -> p.getFileName().toString()).toList());
        assertEquals(present, listed);
    }

    @Test
    void readmeNewCommandWorksAsWritten() {
        Path starter = temp.resolve("starter.yaml");
        assertEquals(Main.OK, Run.of("new", "continuous", "--units", "SI", "--out", starter.toString()).status());
        assertEquals(Main.OK, Run.of("check", starter.toString()).status());
    }

    @Test
    void readmeQuickStartBuildsAnExistingJob() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        Matcher m = Pattern.compile("build (example-jobs/[\\w.-]+\\.yaml)").matcher(readme);
        assertTrue(m.find(), "the quick start builds an example job");
        assertTrue(Files.exists(Path.of(m.group(1))), m.group(1));
        assertTrue(readme.contains("./mvnw verify"), "the test command");
    }
}
