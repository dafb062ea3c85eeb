package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Load;

/**
 * The beam's regions for pattern loading: each span between two supports, and an overhang
 * beyond the first or last support, numbered left to right; and a case's loads cut at their
 * borders, so each region's share can be solved alone.
 */
public final class Spans {
    private Spans() {}

    static List<AnalysisResult.Span> of(Beam beam) {
        List<AnalysisResult.Span> spans = new ArrayList<>();
        List<Double> borders = beam.regionBorders();
        double first = beam.supports().get(0).at();
        double last = beam.supports().get(beam.supports().size() - 1).at();
        int numbered = 0;
        for (int i = 0; i + 1 < borders.size(); i++) {
            double from = borders.get(i);
            double to = borders.get(i + 1);
            boolean overhang = to <= first || from >= last;
            String label = to <= first ? "left overhang" : from >= last ? "right overhang" : "span " + ++numbered;
            spans.add(new AnalysisResult.Span(label, from, to, overhang));
        }
        if (beam.supports().size() == 1) {
            // a single support: the whole beam cantilevers from it (to one side or both)
            spans.replaceAll(s -> new AnalysisResult.Span(s.label().replace("overhang", "cantilever"), s.from(), s.to(), true));
        }
        return spans;
    }

    /** The part of each load that lies in [from, to); a point load on a border goes to the region on its right. */
    public static List<Load> within(List<Load> loads, double from, double to, boolean last) {
        List<Load> result = new ArrayList<>();
        for (Load load : loads) {
            if (load instanceof Load.Point p && inside(p.at(), from, to, last)) {
                result.add(p);
            } else if (load instanceof Load.Couple c && inside(c.at(), from, to, last)) {
                result.add(c);
            } else if (load instanceof Load.Distributed d) {
                double a = Math.max(from, d.from());
                double b = Math.min(to, d.to());
                if (b > a) {
                    result.add(new Load.Distributed(d.loadCase(), d.intensityAt(a), d.intensityAt(b), a, b, d.uniform(),
                            d.note(), d.where()));
                }
            }
        }
        return result;
    }

    private static boolean inside(double x, double from, double to, boolean last) {
        return x >= from && (x < to || (last && x <= to));
    }

    /**
     * The loaded-span arrangements to examine. Up to six regions: every non-empty subset but the
     * full one (which is the combination itself). Beyond that, the arrangements that give the
     * extreme moments and shears of a continuous beam on rigid supports (common practice, as in
     * ACI 318-19 6.4.3): alternate regions loaded (both ways), and for each support two adjacent
     * regions loaded with alternate regions beyond them; plus each region alone.
     */
    static List<boolean[]> arrangements(int regions) {
        List<boolean[]> result = new ArrayList<>();
        if (regions <= 6) {
            for (int mask = 1; mask < (1 << regions) - 1; mask++) {
                boolean[] loaded = new boolean[regions];
                for (int i = 0; i < regions; i++) {
                    loaded[i] = (mask & (1 << i)) != 0;
                }
                result.add(loaded);
            }
            return result;
        }
        for (int parity = 0; parity < 2; parity++) {
            boolean[] loaded = new boolean[regions];
            for (int i = parity; i < regions; i += 2) {
                loaded[i] = true;
            }
            result.add(loaded);
        }
        for (int i = 0; i + 1 < regions; i++) {
            boolean[] loaded = new boolean[regions];
            loaded[i] = true;
            loaded[i + 1] = true;
            for (int j = i - 2; j >= 0; j -= 2) {
                loaded[j] = true;
            }
            for (int j = i + 3; j < regions; j += 2) {
                loaded[j] = true;
            }
            result.add(loaded);
        }
        for (int i = 0; i < regions; i++) {
            boolean[] loaded = new boolean[regions];
            loaded[i] = true;
            result.add(loaded);
        }
        return result;
    }
}
