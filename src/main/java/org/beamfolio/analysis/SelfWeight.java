package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Load;
import org.beamfolio.catalogue.ShapeProperty;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.Segment;
import org.beamfolio.section.SectionProperties;

/**
 * The beam's own weight as uniform loads segment by segment: w = density x A, or, for a catalogue
 * shape, its tabulated nominal weight per length W (the catalogue's, so the load is the weight the
 * engineer orders by).
 */
final class SelfWeight {
    private SelfWeight() {}

    static List<Load> loads(Beam beam, Map<String, SectionProperties> sections, Map<String, Material> materials,
                            Map<String, Section> shapes) {
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
                Section shape = shapes.get(section);
                boolean tabulated = shape != null && shape.shape() instanceof SectionShape.Catalogued;
                double w = tabulated ? ((SectionShape.Catalogued) shape.shape()).shape().get(ShapeProperty.W)
                        : materials.get(material).weightDensity() * sections.get(section).area();
                String how = tabulated ? "tabulated W of " + ((SectionShape.Catalogued) shape.shape()).shape().designation()
                        : material + ", " + section;
                result.add(new Load.Distributed(beam.selfWeightCase(), w, w, previous, cut, true,
                        "self weight (" + how + ")", null));
            }
            previous = cut;
        }
        return result;
    }
}
