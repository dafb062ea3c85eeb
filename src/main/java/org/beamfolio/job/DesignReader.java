package org.beamfolio.job;

import java.util.Set;
import org.beamfolio.loads.LiveLoadReduction;
import org.beamfolio.loads.ReductionSettings;

/**
 * Reads {@code design}: the live load reductions, {@code live_load_reduction: { KLL: 2, floors: 1 }}
 * (ASCE/SEI 7-22 4.7.2) and {@code roof_live_load_reduction: { rise: 4 }} (4.8.2, F in inches of
 * rise per foot), each may be {@code none}.
 */
final class DesignReader {
    /**
     * The keys of {@code design}: the reductions read here, {@code steel} and {@code method} by
     * {@link SteelDesignReader}, {@code timber}, {@code method}, {@code timber_service} and
     * {@code durations} by {@link TimberDesignReader}.
     */
    static final Set<String> DESIGN_KEYS = Set.of("live_load_reduction", "roof_live_load_reduction", "steel", "method", "timber", "timber_service", "durations");

    /** The keys of {@code design.live_load_reduction} given as a mapping. */
    static final Set<String> LIVE_LOAD_REDUCTION_KEYS = Set.of("KLL", "floors");

    /** The keys of {@code design.roof_live_load_reduction} given as a mapping. */
    static final Set<String> ROOF_LIVE_LOAD_REDUCTION_KEYS = Set.of("rise");

    private DesignReader() {}

    /**
     * @param f the {@code design} mapping, or null when the job has none; the other design readers
     *          read their own keys of it, and the job reader rejects unknown keys once all have read
     */
    static ReductionSettings reductions(ReadContext c, ReadContext.Fields f) {
        if (f == null) {
            return ReductionSettings.NONE;
        }
        boolean ok = true;
        Double kll = null;
        int floors = 1;
        YamlNode live = f.optional("live_load_reduction");
        if (live != null && !isNone(live)) {
            ReadContext.Fields l = mappingOrNone(c, live, f.path("live_load_reduction"), "{ KLL: 2 }");
            if (l == null) {
                ok = false;
            } else {
                YamlNode kllNode = l.required("KLL");
                kll = kllNode == null ? null : c.number(kllNode, l.path("KLL"));
                if (kll != null && !LiveLoadReduction.validKll(kll)) {
                    c.error(kllNode, l.path("KLL"), "KLL must be 1, 2, 3 or 4 (ASCE/SEI 7-22 Table 4.7-1: e.g. 2 for interior beams,"
                            + " 1 for beams at an edge with a cantilever slab, or 4 for interior columns); got " + kllNode.describe());
                    kll = null;
                }
                ok &= kll != null;
                YamlNode floorsNode = l.optional("floors");
                if (floorsNode != null) {
                    Double n = c.number(floorsNode, l.path("floors"));
                    if (n != null && (n < 1 || n != Math.rint(n) || n > 1000)) {
                        c.error(floorsNode, l.path("floors"), "the number of floors the member supports is a whole number, 1 or more");
                        n = null;
                    }
                    ok &= n != null;
                    floors = n == null ? 1 : n.intValue();
                }
                l.rejectUnknown(LIVE_LOAD_REDUCTION_KEYS);
            }
        }
        Double rise = null;
        YamlNode roof = f.optional("roof_live_load_reduction");
        if (roof != null && !isNone(roof)) {
            ReadContext.Fields r = mappingOrNone(c, roof, f.path("roof_live_load_reduction"), "{ rise: 4 }");
            if (r == null) {
                ok = false;
            } else {
                YamlNode riseNode = r.required("rise");
                rise = riseNode == null ? null : c.number(riseNode, r.path("rise"));
                if (rise != null && rise < 0) {
                    c.error(riseNode, r.path("rise"), "the roof's rise F, inches per foot, must not be negative");
                    rise = null;
                }
                ok &= rise != null;
                r.rejectUnknown(ROOF_LIVE_LOAD_REDUCTION_KEYS);
            }
        }
        return ok ? new ReductionSettings(kll, floors, rise, live != null, roof != null) : null;
    }

    private static ReadContext.Fields mappingOrNone(ReadContext c, YamlNode node, String path, String example) {
        if (node instanceof YamlNode.Scalar) {
            c.error(node, path, "expected none or a mapping such as " + example + ", got " + node.describe());
            return null;
        }
        return c.fields(node, path);
    }

    private static boolean isNone(YamlNode node) {
        return node instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.STRING && s.text().strip().equals("none");
    }
}
