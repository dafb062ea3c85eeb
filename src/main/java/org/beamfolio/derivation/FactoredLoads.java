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
                out.add(scaled(l, f.getValue()));
            }
        }
        return out;
    }

    static Load scaled(Load l, double k) {
        if (l instanceof Load.Point p) {
            return new Load.Point(p.loadCase(), k * p.P(), p.at(), p.note(), p.where());
        }
        if (l instanceof Load.Couple c) {
            return new Load.Couple(c.loadCase(), k * c.M(), c.at(), c.note(), c.where());
        }
        Load.Distributed d = (Load.Distributed) l;
        return new Load.Distributed(d.loadCase(), k * d.wStart(), k * d.wEnd(), d.from(), d.to(), d.uniform(), d.note(), d.where());
    }

    /** Resultant force (down +) of a load. */
    static double force(Load l) {
        if (l instanceof Load.Point p) {
            return p.P();
        }
        if (l instanceof Load.Distributed d) {
            return d.resultant();
        }
        return 0;
    }

    /** Where the resultant acts (the centroid of a line load's diagram). */
    static double position(Load l) {
        if (l instanceof Load.Point p) {
            return p.at();
        }
        if (l instanceof Load.Couple c) {
            return c.at();
        }
        Load.Distributed d = (Load.Distributed) l;
        double sum = d.wStart() + d.wEnd();
        return sum == 0 ? (d.from() + d.to()) / 2 : d.from() + (d.to() - d.from()) * (d.wStart() + 2 * d.wEnd()) / (3 * sum);
    }

    /** Counter-clockwise couple of a load (zero for forces). */
    static double couple(Load l) {
        return l instanceof Load.Couple c ? c.M() : 0;
    }
}
