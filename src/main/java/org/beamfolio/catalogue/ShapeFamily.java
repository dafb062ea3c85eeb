package org.beamfolio.catalogue;

/** The beam families of the shape catalogue, grouped by the kind of cross-section the design rules see. */
public enum ShapeFamily {
    W(Kind.I_SHAPE), M(Kind.I_SHAPE), S(Kind.I_SHAPE), HP(Kind.I_SHAPE),
    C(Kind.CHANNEL), MC(Kind.CHANNEL),
    WT(Kind.TEE), MT(Kind.TEE), ST(Kind.TEE),
    HSS_RECTANGULAR(Kind.RECTANGULAR_HSS), HSS_ROUND(Kind.ROUND_HSS), PIPE(Kind.ROUND_HSS);

    /** The cross-section as the specification classifies it. */
    public enum Kind { I_SHAPE, CHANNEL, TEE, RECTANGULAR_HSS, ROUND_HSS }

    private final Kind kind;

    ShapeFamily(Kind kind) {
        this.kind = kind;
    }

    public Kind kind() {
        return kind;
    }

    /** The family of a catalogue row from its {@code Type} and whether it has an outside diameter. */
    static ShapeFamily of(String type, boolean round) {
        if (type.equals("HSS")) {
            return round ? HSS_ROUND : HSS_RECTANGULAR;
        }
        return valueOf(type);
    }
}
