package org.beamfolio.report;

import static org.beamfolio.units.RoundOff.clean;

import org.beamfolio.units.Numbers;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Response;
import org.beamfolio.derivation.Derivation;
import org.beamfolio.derivation.Derivations;
import org.beamfolio.derivation.FactoredLoads;
import org.beamfolio.derivation.Step;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;
import org.beamfolio.report.drawing.Chart;
import org.beamfolio.report.drawing.Drawing;
import org.beamfolio.units.Unit;

/** The analysis sheets of the governing combinations, and the envelope sheet. */
final class CombinationPart {
    private final AnalysisResult result;
    private final Texts t;
    private final Map<String, Drawing> drawings;

    CombinationPart(AnalysisResult result, Texts t, Map<String, Drawing> drawings) {
        this.result = result;
        this.t = t;
        this.drawings = drawings;
    }

    List<ReportModel.CombinationSheet> sheets(List<CombinationResult> governing) {
        List<ReportModel.CombinationSheet> sheets = new ArrayList<>();
        int i = 0;
        for (CombinationResult c : governing) {
            String id = "combination-" + i++;
            Derivation d = Derivations.of(result, c);
            List<ReportModel.NumberedStep> numbered = new ArrayList<>();
            for (Step s : d.steps()) {
                numbered.add(new ReportModel.NumberedStep(Integer.toString(s.number()), s.statement(), s.symbolic(), s.substituted(),
                        s.result(), s.source(), s.uses().isEmpty() ? "" : "uses step " + String.join(", ",
                        s.uses().stream().map(String::valueOf).toList())));
            }
            sheets.add(new ReportModel.CombinationSheet(id, c.name(), governs(c), reactions(c.response()), equilibrium(c),
                    figures(id, c), keyPoints(c.response()), d.method(), numbered,
                    d.tables().stream().map(t -> new ReportModel.TitledTable(t.title(), new ReportModel.Table(t.header(), t.rows()))).toList()));
        }
        return sheets;
    }

    private String governs(CombinationResult c) {
        List<String> what = new ArrayList<>();
        Extremes e = result.envelope();
        if (e.momentMax().value() > 0 && c.name().equals(e.momentMax().combination())) {
            what.add("largest sagging moment");
        }
        if (e.momentMin().value() < 0 && c.name().equals(e.momentMin().combination())) {
            what.add("largest hogging moment");
        }
        Extreme shear = Math.abs(e.shearMax().value()) >= Math.abs(e.shearMin().value()) ? e.shearMax() : e.shearMin();
        if (c.name().equals(shear.combination())) {
            what.add("largest shear");
        }
        Extreme deflection = Math.abs(e.deflectionMax().value()) >= Math.abs(e.deflectionMin().value())
                ? e.deflectionMax() : e.deflectionMin();
        if (c.name().equals(deflection.combination())) {
            what.add("largest deflection");
        }
        return what.isEmpty() ? "governs a check (see Checks)" : "Governs the " + String.join(", the ", what) + ".";
    }

    private ReportModel.Table reactions(Response r) {
        List<List<String>> rows = new ArrayList<>();
        List<Support> supports = result.job().beam().supports();
        for (int i = 0; i < supports.size(); i++) {
            boolean moment = r.reactionMoment()[i] != 0 || supports.get(i).kind().label().equals("fixed");
            rows.add(List.of("R" + (i + 1), supports.get(i).kind().label(), t.len(supports.get(i).at()),
                    t.force(r.reactionForce()[i]), moment ? t.moment(r.reactionMoment()[i]) : "-"));
        }
        return new ReportModel.Table(List.of("Reaction", "Support", "At", "Force (up +)", "Moment (ccw +)"), rows);
    }

    /** Factored total downward load and its moment about x = 0 (counter-clockwise positive), case by case. */
    private Map<String, double[]> factoredTotals(CombinationResult c) {
        Map<String, double[]> totals = new java.util.LinkedHashMap<>();
        for (Load load : FactoredLoads.of(result, c)) {
            double[] t = totals.computeIfAbsent(load.loadCase(), k -> new double[2]);
            t[0] += load.force();
            t[1] += -load.force() * load.centroid() + load.couple();
        }
        return totals;
    }

