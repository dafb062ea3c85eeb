package org.beamfolio.catalogue;

/**
 * A tabulated column of the shape catalogue, named as the AISC Shapes Database names it, with the
 * power of length it carries so that a tabulated value (inches) converts once to SI.
 */
public enum ShapeProperty {
    W("W", "nominal weight", -1),
    A("A", "cross-sectional area", 2),
    D("d", "overall depth", 1),
    HT("Ht", "overall depth of an HSS", 1),
    H_FLAT("h", "flat width of an HSS's longer wall", 1),
    OD("OD", "outside diameter", 1),
    BF("bf", "flange width", 1),
    B("B", "overall width of an HSS", 1),
    B_FLAT("b", "flat width of an HSS's shorter wall", 1),
    TW("tw", "web thickness", 1),
    TF("tf", "flange thickness", 1),
    TNOM("tnom", "nominal wall thickness", 1),
    TDES("tdes", "design wall thickness", 1),
    KDES("kdes", "distance from the outer face of the flange to the web toe of the fillet (design)", 1),
    X_BAR("x", "horizontal distance from the back of the web to the centroid", 1),
    Y_BAR("y", "vertical distance from the outer face of the flange to the centroid", 1),
    EO("eo", "horizontal distance from the outer edge of a channel's web to its shear centre", 1),
    XP("xp", "horizontal distance from the back of the web to the plastic neutral axis", 1),
    YP("yp", "vertical distance from the outer face of the flange to the plastic neutral axis", 1),
    BF_2TF("bf/2tf", "flange slenderness", 0),
    B_T("b/t", "flange slenderness of a channel", 0),
    B_TDES("b/tdes", "flange slenderness of an HSS", 0),
    H_TW("h/tw", "web slenderness", 0),
    H_TDES("h/tdes", "web slenderness of an HSS", 0),
    D_T("D/t", "diameter to thickness (round HSS, pipe) or depth to stem thickness (tee)", 0),
    IX("Ix", "moment of inertia about the x-axis", 4),
    ZX("Zx", "plastic section modulus about the x-axis", 3),
    SX("Sx", "elastic section modulus about the x-axis", 3),
    RX("rx", "radius of gyration about the x-axis", 1),
    IY("Iy", "moment of inertia about the y-axis", 4),
    ZY("Zy", "plastic section modulus about the y-axis", 3),
    SY("Sy", "elastic section modulus about the y-axis", 3),
    RY("ry", "radius of gyration about the y-axis", 1),
    J("J", "torsional constant", 4),
    CW("Cw", "warping constant", 6),
    C_HSS("C", "HSS torsional constant", 3),
    QF("Qf", "statical moment at the flange-web junction", 3),
    QW("Qw", "statical moment at mid-depth", 3),
    RO("ro", "polar radius of gyration about the shear centre", 1),
    H_FLEX("H", "flexural constant", 0),
    RTS("rts", "effective radius of gyration", 1),
    HO("ho", "distance between the flange centroids", 1);

    /** Metres in an inch, exact by definition. */
    static final double INCH = 0.0254;
    /** Newtons per metre in a pound-force per foot (international pound, standard gravity). */
    static final double POUND_PER_FOOT = 0.45359237 * 9.80665 / 0.3048;

    private final String column;
    private final String description;
    private final int lengthPower;

    ShapeProperty(String column, String description, int lengthPower) {
        this.column = column;
        this.description = description;
        this.lengthPower = lengthPower;
    }

    /** The database's column name, as the catalogue prints it. */
    public String column() {
        return column;
    }

    public String description() {
        return description;
    }

    /** The power of length (0 for a ratio); -1 marks weight per length. */
    public int lengthPower() {
        return lengthPower;
    }

    /** The SI value (m^n, or N/m for weight) of a value in the catalogue's US units. */
    double toSi(double tabulated) {
        if (lengthPower < 0) {
            return tabulated * POUND_PER_FOOT;
        }
        return tabulated * Math.pow(INCH, lengthPower);
    }
}
