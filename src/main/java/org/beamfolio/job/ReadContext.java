package org.beamfolio.job;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.beamfolio.model.Location;
import org.beamfolio.units.Dimension;
import org.beamfolio.units.Lengths;
import org.beamfolio.units.QuantityParser;
import org.beamfolio.units.Suggest;

/**
 * What every part of the job reader shares: the file's name, the diagnostics found so far, and
 * the small typed readers that turn a located YAML node into a value or a located message.
 * A reader that finds a problem records it and returns null, so that reading goes on and every
 * mistake in the file is reported together.
 */
final class ReadContext {
    private final String file;
    private final List<Diagnostic> diagnostics = new ArrayList<>();
    private Lengths.Style lengths = Lengths.Style.FEET_AND_INCHES;

    ReadContext(String file) {
        this.file = file;
    }

    String file() {
        return file;
    }

    List<Diagnostic> diagnostics() {
        return diagnostics;
    }

    /** Messages give lengths in the job's own units from here on. */
    void writeLengthsAs(Lengths.Style style) {
        lengths = style;
    }

    /** A length (a position, a span) for a message, in the job's units. */
    String length(double metres) {
        return Lengths.describe(metres, lengths);
    }

    void error(YamlNode at, String path, String message) {
        error(at.location(), path, message);
    }

    void error(Location at, String path, String message) {
        Diagnostic d = new Diagnostic(file, at, path, message);
        // the shared blocks of a job with members are read once per member: say each mistake once
        if (!diagnostics.contains(d)) {
            diagnostics.add(d);
        }
    }

    /** A mapping, or a message saying what stood there instead. */
    Fields fields(YamlNode node, String path) {
        if (node instanceof YamlNode.Mapping m) {
            return new Fields(this, m, path);
        }
        error(node, path, "expected a mapping of keys and values, got " + node.describe());
        return null;
    }

    /**
     * One member of a job with members, read as a single-beam job would be: the shared top-level
     * keys with the member's own keys over them. A key the member gives is named by its place
     * under {@code memberPath} (members[2].beam.length), a shared one as at the top of the file.
     */
    Fields member(YamlNode.Mapping shared, YamlNode.Mapping own, String memberPath) {
        java.util.Map<String, YamlNode.Entry> entries = new java.util.LinkedHashMap<>(shared.entries());
        entries.putAll(own.entries());
        return new Fields(this, new YamlNode.Mapping(own.location(), entries), "", own.entries().keySet(), memberPath);
    }

    Optional<List<YamlNode>> list(YamlNode node, String path) {
        if (node instanceof YamlNode.Sequence s) {
            return Optional.of(s.items());
        }
        error(node, path, "expected a list, got " + node.describe());
        return Optional.empty();
    }

    /** Free text: a string, or a bare number or date that YAML typed otherwise, kept as written. */
    String text(YamlNode node, String path) {
        if (node instanceof YamlNode.Scalar s) {
            return s.kind() == YamlNode.Scalar.Kind.NULL ? "" : s.text();
        }
        error(node, path, "expected text, got " + node.describe());
        return null;
    }

    /** An identifier: non-empty text without surrounding blanks. */
    String id(YamlNode node, String path) {
        String text = text(node, path);
        if (text == null) {
            return null;
        }
        if (text.isBlank()) {
            error(node, path, "must not be empty");
            return null;
        }
        return text.strip();
    }

    Boolean bool(YamlNode node, String path) {
        if (node instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.BOOLEAN) {
            return Boolean.parseBoolean(s.text());
        }
        error(node, path, "expected true or false, got " + node.describe());
        return null;
    }

    /** A bare number, for factors and ratios. */
    Double number(YamlNode node, String path) {
        if (node instanceof YamlNode.Scalar s
                && (s.kind() == YamlNode.Scalar.Kind.INTEGER || s.kind() == YamlNode.Scalar.Kind.FLOAT)) {
            try {
                double value = Double.parseDouble(s.text());
                if (Double.isFinite(value)) {
                    return value;
                }
            } catch (NumberFormatException ignored) {
                // falls through to the message
            }
            error(node, path, "expected a finite number, got " + s.text());
            return null;
        }
        error(node, path, "expected a number, got " + node.describe());
        return null;
    }

    /** A quantity with its unit, in SI. */
    Double quantity(YamlNode node, String path, Dimension dimension) {
        if (!(node instanceof YamlNode.Scalar s) || s.kind() == YamlNode.Scalar.Kind.NULL) {
            error(node, path, "expected a " + dimension.description() + " with its unit, e.g. \"12 "
                    + org.beamfolio.units.Units.symbolsOf(dimension).get(0) + "\", got " + node.describe());
            return null;
        }
        if (s.kind() == YamlNode.Scalar.Kind.INTEGER || s.kind() == YamlNode.Scalar.Kind.FLOAT) {
            error(node, path, "a bare number is not a " + dimension.description() + ": add its unit, e.g. \""
                    + s.text() + " " + org.beamfolio.units.Units.symbolsOf(dimension).get(0) + "\"");
            return null;
        }
        QuantityParser.Result result = QuantityParser.parse(s.text(), dimension);
        if (!result.ok()) {
            error(node, path, result.error());
            return null;
        }
        return result.si();
    }

