package org.beamfolio.job;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Set;
import java.util.Map;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.units.Dimension;

/** Reads the sections and rejects shapes that cannot be built (a flange deeper than the section). */
final class SectionReader {
    /** The keys of one section: a designation from the catalogue, or a shape and its dimensions: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> SECTION_KEYS = Set.of("choose", "designation", "lumber", "plies", "shape", "flip", "b", "h", "d", "t", "bf", "tf", "tw", "plates", "I", "depth", "y_bottom", "A", "Q");

    /** The keys of one plate of a plates section: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> PLATE_KEYS = Set.of("b", "h", "y");

    static final List<String> SHAPES = List.of("rectangle", "circle", "tube", "pipe", "i_beam", "tee", "channel", "plates", "given");

    private SectionReader() {}

    static Map<String, Section> readAll(ReadContext context, YamlNode node) {
        Map<String, Section> result = new LinkedHashMap<>();
        if (node == null) {
            return result;
        }
        ReadContext.Fields all = context.fields(node, "sections");
        if (all == null) {
            return result;
        }
        if (all.node().entries().isEmpty()) {
            context.error(node, "sections", "at least one section is needed");
        }
        for (YamlNode.Entry entry : all.node().entries().values()) {
            all.optional(entry.key());
            Section section = read(context, entry.key(), entry.value(), "sections." + entry.key());
            if (section != null) {
                result.put(entry.key(), section);
            }
        }
        return result;
    }

    private static Section read(ReadContext context, String id, YamlNode node, String path) {
        ReadContext.Fields f = context.fields(node, path);
        if (f == null) {
            return null;
        }
        if (f.node().entries().containsKey("choose")) {
            // the candidates take the place of a designation, shape or size: every other key is refused
            f.optional("choose");
            Section chosen = ChoiceReader.read(context, id, f.node().entries().get("choose").value(), f.path("choose"));
            f.rejectUnknown(SECTION_KEYS);
            return chosen;
        }
        if (f.has("lumber")) {
            Section lumber = lumber(context, f, id);
            f.rejectUnknown(SECTION_KEYS);
            return lumber;
        }
        boolean flip = false;
        YamlNode flipNode = f.optional("flip");
        if (flipNode != null) {
            Boolean value = context.bool(flipNode, f.path("flip"));
            flip = value != null && value;
        }
        YamlNode designation = f.optional("designation");
        if (designation != null) {
            SectionShape catalogued = CatalogueSections.read(context, designation, f.path("designation"));
            f.rejectUnknown(SECTION_KEYS);
            return catalogued == null ? null : new Section(id, catalogued, flip);
        }
        YamlNode shapeNode = f.required("shape");
        if (shapeNode == null) {
            f.rejectUnknown(SECTION_KEYS, "b", "h", "d", "t", "bf", "tf", "tw", "plates", "I", "depth", "y_bottom", "A", "Q");
            return null;
        }
        String shape = context.choice(shapeNode, f.path("shape"), SHAPES);
        if (shape == null) {
            f.rejectUnknown(SECTION_KEYS, "b", "h", "d", "t", "bf", "tf", "tw", "plates", "I", "depth", "y_bottom", "A", "Q");
            return null;
        }
        SectionShape result = switch (shape) {
            case "rectangle" -> rectangle(context, f);
            case "circle" -> circle(context, f);
            case "tube" -> tube(context, f);
            case "pipe" -> pipe(context, f);
            case "i_beam", "tee", "channel" -> flanged(context, f, shape);
            case "plates" -> plates(context, f);
            default -> given(context, f);
        };
        f.rejectUnknown(SECTION_KEYS);
        return result == null ? null : new Section(id, result, flip);
    }

    /** Common nominal sizes, for suggestions when a size is not one the lumber standard dresses. */
    private static final List<String> COMMON_LUMBER = List.of("2x4", "2x6", "2x8", "2x10", "2x12", "2x14", "3x8", "3x10",
            "3x12", "4x6", "4x8", "4x10", "4x12", "4x14", "4x16", "6x8", "6x10", "6x12", "6x14", "6x16", "8x10", "8x12", "8x14");

