package org.beamfolio.design.steel;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.UnbracedSegments;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Bracing;
import org.beamfolio.model.Job;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.Support;

/**
 * A steel beam designed to AISC 360 over every combination of the job (the job's method: its
 * ASCE 7 set, or {@code design.method} for its own list): flexure per unbraced segment of the
 * flange in compression (Lb, Cb by Eq. F1-1 from that combination's exact moment field, Mn by
 * Chapter F, demand the largest compressing moment in the segment), shear by Chapter G against the
 * largest |V|, and, at supports with a bearing length, web local yielding (J10.2) and crippling
 * (J10.3) against the largest downward reaction. Worked once per analysis ({@link #of}); the
 * checks, the design sheet and the results file all read it.
 */
public record SteelDesignWork(SteelMember member, Method method, List<FlexureRow> flexure, List<ShearRow> shear,
                              List<BearingRow> bearing) {
    public SteelDesignWork {
        flexure = List.copyOf(flexure);
        shear = List.copyOf(shear);
        bearing = List.copyOf(bearing);
    }

    /** One unbraced segment under one combination. */
    public record FlexureRow(CombinationResult combination, UnbracedSegments.Segment segment, MomentGradient gradient,
                             Strength strength, double demand, double available, double ratio) {}

    /** The largest shear of one combination against the shear strength. */
    public record ShearRow(CombinationResult combination, Extreme demand, Strength strength, double available, double ratio) {}

    /** One support's largest downward reaction against one web limit state. */
    public record BearingRow(int support, double at, CombinationResult combination, double force, Strength strength,
                             double available, double ratio) {}

    /** The design of the job's beam, worked once and kept with the analysis; null without {@code design.steel}. */
    public static SteelDesignWork of(AnalysisResult result) {
        if (result.job().steelDesign() == null) {
            return null;
        }
        return result.worked().get(SteelDesignWork.class, () -> work(result));
    }

    /** The member the job designs: its one catalogue shape in its material, to its edition. */
    public static SteelMember member(Job job) {
        Edition edition = Edition.find(job.steelDesign().specification()).orElseThrow();
        SectionShape shape = job.sections().get(job.beam().section()).shape();
        return SteelMember.of(((SectionShape.Catalogued) shape).shape(), job.materials().get(job.beam().material()), edition);
    }

    private static SteelDesignWork work(AnalysisResult result) {
        Job job = result.job();
        Beam beam = job.beam();
        SteelMember member = member(job);
        Method method = job.steelDesign().lrfd() ? Method.LRFD : Method.ASD;
        List<FlexureRow> flexure = new ArrayList<>();
        List<ShearRow> shear = new ArrayList<>();
        List<BearingRow> bearing = new ArrayList<>();
        Strength shearStrength = Shear.strength(member, null);
        List<Strength[]> web = new ArrayList<>();
        for (Support s : beam.supports()) {
            if (s.bearingLength() == null) {
                web.add(null);
                continue;
            }
            double fromEnd = Math.min(s.at(), beam.length() - s.at());
            web.add(new Strength[] {WebLocalYielding.strength(member, s.bearingLength(), fromEnd),
                    WebLocalCrippling.strength(member, s.bearingLength(), fromEnd)});
        }
        for (CombinationResult c : result.combinations()) {
            Field moment = c.response().moment();
            for (UnbracedSegments.Segment seg : UnbracedSegments.of(beam, moment)) {
                MomentGradient gradient = MomentGradient.of(moment, seg.from(), seg.to(), seg.freeEnd());
                // F1-1 gives 1.0 when the moment is uniform; round-off may put it a hair below
                double cb = Math.max(1.0, gradient.cb());
                boolean stemInCompression = seg.flange() == Bracing.Flange.BOTTOM; // tees are catalogued stem down
                Strength strength = Flexure.strength(member, new FlexureCase(seg.lb(), cb, stemInCompression));
                double demand = Math.abs(seg.demand().value());
                flexure.add(new FlexureRow(c, seg, gradient, strength, demand, strength.available(method),
                        strength.ratio(demand, method)));
            }
            Extreme vMax = c.extremes().shearMax();
            Extreme vMin = c.extremes().shearMin();
            Extreme v = Math.abs(vMin.value()) > Math.abs(vMax.value()) ? vMin : vMax;
            shear.add(new ShearRow(c, v, shearStrength, shearStrength.available(method),
                    shearStrength.ratio(v.value(), method)));
            for (int i = 0; i < web.size(); i++) {
                if (web.get(i) == null) {
                    continue;
                }
                // a reaction pushing up bears on the bottom flange; one pulling down is uplift, not bearing
                double force = Math.max(0, c.response().reactionForce()[i]);
                for (Strength s : web.get(i)) {
                    bearing.add(new BearingRow(i, beam.supports().get(i).at(), c, force, s, s.available(method),
                            s.ratio(force, method)));
                }
            }
        }
        return new SteelDesignWork(member, method, flexure, shear, bearing);
    }
}