    /**
     * A line load; a pressure written where a line load belongs gets the way forward, since the
     * engineer's number is right and only the take-off is missing.
     */
    Double lineLoad(YamlNode node, String path) {
        if (node instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.STRING
                && QuantityParser.parse(s.text(), Dimension.STRESS).ok()) {
            error(node, path, "\"" + s.text().strip() + "\" is a pressure, not a line load: use type: area with a width"
                    + " (and the pressure under area_loads), or multiply by a tributary width");
            return null;
        }
        return quantity(node, path, Dimension.FORCE_PER_LENGTH);
    }

    /** A pressure (an area load); a line load written where a pressure belongs gets the way forward. */
    Double pressure(YamlNode node, String path) {
        if (node instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.STRING
                && QuantityParser.parse(s.text(), Dimension.FORCE_PER_LENGTH).ok()) {
            error(node, path, "\"" + s.text().strip() + "\" is a line load, not a pressure: divide by the tributary width"
                    + " to give a pressure (psf, ksf, Pa, kPa), or put it under loads with type: uniform");
            return null;
        }
        return quantity(node, path, Dimension.STRESS);
    }

    /** A quantity that must be greater than zero. */
    Double positive(YamlNode node, String path, Dimension dimension) {
        Double value = quantity(node, path, dimension);
        if (value != null && !(value > 0)) {
            error(node, path, "must be greater than zero, got " + text(node, path));
            return null;
        }
        return value;
    }

    /** One of a closed set of words, with a suggestion when it is near one. */
    String choice(YamlNode node, String path, List<String> allowed) {
        String text = text(node, path);
        if (text == null) {
            return null;
        }
        for (String option : allowed) {
            if (option.equalsIgnoreCase(text.strip())) {
                return option;
            }
        }
        String hint = Suggest.closest(text, allowed).map(s -> "; did you mean \"" + s + "\"?").orElse("");
        error(node, path, "unknown value \"" + text + "\"" + hint + " (one of: " + String.join(", ", allowed) + ")");
        return null;
    }

    /** The keys of one mapping, with required and optional look-ups and a check for unknown keys. */
    static final class Fields {
        private final ReadContext context;
        private final YamlNode.Mapping mapping;
        private final String path;
        private final Set<String> known = new LinkedHashSet<>();
        /** Keys a member gives itself in a job with members, named under {@link #ownPath}. */
        private final Set<String> own;
        private final String ownPath;

        private Fields(ReadContext context, YamlNode.Mapping mapping, String path) {
            this(context, mapping, path, Set.of(), null);
        }

        private Fields(ReadContext context, YamlNode.Mapping mapping, String path, Set<String> own, String ownPath) {
            this.context = context;
            this.mapping = mapping;
            this.path = path;
            this.own = Set.copyOf(own);
            this.ownPath = ownPath;
        }

        YamlNode.Mapping node() {
            return mapping;
        }

        String path(String key) {
            if (own.contains(key) || (ownPath != null && !mapping.entries().containsKey(key))) {
                return ownPath + "." + key;
            }
            return path.isEmpty() ? key : path + "." + key;
        }

        String path() {
            return path;
        }

        YamlNode optional(String key) {
            known.add(key);
            YamlNode.Entry entry = mapping.entries().get(key);
            if (entry == null || (entry.value() instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.NULL)) {
                return null;
            }
            return entry.value();
        }

        YamlNode required(String key) {
            YamlNode value = optional(key);
            if (value == null) {
                context.error(mapping, path(key), "missing: this " + (ownPath != null ? "member" : path.isEmpty() ? "file" : "entry")
                        + " needs a \"" + key + "\"");
            }
            return value;
        }

        boolean has(String key) {
            return optional(key) != null;
        }

        /**
         * As {@link #rejectUnknown(String...)}, for a block whose reader declares the keys it
         * accepts ({@code declared}, the set the JSON Schema is tested against): a key asked for
         * or allowed here that the declaration lacks is a mistake in the reader, and fails at once.
         */
        void rejectUnknown(Set<String> declared, String... alsoAllowed) {
            Set<String> read = new LinkedHashSet<>(known);
            read.addAll(List.of(alsoAllowed));
            read.removeAll(declared);
            if (!read.isEmpty()) {
                throw new IllegalStateException(path + ": the reader reads " + read + " but does not declare them among " + declared);
            }
            rejectUnknown(alsoAllowed);
        }

        /** Reports every key not asked for, with the nearest known key as a suggestion. */
        void rejectUnknown(String... alsoAllowed) {
            known.addAll(List.of(alsoAllowed));
            for (YamlNode.Entry entry : mapping.entries().values()) {
                if (!known.contains(entry.key())) {
                    String hint = Suggest.closest(entry.key(), known).map(s -> "; did you mean \"" + s + "\"?").orElse("");
                    if (hint.isEmpty() && entry.key().contains(" ")) {
                        // in { a: b, c } a comma inside unquoted text starts a new key
                        hint = "; a comma in the text before it may have split that value: put text with commas in quotes";
                    }
                    context.error(entry.keyLocation(), path(entry.key()), "unknown key" + hint
                            + " (allowed here: " + String.join(", ", known) + ")");
                }
            }
        }
    }
}
