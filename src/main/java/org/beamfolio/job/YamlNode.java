package org.beamfolio.job;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.model.Location;

/** A YAML node with the place it came from, so every message can point at it. */
public sealed interface YamlNode permits YamlNode.Mapping, YamlNode.Sequence, YamlNode.Scalar {
    Location location();

    /** What this node is, in a message ("a list", "a number"). */
    String describe();

    record Mapping(Location location, Map<String, Entry> entries) implements YamlNode {
        public Mapping {
            entries = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(entries));
        }

        @Override
        public String describe() {
            return "a mapping";
        }
    }

    /** A mapping entry: its key's place and its value. */
    record Entry(String key, Location keyLocation, YamlNode value) {}

    record Sequence(Location location, List<YamlNode> items) implements YamlNode {
        public Sequence {
            items = List.copyOf(items);
        }

        @Override
        public String describe() {
            return "a list";
        }
    }

    /** A scalar as the YAML reader typed it. */
    record Scalar(Location location, String text, Kind kind) implements YamlNode {
        public enum Kind { STRING, INTEGER, FLOAT, BOOLEAN, NULL }

        @Override
        public String describe() {
            return switch (kind) {
                case STRING -> "the text \"" + text + "\"";
                case INTEGER, FLOAT -> "the bare number " + text;
                case BOOLEAN -> "the value " + text;
                case NULL -> "nothing";
            };
        }
    }
}
