package org.beamfolio.report;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.timber.TimberBeamDesign;
import org.beamfolio.checks.timber.TimberDesignResult;
import org.beamfolio.design.timber.AdjustedValues;
import org.beamfolio.model.timber.Factor;
import org.beamfolio.model.timber.TimberKind;
import org.beamfolio.model.timber.TimberValues;
import org.beamfolio.model.TimberDesign;
import org.beamfolio.units.Numbers;

/**
 * The timber design sheet: the reference values with their source, every adjustment factor of
 * the governing bending check with its value and clause, Fb' worked out, and the combinations
 * one by one (demand, CD, adjusted value, ratio), so a reviewer sees why a combination with a
 * smaller moment can govern. Every number is {@link TimberBeamDesign}'s, the checks' own.
 */
final class TimberPart {
    private final AnalysisResult result;
    private final Texts t;

    TimberPart(AnalysisResult result, Texts t) {
        this.result = result;
        this.t = t;
    }

    /** The sheet, or null for a job without timber design. */
    ReportModel.Timber build() {
        TimberDesignResult d = TimberBeamDesign.of(result);
        if (d == null) {
            return null;
        }
        TimberDesign design = result.job().timber();
        TimberValues v = d.values();
        List<String> basis = new ArrayList<>();
        basis.add("National Design Specification for Wood Construction, 2018 edition (NDS 2018), allowable stress design; "
                + v.kind().label() + ", adjustment factors by " + v.kind().applicability() + ".");
        basis.add("Service: " + (design.service().wet() ? "wet" : "dry") + ", temperature " + design.service().temperature().range()
                + (design.service().repetitive() ? ", repetitive members" : "") + (design.service().incised() ? ", incised" : "") + ".");
        List<String> durations = new ArrayList<>();
        design.durations().forEach((c, dur) -> durations.add(c + ": " + dur.key().replace('_', ' ') + " (CD = "
                + Numbers.format(dur.factor()) + (design.given().contains(c) ? ", job file" : ", default") + ")"));
        basis.add("Load durations (NDS 2.3.2, Table 2.3.2): " + String.join("; ", durations)
                + ". Each combination takes the CD of its shortest-duration case.");
        basis.add("Deflections use E' = E CM Ct Ci = " + t.stress(d.modulus().value()) + ".");

        List<List<String>> reference = new ArrayList<>();
        reference.add(List.of("Fb", t.stress(v.fb()), v.kind() == TimberKind.GLULAM ? "bottom face in tension (Fbx+)" : "either face"));
        if (v.fbNegative() != null) {
            reference.add(List.of("Fb_neg", t.stress(v.fbNegative()), "top face in tension (Fbx-)"));
        }
        reference.add(List.of("Fv", t.stress(v.fv()), ""));
        reference.add(List.of("Fc_perp", t.stress(v.fcPerp()), ""));
        reference.add(List.of("E", t.stress(v.e()), ""));
        reference.add(List.of("Emin", t.stress(v.eMin()), ""));
        String source = v.source().isBlank() ? "Source: not stated in the job file." : "Source: " + v.source() + ".";

        TimberDesignResult.Bending g = d.governingBending();
        ReportModel.Table factors = null;
        List<ReportModel.Equation> worked = new ArrayList<>();
        if (g != null) {
            List<List<String>> rows = new ArrayList<>();
            for (Factor f : g.adjusted().factors()) {
                rows.add(List.of(f.symbol(), Numbers.format(f.value()), f.clause(), f.basis()));
            }
            factors = new ReportModel.Table(List.of("Factor", "Value", "Clause", "Basis"), rows);
            worked = fbPrime(g);
        }
        List<List<String>> bending = new ArrayList<>();
        for (TimberDesignResult.Bending b : d.bending()) {
            bending.add(List.of(b.combination(), b.durationCase() + ", " + b.cd().key().replace('_', ' '), Numbers.format(b.cd().factor()),
                    t.moment(b.moment()), t.len(b.at()), b.hogging() ? "top (Fb-)" : "bottom (Fb+)", t.stress(b.fb()),
                    t.stress(b.limit()), Numbers.format(b.ratio()), b == g ? "governs" : ""));
        }
        List<List<String>> shear = new ArrayList<>();
        TimberDesignResult.Shear gs = d.governingShear();
        for (TimberDesignResult.Shear s : d.shear()) {
            shear.add(List.of(s.combination(), Numbers.format(s.cd().factor()), t.force(Math.abs(s.v())), t.len(s.at()),
                    t.stress(s.fv()), t.stress(s.adjusted().value()), Numbers.format(s.ratio()), s == gs ? "governs" : ""));
        }
        List<List<String>> bearing = new ArrayList<>();
        for (TimberDesignResult.Bearing b : d.bearing()) {
            bearing.add(List.of("R" + b.support(), t.len(b.at()), t.force(b.reaction()), b.combination(),
                    t.q(b.b(), t.units().sectionLength()) + " x " + t.q(b.length(), t.units().sectionLength()),
                    t.stress(b.stress()), Numbers.format(b.adjusted().factors().get(0).value()), t.stress(b.adjusted().value()),
                    Numbers.format(b.ratio())));
        }
        List<List<String>> creep = new ArrayList<>();
        for (TimberDesignResult.LongTerm lt : d.deflection()) {
            creep.add(List.of(lt.limitCases(), lt.region(), Numbers.format(d.kcr().value()) + " x (" + String.join(" + ", lt.longTermCases())
                    + ")" + (lt.shortTermCases().isEmpty() ? "" : " + " + String.join(" + ", lt.shortTermCases())),
                    t.deflection(lt.deflection()), lt.limitText() + " = " + t.deflection(lt.allowed()), Numbers.format(lt.ratio())));
        }
        String shearNote = gs != null && gs.nearSupportsReduced()
                ? "fv = 1.5 V / A at the largest shear, V with the loads within d of the bearings' faces left out and concentrated"
                  + " loads there times x/d (NDS 3.4.3.1(a)); supports without a bearing length and the self weight keep every load."
                : "fv = 1.5 V / A at the largest shear; no support has a bearing length, so every load is kept (conservative).";
        return new ReportModel.Timber(basis, new ReportModel.Table(List.of("Reference value", "Value", "Note"), reference), source,
                factors, worked,
                new ReportModel.Table(List.of("Combination", "Shortest load", "CD", "M", "At", "Face in tension", "fb", "Fb'", "Ratio", ""), bending),
                new ReportModel.Table(List.of("Combination", "CD", "|V|", "At", "fv = 1.5 V / A", "Fv'", "Ratio", ""), shear),
                bearing.isEmpty() ? null : new ReportModel.Table(List.of("Support", "At", "Largest R", "Under", "b x lb", "fc_perp", "Cb",
                        "Fc_perp'", "Ratio"), bearing),
                creep.isEmpty() ? null : new ReportModel.Table(List.of("Limit on", "Region", "Deflection of", "delta_T", "Limit", "Ratio"), creep),
                shearNote, "Kcr = " + Numbers.format(d.kcr().value()) + " (" + d.kcr().basis() + ", " + d.kcr().clause()
                        + "): delta_T = Kcr delta_LT + delta_ST, the long-term part being the cases of permanent duration.");
    }

