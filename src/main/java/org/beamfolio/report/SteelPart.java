package org.beamfolio.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.catalogue.ShapeCatalogue;
import org.beamfolio.catalogue.ShapeProperty;
import org.beamfolio.catalogue.SteelGrade;
import org.beamfolio.design.steel.Equation;
import org.beamfolio.design.steel.LimitStateResult;
import org.beamfolio.design.steel.Method;
import org.beamfolio.design.steel.Slenderness;
import org.beamfolio.design.steel.SteelDesignWork;
import org.beamfolio.design.steel.SteelMember;
import org.beamfolio.design.steel.Strength;
import org.beamfolio.design.steel.Value;
import org.beamfolio.model.Material;
import org.beamfolio.units.Numbers;
import org.beamfolio.units.Units;

/**
 * The steel design sheet: the catalogue row and the steel used, the compactness of the elements,
 * every unbraced segment with Lb, Cb and Mn under the combination that governs it, the governing
 * segment's limit states worked with their equations and numbers, shear, and web bearing. It reads
 * the one {@link SteelDesignWork} the checks read.
 */
final class SteelPart {
    private final AnalysisResult result;
    private final Texts t;
    private final boolean si;

    SteelPart(AnalysisResult result, Texts t) {
        this.result = result;
        this.t = t;
        this.si = result.job().report().units() == org.beamfolio.units.UnitSystem.SI;
    }

    /** The sheet, or null when the job asks for no steel design. */
    ReportModel.SteelSheet build() {
        SteelDesignWork work = SteelDesignWork.of(result);
        if (work == null) {
            return null;
        }
        SteelMember m = work.member();
        String method = work.method() == Method.LRFD ? "LRFD (phi Rn)" : "ASD (Rn / Omega)";
        String title = "Steel design: " + m.shape().designation() + " to " + m.edition().label() + ", " + method;
        List<SteelDesignWork.FlexureRow> segments = work.governingPerSegment();
        SteelDesignWork.FlexureRow governing = segments.stream()
                .max(Comparator.comparingDouble(SteelDesignWork.FlexureRow::ratio)).orElse(null);
        List<ReportModel.Equation> flexure = new ArrayList<>();
        String flexureNote = "";
        if (governing != null) {
            var seg = governing.segment();
            flexureNote = "Governing segment: " + seg.flange().label() + " flange from " + t.len(seg.from()) + " to "
                    + t.len(seg.to()) + " under " + governing.combination().name() + ". Every limit state of "
                    + governing.strength().section().reference() + " evaluated; the least nominal strength governs.";
            flexure.add(equation("Lateral-torsional buckling modification factor", governing.gradient().equation(),
                    org.beamfolio.design.steel.MomentGradient.clause(m.edition()).reference()));
            flexure.addAll(limitStates(governing.strength()));
            flexure.add(available("Available flexural strength", governing.strength(), work.method(), governing.demand(),
                    governing.available(), governing.ratio(), true));
        }
        SteelDesignWork.ShearRow shear = work.shear().stream()
                .max(Comparator.comparingDouble(SteelDesignWork.ShearRow::ratio)).orElse(null);
        List<ReportModel.Equation> shearEqs = new ArrayList<>();
        if (shear != null) {
            shearEqs.addAll(limitStates(shear.strength()));
            shearEqs.add(available("Available shear strength, under " + shear.combination().name() + " at "
                    + t.len(shear.demand().at()), shear.strength(), work.method(), Math.abs(shear.demand().value()),
                    shear.available(), shear.ratio(), false));
        }
        List<ReportModel.Equation> bearing = new ArrayList<>();
        Map<String, SteelDesignWork.BearingRow> worst = new java.util.LinkedHashMap<>();
        for (SteelDesignWork.BearingRow row : work.bearing()) {
            worst.merge(row.support() + ":" + row.index() + row.strength().kind(), row, (a, b) -> b.ratio() > a.ratio() ? b : a);
        }
        for (SteelDesignWork.BearingRow row : worst.values()) {
            bearing.addAll(limitStates(row.strength()));
            String place = row.support() ? "Support " + (row.index() + 1) + " at " + t.len(row.at()) + ", largest reaction"
                    : "Point loads at " + t.len(row.at()) + ", their largest sum";
            bearing.add(available(place + " under " + row.combination().name(), row.strength(), work.method(), row.force(),
                    row.available(), row.ratio(), false));
        }
        return new ReportModel.SteelSheet(title, member(m), catalogueRow(m), compactness(m), segmentTable(segments),
                flexureNote, flexure, shearEqs, bearing);
    }

