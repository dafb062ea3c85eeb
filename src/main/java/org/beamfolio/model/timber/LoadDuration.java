package org.beamfolio.model.timber;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Load-duration factors CD of NDS 2018 Table 2.3.2. A combination takes the factor of its
 * shortest-duration load (NDS 2.3.2); CD applies to Fb, Fv (and Ft, Fc), never to Fc_perp, E
 * or Emin (NDS Table 4.3.1 and 5.3.1).
 */
public enum LoadDuration {
    PERMANENT("permanent", 0.9),
    TEN_YEARS("ten_years", 1.0),
    TWO_MONTHS("two_months", 1.15),
    SEVEN_DAYS("seven_days", 1.25),
    TEN_MINUTES("ten_minutes", 1.6),
    IMPACT("impact", 2.0);

    public static final String CLAUSE = "NDS 2018 2.3.2, Table 2.3.2";

    private final String key;
    private final double factor;

    LoadDuration(String key, double factor) {
        this.key = key;
        this.factor = factor;
    }

    public String key() {
        return key;
    }

    public double factor() {
        return factor;
    }

    public static Optional<LoadDuration> ofKey(String key) {
        for (LoadDuration d : values()) {
            if (d.key.equals(key.toLowerCase(Locale.ROOT))) {
                return Optional.of(d);
            }
        }
        return Optional.empty();
    }

    /** The durations the job format assumes when `design.durations` leaves a case out. */
    public static final Map<String, LoadDuration> DEFAULTS = Map.of(
            "D", PERMANENT, "L", TEN_YEARS, "Lr", SEVEN_DAYS, "S", TWO_MONTHS,
            "R", SEVEN_DAYS, "W", TEN_MINUTES, "E", TEN_MINUTES);

    /** The shorter of two durations: the one with the larger factor. */
    public LoadDuration shorter(LoadDuration other) {
        return other.factor > factor ? other : this;
    }
}
