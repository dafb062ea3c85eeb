package org.beamfolio.job;

import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;

/**
 * The ids one part of the file defines (materials, sections, load cases), told apart from the ids
 * it names but could not read. A reference to an id whose definition already has its own message,
 * or into a part that could not be read at all, is not reported again: the follow-on message
 * would point at the wrong line, and following its advice could make the job wrong.
 *
 * @param read what read cleanly, by id
 * @param named every id the part names, read cleanly or not
 * @param complete false when the part itself could not be read, so any id may be among its failures
 */
record Defined<T>(Map<String, T> read, Set<String> named, boolean complete) {
    /** A part whose ids are the keys of a mapping (materials, sections). */
    static <T> Defined<T> keysOf(YamlNode node, Map<String, T> read) {
        if (node instanceof YamlNode.Mapping m) {
            return new Defined<>(read, new LinkedHashSet<>(m.entries().keySet()), true);
        }
        return new Defined<>(read, Set.of(), false);
    }

    Set<String> ids() {
        return read.keySet();
    }

    boolean has(String id) {
        return read.containsKey(id);
    }

    T get(String id) {
        return read.get(id);
    }

    /** Whether a reference to this id cannot be judged because of a failure reported elsewhere. */
    boolean failed(String id) {
        return !has(id) && (!complete || named.contains(id));
    }
}
