package org.beamfolio.properties;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Response;
import org.beamfolio.model.Hinge;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;
import org.junit.jupiter.api.Test;

/**
 * Properties of statics and linear elasticity (common practice) over random valid beams drawn
 * from fixed seeds: equilibrium, zero moment at free ends and hinges, superposition, and mirror
 * symmetry.
 */
class BeamPropertiesTest {
    /** The response to every load together: the last default combination, all cases at 1.0. */
    private static Response all(AnalysisResult r) {
        return r.combinations().get(r.combinations().size() - 1).response();
    }

    private static double scale(Response r) {
        return Math.max(Math.abs(r.moment().max().value()), Math.abs(r.moment().min().value()));
    }

    @Test
    void reactionsBalanceTheLoads() {
        Trials.forAll(11, 200, RandomBeams::next, beam -> {
            AnalysisResult r = TestJobs.solve(beam.text());
            Job job = r.job();
            Response all = all(r);
            double[] residual = TestJobs.relativeResiduals(job, all);
            assertEquals(0, residual[0], 1e-9, "vertical forces");
            assertEquals(0, residual[1], 1e-9, "moments about x = 0");
        });
    }

    @Test
    void momentIsZeroAtFreeEndsAndHinges() {
        Trials.forAll(12, 200, RandomBeams::next, beam -> {
            AnalysisResult r = TestJobs.solve(beam.text());
            Job job = r.job();
            Response all = all(r);
            double scale = scale(all) + couples(job);
            double length = job.beam().length();
            List<Support> supports = job.beam().supports();
            if (supports.get(0).at() > 0) {
                assertEquals(0, (all.moment().at(0) + coupleAt(job, 0)) / scale, 1e-9, "free left end");
            }
            if (supports.get(supports.size() - 1).at() < length) {
                assertEquals(0, (all.moment().leftOf(length) - coupleAt(job, length)) / scale, 1e-9, "free right end");
            }
            for (Hinge h : job.beam().hinges()) {
                assertEquals(0, all.moment().leftOf(h.at()) / scale, 1e-9, "left of the hinge at " + h.at());
            }
        });
    }

    private static double couples(Job job) {
        return job.loads().stream().filter(l -> l instanceof Load.Couple).mapToDouble(l -> Math.abs(((Load.Couple) l).M())).sum();
    }

    /** A couple right at a free end sets the moment there. */
    private static double coupleAt(Job job, double x) {
        return job.loads().stream().filter(l -> l instanceof Load.Couple c && c.at() == x).mapToDouble(l -> ((Load.Couple) l).M()).sum();
    }

    @Test
    void extremesFoundPieceByPieceAreThoseOfTheWholeDiagrams() {
        // a combination's extremes come from its load cases piece by piece, its diagrams are summed
        // only when read: both must give the same numbers, to the bit (the same sums in the same order)
        Trials.forAll(15, 150, RandomBeams::next, beam -> {
            for (org.beamfolio.analysis.CombinationResult c : TestJobs.solve(beam.text()).combinations()) {
                Response r = c.response();
                assertEquals(r.moment().max().value(), c.extremes().momentMax().value(), 0.0, c.name() + " largest moment");
                assertEquals(r.moment().max().at(), c.extremes().momentMax().at(), 0.0, c.name() + " where");
                assertEquals(r.moment().min().value(), c.extremes().momentMin().value(), 0.0, c.name() + " smallest moment");
                assertEquals(r.shear().max().value(), c.extremes().shearMax().value(), 0.0, c.name() + " largest shear");
                assertEquals(r.shear().min().at(), c.extremes().shearMin().at(), 0.0, c.name() + " where the smallest shear");
                assertEquals(r.deflection().max().value(), c.extremes().deflectionMax().value(), 0.0, c.name() + " deflection");
                assertEquals(r.deflection().min().value(), c.extremes().deflectionMin().value(), 0.0, c.name() + " upward deflection");
            }
        });
    }

    @Test
    void theSumOfTwoCasesIsTheResultOfTheirLoadsTogether() {
        Trials.forAll(13, 150, RandomBeams::next, beam -> {
            Response combined = all(TestJobs.solve(beam.text()));
            Response single = TestJobs.solve(beam.text().replace("case: L", "case: D")).cases().get("D");
            double scale = scale(single) + 1;
            for (int i = 0; i < combined.reactionForce().length; i++) {
                assertEquals(single.reactionForce()[i], combined.reactionForce()[i], 1e-9 * (Math.abs(single.reactionForce()[i]) + scale));
            }
            for (double f = 0; f <= 1.0; f += 0.125) {
                double x = f * beam.length();
                assertEquals(single.moment().at(x), combined.moment().at(x), 1e-9 * scale, "moment at " + x);
            }
        });
    }

    @Test
    void aBeamAndItsMirrorImageGiveMirroredResults() {
        Trials.forAll(14, 150, RandomBeams::next, beam -> {
            Response a = all(TestJobs.solve(beam.text()));
            Response b = all(TestJobs.solve(beam.mirrored()));
            double length = beam.length();
            int n = a.reactionForce().length;
            // the mirror is solved on its own: the two agree to the solution's round-off, which a
            // near-mechanism lever (a hinge just past a support) magnifies; hence 1e-8, not 1e-9
            double forces = java.util.Arrays.stream(a.reactionForce()).map(Math::abs).max().orElse(0) + 1;
            double scale = scale(a) + forces * length;
            for (int i = 0; i < n; i++) {
                assertEquals(a.reactionForce()[i], b.reactionForce()[n - 1 - i], 1e-8 * forces, "reaction " + i);
                assertEquals(a.reactionMoment()[i], -b.reactionMoment()[n - 1 - i], 1e-8 * scale, "support moment " + i);
            }
            double deflection = Math.max(Math.abs(a.deflection().max().value()), Math.abs(a.deflection().min().value())) + 1e-15;
            for (double f = 0.0625; f < 1.0; f += 0.125) {
                double x = f * length;
                assertEquals(a.moment().at(x), b.moment().at(length - x), 1e-8 * scale, "moment at " + x);
                assertEquals(a.deflection().at(x), b.deflection().at(length - x), 1e-7 * deflection, "deflection at " + x);
            }
        });
    }
}
