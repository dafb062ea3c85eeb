package org.beamfolio.job;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.beamfolio.loads.AreaLoad;
import org.beamfolio.loads.TakeOff;

/**
 * Reads {@code area_loads}: by name, a pressure per load case, the cases that may be reduced
 * ({@code reducible}), whether the floor is an assembly use ({@code assembly}) and a note.
 * Every other key of an area load is a load case id.
 */
final class AreaLoadReader {
    /** The keys of an area load that are not load cases. */
    static final List<String> RESERVED = List.of("reducible", "assembly", "note");

    private AreaLoadReader() {}

    static Defined<AreaLoad> readAll(ReadContext c, YamlNode node) {
        Map<String, AreaLoad> result = new LinkedHashMap<>();
        if (node == null) {
            return new Defined<>(result, Set.of(), true);
        }
        ReadContext.Fields all = c.fields(node, "area_loads");
        if (all == null) {
            return new Defined<>(result, Set.of(), false);
        }
        for (YamlNode.Entry entry : all.node().entries().values()) {
            all.optional(entry.key());
            AreaLoad load = read(c, entry.key(), entry.value(), all.path(entry.key()));
            if (load != null) {
                result.put(entry.key(), load);
            }
        }
        return Defined.keysOf(node, result);
    }

    private static AreaLoad read(ReadContext c, String name, YamlNode node, String path) {
        ReadContext.Fields f = c.fields(node, path);
        if (f == null) {
            return null;
        }
        boolean ok = true;
        Map<String, Double> pressures = new LinkedHashMap<>();
        for (YamlNode.Entry e : f.node().entries().values()) {
            if (RESERVED.contains(e.key())) {
                continue;
            }
            f.optional(e.key());
            Double p = c.pressure(e.value(), f.path(e.key()));
            if (p == null) {
                ok = false;
            } else {
                pressures.put(e.key(), p);
            }
        }
        if (ok && pressures.isEmpty()) {
            c.error(node, path, "an area load needs a pressure for at least one load case, e.g. { D: 15 psf, L: 50 psf }");
            ok = false;
        }
        Set<String> reducible = new LinkedHashSet<>();
        YamlNode reducibleNode = f.optional("reducible");
        if (reducibleNode != null) {
            List<YamlNode> items = c.list(reducibleNode, f.path("reducible")).orElse(null);
            ok &= items != null && reducible(c, items, f.path("reducible"), f, pressures.keySet(), reducible);
        }
        YamlNode assemblyNode = f.optional("assembly");
        Boolean assembly = assemblyNode == null ? Boolean.FALSE : c.bool(assemblyNode, f.path("assembly"));
        YamlNode noteNode = f.optional("note");
        String note = noteNode == null ? "" : c.text(noteNode, f.path("note"));
        return ok && assembly != null && note != null ? new AreaLoad(name, pressures, reducible, assembly, note) : null;
    }

    /** The reducible cases: live load cases the area load has a pressure for. */
    private static boolean reducible(ReadContext c, List<YamlNode> items, String path, ReadContext.Fields f,
                                     Set<String> cases, Set<String> into) {
        boolean ok = true;
        // a case whose pressure failed to read is still the area load's: its own message says why
        Set<String> named = new LinkedHashSet<>(f.node().entries().keySet());
        named.removeAll(RESERVED);
        for (int i = 0; i < items.size(); i++) {
            String id = c.id(items.get(i), path + "[" + i + "]");
            if (id == null) {
                ok = false;
                continue;
            }
            if (!named.contains(id)) {
                c.error(items.get(i), path + "[" + i + "]", "this area load has no pressure for case \"" + id + "\" to reduce"
                        + org.beamfolio.units.Suggest.closest(id, named).map(s -> "; did you mean \"" + s + "\"?").orElse("")
                        + " (its cases: " + String.join(", ", named) + ")");
                ok = false;
            } else if (!id.equals(TakeOff.FLOOR_LIVE) && !id.equals(TakeOff.ROOF_LIVE)) {
                c.error(items.get(i), path + "[" + i + "]", "case \"" + id + "\" cannot be reduced: only live load is,"
                        + " L by ASCE/SEI 7-22 4.7 and Lr by 4.8");
                ok = false;
            } else if (cases.contains(id)) {
                into.add(id);
            }
        }
        return ok;
    }
}
