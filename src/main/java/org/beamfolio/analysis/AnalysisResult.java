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
 * @param patterns the pattern cases by region and the arrangements examined (none without {@code pattern})
 * @param reactions the largest and smallest reaction at each support over every combination and arrangement
 * @param worked what later stages work out from this analysis, each worked once ({@link Worked})
 */
public record AnalysisResult(Job job, StructureModel model, List<org.beamfolio.model.Load> loads, Map<String, SectionProperties> sections,
                             Map<String, Response> cases, List<CombinationResult> combinations,
                             Extremes envelope, List<String> droppedCombinations, String combinationSource,
                             List<Span> spans, Patterns patterns, ReactionEnvelope reactions, Worked worked) {
    /** Below this smallest pivot ratio the package warns that the model is badly conditioned. */
    public static final double POOR_CONDITIONING = 1e-8;

    /**
     * The governing stresses, found once for the checks, the worked steps and the summary: the
     * first time they are asked for, as a search that checks steel to a specification never reads them.
     */
    public GoverningStresses stresses() {
        return worked.get(GoverningStresses.class, () -> GoverningStresses.of(job, model, combinations));
    }

    /**
     * The smallest ratio, over every case solved, of a pivot of the factorisation to its unknown's
     * own stiffness: 1 is ideal; a tiny value means the model is close to a mechanism.
     */
    public double pivotRatio() {
        return cases.values().stream().mapToDouble(Response::pivotRatio).min().orElse(1);
    }

    /**
     * A region between supports, or an overhang (a cantilever when the beam has one support),
     * labelled for the package ("span 2", "right overhang").
     */
    public record Span(String label, double from, double to, boolean overhang) {
        /** The length span-ratio deflection limits apply to: the span, or twice an overhang's length (common practice). */
        public double limitLength() {
            return (overhang ? 2 : 1) * (to - from);
        }
    }
}
