package org.beamfolio.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.beamfolio.loads.AreaLoad;
import org.beamfolio.loads.ReductionSettings;
import org.beamfolio.loads.TakeOff;
import org.beamfolio.loads.Tributary;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Load;
import org.beamfolio.model.Location;
import org.beamfolio.model.ReactionLoad;
import org.beamfolio.units.Dimension;

/**
 * Reads the loads: point forces, couples, uniform and linearly varying line loads, and area loads
 * over a tributary width, which the take-off turns into line loads (reduced where the job asks).
 */
final class LoadReader {
    /** The keys of one load, of any type (each type reads its own of them): the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> LOAD_KEYS = Set.of("type", "case", "note", "P", "M", "w", "at", "from", "to", "sense", "load", "width", "bearing",
            "member", "support", "spacing");

    static final int MAX_LOADS = 20000;

    private LoadReader() {}

    /**
     * The member's loads in the order written (an area load's line loads where it stood), their
     * take-off, and the reactions of other members it carries (brought in once those are solved).
     */
    record Read(List<Load> loads, TakeOff takeOff, List<ReactionLoad> reactions) {}

    /** A member whose reactions another member of the job may carry: how many supports it has. */
    record Supporting(String id, int supports) {}

    /** One entry of the list: a load, an area load on a width still to be taken off, or a reaction to bring in. */
    private record Entry(Load load, Tributary tributary, ReactionLoad reaction, Location where) {
        Entry(Load load, Tributary tributary, Location where) {
            this(load, tributary, null, where);
        }
    }

