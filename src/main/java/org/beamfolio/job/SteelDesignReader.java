package org.beamfolio.job;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.beamfolio.catalogue.SteelGrade;
import org.beamfolio.combinations.BuiltInSets;
import org.beamfolio.design.steel.Edition;
import org.beamfolio.design.steel.Flexure;
import org.beamfolio.design.steel.SteelMember;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.Segment;
import org.beamfolio.model.SteelDesign;

/**
 * Reads the steel keys of {@code design:} ({@code steel}, {@code method}) and what they require
 * of the beam: catalogue shapes that AISC 360's chapters as implemented cover, and steel with a
 * yield strength. Also refuses, with or without design, a catalogue shape in a material that is
 * not steel.
 */
final class SteelDesignReader {
    /** A material whose E is within this fraction of 200 GPa counts as steel (E 200 to 210 GPa; 29,000 ksi). */
    private static final double STEEL_E_TOLERANCE = 0.10;
    private static final double STEEL_E = 200e9;

    private SteelDesignReader() {}

    /**
     * @param design the {@code design} mapping, or null when the job has none
     * @param setName the built-in combination set, or null
     */
    static SteelDesign read(ReadContext c, ReadContext.Fields design, String setName, Beam beam,
                            Map<String, Material> materials, Map<String, Section> sections, YamlNode sectionsNode,
                            YamlNode materialsNode) {
        if (beam != null) {
            requireSteelForCatalogueShapes(c, beam, materials, sections, sectionsNode);
        }
        if (design == null) {
            return null;
        }
        YamlNode steelNode = design.optional("steel");
        YamlNode methodNode = design.optional("method");
        String method = methodNode == null ? null : c.choice(methodNode, design.path("method"), List.of("ASD", "LRFD"));
        if (steelNode == null) {
            return null;
        }
        String specification = c.text(steelNode, design.path("steel"));
        if (specification == null) {
            return null;
        }
        Edition edition = Edition.find(specification).orElse(null);
        if (edition == null) {
            c.error(steelNode, design.path("steel"), "unknown specification \"" + specification
                    + "\" (one of: AISC360-16, AISC360-22)");
            return null;
        }
        if (BuiltInSets.EN1990.equals(setName)) {
            c.error(steelNode, design.path("steel"), "AISC 360 design goes with ASCE 7 combinations: use ASCE7-ASD, ASCE7-LRFD"
                    + " or an explicit list with design.method, not EN1990");
            return null;
        }
        String implied = BuiltInSets.ASCE7_LRFD.equals(setName) ? "LRFD" : BuiltInSets.ASCE7_ASD.equals(setName) ? "ASD" : null;
        if (methodNode == null && implied == null) {
            c.error(steelNode, design.path("method"), "steel design needs design.method (ASD or LRFD): the combinations"
                    + " are not the ASCE7-ASD or ASCE7-LRFD set, so they do not say which");
            return null;
        }
        if (method != null && implied != null && !method.equals(implied)) {
            c.error(methodNode, design.path("method"), method + " does not go with the " + setName + " combinations ("
                    + (implied.equals("LRFD") ? "factored for LRFD" : "for ASD") + "): write method: " + implied
                    + " or use the ASCE7-" + method + " set");
            return null;
        }
        if (method == null && methodNode != null) {
            return null;
        }
        if (beam != null && !designable(c, beam, materials, sections, sectionsNode, materialsNode, edition, steelNode, design.path("steel"))) {
            return null;
        }
        return new SteelDesign(specification.strip(), "LRFD".equals(method != null ? method : implied));
    }

