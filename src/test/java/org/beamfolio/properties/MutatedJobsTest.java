package org.beamfolio.properties;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.beamfolio.cli.Main;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Random mutations of valid job files: the tool answers 0 or 2, never a crash or a stack trace. */
class MutatedJobsTest {
    static final List<String> EXAMPLES = List.of("warehouse-mezzanine-simple-span.yaml", "footbridge-continuous-three-span.yaml",
            "timber-joist-on-new-post.yaml", "balcony-cantilever.yaml");
    static final String NOISE = "x0-9.:{}[]#&*!|>'\"\t ,e-+";

    @TempDir
    Path temp;

    static String mutate(String text, Random random) {
        List<String> lines = new ArrayList<>(text.lines().toList());
        int line = random.nextInt(lines.size());
        int other = random.nextInt(lines.size());
        int at = random.nextInt(Math.max(1, text.length()));
        char c = NOISE.charAt(random.nextInt(NOISE.length()));
        return switch (random.nextInt(7)) {
            case 0 -> text.substring(0, at) + text.substring(Math.min(text.length(), at + 1));
            case 1 -> text.substring(0, at) + c + text.substring(at);
            case 2 -> {
                lines.remove(line);
                yield String.join("\n", lines);
            }
            case 3 -> {
                lines.add(line, lines.get(other));
                yield String.join("\n", lines);
            }
            case 4 -> {
                String a = lines.get(line);
                lines.set(line, lines.get(other));
                lines.set(other, a);
                yield String.join("\n", lines);
            }
            case 5 -> text.replaceFirst("\\d+(\\.\\d+)?", random.nextBoolean() ? "" : "-" + c);
            default -> {
                lines.set(line, "  " + lines.get(line));
                yield String.join("\n", lines);
            }
        };
    }

    @Test
    void theToolAnswersZeroTwoOrThree() {
        Random pick = new Random(21);
        Trials.forAll(21, 400, random -> {
            try {
                String text = Files.readString(Path.of("example-jobs", EXAMPLES.get(pick.nextInt(EXAMPLES.size()))));
                for (int k = 1 + random.nextInt(3); k > 0; k--) {
                    text = mutate(text, random);
                }
                return text;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }, text -> {
            try {
                Path job = temp.resolve("mutated.yaml");
                Files.writeString(job, text);
                ByteArrayOutputStream err = new ByteArrayOutputStream();
                int status = Main.run(new String[] {"check", job.toString()},
                        new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
                String messages = err.toString(StandardCharsets.UTF_8);
                assertTrue(status == Main.OK || status == Main.BAD_INPUT || status == Main.CHECKS_FAIL, "status " + status + ":\n" + messages);
                assertTrue(!messages.contains("Exception") && !messages.contains("\tat "), messages);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }
}
