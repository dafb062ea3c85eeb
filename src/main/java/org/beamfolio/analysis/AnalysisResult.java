package org.beamfolio.analysis;

import java.util.List;
import java.util.Map;
import org.beamfolio.model.Job;
import org.beamfolio.section.SectionProperties;

/**
 * Everything the analysis found for one job.
 *
 * @param cases each load case solved once, by name
 * @param combinations every combination, then every pattern arrangement
 * @param droppedCombinations built-in combinations left out, and why
 * @param combinationSource the standard the combinations come from, or "job file"
 * @param loads every load analysed: the job's, then the self weight
 */
public record AnalysisResult(Job job, StructureModel model, List<org.beamfolio.model.Load> loads, Map<String, SectionProperties> sections,
                             Map<String, Response> cases, List<CombinationResult> combinations,
                             Extremes envelope, List<String> droppedCombinations, String combinationSource,
                             List<Span> spans) {
    /** A region between supports (or an overhang), numbered for pattern names. */
    public record Span(String label, double from, double to) {}
}
