package org.beamfolio.checks.steel;

import org.beamfolio.design.steel.LimitStateResult;
import org.beamfolio.design.steel.Method;
import org.beamfolio.design.steel.SteelDesignWork;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.UnbracedSegments;
import org.beamfolio.checks.Authority;
import org.beamfolio.checks.Check;
import org.beamfolio.checks.CheckKind;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.units.Unit;
import org.beamfolio.units.Units;

/**
 * The checks of a steel beam designed to AISC 360 ({@link SteelDesignWork}): one flexure check per
 * unbraced segment of a flange in compression, under the combination that gives it the largest
 * ratio; one shear check; at each support with a bearing length, web local yielding and web local
 * crippling. Demand is the required strength (Ma or Mu, Va or Vu, Ra or Ru) and limit the
 * available strength (Mn/Omega or phi Mn), in kip*ft and kips (US) or kN*m and kN (SI).
 */
public final class SteelChecks implements Check {
    @Override
    public String id() {
        return "aisc";
    }

    @Override
    public Authority authority() {
        return new Authority("AISC 360", "2016 or 2022, as the job states", "Chapters F and G, J10.2 and J10.3");
    }

    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        return outcomes(result);
    }

    /** The steel checks of the job, none without {@code design.steel}. */
    public static List<CheckOutcome> outcomes(AnalysisResult result) {
        SteelDesignWork work = SteelDesignWork.of(result);
        if (work == null) {
            return List.of();
        }
        boolean si = result.job().report().units() == org.beamfolio.units.UnitSystem.SI;
        Unit moment = Units.of(si ? "kN*m" : "kip*ft");
        Unit force = Units.of(si ? "kN" : "kip");
        Unit length = ReportUnits.of(result.job().report().units()).length();
        String method = work.method() == Method.LRFD ? "LRFD, phi Rn" : "ASD, Rn/Omega";
        List<CheckOutcome> out = new ArrayList<>();
        for (SteelDesignWork.FlexureRow row : governingPerSegment(work.flexure())) {
            UnbracedSegments.Segment seg = row.segment();
            LimitStateResult governing = row.strength().governing();
            Map<String, Double> factors = new LinkedHashMap<>();
            factors.put("Cb", row.strength().factors().get("Cb"));
            String where = seg.flange().label() + " flange " + trim(length.fromSi(seg.from())) + " to "
                    + trim(length.fromSi(seg.to())) + " " + length.symbol();
            String braced = seg.continuouslyBraced() ? "braced continuously" : "Lb = " + trim(length.fromSi(seg.lb())) + " "
                    + length.symbol() + (seg.freeEnd() ? ", unbraced free end" : "");
            out.add(new CheckOutcome(segmentId(row, length), "Flexure, " + where + " in compression (" + braced + "), "
                    + governing.limitState() + " governs (" + method + ")", moment.fromSi(row.demand()),
                    moment.fromSi(row.available()), row.ratio(), row.ratio() <= 1, row.combination().name(),
                    seg.demand().at(), moment.symbol(), CheckKind.FLEXURE, governing.clause().reference(), governing.limitState(),
                    new CheckOutcome.Segment(seg.from(), seg.to()), factors));
        }
        work.shear().stream().max(Comparator.comparingDouble(SteelDesignWork.ShearRow::ratio)).ifPresent(row -> {
            LimitStateResult governing = row.strength().governing();
            out.add(new CheckOutcome("shear", "Shear, " + governing.limitState() + " (" + method + ")",
                    force.fromSi(Math.abs(row.demand().value())), force.fromSi(row.available()), row.ratio(),
                    row.ratio() <= 1, row.combination().name(), row.demand().at(), force.symbol(), CheckKind.SHEAR,
                    governing.clause().reference(), governing.limitState(), null, Map.of()));
        });
        Map<String, SteelDesignWork.BearingRow> bearing = new LinkedHashMap<>();
        for (SteelDesignWork.BearingRow row : work.bearing()) {
            String id = row.strength().kind().replace(' ', '-') + "-support" + (row.support() + 1);
            bearing.merge(id, row, (a, b) -> b.ratio() > a.ratio() ? b : a);
        }
        for (Map.Entry<String, SteelDesignWork.BearingRow> e : bearing.entrySet()) {
            SteelDesignWork.BearingRow row = e.getValue();
            LimitStateResult governing = row.strength().governing();
            out.add(new CheckOutcome(e.getKey(), capitalised(governing.limitState()) + " at support " + (row.support() + 1)
                    + ", bearing length " + trim(ReportUnits.of(result.job().report().units()).sectionLength()
                            .fromSi(row.strength().factors().get("lb"))) + " "
                    + ReportUnits.of(result.job().report().units()).sectionLength().symbol() + " (" + method + ")",
                    force.fromSi(row.force()), force.fromSi(row.available()), row.ratio(), row.ratio() <= 1,
                    row.combination().name(), row.at(), force.symbol(), CheckKind.BEARING, governing.clause().reference(),
                    governing.limitState(), null, Map.of()));
        }
        return out;
    }

    /** Per flange segment (in order along the beam), the combination with the largest ratio; the earlier one on a tie. */
    public static List<SteelDesignWork.FlexureRow> governingPerSegment(List<SteelDesignWork.FlexureRow> rows) {
        Map<String, SteelDesignWork.FlexureRow> best = new LinkedHashMap<>();
        for (SteelDesignWork.FlexureRow row : rows) {
            best.merge(key(row.segment()), row, (a, b) -> b.ratio() > a.ratio() ? b : a);
        }
        List<SteelDesignWork.FlexureRow> result = new ArrayList<>(best.values());
        result.sort(Comparator.comparing((SteelDesignWork.FlexureRow r) -> r.segment().flange())
                .thenComparingDouble(r -> r.segment().from()));
        return result;
    }

    private static String key(UnbracedSegments.Segment s) {
        return s.flange() + ":" + s.from() + ":" + s.to();
    }

    /** {@code flexure-top-0-30ft}: the flange and the segment's ends in the report's length unit. */
    private static String segmentId(SteelDesignWork.FlexureRow row, Unit length) {
        return "flexure-" + row.segment().flange().label() + "-" + trim(length.fromSi(row.segment().from())).replace(",", "")
                + "-" + trim(length.fromSi(row.segment().to())).replace(",", "") + length.symbol();
    }

    private static String capitalised(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    private static String trim(double v) {
        return org.beamfolio.units.Numbers.format(v);
    }
}