    /** Sawn lumber by nominal size ({@code lumber: 2x10}, {@code plies: 2}): a rectangle of the dressed size. */
    private static Section lumber(ReadContext c, ReadContext.Fields f, String id) {
        int plies = 1;
        YamlNode pliesNode = f.optional("plies");
        if (pliesNode != null) {
            Double n = c.number(pliesNode, f.path("plies"));
            if (n == null) {
                return null;
            }
            if (n != Math.rint(n) || n < 1 || n > 6) {
                c.error(pliesNode, f.path("plies"), "plies must be a whole number from 1 to 6, got " + ((YamlNode.Scalar) pliesNode).text());
                return null;
            }
            plies = n.intValue();
        }
        YamlNode node = f.optional("lumber");
        String text = c.text(node, f.path("lumber"));
        if (text == null) {
            return null;
        }
        java.util.Optional<org.beamfolio.catalogue.Lumber> lumber = org.beamfolio.catalogue.Lumber.parse(text, plies);
        if (lumber.isEmpty()) {
            String hint = org.beamfolio.units.Suggest.closest(text.strip().toLowerCase(java.util.Locale.ROOT), COMMON_LUMBER)
                    .map(s -> "; did you mean \"" + s + "\"?").orElse("");
            c.error(node, f.path("lumber"), "no dressed size for nominal \"" + text + "\"" + hint
                    + " (a nominal thickness x width such as 2x10 or 4x12, thickness 2 to 12 in not above the width,"
                    + " width to 24 in; for other sizes give shape: rectangle)");
            return null;
        }
        org.beamfolio.catalogue.Lumber l = lumber.get();
        return new Section(id, new SectionShape.Rectangle(l.breadth(), l.depth()), false, l);
    }

    private static Double len(ReadContext c, ReadContext.Fields f, String key) {
        YamlNode n = f.required(key);
        return n == null ? null : c.positive(n, f.path(key), Dimension.LENGTH);
    }

    private static SectionShape rectangle(ReadContext c, ReadContext.Fields f) {
        Double b = len(c, f, "b");
        Double h = len(c, f, "h");
        return b == null || h == null ? null : new SectionShape.Rectangle(b, h);
    }

    private static SectionShape circle(ReadContext c, ReadContext.Fields f) {
        Double d = len(c, f, "d");
        return d == null ? null : new SectionShape.Circle(d);
    }

    private static SectionShape tube(ReadContext c, ReadContext.Fields f) {
        Double b = len(c, f, "b");
        Double h = len(c, f, "h");
        Double t = len(c, f, "t");
        if (b == null || h == null || t == null) {
            return null;
        }
        if (!(2 * t < Math.min(b, h))) {
            c.error(f.optional("t"), f.path("t"), "the wall is too thick: twice t must be less than both b and h");
            return null;
        }
        return new SectionShape.Tube(b, h, t);
    }

    private static SectionShape pipe(ReadContext c, ReadContext.Fields f) {
        Double d = len(c, f, "d");
        Double t = len(c, f, "t");
        if (d == null || t == null) {
            return null;
        }
        if (!(2 * t < d)) {
            c.error(f.optional("t"), f.path("t"), "the wall is too thick: twice t must be less than the outside diameter d");
            return null;
        }
        return new SectionShape.Pipe(d, t);
    }

    private static SectionShape flanged(ReadContext c, ReadContext.Fields f, String shape) {
        Double d = len(c, f, "d");
        Double bf = len(c, f, "bf");
        Double tf = len(c, f, "tf");
        Double tw = len(c, f, "tw");
        if (d == null || bf == null || tf == null || tw == null) {
            return null;
        }
        boolean ok = true;
        if (shape.equals("tee") ? !(tf < d) : !(2 * tf < d)) {
            c.error(f.optional("tf"), f.path("tf"), shape.equals("tee")
                    ? "the flange is as deep as the whole tee: tf must be less than d"
                    : "the flanges are too thick: twice tf must be less than the depth d");
            ok = false;
        }
        if (!(tw <= bf)) {
            c.error(f.optional("tw"), f.path("tw"), "the web is wider than the flange: tw must not exceed bf");
            ok = false;
        }
        if (!ok) {
            return null;
        }
        return switch (shape) {
            case "i_beam" -> new SectionShape.IBeam(d, bf, tf, tw);
            case "tee" -> new SectionShape.Tee(d, bf, tf, tw);
            default -> new SectionShape.Channel(d, bf, tf, tw);
        };
    }

