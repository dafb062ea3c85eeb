package org.beamfolio.design.timber;

import org.beamfolio.model.timber.TimberKind;
import org.beamfolio.model.timber.SizeClass;
import org.beamfolio.model.timber.TimberValues;
import org.beamfolio.model.timber.Factor;
import java.util.Locale;

/**
 * Size factor CF on Fb of sawn lumber. Dimension lumber (2 to 4 in thick): the NDS Supplement
 * Table 4A adjustment factors for Select Structural, No. 1 and Btr, No. 1, No. 2 and No. 3 by
 * nominal width and thickness (from memory of that table). Timbers 5 in and thicker deeper than
 * 12 in: CF = (12/d)^(1/9), NDS 2018 4.3.6.2 (Eq. 4.3-1).
 */
public final class SizeFactor {
    private SizeFactor() {}

    private static final double INCH = 0.0254;

    /** Dressed depths (in) of the nominal widths in Table 4A and the factors for 2-3 in and 4 in thickness. */
    private static final double[][] DIMENSION = {
        // dressed depth upper bound, CF 2 & 3 in thick, CF 4 in thick, nominal width
        {3.5, 1.5, 1.5, 4},
        {4.5, 1.4, 1.4, 5},
        {5.5, 1.3, 1.3, 6},
        {7.25, 1.2, 1.3, 8},
        {9.25, 1.1, 1.2, 10},
        {11.25, 1.0, 1.1, 12},
        {Double.MAX_VALUE, 0.9, 1.0, 14},
    };

    /**
     * @param b thickness (breadth of one ply), m
     * @param d depth, m
     */
    public static Factor of(TimberValues v, double b, double d) {
        if (v.kind() != TimberKind.SAWN || v.sizeClass() == SizeClass.NONE) {
            return Factor.unity("CF", "NDS 2018 4.3.6", v.kind() == TimberKind.SAWN
                    ? "size factor included in the reference value" : "size factor does not apply to " + v.kind().label());
        }
        double dIn = d / INCH;
        if (v.sizeClass() == SizeClass.TIMBER) {
            if (dIn <= 12) {
                return Factor.unity("CF", "NDS 2018 4.3.6.2", "timber d <= 12 in");
            }
            double value = Math.pow(12 / dIn, 1.0 / 9);
            return new Factor("CF", value, "NDS 2018 4.3.6.2, Eq. 4.3-1",
                    String.format(Locale.ROOT, "(12 / d)^(1/9) = (12 / %.3f)^(1/9)", dIn));
        }
        boolean fourInch = b / INCH > 3.0;
        for (double[] row : DIMENSION) {
            if (dIn <= row[0] + 1e-6) {
                String nominal = row[3] >= 14 ? "14 in and wider" : String.format(Locale.ROOT, "%.0f in wide", row[3]);
                return new Factor("CF", fourInch ? row[2] : row[1], "NDS Supplement Table 4A, size factor",
                        nominal + ", " + (fourInch ? "4 in" : "2 and 3 in") + " thick");
            }
        }
        throw new AssertionError("unreachable: the last row covers every depth");
    }
}
