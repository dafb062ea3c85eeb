package org.beamfolio.design.steel;

import org.beamfolio.catalogue.ShapeFamily;

/** The web bearing checks of J10.2 and J10.3 are implemented for I-shapes and channels only. */
final class BearingScope {
    private BearingScope() {}

    static void require(SteelMember m, String clause) {
        ShapeFamily.Kind kind = m.shape().family().kind();
        if (kind != ShapeFamily.Kind.I_SHAPE && kind != ShapeFamily.Kind.CHANNEL) {
            throw new OutOfScopeException(m.shape().designation() + ": " + m.edition().label() + " " + clause
                    + " is implemented for I-shapes and channels only");
        }
    }
}
