package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.beamfolio.combinations.BuiltInSets;
import org.beamfolio.combinations.CombinationSet;
import org.beamfolio.model.Combination;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.model.Section;
import org.beamfolio.section.SectionCalculator;
import org.beamfolio.section.SectionProperties;
import org.beamfolio.units.Lengths;

/**
 * The analysis stage's entry point: checks the beam is stable, builds the element model, solves
 * each load case once, and forms every combination and pattern arrangement by superposition.
 */
public final class Analysis {
    private Analysis() {}

    public static AnalysisResult run(Job job) throws UnstableBeamException {
        Optional<Instability> instability = Stability.check(job.beam(), job.report().units() == ReportSettings.UnitSystem.SI
                ? Lengths.Style.METRES : Lengths.Style.FEET_AND_INCHES);
        if (instability.isPresent()) {
            throw new UnstableBeamException(instability.get());
        }
        Map<String, SectionProperties> sections = new LinkedHashMap<>();
        for (Section s : job.sections().values()) {
            sections.put(s.id(), SectionCalculator.of(s));
        }
        List<Load> loads = new ArrayList<>(job.loads());
        loads.addAll(SelfWeight.loads(job.beam(), sections, job.materials()));
        StructureModel model = StructureModel.build(job.beam(), loads, sections, job.materials());
        Set<String> caseNames = new LinkedHashSet<>();
        loads.forEach(l -> caseNames.add(l.loadCase()));
        Map<String, Response> cases = new LinkedHashMap<>();
        for (String name : caseNames) {
            cases.put(name, solve(model, loads.stream().filter(l -> l.loadCase().equals(name)).toList(), name, job));
        }
        List<String> dropped = new ArrayList<>();
        List<Combination> combinations = new ArrayList<>();
        List<String> references = new ArrayList<>();
        String source;
        if (job.combinationSet() != null) {
            CombinationSet set = BuiltInSets.find(job.combinationSet()).orElseThrow();
            CombinationSet.Expansion expansion = set.expand(caseNames);
            combinations.addAll(expansion.combinations());
            references.addAll(expansion.references());
            dropped.addAll(expansion.dropped());
            source = set.source();
        } else {
            combinations.addAll(job.combinations());
            combinations.forEach(c -> references.add("job file"));
            source = "job file";
        }
        Stresses stresses = new Stresses(model);
        List<CombinationResult> results = new ArrayList<>();
        for (int i = 0; i < combinations.size(); i++) {
            Combination c = combinations.get(i);
            Superposition sum = new Superposition(c.factors().size()).addCases(cases, c.factors());
            results.add(result(model, stresses, sum, c.name(), c.factors(), references.get(i), "", List.of()));
        }
        List<AnalysisResult.Span> spans = Spans.of(job.beam());
        if (!job.pattern().isEmpty()) {
            results.addAll(patterns(job, model, loads, spans, combinations, references, cases, stresses));
        }
        Extremes envelope = Envelope.of(results);
        return new AnalysisResult(job, model, List.copyOf(loads), sections, cases, results, envelope, dropped, source, spans);
    }

    private static Response solve(StructureModel model, List<Load> loads, String name, Job job) throws UnstableBeamException {
        try {
            return CaseSolver.solve(model, CaseSolver.loadsOf(model, loads), name);
        } catch (BandedSolver.NotPositiveDefinite e) {
            throw new UnstableBeamException(new Instability("beam", job.beam().supports().get(0).where(),
                    "the stiffness matrix is singular to working precision: check for a spring or a segment whose"
                            + " stiffness differs from the rest by many orders of magnitude"));
        }
    }

    private static CombinationResult result(StructureModel model, Stresses stresses, Superposition sum, String name,
                                            Map<String, Double> factors, String reference, String arrangement, List<Integer> regions) {
        return new CombinationResult(name, factors, reference, arrangement, regions, () -> sum.response(model, name),
                stresses.extremes(sum, model.elementStarts(), model.elementEnds()));
    }

    /**
     * Each combination that carries a pattern case, again with that case on some regions only.
     * Each region's share of a pattern case is solved once; an arrangement is the combination
     * less the full pattern case plus the loaded regions' shares.
     */
    private static List<CombinationResult> patterns(Job job, StructureModel model, List<Load> loads,
                                                    List<AnalysisResult.Span> spans, List<Combination> combinations,
                                                    List<String> references, Map<String, Response> cases,
                                                    Stresses stresses) throws UnstableBeamException {
        Map<String, Response[]> shares = new LinkedHashMap<>();
        for (String p : job.pattern()) {
            List<Load> ofCase = loads.stream().filter(l -> l.loadCase().equals(p)).toList();
            Response[] perSpan = new Response[spans.size()];
            for (int i = 0; i < spans.size(); i++) {
                AnalysisResult.Span span = spans.get(i);
                perSpan[i] = solve(model, Spans.within(ofCase, span.from(), span.to(), i == spans.size() - 1), p, job);
            }
            shares.put(p, perSpan);
        }
        List<boolean[]> arrangements = Spans.arrangements(spans.size());
        List<CombinationResult> results = new ArrayList<>();
        for (int c = 0; c < combinations.size(); c++) {
            Combination combination = combinations.get(c);
            boolean patterned = job.pattern().stream().anyMatch(p -> combination.factors().getOrDefault(p, 0.0) != 0);
            if (!patterned) {
                continue;
            }
            Map<String, Double> fixed = new LinkedHashMap<>(combination.factors());
            job.pattern().forEach(fixed::remove);
            for (boolean[] loaded : arrangements) {
                String arrangement = describe(spans, loaded);
                String name = combination.name() + " (" + String.join(", ", job.pattern()) + " on " + arrangement + ")";
                Superposition terms = new Superposition(fixed.size() + loaded.length).addCases(cases, fixed);
                for (String p : job.pattern()) {
                    double factor = combination.factors().getOrDefault(p, 0.0);
                    for (int i = 0; i < loaded.length; i++) {
                        if (loaded[i] && factor != 0) {
                            terms.add(shares.get(p)[i], factor);
                        }
                    }
                }
                List<Integer> regions = new ArrayList<>();
                for (int i = 0; i < loaded.length; i++) {
                    if (loaded[i]) {
                        regions.add(i);
                    }
                }
                results.add(result(model, stresses, terms, name, combination.factors(), references.get(c), arrangement, regions));
            }
        }
        return results;
    }

    static String describe(List<AnalysisResult.Span> spans, boolean[] loaded) {
        List<String> numbered = new ArrayList<>();
        List<String> other = new ArrayList<>();
        for (int i = 0; i < loaded.length; i++) {
            if (loaded[i]) {
                String label = spans.get(i).label();
                if (label.startsWith("span ")) {
                    numbered.add(label.substring(5));
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
}
