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
 * factors to SI. The inch is 0.0254 m exactly and the pound-force 0.45359237 kg times standard
 * gravity 9.80665 m/s^2 (both by definition: NIST SP 811, appendix B); the rest follow from them.
 */
public final class Units {
    public static final double INCH = 0.0254;
    public static final double FOOT = 12 * INCH;
    public static final double STANDARD_GRAVITY = 9.80665;
    public static final double POUND_FORCE = 0.45359237 * STANDARD_GRAVITY;
    public static final double KIP = 1000 * POUND_FORCE;

    private static final Map<String, Unit> BY_SYMBOL = new LinkedHashMap<>();

    static {
        length("in", INCH);
        length("ft", FOOT);
        length("mm", 1e-3);
        length("cm", 1e-2);
        length("m", 1.0);

        add("lb", Dimension.FORCE, POUND_FORCE);
        add("kip", Dimension.FORCE, KIP);
        add("N", Dimension.FORCE, 1.0);
        add("kN", Dimension.FORCE, 1e3);

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
        add("Pa", Dimension.STRESS, 1.0);
        add("kPa", Dimension.STRESS, 1e3);
        add("MPa", Dimension.STRESS, 1e6);
        add("GPa", Dimension.STRESS, 1e9);

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

    private static void alias(String alias, String symbol) {
        Unit unit = BY_SYMBOL.get(symbol);
        BY_SYMBOL.put(alias, new Unit(alias, unit.dimension(), unit.toSi()));
    }

    /** The unit with this symbol; {@code -} may stand for {@code *} (kip-ft). */
    public static Optional<Unit> find(String symbol) {
        Unit unit = BY_SYMBOL.get(symbol);
        if (unit == null) {
            unit = BY_SYMBOL.get(symbol.replace('-', '*'));
        }
        return Optional.ofNullable(unit);
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

    /** Every accepted symbol, for suggestions. */
    public static List<String> allSymbols() {
        return List.copyOf(BY_SYMBOL.keySet());
    }

    /** A case-insensitive match, for a "did you mean" when the case is all that is wrong. */
    public static Optional<Unit> findIgnoringCase(String symbol) {
        String wanted = symbol.replace('-', '*').toLowerCase(Locale.ROOT);
        return BY_SYMBOL.values().stream()
                .filter(u -> u.symbol().toLowerCase(Locale.ROOT).equals(wanted))
                .findFirst();
    }
}
