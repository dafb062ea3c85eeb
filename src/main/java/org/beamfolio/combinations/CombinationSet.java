package org.beamfolio.combinations;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.beamfolio.model.Combination;

/**
 * A built-in set of load combinations from a standard.
 *
 * @param purpose what the set's combinations are for: allowable-stress (service) or strength
 */
public record CombinationSet(String id, String source, Purpose purpose, List<CombinationTemplate> templates,
                             Set<String> cases) {
    public enum Purpose { ALLOWABLE_STRESS, STRENGTH, MIXED }

    public CombinationSet {
        templates = List.copyOf(templates);
        cases = Set.copyOf(cases);
    }

    /** The set's combinations for a job whose loads use {@code usedCases}, and what was dropped. */
    public record Expansion(List<Combination> combinations, List<String> references, List<String> dropped) {}

    /**
     * Expands each template over the cases the job uses: a term none of whose cases the job uses
     * drops out; an alternative term yields one combination per used alternative; a combination
     * that comes out the same as an earlier one (or empty) is dropped and recorded as such. The
     * permanent case D is always taken as used, so that "D" and "1.4D" stand even without dead load.
     */
    public Expansion expand(Set<String> usedCases) {
        List<Combination> result = new ArrayList<>();
        List<String> references = new ArrayList<>();
        List<String> dropped = new ArrayList<>();
        for (CombinationTemplate template : templates) {
            List<List<CombinationTemplate.Choice>> variants = new ArrayList<>();
            variants.add(new ArrayList<>());
            boolean missing = false;
            for (CombinationTemplate.Term term : template.terms()) {
                List<CombinationTemplate.Choice> usable = term.choices().stream()
                        .filter(c -> c.loadCase().equals("D") || usedCases.contains(c.loadCase()))
                        .toList();
                if (usable.isEmpty() && term.required()) {
                    variants.clear();
                    break;
                }
                if (usable.isEmpty()) {
                    missing = true;
                    continue;
                }
                List<List<CombinationTemplate.Choice>> next = new ArrayList<>();
                for (List<CombinationTemplate.Choice> partial : variants) {
                    for (CombinationTemplate.Choice choice : usable) {
                        List<CombinationTemplate.Choice> extended = new ArrayList<>(partial);
                        extended.add(choice);
                        next.add(extended);
                    }
                }
                variants = next;
            }
            if (variants.isEmpty()) {
                dropped.add(template.reference() + ": the job has no load of its leading case");
            }
            for (List<CombinationTemplate.Choice> variant : variants) {
                Map<String, Double> factors = new LinkedHashMap<>();
                List<String> labels = new ArrayList<>();
                for (CombinationTemplate.Choice choice : variant) {
                    factors.merge(choice.loadCase(), choice.factor(), Double::sum);
                    labels.add(choice.label());
                }
                String name = String.join(" + ", labels);
                boolean duplicate = result.stream().anyMatch(c -> c.factors().equals(factors));
                // a combination written for a variable load the job does not have, reduced to dead load alone
                boolean onlyDeadLeft = missing && factors.keySet().equals(Set.of("D")) && template.terms().size() > 1;
                if (duplicate || factors.isEmpty() || onlyDeadLeft) {
                    dropped.add(template.reference() + (missing ? ": the job has none of its variable cases" : ": same as an earlier combination"));
                } else {
                    result.add(new Combination(name, factors, template.purpose()));
                    references.add(template.reference());
                }
            }
        }
        return new Expansion(result, references, dropped);
    }
}
