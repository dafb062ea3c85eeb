package org.beamfolio.derivation;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Spans;
import org.beamfolio.model.Load;

/**
 * The loads of one combination with their factors applied (SI, down positive), a pattern case
 * only on the regions its arrangement loads.
 */
public final class FactoredLoads {
    private FactoredLoads() {}

    public static List<Load> of(AnalysisResult result, CombinationResult c) {
        List<Load> out = new ArrayList<>();
        List<AnalysisResult.Span> spans = result.spans();
        for (Map.Entry<String, Double> f : c.factors().entrySet()) {
            List<Load> ofCase = result.loads().stream().filter(l -> l.loadCase().equals(f.getKey())).toList();
            if (!c.arrangement().isEmpty() && result.job().pattern().contains(f.getKey())) {
                List<Load> loaded = new ArrayList<>();
                for (int i : c.loadedRegions()) {
                    loaded.addAll(Spans.within(ofCase, spans.get(i).from(), spans.get(i).to(), i == spans.size() - 1));
                }
                ofCase = loaded;
            }
            for (Load l : ofCase) {
                out.add(l.scaled(f.getValue()));
            }
        }
        return out;
    }

    static double force(Load l) {
        return l.force();
    }

    static double position(Load l) {
        return l.centroid();
    }

    static double couple(Load l) {
        return l.couple();
    }
}
