package org.beamfolio.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Data flows one way through the stages (ARCHITECTURE.md): a stage may use only the stages below
 * it. Every reference from one stage to another, by import or by a fully qualified name, is read
 * from the sources and compared with the allowed list.
 */
class StagesTest {
    static final Path SOURCES = Path.of("src/main/java/org/beamfolio");
    static final Pattern REFERENCE = Pattern.compile("org\\.beamfolio\\.([a-z]+)\\.");

    /** Each stage and the stages it may use; a stage's own subpackages belong to it. */
    static final Map<String, Set<String>> ALLOWED = Map.ofEntries(
            Map.entry("units", Set.of()),
            Map.entry("catalogue", Set.of("units")),
            Map.entry("model", Set.of("units", "catalogue", "loads")),
            Map.entry("section", Set.of("units", "catalogue", "model")),
            Map.entry("combinations", Set.of("units", "model")),
            Map.entry("loads", Set.of("units")),
            Map.entry("job", Set.of("units", "catalogue", "model", "section", "combinations", "loads", "design")),
            Map.entry("analysis", Set.of("units", "catalogue", "model", "section", "combinations", "loads")),
            Map.entry("design", Set.of("units", "catalogue", "model", "section", "analysis")),
            Map.entry("derivation", Set.of("units", "catalogue", "model", "section", "analysis")),
            Map.entry("checks", Set.of("units", "catalogue", "model", "section", "combinations", "analysis", "design")),
            Map.entry("selection", Set.of("units", "catalogue", "model", "section", "combinations", "analysis", "design", "checks")),
            Map.entry("results", Set.of("units", "catalogue", "model", "section", "analysis", "design", "derivation", "checks")),
            Map.entry("report", Set.of("units", "catalogue", "model", "section", "combinations", "loads", "analysis", "design",
                    "derivation", "checks", "results")),
            Map.entry("seal", Set.of("units", "model", "checks")),
            Map.entry("cli", Set.of("units", "catalogue", "model", "section", "combinations", "loads", "job", "analysis", "design",
                    "derivation", "checks", "selection", "results", "report", "seal")));

    @Test
    void noStageReachesUpward() throws IOException {
        List<String> violations = new ArrayList<>();
        for (Map.Entry<String, Set<String>> used : references().entrySet()) {
            String stage = used.getKey();
            assertTrue(ALLOWED.containsKey(stage), "stage " + stage + " is not in the list of stages: add it to ARCHITECTURE.md and here");
            for (String target : used.getValue()) {
                if (!ALLOWED.get(stage).contains(target)) {
                    violations.add(stage + " -> " + target);
                }
            }
        }
        assertEquals(List.of(), violations, "references against the flow of data");
    }

    @Test
    void theAllowedStagesFormNoCycle() {
        for (String start : ALLOWED.keySet()) {
            assertTrue(!reaches(start, start, new TreeSet<>()), "a cycle through " + start);
        }
    }

    /** The check above must be able to fail: a reference planted in a copy of the sources is found. */
    @Test
    void aReferenceUpwardIsFound() {
        Set<String> found = stagesIn("package org.beamfolio.units;\nimport org.beamfolio.report.PackageRenderer;\n"
                + "class X { Object y = org.beamfolio.cli.Main.class; }", "units");
        assertEquals(Set.of("report", "cli"), found);
    }

    private static boolean reaches(String from, String target, Set<String> seen) {
        for (String next : ALLOWED.get(from)) {
            if (next.equals(target) || (seen.add(next) && reaches(next, target, seen))) {
                return true;
            }
        }
        return false;
    }

    static Map<String, Set<String>> references() throws IOException {
        Map<String, Set<String>> out = new TreeMap<>();
        try (Stream<Path> files = Files.walk(SOURCES)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                String stage = SOURCES.relativize(file).getName(0).toString();
                if (stage.endsWith(".java")) {
                    continue;
                }
                out.computeIfAbsent(stage, k -> new TreeSet<>()).addAll(stagesIn(Files.readString(file), stage));
            }
        }
        return out;
    }

    static Set<String> stagesIn(String source, String own) {
        Set<String> found = new TreeSet<>();
        Matcher m = REFERENCE.matcher(source.replaceAll("(?m)^package .*$", ""));
        while (m.find()) {
            if (!m.group(1).equals(own)) {
                found.add(m.group(1));
            }
        }
        return found;
    }
}
