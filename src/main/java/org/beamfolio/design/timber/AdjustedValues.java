package org.beamfolio.design.timber;

import org.beamfolio.model.timber.TimberKind;
import org.beamfolio.model.timber.TimberService;
import org.beamfolio.model.timber.TimberValues;
import org.beamfolio.model.timber.LoadDuration;
import org.beamfolio.model.timber.ServiceFactors;
import org.beamfolio.model.timber.Factor;
import org.beamfolio.model.timber.Property;
import java.util.ArrayList;
import java.util.List;

/**
 * Adjusted design values of a timber beam (allowable stress design), each with the factors that
 * make it, NDS 2018 Tables 4.3.1 (sawn), 5.3.1 (glulam) and 8.3.1 (SCL):
 * Fb' = Fb CD CM Ct CL CF Ci Cr (sawn), Fb CD CM Ct (lesser of CL, CV) (glulam), Fb CD CM Ct CL Cr
 * (SCL); Fv' = Fv CD CM Ct Ci; Fc_perp' = Fc_perp CM Ct Ci Cb; Emin' = Emin CM Ct Ci;
 * E' = E CM Ct Ci. The flat use factor Cfu is 1.0 for a beam loaded on its narrow face, the
 * only orientation the tool models.
 */
public final class AdjustedValues {
    private final TimberValues values;
    private final TimberService service;
    private final double b;
    private final double d;

    /**
     * @param b breadth of the whole member (plies side by side, fastened to act together), m
     * @param d depth, m
     */
    public AdjustedValues(TimberValues values, TimberService service, double b, double d) {
        this.values = values;
        this.service = service;
        this.b = b;
        this.d = d;
    }

    public TimberValues values() {
        return values;
    }

    /**
     * Fb' for one combination and one unbraced segment of the compression edge.
     *
     * @param cd the combination's load-duration factor
     * @param topInTension whether the top face is in tension (hogging), which selects Fb- for glulam
     * @param ply the thickness of one ply, for the size factor
     * @param effectiveLength le of the segment, or null when the compression edge is braced
     * @param zeroMomentLength glulam: the length between points of zero moment, for CV
     */
    public Bending bending(LoadDuration cd, boolean topInTension, double ply, Double effectiveLength,
                           double zeroMomentLength) {
        double fb = values.fbFor(topInTension);
        TimberKind kind = values.kind();
        // the factors of Fb* (NDS 3.3.3.8): every applicable factor but Cfu, CV and CL, by the product's table
        List<Factor> factors = new ArrayList<>();
        factors.add(new Factor("CD", cd.factor(), LoadDuration.CLAUSE, cd.key().replace('_', ' ')));
        Factor cf = SizeFactor.of(values, ply, d);
        factors.add(ServiceFactors.wetService(values, Property.FB, fb * cf.value(), service));
        factors.add(ServiceFactors.temperature(Property.FB, service));
        if (kind == TimberKind.SAWN) {
            factors.add(cf);
            factors.add(ServiceFactors.incising(values, Property.FB, service));
        }
        if (kind != TimberKind.GLULAM) {
            factors.add(ServiceFactors.repetitive(values, service));
        }
        double fbStar = fb;
        for (Factor f : factors) {
            fbStar *= f.value();
        }
        BeamStability.Result stability = null;
        Factor cl;
        if (effectiveLength == null) {
            cl = BeamStability.braced("compression edge braced along its length");
        } else if (d <= b) {
            cl = BeamStability.braced("depth does not exceed breadth");
        } else {
            stability = BeamStability.of(effectiveLength, b, d, fbStar, eMin());
            cl = stability.factor(fbStar);
        }
        factors.add(flatUse());
        factors.add(cl);
        double adjusted = fbStar;
        if (kind == TimberKind.GLULAM) {
            Factor cv = VolumeFactor.of(values, zeroMomentLength, b, d);
            factors.add(cv);
            adjusted *= Math.min(cl.value(), cv.value());
        } else {
            adjusted *= cl.value();
        }
        return new Bending(fb, fbStar, adjusted, List.copyOf(factors), stability, topInTension);
    }

    /** Cfu = 1.0: the beam is loaded on its narrow face (edgewise), the only orientation modelled. */
    private Factor flatUse() {
        return Factor.unity("Cfu", values.kind() == TimberKind.GLULAM ? "NDS 2018 5.3.7" : "NDS 2018 4.3.7",
                "loaded edgewise (on the narrow face): flat use factor not applied");
    }

    public Adjusted shear(LoadDuration cd) {
        return adjust(Property.FV, values.fv(), List.of(
                new Factor("CD", cd.factor(), LoadDuration.CLAUSE, cd.key().replace('_', ' '))));
    }

    /**
     * @param bearingLength lb, m
     * @param nearEnd bearing within 3 in of the member's end, where the bearing area factor does not apply
     */
    public Adjusted bearing(double bearingLength, boolean nearEnd) {
        return adjust(Property.FC_PERP, values.fcPerp(), List.of(BearingAreaFactor.of(bearingLength, nearEnd)));
    }

    public Adjusted modulus() {
        return adjust(Property.E, values.e(), List.of());
    }

    public double eMin() {
        return adjust(Property.EMIN, values.eMin(), List.of()).value();
    }

    private Adjusted adjust(Property p, double reference, List<Factor> extra) {
        List<Factor> factors = new ArrayList<>(extra);
        factors.add(ServiceFactors.wetService(values, p, Double.NaN, service));
        factors.add(ServiceFactors.temperature(p, service));
        factors.add(ServiceFactors.incising(values, p, service));
        double value = reference;
        for (Factor f : factors) {
            value *= f.value();
        }
        return new Adjusted(p, reference, value, List.copyOf(factors));
    }

    /** An adjusted value: the reference value times each factor. */
    public record Adjusted(Property property, double reference, double value, List<Factor> factors) {}

    /**
     * Fb' with its parts.
     *
     * @param reference Fb for the face in tension
     * @param fbStar Fb* of NDS 3.3.3.8
     * @param stability null when CL = 1.0 by bracing or proportions
     */
    public record Bending(double reference, double fbStar, double value, List<Factor> factors,
                          BeamStability.Result stability, boolean topInTension) {
        /** Whether the factor applies to this product (each product's table lists its own). */
        public boolean has(String symbol) {
            return factors.stream().anyMatch(f -> f.symbol().equals(symbol));
        }

        /** The lesser of CL and CV for glulam (NDS 5.3.6), else CL: the one that enters Fb'. */
        public String governingStability() {
            return has("CV") && factor("CV") < factor("CL") ? "CV" : "CL";
        }

        public double factor(String symbol) {
            for (Factor f : factors) {
                if (f.symbol().equals(symbol)) {
                    return f.value();
                }
            }
            throw new IllegalArgumentException("no factor " + symbol);
        }
    }
}
