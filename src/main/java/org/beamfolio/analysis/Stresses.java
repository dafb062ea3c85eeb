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

    Extremes extremes(Response r) {
        Field t = top(r);
        Field b = bottom(r);
        Field tau = shearStress(r);
        Extreme tauMax = null;
        if (tau != null) {
            Extreme e = tau.maxAbs();
            tauMax = new Extreme(Math.abs(e.value()), e.at(), null);
        }
        return new Extremes(r.shear().max(), r.shear().min(), r.moment().max(), r.moment().min(),
                r.deflection().max(), r.deflection().min(), t.max(), t.min(), b.max(), b.min(), tauMax);
    }
}
