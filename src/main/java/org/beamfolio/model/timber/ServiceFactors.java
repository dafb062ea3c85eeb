package org.beamfolio.model.timber;

/**
 * The wet service (CM), temperature (Ct) and incising (Ci) factors. Values are those of NDS 2018
 * Table 2.3.3 (Ct), 4.3.8 (Ci), NDS Supplement Tables 4A and 4D (CM, sawn) and 5A (CM, glulam),
 * as recalled from those tables (from memory; check them against the edition in force).
 */
public final class ServiceFactors {
    private ServiceFactors() {}

    /** psi in Pa, exact (1 lbf/in^2 = 4.4482216152605 N / 0.00064516 m^2). */
    public static final double PSI = 4.4482216152605 / 0.00064516;

    public static Factor wetService(TimberValues v, Property p, double fbTimesCf, TimberService s) {
        if (!s.wet()) {
            return Factor.unity("CM", "NDS 2018 4.3.3 / 5.3.3", "dry service (moisture content within the dry limits)");
        }
        return switch (v.kind()) {
            case GLULAM -> new Factor("CM", switch (p) {
                case FB -> 0.8;
                case FV -> 0.875;
                case FC_PERP -> 0.53;
                case E, EMIN -> 0.833;
            }, "NDS Supplement Table 5A, wet service", "wet service, glulam");
            case SAWN -> v.sizeClass() == SizeClass.TIMBER
                    ? new Factor("CM", switch (p) {
                        case FB, FV -> 1.0;
                        case FC_PERP -> 0.67;
                        case E, EMIN -> 1.0;
                    }, "NDS Supplement Table 4D, wet service", "wet service, timbers 5 in and thicker")
                    : sawnDimensionWet(p, fbTimesCf);
            case SCL -> throw new IllegalArgumentException(
                    "wet service of structural composite lumber is outside the NDS rules the tool applies;"
                            + " use the manufacturer's values");
        };
    }

    private static Factor sawnDimensionWet(Property p, double fbTimesCf) {
        if (p == Property.FB && fbTimesCf <= 1150 * PSI) {
            return Factor.unity("CM", "NDS Supplement Table 4A, wet service", "Fb CF <= 1,150 psi");
        }
        return new Factor("CM", switch (p) {
            case FB -> 0.85;
            case FV -> 0.97;
            case FC_PERP -> 0.67;
            case E, EMIN -> 0.9;
        }, "NDS Supplement Table 4A, wet service", "wet service, dimension lumber");
    }

    /** CM Ct Ci on E: the factor from E to E', the modulus deflections are computed with. */
    public static double modulusFactor(TimberValues v, TimberService s) {
        return wetService(v, Property.E, Double.NaN, s).value() * temperature(Property.E, s).value()
                * incising(v, Property.E, s).value();
    }

    public static Factor temperature(Property p, TimberService s) {
        String clause = "NDS 2018 2.3.3, Table 2.3.3";
        if (s.temperature() == Temperature.NORMAL) {
            return Factor.unity("Ct", clause, s.temperature().range());
        }
        boolean elevated = s.temperature() == Temperature.ELEVATED;
        double value = switch (p) {
            case E, EMIN -> 0.9;
            case FB, FV, FC_PERP -> elevated ? (s.wet() ? 0.7 : 0.8) : (s.wet() ? 0.5 : 0.7);
        };
        return new Factor("Ct", value, clause, s.temperature().range() + (s.wet() ? ", wet" : ", dry"));
    }

    public static Factor incising(TimberValues v, Property p, TimberService s) {
        String clause = "NDS 2018 4.3.8, Table 4.3.8";
        if (!s.incised() || v.kind() != TimberKind.SAWN) {
            return Factor.unity("Ci", clause, "not incised");
        }
        double value = switch (p) {
            case E, EMIN -> 0.95;
            case FB, FV -> 0.80;
            case FC_PERP -> 1.0;
        };
        return new Factor("Ci", value, clause, "incised for preservative treatment");
    }

    /**
     * Repetitive member factor on Fb: 1.15 for dimension lumber (NDS 4.3.9); 1.04 for structural
     * composite lumber (NDS 8.3.7, from memory); none for glulam or timbers.
     */
    public static Factor repetitive(TimberValues v, TimberService s) {
        if (!s.repetitive()) {
            return Factor.unity("Cr", "NDS 2018 4.3.9", "not repetitive members");
        }
        return switch (v.kind()) {
            case SAWN -> v.sizeClass() == SizeClass.TIMBER
                    ? Factor.unity("Cr", "NDS 2018 4.3.9", "timbers: repetitive member factor does not apply")
                    : new Factor("Cr", 1.15, "NDS 2018 4.3.9", "repetitive dimension lumber members");
            case SCL -> new Factor("Cr", 1.04, "NDS 2018 8.3.7", "repetitive structural composite lumber members");
            case GLULAM -> Factor.unity("Cr", "NDS 2018 Table 5.3.1", "glulam: repetitive member factor does not apply");
        };
    }
}
