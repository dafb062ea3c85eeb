package org.beamfolio.analysis;

import static org.beamfolio.TestJobs.text;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.beamfolio.TestJobs;
import org.beamfolio.model.Hinge;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;
import org.beamfolio.model.SupportKind;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Structural invariants every solved beam must satisfy (statics and compatibility, common
 * practice): reactions balance the loads in force and moment; moment vanishes at end pins and
 * rollers, hinges and free ends; shear jumps by each point load and reaction; deflection is zero
 * at rigid supports and continuous everywhere.
 */
class InvariantsTest {
    static final String LOADS = """
              - { case: D, type: uniform, w: 4 kN/m }
              - { case: D, type: uniform, w: 7 kN/m, from: 1.2 m, to: 4.1 m }
              - { case: D, type: linear, w: [2 kN/m, 9 kN/m], from: 0.5 m, to: 5.5 m }
              - { case: D, type: point, P: 18 kN, at: 2.3 m }
              - { case: D, type: point, P: -6 kN, at: 4.9 m }
              - { case: D, type: moment, M: 11 kN*m, at: 3.7 m, sense: ccw }
            """;

    static Stream<Arguments> beams() {
        List<Arguments> beams = new ArrayList<>();
        beams.add(beam("simple span", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n", ""));
        beams.add(beam("cantilever fixed at left", "    - { at: 0 m, type: fixed }\n", ""));
        beams.add(beam("cantilever fixed at right", "    - { at: 6 m, type: fixed }\n", ""));
        beams.add(beam("propped", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: roller }\n", ""));
        beams.add(beam("fixed-fixed", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: fixed }\n", ""));
        beams.add(beam("overhangs both ends", "    - { at: 1 m, type: pin }\n    - { at: 5 m, type: roller }\n", ""));
        beams.add(beam("three spans", "    - { at: 0 m, type: pin }\n    - { at: 2 m, type: roller }\n"
                + "    - { at: 3.5 m, type: roller }\n    - { at: 6 m, type: roller }\n", ""));
        beams.add(beam("springs", "    - { at: 0 m, type: pin }\n    - { at: 2.5 m, type: spring, k: 800 kN/m, kr: 300 kN*m/rad }\n"
                + "    - { at: 6 m, type: spring, k: 2000 kN/m }\n", ""));
        beams.add(beam("hinged continuous", "    - { at: 0 m, type: fixed }\n    - { at: 3 m, type: roller }\n"
                + "    - { at: 6 m, type: roller }\n", "  hinges: [ 4.5 m ]\n"));
        beams.add(beam("two hinges, Gerber", "    - { at: 0 m, type: pin }\n    - { at: 2 m, type: roller }\n"
                + "    - { at: 4 m, type: roller }\n    - { at: 6 m, type: roller }\n", "  hinges: [ 2.5 m, 3.5 m ]\n"));
        beams.add(beam("hinge over an interior roller", "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: roller }\n"
                + "    - { at: 6 m, type: roller }\n", "  hinges: [ 3 m ]\n"));
        beams.add(beam("segments of other stiffness", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: pin }\n",
                "  segments:\n    - { from: 2 m, to: 3.5 m, section: s2 }\n"));
        return beams.stream();
    }

    private static Arguments beam(String name, String supports, String extra) {
        String text = text("6 m", supports, LOADS).replace("loads:\n", extra + "loads:\n")
                .replace("sections:\n", "sections:\n  s2: { shape: rectangle, b: 200 mm, h: 500 mm }\n");
        return Arguments.of(name, text);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("beams")
    void reactionsBalanceTheLoads(String name, String text) {
        Job job = TestJobs.job(text);
        Response r = TestJobs.solve(text).cases().get("D");
        double[] residual = TestJobs.relativeResiduals(job, r);
        assertEquals(0, residual[0], 1e-9, "sum of vertical forces, relative");
        assertEquals(0, residual[1], 1e-9, "sum of moments about x = 0, relative");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("beams")
    void momentIsZeroAtEndPinsRollersHingesAndFreeEnds(String name, String text) {
        Job job = TestJobs.job(text);
        Response r = TestJobs.solve(text).cases().get("D");
        double scale = Math.max(Math.abs(r.moment().max().value()), Math.abs(r.moment().min().value()));
        double length = job.beam().length();
        boolean leftHeld = job.beam().supports().stream().anyMatch(s -> s.at() == 0 && restrainsRotation(s));
        boolean rightHeld = job.beam().supports().stream().anyMatch(s -> s.at() == length && restrainsRotation(s));
        if (!leftHeld) {
            assertEquals(0, r.moment().at(0) / scale, 1e-9, "left end");
        }
        if (!rightHeld) {
            assertEquals(0, r.moment().leftOf(length) / scale, 1e-9, "right end");
        }
        for (Hinge h : job.beam().hinges()) {
            assertEquals(0, r.moment().leftOf(h.at()) / scale, 1e-9, "left of the hinge at " + h.at());
            assertEquals(0, r.moment().at(h.at()) / scale, 1e-9, "right of the hinge at " + h.at());
        }
    }

    private static boolean restrainsRotation(Support s) {
        return s.kind() instanceof SupportKind.Fixed || (s.kind() instanceof SupportKind.Spring sp && sp.kr() > 0);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("beams")
    void shearJumpsByEachPointLoadAndReaction(String name, String text) {
        Job job = TestJobs.job(text);
        Response r = TestJobs.solve(text).cases().get("D");
        double scale = Math.abs(r.shear().max().value()) + Math.abs(r.shear().min().value());
        List<Double> points = new ArrayList<>();
        job.loads().stream().filter(l -> l instanceof Load.Point).forEach(l -> points.add(((Load.Point) l).at()));
        job.beam().supports().forEach(s -> points.add(s.at()));
        for (double x : points) {
            double expected = 0;
            for (Load l : job.loads()) {
                if (l instanceof Load.Point p && p.at() == x) {
                    expected -= p.P();
                }
            }
            for (int i = 0; i < job.beam().supports().size(); i++) {
                if (job.beam().supports().get(i).at() == x) {
                    expected += r.reactionForce()[i];
                }
            }
            double left = x == 0 ? 0 : r.shear().leftOf(x);
            double right = x == job.beam().length() ? 0 : r.shear().at(x);
            assertEquals(expected, right - left, 1e-9 * scale, "shear jump at x = " + x);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("beams")
    void deflectionIsZeroAtRigidSupportsAndContinuous(String name, String text) {
        Job job = TestJobs.job(text);
        Response r = TestJobs.solve(text).cases().get("D");
        double scale = Math.max(Math.abs(r.deflection().max().value()), Math.abs(r.deflection().min().value()));
        assertTrue(scale > 0, "the beam deflects");
        for (Support s : job.beam().supports()) {
            if (!(s.kind() instanceof SupportKind.Spring)) {
                assertEquals(0, r.deflection().at(s.at()) / scale, 1e-9, "at the support at " + s.at());
            }
        }
        Field v = r.deflection();
        for (int i = 1; i < v.size(); i++) {
            double x = v.start(i);
            assertEquals(v.leftOf(x), v.at(x), 1e-9 * scale, "deflection continuous at " + x);
        }
        Field slope = r.slope();
        double slopeScale = Math.max(Math.abs(slope.max().value()), Math.abs(slope.min().value()));
        for (int i = 1; i < slope.size(); i++) {
            double x = slope.start(i);
            boolean hinge = job.beam().hinges().stream().anyMatch(h -> h.at() == x);
            if (!hinge) {
                assertEquals(slope.leftOf(x), slope.at(x), 1e-9 * slopeScale, "slope continuous at " + x);
            }
        }
    }
}
