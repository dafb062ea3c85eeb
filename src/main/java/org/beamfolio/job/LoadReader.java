package org.beamfolio.job;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Load;
import org.beamfolio.units.Dimension;

/** Reads the loads: point forces, couples, uniform and linearly varying line loads. */
final class LoadReader {
    static final int MAX_LOADS = 20000;

    private LoadReader() {}

    static List<Load> readAll(ReadContext c, YamlNode node, Beam beam) {
        List<Load> result = new ArrayList<>();
        List<YamlNode> items = JobReader.listOrEmpty(c, node, "loads");
        if (items == null) {
            return result;
        }
        if (items.size() > MAX_LOADS) {
            c.error(node, "loads", "too many loads: " + items.size() + " (at most " + MAX_LOADS + ")");
            return result;
        }
        Double length = beam == null ? null : beam.length();
        for (int i = 0; i < items.size(); i++) {
            Load load = read(c, items.get(i), "loads[" + i + "]", length);
            if (load != null) {
                result.add(load);
            }
        }
        return result;
    }

    private static Load read(ReadContext c, YamlNode node, String path, Double length) {
        ReadContext.Fields f = c.fields(node, path);
        if (f == null) {
            return null;
        }
        YamlNode caseNode = f.required("case");
        String loadCase = caseNode == null ? null : c.id(caseNode, f.path("case"));
        YamlNode noteNode = f.optional("note");
        String note = noteNode == null ? "" : c.text(noteNode, f.path("note"));
        YamlNode typeNode = f.required("type");
        String type = typeNode == null ? null : c.choice(typeNode, f.path("type"), List.of("point", "moment", "uniform", "linear"));
        if (type == null) {
            f.rejectUnknown("P", "M", "w", "at", "from", "to", "sense");
            return null;
        }
        Load load = switch (type) {
            case "point" -> point(c, f, loadCase, note, length, node.location());
            case "moment" -> couple(c, f, loadCase, note, length, node.location());
            case "uniform" -> uniform(c, f, loadCase, note, length, node.location());
            default -> linear(c, f, loadCase, note, length, node.location());
        };
        f.rejectUnknown();
        return loadCase == null || note == null ? null : load;
    }

    private static Double at(ReadContext c, ReadContext.Fields f, Double length) {
        YamlNode n = f.required("at");
        return n == null ? null : BeamReader.position(c, n, f.path("at"), length);
    }

    private static Load point(ReadContext c, ReadContext.Fields f, String loadCase, String note, Double length, Location where) {
        YamlNode pNode = f.required("P");
        Double p = pNode == null ? null : c.quantity(pNode, f.path("P"), Dimension.FORCE);
        Double at = at(c, f, length);
        return p == null || at == null ? null : new Load.Point(loadCase, p, at, note, where);
    }

    private static Load couple(ReadContext c, ReadContext.Fields f, String loadCase, String note, Double length, Location where) {
        YamlNode mNode = f.required("M");
        Double m = mNode == null ? null : c.quantity(mNode, f.path("M"), Dimension.MOMENT);
        Double at = at(c, f, length);
        YamlNode senseNode = f.required("sense");
        String sense = senseNode == null ? null : c.choice(senseNode, f.path("sense"), List.of("cw", "ccw"));
        if (m == null || at == null || sense == null) {
            return null;
        }
        return new Load.Couple(loadCase, sense.equals("ccw") ? m : -m, at, note, where);
    }

    private static Load uniform(ReadContext c, ReadContext.Fields f, String loadCase, String note, Double length, Location where) {
        YamlNode wNode = f.required("w");
        Double w = wNode == null ? null : c.quantity(wNode, f.path("w"), Dimension.FORCE_PER_LENGTH);
        Double[] range = range(c, f, length, false);
        if (w == null || range == null) {
            return null;
        }
        return new Load.Distributed(loadCase, w, w, range[0], range[1], true, note, where);
    }

    private static Load linear(ReadContext c, ReadContext.Fields f, String loadCase, String note, Double length, Location where) {
        YamlNode wNode = f.required("w");
        Double start = null;
        Double end = null;
        if (wNode != null) {
            List<YamlNode> ends = c.list(wNode, f.path("w")).orElse(null);
            if (ends != null && ends.size() != 2) {
                c.error(wNode, f.path("w"), "a linear load needs two intensities, [start, end]; got " + ends.size());
            } else if (ends != null) {
                start = c.quantity(ends.get(0), f.path("w") + "[0]", Dimension.FORCE_PER_LENGTH);
                end = c.quantity(ends.get(1), f.path("w") + "[1]", Dimension.FORCE_PER_LENGTH);
            }
        }
        Double[] range = range(c, f, length, true);
        if (start == null || end == null || range == null) {
            return null;
        }
        return new Load.Distributed(loadCase, start, end, range[0], range[1], false, note, where);
    }

    /** from and to; for a uniform load both may be left out (the whole beam) or either one. */
    private static Double[] range(ReadContext c, ReadContext.Fields f, Double length, boolean required) {
        YamlNode fromNode = required ? f.required("from") : f.optional("from");
        YamlNode toNode = required ? f.required("to") : f.optional("to");
        Double from = fromNode == null ? (required ? null : Double.valueOf(0)) : BeamReader.position(c, fromNode, f.path("from"), length);
        Double to = toNode == null ? (required || length == null ? null : length) : BeamReader.position(c, toNode, f.path("to"), length);
        if (from == null || to == null) {
            return null;
        }
        if (!(to - from > BeamReader.samePoint(length))) {
            YamlNode at = toNode != null ? toNode : f.node();
            c.error(at, f.path("to"), "the range is reversed or empty: \"to\" must be greater than \"from\"");
            return null;
        }
        return new Double[] {from, to};
    }
}