    private List<ReportModel.Row> member(SteelMember m) {
        Material material = result.job().materials().get(result.job().beam().material());
        String grade = material.grade() == null ? "not named" : material.grade() + " ("
                + SteelGrade.find(material.grade()).map(SteelGrade::standard).orElse("") + ")";
        List<ReportModel.Row> rows = new ArrayList<>();
        rows.add(new ReportModel.Row("Shape", m.shape().designation() + " (metric " + m.shape().metricDesignation()
                + "), section " + result.job().beam().section()));
        rows.add(new ReportModel.Row("Source of the properties", ShapeCatalogue.SOURCE + ", tabulated values as printed below"));
        rows.add(new ReportModel.Row("Material", material.id() + ", grade " + grade));
        rows.add(new ReportModel.Row("Fy, Fu, E", value(Value.of("Fy", m.fy(), org.beamfolio.design.steel.Kind.STRESS))
                + (material.yieldStress() != null ? " (given)" : " (of the grade)") + ", "
                + value(Value.of("Fu", m.fu(), org.beamfolio.design.steel.Kind.STRESS)) + ", "
                + value(Value.of("E", m.e(), org.beamfolio.design.steel.Kind.STRESS))));
        rows.add(new ReportModel.Row("Specification", m.edition().label() + ", Specification for Structural Steel Buildings"));
        rows.add(new ReportModel.Row("Bracing", "top flange: " + lateral(result.job().beam().bracing().top()) + "; bottom flange: "
                + lateral(result.job().beam().bracing().bottom()) + "; the supports brace both flanges against twist"));
        return rows;
    }

    private String lateral(org.beamfolio.model.Bracing.Lateral l) {
        if (l.continuous()) {
            return "braced continuously";
        }
        return l.points().isEmpty() ? "at the supports" : "at the supports and " + String.join(", ", l.points().stream().map(t::len).toList());
    }

    private ReportModel.Table catalogueRow(SteelMember m) {
        List<List<String>> rows = new ArrayList<>();
        for (Map.Entry<ShapeProperty, String> e : m.shape().row().entrySet()) {
            ShapeProperty p = e.getKey();
            String unit = p.lengthPower() < 0 ? "lb/ft" : p.lengthPower() == 0 ? "" : p.lengthPower() == 1 ? "in"
                    : "in" + superscript(p.lengthPower());
            rows.add(List.of(p.column(), p.description(), e.getValue() + (unit.isEmpty() ? "" : " " + unit)));
        }
        return new ReportModel.Table(List.of("Property", "What it is", "Tabulated"), rows);
    }

    private ReportModel.Table compactness(SteelMember m) {
        List<List<String>> rows = new ArrayList<>();
        for (Slenderness s : org.beamfolio.design.steel.Flexure.compactness(m)) {
            rows.add(List.of(s.element(), s.ratio(), Numbers.format(s.lambda()), Numbers.format(s.lambdaP()),
                    Numbers.format(s.lambdaR()), s.compactness().label(), "Table B4.1b case " + s.tableCase()));
        }
        return new ReportModel.Table(List.of("Element", "lambda", "Value", "lambda_p", "lambda_r", "Class", "Source"), rows);
    }

    private ReportModel.Table segmentTable(List<SteelDesignWork.FlexureRow> segments) {
        String l = Texts.symbol(t.units().length());
        String mu = si ? "kN·m" : "kip·ft";
        List<List<String>> rows = new ArrayList<>();
        for (SteelDesignWork.FlexureRow r : segments) {
            var seg = r.segment();
            var g = r.gradient();
            rows.add(List.of(seg.flange().label(), t.plain(seg.from(), t.units().length()), t.plain(seg.to(), t.units().length()),
                    seg.continuouslyBraced() ? "0 (continuous)" : t.plain(seg.lb(), t.units().length()) + (seg.freeEnd() ? " (free end)" : ""),
                    moment(g.mA()), moment(g.mB()), moment(g.mC()), moment(g.mMax()),
                    Numbers.format(r.strength().factors().get("Cb")), moment(r.strength().nominal()), moment(r.available()),
                    moment(r.demand()), Numbers.format(r.ratio()), r.strength().governing().limitState(), r.combination().name()));
        }
        return new ReportModel.Table(List.of("Flange", "From (" + l + ")", "To (" + l + ")", "Lb (" + l + ")", "MA (" + mu + ")",
                "MB", "MC", "Mmax", "Cb", "Mn", "Available", "Demand", "Ratio", "Governs", "Combination"), rows);
    }

