package org.beamfolio.checks;

import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.design.steel.LimitStateResult;
import org.beamfolio.design.steel.SteelDesignWork;
import org.beamfolio.units.Measure;

/**
 * Shear of a catalogue steel shape, AISC 360 Chapter G (G2.1 for I-shapes and channels with Cv1,
 * G3 tees, G4 rectangular HSS, G5 round HSS): the largest |V| over every combination against the
 * available shear strength. Worked by {@link SteelDesignWork}.
 */
final class SteelShearCheck implements Check {
    static final Authority AUTHORITY = new Authority(SteelDesignChecks.STANDARD, "2016, 2022", "Chapter G");

    @Override
    public String id() {
        return "shear";
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
        return work.shear().stream().max(Comparator.comparingDouble(SteelDesignWork.ShearRow::ratio)).map(row -> {
            LimitStateResult governing = row.strength().governing();
            return List.of(new CheckOutcome(id(), "Shear, " + governing.limitState() + " ("
                    + SteelDesignChecks.method(work.method()) + ")", Math.abs(row.demand().value()),
                    row.available(), row.ratio(), row.ratio() <= 1, row.combination().name(),
                    row.demand().at(), Measure.DESIGN_FORCE, CheckKind.SHEAR, governing.clause().reference(),
                    governing.limitState(), null, Map.of()));
        }).orElse(List.of());
    }
}
