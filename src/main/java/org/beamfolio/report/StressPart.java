package org.beamfolio.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.section.SectionProperties;
import org.beamfolio.units.RoundOff;

/**
 * Section properties (with the parallel axis table for sections built of rectangles) and the
 * governing stresses worked out: sigma = M c / I at the extreme fibres and tau = V Q / (I t),
 * with the unit conversion shown.
 */
final class StressPart {
    private final AnalysisResult result;
    private final Texts t;

    StressPart(AnalysisResult result, Texts t) {
        this.result = result;
        this.t = t;
    }

    ReportModel.Table summaryTable() {
        var u = t.units();
        List<List<String>> rows = new ArrayList<>();
        for (Map.Entry<String, SectionProperties> e : result.sections().entrySet()) {
            SectionProperties s = e.getValue();
            rows.add(List.of(e.getKey(), shapeName(result.job().sections().get(e.getKey())),
                    s.area() == null ? "not given" : t.plain(s.area(), u.area()), t.plain(s.inertia(), u.secondMoment()),
                    t.plain(s.yBottom(), u.sectionLength()), t.plain(s.sTop(), u.firstMoment()), t.plain(s.sBottom(), u.firstMoment())));
        }
        return new ReportModel.Table(List.of("Section", "Shape", "A (" + Texts.symbol(u.area()) + ")", "I (" + Texts.symbol(u.secondMoment()) + ")",
                "y_b (" + Texts.symbol(u.sectionLength()) + ")", "S_top (" + Texts.symbol(u.firstMoment()) + ")",
                "S_bot (" + Texts.symbol(u.firstMoment()) + ")"), rows);
    }

    static String shapeName(Section section) {
        SectionShape shape = section.shape();
        String name;
        if (shape instanceof SectionShape.Catalogued c) {
            name = c.shape().designation();
        } else if (shape instanceof SectionShape.IBeam) {
            name = "I shape";
        } else if (shape instanceof SectionShape.Given) {
            name = "given properties";
        } else if (shape instanceof SectionShape.Plates) {
            name = "built-up plates";
        } else {
            name = shape instanceof SectionShape.Rectangle ? "rectangle" : shape instanceof SectionShape.Circle ? "circle"
                    : shape instanceof SectionShape.Tube ? "tube" : shape instanceof SectionShape.Pipe ? "pipe"
                    : shape instanceof SectionShape.Tee ? "tee" : "channel";
        }
        return name + (section.flip() ? ", flipped" : "");
    }

    ReportModel.Stresses build() {
        List<ReportModel.SectionSheet> sheets = new ArrayList<>();
        var u = t.units();
        for (Map.Entry<String, SectionProperties> e : result.sections().entrySet()) {
            SectionProperties s = e.getValue();
            List<ReportModel.Row> props = new ArrayList<>();
            props.add(new ReportModel.Row("Shape", shapeName(result.job().sections().get(e.getKey()))));
            props.add(new ReportModel.Row("Depth", t.q(s.depth(), u.sectionLength())));
            if (s.area() != null) {
                props.add(new ReportModel.Row("A", t.q(s.area(), u.area())));
            }
            props.add(new ReportModel.Row("Centroid above the bottom, y_b", t.q(s.yBottom(), u.sectionLength())));
            props.add(new ReportModel.Row("I about the centroidal axis", t.q(s.inertia(), u.secondMoment())));
            props.add(new ReportModel.Row("c_top, c_bottom", t.q(s.cTop(), u.sectionLength()) + ", " + t.q(s.cBottom(), u.sectionLength())));
            props.add(new ReportModel.Row("S_top = I / c_top, S_bottom = I / c_bottom", t.q(s.sTop(), u.firstMoment()) + ", "
                    + t.q(s.sBottom(), u.firstMoment())));
            if (s.qNeutral() != null) {
                props.add(new ReportModel.Row("Q at the neutral axis, width t there", t.q(s.qNeutral(), u.firstMoment()) + ", "
                        + (s.tNeutral() == null ? "not given" : t.q(s.tNeutral(), u.sectionLength()))));
            }
            for (SectionProperties.Junction j : s.junctions()) {
                props.add(new ReportModel.Row("Q at the junction " + t.q(j.height(), u.sectionLength()) + " above the bottom, width",
                        t.q(Math.abs(j.q()), u.firstMoment()) + ", " + t.q(j.width(), u.sectionLength())));
            }
            List<List<String>> parts = new ArrayList<>();
            double sumA = 0;
            double sumAy = 0;
            double sumI = 0;
            for (SectionProperties.Part p : s.parts()) {
                // A·d² of a part centred on the axis is zero; its round-off is printed as such
                double transfer = RoundOff.clean(p.transferInertia(), s.inertia());
                parts.add(List.of(t.plain(p.b(), u.sectionLength()) + " × " + t.plain(p.h(), u.sectionLength()),
                        t.plain(p.area(), u.area()), t.plain(p.centroid(), u.sectionLength()), t.plain(p.area() * p.centroid(), u.firstMoment()),
                        t.plain(p.ownInertia(), u.secondMoment()), t.plain(transfer, u.secondMoment())));
                sumA += p.area();
                sumAy += p.area() * p.centroid();
                sumI += p.ownInertia() + p.transferInertia();
            }
            if (!parts.isEmpty()) {
                parts.add(List.of("Sum", t.plain(sumA, u.area()), "y_b = ΣAy/ΣA = " + t.plain(sumAy / sumA, u.sectionLength()),
                        t.plain(sumAy, u.firstMoment()), "I = Σ(I_own + A·d²)", t.plain(sumI, u.secondMoment())));
            }
            String l = Texts.symbol(u.sectionLength());
            ReportModel.Table table = new ReportModel.Table(List.of("Plate b × h (" + l + ")", "A (" + Texts.symbol(u.area()) + ")",
                    "y (" + l + ")", "A·y (" + Texts.symbol(u.firstMoment()) + ")", "I_own = b·h³/12 (" + Texts.symbol(u.secondMoment()) + ")",
                    "A·d² (" + Texts.symbol(u.secondMoment()) + ")"), parts);
            sheets.add(new ReportModel.SectionSheet(e.getKey(), props, table));
        }
        return new ReportModel.Stresses(sheets, equations());
    }

    private List<ReportModel.Equation> equations() {
        List<ReportModel.Equation> out = new ArrayList<>();
        for (org.beamfolio.derivation.Step step : org.beamfolio.derivation.StressSteps.of(result)) {
            out.add(new ReportModel.Equation(step.statement(), step.symbolic(), step.substituted(), step.result(), step.source()));
        }
        return out;
    }
}
