package org.beamfolio.cli;

import org.beamfolio.checks.CheckedMember;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Instability;
import org.beamfolio.analysis.LoadPath;
import org.beamfolio.analysis.MemberLoads;
import org.beamfolio.analysis.UnstableBeamException;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.checks.Checks;
import org.beamfolio.job.Diagnostic;
import org.beamfolio.job.JobReading;
import org.beamfolio.model.Job;
import org.beamfolio.model.ProjectJob;

/**
 * Solves and checks the members of a job with members along the load path: level by level, each
 * member after those whose reactions it carries, with the reactions brought in case by case. The
 * members of one level do not depend on each other and are solved side by side.
 */
final class MemberSolver {
    private MemberSolver() {}

    /** One member solved, or the message that says why it cannot be. */
    private record Done(CheckedMember member, Diagnostic problem) {}

    static Pipeline.Solved solve(JobReading reading) {
        ProjectJob project = reading.project();
        Map<String, AnalysisResult> solved = new ConcurrentHashMap<>();
        Map<String, CheckedMember> done = new ConcurrentHashMap<>();
        for (List<Job> level : LoadPath.levels(project)) {
            List<Done> outcomes = level.size() == 1 ? List.of(solve(reading, level.get(0), solved))
                    : level.parallelStream().map(m -> solve(reading, m, solved)).toList();
            for (Done d : outcomes) {
                if (d.problem() != null) {
                    return Pipeline.badInput(reading, d.problem());
                }
                solved.put(d.member().id(), d.member().result());
                done.put(d.member().id(), d.member());
            }
        }
        List<CheckedMember> members = project.members().stream().map(m -> done.get(m.member())).toList();
        List<CheckOutcome> checks = new ArrayList<>();
        members.forEach(m -> checks.addAll(m.checks()));
        return new Pipeline.Solved(null, checks, List.of(), Main.OK, members);
    }

    private static Done solve(JobReading reading, Job member, Map<String, AnalysisResult> solved) {
        String prefix = "member " + member.member() + ": ";
        try {
            AnalysisResult result = Analysis.run(org.beamfolio.selection.Selection.resolve(MemberLoads.withReactions(member, solved)));
            return new Done(new CheckedMember(member.member(), result, Checks.run(result)), null);
        } catch (UnstableBeamException e) {
            Instability i = e.instability();
            return new Done(null, new Diagnostic(reading.file(), i.where(), i.keyPath(), prefix + i.message()));
        } catch (org.beamfolio.checks.timber.TimberInputException e) {
            return new Done(null, new Diagnostic(reading.file(), e.where(), e.keyPath(), prefix + e.getMessage()));
        }
    }
}
