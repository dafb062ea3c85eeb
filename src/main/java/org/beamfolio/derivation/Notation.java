package org.beamfolio.derivation;

import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.units.Unit;

/** Report units for the working, and their symbols as printed. */
final class Notation {
    final Unit length;
    final Unit force;
    final Unit moment;
    final Unit distributed;
    final Unit deflection;

    Notation(AnalysisResult result) {
        ReportUnits u = ReportUnits.of(result.job().report().units());
        length = u.length();
        force = u.force();
        moment = u.moment();
        distributed = u.distributed();
        deflection = u.deflection();
    }

    double x(double si) {
        return length.fromSi(si);
    }

    double f(double si) {
        return force.fromSi(si);
    }

    double m(double si) {
        return moment.fromSi(si);
    }

    double w(double si) {
        return distributed.fromSi(si);
    }

    String xu() {
        return sym(length);
    }

    String fu() {
        return sym(force);
    }

    String mu() {
        return sym(moment);
    }

    String wu() {
        return sym(distributed);
    }

    static String sym(Unit u) {
        return u.symbol().replace("*", "·").replace("^2", "²").replace("^3", "³").replace("^4", "⁴");
    }
}
