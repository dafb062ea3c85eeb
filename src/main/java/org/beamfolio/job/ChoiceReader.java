package org.beamfolio.job;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.beamfolio.catalogue.Lumber;
import org.beamfolio.catalogue.Shape;
import org.beamfolio.catalogue.ShapeCatalogue;
import org.beamfolio.catalogue.ShapeFamily;
import org.beamfolio.catalogue.ShapeProperty;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionChoice;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.Segment;
import org.beamfolio.units.Dimension;

/**
 * Reads {@code choose:} in a section: a list of catalogue designations, a catalogue family with
 * filters, or lumber sizes and plies. The candidates come out in the order the search tries
 * them: catalogue shapes by nominal weight per length (equal weights shallowest first), lumber by
 * cross-section area (equal areas shallowest first), so the first that passes is the lightest.
 */
final class ChoiceReader {
    /** The keys of {@code choose: { family: ... }}; the JSON Schema is tested against them. */
    static final Set<String> FAMILY_KEYS = Set.of("family", "depth_max", "depth_min", "weight_max", "nominal_depths");

    /** The keys of {@code choose: { lumber: ... }}; the JSON Schema is tested against them. */
    static final Set<String> LUMBER_KEYS = Set.of("lumber", "plies");

    /** The keys of {@code choose: { widths: ... }} (glulam); the JSON Schema is tested against them. */
    static final Set<String> GLULAM_KEYS = Set.of("widths", "depth_min", "depth_max", "lamination");

    /** Glulam candidates offered at most, so a mistyped lamination cannot ask for thousands. */
    private static final int MOST_GLULAM = 400;

    /** The families as a job file names them; HSS alone is the rectangular (and square) HSS. */
    private static final Map<String, ShapeFamily> FAMILIES = familyNames();

    private static final double INCH = 0.0254;

    private ChoiceReader() {}

    private static Map<String, ShapeFamily> familyNames() {
        Map<String, ShapeFamily> names = new java.util.LinkedHashMap<>();
        for (ShapeFamily f : ShapeFamily.values()) {
            names.put(switch (f) {
                case HSS_RECTANGULAR -> "HSS";
                case HSS_ROUND -> "HSS_round";
                default -> f.name();
            }, f);
        }
        return names;
    }

    /** The section to be chosen, carrying its candidates, or null after a message. */
    static Section read(ReadContext c, String id, YamlNode node, String path) {
        if (node instanceof YamlNode.Sequence s) {
            return listed(c, id, s, path);
        }
        ReadContext.Fields f = node instanceof YamlNode.Mapping ? c.fields(node, path) : null;
        if (f == null) {
            c.error(node, path, "expected a list of designations ([ W12X26, W14X22 ]), a family ({ family: W, depth_max: 16 in })"
                    + " or lumber sizes ({ lumber: [ 2x8, 2x10 ], plies: [ 1, 2 ] }), got " + node.describe());
            return null;
        }
        if (f.node().entries().containsKey("family")) {
            Section section = family(c, id, f);
            f.rejectUnknown(FAMILY_KEYS);
            return section;
        }
        if (f.node().entries().containsKey("lumber")) {
            Section section = lumber(c, id, f);
            f.rejectUnknown(LUMBER_KEYS);
            return section;
        }
        if (f.node().entries().containsKey("widths")) {
            Section section = glulam(c, id, f);
            f.rejectUnknown(GLULAM_KEYS);
            return section;
        }
        c.error(node, path, "choose needs a family (family: W), lumber sizes (lumber: [ 2x8, 2x10 ]) or glulam widths"
                + " (widths: [ 5-1/8 in ], depth_min, depth_max, lamination); or give a list of designations");
        return null;
    }

