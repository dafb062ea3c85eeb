package org.beamfolio.catalogue;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Structural steel grades by name, with the minimum specified yield and tensile strengths of their
 * standards for the usual thicknesses, E, and weight density. SI inside (Pa, N/m^3).
 *
 * <p>E = 29,000 ksi for the ASTM grades (AISC 360-16 and 360-22, Symbols: "E, modulus of elasticity
 * of steel = 29,000 ksi"); 210 GPa for the EN grades (EN 1993-1-1 3.2.6). Weight density 490 pcf
 * for the ASTM grades and 7850 kg/m^3 under standard gravity for the EN grades: common practice.
 * A500 Grade C is 50 ksi for rectangular and 46 ksi for round HSS (ASTM A500, Grade C); the EN
 * values are those of EN 10025-2 for thicknesses up to 40 mm.
 */
public enum SteelGrade {
    A992("A992", "ASTM A992/A992M", ksi(50), ksi(50), ksi(65), Origin.ASTM),
    A36("A36", "ASTM A36/A36M", ksi(36), ksi(36), ksi(58), Origin.ASTM),
    A572_50("A572-50", "ASTM A572/A572M Grade 50", ksi(50), ksi(50), ksi(65), Origin.ASTM),
    A500C("A500C", "ASTM A500/A500M Grade C", ksi(50), ksi(46), ksi(62), Origin.ASTM),
    A53B("A53B", "ASTM A53/A53M Grade B", ksi(35), ksi(35), ksi(60), Origin.ASTM),
    S235("S235", "EN 10025-2 S235 (t <= 40 mm)", 235e6, 235e6, 360e6, Origin.EN),
    S275("S275", "EN 10025-2 S275 (t <= 40 mm)", 275e6, 275e6, 430e6, Origin.EN),
    S355("S355", "EN 10025-2 S355 (t <= 40 mm)", 355e6, 355e6, 490e6, Origin.EN);

    /** Pascals in a ksi (1000 lbf per square inch, international pound). */
    public static final double KSI = 4.4482216152605e3 / (0.0254 * 0.0254);

    private enum Origin {
        ASTM(29_000 * KSI, 490 * 4.4482216152605 / (0.3048 * 0.3048 * 0.3048)),
        EN(210e9, 7850 * 9.80665);

        final double e;
        final double weightDensity;

        Origin(double e, double weightDensity) {
            this.e = e;
            this.weightDensity = weightDensity;
        }
    }

    private final String label;
    private final String standard;
    private final double fy;
    private final double fyRound;
    private final double fu;
    private final Origin origin;

    SteelGrade(String label, String standard, double fy, double fyRound, double fu, Origin origin) {
        this.label = label;
        this.standard = standard;
        this.fy = fy;
        this.fyRound = fyRound;
        this.fu = fu;
        this.origin = origin;
    }

    private static double ksi(double v) {
        return v * KSI;
    }

    /** The name a job file uses, e.g. {@code A572-50}. */
    public String label() {
        return label;
    }

    /** The standard the values come from, printed beside them. */
    public String standard() {
        return standard;
    }

    /** Minimum specified yield stress (Pa) for a rectangular or open shape. */
    public double fy() {
        return fy;
    }

    /** Minimum specified yield stress (Pa) for a shape of the family (A500 Grade C differs for round HSS). */
    public double fy(ShapeFamily family) {
        return family.kind() == ShapeFamily.Kind.ROUND_HSS ? fyRound : fy;
    }

    /** Minimum specified tensile strength (Pa). */
    public double fu() {
        return fu;
    }

    public double elasticModulus() {
        return origin.e;
    }

    /** Weight per volume (N/m^3) for self weight. */
    public double weightDensity() {
        return origin.weightDensity;
    }

    /** A grade by its name, whatever the case, spaces or hyphens ({@code a572-50}, {@code A572 50}). */
    public static Optional<SteelGrade> find(String name) {
        String key = key(name);
        return Arrays.stream(values()).filter(g -> key(g.label).equals(key)).findFirst();
    }

    /** The names a job file may use, for messages. */
    public static List<String> labels() {
        return Arrays.stream(values()).map(SteelGrade::label).toList();
    }

    private static String key(String name) {
        return name.toUpperCase(Locale.ROOT).replaceAll("[\\s_-]", "");
    }
}