    /**
     * The independent equilibrium check of a combination: the reactions against the factored
     * applied loads, in force and in moment about x = 0, with the residual.
     */
    private List<ReportModel.Equation> equilibrium(CombinationResult c) {
        Response r = c.response();
        List<Support> supports = result.job().beam().supports();
        List<String> rNames = new ArrayList<>();
        List<String> rValues = new ArrayList<>();
        List<String> mTerms = new ArrayList<>();
        double sumR = 0;
        double sumRM = 0;
        double forceScale = 0;
        double momentScale = 0;
        for (int i = 0; i < supports.size(); i++) {
            rNames.add("R" + (i + 1));
            forceScale += Math.abs(r.reactionForce()[i]);
            rValues.add(t.force(r.reactionForce()[i]));
            sumR += r.reactionForce()[i];
            double m = r.reactionForce()[i] * supports.get(i).at() + r.reactionMoment()[i];
            sumRM += m;
            momentScale += Math.abs(m);
            mTerms.add("(" + t.force(r.reactionForce()[i]) + ")(" + t.len(supports.get(i).at()) + ")"
                    + (r.reactionMoment()[i] != 0 ? " + (" + t.moment(r.reactionMoment()[i]) + ")" : ""));
        }
        List<String> loadTerms = new ArrayList<>();
        List<String> loadMomentTerms = new ArrayList<>();
        double applied = 0;
        double appliedMoment = 0;
        String pattern = c.arrangement().isEmpty() ? "" : " (pattern case on " + c.arrangement() + " only)";
        for (Map.Entry<String, double[]> f : factoredTotals(c).entrySet()) {
            applied += f.getValue()[0];
            appliedMoment += f.getValue()[1];
            forceScale += Math.abs(f.getValue()[0]);
            momentScale += Math.abs(f.getValue()[1]);
            loadTerms.add(t.force(f.getValue()[0]) + " (" + f.getKey() + ")");
            loadMomentTerms.add("(" + t.moment(f.getValue()[1]) + ") (" + f.getKey() + ")");
        }
        double residualForce = clean(sumR - applied, forceScale);
        double residualMoment = clean(sumRM + appliedMoment, momentScale);
        List<ReportModel.Equation> out = new ArrayList<>();
        out.add(new ReportModel.Equation("Vertical equilibrium" + pattern, "ΣFy = Σ R − Σ combined loads = 0",
                String.join(" + ", rValues) + " − [" + String.join(" + ", loadTerms) + "] = " + t.force(sumR) + " − " + t.force(applied),
                "residual " + t.force(residualForce), "statics: sum of vertical forces"));
        out.add(new ReportModel.Equation("Moment equilibrium about x = 0 (ccw +)", "ΣM₀ = Σ R·x + Σ M_R + Σ M of the combined loads = 0",
                String.join(" + ", mTerms) + " + [" + String.join(" + ", loadMomentTerms) + "] = " + t.moment(sumRM) + " + ("
                        + t.moment(appliedMoment) + ")",
                "residual " + t.moment(residualMoment), "statics: sum of moments about the left end"));
        return out;
    }