    /** Every section on the beam a catalogue shape inside the chapters implemented, every material a steel with Fy. */
    private static boolean designable(ReadContext c, Beam beam, Map<String, Material> materials, Map<String, Section> sections,
                                      YamlNode sectionsNode, YamlNode materialsNode, Edition edition, YamlNode steelNode, String path) {
        boolean ok = true;
        for (Segment s : beam.segments()) {
            if (!s.section().equals(beam.section()) || !s.material().equals(beam.material())) {
                c.error(steelNode, path, "design.steel designs a beam of one section and material; the segment from "
                        + c.length(s.from()) + " to " + c.length(s.to()) + " changes them (out of scope)");
                return false;
            }
        }
        for (String[] pair : pairs(beam)) {
            Section section = sections.get(pair[0]);
            Material material = materials.get(pair[1]);
            if (section == null || material == null) {
                continue;
            }
            if (section.choice() != null && section.choice().kind().timber()) {
                continue; // the choice's reader says that lumber and glulam are timber
            }
            if (!(section.shape() instanceof SectionShape.Catalogued)) {
                c.error(at(sectionsNode, pair[0], steelNode), "sections." + pair[0], "design.steel designs catalogue shapes"
                        + " (designation:); this " + shapeName(section.shape()) + " section is out of scope of the steel"
                        + " design (built-up plate girders, F4 and F5, are not implemented): name a catalogue shape or"
                        + " leave out design.steel and check it with checks.stress");
                ok = false;
                continue;
            }
            if (section.flip()) {
                c.error(at(sectionsNode, pair[0], steelNode), "sections." + pair[0] + ".flip", "design.steel designs shapes"
                        + " as catalogued: a turned-over shape is out of scope");
                ok = false;
                continue;
            }
            boolean hasFy = material.yieldStress() != null
                    || (material.grade() != null && SteelGrade.find(material.grade()).isPresent());
            if (!hasFy) {
                c.error(at(materialsNode, pair[1], steelNode), "materials." + pair[1], "steel design needs the yield strength of material \""
                        + pair[1] + "\": name a grade (grade: A992) or give Fy and Fu");
                ok = false;
                continue;
            }
            ok &= inScope(c, at(sectionsNode, pair[0], steelNode), pair, section, material, edition, at(materialsNode, pair[1], steelNode));
        }
        return ok;
    }

    /**
     * Whether the section's shape (every listed candidate of a section to be chosen) is inside the
     * chapters implemented. A family's shapes outside them are left out by the search instead, so
     * a family is not refused for a shape the engineer did not name.
     */
    private static boolean inScope(ReadContext c, YamlNode sectionAt, String[] pair, Section section, Material material,
                                   Edition edition, YamlNode materialAt) {
        List<Section> shapes = section.choice() == null ? List.of(section)
                : section.choice().kind() == org.beamfolio.model.SectionChoice.Kind.LISTED ? section.choice().candidates() : List.of();
        boolean ok = true;
        for (Section s : shapes) {
            if (!(s.shape() instanceof SectionShape.Catalogued catalogued)) {
                continue;
            }
            try {
                SteelMember m = SteelMember.of(catalogued.shape(), material, edition);
                var outside = Flexure.outOfScope(m);
                if (outside.isPresent()) {
                    c.error(sectionAt, "sections." + pair[0], "out of scope of the steel design: "
                            + (section.choice() == null ? "" : s.designation() + ": ") + outside.get());
                    ok = false;
                }
            } catch (IllegalArgumentException e) {
                c.error(materialAt, "materials." + pair[1], e.getMessage());
                return false;
            }
        }
        return ok;
    }

    /** A catalogue shape is steel: its material must name a steel grade, give Fy, or at least have the E of steel. */
    private static void requireSteelForCatalogueShapes(ReadContext c, Beam beam, Map<String, Material> materials,
                                                       Map<String, Section> sections, YamlNode sectionsNode) {
        Set<String> reported = new LinkedHashSet<>();
        for (String[] pair : pairs(beam)) {
            Section section = sections.get(pair[0]);
            Material material = materials.get(pair[1]);
            if (section == null || material == null || !(section.shape() instanceof SectionShape.Catalogued)) {
                continue;
            }
            if (section.choice() != null && material.timber() != null) {
                continue; // the choice's reader says that catalogue shapes are steel
            }
            boolean steel = material.grade() != null || material.yieldStress() != null
                    || Math.abs(material.elasticModulus() / STEEL_E - 1) <= STEEL_E_TOLERANCE;
            if (!steel && reported.add(pair[1])) {
                c.error(at(sectionsNode, pair[0], null), "sections." + pair[0], "is a steel shape from the catalogue, but"
                        + " material \"" + pair[1] + "\" is not steel (E = " + Math.round(material.elasticModulus() / 1e6)
                        + " MPa, no grade, no Fy): use a steel material (grade: A992) or a section of its own shape");
            }
        }
    }

    /** The (section, material) pairs the beam uses: its own, then each segment's. */
    private static List<String[]> pairs(Beam beam) {
        List<String[]> result = new ArrayList<>();
        result.add(new String[] {beam.section(), beam.material()});
        for (Segment s : beam.segments()) {
            result.add(new String[] {s.section(), s.material()});
        }
        return result;
    }

    private static YamlNode at(YamlNode sectionsNode, String id, YamlNode fallback) {
        if (sectionsNode instanceof YamlNode.Mapping m && m.entries().containsKey(id)) {
            return m.entries().get(id).value();
        }
        return fallback != null ? fallback : sectionsNode;
    }

    /** The shape's key as the job file writes it (i_beam, plates, given, ...). */
    private static String shapeName(SectionShape shape) {
        String name = shape.getClass().getSimpleName();
        return name.equals("IBeam") ? "i_beam" : name.toLowerCase(java.util.Locale.ROOT);
    }
}