    private static SectionShape plates(ReadContext c, ReadContext.Fields f) {
        YamlNode node = f.required("plates");
        if (node == null) {
            return null;
        }
        List<YamlNode> items = c.list(node, f.path("plates")).orElse(null);
        if (items == null) {
            return null;
        }
        if (items.isEmpty()) {
            c.error(node, f.path("plates"), "at least one plate is needed");
            return null;
        }
        List<SectionShape.Plate> plates = new ArrayList<>();
        boolean ok = true;
        for (int i = 0; i < items.size(); i++) {
            String path = f.path("plates") + "[" + i + "]";
            ReadContext.Fields p = c.fields(items.get(i), path);
            if (p == null) {
                ok = false;
                continue;
            }
            Double b = len(c, p, "b");
            Double h = len(c, p, "h");
            YamlNode yNode = p.required("y");
            Double y = yNode == null ? null : c.quantity(yNode, p.path("y"), Dimension.LENGTH);
            if (y != null && y < 0) {
                c.error(yNode, p.path("y"), "a plate cannot sit below the section's bottom: y must be zero or more");
                y = null;
            }
            p.rejectUnknown(PLATE_KEYS);
            if (b == null || h == null || y == null) {
                ok = false;
            } else {
                plates.add(new SectionShape.Plate(b, h, y));
            }
        }
        if (!ok) {
            return null;
        }
        return checkStack(c, node, f.path("plates"), plates) ? new SectionShape.Plates(plates) : null;
    }

    /** Plates stack one on another from y = 0: a gap leaves them unconnected, an overlap counts material twice. */
    private static boolean checkStack(ReadContext c, YamlNode node, String path, List<SectionShape.Plate> plates) {
        List<SectionShape.Plate> sorted = new ArrayList<>(plates);
        sorted.sort(Comparator.comparingDouble(SectionShape.Plate::y));
        double depth = sorted.stream().mapToDouble(p -> p.y() + p.h()).max().orElse(0);
        double tolerance = 1e-9 * depth;
        if (Math.abs(sorted.get(0).y()) > tolerance) {
            c.error(node, path, "no plate sits at the section's bottom (y = 0)");
            return false;
        }
        double top = sorted.get(0).y() + sorted.get(0).h();
        for (int i = 1; i < sorted.size(); i++) {
            SectionShape.Plate p = sorted.get(i);
            if (p.y() > top + tolerance) {
                c.error(node, path, "the plates do not touch: a gap between heights " + fmt(top) + " and " + fmt(p.y())
                        + " (each plate must sit on the one below)");
                return false;
            }
            if (p.y() < top - tolerance) {
                c.error(node, path, "the plates overlap between heights " + fmt(p.y()) + " and " + fmt(Math.min(top, p.y() + p.h()))
                        + " (each plate must sit on the one below)");
                return false;
            }
            top = p.y() + p.h();
        }
        return true;
    }

    private static String fmt(double metres) {
        return String.format(java.util.Locale.ROOT, "%.4g in (%.4g mm)", metres / 0.0254, metres * 1000);
    }

    private static SectionShape given(ReadContext c, ReadContext.Fields f) {
        YamlNode iNode = f.required("I");
        Double i = iNode == null ? null : c.positive(iNode, f.path("I"), Dimension.SECOND_MOMENT);
        Double depth = len(c, f, "depth");
        Double yBottom = len(c, f, "y_bottom");
        Double a = optional(c, f, "A", Dimension.AREA);
        Double q = optional(c, f, "Q", Dimension.FIRST_MOMENT);
        YamlNode tNode = f.optional("t");
        Double t = tNode == null ? null : c.positive(tNode, f.path("t"), Dimension.LENGTH);
        if (depth != null && yBottom != null && !(yBottom < depth)) {
            c.error(f.optional("y_bottom"), f.path("y_bottom"), "the centroid lies outside the section: y_bottom must be less than depth");
            return null;
        }
        if (i == null || depth == null || yBottom == null) {
            return null;
        }
        return new SectionShape.Given(i, depth, yBottom, a, q, t);
    }

    private static Double optional(ReadContext c, ReadContext.Fields f, String key, Dimension dimension) {
        YamlNode node = f.optional(key);
        return node == null ? null : c.positive(node, f.path(key), dimension);
    }
}