    private static Section listed(ReadContext c, String id, YamlNode.Sequence list, String path) {
        if (list.items().isEmpty()) {
            c.error(list, path, "the list of candidates is empty: name at least one designation");
            return null;
        }
        ShapeCatalogue catalogue = ShapeCatalogue.aisc();
        List<Shape> shapes = new ArrayList<>();
        boolean ok = true;
        for (int i = 0; i < list.items().size(); i++) {
            YamlNode item = list.items().get(i);
            String itemPath = path + "[" + i + "]";
            String text = c.text(item, itemPath);
            if (text == null) {
                ok = false;
                continue;
            }
            Optional<Shape> shape = catalogue.find(text);
            if (shape.isEmpty()) {
                String hint = Lumber.parse(text, 1).isPresent()
                        ? " (lumber sizes are chosen with choose: { lumber: [ " + text.strip() + " ] })"
                        : "; nearest: " + String.join(", ", catalogue.nearest(text, 3));
                c.error(item, itemPath, "\"" + text + "\" is not in the " + catalogue.source() + hint);
                ok = false;
                continue;
            }
            if (shapes.contains(shape.get())) {
                c.error(item, itemPath, shape.get().designation() + " is listed twice");
                ok = false;
                continue;
            }
            shapes.add(shape.get());
        }
        if (!ok) {
            return null;
        }
        List<String> names = shapes.stream().map(Shape::designation).toList();
        return catalogued(id, SectionChoice.Kind.LISTED, "listed: " + String.join(", ", names), shapes);
    }

    private static Section family(ReadContext c, String id, ReadContext.Fields f) {
        YamlNode familyNode = f.optional("family");
        String name = c.choice(familyNode, f.path("family"), List.copyOf(FAMILIES.keySet()));
        Double depthMax = positive(c, f, "depth_max", Dimension.LENGTH);
        Double depthMin = positive(c, f, "depth_min", Dimension.LENGTH);
        Double weightMax = positive(c, f, "weight_max", Dimension.FORCE_PER_LENGTH);
        List<Double> nominal = nominalDepths(c, f);
        if (name == null || (f.has("depth_max") && depthMax == null) || (f.has("depth_min") && depthMin == null)
                || (f.has("weight_max") && weightMax == null) || nominal == null) {
            return null;
        }
        ShapeFamily family = FAMILIES.get(name);
        List<String> filters = new ArrayList<>();
        List<Shape> shapes = new ArrayList<>();
        for (Shape s : ShapeCatalogue.aisc().shapes()) {
            if (s.family() != family) {
                continue;
            }
            double depth = tabulatedDepth(s);
            if ((depthMax == null || depth <= depthMax * (1 + 1e-12)) && (depthMin == null || depth >= depthMin * (1 - 1e-12))
                    && (weightMax == null || s.get(ShapeProperty.W) <= weightMax * (1 + 1e-12))
                    && (nominal.isEmpty() || nominal.stream().anyMatch(n -> Math.abs(n - nominalDepth(s)) < 1e-9))) {
                shapes.add(s);
            }
        }
        filters.add(name + " shapes");
        if (!nominal.isEmpty()) {
            filters.add("nominal depth " + written(f, "nominal_depths"));
        }
        if (depthMin != null) {
            filters.add("tabulated depth at least " + written(f, "depth_min"));
        }
        if (depthMax != null) {
            filters.add("tabulated depth at most " + written(f, "depth_max"));
        }
        if (weightMax != null) {
            filters.add("weight at most " + written(f, "weight_max"));
        }
        if (shapes.isEmpty()) {
            List<Shape> all = ShapeCatalogue.aisc().shapes().stream().filter(s -> s.family() == family).toList();
            double shallow = all.stream().mapToDouble(ChoiceReader::tabulatedDepth).min().orElse(0) / INCH;
            double deep = all.stream().mapToDouble(ChoiceReader::tabulatedDepth).max().orElse(0) / INCH;
            c.error(f.node(), f.path(), "no shape of the catalogue is within these filters (" + String.join(", ", filters)
                    + "); " + name + " shapes run from " + String.format(Locale.ROOT, "%.3g to %.3g in", shallow, deep) + " deep");
            return null;
        }
        String basis = String.join(", ", filters) + " (" + shapes.size() + " shape" + (shapes.size() == 1 ? "" : "s")
                + " of the " + ShapeCatalogue.SOURCE + ")";
        return catalogued(id, SectionChoice.Kind.FAMILY, basis, shapes);
    }

