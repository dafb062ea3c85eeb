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
import org.beamfolio.model.Purpose;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.model.Section;
import org.beamfolio.section.SectionCalculator;
import org.beamfolio.section.SectionProperties;
import org.beamfolio.units.Lengths;
import org.beamfolio.units.UnitSystem;

/**
 * The analysis stage's entry point: checks the beam is stable, builds the element model, solves
 * each load case once, and forms every combination and pattern arrangement by superposition.
 */
public final class Analysis {
    private Analysis() {}

    public static AnalysisResult run(Job job) throws UnstableBeamException {
        Optional<Instability> instability = Stability.check(job.beam(), job.report().units() == UnitSystem.SI
                ? Lengths.Style.METRES : Lengths.Style.FEET_AND_INCHES);
        if (instability.isPresent()) {
            throw new UnstableBeamException(instability.get());
        }
        Map<String, SectionProperties> sections = new LinkedHashMap<>();
        for (Section s : job.sections().values()) {
            sections.put(s.id(), SectionCalculator.of(s));
        }
        List<Load> loads = new ArrayList<>(job.loads());
        loads.addAll(SelfWeight.loads(job.beam(), sections, job.materials(), job.sections()));
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
        List<AnalysisResult.Span> spans = Spans.of(job.beam());
        Patterns patterns = patterns(job, model, loads, spans, cases);
        ReactionEnvelope reactions = new ReactionEnvelope(model.supports().size());
        List<CombinationResult> results = new ArrayList<>();
        for (int i = 0; i < combinations.size(); i++) {
            Combination c = combinations.get(i);
            results.add(result(model, stresses, reactions, patterns.terms(c.factors(), null), c.name(), c.factors(),
                    references.get(i), c.purpose(), "", List.of()));
        }
        for (int i = 0; i < combinations.size(); i++) {
            Combination c = combinations.get(i);
            if (patterns.casesIn(c.factors()).isEmpty()) {
                continue;
            }
            for (boolean[] loaded : patterns.arrangements()) {
                results.add(result(model, stresses, reactions, patterns.terms(c.factors(), loaded),
                        patterns.name(c.name(), c.factors(), loaded), c.factors(), references.get(i), c.purpose(),
                        patterns.describe(loaded), Patterns.regions(loaded)));
            }
        }
        Extremes envelope = Envelope.of(results);
        return new AnalysisResult(job, model, List.copyOf(loads), sections, cases, results, envelope, dropped, source, spans,
                patterns, reactions, new Worked());
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

    private static CombinationResult result(StructureModel model, Stresses stresses, ReactionEnvelope reactions, Superposition sum,
                                            String name, Map<String, Double> factors, String reference, Purpose purpose,
                                            String arrangement, List<Integer> regions) {
        reactions.accept(name, sum.reactionForces(model.supports().size()));
        return new CombinationResult(name, factors, reference, purpose, arrangement, regions, () -> sum.response(model, name),
                stresses.extremes(sum, model.elementStarts(), model.elementEnds()));
    }

    /** Each pattern case's share on each region, solved once. */
    private static Patterns patterns(Job job, StructureModel model, List<Load> loads, List<AnalysisResult.Span> spans,
                                     Map<String, Response> cases) throws UnstableBeamException {
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
        return new Patterns(job.pattern(), shares, spans, cases, model);
    }
}