    /**
     * @param path the loads' key path ("loads", or "members[1].loads" for a member)
     * @param members the members whose reactions this one may carry, read so far; null for a
     *        single-beam job, which carries none
     */
    static Read readAll(ReadContext c, YamlNode node, String path, Beam beam, Defined<AreaLoad> areaLoads,
                        ReductionSettings reductions, Defined<Supporting> members) {
        List<Load> result = new ArrayList<>();
        List<ReactionLoad> reactions = new ArrayList<>();
        List<YamlNode> items = JobReader.listOrEmpty(c, node, path);
        if (items == null) {
            return new Read(result, TakeOff.EMPTY, reactions);
        }
        if (items.size() > MAX_LOADS) {
            c.error(node, path, "too many loads: " + items.size() + " (at most " + MAX_LOADS + ")");
            return new Read(result, TakeOff.EMPTY, reactions);
        }
        Double length = beam == null ? null : beam.length();
        List<Entry> entries = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Entry entry = read(c, items.get(i), path + "[" + i + "]", length, areaLoads, members);
            if (entry != null) {
                entries.add(entry);
            }
        }
        List<Tributary> tributaries = entries.stream().map(Entry::tributary).filter(java.util.Objects::nonNull).toList();
        TakeOff takeOff = reductions == null ? TakeOff.EMPTY : TakeOff.of(tributaries, reductions);
        int application = -1;
        for (Entry e : entries) {
            if (e.load() != null) {
                result.add(e.load());
                continue;
            }
            if (e.reaction() != null) {
                ReactionLoad r = e.reaction();
                reactions.add(new ReactionLoad(r.member(), r.support(), r.at(), r.spacing(), r.from(), r.to(), r.note(),
                        r.where(), result.size()));
                continue;
            }
            application++;
            for (TakeOff.Line line : takeOff.lines()) {
                if (line.application() == application) { // the take-off numbers applications in the same order
                    result.add(new Load.Distributed(line.loadCase(), line.wStart(), line.wEnd(), e.tributary().from(),
                            e.tributary().to(), !e.tributary().varying(), noteOf(e.tributary()), e.where()));
                }
            }
        }
        return new Read(result, takeOff, reactions);
    }

    /** The note a line load from an area load carries: where it came from, and the engineer's words. */
    private static String noteOf(Tributary t) {
        StringBuilder note = new StringBuilder("area load ").append(t.load().name());
        for (String words : List.of(t.load().note(), t.note())) {
            if (!words.isBlank()) {
                note.append(note.indexOf(":") < 0 ? ": " : "; ").append(words);
            }
        }
        return note.toString();
    }

    private static Entry read(ReadContext c, YamlNode node, String path, Double length, Defined<AreaLoad> areaLoads,
                              Defined<Supporting> members) {
        ReadContext.Fields f = c.fields(node, path);
        if (f == null) {
            return null;
        }
        YamlNode typeNode = f.required("type");
        String type = typeNode == null ? null : c.choice(typeNode, f.path("type"),
                List.of("point", "moment", "uniform", "linear", "area", "reaction"));
        if ("area".equals(type)) {
            return area(c, f, length, areaLoads);
        }
        if ("reaction".equals(type)) {
            if (members == null) {
                c.error(typeNode, f.path("type"), "a reaction load brings another member's reaction: it belongs to a job with"
                        + " members (write the load as type: point or uniform here)");
                f.rejectUnknown(LOAD_KEYS, "member", "support", "at", "spacing", "from", "to", "note", "case");
                return null;
            }
            ReactionLoad reaction = ReactionLoadReader.read(c, f, length, members);
            return reaction == null ? null : new Entry(null, null, reaction, node.location());
        }
        if (f.has("member") || f.has("support") || f.has("spacing")) {
            YamlNode.Entry first = f.node().entries().values().stream()
                    .filter(e -> List.of("member", "support", "spacing").contains(e.key())).findFirst().orElseThrow();
            c.error(first.keyLocation(), f.path(first.key()), "member, support and spacing belong to a reaction load:"
                    + " write type: reaction to bring another member's reaction");
        }
        YamlNode caseNode = f.required("case");
        String loadCase = caseNode == null ? null : c.id(caseNode, f.path("case"));
        YamlNode noteNode = f.optional("note");
        String note = noteNode == null ? "" : c.text(noteNode, f.path("note"));
        if (type == null) {
            f.rejectUnknown(LOAD_KEYS, "P", "M", "w", "at", "from", "to", "sense", "load", "width", "bearing", "member",
                    "support", "spacing");
            return null;
        }
        if (f.has("width") || f.has("load")) {
            // the engineer meant an area load: say how to write one, not what is wrong with w
            c.error(f.node(), f.path("type"), "a tributary width belongs to an area load: write type: area, load: <a name under"
                    + " area_loads, which holds the pressure>, width: ...; or give the line load w without a width");
            f.rejectUnknown(LOAD_KEYS, "P", "M", "w", "at", "from", "to", "sense", "bearing", "member", "support", "spacing");
            return null;
        }
        Load load = switch (type) {
            case "point" -> point(c, f, loadCase, note, length, node.location());
            case "moment" -> couple(c, f, loadCase, note, length, node.location());
            case "uniform" -> uniform(c, f, loadCase, note, length, node.location());
            default -> linear(c, f, loadCase, note, length, node.location());
        };
        f.rejectUnknown(LOAD_KEYS, "member", "support", "spacing");
        return loadCase == null || note == null || load == null ? null : new Entry(load, null, node.location());
    }

    /** An area load over a tributary width, constant or varying linearly over from..to (default the whole beam). */
    private static Entry area(ReadContext c, ReadContext.Fields f, Double length, Defined<AreaLoad> areaLoads) {
        if (f.has("case")) {
            c.error(f.node().entries().get("case").keyLocation(), f.path("case"), "an area load takes its cases from its"
                    + " entry under area_loads: leave case out here");
        }
        if (f.has("w")) {
            c.error(f.node().entries().get("w").keyLocation(), f.path("w"), "an area load's pressure is given under area_loads"
                    + " and multiplied by the width here: leave w out, or use type: uniform for a line load");
        }
        String name = BeamReader.reference(c, f, "load", areaLoads, "area_loads", true);
        YamlNode noteNode = f.optional("note");
        String note = noteNode == null ? "" : c.text(noteNode, f.path("note"));
        Double[] widths = widths(c, f);
        Double[] range = range(c, f, length, false);
        f.rejectUnknown(LOAD_KEYS, "case", "w", "member", "support", "spacing");
        if (name == null || note == null || widths == null || range == null || f.has("case") || f.has("w")) {
            return null;
        }
        return new Entry(null, new Tributary(areaLoads.get(name), widths[0], widths[1], range[0], range[1], note), f.node().location());
    }

    /** width: one length, or [start, end] varying linearly; never negative, not zero throughout. */
    private static Double[] widths(ReadContext c, ReadContext.Fields f) {
        YamlNode node = f.required("width");
        if (node == null) {
            return null;
        }
        if (node instanceof YamlNode.Sequence s) {
            if (s.items().size() != 2) {
                c.error(node, f.path("width"), "a varying tributary width needs two widths, [start, end]; got " + s.items().size());
                return null;
            }
            Double start = c.quantity(s.items().get(0), f.path("width") + "[0]", Dimension.LENGTH);
            Double end = c.quantity(s.items().get(1), f.path("width") + "[1]", Dimension.LENGTH);
            if (start == null || end == null) {
                return null;
            }
            if (start < 0 || end < 0 || start + end == 0) {
                c.error(node, f.path("width"), "tributary widths must not be negative, nor both zero");
                return null;
            }
            return new Double[] {start, end};
        }
        Double width = c.positive(node, f.path("width"), Dimension.LENGTH);
        return width == null ? null : new Double[] {width, width};
    }

    static Double at(ReadContext c, ReadContext.Fields f, Double length) {
        YamlNode n = f.required("at");
        return n == null ? null : BeamReader.position(c, n, f.path("at"), length);
    }

    private static Load point(ReadContext c, ReadContext.Fields f, String loadCase, String note, Double length, Location where) {
        YamlNode pNode = f.required("P");
        Double p = pNode == null ? null : c.quantity(pNode, f.path("P"), Dimension.FORCE);
        Double at = at(c, f, length);
        YamlNode bearingNode = f.optional("bearing");
        Double bearing = bearingNode == null ? null : c.positive(bearingNode, f.path("bearing"), Dimension.LENGTH);
        if (bearingNode != null && bearing == null) {
            return null;
        }
        return p == null || at == null ? null : new Load.Point(loadCase, p, at, note, where, bearing);
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
        Double w = wNode == null ? null : c.lineLoad(wNode, f.path("w"));
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
                start = c.lineLoad(ends.get(0), f.path("w") + "[0]");
                end = c.lineLoad(ends.get(1), f.path("w") + "[1]");
            }
        }
        Double[] range = range(c, f, length, true);
        if (start == null || end == null || range == null) {
            return null;
        }
        return new Load.Distributed(loadCase, start, end, range[0], range[1], false, note, where);
    }

    /** from and to; for a uniform load both may be left out (the whole beam) or either one. */
    static Double[] range(ReadContext c, ReadContext.Fields f, Double length, boolean required) {
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
