package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The job's pattern cases split by region, and the arrangements examined: the one place that says
 * which regions carry a pattern case, so the envelope, the reactions and the deflection checks all
 * use the same arrangements. Each region's share of a pattern case is solved once; an
 * arrangement is a sum of factors with the pattern cases' full responses replaced by the loaded
 * regions' shares.
 */
public final class Patterns {
    private final List<String> cases;
    private final Map<String, Response[]> shares;
    private final List<AnalysisResult.Span> spans;
    private final List<boolean[]> arrangements;
    private final Map<String, Response> full;
    private final StructureModel model;

    Patterns(List<String> cases, Map<String, Response[]> shares, List<AnalysisResult.Span> spans,
             Map<String, Response> full, StructureModel model) {
        this.cases = List.copyOf(cases);
        this.shares = Map.copyOf(shares);
        this.spans = List.copyOf(spans);
        this.arrangements = cases.isEmpty() ? List.of() : Spans.arrangements(spans.size());
        this.full = full;
        this.model = model;
    }

    /** The pattern cases that carry a non-zero factor in {@code factors}. */
    public List<String> casesIn(Map<String, Double> factors) {
        return cases.stream().filter(p -> factors.getOrDefault(p, 0.0) != 0).toList();
    }

    /** The arrangements examined (loaded regions, indexed as the spans), never the all-loaded one. */
    public List<boolean[]> arrangements() {
        return arrangements.stream().map(boolean[]::clone).toList();
    }

    /** The sum of the factored cases, the pattern cases on the loaded regions only ({@code null}: on all). */
    Superposition terms(Map<String, Double> factors, boolean[] loaded) {
        if (loaded == null) {
            return new Superposition(factors.size()).addCases(full, factors);
        }
        Superposition terms = new Superposition(factors.size() + loaded.length);
        for (Map.Entry<String, Double> f : factors.entrySet()) {
            if (cases.contains(f.getKey())) {
                continue;
            }
            Response r = full.get(f.getKey());
            if (r != null && f.getValue() != 0) {
                terms.add(r, f.getValue());
            }
        }
        for (String p : cases) {
            double factor = factors.getOrDefault(p, 0.0);
            for (int i = 0; i < loaded.length; i++) {
                if (loaded[i] && factor != 0) {
                    terms.add(shares.get(p)[i], factor);
                }
            }
        }
        return terms;
    }

    /** The deflection of {@link #terms} alone, the same numbers as the whole response's. */
    public Field deflection(Map<String, Double> factors, boolean[] loaded) {
        return terms(factors, loaded).deflection(model);
    }

    /** An arrangement's name: {@code D + L (L on span 2)}; the base name alone when every region is loaded. */
    public String name(String base, Map<String, Double> factors, boolean[] loaded) {
        return loaded == null ? base : base + " (" + String.join(", ", casesIn(factors)) + " on " + describe(loaded) + ")";
    }

    /** The loaded regions in words: {@code spans 1, 3, right overhang}. */
    public String describe(boolean[] loaded) {
        List<String> numbered = new ArrayList<>();
        List<String> other = new ArrayList<>();
        for (int i = 0; i < loaded.length; i++) {
            if (loaded[i]) {
                String label = spans.get(i).label();
                if (!spans.get(i).overhang()) {
                    numbered.add(label.substring("span ".length()));
                } else {
                    other.add(label);
                }
            }
        }
        List<String> parts = new ArrayList<>();
        if (!numbered.isEmpty()) {
            parts.add((numbered.size() == 1 ? "span " : "spans ") + String.join(", ", numbered));
        }
        parts.addAll(other);
        return String.join(", ", parts);
    }

    static List<Integer> regions(boolean[] loaded) {
        List<Integer> regions = new ArrayList<>();
        for (int i = 0; i < loaded.length; i++) {
            if (loaded[i]) {
                regions.add(i);
            }
        }
        return regions;
    }
}
