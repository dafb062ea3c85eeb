package org.beamfolio.job;

import java.util.List;
import java.util.Set;
import org.beamfolio.model.timber.SizeClass;
import org.beamfolio.model.timber.TimberKind;
import org.beamfolio.model.timber.TimberValues;
import org.beamfolio.model.Material;
import org.beamfolio.units.Dimension;

/**
 * A timber material ({@code timber: sawn | glulam | scl}): the NDS reference design values the
 * engineer gives, with their source. The tool ships the factor rules, not a table of grades, so
 * every reference value is required.
 */
final class TimberMaterialReader {
    /** The keys of a timber material, {@code materials.<id>} with {@code timber}. */
    static final Set<String> KEYS = Set.of("timber", "Fb", "Fb_neg", "Fv", "Fc_perp", "E", "Emin", "density", "size_factor", "species", "source");

    static final List<String> KINDS = List.of("sawn", "glulam", "scl");
    static final List<String> SIZE_CLASSES = List.of("dimension", "timber", "none");
    static final List<String> SPECIES = List.of("southern_pine", "other");

    private TimberMaterialReader() {}

    /** Reads the keys of a material mapping that names {@code timber}; null when something is wrong. */
    static Material read(ReadContext c, ReadContext.Fields f, String id) {
        String kindText = c.choice(f.optional("timber"), f.path("timber"), KINDS);
        TimberKind kind = kindText == null ? null : TimberKind.valueOf(kindText.toUpperCase(java.util.Locale.ROOT));
        Double fb = stress(c, f, "Fb");
        Double fv = stress(c, f, "Fv");
        Double fcPerp = stress(c, f, "Fc_perp");
        Double e = stress(c, f, "E");
        Double eMin = stress(c, f, "Emin");
        Double fbNeg = null;
        YamlNode fbNegNode = f.optional("Fb_neg");
        if (fbNegNode != null) {
            if (kind != null && kind != TimberKind.GLULAM) {
                c.error(fbNegNode, f.path("Fb_neg"), "Fb_neg (compression zone stressed in tension) applies to glulam only;"
                        + " " + kind.label() + " has one Fb for both faces: remove Fb_neg or set timber: glulam");
                kind = null;
            } else {
                fbNeg = c.positive(fbNegNode, f.path("Fb_neg"), Dimension.STRESS);
                if (fbNeg == null) {
                    kind = null;
                }
            }
        }
        SizeClass size = kind == TimberKind.SAWN ? SizeClass.DIMENSION : SizeClass.NONE;
        YamlNode sizeNode = f.optional("size_factor");
        if (sizeNode != null) {
            if (kind != null && kind != TimberKind.SAWN) {
                c.error(sizeNode, f.path("size_factor"), "the size factor CF applies to sawn lumber only (NDS 4.3.6);"
                        + " remove size_factor from this " + kind.label());
                kind = null;
            } else {
                String s = c.choice(sizeNode, f.path("size_factor"), SIZE_CLASSES);
                if (s == null) {
                    kind = null;
                } else {
                    size = SizeClass.valueOf(s.toUpperCase(java.util.Locale.ROOT));
                }
            }
        }
        double x = 10;
        YamlNode speciesNode = f.optional("species");
        if (speciesNode != null) {
            String s = c.choice(speciesNode, f.path("species"), SPECIES);
            if (s == null) {
                kind = null;
            } else if (kind != null && kind != TimberKind.GLULAM) {
                c.error(speciesNode, f.path("species"), "species sets the volume factor exponent of glulam (NDS 5.3.6);"
                        + " it does not apply to " + kind.label());
                kind = null;
            } else if (s.equals("southern_pine")) {
                x = 20;
            }
        }
        YamlNode densityNode = f.optional("density");
        Double density = densityNode == null ? null : c.positive(densityNode, f.path("density"), Dimension.WEIGHT_DENSITY);
        YamlNode allowable = f.optional("allowable");
        if (allowable != null) {
            c.error(allowable, f.path("allowable"), "a timber material is designed to the NDS from its reference values;"
                    + " remove allowable (the adjusted design values replace it)");
        }
        YamlNode source = f.optional("source");
        String sourceText = source == null ? "" : c.text(source, f.path("source"));
        if (kind == null || fb == null || fv == null || fcPerp == null || e == null || eMin == null
                || allowable != null || (densityNode != null && density == null)) {
            return null;
        }
        TimberValues values = new TimberValues(kind, fb, fbNeg, fv, fcPerp, e, eMin, size, x,
                sourceText == null ? "" : sourceText);
        return Material.timber(id, density, values);
    }

    private static Double stress(ReadContext c, ReadContext.Fields f, String key) {
        YamlNode node = f.optional(key);
        if (node == null) {
            c.error(f.node(), f.path(key), "missing: a timber material needs its reference value " + key
                    + " (from the NDS Supplement or the manufacturer), e.g. \"" + key + ": " + example(key) + "\"");
            return null;
        }
        return c.positive(node, f.path(key), Dimension.STRESS);
    }

    private static String example(String key) {
        return switch (key) {
            case "Fb" -> "900 psi";
            case "Fv" -> "180 psi";
            case "Fc_perp" -> "625 psi";
            case "E" -> "1600 ksi";
            default -> "580 ksi";
        };
    }
}