    private static Section catalogued(String id, SectionChoice.Kind kind, String basis, List<Shape> shapes) {
        List<Shape> ordered = new ArrayList<>(shapes);
        ordered.sort(Comparator.<Shape>comparingDouble(s -> s.get(ShapeProperty.W)).thenComparingDouble(ChoiceReader::tabulatedDepth));
        List<Section> candidates = ordered.stream()
                .map(s -> new Section(id, new SectionShape.Catalogued(s), false)).toList();
        return first(id, new SectionChoice(kind, basis, candidates, List.of()));
    }

    private static Section first(String id, SectionChoice choice) {
        return choice.candidates().get(0).chosenAs(choice.candidates().get(0), choice);
    }

    /** The depth the catalogue tabulates: d, the HSS's Ht, or the outside diameter. */
    static double tabulatedDepth(Shape s) {
        return s.has(ShapeProperty.D) ? s.get(ShapeProperty.D) : s.has(ShapeProperty.HT) ? s.get(ShapeProperty.HT) : s.get(ShapeProperty.OD);
    }

    /** The first number of the designation: W14X22 is 14, HSS6.625X.250 is 6.625, Pipe8STD is 8. */
    static double nominalDepth(Shape s) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\d+(?:\\.\\d+)?").matcher(s.designation());
        return m.find() ? Double.parseDouble(m.group()) : Double.NaN;
    }

    private static List<Double> nominalDepths(ReadContext c, ReadContext.Fields f) {
        YamlNode node = f.optional("nominal_depths");
        if (node == null) {
            return List.of();
        }
        List<YamlNode> items = c.list(node, f.path("nominal_depths")).orElse(null);
        if (items == null) {
            return null;
        }
        if (items.isEmpty()) {
            c.error(node, f.path("nominal_depths"), "the list is empty: leave it out, or give the nominal depths, e.g. [ 12, 14 ]");
            return null;
        }
        List<Double> result = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Double n = c.number(items.get(i), f.path("nominal_depths") + "[" + i + "]");
            if (n == null) {
                return null;
            }
            result.add(n);
        }
        return result;
    }

    private static Section lumber(ReadContext c, String id, ReadContext.Fields f) {
        YamlNode sizesNode = f.optional("lumber");
        List<YamlNode> sizes = c.list(sizesNode, f.path("lumber")).orElse(null);
        if (sizes == null) {
            return null;
        }
        if (sizes.isEmpty()) {
            c.error(sizesNode, f.path("lumber"), "the list of sizes is empty: name at least one nominal size, e.g. [ 2x10 ]");
            return null;
        }
        List<Integer> plies = plies(c, f);
        if (plies == null) {
            return null;
        }
        List<Lumber> candidates = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        boolean ok = true;
        for (int i = 0; i < sizes.size(); i++) {
            String itemPath = f.path("lumber") + "[" + i + "]";
            String text = c.text(sizes.get(i), itemPath);
            if (text == null) {
                ok = false;
                continue;
            }
            Optional<Lumber> size = Lumber.parse(text, 1);
            if (size.isEmpty()) {
                c.error(sizes.get(i), itemPath, "no dressed size for nominal \"" + text + "\" (a nominal thickness x width such as"
                        + " 2x10 or 4x12, thickness 2 to 12 in not above the width, width to 24 in)");
                ok = false;
                continue;
            }
            if (!seen.add(size.get().designation())) {
                c.error(sizes.get(i), itemPath, size.get().designation() + " is listed twice");
                ok = false;
                continue;
            }
            for (int n : plies) {
                candidates.add(new Lumber(size.get().nominalThickness(), size.get().nominalDepth(), n));
            }
        }
        if (!ok) {
            return null;
        }
        candidates.sort(Comparator.<Lumber>comparingDouble(l -> l.breadth() * l.depth()).thenComparingDouble(Lumber::depth));
        String pliesText = plies.equals(List.of(1)) ? ""
                : " in " + String.join(" or ", plies.stream().map(String::valueOf).toList()) + (plies.equals(List.of(1)) ? " ply" : " plies");
        String basis = "sawn lumber " + String.join(", ", seen) + pliesText + ", dressed (" + candidates.size() + " size"
                + (candidates.size() == 1 ? "" : "s") + ")";
        List<Section> sections = candidates.stream()
                .map(l -> new Section(id, new SectionShape.Rectangle(l.breadth(), l.depth()), false, l)).toList();
        return first(id, new SectionChoice(SectionChoice.Kind.LUMBER, basis, sections, List.of()));
    }

    /**
     * Glulam: each width given, in every depth of whole laminations from depth_min to depth_max
     * ({@code lamination} thick, 1-1/2 in by default, the usual western species lamination; common
     * practice), as rectangles.
     */
    private static Section glulam(ReadContext c, String id, ReadContext.Fields f) {
        YamlNode widthsNode = f.optional("widths");
        List<YamlNode> items = c.list(widthsNode, f.path("widths")).orElse(null);
        YamlNode minNode = f.required("depth_min");
        YamlNode maxNode = f.required("depth_max");
        Double depthMin = minNode == null ? null : c.positive(minNode, f.path("depth_min"), Dimension.LENGTH);
        Double depthMax = maxNode == null ? null : c.positive(maxNode, f.path("depth_max"), Dimension.LENGTH);
        Double lamination = f.has("lamination") ? c.positive(f.optional("lamination"), f.path("lamination"), Dimension.LENGTH)
                : Double.valueOf(1.5 * INCH);
        if (items == null || depthMin == null || depthMax == null || lamination == null) {
            return null;
        }
        if (items.isEmpty()) {
            c.error(widthsNode, f.path("widths"), "the list of widths is empty: give at least one, e.g. [ 5-1/8 in ]");
            return null;
        }
        List<Double> widths = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Double w = c.positive(items.get(i), f.path("widths") + "[" + i + "]", Dimension.LENGTH);
            if (w == null) {
                return null;
            }
            widths.add(w);
        }
        long first = (long) Math.ceil(depthMin / lamination - 1e-9);
        long last = (long) Math.floor(depthMax / lamination + 1e-9);
        if (last < first) {
            c.error(f.node(), f.path(), "no depth of whole laminations lies between depth_min and depth_max (laminations "
                    + written(f, "lamination", "1-1/2 in") + " thick): widen the range");
            return null;
        }
        if ((last - first + 1) * widths.size() > MOST_GLULAM) {
            c.error(f.node(), f.path(), "that is " + (last - first + 1) * widths.size() + " glulam sizes, more than "
                    + MOST_GLULAM + ": narrow the depths or check the lamination thickness");
            return null;
        }
        List<SectionShape.Rectangle> sizes = new ArrayList<>();
        for (double b : widths) {
            for (long n = first; n <= last; n++) {
                sizes.add(new SectionShape.Rectangle(b, n * lamination));
            }
        }
        sizes.sort(Comparator.<SectionShape.Rectangle>comparingDouble(r -> r.b() * r.h()).thenComparingDouble(SectionShape.Rectangle::h));
        String basis = "glulam " + written(f, "widths") + " wide, " + written(f, "depth_min") + " to " + written(f, "depth_max")
                + " deep in laminations of " + written(f, "lamination", "1-1/2 in") + " (" + sizes.size() + " sizes)";
        List<Section> candidates = sizes.stream().map(r -> new Section(id, r, false)).toList();
        return first(id, new SectionChoice(SectionChoice.Kind.GLULAM, basis, candidates, List.of()));
    }

    private static String written(ReadContext.Fields f, String key, String otherwise) {
        return f.node().entries().containsKey(key) ? written(f, key) : otherwise;
    }

    private static List<Integer> plies(ReadContext c, ReadContext.Fields f) {
        YamlNode node = f.optional("plies");
        if (node == null) {
            return List.of(1);
        }
        List<YamlNode> items = node instanceof YamlNode.Scalar ? List.of(node) : c.list(node, f.path("plies")).orElse(null);
        if (items == null) {
            return null;
        }
        if (items.isEmpty()) {
            c.error(node, f.path("plies"), "the list of plies is empty: leave it out for single members, or give e.g. [ 1, 2 ]");
            return null;
        }
        List<Integer> result = new ArrayList<>();
        for (YamlNode item : items) {
            Double n = c.number(item, f.path("plies"));
            if (n == null) {
                return null;
            }
            if (n != Math.rint(n) || n < 1 || n > 6) {
                c.error(item, f.path("plies"), "plies must be whole numbers from 1 to 6, got " + ((YamlNode.Scalar) item).text());
                return null;
            }
            if (!result.contains(n.intValue())) {
                result.add(n.intValue());
            }
        }
        return result;
    }

    private static Double positive(ReadContext c, ReadContext.Fields f, String key, Dimension dimension) {
        YamlNode node = f.optional(key);
        return node == null ? null : c.positive(node, f.path(key), dimension);
    }

    /** The filter as the job file writes it, for the sheet. */
    private static String written(ReadContext.Fields f, String key) {
        YamlNode node = f.node().entries().get(key).value();
        if (node instanceof YamlNode.Sequence s) {
            return String.join(", ", s.items().stream().map(i -> i instanceof YamlNode.Scalar sc ? sc.text() : "?").toList());
        }
        return node instanceof YamlNode.Scalar s ? s.text().strip() : "";
    }

    /**
     * What a choice asks of the beam that uses it: one chosen section per beam (the search
     * chooses one at a time), a material of the candidates' kind (catalogue shapes are steel,
     * lumber is timber), and at least one check to choose by.
     *
     * @param checksAsked whether the job asks for any check (design, stress or deflection)
     */
    static void requireFit(ReadContext c, Beam beam, Map<String, Material> materials, Map<String, Section> sections,
                           YamlNode sectionsNode, boolean checksAsked) {
        Set<String> chosen = new LinkedHashSet<>();
        List<String[]> pairs = new ArrayList<>();
        pairs.add(new String[] {beam.section(), beam.material()});
        for (Segment s : beam.segments()) {
            pairs.add(new String[] {s.section(), s.material()});
        }
        Set<String> reported = new LinkedHashSet<>();
        for (String[] pair : pairs) {
            Section section = sections.get(pair[0]);
            Material material = materials.get(pair[1]);
            if (section == null || section.choice() == null) {
                continue;
            }
            YamlNode at = chooseNode(sectionsNode, pair[0]);
            String path = "sections." + pair[0] + ".choose";
            chosen.add(pair[0]);
            if (chosen.size() == 2 && reported.add("two")) {
                c.error(at, path, "the beam already has a section to choose (\"" + chosen.iterator().next() + "\"): the"
                        + " tool chooses one section of a beam at a time; name the other section");
            }
            if (material == null || !reported.add(pair[0] + "/" + pair[1])) {
                continue;
            }
            SectionChoice.Kind kind = section.choice().kind();
            boolean lumber = kind == SectionChoice.Kind.LUMBER;
            if (kind == SectionChoice.Kind.GLULAM && (material.timber() == null
                    || material.timber().kind() != org.beamfolio.model.timber.TimberKind.GLULAM)) {
                c.error(at, path, "glulam sizes need a glulam material, but material \"" + pair[1] + "\" is not one (give it"
                        + " timber: glulam and its reference design values)");
            } else if (lumber && material.timber() == null) {
                c.error(at, path, "lumber sizes are timber, but material \"" + pair[1] + "\" is not a timber material (give it"
                        + " timber: sawn and its reference design values), or choose catalogue shapes for a steel beam");
            } else if (!kind.timber() && material.timber() != null) {
                c.error(at, path, "catalogue shapes are steel, but material \"" + pair[1] + "\" is timber: choose lumber"
                        + " sizes (choose: { lumber: [ 2x10, 2x12 ] }) or use a steel material (grade: A992)");
            }
        }
        if (!chosen.isEmpty() && !checksAsked) {
            String id = chosen.iterator().next();
            c.error(chooseNode(sectionsNode, id), "sections." + id + ".choose", "the job asks for no check to choose by: the"
                    + " lightest candidate that passes every check needs checks (design.steel, design.timber, checks.stress or"
                    + " checks.deflection)");
        }
    }

    private static YamlNode chooseNode(YamlNode sectionsNode, String id) {
        if (sectionsNode instanceof YamlNode.Mapping m && m.entries().containsKey(id)
                && m.entries().get(id).value() instanceof YamlNode.Mapping section && section.entries().containsKey("choose")) {
            return section.entries().get("choose").value();
        }
        return sectionsNode;
    }
}
