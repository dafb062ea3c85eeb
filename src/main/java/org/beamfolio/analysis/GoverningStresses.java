package org.beamfolio.analysis;

import java.util.List;
import org.beamfolio.model.Job;
import org.beamfolio.model.Material;
import org.beamfolio.section.SectionProperties;

/**
 * The governing fibre tension, fibre compression and shear stress of a job, found once in the
 * analysis and read by the checks, the worked stresses, the summary and the results file. The
 * search runs over the combinations the allowables are compared with ({@link StressCombinations};
 * every combination when the job has none of them, {@code service} false), element by element at
 * each piece's ends and stationary points (exact), and ranks by the ratio to the element's
 * allowable where the material gives one, else by the stress itself. The first of equal ratios wins.
 *
 * @param tension null when there is no combination at all; likewise compression
 * @param shear null where a section gives no Q or t
 * @param service whether the combinations searched are the allowable-stress or service ones
 */
public record GoverningStresses(StressDemand tension, StressDemand compression, StressDemand shear, boolean service) {
    static GoverningStresses of(Job job, StructureModel model, List<CombinationResult> all) {
        List<CombinationResult> service = StressCombinations.of(all);
        List<CombinationResult> searched = service.isEmpty() ? all : service;
        if (searched.isEmpty()) {
            return new GoverningStresses(null, null, null, false);
        }
        return new GoverningStresses(fibre(job, model, searched, StressDemand.Kind.TENSION),
                fibre(job, model, searched, StressDemand.Kind.COMPRESSION), shear(job, model, searched), !service.isEmpty());
    }

    private static double allowable(Double value) {
        return value == null ? Double.NaN : value;
    }

    private static double ratio(double demand, double allowable) {
        return Double.isNaN(allowable) ? demand : demand / allowable;
    }

    private static StressDemand fibre(Job job, StructureModel model, List<CombinationResult> combinations, StressDemand.Kind kind) {
        int sign = kind == StressDemand.Kind.TENSION ? 1 : -1;
        Stresses stresses = new Stresses(model);
        Best best = new Best();
        for (CombinationResult c : combinations) {
            for (boolean topFibre : new boolean[] {true, false}) {
                Field stress = topFibre ? stresses.top(c.response()) : stresses.bottom(c.response());
                for (int e = 0; e < model.elements(); e++) {
                    Material m = job.materials().get(model.materialId(e));
                    double allowable = allowable(sign > 0 ? m.allowableTension() : m.allowableCompression());
                    for (double s : stress.candidates(e)) {
                        double value = stress.value(e, s);
                        best.offer(ratio(Math.max(0, sign * value), allowable), c, e, s, topFibre, value, allowable);
                    }
                }
            }
        }
        if (best.combination == null) {
            return null;
        }
        Field moment = best.combination.response().moment();
        SectionProperties p = model.section(best.element);
        return new StressDemand(kind, best.combination, best.element, moment.start(best.element) + best.s,
                side(moment, best.element, best.s), best.topFibre, moment.value(best.element, best.s),
                best.topFibre ? p.cTop() : p.cBottom(), Double.NaN, Double.NaN, best.value, best.allowable);
    }

    private static StressDemand shear(Job job, StructureModel model, List<CombinationResult> combinations) {
        Stresses stresses = new Stresses(model);
        Best best = new Best();
        for (CombinationResult c : combinations) {
            Field tau = stresses.shearStress(c.response());
            if (tau == null) {
                return null;
            }
            for (int e = 0; e < model.elements(); e++) {
                double allowable = allowable(job.materials().get(model.materialId(e)).allowableShear());
                for (double s : tau.candidates(e)) {
                    double value = Math.abs(tau.value(e, s));
                    best.offer(ratio(value, allowable), c, e, s, false, value, allowable);
                }
            }
        }
        if (best.combination == null) {
            return null;
        }
        Field shear = best.combination.response().shear();
        SectionProperties p = model.section(best.element);
        // the cut of SectionProperties.shearStressFactor: the neutral axis or a junction with a larger Q / t
        double q = p.qNeutral();
        double width = p.tNeutral();
        double height = Double.NaN;
        for (SectionProperties.Junction j : p.junctions()) {
            if (Math.abs(j.q()) / j.width() > q / width) {
                q = Math.abs(j.q());
                width = j.width();
                height = j.height();
            }
        }
        return new StressDemand(StressDemand.Kind.SHEAR, best.combination, best.element, shear.start(best.element) + best.s,
                side(shear, best.element, best.s), false, shear.value(best.element, best.s), q, width, height, best.value,
                best.allowable);
    }

    /** The largest ratio offered so far and where; the first of equal ratios stays. */
    private static final class Best {
        double ratio = -1;
        CombinationResult combination;
        int element;
        double s;
        boolean topFibre;
        double value;
        double allowable;

        void offer(double ratio, CombinationResult c, int e, double s, boolean topFibre, double value, double allowable) {
            if (ratio > this.ratio) {
                this.ratio = ratio;
                this.combination = c;
                this.element = e;
                this.s = s;
                this.topFibre = topFibre;
                this.value = value;
                this.allowable = allowable;
            }
        }
    }

    /** Which side of a jump the value at local s of piece e lies on, if the field jumps there. */
    static StressDemand.Side side(Field f, int e, double s) {
        double length = f.end(e) - f.start(e);
        double here = f.value(e, s);
        double tolerance = 1e-9 * Math.max(Math.abs(f.max().value()), Math.abs(f.min().value()));
        if (s == 0 && e > 0 && Math.abs(f.value(e - 1, f.end(e - 1) - f.start(e - 1)) - here) > tolerance) {
            return StressDemand.Side.RIGHT;
        }
        if (s == length && e < f.size() - 1 && Math.abs(f.value(e + 1, 0) - here) > tolerance) {
            return StressDemand.Side.LEFT;
        }
        return StressDemand.Side.NONE;
    }
}