    /** The table of applicable factors for the product designed. */
    private String d(TimberDesignResult.Bending g) {
        return TimberBeamDesign.of(result).values().kind().applicability();
    }

    /** Fb' of the governing combination, step by step. */
    private List<ReportModel.Equation> fbPrime(TimberDesignResult.Bending g) {
        List<ReportModel.Equation> out = new ArrayList<>();
        AdjustedValues.Bending a = g.adjusted();
        StringBuilder symbols = new StringBuilder("Fb* = Fb");
        StringBuilder numbers = new StringBuilder(t.stress(a.reference()));
        for (Factor f : a.factors()) {
            if (!List.of("CL", "CV", "Cfu").contains(f.symbol())) {
                symbols.append(" ").append(f.symbol());
                numbers.append(" x ").append(Numbers.format(f.value()));
            }
        }
        out.add(new ReportModel.Equation("Fb for the face in tension times every factor but CL, CV and Cfu (" + g.combination() + ")",
                symbols.toString(), numbers.toString(), t.stress(a.fbStar()), "NDS 2018 3.3.3.8; factors by " + d(g)));
        if (g.le() != null) {
            double lu = g.segment().length();
            out.add(new ReportModel.Equation("Effective length of the unbraced segment " + t.len(g.segment().from()) + " to "
                    + t.len(g.segment().to()) + " (" + g.segment().bracedBy() + "); Table 3.3.3 row: " + g.row().description(),
                    g.le().equation(), "lu = " + t.q(lu, t.units().sectionLength()) + ", d = " + t.q(g.d(), t.units().sectionLength()),
                    t.q(g.le().le(), t.units().sectionLength()), "NDS 2018 3.3.3, Table 3.3.3"));
        }
        if (a.stability() != null) {
            out.add(new ReportModel.Equation("Slenderness ratio (not above 50)", "RB = sqrt(le d / b^2)",
                    "sqrt(" + t.q(g.le().le(), t.units().sectionLength()) + " x " + t.q(g.d(), t.units().sectionLength()) + " / ("
                            + t.q(g.b(), t.units().sectionLength()) + ")^2)", Numbers.format(a.stability().rb()), "NDS 2018 Eq. 3.3-5, 3.3.3.7"));
            out.add(new ReportModel.Equation("Critical buckling design value", "FbE = 1.20 Emin' / RB^2",
                    "1.20 x Emin' / " + Numbers.format(a.stability().rb()) + "^2", t.stress(a.stability().fbe()), "NDS 2018 3.3.3.8"));
            out.add(new ReportModel.Equation("Beam stability factor",
                    "CL = (1 + FbE/Fb*)/1.9 - sqrt(((1 + FbE/Fb*)/1.9)^2 - (FbE/Fb*)/0.95)",
                    "FbE/Fb* = " + t.stress(a.stability().fbe()) + " / " + t.stress(a.fbStar()), Numbers.format(a.factor("CL")),
                    "NDS 2018 Eq. 3.3-6"));
        }
        if (a.has("CV")) {
            Factor cv = a.factors().stream().filter(f -> f.symbol().equals("CV")).findFirst().orElseThrow();
            out.add(new ReportModel.Equation("Volume factor, L between points of zero moment from " + t.len(g.zeroMomentFrom()) + " to "
                    + t.len(g.zeroMomentTo()), "CV = (21/L)^(1/x) (12/d)^(1/x) (5.125/b)^(1/x) <= 1.0", cv.basis(),
                    Numbers.format(cv.value()), cv.clause()));
        }
        String stability = a.has("CV") ? "lesser of CL and CV = " + a.governingStability() : "CL";
        out.add(new ReportModel.Equation("Adjusted bending design value", "Fb' = Fb* x " + stability,
                t.stress(a.fbStar()) + " x " + Numbers.format(a.factor(a.governingStability())), t.stress(a.value()),
                d(g) + (a.has("CV") ? ", 5.3.6" : "")));
        out.add(new ReportModel.Equation("Bending stress at " + t.len(g.at()) + " under " + g.combination(), "fb = M / S, S = b d^2 / 6",
                t.moment(Math.abs(g.moment())) + " / " + t.q(g.s(), t.units().firstMoment()), t.stress(g.fb()) + " (ratio "
                + Numbers.format(g.ratio()) + ")", "NDS 2018 3.3.2"));
        return out;
    }
}
