package org.beamfolio.report;

import org.beamfolio.units.Numbers;
import org.beamfolio.results.ReportUnits;
import org.beamfolio.units.Unit;

/** Quantities as the package prints them: rounded by {@link Numbers}, with their unit. */
final class Texts {
    private final ReportUnits u;

    Texts(ReportUnits units) {
        this.u = units;
    }

    ReportUnits units() {
        return u;
    }

    String len(double metres) {
        return q(metres, u.length());
    }

    String q(double si, Unit unit) {
        return Numbers.format(unit.fromSi(si), symbol(unit));
    }

    String force(double si) {
        return q(si, u.force());
    }

    String moment(double si) {
        return q(si, u.moment());
    }

    String stress(double si) {
        return q(si, u.stress());
    }

    String deflection(double si) {
        return q(si, u.deflection());
    }

    String plain(double si, Unit unit) {
        return Numbers.format(unit.fromSi(si));
    }

    static String symbol(Unit unit) {
        return unit.symbol().replace("*", "·").replace("^2", "²").replace("^3", "³").replace("^4", "⁴");
    }
}