    /** Every limit state of a strength with its equations, then a line saying which applies and governs. */
    private List<ReportModel.Equation> limitStates(Strength s) {
        List<ReportModel.Equation> out = new ArrayList<>();
        LimitStateResult governing = s.governing();
        for (LimitStateResult ls : s.evaluated()) {
            String status = !ls.applies() ? "does not apply" : ls == governing ? "governs" : "evaluated";
            String what = capitalised(ls.limitState()) + " (" + status + (ls.note().isEmpty() ? "" : "; " + ls.note()) + ")";
            List<Equation> eqs = ls.equations();
            for (int i = 0; i < eqs.size(); i++) {
                out.add(equation(i == 0 ? what : capitalised(ls.limitState()), eqs.get(i), ls.clause().reference()));
            }
        }
        return out;
    }

    private ReportModel.Equation available(String what, Strength s, Method method, double demand, double available,
                                           double ratio, boolean moment) {
        var r = s.resistance();
        String nominal = moment ? "Mn" : s.kind().equals("shear") ? "Vn" : "Rn";
        String symbolic = method == Method.LRFD ? "phi " + nominal + "; ratio = demand / (phi " + nominal + ")"
                : nominal + " / Omega; ratio = demand / (" + nominal + " / Omega)";
        String numbers = (method == Method.LRFD ? Numbers.format(r.phi()) + " × " + amount(s.nominal(), moment)
                : amount(s.nominal(), moment) + " / " + Numbers.format(r.omega())) + " = " + amount(available, moment)
                + "; ratio = " + amount(demand, moment) + " / " + amount(available, moment);
        if (moment && !si) {
            numbers += " (" + in(available, "kip*ft") + " available, " + in(demand, "kip*ft") + " required)";
        }
        return new ReportModel.Equation(what, symbolic, numbers, Numbers.format(ratio) + (ratio <= 1 ? " (meets)" : " (EXCEEDS)"),
                r.clause().reference() + (method == Method.LRFD ? ", phi = " + Numbers.format(r.phi())
                        : ", Omega = " + Numbers.format(r.omega())));
    }

    private ReportModel.Equation equation(String what, Equation e, String clause) {
        String result = e.result().symbol();
        String cap = e.cap() == null ? "" : " ≤ " + e.cap().symbol();
        String capNumbers = e.cap() == null ? "" : " ≤ " + value(e.cap());
        return new ReportModel.Equation(what, result + " = " + pretty(e.symbolic()) + cap,
                result + " = " + pretty(e.substituted(this::value)) + capNumbers, resultValue(e.result()),
                clause + source(e.number(), clause));
    }

    /** A value of a worked equation with its unit: in, in², ..., ksi, kip, kip·in (US) or mm, ..., MPa, kN, kN·m (SI). */
    private String value(Value v) {
        double x = v.value();
        return switch (v.kind()) {
            case NUMBER -> Numbers.format(x);
            case LENGTH -> in(x, si ? "mm" : "in");
            case AREA -> in(x, si ? "mm^2" : "in^2");
            case MODULUS -> in(x, si ? "mm^3" : "in^3");
            case INERTIA -> in(x, si ? "mm^4" : "in^4");
            case WARPING -> Numbers.format(x * Math.pow(Units.of(si ? "mm" : "in").fromSi(1), 6), si ? "mm⁶" : "in⁶");
            case STRESS -> in(x, si ? "MPa" : "ksi");
            case FORCE -> in(x, si ? "kN" : "kip");
            case MOMENT -> in(x, si ? "kN*m" : "kip*in");
        };
    }

    private static String in(double si, String unit) {
        return Numbers.format(Units.of(unit).fromSi(si), Texts.symbol(Units.of(unit)));
    }

    /** A result as printed: a US moment also in kip·ft, the unit of the checks. */
    private String resultValue(Value v) {
        return v.kind() == org.beamfolio.design.steel.Kind.MOMENT && !si ? value(v) + " = " + in(v.value(), "kip*ft") : value(v);
    }

    private String amount(double si, boolean moment) {
        return value(Value.of("", si, moment ? org.beamfolio.design.steel.Kind.MOMENT : org.beamfolio.design.steel.Kind.FORCE));
    }

    /** A moment in the sheet's table unit, kip·ft or kN·m, without the unit. */
    private String moment(double si) {
        return Numbers.format(Units.of(this.si ? "kN*m" : "kip*ft").fromSi(si));
    }

    /** {@code , Eq. F2-2} for an equation number; a clause or a remark as it is; nothing when it repeats the clause. */
    private static String source(String number, String clause) {
        if (number.isEmpty() || clause.endsWith(" " + number)) {
            return "";
        }
        return number.matches("[A-Z]\\d+-\\d+[a-z]?") ? ", Eq. " + number : ", " + number;
    }

    private static String pretty(String expression) {
        return expression.replace(" * ", " × ").replace("*", "×");
    }

    private static String superscript(int power) {
        return switch (power) {
            case 2 -> "²";
            case 3 -> "³";
            case 4 -> "⁴";
            case 6 -> "⁶";
            default -> "^" + power;
        };
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
