package org.beamfolio.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.UnbracedSegments;
import org.beamfolio.design.steel.LimitStateResult;
import org.beamfolio.design.steel.SteelDesignWork;
import org.beamfolio.units.Measure;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.units.Unit;

/**
 * Flexure of a catalogue steel shape, AISC 360 Chapter F: one outcome per unbraced segment of a
 * flange in compression, under the combination that gives it the largest ratio of the required
 * strength (Ma or Mu, the largest moment compressing that flange in the segment) to the available
 * strength (Mn/Omega_b or phi_b Mn, Mn by the section of Chapter F that applies, with Lb and Cb of
 * the segment). Worked by {@link SteelDesignWork}; the package's steel sheet reads the same rows.
 */
final class SteelFlexureCheck implements Check {
    static final Authority AUTHORITY = new Authority(SteelDesignChecks.STANDARD, "2016, 2022", "Chapter F");

    @Override
    public String id() {
        return "flexure";
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
        Unit length = ReportUnits.of(result.job().report().units()).length();
        List<CheckOutcome> out = new ArrayList<>();
        for (SteelDesignWork.FlexureRow row : work.governingPerSegment()) {
            UnbracedSegments.Segment seg = row.segment();
            LimitStateResult governing = row.strength().governing();
            Map<String, Double> factors = new LinkedHashMap<>();
            factors.put("Cb", row.strength().factors().get("Cb"));
            String from = SteelDesignChecks.number(length.fromSi(seg.from()));
            String to = SteelDesignChecks.number(length.fromSi(seg.to()));
            String braced = seg.continuouslyBraced() ? "braced continuously"
                    : "Lb = " + SteelDesignChecks.number(length.fromSi(seg.lb())) + " " + length.symbol()
                    + (seg.freeEnd() ? ", unbraced free end" : "");
            out.add(new CheckOutcome(id() + "-" + seg.flange().label() + "-" + from + "-" + to + length.symbol(),
                    "Flexure, " + seg.flange().label() + " flange " + from + " to " + to + " " + length.symbol()
                            + " in compression (" + braced + "), " + governing.limitState() + " governs ("
                            + SteelDesignChecks.method(work.method()) + ")",
                    row.demand(), row.available(), row.ratio(), row.ratio() <= 1,
                    row.combination().name(), seg.demand().at(), Measure.DESIGN_MOMENT, CheckKind.FLEXURE,
                    governing.clause().reference(), governing.limitState(), new CheckOutcome.Segment(seg.from(), seg.to()),
                    factors));
        }
        return out;
    }
}
