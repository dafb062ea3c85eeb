package org.beamfolio.model.timber;

/** The product families the NDS adjusts differently: sawn lumber (chapter 4), glulam (5), SCL (8). */
public enum TimberKind {
    SAWN("sawn lumber", "NDS 2018 Table 4.3.1"),
    GLULAM("structural glued laminated timber", "NDS 2018 Table 5.3.1"),
    SCL("structural composite lumber", "NDS 2018 Table 8.3.1");

    private final String label;
    private final String applicability;

    TimberKind(String label, String applicability) {
        this.label = label;
        this.applicability = applicability;
    }

    public String label() {
        return label;
    }

    /** The table that says which factors apply to this product. */
    public String applicability() {
        return applicability;
    }
}
