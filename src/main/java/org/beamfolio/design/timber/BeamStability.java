package org.beamfolio.design.timber;

import org.beamfolio.model.timber.ServiceFactors;
import org.beamfolio.model.timber.Factor;
import java.util.Locale;

/**
 * Beam stability factor CL, NDS 2018 3.3.3: slenderness RB = sqrt(le d / b^2) (Eq. 3.3-5), not
 * above 50 (3.3.3.7); FbE = 1.20 Emin' / RB^2 (3.3.3.8); and
 * CL = (1 + FbE/Fb*)/1.9 - sqrt(((1 + FbE/Fb*)/1.9)^2 - (FbE/Fb*)/0.95) (Eq. 3.3-6).
 * Fb* is Fb times every applicable factor except Cfu, CV and CL.
 */
public final class BeamStability {
    private BeamStability() {}

    public static final double RB_LIMIT = 50;

    /**
     * @param le effective length, m
     * @param b breadth, m
     * @param d depth, m
     * @param fbStar Fb*, Pa
     * @param eMinAdjusted Emin', Pa
     */
    public static Result of(double le, double b, double d, double fbStar, double eMinAdjusted) {
        double rb = Math.sqrt(le * d / (b * b));
        if (rb > RB_LIMIT) {
            throw new SlendernessException(rb);
        }
        double fbe = 1.20 * eMinAdjusted / (rb * rb);
        double alpha = fbe / fbStar;
        double a = (1 + alpha) / 1.9;
        double cl = a - Math.sqrt(a * a - alpha / 0.95);
        return new Result(rb, fbe, cl);
    }

    /** A member braced so it cannot buckle laterally, or no deeper than wide (NDS 3.3.3.1). */
    public static Factor braced(String why) {
        return Factor.unity("CL", "NDS 2018 3.3.3.1", why);
    }

    public record Result(double rb, double fbe, double cl) {
        public Factor factor(double fbStar) {
            return new Factor("CL", cl, "NDS 2018 3.3.3, Eq. 3.3-6", String.format(Locale.ROOT,
                    "RB = %.3f, FbE = 1.20 Emin' / RB^2 = %.0f psi, Fb* = %.0f psi, FbE/Fb* = %.4f",
                    rb, fbe / ServiceFactors.PSI, fbStar / ServiceFactors.PSI, fbe / fbStar));
        }
    }

    /** RB above 50: NDS 3.3.3.7 does not allow the member. */
    public static final class SlendernessException extends IllegalArgumentException {
        private static final long serialVersionUID = 1L;
        private final double rb;

        public SlendernessException(double rb) {
            super(String.format(Locale.ROOT, "slenderness ratio RB = %.1f exceeds 50 (NDS 2018 3.3.3.7);"
                    + " brace the compression edge more closely", rb));
            this.rb = rb;
        }

        public double rb() {
            return rb;
        }
    }
}
