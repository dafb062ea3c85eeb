package org.beamfolio.job;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Bracing;
import org.beamfolio.model.Hinge;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.Segment;
import org.beamfolio.model.Support;
import org.beamfolio.model.SupportKind;
import org.beamfolio.units.Dimension;
import org.beamfolio.units.Suggest;

/** Reads the beam: its length, section and material, supports, hinges and segments. */
final class BeamReader {
    /** The keys of the beam block: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> BEAM_KEYS = Set.of("length", "section", "material", "supports", "hinges", "segments", "bracing", "self_weight");

    /** The keys of one support (k and kr for a spring only): the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> SUPPORT_KEYS = Set.of("at", "type", "k", "kr", "bearing");

    /** The keys of the beam's bracing: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> BRACING_KEYS = Set.of("top", "bottom");

    /** The keys of one segment of the beam: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> SEGMENT_KEYS = Set.of("from", "to", "section", "material");

    /** Positions closer than this fraction of the beam length are the same point. */
    static final double SAME_POINT = 1e-9;
    static final int MAX_SUPPORTS = 2001;

    private BeamReader() {}

    /** @param path the beam's key path ("beam", or "members[1].beam" for a member) */
    static Beam read(ReadContext c, YamlNode node, String path, Defined<Material> materials, Defined<Section> sections) {
        if (node == null) {
            return null;
        }
        ReadContext.Fields f = c.fields(node, path);
        if (f == null) {
            return null;
        }
        YamlNode lengthNode = f.required("length");
        Double length = lengthNode == null ? null : c.positive(lengthNode, f.path("length"), Dimension.LENGTH);
        String section = reference(c, f, "section", sections, "sections", true);
        String material = reference(c, f, "material", materials, "materials", true);
        List<Support> supports = supports(c, f, length);
        List<Hinge> hinges = hinges(c, f, length, supports);
        List<Segment> segments = segments(c, f, length, sections, materials);
        Bracing bracing = bracing(c, f, length);
        YamlNode sw = f.optional("self_weight");
        String selfWeight = sw == null ? null : c.id(sw, f.path("self_weight"));
        if (selfWeight != null && section != null && material != null) {
            for (String m : usedMaterials(material, segments)) {
                if (materials.has(m) && materials.get(m).weightDensity() == null) {
                    c.error(sw, f.path("self_weight"), "self weight needs a density: material \"" + m + "\" has none");
                }
            }
            for (String id : usedSections(section, segments)) {
                if (sections.get(id) != null && sections.get(id).shape() instanceof SectionShape.Given g && g.A() == null) {
                    c.error(sw, f.path("self_weight"), "self weight needs the area: section \"" + id + "\" gives no A");
                }
            }
        }
        f.rejectUnknown(BEAM_KEYS);
        if (length == null || section == null || material == null || supports == null || hinges == null || segments == null
                || bracing == null) {
            return null;
        }
        return new Beam(length, section, material, supports, hinges, segments, selfWeight, bracing);
    }

    private static List<String> usedSections(String section, List<Segment> segments) {
        List<String> result = new ArrayList<>(List.of(section));
        if (segments != null) {
            segments.forEach(s -> result.add(s.section()));
        }
        return result;
    }

    private static List<String> usedMaterials(String material, List<Segment> segments) {
        List<String> result = new ArrayList<>(List.of(material));
        if (segments != null) {
            segments.forEach(s -> result.add(s.material()));
        }
        return result;
    }

    static String reference(ReadContext c, ReadContext.Fields f, String key, Defined<?> defined, String where, boolean required) {
        YamlNode n = required ? f.required(key) : f.optional(key);
        if (n == null) {
            return null;
        }
        String id = c.id(n, f.path(key));
        if (id == null) {
            return null;
        }
        if (defined.failed(id)) {
            return null; // its definition has its own message
        }
        java.util.Set<String> ids = defined.ids();
        if (!ids.contains(id)) {
            String hint = Suggest.closest(id, ids).map(s -> "; did you mean \"" + s + "\"?").orElse("");
            c.error(n, f.path(key), "no " + key + " \"" + id + "\" under " + where + hint
                    + (ids.isEmpty() ? "" : " (defined: " + String.join(", ", ids) + ")"));
            return null;
        }
        return id;
    }

    /** A position on the beam, 0 to its length inclusive. */
    static Double position(ReadContext c, YamlNode n, String path, Double length) {
        Double x = c.quantity(n, path, Dimension.LENGTH);
        if (x == null || length == null) {
            return x;
        }
        if (x < -SAME_POINT * length || x > length * (1 + SAME_POINT)) {
            c.error(n, path, "is off the beam: positions run from 0 to the beam length " + c.length(length));
            return null;
        }
        return Math.max(0, Math.min(length, x));
    }

