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

    static Defined<String> of(List<Load> loads, Beam beam, YamlNode beamNode, YamlNode loadsNode) {
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
                complete &= item instanceof YamlNode.Mapping m && caseOf(m, "case", named, false);
            }
        } else if (loadsNode != null) {
            complete = false;
        }
        return new Defined<>(used, named, complete);
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
