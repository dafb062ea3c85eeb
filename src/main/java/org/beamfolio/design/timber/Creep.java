package org.beamfolio.design.timber;

import org.beamfolio.model.timber.TimberService;
import org.beamfolio.model.timber.Factor;

/**
 * Long-term deflection with creep, NDS 2018 3.5.2 (Eq. 3.5-1): delta_T = Kcr delta_LT + delta_ST,
 * Kcr = 1.5 for seasoned lumber, glulam and SCL in dry service, 2.0 in wet service (and for
 * unseasoned lumber).
 */
public final class Creep {
    private Creep() {}

    public static Factor kcr(TimberService service) {
        return service.wet()
                ? new Factor("Kcr", 2.0, "NDS 2018 3.5.2", "wet service")
                : new Factor("Kcr", 1.5, "NDS 2018 3.5.2", "seasoned lumber, glulam or SCL in dry service");
    }

    /** delta_T = Kcr delta_LT + delta_ST. */
    public static double total(double kcr, double longTerm, double shortTerm) {
        return kcr * longTerm + shortTerm;
    }
}
