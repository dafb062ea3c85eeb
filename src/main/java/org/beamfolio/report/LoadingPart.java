package org.beamfolio.report;

import org.beamfolio.units.Numbers;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.model.Hinge;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Material;
import org.beamfolio.model.Support;
import org.beamfolio.model.SupportKind;
import org.beamfolio.report.drawing.BeamSketch;
import org.beamfolio.report.drawing.Drawing;
import org.beamfolio.report.drawing.LoadingDiagram;

/** The loading sheet: the beam, its supports, a to-scale diagram per load case, loads and combinations. */
final class LoadingPart {
    private final AnalysisResult result;
    private final Texts t;
    private final Map<String, Drawing> drawings;

    LoadingPart(AnalysisResult result, Texts t, Map<String, Drawing> drawings) {
        this.result = result;
        this.t = t;
        this.drawings = drawings;
    }

    ReportModel.Loading build() {
        Job job = result.job();
        List<ReportModel.Figure> figures = new ArrayList<>();
        Set<String> cases = new LinkedHashSet<>();
        result.loads().forEach(l -> cases.add(l.loadCase()));
        int i = 0;
        for (String c : cases) {
            String id = "loading-" + i++;
            drawings.put(id, new LoadingDiagram(sketch(c)));
            String description = job.cases().getOrDefault(c, "");
            figures.add(new ReportModel.Figure(id, "Case " + c + (description.isEmpty() ? "" : " (" + description + ")"), "40mm"));
        }
        List<List<String>> combos = new ArrayList<>();
        for (CombinationResult c : result.combinations()) {
            if (c.arrangement().isEmpty()) {
                List<String> factors = new ArrayList<>();
                c.factors().forEach((k, v) -> factors.add(Numbers.format(v) + " × " + k));
                combos.add(List.of(c.name(), String.join(" + ", factors), c.reference()));
            }
        }
        List<String> pattern = new ArrayList<>();
        if (!job.pattern().isEmpty()) {
            long arrangements = result.combinations().stream().filter(c -> !c.arrangement().isEmpty()).count();
            pattern.add("Pattern loading: case " + String.join(", ", job.pattern()) + " is also applied region by region ("
                    + String.join("; ", result.spans().stream().map(s -> s.label() + " " + t.len(s.from()) + " to " + t.len(s.to())).toList())
                    + "), giving " + arrangements + " further arrangements, all included in the envelope and the reactions;"
                    + " a deflection check naming a pattern case is made under each arrangement as well.");
        }
        return new ReportModel.Loading(beamRows(), supports(), figures, loads(), result.combinationSource(),
                new ReportModel.Table(List.of("Combination", "Factors", "Source"), combos), result.droppedCombinations(), pattern);
    }

    private BeamSketch sketch(String loadCase) {
        Job job = result.job();
        List<BeamSketch.SupportMark> supports = new ArrayList<>();
        for (Support s : job.beam().supports()) {
            BeamSketch.SupportKind kind = s.kind() instanceof SupportKind.Pin ? BeamSketch.SupportKind.PIN
                    : s.kind() instanceof SupportKind.Roller ? BeamSketch.SupportKind.ROLLER
                    : s.kind() instanceof SupportKind.Fixed ? BeamSketch.SupportKind.FIXED : BeamSketch.SupportKind.SPRING;
            supports.add(new BeamSketch.SupportMark(s.at(), kind, t.len(s.at())));
        }
        List<BeamSketch.LoadMark> loads = new ArrayList<>();
        for (Load load : result.loads()) {
            if (!load.loadCase().equals(loadCase)) {
                continue;
            }
            if (load instanceof Load.Point p) {
                loads.add(new BeamSketch.LoadMark(BeamSketch.LoadMark.Kind.POINT, p.at(), p.at(), p.P(), p.P(), t.force(p.P())));
            } else if (load instanceof Load.Couple c) {
                loads.add(new BeamSketch.LoadMark(c.M() >= 0 ? BeamSketch.LoadMark.Kind.COUPLE_CCW : BeamSketch.LoadMark.Kind.COUPLE_CW,
                        c.at(), c.at(), c.M(), c.M(), t.moment(Math.abs(c.M()))));
            } else if (load instanceof Load.Distributed d) {
                String label = d.uniform() || d.wStart() == d.wEnd() ? t.q(d.wStart(), t.units().distributed())
                        : t.q(d.wStart(), t.units().distributed()) + " to " + t.q(d.wEnd(), t.units().distributed());
                loads.add(new BeamSketch.LoadMark(BeamSketch.LoadMark.Kind.LINE, d.from(), d.to(), d.wStart(), d.wEnd(), label));
            }
        }
        return new BeamSketch(job.beam().length(), supports, job.beam().hinges().stream().map(Hinge::at).toList(), loads,
                "L = " + t.len(job.beam().length()));
    }

