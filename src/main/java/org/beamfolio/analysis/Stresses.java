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
     * Every extreme of a response in one pass per field: the candidate points of the moment
     * (its ends and the zeros of shear) serve the fibre stresses too, which are scaled moments.
     */
    Extremes extremes(Response r) {
        Field v = r.shear();
        Field m = r.moment();
        Field d = r.deflection();
        int n = m.size();
        double[][] vPoints = new double[n][];
        double[][] mPoints = new double[n][];
        for (int i = 0; i < n; i++) {
            vPoints[i] = v.candidates(i);
            mPoints[i] = m.candidates(i);
        }
        Extreme[] shearRange = v.extremes(null, v, i -> vPoints[i]);
        Extreme[] momentRange = m.extremes(null, m, i -> mPoints[i]);
        Extreme[] deflectionRange = d.extremes(null, d, d::candidates);
        Extreme[] topRange = m.extremes(top, m, i -> mPoints[i]);
        Extreme[] bottomRange = m.extremes(bottom, m, i -> mPoints[i]);
        Extreme tauMax = null;
        if (shear != null) {
            Extreme[] tau = v.extremes(shear, v, i -> vPoints[i]);
            Extreme larger = Math.abs(tau[1].value()) > Math.abs(tau[0].value()) ? tau[1] : tau[0];
            tauMax = new Extreme(Math.abs(larger.value()), larger.at(), null);
        }
        return new Extremes(shearRange[0], shearRange[1], momentRange[0], momentRange[1], deflectionRange[0], deflectionRange[1],
                topRange[0], topRange[1], bottomRange[0], bottomRange[1], tauMax);
    }
}
