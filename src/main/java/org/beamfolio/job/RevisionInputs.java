package org.beamfolio.job;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.beamfolio.model.InputChange;

/**
 * The inputs that changed between two revisions of a job file. Loads are matched by what they
 * are (case, type and position), not by their place in the list, so inserting a load shows as
 * one new load rather than as every later load changed.
 */
public final class RevisionInputs {
    private static final Pattern LOAD_ITEM = Pattern.compile("^(.*?loads)\\[(\\d+)\\](.*)$");

    private RevisionInputs() {}

    public static List<InputChange> between(String beforeText, String nowText) {
        Map<String, String> before = byIdentity(Flattened.of(beforeText));
        Map<String, String> now = byIdentity(Flattened.of(nowText));
        Set<String> keys = new LinkedHashSet<>(before.keySet());
        keys.addAll(now.keySet());
        List<InputChange> changes = new ArrayList<>();
        for (String key : keys) {
            String old = before.get(key);
            String neu = now.get(key);
            if (old == null || !old.equals(neu)) {
                changes.add(new InputChange(key, old, neu));
            }
        }
        return changes;
    }

    /** The flattened inputs with each load's list index replaced by its identity. */
    static Map<String, String> byIdentity(Map<String, String> flat) {
        Map<String, Map<String, String>> loads = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : flat.entrySet()) {
            Matcher m = LOAD_ITEM.matcher(e.getKey());
            if (m.matches() && m.group(3).startsWith(".")) {
                loads.computeIfAbsent(m.group(1) + "[" + m.group(2) + "]", k -> new LinkedHashMap<>())
                        .put(m.group(3).substring(1), e.getValue());
            }
        }
        Map<String, String> names = new HashMap<>();
        Map<String, Integer> seen = new HashMap<>();
        for (Map.Entry<String, Map<String, String>> load : loads.entrySet()) {
            String list = load.getKey().substring(0, load.getKey().lastIndexOf('['));
            String identity = list + "[" + identity(load.getValue()) + "]";
            int n = seen.merge(identity, 1, Integer::sum);
            names.put(load.getKey(), n == 1 ? identity : identity.substring(0, identity.length() - 1) + " #" + n + "]");
        }
        Map<String, String> out = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : flat.entrySet()) {
            Matcher m = LOAD_ITEM.matcher(e.getKey());
            String item = m.matches() ? m.group(1) + "[" + m.group(2) + "]" : null;
            out.put(item != null && names.containsKey(item) ? names.get(item) + m.group(3) : e.getKey(), e.getValue());
        }
        return out;
    }

    private static String identity(Map<String, String> fields) {
        StringBuilder s = new StringBuilder();
        append(s, fields.get("case"));
        append(s, fields.get("type"));
        append(s, fields.get("load"));
        append(s, fields.get("member"));
        if (fields.containsKey("at")) {
            append(s, "at " + fields.get("at"));
        }
        if (fields.containsKey("from") || fields.containsKey("to")) {
            append(s, fields.getOrDefault("from", "start") + " to " + fields.getOrDefault("to", "end"));
        }
        return s.toString();
    }

    private static void append(StringBuilder s, String part) {
        if (part != null) {
            if (s.length() > 0) {
                s.append(' ');
            }
            s.append(part);
        }
    }
}