    private static List<Support> supports(ReadContext c, ReadContext.Fields f, Double length) {
        YamlNode node = f.required("supports");
        if (node == null) {
            return null;
        }
        List<YamlNode> items = c.list(node, f.path("supports")).orElse(null);
        if (items == null) {
            return null;
        }
        if (items.isEmpty()) {
            c.error(node, f.path("supports"), "a beam needs at least one support");
            return null;
        }
        if (items.size() > MAX_SUPPORTS) {
            c.error(node, f.path("supports"), "too many supports: " + items.size() + " (at most " + MAX_SUPPORTS + ")");
            return null;
        }
        List<Support> result = new ArrayList<>();
        boolean ok = true;
        double same = samePoint(length);
        for (int i = 0; i < items.size(); i++) {
            String path = f.path("supports") + "[" + i + "]";
            ReadContext.Fields s = c.fields(items.get(i), path);
            if (s == null) {
                ok = false;
                continue;
            }
            YamlNode atNode = s.required("at");
            Double at = atNode == null ? null : position(c, atNode, s.path("at"), length);
            YamlNode typeNode = s.required("type");
            String type = typeNode == null ? null : c.choice(typeNode, s.path("type"), List.of("pin", "roller", "fixed", "spring"));
            SupportKind kind = null;
            if (type != null) {
                kind = switch (type) {
                    case "pin" -> new SupportKind.Pin();
                    case "roller" -> new SupportKind.Roller();
                    case "fixed" -> new SupportKind.Fixed();
                    default -> spring(c, s);
                };
            }
            YamlNode bearingNode = s.optional("bearing");
            Double bearing = bearingNode == null ? null : c.positive(bearingNode, s.path("bearing"), Dimension.LENGTH);
            s.rejectUnknown(SUPPORT_KEYS);
            if (at == null || kind == null || (bearingNode != null && bearing == null)) {
                ok = false;
                continue;
            }
            for (Support earlier : result) {
                if (Math.abs(earlier.at() - at) <= same) {
                    c.error(atNode, s.path("at"), "two supports at " + c.length(at) + " (the other is at line "
                            + earlier.where().line() + "): combine them into one");
                    ok = false;
                }
            }
            result.add(new Support(at, kind, items.get(i).location(), bearing));
        }
        if (!ok) {
            return null;
        }
        result.sort(Comparator.comparingDouble(Support::at));
        return result;
    }

    /** {@code bracing: { top: continuous | supports | [points], bottom: ... }}; absent: both at the supports. */
    private static Bracing bracing(ReadContext c, ReadContext.Fields f, Double length) {
        YamlNode node = f.optional("bracing");
        if (node == null) {
            return Bracing.AT_SUPPORTS;
        }
        ReadContext.Fields b = c.fields(node, f.path("bracing"));
        if (b == null) {
            return null;
        }
        Bracing.Lateral top = lateral(c, b, "top", length);
        Bracing.Lateral bottom = lateral(c, b, "bottom", length);
        b.rejectUnknown(BRACING_KEYS);
        return top == null || bottom == null ? null : new Bracing(top, bottom);
    }

    private static Bracing.Lateral lateral(ReadContext c, ReadContext.Fields b, String key, Double length) {
        YamlNode node = b.optional(key);
        if (node == null) {
            return Bracing.Lateral.AT_SUPPORTS;
        }
        String path = b.path(key);
        if (node instanceof YamlNode.Scalar) {
            String kind = c.choice(node, path, List.of("continuous", "supports"));
            return kind == null ? null : kind.equals("continuous") ? Bracing.Lateral.CONTINUOUS : Bracing.Lateral.AT_SUPPORTS;
        }
        List<YamlNode> items = c.list(node, path).orElse(null);
        if (items == null) {
            return null;
        }
        List<Double> points = new ArrayList<>();
        boolean ok = true;
        for (int i = 0; i < items.size(); i++) {
            Double x = position(c, items.get(i), path + "[" + i + "]", length);
            if (x == null) {
                ok = false;
            } else {
                points.add(x);
            }
        }
        if (!ok || length == null) {
            return null;
        }
        points.sort(Comparator.naturalOrder());
        return new Bracing.Lateral(false, points);
    }

