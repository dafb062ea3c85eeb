package org.beamfolio.report;

import org.beamfolio.model.ReportSettings;
import org.beamfolio.units.Measure;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.units.Unit;

/** Quantities as the package prints them: rounded by {@link Numbers}, with their unit. */
final class Texts {
    private final ReportUnits u;
    private final ReportSettings.Positions positions;

    Texts(ReportUnits units, ReportSettings.Positions positions) {
        this.u = units;
        this.positions = positions;
    }

    ReportUnits units() {
        return u;
    }

    /** A position or length along the beam: decimal, or in feet and inches when the job asks (9'-6"). */
    String len(double metres) {
        return positions == ReportSettings.Positions.FEET_INCHES ? feetInches(metres) : q(metres, u.length());
    }

    /**
     * Feet and inches to the nearest sixteenth of an inch (9'-6", 12'-3 1/4", 0'-8"), the way US
     * drawings give positions (common practice); a negative value keeps its sign in front.
     */
    static String feetInches(double metres) {
        long sixteenths = Math.round(Math.abs(metres) / 0.0254 * 16);
        long feet = sixteenths / (12 * 16);
        long rest = sixteenths % (12 * 16);
        long inches = rest / 16;
        long fraction = rest % 16;
        String inchText = Long.toString(inches);
        if (fraction != 0) {
            long denominator = 16;
            while (fraction % 2 == 0) {
                fraction /= 2;
                denominator /= 2;
            }
            inchText += " " + fraction + "/" + denominator;
        }
        return (metres < 0 && sixteenths != 0 ? "-" : "") + feet + "'-" + inchText + "\"";
    }

    String q(double si, Unit unit) {
        return Numbers.format(unit.fromSi(si), symbol(unit));
    }

    /** A check's demand or limit (SI) in the unit the package gives what it measures. */
    String checked(double si, Measure measure) {
        return q(si, u.unitOf(measure));
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
        return symbol(unit.symbol());
    }

    /** A unit symbol as the report prints it (lb·ft, in⁴). */
    static String symbol(String symbol) {
        return symbol.replace("*", "·").replace("^2", "²").replace("^3", "³").replace("^4", "⁴");
    }
}