    private List<ReportModel.Row> beamRows() {
        Job job = result.job();
        List<ReportModel.Row> rows = new ArrayList<>();
        rows.add(new ReportModel.Row("Length", t.len(job.beam().length())));
        rows.add(new ReportModel.Row("Regions", String.join("; ", result.spans().stream().map(s -> s.label() + ", " + t.len(s.to() - s.from())).toList())));
        Material m = job.materials().get(job.beam().material());
        rows.add(new ReportModel.Row("Section and material", job.beam().section() + ", " + m.id()));
        for (var s : job.beam().segments()) {
            rows.add(new ReportModel.Row("Segment", t.len(s.from()) + " to " + t.len(s.to()) + ": section " + s.section()
                    + ", material " + s.material()));
        }
        List<String> hinges = job.beam().hinges().stream().map(Hinge::at).map(t::len).toList();
        rows.add(new ReportModel.Row("Internal hinges", hinges.isEmpty() ? "none" : String.join(", ", hinges)));
        if (job.beam().selfWeightCase() != null) {
            boolean catalogued = job.sections().values().stream().anyMatch(x -> x.shape() instanceof org.beamfolio.model.SectionShape.Catalogued);
            rows.add(new ReportModel.Row("Self weight", (catalogued ? "catalogue shapes: the tabulated nominal weight per length W;"
                    + " other sections: " : "") + "density × area, added to case " + job.beam().selfWeightCase()));
        }
        return rows;
    }

    private ReportModel.Table supports() {
        List<List<String>> rows = new ArrayList<>();
        for (Support s : result.job().beam().supports()) {
            String detail = switch (s.kind().label()) {
                case "pin" -> "restrains vertical and horizontal movement";
                case "roller" -> "restrains vertical movement";
                case "fixed" -> "restrains movement and rotation";
                default -> "";
            };
            if (s.kind() instanceof SupportKind.Spring sp) {
                detail = "vertical k = " + t.q(sp.k(), t.units().stiffness())
                        + (sp.kr() > 0 ? ", rotational kr = " + t.q(sp.kr(), t.units().rotationalStiffness()) : "");
            }
            rows.add(List.of(t.len(s.at()), s.kind().label(), detail));
        }
        return new ReportModel.Table(List.of("At", "Support", "Restraint"), rows);
    }

    private ReportModel.Table loads() {
        List<List<String>> rows = new ArrayList<>();
        for (Load load : result.loads()) {
            if (load instanceof Load.Point p) {
                rows.add(List.of(p.loadCase(), "point", "P = " + t.force(p.P()), "at " + t.len(p.at()), p.note()));
            } else if (load instanceof Load.Couple c) {
                rows.add(List.of(c.loadCase(), "couple", "M = " + t.moment(Math.abs(c.M())) + (c.M() >= 0 ? " ccw" : " cw"),
                        "at " + t.len(c.at()), c.note()));
            } else if (load instanceof Load.Distributed d) {
                String w = d.uniform() ? "w = " + t.q(d.wStart(), t.units().distributed())
                        : "w = " + t.q(d.wStart(), t.units().distributed()) + " to " + t.q(d.wEnd(), t.units().distributed());
                rows.add(List.of(d.loadCase(), d.uniform() ? "uniform" : "linear", w, t.len(d.from()) + " to " + t.len(d.to()), d.note()));
            }
        }
        return new ReportModel.Table(List.of("Case", "Type", "Magnitude", "Where", "Note"), rows);
    }
}
