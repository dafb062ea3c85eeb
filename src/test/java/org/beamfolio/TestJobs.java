package org.beamfolio;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Response;
import org.beamfolio.analysis.UnstableBeamException;
import org.beamfolio.job.JobReader;
import org.beamfolio.job.JobReading;
import org.beamfolio.model.Job;

/**
 * Test beams written as job files. The common part fixes EI = 200 GPa x 1e8 mm^4 = 2e7 N*m^2
 * (invented test data, chosen for round numbers), so closed forms can be evaluated by hand.
 */
public final class TestJobs {
    public static final double EI = 200e9 * 1e8 * 1e-12;

    private TestJobs() {}

    public static String header() {
        return """
                beamfolio: 1
                project: { title: Test beam, number: T-1 }
                report: { units: SI, paper: a4 }
                materials:
                  m: { E: 200 GPa, density: 7850 kg/m^3, allowable: { tension: 165 MPa, compression: 165 MPa, shear: 100 MPa } }
                sections:
                  s: { shape: given, I: 1e8 mm^4, depth: 300 mm, y_bottom: 150 mm, A: 5000 mm^2, Q: 4e5 mm^3, t: 8 mm }
                """;
    }

    /** A job of the common header, this beam block (indented under beam:) and these loads. */
    public static String text(String length, String supports, String loads) {
        return header() + "beam:\n  length: " + length + "\n  section: s\n  material: m\n  supports:\n" + supports
                + "loads:\n" + loads;
    }

    /**
     * A 20 ft simple span of A992 steel, top flange braced, under D 0.5 klf and L 1.5 klf (LRFD,
     * AISC 360-16), whose section b1 is chosen by {@code choose}; with {@code selfWeight} the
     * chosen shape's own weight is added to D. Mu = (1.2 x 0.5 + 1.6 x 1.5) x 20^2 / 8 = 150 kip*ft
     * without self weight (statics by hand).
     */
    public static String chosenFloorBeam(String choose, boolean selfWeight) {
        return """
                beamfolio: 1
                project: { title: Test floor beam, number: T-41, date: 2026-12-02 }
                report: { units: US }
                materials:
                  a992: { grade: A992 }
                sections:
                  b1: { choose: %s }
                beam:
                  length: 20 ft
                  section: b1
                  material: a992
                  bracing: { top: continuous, bottom: supports }
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 20 ft, type: roller }
                %s
                loads:
                  - { case: D, type: uniform, w: 0.5 klf }
                  - { case: L, type: uniform, w: 1.5 klf }
                combinations: ASCE7-LRFD
                design: { steel: AISC360-16 }
                """.formatted(choose, selfWeight ? "  self_weight: D" : "");
    }

    public static JobReading read(String text) {
        return JobReader.read("test.yaml", "test", text.getBytes(StandardCharsets.UTF_8));
    }

    public static Job job(String text) {
        JobReading reading = read(text);
        assertTrue(reading.ok(), () -> "test job should be valid:\n" + reading.report() + "\n" + text);
        return reading.job();
    }

    /**
     * Every beam of an example job file, solved: the one beam of a single-beam job, or each member
     * of a job with members along its load path, with the reactions it carries brought in.
     */
    public static java.util.List<AnalysisResult> solveEvery(java.nio.file.Path file) {
        JobReading reading = JobReader.read(file);
        assertTrue(reading.ok(), reading::report);
        try {
            if (!reading.hasMembers()) {
                return java.util.List.of(Analysis.run(reading.job()));
            }
            java.util.Map<String, AnalysisResult> solved = new java.util.LinkedHashMap<>();
            for (java.util.List<Job> level : org.beamfolio.analysis.LoadPath.levels(reading.project())) {
                for (Job member : level) {
                    solved.put(member.member(), Analysis.run(org.beamfolio.analysis.MemberLoads.withReactions(member, solved)));
                }
            }
            return java.util.List.copyOf(solved.values());
        } catch (UnstableBeamException e) {
            throw new AssertionError("example beam should be stable: " + e.getMessage(), e);
        }
    }

    public static AnalysisResult solve(String text) {
        try {
            return Analysis.run(job(text));
        } catch (UnstableBeamException e) {
            throw new AssertionError("test beam should be stable: " + e.getMessage(), e);
        }
    }

    /**
     * The out-of-balance of a response against the job's loads (statics): the sum of vertical
     * forces and of moments about x = 0, each divided by the size of what was summed (the loads'
     * and reactions' magnitudes, and those times the beam length), so the residuals are relative.
     */
    public static double[] relativeResiduals(org.beamfolio.model.Job job, Response r) {
        double force = 0;
        double moment = 0;
        double size = 0;
        for (org.beamfolio.model.Load l : job.loads()) {
            force -= l.force();
            moment += -l.force() * l.centroid() + l.couple();
            size += Math.abs(l.force()) + Math.abs(l.couple()) / job.beam().length();
            if (l instanceof org.beamfolio.model.Load.Distributed d) {
                size += Math.abs(d.wEnd() - d.wStart()) * (d.to() - d.from());
            }
        }
        for (int i = 0; i < job.beam().supports().size(); i++) {
            force += r.reactionForce()[i];
            moment += r.reactionForce()[i] * job.beam().supports().get(i).at() + r.reactionMoment()[i];
            size += Math.abs(r.reactionForce()[i]);
        }
        return new double[] {force / size, moment / (size * job.beam().length())};
    }

    /** The response to load case D of a job. */
    public static Response caseD(String text) {
        return solve(text).cases().get("D");
    }
}
