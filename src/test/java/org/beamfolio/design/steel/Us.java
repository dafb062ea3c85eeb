package org.beamfolio.design.steel;

import org.beamfolio.catalogue.ShapeCatalogue;
import org.beamfolio.catalogue.SteelGrade;

/** US customary units in SI (exact definitions: NIST SP 811, Appendix B) and members for the tests. */
final class Us {
    static final double IN = 0.0254;
    static final double FT = 0.3048;
    static final double KIP = 4448.2216152605;
    static final double KSI = KIP / (IN * IN);
    static final double KIP_FT = KIP * FT;

    private Us() {}

    static SteelMember member(String designation, SteelGrade grade) {
        return SteelMember.of(ShapeCatalogue.aisc().find(designation).orElseThrow(), grade, Edition.AISC_360_16);
    }

    static double kipFt(double newtonMetres) {
        return newtonMetres / KIP_FT;
    }
}