    private List<ReportModel.Figure> figures(String id, CombinationResult c) {
        Response r = c.response();
        Unit x = t.units().length();
        String xLabel = "x (" + Texts.symbol(x) + ")";
        List<ReportModel.Figure> out = new ArrayList<>();
        drawings.put(id + "-shear", new Chart("V (" + Texts.symbol(t.units().force()) + ")", xLabel,
                List.of(Sampling.series("V", r.shear(), x, t.units().force())),
                marks(List.of(r.shear().max(), r.shear().min()), t.units().force()), false));
        out.add(new ReportModel.Figure(id + "-shear", "Shear, " + c.name(), "52mm"));
        drawings.put(id + "-moment", new Chart("M (" + Texts.symbol(t.units().moment()) + ")", xLabel,
                List.of(Sampling.series("M", r.moment(), x, t.units().moment())),
                marks(List.of(r.moment().max(), r.moment().min()), t.units().moment()), false));
        out.add(new ReportModel.Figure(id + "-moment", "Bending moment (sagging +), " + c.name(), "52mm"));
        drawings.put(id + "-deflection", new Chart("δ (" + Texts.symbol(t.units().deflection()) + ", down +)", xLabel,
                List.of(Sampling.series("δ", r.deflection(), x, t.units().deflection())),
                marks(List.of(r.deflection().max()), t.units().deflection()), true));
        out.add(new ReportModel.Figure(id + "-deflection", "Deflection (down +), " + c.name(), "46mm"));
        return out;
    }

    private List<Chart.Mark> marks(List<Extreme> extremes, Unit unit) {
        List<Chart.Mark> marks = new ArrayList<>();
        for (Extreme e : extremes) {
            if (e.value() != 0) {
                marks.add(new Chart.Mark(t.units().length().fromSi(e.at()), unit.fromSi(e.value()),
                        t.q(e.value(), unit) + " at " + t.len(e.at())));
            }
        }
        return marks;
    }

    /** Supports, hinges, load points and ends, and the points of zero shear inside an element (each from its root). */
    private ReportModel.Table keyPoints(Response r) {
        TreeSet<Double> xs = new TreeSet<>();
        double length = result.job().beam().length();
        xs.add(0.0);
        xs.add(length);
        result.job().beam().supports().forEach(s -> xs.add(s.at()));
        result.job().beam().hinges().forEach(h -> xs.add(h.at()));
        for (Load load : result.job().loads()) {
            xs.addAll(load.positions());
        }
        Field v = r.shear();
        TreeSet<Double> zeroShear = new TreeSet<>(v.zeroesInside());
        xs.addAll(zeroShear);
        List<List<String>> rows = new ArrayList<>();
        double vScale = scale(v);
        double mScale = scale(r.moment());
        double dScale = scale(r.deflection());
        for (double x : xs) {
            String vl = x == 0 ? "-" : t.force(clean(v.leftOf(x), vScale));
            String vr = x == length ? "-" : t.force(clean(v.at(x), vScale));
            // both sides of a jump: a couple makes the moment jump as a point load makes the shear jump
            String ml = x == 0 ? "-" : t.moment(clean(r.moment().leftOf(x), mScale));
            String mr = x == length ? "-" : t.moment(clean(r.moment().at(x), mScale));
            rows.add(List.of(t.len(x), vl, vr, ml, mr,
                    t.deflection(clean(r.deflection().at(x), dScale)), zeroShear.contains(x) ? "zero shear" : ""));
        }
        if (rows.size() > 40) {
            rows = rows.subList(0, 40);
        }
        return new ReportModel.Table(List.of("x", "V left", "V right", "M left", "M right", "Deflection", "Note"), rows);
    }

    private static double scale(Field f) {
        return Math.max(Math.abs(f.max().value()), Math.abs(f.min().value()));
    }

    /** The equilibrium check of every combination and arrangement, one row each. */
    private ReportModel.Table everyEquilibrium() {
        List<List<String>> rows = new ArrayList<>();
        List<Support> supports = result.job().beam().supports();
        for (CombinationResult c : result.combinations()) {
            if (rows.size() == 200) {
                rows.add(List.of("(" + (result.combinations().size() - 200) + " more, each checked the same way)", "", "", "", ""));
                break;
            }
            double sumR = 0;
            double sumM = 0;
            double forceScale = 0;
            double momentScale = 0;
            for (int i = 0; i < supports.size(); i++) {
                double m = c.response().reactionForce()[i] * supports.get(i).at() + c.response().reactionMoment()[i];
                sumR += c.response().reactionForce()[i];
                sumM += m;
                forceScale += Math.abs(c.response().reactionForce()[i]);
                momentScale += Math.abs(m);
            }
            double applied = 0;
            double appliedMoment = 0;
            for (double[] v : factoredTotals(c).values()) {
                applied += v[0];
                appliedMoment += v[1];
                forceScale += Math.abs(v[0]);
                momentScale += Math.abs(v[1]);
            }
            rows.add(List.of(c.name(), t.force(sumR), t.force(applied), t.force(clean(sumR - applied, forceScale)),
                    t.moment(clean(sumM + appliedMoment, momentScale))));
        }
        return new ReportModel.Table(List.of("Combination", "Σ R", "Σ combined loads", "Residual ΣFy", "Residual ΣM about x = 0"), rows);
    }

