package org.beamfolio.job;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Load;

/**
 * The load cases a job uses: those of the loads that read cleanly and of the beam's self weight,
 * and every case a load or the beam names even where that load or the beam failed to read. A
 * combination, pattern or check that names a case whose loads failed is not told "no load uses
 * case D": the failed load has its own message, and dropping D would be the wrong fix.
 */
final class LoadCases {
    private LoadCases() {}

    /** @param memberCases the cases of each member read so far, for reaction loads; null for a single-beam job */
    static Defined<String> of(List<Load> loads, Beam beam, YamlNode beamNode, YamlNode loadsNode,
                              Defined<org.beamfolio.loads.AreaLoad> areaLoads, Map<String, Set<String>> memberCases) {
        Map<String, String> used = new LinkedHashMap<>();
        loads.forEach(l -> used.put(l.loadCase(), l.loadCase()));
        if (beam != null && beam.selfWeightCase() != null) {
            used.put(beam.selfWeightCase(), beam.selfWeightCase());
        }
        Set<String> named = new LinkedHashSet<>(used.keySet());
        // a missing or unreadable beam may have named a self-weight case: that has its own message
        boolean complete = beamNode instanceof YamlNode.Mapping m && caseOf(m, "self_weight", named, true);
        if (loadsNode instanceof YamlNode.Sequence s) {
            for (YamlNode item : s.items()) {
                complete &= item instanceof YamlNode.Mapping m && (is(m, "area") ? areaCases(m, areaLoads, named)
                        : is(m, "reaction") ? memberCases(m, memberCases, used, named) : caseOf(m, "case", named, false));
            }
        } else if (loadsNode != null) {
            complete = false;
        }
        return new Defined<>(used, named, complete);
    }

    private static boolean is(YamlNode.Mapping m, String loadType) {
        YamlNode.Entry type = m.entries().get("type");
        return type != null && type.value() instanceof YamlNode.Scalar s && s.text().strip().equalsIgnoreCase(loadType);
    }

    /** Adds the cases of the member whose reaction a load brings; false when that member did not read. */
    private static boolean memberCases(YamlNode.Mapping m, Map<String, Set<String>> memberCases, Map<String, String> used,
                                       Set<String> named) {
        YamlNode.Entry member = m.entries().get("member");
        if (memberCases != null && member != null && member.value() instanceof YamlNode.Scalar s
                && memberCases.containsKey(s.text().strip())) {
            memberCases.get(s.text().strip()).forEach(c -> used.put(c, c));
            named.addAll(memberCases.get(s.text().strip()));
            return true;
        }
        return false;
    }

    /** Adds the cases of the area load an application names; false when that area load did not read. */
    private static boolean areaCases(YamlNode.Mapping m, Defined<org.beamfolio.loads.AreaLoad> areaLoads, Set<String> named) {
        YamlNode.Entry load = m.entries().get("load");
        if (load != null && load.value() instanceof YamlNode.Scalar s && areaLoads.has(s.text().strip())) {
            named.addAll(areaLoads.get(s.text().strip()).pressures().keySet());
            return true;
        }
        return false;
    }

    /** Adds the case a mapping names under key; false when it names one that cannot be read. */
    private static boolean caseOf(YamlNode.Mapping m, String key, Set<String> named, boolean optional) {
        YamlNode.Entry entry = m.entries().get(key);
        if (entry == null || (entry.value() instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.NULL)) {
            return optional;
        }
        if (entry.value() instanceof YamlNode.Scalar s && !s.text().isBlank()) {
            named.add(s.text().strip());
            return true;
        }
        return false;
    }
}
