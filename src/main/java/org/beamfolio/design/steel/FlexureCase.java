package org.beamfolio.design.steel;

/**
 * The bending a flexural strength is worked for: the unbraced length Lb of the compression flange
 * (m; 0 when it is braced continuously), the lateral-torsional buckling modification factor Cb,
 * and, for tees, whether the stem is in compression.
 */
public record FlexureCase(double lb, double cb, boolean stemInCompression) {
    public FlexureCase {
        if (!(lb >= 0) || !(cb >= 1.0)) {
            throw new IllegalArgumentException("Lb must be zero or more and Cb at least 1.0, got Lb = " + lb + " m, Cb = " + cb);
        }
    }

    /** Continuous lateral bracing of the compression flange. */
    public static FlexureCase continuouslyBraced() {
        return new FlexureCase(0, 1.0, false);
    }

    public static FlexureCase unbraced(double lb, double cb) {
        return new FlexureCase(lb, cb, false);
    }
}
