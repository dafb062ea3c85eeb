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

    static Defined<String> of(List<Load> loads, Beam beam, YamlNode beamNode, YamlNode loadsNode,
                              Defined<org.beamfolio.loads.AreaLoad> areaLoads) {
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
                complete &= item instanceof YamlNode.Mapping m && (isArea(m) ? areaCases(m, areaLoads, named) : caseOf(m, "case", named, false));
            }
        } else if (loadsNode != null) {
            complete = false;
        }
        return new Defined<>(used, named, complete);
    }

    private static boolean isArea(YamlNode.Mapping m) {
        YamlNode.Entry type = m.entries().get("type");
        return type != null && type.value() instanceof YamlNode.Scalar s && s.text().strip().equalsIgnoreCase("area");
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
