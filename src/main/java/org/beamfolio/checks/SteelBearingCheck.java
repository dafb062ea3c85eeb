package org.beamfolio.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.design.steel.LimitStateResult;
import org.beamfolio.design.steel.SteelDesignWork;
import org.beamfolio.units.Measure;
import org.beamfolio.units.ReportUnits;

/**
 * Web local yielding (AISC 360 J10.2) and web local crippling (J10.3) of a catalogue I-shape or
 * channel under a concentrated force: at each support that gives a bearing length, the largest
 * upward reaction; under point loads that give one, the largest factored sum of the point loads at
 * that position. One outcome per place and limit state, under the combination with the largest
 * ratio. Worked by {@link SteelDesignWork}.
 */
final class SteelBearingCheck implements Check {
    static final Authority AUTHORITY = new Authority(SteelDesignChecks.STANDARD, "2016, 2022", "J10.2, J10.3");

    @Override
    public String id() {
        return "web";
    }

    @Override
    public Authority authority() {
        return AUTHORITY;
    }

    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        SteelDesignWork work = SteelDesignWork.of(result);
        if (work == null) {
            return List.of();
        }
        ReportUnits u = ReportUnits.of(result.job().report().units());
        Map<String, SteelDesignWork.BearingRow> worst = new LinkedHashMap<>();
        for (SteelDesignWork.BearingRow row : work.bearing()) {
            String id = row.strength().kind().replace(' ', '-') + (row.support() ? "-support" : "-load") + (row.index() + 1);
            worst.merge(id, row, (a, b) -> b.ratio() > a.ratio() ? b : a);
        }
        List<CheckOutcome> out = new ArrayList<>();
        for (Map.Entry<String, SteelDesignWork.BearingRow> e : worst.entrySet()) {
            SteelDesignWork.BearingRow row = e.getValue();
            LimitStateResult governing = row.strength().governing();
            String place = row.support() ? "support " + (row.index() + 1)
                    : "the point loads at " + SteelDesignChecks.number(u.length().fromSi(row.at())) + " " + u.length().symbol();
            String what = governing.limitState();
            out.add(new CheckOutcome(e.getKey(), Character.toUpperCase(what.charAt(0)) + what.substring(1) + " at " + place
                    + ", bearing length " + SteelDesignChecks.number(u.sectionLength().fromSi(row.strength().factors().get("lb")))
                    + " " + u.sectionLength().symbol() + " (" + SteelDesignChecks.method(work.method()) + ")",
                    row.force(), row.available(), row.ratio(), row.ratio() <= 1,
                    row.combination().name(), row.at(), Measure.DESIGN_FORCE, CheckKind.BEARING, governing.clause().reference(),
                    governing.limitState(), null, Map.of()));
        }
        return out;
    }
}
