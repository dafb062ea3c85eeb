package org.beamfolio.job;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A job file as key paths and the text of their values ({@code beam.supports[1].at} to
 * {@code 20 ft}), for comparing two revisions of a job input by input.
 */
public final class Flattened {
    private Flattened() {}

    /** The flattened inputs of a job's source text (which has already been read without error). */
    public static Map<String, String> of(String text) {
        Map<String, String> out = new LinkedHashMap<>();
        try {
            YamlNode root = new YamlTreeReader().read(text, new java.util.ArrayList<>(), "");
            walk(root, "", out);
        } catch (YamlTreeReader.SyntaxError e) {
            out.put("", "(unreadable: " + e.getMessage() + ")");
        }
        return out;
    }

    private static void walk(YamlNode node, String path, Map<String, String> out) {
        if (node instanceof YamlNode.Mapping m) {
            for (YamlNode.Entry e : m.entries().values()) {
                walk(e.value(), path.isEmpty() ? e.key() : path + "." + e.key(), out);
            }
        } else if (node instanceof YamlNode.Sequence s) {
            List<YamlNode> items = s.items();
            if (items.isEmpty()) {
                out.put(path, "[]");
            }
            for (int i = 0; i < items.size(); i++) {
                walk(items.get(i), path + "[" + i + "]", out);
            }
        } else if (node instanceof YamlNode.Scalar sc) {
            out.put(path, sc.text());
        }
    }
}
