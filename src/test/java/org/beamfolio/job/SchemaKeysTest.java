package org.beamfolio.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The JSON Schema shipped for editors names, block by block, exactly the keys its reader accepts:
 * the reader's own declared keys (which it uses to reject any other) against the properties of the
 * schema's object for that block, its alternatives (oneOf) taken together.
 */
class SchemaKeysTest {
    static final JsonNode SCHEMA = read();

    static JsonNode read() {
        try (InputStream in = SchemaKeysTest.class.getResourceAsStream("/schema/job-format-1.schema.json")) {
            return new ObjectMapper().readTree(in);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static Stream<Arguments> blocks() {
        return Stream.of(
                Arguments.of("top level", "", JobReader.TOP_KEYS),
                Arguments.of("project", "/properties/project", ProjectReader.PROJECT_KEYS),
                Arguments.of("project.history[]", "/properties/project/properties/history/items", ProjectReader.HISTORY_KEYS),
                Arguments.of("report", "/properties/report", ProjectReader.REPORT_KEYS),
                Arguments.of("beam", "/properties/beam", BeamReader.BEAM_KEYS),
                Arguments.of("beam.supports[]", "/definitions/support", BeamReader.SUPPORT_KEYS),
                Arguments.of("beam.segments[]", "/properties/beam/properties/segments/items", BeamReader.SEGMENT_KEYS),
                Arguments.of("beam.bracing", "/properties/beam/properties/bracing", BeamReader.BRACING_KEYS),
                Arguments.of("materials.<id>, steel or other", "/definitions/material/oneOf/0", JobReader.MATERIAL_KEYS),
                Arguments.of("materials.<id>.allowable", "/definitions/material/oneOf/0/properties/allowable", JobReader.ALLOWABLE_KEYS),
                Arguments.of("materials.<id>, timber", "/definitions/material/oneOf/1", TimberMaterialReader.KEYS),
                Arguments.of("sections.<id>", "/definitions/section", SectionReader.SECTION_KEYS),
                Arguments.of("sections.<id>.plates[]", "/definitions/section/oneOf/*/properties/plates/items", SectionReader.PLATE_KEYS),
                Arguments.of("sections.<id>.choose (family)", "/definitions/section/oneOf/*/properties/choose/oneOf/1", ChoiceReader.FAMILY_KEYS),
                Arguments.of("sections.<id>.choose (lumber)", "/definitions/section/oneOf/*/properties/choose/oneOf/2", ChoiceReader.LUMBER_KEYS),
                Arguments.of("sections.<id>.choose (glulam)", "/definitions/section/oneOf/*/properties/choose/oneOf/3", ChoiceReader.GLULAM_KEYS),
                Arguments.of("loads[]", "/definitions/load", LoadReader.LOAD_KEYS),
                Arguments.of("members[]", "/properties/members/items", MembersReader.MEMBER_KEYS),
                Arguments.of("combinations[]", "/properties/combinations/oneOf/1/items", CombinationReader.COMBINATION_KEYS),
                Arguments.of("checks", "/properties/checks", CombinationReader.CHECKS_KEYS),
                Arguments.of("checks.deflection[]", "/properties/checks/properties/deflection/items", CombinationReader.DEFLECTION_KEYS),
                Arguments.of("design", "/properties/design", DesignReader.DESIGN_KEYS),
                Arguments.of("design.live_load_reduction", "/properties/design/properties/live_load_reduction/oneOf/1", DesignReader.LIVE_LOAD_REDUCTION_KEYS),
                Arguments.of("design.roof_live_load_reduction", "/properties/design/properties/roof_live_load_reduction/oneOf/1", DesignReader.ROOF_LIVE_LOAD_REDUCTION_KEYS),
                Arguments.of("design.timber_service", "/properties/design/properties/timber_service", TimberDesignReader.SERVICE_KEYS));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("blocks")
    void theSchemaNamesExactlyTheKeysTheReaderAccepts(String block, String pointer, Set<String> readerKeys) {
        JsonNode node = at(SCHEMA, pointer);
        assertFalse(node.isMissingNode(), pointer + " is not in the schema");
        assertEquals(new TreeSet<>(readerKeys), properties(node), block + ": the reader's keys against the schema's " + pointer);
    }

    /** The node at a JSON pointer, where {@code oneOf/*} stands for the first alternative that has the rest. */
    static JsonNode at(JsonNode root, String pointer) {
        int star = pointer.indexOf("/oneOf/*");
        if (star < 0) {
            return root.at(pointer);
        }
        String rest = pointer.substring(star + "/oneOf/*".length());
        for (JsonNode alternative : root.at(pointer.substring(0, star) + "/oneOf")) {
            JsonNode found = alternative.at(rest);
            if (!found.isMissingNode()) {
                return found;
            }
        }
        return root.at(pointer.substring(0, star) + "/oneOf/missing");
    }

    /** The properties an object of the schema allows: its own and those of each of its alternatives. */
    static Set<String> properties(JsonNode node) {
        Set<String> keys = new TreeSet<>();
        node.path("properties").fieldNames().forEachRemaining(keys::add);
        for (JsonNode alternative : node.path("oneOf")) {
            alternative.path("properties").fieldNames().forEachRemaining(keys::add);
        }
        return keys;
    }
}
