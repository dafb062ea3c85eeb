package org.beamfolio.analysis;

import org.beamfolio.section.SectionProperties;

/**
 * Stresses from a response, element by element with each element's section: fibre stress
 * sigma = M y / I (top: y = -c_top, bottom: y = +c_bottom, tension positive, sagging M positive)
 * and shear stress tau = V Q / (I t), the larger of its values at the neutral axis and at each
 * flange-to-web junction (where a narrow web under a wide flange can govern, as in a tee whose
 * neutral axis lies in the flange). Being linear in M and V, their extremes
 * are those of scaled polynomial pieces and as exact.
 */
public final class Stresses {
    private final double[] top;
    private final double[] bottom;
    private final double[] shear;

    public Stresses(StructureModel model) {
        int n = model.elements();
        top = new double[n];
        bottom = new double[n];
        double[] q = new double[n];
        boolean shearKnown = true;
        for (int e = 0; e < n; e++) {
            SectionProperties s = model.section(e);
            top[e] = -s.cTop() / s.inertia();
            bottom[e] = s.cBottom() / s.inertia();
            if (s.qNeutral() == null || s.tNeutral() == null) {
                shearKnown = false;
            } else {
                q[e] = s.shearStressFactor();
            }
        }
        shear = shearKnown ? q : null;
    }

    public Field top(Response r) {
        return r.moment().scaledBy(top);
    }

    public Field bottom(Response r) {
        return r.moment().scaledBy(bottom);
    }

    /** Null where a section has no Q or t. */
    public Field shearStress(Response r) {
        return shear == null ? null : r.shear().scaledBy(shear);
    }

    /**
     * Every extreme of a combination in one pass along the beam, piece by piece from its terms:
     * the candidate points of the shear (its piece ends and stationary points) serve the shear
     * stress too, and those of the moment the fibre stresses, which are scaled shears and moments.
     */
    Extremes extremes(Superposition sum, double[] starts, double[] ends) {
        double x0 = starts[0];
        Range shearRange = new Range(x0);
        Range momentRange = new Range(x0);
        Range deflectionRange = new Range(x0);
        Range topRange = new Range(x0);
        Range bottomRange = new Range(x0);
        Range tau = shear == null ? null : new Range(x0);
        double[] points = new double[Field.CANDIDATES];
        double[] piece = new double[Field.STRIDE];
        for (int i = 0; i < starts.length; i++) {
            double start = starts[i];
            double length = ends[i] - starts[i];
            sum.piece(Superposition.Quantity.SHEAR, i, piece);
            int count = Field.candidates(piece, length, points);
            for (int k = 0; k < count; k++) {
                double value = Field.value(piece, points[k]);
                shearRange.offer(value, start + points[k]);
                if (tau != null) {
                    tau.offer(shear[i] * value, start + points[k]);
                }
            }
            sum.piece(Superposition.Quantity.MOMENT, i, piece);
            count = Field.candidates(piece, length, points);
            for (int k = 0; k < count; k++) {
                double value = Field.value(piece, points[k]);
                momentRange.offer(value, start + points[k]);
                topRange.offer(top[i] * value, start + points[k]);
                bottomRange.offer(bottom[i] * value, start + points[k]);
            }
            sum.piece(Superposition.Quantity.DEFLECTION, i, piece);
            count = Field.candidates(piece, length, points);
            for (int k = 0; k < count; k++) {
                deflectionRange.offer(Field.value(piece, points[k]), start + points[k]);
            }
        }
        Extreme tauMax = null;
        if (tau != null) {
            Extreme larger = Math.abs(tau.min().value()) > Math.abs(tau.max().value()) ? tau.min() : tau.max();
            tauMax = new Extreme(Math.abs(larger.value()), larger.at(), null);
        }
        return new Extremes(shearRange.max(), shearRange.min(), momentRange.max(), momentRange.min(), deflectionRange.max(),
                deflectionRange.min(), topRange.max(), topRange.min(), bottomRange.max(), bottomRange.min(), tauMax);
    }
}
