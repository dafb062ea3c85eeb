package org.beamfolio.checks;

/** What sort of check an outcome is, as the results file names it ({@code kind}). */
public enum CheckKind {
    STRESS("stress"), DEFLECTION("deflection"), FLEXURE("flexure"), SHEAR("shear"), BEARING("bearing");

    private final String key;

    CheckKind(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
