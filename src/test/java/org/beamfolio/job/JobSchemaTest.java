package org.beamfolio.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.beamfolio.units.Dimension;
import org.beamfolio.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

/** The JSON Schema shipped for editors agrees with the tool: it takes every example and rejects what the tool rejects. */
class JobSchemaTest {
    static final JsonSchema SCHEMA = load();

    static JsonSchema load() {
        try (InputStream in = JobSchemaTest.class.getResourceAsStream("/schema/job-format-1.schema.json")) {
            return JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V7).getSchema(new ObjectMapper().readTree(in));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static Set<ValidationMessage> validate(String yaml) throws Exception {
        JsonNode node = new YAMLMapper().readTree(yaml);
        return SCHEMA.validate(node);
    }

    static Stream<Path> examples() throws Exception {
        try (Stream<Path> files = Files.list(Path.of("example-jobs"))) {
            return files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void everyExampleJobIsValid(Path job) throws Exception {
        Set<ValidationMessage> errors = validate(Files.readString(job));
        assertTrue(errors.isEmpty(), errors.toString());
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"simple-span", "overhang", "cantilever", "continuous"})
    void everyStarterIsValid(String layout) throws Exception {
        for (boolean si : new boolean[] {false, true}) {
            Path file = Files.createTempFile("starter", ".yaml");
            Files.delete(file);
            org.beamfolio.cli.Main.run(new String[] {"new", layout, "--units", si ? "SI" : "US", "--out", file.toString()},
                    new java.io.PrintStream(java.io.OutputStream.nullOutputStream()), new java.io.PrintStream(java.io.OutputStream.nullOutputStream()));
            Set<ValidationMessage> errors = validate(Files.readString(file));
            Files.delete(file);
            assertTrue(errors.isEmpty(), layout + ": " + errors);
        }
    }

    @Test
    void everyUnitTheToolAcceptsTheSchemaAcceptsToo() throws Exception {
        Map<Dimension, String> names = Map.of(Dimension.LENGTH, "length", Dimension.FORCE, "force", Dimension.FORCE_PER_LENGTH, "forcePerLength",
                Dimension.MOMENT, "moment", Dimension.STRESS, "stress", Dimension.AREA, "area", Dimension.FIRST_MOMENT, "firstMoment",
                Dimension.SECOND_MOMENT, "secondMoment", Dimension.WEIGHT_DENSITY, "density", Dimension.ROTATIONAL_STIFFNESS, "rotationalStiffness");
        JsonNode definitions = new ObjectMapper().readTree(JobSchemaTest.class.getResourceAsStream("/schema/job-format-1.schema.json"))
                .get("definitions");
        for (Map.Entry<Dimension, String> e : names.entrySet()) {
            java.util.regex.Pattern pattern = java.util.regex.Pattern.compile(definitions.get(e.getValue()).get("pattern").asText());
            List<String> spellings = new java.util.ArrayList<>(Units.symbolsOf(e.getKey()));
            spellings.addAll(Units.shorthandOf(e.getKey()));
            for (String unit : spellings) {
                assertTrue(pattern.matcher("12.5 " + unit).matches(), e.getValue() + " accepts " + unit);
                assertTrue(pattern.matcher("12.5 " + unit.replace('*', '-')).matches(), e.getValue() + " accepts " + unit.replace('*', '-'));
            }
            assertFalse(pattern.matcher("12.5").matches(), e.getValue() + " refuses a bare number");
        }
    }

    /** Lengths and shorthand the schema and the tool both take, and near misses both refuse. */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"9'-6\"", "9' 6\"", "9'6\"", "9'", "6\"", "9 ft 6 in", "9ft 6in", "9 ft-6 in", "-9'-6 1/2\"",
        "9'-6-1/2\"", "6 1/2\"", "3/4 in", "2.5' 3.25\"", "24 ft", "1e3 mm", "-2 m",
        "9'-6", "9' 6", "6 1/0\"", "9 ft 6", "'9", "1/2 ft", "9'-'6\"", "9 feet", "4 meters", "9'-6\" 3", "2 k", "ft"})
    void theSchemaTakesExactlyTheLengthsTheToolTakes(String text) throws Exception {
        java.util.regex.Pattern pattern = java.util.regex.Pattern.compile(new ObjectMapper()
                .readTree(JobSchemaTest.class.getResourceAsStream("/schema/job-format-1.schema.json"))
                .get("definitions").get("length").get("pattern").asText());
        assertEquals(org.beamfolio.units.QuantityParser.parse(text, Dimension.LENGTH).ok(), pattern.matcher(text).matches(), text);
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"3 ft-kip", "3 k-ft", "3 kip-ft", "3 ft-lb", "3 lb-ft", "3 in-kip", "2 kNm", "3 kip-fet", "3 ft-kips", "3 ft"})
    void theSchemaTakesExactlyTheMomentsTheToolTakes(String text) throws Exception {
        java.util.regex.Pattern pattern = java.util.regex.Pattern.compile(new ObjectMapper()
                .readTree(JobSchemaTest.class.getResourceAsStream("/schema/job-format-1.schema.json"))
                .get("definitions").get("moment").get("pattern").asText());
        assertEquals(org.beamfolio.units.QuantityParser.parse(text, Dimension.MOMENT).ok(), pattern.matcher(text).matches(), text);
    }

    static final List<String> BOTH_REJECT = List.of("bare-number-length", "unknown-unit", "wrong-dimension", "unknown-support-kind",
            "unknown-load-kind", "unknown-shape", "missing-load-case", "missing-point-position", "misspelt-key", "misspelt-top-key",
            "missing-version", "wrong-version", "unknown-builtin-set", "factor-not-number", "moment-without-sense", "spring-without-k",
            "deflection-limit-bad", "linear-one-intensity", "list-where-mapping", "top-level-list", "us-kip-as-length",
            "us-misspelt-kip", "us-feet-and-inches-as-force", "us-fraction-zero-denominator", "follow-on-material-fails",
            "follow-on-load-fails", "area-pressure-as-line-load", "area-line-load-as-pressure", "area-width-wrong-dimension",
            "area-varying-width-wrong-dimension", "area-reducible-dead-load", "area-kll-not-in-table", "area-load-with-case",
            "area-width-on-line-load", "timber-missing-reference-value", "timber-fb-neg-on-sawn", "timber-lrfd");

    @Test
    void theSchemaAndTheToolRejectTheSameMistakes() throws Exception {
        for (String name : BOTH_REJECT) {
            Path file = Path.of(JobSchemaTest.class.getResource("/bad-jobs/" + name + ".yaml").toURI());
            String text = Files.readString(file);
            assertFalse(validate(text).isEmpty(), "the schema rejects " + name);
            assertFalse(JobReader.read(file).ok(), "the tool rejects " + name);
        }
    }
}
