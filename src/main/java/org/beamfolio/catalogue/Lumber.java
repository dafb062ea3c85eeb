package org.beamfolio.catalogue;

import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Sawn lumber by nominal size, dressed (S4S, dry) to the standard sizes of common practice
 * (American Softwood Lumber Standard, PS 20, as tabulated in the NDS Supplement Table 1A; from
 * memory): nominal 2, 3 and 4 in dress to 1-1/2, 2-1/2 and 3-1/2 in; 5 and 6 in widths lose
 * 1/2 in; 8 in and wider lose 3/4 in; timbers (5 in and thicker) lose 1/2 in each way.
 *
 * @param nominalThickness nominal thickness of one ply, in
 * @param nominalDepth nominal width (the depth of a beam on edge), in
 * @param plies plies side by side
 */
public record Lumber(int nominalThickness, int nominalDepth, int plies) {
    private static final double INCH = 0.0254;
    private static final Pattern NOMINAL = Pattern.compile("\\s*(\\d{1,2})\\s*[xX]\\s*(\\d{1,2})\\s*");

    public Lumber {
        if (nominalThickness < 2 || nominalDepth < 2 || nominalThickness > 12 || nominalDepth > 24) {
            throw new IllegalArgumentException("no dressed size for nominal " + nominalThickness + "x" + nominalDepth);
        }
        if (plies < 1) {
            throw new IllegalArgumentException("plies must be at least 1, got " + plies);
        }
    }

    /** "2x10" (x or X, spaces allowed); empty when the text is not a nominal size the tool knows. */
    public static Optional<Lumber> parse(String text, int plies) {
        Matcher m = NOMINAL.matcher(text);
        if (!m.matches()) {
            return Optional.empty();
        }
        int t = Integer.parseInt(m.group(1));
        int d = Integer.parseInt(m.group(2));
        if (t < 2 || d < 2 || t > 12 || d > 24 || t > d || (d > 4 && d % 2 == 1 && d != 5)) {
            return Optional.empty();
        }
        return Optional.of(new Lumber(t, d, plies));
    }

    /** Dressed dimension of one nominal size, in. */
    static double dressed(int nominal, boolean timber) {
        return timber || nominal <= 7 ? nominal - 0.5 : nominal - 0.75;
    }

    /** Timbers are 5 in (nominal) and thicker. */
    public boolean timber() {
        return nominalThickness >= 5;
    }

    /** Dressed thickness of one ply, m. */
    public double plyThickness() {
        return dressed(nominalThickness, timber()) * INCH;
    }

    /** Dressed breadth of all plies, m. */
    public double breadth() {
        return plies * plyThickness();
    }

    /** Dressed depth, m. */
    public double depth() {
        return dressed(nominalDepth, timber()) * INCH;
    }

    public String designation() {
        String size = nominalThickness + "x" + nominalDepth;
        return plies == 1 ? size : plies + "-" + size;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s (%s x %s in)", designation(),
                inches(breadth() / INCH), inches(depth() / INCH));
    }

    private static String inches(double v) {
        int whole = (int) Math.floor(v + 1e-9);
        double frac = v - whole;
        if (frac < 1e-9) {
            return Integer.toString(whole);
        }
        int sixteenths = (int) Math.round(frac * 16);
        int g = gcd(sixteenths, 16);
        return whole + "-" + (sixteenths / g) + "/" + (16 / g);
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
    }
}
