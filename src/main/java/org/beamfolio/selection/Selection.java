package org.beamfolio.selection;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.UnstableBeamException;
import org.beamfolio.catalogue.ShapeProperty;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.checks.Checks;
import org.beamfolio.checks.timber.TimberInputException;
import org.beamfolio.design.steel.Detail;
import org.beamfolio.design.steel.OutOfScopeException;
import org.beamfolio.design.steel.SteelDesignWork;
import org.beamfolio.model.Job;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionChoice;
import org.beamfolio.model.SectionShape;

/**
 * The selection stage's entry point: chooses the section a job leaves to the tool
 * ({@code choose:}). Candidates are tried in the order the reader gives them, lightest first;
 * each is put in the job, the job is analysed and every check it asks for is run, exactly as if
 * the engineer had named that section (its own self weight included), and the first that passes
 * every check is chosen. When none passes, the candidate with the lowest governing ratio is
 * used, so the package can be written and show by how much it misses.
 *
 * <p>The search works on one member's job, so a project of several members can apply it to each.
 */
public final class Selection {
    private Selection() {}

    /**
     * The job with its section to be chosen replaced by the candidate chosen, which carries the
     * candidates tried; the job itself when it leaves no section to the tool.
     *
     * @throws UnstableBeamException when the beam cannot be solved (whatever the section)
     * @throws TimberInputException when no candidate can be checked (e.g. every one too slender for the NDS)
     */
    public static Job resolve(Job job) throws UnstableBeamException {
        Section open = sectionToChoose(job);
        if (open == null) {
            return job;
        }
        List<SectionChoice.Trial> tried = new ArrayList<>();
        TimberInputException firstRefusal = null;
        List<Section> candidates = open.choice().candidates();
        int window = Math.max(1, Runtime.getRuntime().availableProcessors());
        search:
        for (int from = 0; from < candidates.size(); from += window) {
            // the next few candidates are tried side by side; the results are read in order, and those
            // after the first that passes are dropped, so the outcome is the same as one by one
            for (Trial trial : trials(job, open, candidates.subList(from, Math.min(from + window, candidates.size())))) {
                if (trial.refusal() != null && firstRefusal == null) {
                    firstRefusal = trial.refusal();
                }
                tried.add(trial.entry());
                if (trial.entry().pass()) {
                    break search;
                }
            }
        }
        SectionChoice searched = open.choice().withTried(tried);
        SectionChoice.Trial chosen = searched.chosen();
        if (chosen == null && firstRefusal != null) {
            throw firstRefusal;
        }
        if (chosen == null) {
            // the reader refuses listed shapes outside the design's scope, and no family has only such shapes
            throw new IllegalStateException("no candidate for section " + open.id() + " could be checked: "
                    + tried.get(0).description());
        }
        return Jobs.withSection(job, open.chosenAs(chosen.section(), searched));
    }

    /** The section of the beam left to the tool (the reader allows one a beam), or null. */
    static Section sectionToChoose(Job job) {
        List<String> used = new ArrayList<>();
        used.add(job.beam().section());
        job.beam().segments().forEach(s -> used.add(s.section()));
        for (String id : used) {
            Section s = job.sections().get(id);
            if (s != null && s.choice() != null && s.choice().tried().isEmpty()) {
                return s;
            }
        }
        return null;
    }

    /** Each candidate's trial, in order; worked in parallel, as each is independent of the others. */
    private static List<Trial> trials(Job job, Section open, List<Section> candidates) throws UnstableBeamException {
        if (candidates.size() == 1) {
            return List.of(trial(job, open, candidates.get(0)));
        }
        try {
            return candidates.parallelStream().map(c -> {
                try {
                    return trial(job, open, c);
                } catch (UnstableBeamException e) {
                    throw new Unstable(e);
                }
            }).toList();
        } catch (Unstable e) {
            throw e.cause;
        }
    }

    /** Carries a beam's instability out of a parallel stream. */
    private static final class Unstable extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient UnstableBeamException cause;

        Unstable(UnstableBeamException cause) {
            super(cause);
            this.cause = cause;
        }
    }

    /** One candidate's entry, and the refusal that kept it from being checked (or null). */
    private record Trial(SectionChoice.Trial entry, TimberInputException refusal) {}

    private static Trial trial(Job job, Section open, Section candidate) throws UnstableBeamException {
        Job named = asNamed(job, open, candidate);
        double weight = weight(job, open.id(), candidate);
        double area = area(candidate);
        try {
            List<CheckOutcome> outcomes = outcomes(named, Detail.VALUES);
            CheckOutcome governing = outcomes.stream().max(Comparator.comparingDouble(CheckOutcome::ratio)).orElse(null);
            boolean pass = outcomes.stream().allMatch(CheckOutcome::pass);
            if (governing == null) {
                return new Trial(new SectionChoice.Trial(candidate, weight, area, "none", "no check", Double.NaN, pass), null);
            }
            return new Trial(new SectionChoice.Trial(candidate, weight, area, governing.id(), governing.description(),
                    governing.ratio(), pass), null);
        } catch (TimberInputException e) {
            return new Trial(new SectionChoice.Trial(candidate, weight, area, "not checked", e.getMessage(), Double.NaN, false), e);
        } catch (OutOfScopeException e) {
            return new Trial(new SectionChoice.Trial(candidate, weight, area, "out of scope", e.getMessage(), Double.NaN, false), null);
        }
    }

    /** The job with the section to choose replaced by the candidate, as if the engineer had named it. */
    static Job asNamed(Job job, Section open, Section candidate) {
        return Jobs.withSection(job, new Section(open.id(), candidate.shape(), candidate.flip(), candidate.lumber()));
    }

    /**
     * Every check outcome of the job as named, its steel design worked for {@code detail}: a
     * candidate's design is worked for its values only ({@link Detail#VALUES}), as no package prints
     * it (the chosen one is analysed and designed afresh, with its equations, for the package).
     */
    static List<CheckOutcome> outcomes(Job named, Detail detail) throws UnstableBeamException {
        AnalysisResult result = Analysis.run(named);
        if (detail == Detail.VALUES) {
            SteelDesignWork.valuesOnly(result);
        }
        return Checks.run(result);
    }

    /** Weight per length, N/m: the catalogue's W, or density x A of the material the section is used with (NaN without a density). */
    static double weight(Job job, String sectionId, Section candidate) {
        if (candidate.shape() instanceof SectionShape.Catalogued c) {
            return c.shape().get(ShapeProperty.W);
        }
        String materialId = job.beam().section().equals(sectionId) ? job.beam().material()
                : job.beam().segments().stream().filter(s -> s.section().equals(sectionId)).map(s -> s.material())
                        .findFirst().orElse(job.beam().material());
        Material m = job.materials().get(materialId);
        return m == null || m.weightDensity() == null ? Double.NaN : m.weightDensity() * area(candidate);
    }

    /** Cross-section area, m^2 (the catalogue's A, or b x h of lumber). */
    static double area(Section candidate) {
        if (candidate.shape() instanceof SectionShape.Catalogued c) {
            return c.shape().get(ShapeProperty.A);
        }
        if (candidate.shape() instanceof SectionShape.Rectangle r) {
            return r.b() * r.h();
        }
        return Double.NaN;
    }

    /** Every section of the job by id, for building a job with one replaced. */
    static Map<String, Section> sections(Job job, Section replacement) {
        Map<String, Section> sections = new LinkedHashMap<>(job.sections());
        sections.put(replacement.id(), replacement);
        return sections;
    }
}
