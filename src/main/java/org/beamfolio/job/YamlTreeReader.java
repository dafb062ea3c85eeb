package org.beamfolio.job;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.model.Location;
import org.yaml.snakeyaml.LoaderOptions;

/**
 * Reads YAML text into {@link YamlNode}s that keep the line and column of every key and value.
 * Duplicate keys are reported rather than silently overwritten; aliases, nesting and size are
 * bounded so a hostile file cannot exhaust the machine.
 */
final class YamlTreeReader {
    static final int MAX_NESTING = 40;
    static final int MAX_ALIASES = 20;
    static final int MAX_CODE_POINTS = 8 * 1024 * 1024;

    private final YAMLFactory factory;

    YamlTreeReader() {
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(MAX_ALIASES);
        options.setNestingDepthLimit(MAX_NESTING);
        options.setCodePointLimit(MAX_CODE_POINTS);
        options.setAllowDuplicateKeys(true); // detected here, with both places named
        factory = YAMLFactory.builder()
                .loaderOptions(options)
                .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_NESTING).build())
                .build();
    }

    /** Thrown for text that is not YAML; carries the place the YAML reader stopped. */
    static final class SyntaxError extends Exception {
        final Location location;

        SyntaxError(String message, Location location) {
            super(message);
            this.location = location;
        }
    }

    YamlNode read(String text, List<Diagnostic> duplicates, String file) throws SyntaxError {
        try (YAMLParser parser = factory.createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                throw new SyntaxError("the file is empty", Location.START);
            }
            YamlNode root = readValue(parser, duplicates, file, "");
            if (parser.nextToken() != null) {
                throw new SyntaxError("more than one YAML document in the file", locationOf(parser.currentTokenLocation()));
            }
            return root;
        } catch (JsonProcessingException e) {
            JsonLocation where = e.getLocation();
            Location at = where == null ? Location.START : locationOf(where);
            String message = e.getOriginalMessage();
            if (message != null && message.contains("(TAB)")) {
                throw tabError(text, at);
            }
            throw new SyntaxError("YAML syntax: " + cleanMessage(e.getOriginalMessage()), at);
        } catch (IOException e) {
            throw new SyntaxError("could not read YAML: " + e.getMessage(), Location.START);
        } catch (RuntimeException e) {
            // the underlying YAML scanner signals its limits (aliases, nesting, size) this way
            throw new SyntaxError("YAML: " + cleanMessage(e.getMessage()), Location.START);
        }
    }

    private YamlNode readValue(YAMLParser p, List<Diagnostic> duplicates, String file, String path) throws IOException {
        JsonToken token = p.currentToken();
        Location at = locationOf(p.currentTokenLocation());
        if (p.isCurrentAlias()) {
            // refused rather than expanded: a job file is read by people, and expansion is how alias bombs work
            duplicates.add(new Diagnostic(file, at, path, "YAML aliases (*" + p.getText()
                    + ") are not accepted in job files: write the value out in full"));
            return new YamlNode.Scalar(at, "", YamlNode.Scalar.Kind.NULL);
        }
        switch (token) {
            case START_OBJECT: {
                Map<String, YamlNode.Entry> entries = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String key = p.currentName();
                    Location keyAt = locationOf(p.currentTokenLocation());
                    p.nextToken();
                    String childPath = path.isEmpty() ? key : path + "." + key;
                    YamlNode value = readValue(p, duplicates, file, childPath);
                    YamlNode.Entry earlier = entries.get(key);
                    if (earlier != null) {
                        duplicates.add(new Diagnostic(file, keyAt, childPath, "key given twice (first at line "
                                + earlier.keyLocation().line() + "); remove one"));
                    } else {
                        entries.put(key, new YamlNode.Entry(key, keyAt, value));
                    }
                }
                return new YamlNode.Mapping(at, entries);
            }
            case START_ARRAY: {
                List<YamlNode> items = new ArrayList<>();
                int index = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    items.add(readValue(p, duplicates, file, path + "[" + index++ + "]"));
                }
                return new YamlNode.Sequence(at, items);
            }
            case VALUE_STRING:
                return new YamlNode.Scalar(at, p.getText(), YamlNode.Scalar.Kind.STRING);
            case VALUE_NUMBER_INT:
                return new YamlNode.Scalar(at, p.getText(), YamlNode.Scalar.Kind.INTEGER);
            case VALUE_NUMBER_FLOAT:
                return new YamlNode.Scalar(at, p.getText(), YamlNode.Scalar.Kind.FLOAT);
            case VALUE_TRUE:
            case VALUE_FALSE:
                return new YamlNode.Scalar(at, p.getText(), YamlNode.Scalar.Kind.BOOLEAN);
            case VALUE_NULL:
                return new YamlNode.Scalar(at, "", YamlNode.Scalar.Kind.NULL);
            default:
                throw new IOException("unexpected YAML token " + token);
        }
    }

    static final String TAB_MESSAGE = "tabs are not allowed for indentation in YAML; use spaces";

    /**
     * The YAML reader refused a tab: said in plain words, at the tab. The reader stops at the tab
     * or at the end of the line before it, so the tab is the first one from there on.
     */
    private static SyntaxError tabError(String text, Location stoppedAt) {
        String[] lines = text.split("\r?\n", -1);
        for (int i = Math.max(0, stoppedAt.line() - 1); i < lines.length; i++) {
            String line = lines[i];
            int from = i == stoppedAt.line() - 1 ? Math.min(line.length(), Math.max(0, stoppedAt.column() - 1)) : 0;
            int column = line.indexOf('\t', from);
            if (column >= 0) {
                boolean indentation = line.substring(0, column).isBlank();
                return new SyntaxError(indentation ? TAB_MESSAGE : "a tab cannot stand here in YAML; use spaces",
                        new Location(i + 1, column + 1));
            }
        }
        return new SyntaxError(TAB_MESSAGE, stoppedAt);
    }

    private static Location locationOf(JsonLocation where) {
        if (where == null) {
            return Location.START;
        }
        return new Location(Math.max(1, where.getLineNr()), Math.max(1, where.getColumnNr()));
    }

    private static String cleanMessage(String message) {
        if (message == null) {
            return "unreadable";
        }
        String firstLines = message.strip();
        int cut = firstLines.indexOf("\n in 'reader'");
        if (cut > 0) {
            firstLines = firstLines.substring(0, cut);
        }
        return firstLines.replaceAll("\\s*\\n\\s*", "; ");
    }
}