    private static SupportKind spring(ReadContext c, ReadContext.Fields s) {
        YamlNode kNode = s.required("k");
        Double k = kNode == null ? null : c.positive(kNode, s.path("k"), Dimension.FORCE_PER_LENGTH);
        YamlNode krNode = s.optional("kr");
        Double kr = krNode == null ? Double.valueOf(0) : c.positive(krNode, s.path("kr"), Dimension.ROTATIONAL_STIFFNESS);
        return k == null || kr == null ? null : new SupportKind.Spring(k, kr);
    }

    private static List<Hinge> hinges(ReadContext c, ReadContext.Fields f, Double length, List<Support> supports) {
        List<YamlNode> items = JobReader.listOrEmpty(c, f.optional("hinges"), f.path("hinges"));
        if (items == null) {
            return null;
        }
        List<Hinge> result = new ArrayList<>();
        boolean ok = true;
        if (length == null) {
            return null;
        }
        for (int i = 0; i < items.size(); i++) {
            String path = f.path("hinges") + "[" + i + "]";
            YamlNode item = items.get(i);
            Double at = position(c, item, path, length);
            if (at == null) {
                ok = false;
                continue;
            }
            if (at <= SAME_POINT * length || at >= length * (1 - SAME_POINT)) {
                c.error(item, path, "a hinge at the end of the beam releases nothing: hinges go between the ends");
                ok = false;
                continue;
            }
            if (supports != null) {
                for (Support s : supports) {
                    boolean restrainsRotation = s.kind().restrainsRotation();
                    if (restrainsRotation && Math.abs(s.at() - at) <= SAME_POINT * length) {
                        c.error(item, path, "a hinge cannot stand at a support that restrains rotation ("
                                + s.kind().label() + " at " + c.length(s.at()) + "): say which side the support holds by moving one of them");
                        ok = false;
                    }
                }
            }
            for (Hinge earlier : result) {
                if (Math.abs(earlier.at() - at) <= SAME_POINT * length) {
                    c.error(item, path, "two hinges at " + c.length(at));
                    ok = false;
                }
            }
            result.add(new Hinge(at, item.location()));
        }
        if (!ok) {
            return null;
        }
        result.sort(Comparator.comparingDouble(Hinge::at));
        return result;
    }

    private static List<Segment> segments(ReadContext c, ReadContext.Fields f, Double length,
                                          Defined<Section> sections, Defined<Material> materials) {
        List<YamlNode> items = JobReader.listOrEmpty(c, f.optional("segments"), f.path("segments"));
        if (items == null) {
            return null;
        }
        List<Segment> result = new ArrayList<>();
        boolean ok = true;
        double same = samePoint(length);
        for (int i = 0; i < items.size(); i++) {
            String path = f.path("segments") + "[" + i + "]";
            ReadContext.Fields s = c.fields(items.get(i), path);
            if (s == null) {
                ok = false;
                continue;
            }
            YamlNode fromNode = s.required("from");
            YamlNode toNode = s.required("to");
            Double from = fromNode == null ? null : position(c, fromNode, s.path("from"), length);
            Double to = toNode == null ? null : position(c, toNode, s.path("to"), length);
            String section = s.has("section") ? reference(c, s, "section", sections, "sections", false)
                    : defaultId(f, "section");
            String material = s.has("material") ? reference(c, s, "material", materials, "materials", false)
                    : defaultId(f, "material");
            if (!s.has("section") && !s.has("material")) {
                c.error(items.get(i), path, "a segment must name a section or a material (or both)");
                ok = false;
            }
            s.rejectUnknown(SEGMENT_KEYS);
            if (from == null || to == null || section == null || material == null) {
                ok = false;
                continue;
            }
            if (!(to > from)) {
                c.error(toNode, s.path("to"), "the range is reversed or empty: \"to\" must be greater than \"from\"");
                ok = false;
                continue;
            }
            for (Segment earlier : result) {
                if (from < earlier.to() - same && to > earlier.from() + same) {
                    c.error(items.get(i), path, "overlaps an earlier segment (" + c.length(earlier.from()) + " to "
                            + c.length(earlier.to()) + ")");
                    ok = false;
                }
            }
            result.add(new Segment(from, to, section, material));
        }
        if (!ok) {
            return null;
        }
        result.sort(Comparator.comparingDouble(Segment::from));
        return result;
    }

    /** Positions this close are the same point; without a valid length, a nanometre. */
    static double samePoint(Double length) {
        return length == null ? 1e-9 : SAME_POINT * length;
    }

    private static String defaultId(ReadContext.Fields beam, String key) {
        YamlNode node = beam.optional(key);
        return node instanceof YamlNode.Scalar s ? s.text().strip() : null;
    }
}
