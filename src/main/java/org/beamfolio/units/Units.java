package org.beamfolio.units;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The units a job file may use (format 1's table and a few common spellings) and their exact
 * factors to SI. Besides its symbols, the table accepts the shorthand US practice writes on
 * drawings and in hand calculations where it cannot mean anything else ({@code k} and
 * {@code kips} for kip, {@code '} and {@code "} for foot and inch, {@code ft-kip} beside
 * {@code kip-ft}); an alias reads as its unit and is never printed. The inch is 0.0254 m exactly and the pound-force 0.45359237 kg times standard
 * gravity 9.80665 m/s^2 (both by definition: NIST SP 811, appendix B); the rest follow from them.
 */
public final class Units {
    public static final double INCH = 0.0254;
    public static final double FOOT = 12 * INCH;
    public static final double STANDARD_GRAVITY = 9.80665;
    public static final double POUND_FORCE = 0.45359237 * STANDARD_GRAVITY;
    public static final double KIP = 1000 * POUND_FORCE;

    private static final Map<String, Unit> BY_SYMBOL = new LinkedHashMap<>();
    private static final Map<String, Unit> ALIASES = new LinkedHashMap<>();

    static {
        length("in", INCH);
        length("ft", FOOT);
        length("mm", 1e-3);
        length("cm", 1e-2);
        length("m", 1.0);
        shorthand("'", "ft");
        shorthand("\"", "in");

        add("lb", Dimension.FORCE, POUND_FORCE);
        add("kip", Dimension.FORCE, KIP);
        add("N", Dimension.FORCE, 1.0);
        add("kN", Dimension.FORCE, 1e3);
        shorthand("k", "kip");
        shorthand("kips", "kip");
        shorthand("lbs", "lb");
        shorthand("lbf", "lb");

        add("lb/ft", Dimension.FORCE_PER_LENGTH, POUND_FORCE / FOOT);
        alias("plf", "lb/ft");
        add("kip/ft", Dimension.FORCE_PER_LENGTH, KIP / FOOT);
        alias("klf", "kip/ft");
        add("lb/in", Dimension.FORCE_PER_LENGTH, POUND_FORCE / INCH);
        add("kip/in", Dimension.FORCE_PER_LENGTH, KIP / INCH);
        add("N/m", Dimension.FORCE_PER_LENGTH, 1.0);
        add("kN/m", Dimension.FORCE_PER_LENGTH, 1e3);
        add("N/mm", Dimension.FORCE_PER_LENGTH, 1e3);
        add("kN/mm", Dimension.FORCE_PER_LENGTH, 1e6);
        shorthand("k/ft", "kip/ft");
        shorthand("kips/ft", "kip/ft");
        shorthand("k/in", "kip/in");

        add("lb*ft", Dimension.MOMENT, POUND_FORCE * FOOT);
        add("lb*in", Dimension.MOMENT, POUND_FORCE * INCH);
        add("kip*ft", Dimension.MOMENT, KIP * FOOT);
        add("kip*in", Dimension.MOMENT, KIP * INCH);
        add("N*m", Dimension.MOMENT, 1.0);
        add("kN*m", Dimension.MOMENT, 1e3);
        add("N*mm", Dimension.MOMENT, 1e-3);

        add("psi", Dimension.STRESS, POUND_FORCE / (INCH * INCH));
        add("ksi", Dimension.STRESS, KIP / (INCH * INCH));
        add("psf", Dimension.STRESS, POUND_FORCE / (FOOT * FOOT));
        add("ksf", Dimension.STRESS, KIP / (FOOT * FOOT));
        add("Pa", Dimension.STRESS, 1.0);
        add("kPa", Dimension.STRESS, 1e3);
        add("MPa", Dimension.STRESS, 1e6);
        add("GPa", Dimension.STRESS, 1e9);
        shorthand("N/mm^2", "MPa");
        shorthand("kN/m^2", "kPa");

        power("in", INCH);
        power("ft", FOOT);
        power("mm", 1e-3);
        power("cm", 1e-2);
        power("m", 1.0);

        add("pcf", Dimension.WEIGHT_DENSITY, POUND_FORCE / (FOOT * FOOT * FOOT));
        alias("lb/ft^3", "pcf");
        add("kN/m^3", Dimension.WEIGHT_DENSITY, 1e3);
        // a mass density: its weight under standard gravity
        add("kg/m^3", Dimension.WEIGHT_DENSITY, STANDARD_GRAVITY);

        add("lb*in/rad", Dimension.ROTATIONAL_STIFFNESS, POUND_FORCE * INCH);
        add("lb*ft/rad", Dimension.ROTATIONAL_STIFFNESS, POUND_FORCE * FOOT);
        add("kip*in/rad", Dimension.ROTATIONAL_STIFFNESS, KIP * INCH);
        add("kip*ft/rad", Dimension.ROTATIONAL_STIFFNESS, KIP * FOOT);
        add("N*m/rad", Dimension.ROTATIONAL_STIFFNESS, 1.0);
        add("kN*m/rad", Dimension.ROTATIONAL_STIFFNESS, 1e3);
        add("N*mm/rad", Dimension.ROTATIONAL_STIFFNESS, 1e-3);
        // the force and the length in either order: engineers write ft-kip as often as kip-ft
        for (String suffix : new String[] {"", "/rad"}) {
            shorthand("ft*lb" + suffix, "lb*ft" + suffix);
            shorthand("in*lb" + suffix, "lb*in" + suffix);
            shorthand("ft*kip" + suffix, "kip*ft" + suffix);
            shorthand("in*kip" + suffix, "kip*in" + suffix);
            shorthand("k*ft" + suffix, "kip*ft" + suffix);
            shorthand("ft*k" + suffix, "kip*ft" + suffix);
            shorthand("k*in" + suffix, "kip*in" + suffix);
            shorthand("in*k" + suffix, "kip*in" + suffix);
            shorthand("kNm" + suffix, "kN*m" + suffix);
        }
    }

    private Units() {}

    private static void length(String symbol, double metres) {
        add(symbol, Dimension.LENGTH, metres);
    }

    private static void power(String symbol, double metres) {
        add(symbol + "^2", Dimension.AREA, metres * metres);
        add(symbol + "^3", Dimension.FIRST_MOMENT, metres * metres * metres);
        add(symbol + "^4", Dimension.SECOND_MOMENT, metres * metres * metres * metres);
    }

    private static void add(String symbol, Dimension dimension, double toSi) {
        BY_SYMBOL.put(symbol, new Unit(symbol, dimension, toSi));
    }

    /** Shorthand that reads as a unit of the table but is not offered as a symbol of its own. */
    private static void shorthand(String alias, String symbol) {
        ALIASES.put(alias, BY_SYMBOL.get(symbol));
    }

    private static void alias(String alias, String symbol) {
        Unit unit = BY_SYMBOL.get(symbol);
        BY_SYMBOL.put(alias, new Unit(alias, unit.dimension(), unit.toSi()));
    }

    /**
     * The unit with this symbol or shorthand; {@code -} may stand for {@code *} (kip-ft). A
     * shorthand gives the unit it stands for ({@code ft-kip} gives {@code kip*ft}).
     */
    public static Optional<Unit> find(String symbol) {
        String product = symbol.replace('-', '*');
        for (String spelling : new String[] {symbol, product}) {
            Unit unit = BY_SYMBOL.get(spelling);
            if (unit == null) {
                unit = ALIASES.get(spelling);
            }
            if (unit != null) {
                return Optional.of(unit);
            }
        }
        return Optional.empty();
    }

    /** The unit with this symbol; for units defined in code, where a miss is a programming error. */
    public static Unit of(String symbol) {
        return find(symbol).orElseThrow(() -> new IllegalArgumentException("no unit " + symbol));
    }

    /** Every accepted symbol of one dimension, in table order. */
    public static List<String> symbolsOf(Dimension dimension) {
        List<String> symbols = new ArrayList<>();
        for (Unit unit : BY_SYMBOL.values()) {
            if (unit.dimension() == dimension) {
                symbols.add(unit.symbol());
            }
        }
        return Collections.unmodifiableList(symbols);
    }

    /** Every accepted shorthand of one dimension, written with {@code *} (a {@code -} may stand for it). */
    public static List<String> shorthandOf(Dimension dimension) {
        List<String> symbols = new ArrayList<>();
        ALIASES.forEach((alias, unit) -> {
            if (unit.dimension() == dimension) {
                symbols.add(alias);
            }
        });
        return Collections.unmodifiableList(symbols);
    }

    /** A case-insensitive match, for a "did you mean" when the case is all that is wrong. */
    public static Optional<Unit> findIgnoringCase(String symbol) {
        String wanted = symbol.replace('-', '*').toLowerCase(Locale.ROOT);
        Optional<Unit> unit = BY_SYMBOL.values().stream()
                .filter(u -> u.symbol().toLowerCase(Locale.ROOT).equals(wanted))
                .findFirst();
        return unit.or(() -> ALIASES.entrySet().stream()
                .filter(e -> e.getKey().toLowerCase(Locale.ROOT).equals(wanted))
                .map(Map.Entry::getValue)
                .findFirst());
    }
}