    ReportModel.Envelope envelope() {
        Extremes e = result.envelope();
        List<List<String>> rows = new ArrayList<>();
        rows.add(row("Shear V", e.shearMax(), e.shearMin(), t.units().force()));
        rows.add(row("Moment M (sagging +)", e.momentMax(), e.momentMin(), t.units().moment()));
        rows.add(row("Deflection (down +)", e.deflectionMax(), e.deflectionMin(), t.units().deflection()));
        rows.add(row("Top fibre stress (tension +)", e.stressTopMax(), e.stressTopMin(), t.units().stress()));
        rows.add(row("Bottom fibre stress (tension +)", e.stressBottomMax(), e.stressBottomMin(), t.units().stress()));
        if (e.shearStressMax() != null) {
            rows.add(List.of("Shear stress, largest", t.stress(e.shearStressMax().value()), t.len(e.shearStressMax().at()),
                    e.shearStressMax().combination(), "", "", ""));
        }
        Unit x = t.units().length();
        String xLabel = "x (" + Texts.symbol(x) + ")";
        List<Field> shear = result.combinations().stream().map(c -> c.response().shear()).toList();
        List<Field> moment = result.combinations().stream().map(c -> c.response().moment()).toList();
        List<Field> deflection = result.combinations().stream().map(c -> c.response().deflection()).toList();
        drawings.put("envelope-shear", new Chart("V (" + Texts.symbol(t.units().force()) + ")", xLabel,
                List.of(Sampling.envelope("largest", shear, 1, x, t.units().force()), Sampling.envelope("smallest", shear, -1, x, t.units().force())),
                marks(List.of(e.shearMax(), e.shearMin()), t.units().force()), false));
        drawings.put("envelope-moment", new Chart("M (" + Texts.symbol(t.units().moment()) + ")", xLabel,
                List.of(Sampling.envelope("largest", moment, 1, x, t.units().moment()), Sampling.envelope("smallest", moment, -1, x, t.units().moment())),
                marks(List.of(e.momentMax(), e.momentMin()), t.units().moment()), false));
        drawings.put("envelope-deflection", new Chart("δ (" + Texts.symbol(t.units().deflection()) + ", down +)", xLabel,
                List.of(Sampling.envelope("largest", deflection, 1, x, t.units().deflection()), Sampling.envelope("smallest", deflection, -1, x, t.units().deflection())),
                marks(List.of(e.deflectionMax()), t.units().deflection()), true));
        List<ReportModel.Figure> figures = List.of(
                new ReportModel.Figure("envelope-shear", "Shear envelope", "50mm"),
                new ReportModel.Figure("envelope-moment", "Moment envelope", "50mm"),
                new ReportModel.Figure("envelope-deflection", "Deflection envelope", "46mm"));
        int arrangements = (int) result.combinations().stream().filter(c -> !c.arrangement().isEmpty()).count();
        return new ReportModel.Envelope(new ReportModel.Table(List.of("Quantity", "Largest", "At", "Combination", "Smallest", "At",
                "Combination"), rows), figures, arrangements, everyEquilibrium());
    }

    private List<String> row(String label, Extreme max, Extreme min, Unit unit) {
        return List.of(label, t.q(max.value(), unit), t.len(max.at()), max.combination(), t.q(min.value(), unit), t.len(min.at()),
                min.combination());
    }
}
