package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Hinge;
import org.beamfolio.model.Support;
import org.beamfolio.units.Lengths;

/**
 * Kinematic check before any stiffness is assembled. As rigid parts joined at the hinges, the beam
 * moves as v(x) = a + b x + sum over hinges of c_h (x - x_h) for x past x_h: 2 + (number of
 * hinges) freedoms. Every support that restrains translation sets v(x_s) = 0, every one that
 * restrains rotation sets v'(x_s) = 0. The beam is stable exactly when these equations admit only
 * the zero motion (full column rank, found by singular value decomposition); otherwise the null
 * vector is the mechanism, and it is described in words. Horizontal stability needs one pin or
 * fixed support, since rollers and springs restrain vertical movement only.
 */
public final class Stability {
    private Stability() {}

    /** The check with positions in messages in metres. */
    public static Optional<Instability> check(Beam beam) {
        return check(beam, Lengths.Style.METRES);
    }

    /** The check with positions in messages written in the job's style. */
    public static Optional<Instability> check(Beam beam, Lengths.Style lengths) {
        if (beam.supports().stream().noneMatch(s -> s.kind().restrainsHorizontally())) {
            Support first = beam.supports().get(0);
            return Optional.of(new Instability("beam.supports", first.where(),
                    "nothing holds the beam horizontally: make one support a pin or fixed (rollers and springs restrain vertical movement only)"));
        }
        double length = beam.length();
        List<Hinge> hinges = beam.hinges();
        int columns = 2 + hinges.size();
        List<double[]> rows = new ArrayList<>();
        for (Support s : beam.supports()) {
            double[] translation = new double[columns];
            translation[0] = 1;
            translation[1] = s.at() / length;
            for (int h = 0; h < hinges.size(); h++) {
                translation[2 + h] = Math.max(0, s.at() - hinges.get(h).at()) / length;
            }
            rows.add(translation);
            if (s.kind().restrainsRotation()) {
                double[] rotation = new double[columns];
                rotation[1] = 1;
                for (int h = 0; h < hinges.size(); h++) {
                    rotation[2 + h] = s.at() > hinges.get(h).at() ? 1 : 0;
                }
                rows.add(rotation);
            }
        }
        if (rows.size() < columns) {
            rows.add(new double[columns]); // the decomposition wants at least as many rows as columns
            while (rows.size() < columns) {
                rows.add(new double[columns]);
            }
        }
        RealMatrix a = new Array2DRowRealMatrix(rows.toArray(new double[0][]));
        SingularValueDecomposition svd = new SingularValueDecomposition(a);
        double[] sv = svd.getSingularValues();
        double tolerance = 1e-9 * sv[0];
        if (sv[sv.length - 1] > tolerance) {
            return Optional.empty();
        }
        double[] motion = svd.getV().getColumn(sv.length - 1);
        return Optional.of(describe(beam, motion, lengths));
    }

    /** Names the first rigid part that moves, and the point it turns about or that it slides. */
    private static Instability describe(Beam beam, double[] motion, Lengths.Style lengths) {
        double length = beam.length();
        List<Hinge> hinges = beam.hinges();
        double size = 0;
        for (double m : motion) {
            size = Math.max(size, Math.abs(m));
        }
        double a = motion[0];
        double slope = motion[1];
        double partStart = 0;
        for (int part = 0; part <= hinges.size(); part++) {
            double partEnd = part < hinges.size() ? hinges.get(part).at() : length;
            if (part > 0) {
                double xh = hinges.get(part - 1).at() / length;
                a -= motion[1 + part] * xh;
                slope += motion[1 + part];
            }
            double vStart = a + slope * partStart / length;
            double vEnd = a + slope * partEnd / length;
            if (Math.max(Math.abs(vStart), Math.abs(vEnd)) > 1e-6 * size) {
                String range = hinges.isEmpty() ? "the beam" : "the part of the beam from " + Lengths.describe(partStart, lengths) + " to " + Lengths.describe(partEnd, lengths);
                String movement;
                if (Math.abs(slope) <= 1e-9 * size) {
                    movement = range + " can move up and down freely: add a support under it";
                } else {
                    double pivot = -a / slope * length;
                    movement = range + " can rotate about " + pivotName(beam, pivot, lengths)
                            + (hinges.isEmpty() ? ": add a second support or fix this one"
                            : ": add a support to that part, or remove a hinge that frees it");
                }
                Hinge culprit = part < hinges.size() ? hinges.get(part) : (part > 0 ? hinges.get(part - 1) : null);
                if (culprit != null) {
                    int index = hinges.indexOf(culprit);
                    return new Instability("beam.hinges[" + index + "]", culprit.where(), "the beam is a mechanism: " + movement);
                }
                return new Instability("beam.supports", beam.supports().get(0).where(), "the beam is a mechanism: " + movement);
            }
            partStart = partEnd;
        }
        return new Instability("beam.supports", beam.supports().get(0).where(), "the beam is a mechanism");
    }

    private static String pivotName(Beam beam, double pivot, Lengths.Style lengths) {
        double tolerance = 1e-6 * beam.length();
        for (Support s : beam.supports()) {
            if (Math.abs(s.at() - pivot) <= tolerance) {
                return "the " + s.kind().label() + " support at " + Lengths.describe(s.at(), lengths);
            }
        }
        for (Hinge h : beam.hinges()) {
            if (Math.abs(h.at() - pivot) <= tolerance) {
                return "the hinge at " + Lengths.describe(h.at(), lengths);
            }
        }
        return "the point " + Lengths.describe(pivot, lengths);
    }
}
