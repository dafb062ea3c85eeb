package org.beamfolio.properties;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.Checks;
import org.beamfolio.derivation.Step;
import org.beamfolio.derivation.StressSteps;
import org.beamfolio.job.JobReader;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.units.ReportUnits;
import org.junit.jupiter.api.Test;

/**
 * One value everywhere: the demand of every stress check is the result its worked step prints
 * and keeps, the same double, with the same combination, over every example job and a few
 * hundred random beams. The worked step and the check read one object of the analysis, so this
 * fails as soon as either finds its own governing point.
 */
class WorkedEqualsCheckedTest {
    private static final String STRESS_CHECK = "checks:\n  stress: true\n";

    @Test
    void everyExampleJobWorksWhatItChecks() throws Exception {
        int compared = 0;
        for (Path job : examples()) {
            for (AnalysisResult r : TestJobs.solveEvery(job)) {
                compared += compare(r, Checks.run(r), StressSteps.of(r), job.toString());
            }
        }
        assertTrue(compared >= 9, "stress checks compared with their worked steps: " + compared);
    }

    @Test
    void randomBeamsWorkWhatTheyCheck() {
        int[] compared = {0};
        Trials.forAll(41, 300, RandomBeams::next, beam -> {
            AnalysisResult r = TestJobs.solve(beam.text() + STRESS_CHECK);
            List<CheckOutcome> checks = Checks.run(r);
            assertEquals(3, checks.stream().filter(c -> c.id().startsWith("stress-")).count(), "three stress checks");
            compared[0] += compare(r, checks, StressSteps.of(r), "random beam");
        });
        assertEquals(900, compared[0]);
    }

    /**
     * A tee on a pin and a roller with a 4 ft overhang, a 10,000 lb*ft clockwise couple at the
     * roller and 4,000 lb at the tip (invented). By statics the moment is -4,000 x 4 = -16,000
     * lb*ft just right of the roller and -16,000 - 10,000 = -26,000 lb*ft just left of it, where
     * both fibre stresses govern. The tee (8 x 2 in flange on a 2 x 10 in web, by hand):
     * A = 36 in^2, y_b = 276 / 36 = 7.6667 in, I = 5.333 + 177.78 + 166.67 + 142.22 = 492.0 in^4,
     * c_top = 4.3333 in; top tension 26,000 x 12 x 4.3333 / 492 = 2,747.97 psi, bottom
     * compression 26,000 x 12 x 7.6667 / 492 = 4,861.79 psi. Shear: V = 4,000 lb on the overhang,
     * Q at the neutral axis = 16 x 3.3333 + 2 x 2.3333^2 / 2 = 58.778 in^3, t = 2 in,
     * tau = 4,000 x 58.778 / (492 x 2) = 238.93 psi.
     */
    @Test
    void teeWithOverhangAndCoupleWorksTheSideThatGoverns() {
        String job = """
                beamfolio: 1
                project: { title: Tee with overhang, number: T-2 }
                report: { units: US, paper: letter }
                materials:
                  m: { E: 29000 ksi, allowable: { tension: 20 ksi, compression: 20 ksi, shear: 12 ksi } }
                sections:
                  tee: { shape: tee, d: 12 in, bf: 8 in, tf: 2 in, tw: 2 in }
                beam:
                  length: 20 ft
                  section: tee
                  material: m
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 16 ft, type: roller }
                loads:
                  - { case: D, type: moment, M: 10000 lb*ft, at: 16 ft, sense: cw }
                  - { case: D, type: point, P: 4000 lb, at: 20 ft }
                checks:
                  stress: true
                """;
        AnalysisResult r = TestJobs.solve(job);
        List<CheckOutcome> checks = Checks.run(r);
        List<Step> steps = StressSteps.of(r);
        compare(r, checks, steps, "tee");
        assertEquals(2747.97, demand(r, checks, "stress-tension"), 0.01);
        assertEquals(4861.79, demand(r, checks, "stress-compression"), 0.01);
        assertEquals(238.93, demand(r, checks, "stress-shear"), 0.01);
        for (String what : List.of("Largest tension", "Largest compression")) {
            Step s = step(steps, what);
            assertTrue(s.statement().contains("just left of x = 16"), s.statement());
            assertTrue(s.substituted().contains("(-26,000) [lb·ft]"), s.substituted());
        }
        assertTrue(step(steps, "Largest shear stress").substituted().startsWith("τ = 4,000 [lb]"), step(steps, "Largest shear").substituted());
    }

    /** A check's demand as the package prints it, in the report's units. */
    private static double demand(AnalysisResult r, List<CheckOutcome> checks, String id) {
        return reported(r, checks.stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow());
    }

    /** The worked steps print report units; the check keeps SI and is converted at the edge, once. */
    private static double reported(AnalysisResult r, CheckOutcome c) {
        return ReportUnits.of(r.job().report().units()).inReportUnit(c.demand(), c.measure());
    }

    private static Step step(List<Step> steps, String statement) {
        return steps.stream().filter(s -> s.statement().startsWith(statement)).findFirst()
                .orElseThrow(() -> new AssertionError("no worked step \"" + statement + "\""));
    }

    /** Each stress check against its worked step: the same double and combination. Returns how many. */
    private static int compare(AnalysisResult r, List<CheckOutcome> checks, List<Step> steps, String job) {
        int compared = 0;
        for (CheckOutcome c : checks) {
            String statement = switch (c.id()) {
                case "stress-tension" -> "Largest tension";
                case "stress-compression" -> "Largest compression";
                case "stress-shear" -> "Largest shear stress";
                default -> null;
            };
            if (statement == null) {
                continue;
            }
            Step s = step(steps, statement);
            if (c.demand() == 0) {
                assertTrue(Double.isNaN(s.value()), job + ": " + c.id() + " has no demand, and the step says so: " + s.statement());
            } else {
                assertEquals(reported(r, c), Math.abs(s.value()), 0.0, job + ": " + c.id() + " checked against worked " + s.statement());
                assertTrue(s.statement().contains(" under " + c.combination()), job + ": " + c.id() + " under " + c.combination()
                        + ", worked: " + s.statement());
            }
            assertFalse(s.statement().contains("no allowable-stress"), job + ": checked combinations are worked");
            compared++;
        }
        return compared;
    }

    private static List<Path> examples() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("example-jobs"))) {
            return files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList();
        }
    }
}
