package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every file in test resources bad-jobs/ holds one mistake and names, on its first line, the
 * message it must get ("# expect: key.path: words"); a second line "# messages: n" says how many
 * located messages it gets in all (one, where a follow-on message would mislead). Each must give exit status 2, a located
 * message file:line:column: key.path: ..., the offending line with a caret, no stack trace, and
 * no file written: an earlier package of the same name stays byte for byte.
 */
class BadInputTest {
    @TempDir
    Path temp;

    static Stream<String> corpus() throws IOException, URISyntaxException {
        Path folder = Path.of(BadInputTest.class.getResource("/bad-jobs").toURI());
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @Test
    void corpusIsLarge() throws Exception {
        assertTrue(corpus().count() >= 40, "at least 40 distinct mistakes");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void badInputIsRefusedWithALocatedMessageAndNothingWritten(String name) throws Exception {
        Path source = Path.of(BadInputTest.class.getResource("/bad-jobs/" + name).toURI());
        byte[] bytes = Files.readAllBytes(source);
        String firstLine = new String(bytes, StandardCharsets.ISO_8859_1).lines().findFirst().orElseThrow();
        assertTrue(firstLine.startsWith("# expect: "), "the corpus file states its expected message");
        String expected = firstLine.substring("# expect: ".length());
        Path job = temp.resolve(name);
        Files.write(job, bytes);
        Path out = Files.createDirectories(temp.resolve("out"));
        String jobName = name.replace(".yaml", "");
        byte[] earlier = "an earlier good package".getBytes(StandardCharsets.UTF_8);
        Files.write(out.resolve(jobName + ".pdf"), earlier);

        Run run = Run.of("build", job.toString(), "--out", out.toString());

        assertEquals(Main.BAD_INPUT, run.status(), run.err());
        Pattern located = Pattern.compile("(?m)^" + Pattern.quote(job.toString()) + ":(\\d+):(\\d+): " + Pattern.quote(expected));
        assertTrue(located.matcher(run.err()).find(), () -> "expected\n  " + expected + "\ngot\n" + run.err());
        List<String> header = new String(bytes, StandardCharsets.ISO_8859_1).lines().limit(2).toList();
        if (header.size() > 1 && header.get(1).startsWith("# messages: ")) {
            int count = Integer.parseInt(header.get(1).substring("# messages: ".length()).strip());
            Pattern anyLocated = Pattern.compile("(?m)^" + Pattern.quote(job.toString()) + ":\\d+:\\d+: ");
            assertEquals(count, anyLocated.matcher(run.err()).results().count(), run::err);
        }
        assertTrue(run.err().contains("^"), "the offending line is shown with a caret");
        assertFalse(run.err().contains("Exception") || run.err().contains("\tat "), "no stack trace");
        assertArrayEquals(earlier, Files.readAllBytes(out.resolve(jobName + ".pdf")), "the earlier package is untouched");
        try (Stream<Path> left = Files.list(out)) {
            assertEquals(List.of(out.resolve(jobName + ".pdf")), left.toList(), "nothing else is written");
        }
        assertEquals(Main.BAD_INPUT, Run.of("check", job.toString()).status(), "check refuses it too");
    }

    @Test
    void aFolderWhereAFileBelongsIsBadInput() throws Exception {
        Path folder = Files.createDirectories(temp.resolve("job.yaml"));
        Files.createDirectories(temp.resolve("list"));
        Run run = Run.of("check", temp.resolve("list").resolve("..").resolve("job.yaml").toString() + "/");
        assertEquals(Main.BAD_INPUT, run.status(), run.err());
        assertTrue(folder.toFile().isDirectory());
    }

    @Test
    void aMissingFileIsBadInput() {
        Run run = Run.of("build", temp.resolve("nowhere.yaml").toString(), "--out", temp.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("nowhere.yaml:1:1: (file): cannot read the file"), run.err());
    }

    @Test
    void everyMistakeInAFileIsReportedTogether() throws Exception {
        Path job = temp.resolve("many.yaml");
        String text = new String(Files.readAllBytes(Path.of(BadInputTest.class.getResource("/bad-jobs/negative-length.yaml").toURI())),
                StandardCharsets.UTF_8).replace("b: 200 mm", "b: 0 mm").replace("type: roller", "type: rocker");
        Files.writeString(job, text);
        Run run = Run.of("check", job.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("beam.length: must be greater than zero"), run.err());
        assertTrue(run.err().contains("sections.lintel.b: must be greater than zero"), run.err());
        assertTrue(run.err().contains("beam.supports[1].type: unknown value \"rocker\"; did you mean \"roller\"?"), run.err());
    }
}
