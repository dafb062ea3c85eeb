package org.beamfolio.checks.timber;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;

/**
 * The loads a timber shear check may leave out near a support, NDS 2018 3.4.3.1(a): for a beam
 * bearing on one surface and loaded on the other, a distributed load within a distance d of the
 * support's face is ignored and a concentrated load at x from the face (x below d) is multiplied
 * by x / d. It is taken only at supports given a bearing length (the job then says the beam bears
 * there, and where the face is: half the bearing length from the support's centre); elsewhere,
 * and for the self weight, every load is kept (conservative).
 */
final class ShearNearSupports {
    private ShearNearSupports() {}

    /** A zone next to a support's face, from the support's centre outward, [centre - reach, centre + reach]. */
    private record Zone(double centre, double face, double reach) {}

    /** Whether the job has any support where the reduction is taken. */
    static boolean applies(Job job) {
        return job.beam().supports().stream().anyMatch(s -> s.bearingLength() != null);
    }

    /** The job's loads with those within d of a bearing's face left out or reduced. */
    static List<Load> reduced(Job job, double d) {
        List<Zone> zones = new ArrayList<>();
        for (Support s : job.beam().supports()) {
            if (s.bearingLength() != null) {
                double half = s.bearingLength() / 2;
                zones.add(new Zone(s.at(), half, half + d));
            }
        }
        List<Load> out = new ArrayList<>();
        for (Load l : job.loads()) {
            if (l instanceof Load.Point p) {
                out.add(p.scaled(pointFactor(zones, p.at(), d)));
            } else if (l instanceof Load.Distributed w) {
                out.addAll(clipped(w, zones));
            } else {
                out.add(l);
            }
        }
        return out;
    }

    /** x / d for a concentrated load at x from the nearest face within d; 0 over the bearing; else 1. */
    private static double pointFactor(List<Zone> zones, double at, double d) {
        double factor = 1;
        for (Zone z : zones) {
            double fromCentre = Math.abs(at - z.centre());
            if (fromCentre < z.reach()) {
                double x = Math.max(0, fromCentre - z.face());
                factor = Math.min(factor, x / d);
            }
        }
        return factor;
    }

    /** The parts of a line load outside every zone, each with the intensities it had there. */
    private static List<Load> clipped(Load.Distributed w, List<Zone> zones) {
        List<double[]> parts = new ArrayList<>(List.of(new double[] {w.from(), w.to()}));
        for (Zone z : zones) {
            List<double[]> next = new ArrayList<>();
            for (double[] p : parts) {
                double lo = z.centre() - z.reach();
                double hi = z.centre() + z.reach();
                if (p[1] <= lo || p[0] >= hi) {
                    next.add(p);
                    continue;
                }
                if (p[0] < lo) {
                    next.add(new double[] {p[0], lo});
                }
                if (p[1] > hi) {
                    next.add(new double[] {hi, p[1]});
                }
            }
            parts = next;
        }
        double tiny = 1e-9 * (w.to() - w.from());
        List<Load> out = new ArrayList<>();
        for (double[] p : parts) {
            if (p[1] - p[0] > tiny) {
                out.add(new Load.Distributed(w.loadCase(), w.intensityAt(p[0]), w.intensityAt(p[1]), p[0], p[1],
                        w.uniform(), w.note(), w.where()));
            }
        }
        if (out.isEmpty()) {
            // wholly within d of a support: nothing of it is left, but its case stays known to the combinations
            out.add(new Load.Point(w.loadCase(), 0, w.from(), w.note(), w.where()));
        }
        return out;
    }

    /** The job solved again with the reduced loads, for the shear check only. */
    static org.beamfolio.analysis.AnalysisResult solve(Job job, double d) {
        Job reduced = job.withLoads(reduced(job, d));
        try {
            return org.beamfolio.analysis.Analysis.run(reduced);
        } catch (org.beamfolio.analysis.UnstableBeamException e) {
            throw new IllegalStateException("the beam was solved with all its loads, so it is stable with fewer", e);
        }
    }
}
