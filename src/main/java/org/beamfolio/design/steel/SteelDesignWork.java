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
import org.beamfolio.model.Load;
import org.beamfolio.model.Purpose;
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

    /**
     * A concentrated force on one flange under one combination against one web limit state: an
     * upward reaction at a support, or the downward point loads at a position.
     *
     * @param support true at a support, false under point loads
     * @param index the support's or the first point load's index (from 0) in the job
     * @param force the compressive force on the flange (N), zero when it pulls instead
     */
    public record BearingRow(boolean support, int index, double at, CombinationResult combination, double force,
                             Strength strength, double available, double ratio) {}

    /** Where a bearing length is given: a support, or the point loads at one position (the least length given there). */
    private record BearingPlace(boolean support, int index, double at, double length, List<Load.Point> loads) {}

    /** A flange segment as a key: its flange and ends (boxed, so equal as Double.equals says, bit for bit). */
    private record SegmentKey(Bracing.Flange flange, Double from, Double to) {}

    /** Per flange segment (by flange, then along the beam), the combination with the largest ratio; the earlier one on a tie. */
    public List<FlexureRow> governingPerSegment() {
        java.util.Map<SegmentKey, FlexureRow> best = new java.util.LinkedHashMap<>();
        for (FlexureRow row : flexure) {
            UnbracedSegments.Segment s = row.segment();
            best.merge(new SegmentKey(s.flange(), s.from(), s.to()), row, (a, b) -> b.ratio() > a.ratio() ? b : a);
        }
        List<FlexureRow> result = new ArrayList<>(best.values());
        result.sort(java.util.Comparator.comparing((FlexureRow r) -> r.segment().flange())
                .thenComparingDouble(r -> r.segment().from()));
        return result;
    }

    /** The design of the job's beam, worked once and kept with the analysis; null without {@code design.steel}. */
    public static SteelDesignWork of(AnalysisResult result) {
        if (result.job().steelDesign() == null) {
            return null;
        }
        return result.worked().get(SteelDesignWork.class, () -> work(result, Detail.PRINTED));
    }

    /**
     * The design of the job's beam worked for its values only ({@link Detail#VALUES}: the same
     * strengths and ratios, bit for bit, without the equations the package prints), and kept with
     * the analysis, so the checks run on it afterwards read these values. For an analysis whose
     * package is never printed: a candidate tried in the search for a section. Null without
     * {@code design.steel}; the work already kept when the analysis was designed before.
     */
    public static SteelDesignWork valuesOnly(AnalysisResult result) {
        if (result.job().steelDesign() == null) {
            return null;
        }
        return result.worked().get(SteelDesignWork.class, () -> work(result, Detail.VALUES));
    }

    /** The member the job designs: its one catalogue shape in its material, to its edition. */
    public static SteelMember member(Job job) {
        Edition edition = Edition.find(job.steelDesign().specification()).orElseThrow();
        SectionShape shape = job.sections().get(job.beam().section()).shape();
        return SteelMember.of(((SectionShape.Catalogued) shape).shape(), job.materials().get(job.beam().material()), edition);
    }

    /**
     * Whether the combination is one the method checks: of a built-in ASCE 7 set, its strength
     * combinations for LRFD and its allowable-stress ones for ASD; of the job's own list, every one
     * (the job's {@code design.method} says what they are).
     */
    static boolean ofMethod(CombinationResult c, Method method, Job job) {
        if (job.combinationSet() == null) {
            return true;
        }
        return method == Method.LRFD ? c.purpose() == Purpose.STRENGTH : c.purpose() == Purpose.ALLOWABLE_STRESS;
    }

    /** The supports with a bearing length, then each position of point loads with one, along the beam. */
    private static List<BearingPlace> bearingPlaces(Job job) {
        List<BearingPlace> places = new ArrayList<>();
        List<Support> supports = job.beam().supports();
        for (int i = 0; i < supports.size(); i++) {
            if (supports.get(i).bearingLength() != null) {
                places.add(new BearingPlace(true, i, supports.get(i).at(), supports.get(i).bearingLength(), List.of()));
            }
        }
        double same = 1e-9 * job.beam().length();
        List<Load> loads = job.loads();
        for (int i = 0; i < loads.size(); i++) {
            if (!(loads.get(i) instanceof Load.Point p) || p.bearing() == null) {
                continue;
            }
            boolean counted = places.stream().anyMatch(q -> !q.support() && Math.abs(q.at() - p.at()) <= same);
            if (counted) {
                continue;
            }
            // every point load at this position bears there; the least bearing length given there is taken
            List<Load.Point> here = new ArrayList<>();
            double length = p.bearing();
            for (Load l : loads) {
                if (l instanceof Load.Point o && Math.abs(o.at() - p.at()) <= same) {
                    here.add(o);
                    length = o.bearing() == null ? length : Math.min(length, o.bearing());
                }
            }
            places.add(new BearingPlace(false, i, p.at(), length, here));
        }
        return places;
    }

    /** The point loads of the combination's cases times their factors, down positive. */
    private static double factored(List<Load.Point> loads, CombinationResult c) {
        double sum = 0;
        for (Load.Point p : loads) {
            sum += c.factors().getOrDefault(p.loadCase(), 0.0) * p.P();
        }
        return sum;
    }

    private static SteelDesignWork work(AnalysisResult result, Detail detail) {
        Job job = result.job();
        Beam beam = job.beam();
        SteelMember member = member(job);
        Method method = job.steelDesign().lrfd() ? Method.LRFD : Method.ASD;
        List<FlexureRow> flexure = new ArrayList<>();
        List<ShearRow> shear = new ArrayList<>();
        List<BearingRow> bearing = new ArrayList<>();
        Strength shearStrength = Shear.strength(member, null);
        List<BearingPlace> places = bearingPlaces(job);
        List<Strength[]> web = new ArrayList<>();
        for (BearingPlace p : places) {
            double fromEnd = Math.min(p.at(), beam.length() - p.at());
            web.add(new Strength[] {WebLocalYielding.strength(member, p.length(), fromEnd),
                    WebLocalCrippling.strength(member, p.length(), fromEnd)});
        }
        Flexure.Provisions provisions = null;
        for (CombinationResult c : result.combinations()) {
            if (!ofMethod(c, method, job)) {
                continue;
            }
            Field moment = c.response().moment();
            for (UnbracedSegments.Segment seg : UnbracedSegments.of(beam, moment)) {
                MomentGradient gradient = MomentGradient.of(moment, seg.from(), seg.to(), seg.freeEnd(), detail);
                // F1-1 gives 1.0 when the moment is uniform; round-off may put it a hair below
                double cb = Math.max(1.0, gradient.cb());
                boolean stemInCompression = seg.flange() == Bracing.Flange.BOTTOM; // tees are catalogued stem down
                if (provisions == null) {
                    // found at the first segment, where a shape outside Chapter F's provisions is refused
                    provisions = Flexure.provisions(member);
                }
                Strength strength = Flexure.strength(provisions, new FlexureCase(seg.lb(), cb, stemInCompression), detail);
                double demand = Math.abs(seg.demand().value());
                flexure.add(new FlexureRow(c, seg, gradient, strength, demand, strength.available(method),
                        strength.ratio(demand, method)));
            }
            Extreme vMax = c.extremes().shearMax();
            Extreme vMin = c.extremes().shearMin();
            Extreme v = Math.abs(vMin.value()) > Math.abs(vMax.value()) ? vMin : vMax;
            shear.add(new ShearRow(c, v, shearStrength, shearStrength.available(method),
                    shearStrength.ratio(v.value(), method)));
            for (int i = 0; i < places.size(); i++) {
                BearingPlace p = places.get(i);
                // a reaction pushing up bears on the bottom flange, loads pushing down on the top one; a pull is not bearing
                double force = Math.max(0, p.support() ? c.response().reactionForce()[p.index()] : factored(p.loads(), c));
                for (Strength s : web.get(i)) {
                    bearing.add(new BearingRow(p.support(), p.index(), p.at(), c, force, s, s.available(method),
                            s.ratio(force, method)));
                }
            }
        }
        return new SteelDesignWork(member, method, flexure, shear, bearing);
    }
}
