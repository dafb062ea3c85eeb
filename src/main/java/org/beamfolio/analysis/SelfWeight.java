package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Load;
import org.beamfolio.model.Material;
import org.beamfolio.model.Segment;
import org.beamfolio.section.SectionProperties;

/** The beam's own weight, w = density x A, as uniform loads segment by segment. */
final class SelfWeight {
    private SelfWeight() {}

    static List<Load> loads(Beam beam, Map<String, SectionProperties> sections, Map<String, Material> materials) {
        List<Load> result = new ArrayList<>();
        if (beam.selfWeightCase() == null) {
            return result;
        }
        TreeSet<Double> cuts = new TreeSet<>(List.of(0.0, beam.length()));
        for (Segment s : beam.segments()) {
            cuts.add(s.from());
            cuts.add(s.to());
        }
        Double previous = null;
        for (double cut : cuts) {
            if (previous != null && cut > previous) {
                double mid = 0.5 * (previous + cut);
                String section = beam.sectionAt(mid);
                String material = beam.materialAt(mid);
                double w = materials.get(material).weightDensity() * sections.get(section).area();
                result.add(new Load.Distributed(beam.selfWeightCase(), w, w, previous, cut, true,
                        "self weight (" + material + ", " + section + ")", null));
            }
            previous = cut;
        }
        return result;
    }
}
