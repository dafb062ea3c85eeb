package org.beamfolio.report;

import org.beamfolio.units.Numbers;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.model.DeflectionLimit;
import org.beamfolio.model.Job;
import org.beamfolio.model.Material;
import org.beamfolio.model.Project;
import org.beamfolio.report.drawing.Drawing;
import org.beamfolio.report.drawing.SignConventionSketch;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.results.Version;

/**
 * Gathers a solved job into the {@link ReportModel} and the drawings it refers to, converting to
 * the report's units once. Each part of the package has its own builder.
 */
final class ReportModelBuilder {
    /** The model and its drawings by id. */
    record Built(ReportModel model, Map<String, Drawing> drawings) {}

    /** The ids of the drawings the cover and the basis print. */
    static final String SIGN_CONVENTION = "sign-convention";
    static final String SEAL_BOX = "seal-box";

    private final AnalysisResult result;
    private final Texts t;
    private final Map<String, Drawing> drawings = new LinkedHashMap<>();

    ReportModelBuilder(AnalysisResult result) {
        this.result = result;
        this.t = new Texts(ReportUnits.of(result.job().report().units()), result.job().report().positions());
    }

    Built build(List<CheckOutcome> checks) {
        return build(checks, null);
    }

    /** With a previous revision of the job (or null), the package gets a revision-delta sheet. */
    Built build(List<CheckOutcome> checks, PreviousRevision previous) {
        Job job = result.job();
        Project p = job.project();
        ReportModel.Sheet sheet = new ReportModel.Sheet(p.title(), p.number(), p.subject(), p.revision(), p.preparedBy(),
                p.date(), p.checkedBy(), p.client(), p.location(), job.report().paper().name().toLowerCase(Locale.ROOT),
                Version.get(), job.name() + ".yaml");
        drawings.put(SIGN_CONVENTION, new SignConventionSketch());
        drawings.put(SEAL_BOX, new org.beamfolio.report.drawing.SealBox());
        LoadingPart loading = new LoadingPart(result, t, drawings);
        List<ReportModel.CombinationSheet> analyses = new CombinationPart(result, t, drawings).sheets(governing(checks));
        ReportModel.Envelope envelope = new CombinationPart(result, t, drawings).envelope();
        ReportModel.Stresses stresses = new StressPart(result, t).build();
        ReportModel.Revision revision = previous == null ? null
                : new RevisionPart(result, checks, previous.result(), previous.checks(), previous.inputs(), t).build();
        ReportModel.SteelSheet steel = new SteelPart(result, t).build();
        ReportModel model = new ReportModel(sheet, cover(checks, analyses, revision != null, steel != null), revision, basis(),
                loading.build(), analyses, envelope, new ReactionsPart(result, t).build(), stresses, checks(checks), cautions(),
                reviewChecklist(), history(), appendix(), new TakeOffPart(job.takeOff(), job.report().units(), t).build(), steel,
                new TimberPart(result, t).build(), new SelectionPart(job, t).build());
        return new Built(model, drawings);
    }

    /** The combinations that give an envelope extreme or govern a check, in the order they were formed. */
    private List<CombinationResult> governing(List<CheckOutcome> checks) {
        Set<String> names = new LinkedHashSet<>();
        Extremes e = result.envelope();
        if (e != null) {
            // an extreme of zero (no sagging on a cantilever) is a tie that every combination shares
            if (e.momentMax().value() > 0) {
                names.add(e.momentMax().combination());
            }
            if (e.momentMin().value() < 0) {
                names.add(e.momentMin().combination());
            }
            names.add(Math.abs(e.shearMax().value()) >= Math.abs(e.shearMin().value())
                    ? e.shearMax().combination() : e.shearMin().combination());
            names.add(Math.abs(e.deflectionMax().value()) >= Math.abs(e.deflectionMin().value())
                    ? e.deflectionMax().combination() : e.deflectionMin().combination());
        }
        for (CheckOutcome c : checks) {
            names.add(c.combination());
        }
        List<CombinationResult> out = new ArrayList<>();
        for (CombinationResult c : result.combinations()) {
            if (names.contains(c.name()) && out.size() < 4) {
                out.add(c);
            }
        }
        return out;
    }

    private ReportModel.Cover cover(List<CheckOutcome> checks, List<ReportModel.CombinationSheet> analyses, boolean revision,
                                    boolean steel) {
        Job job = result.job();
        long spans = result.spans().stream().filter(s -> !s.overhang()).count();
        String layout = result.spans().stream().anyMatch(s -> s.label().contains("cantilever")) ? "cantilever"
                : (spans == 1 ? "single-span" : spans + "-span continuous")
                        + (result.spans().stream().anyMatch(s -> s.label().contains("overhang")) ? " beam with overhang" : " beam");
        String scope = "Linear elastic analysis of the " + layout + " described below (" + t.len(job.beam().length())
                + " long) for reactions, shear, moment, deflection and bending and shear stresses under "
                + result.combinations().size() + " load combinations and arrangements, with "
                + (checks.isEmpty() ? "no limit checks requested." : checks.size() + " checks against the stated limits.");
        List<ReportModel.Row> contents = new ArrayList<>();
        if (revision) {
            contents.add(new ReportModel.Row("Changes since the previous revision", "revision"));
        }
        contents.add(new ReportModel.Row("Design basis", "basis"));
        contents.add(new ReportModel.Row("Loading", "loading"));
        for (ReportModel.CombinationSheet s : analyses) {
            contents.add(new ReportModel.Row("Analysis: " + s.name(), s.anchor()));
        }
        contents.add(new ReportModel.Row("Envelope over all combinations", "envelope"));
        contents.add(new ReportModel.Row("Reactions for the supporting structure", "reactions"));
        contents.add(new ReportModel.Row("Section properties and stresses", "stresses"));
        if (SelectionPart.chosenSection(result.job()) != null) {
            contents.add(new ReportModel.Row("Choosing section " + SelectionPart.chosenSection(result.job()).id(), "selection"));
        }
        if (steel) {
            contents.add(new ReportModel.Row("Steel design", "steel"));
        }
        if (result.job().timber() != null) {
            contents.add(new ReportModel.Row("Timber design to the NDS", "timber"));
        }
        contents.add(new ReportModel.Row("Checks and summary", "checks"));
        contents.add(new ReportModel.Row("Cautions", "cautions"));
        contents.add(new ReportModel.Row("Reviewer sign-off", "review"));
        contents.add(new ReportModel.Row("Revision history", "history"));
        contents.add(new ReportModel.Row("Appendix: job file", "appendix"));
        return new ReportModel.Cover(scope, contents);
    }

    private ReportModel.Basis basis() {
        Job job = result.job();
        List<String> codes = new ArrayList<>();
        codes.add("Load combinations: " + result.combinationSource() + ".");
        if (job.steelDesign() != null) {
            codes.add("Steel: " + org.beamfolio.design.steel.Edition.find(job.steelDesign().specification()).orElseThrow().label()
                    + ", Specification for Structural Steel Buildings, " + (job.steelDesign().lrfd() ? "LRFD" : "ASD")
                    + "; shape properties from the " + org.beamfolio.catalogue.ShapeCatalogue.SOURCE + ".");
        }
        boolean springs = job.beam().supports().stream().anyMatch(s -> s.kind() instanceof org.beamfolio.model.SupportKind.Spring);
        for (DeflectionLimit d : job.deflectionLimits()) {
            String cases = String.join(" + ", d.cases());
            codes.add("Deflection under " + cases + ": " + (d.spanRatio() != null
                    ? "span/" + Numbers.format(d.spanRatio()) + " (twice the length for an overhang or cantilever)"
                    : "at most " + t.deflection(d.maximum())) + ", as set by the engineer from the governing code"
                    + (springs ? (d.relative() ? "; measured from the line between the supports' movements (the springs' settlement taken out)"
                    : "; absolute deflection, the springs' settlement included") : "") + ".");
        }
        for (Material m : job.materials().values()) {
            if (!m.source().isBlank()) {
                codes.add("Material " + m.id() + ": " + m.source() + ".");
            }
        }
        codes.add("Governing building code and local amendments: as adopted by the authority having jurisdiction.");
        ReportUnits u = t.units();
        List<ReportModel.Row> units = List.of(
                new ReportModel.Row("Positions and lengths", Texts.symbol(u.length())),
                new ReportModel.Row("Forces, reactions, shear", Texts.symbol(u.force())),
                new ReportModel.Row("Moments", Texts.symbol(u.moment())),
                new ReportModel.Row("Line loads", Texts.symbol(u.distributed())),
                new ReportModel.Row("Stresses", Texts.symbol(u.stress())),
                new ReportModel.Row("Deflection", Texts.symbol(u.deflection())),
                new ReportModel.Row("Section properties", Texts.symbol(u.sectionLength()) + ", " + Texts.symbol(u.area()) + ", "
                        + Texts.symbol(u.firstMoment()) + ", " + Texts.symbol(u.secondMoment())));
        List<String> conventions = List.of(
                "x runs from the left end of the beam (x = 0) to the right end.",
                "Loads act downward when positive; an upward load is negative. Couples are clockwise or counter-clockwise as drawn, x to the right and up on the page.",
                "Reactions are positive upward; support moments positive counter-clockwise.",
                "Bending moment is positive when sagging (tension in the bottom fibre); shear is positive when the part left of a cut is pushed up.",
                "Deflection is positive downward; stress is positive in tension.");
        List<String> method = List.of(
                "Linear elastic analysis with small deflections; plane sections remain plane (Euler-Bernoulli beam theory); shear deformation is neglected.",
                "Direct stiffness method, with a node at every support, hinge, load point, load end and change of section or material. Within each element EI is constant and the load linear, so shear, moment, slope and deflection are exact polynomials; the numbers come from a matrix solution of the nodal equilibrium equations, not from closed-form tables.",
                "Extremes and their locations are found from the real roots of each polynomial's derivative, not by sampling.",
                "Each load case is solved once; combinations and pattern arrangements are formed by superposition.",
                "Numerical conditioning: " + result.model().elements() + " elements, " + result.model().unknowns()
                        + " unknowns; smallest pivot ratio " + Numbers.format(result.pivotRatio())
                        + " (1 is ideal; below 1e-8 the model is close to a mechanism)."
                        + (result.pivotRatio() < AnalysisResult.POOR_CONDITIONING
                        ? " THE MODEL IS BADLY CONDITIONED: the results satisfy equilibrium to the residuals shown, but verify the supports and"
                          + " stiffnesses; a very stiff spring or a very short span beside long ones is the usual cause." : ""));
        List<String> limitations = List.of(
                "Sections are modelled as rectangles without fillets or rounded corners, or by closed forms; given properties are used as stated"
                        + (job.sections().values().stream().anyMatch(x -> x.shape() instanceof org.beamfolio.model.SectionShape.Catalogued)
                        ? "; catalogue shapes use their tabulated properties." : "."),
                "Supports are points; springs are linear. Support settlement is not included unless modelled by a spring.",
                job.steelDesign() != null ? steelScope() + " Not checked: connections, vibration, fire, fatigue and second-order effects."
                        : "Not checked unless shown: lateral-torsional and local buckling, connections, bearing and web crippling, vibration, fire, fatigue, creep and second-order effects.");
        List<String> materialHeader = List.of("Material", "E (" + (u.us() ? "ksi" : "MPa") + ")",
                "Density", "Allowable tension", "Allowable compression", "Allowable shear", "Source");
        List<List<String>> materialRows = new ArrayList<>();
        org.beamfolio.units.Unit modulus = org.beamfolio.units.Units.of(u.us() ? "ksi" : "MPa");
        org.beamfolio.units.Unit density = org.beamfolio.units.Units.of(u.us() ? "pcf" : "kN/m^3");
        for (Material m : job.materials().values()) {
            materialRows.add(List.of(m.id(), t.plain(m.elasticModulus(), modulus),
                    m.weightDensity() == null ? "not given" : t.q(m.weightDensity(), density),
                    optional(m.allowableTension()), optional(m.allowableCompression()), optional(m.allowableShear()), m.source()));
        }
        return new ReportModel.Basis(codes, units, conventions, SIGN_CONVENTION, method, limitations,
                job.project().notes(), new ReportModel.Table(materialHeader, materialRows), new StressPart(result, t).summaryTable());
    }

    private String optional(Double stress) {
        return stress == null ? "not given" : t.stress(stress);
    }

    private ReportModel.Checks checks(List<CheckOutcome> checks) {
        List<List<String>> rows = new ArrayList<>();
        List<Boolean> failing = new ArrayList<>();
        for (CheckOutcome c : checks) {
            rows.add(List.of(c.id(), c.description(), c.clause(), t.checked(c.demand(), c.measure()), t.checked(c.limit(), c.measure()),
                    Numbers.format(c.ratio()), c.pass() ? "meets" : "EXCEEDS", c.combination(), t.len(c.at())));
            failing.add(!c.pass());
        }
        boolean allPass = checks.stream().allMatch(CheckOutcome::pass);
        String governing = checks.stream().max(java.util.Comparator.comparingDouble(CheckOutcome::ratio))
                .map(c -> "Governing ratio " + Numbers.format(c.ratio()) + ": " + c.id() + " under " + c.combination() + " at "
                        + t.len(c.at()) + ". " + (allPass ? "Every check meets its limit." : "At least one check EXCEEDS its limit."))
                .orElse("No checks were requested in the job file.");
        return new ReportModel.Checks(new ReportModel.Table(List.of("Check", "What is checked", "Basis", "Demand", "Limit", "Ratio",
                "Result", "Combination", "At"), rows, failing, 6), governing, allPass, !checks.isEmpty(), failing(checks));
    }

    /** What the cover and the checks sheet state for each check that does not meet its limit. */
    private List<String> failing(List<CheckOutcome> checks) {
        return checks.stream().filter(c -> !c.pass())
                .map(c -> c.id() + ", " + c.description() + ": ratio " + Numbers.format(c.ratio()) + " (demand "
                        + t.checked(c.demand(), c.measure()) + " against a limit of " + t.checked(c.limit(), c.measure())
                        + ") under " + c.combination() + " at " + t.len(c.at()))
                .toList();
    }

    private List<String> cautions() {
        List<String> cautions = new ArrayList<>(new ReactionsPart(result, t).uplift());
        cautions.addAll(List.of(
                "This package is valid only when it has been reviewed, signed and sealed by a licensed professional engineer who takes responsibility for the design. The software does not replace the engineer's judgement.",
                "Loads, load combinations, support conditions, section dimensions and material values are the engineer's inputs: verify them against the governing building code, the referenced standards and the requirements of the authority having jurisdiction.",
                result.job().steelDesign() != null
                        ? "The method's limits: linear elastic, small deflections, Euler-Bernoulli beams without shear deformation, point supports. "
                          + steelScope() + " Connections, vibration, fire, fatigue and second-order effects are not checked; the bracing"
                          + " stated in the job must be provided and able to brace (AISC 360 Appendix 6 is not checked)."
                        : "The method's limits: linear elastic, small deflections, Euler-Bernoulli beams without shear deformation, point supports. Lateral-torsional buckling, local buckling, connections, bearing, web crippling, vibration, fire, fatigue, creep and second-order effects are not checked unless shown in this package."));
        if (result.job().stressCheck() || result.job().steelDesign() == null) {
            cautions.add("Allowable stresses are those given in the job file; they must already include whatever reductions the governing standard requires.");
        }
        return cautions;
    }

    /** What the steel design covers, for the basis and the cautions. */
    private String steelScope() {
        var d = result.job().steelDesign();
        String edition = org.beamfolio.design.steel.Edition.find(d.specification()).map(e -> e.label()).orElse(d.specification());
        return "Steel design to " + edition + " (" + (d.lrfd() ? "LRFD" : "ASD") + "): flexure with yielding, lateral-torsional"
                + " and local buckling over each unbraced segment (Chapter F), shear (Chapter G), and web local yielding and"
                + " crippling (J10.2, J10.3) at supports given a bearing length.";
    }

    private List<String> reviewChecklist() {
        return List.of("Loads and load combinations", "Geometry and support conditions", "Section and material properties",
                "Analysis results and diagrams", "Checks and conclusions");
    }

    private List<List<String>> history() {
        List<List<String>> rows = new ArrayList<>();
        for (Project.Revision r : result.job().project().history()) {
            rows.add(List.of(r.rev(), r.date(), r.by(), r.note()));
        }
        if (rows.isEmpty()) {
            Project p = result.job().project();
            rows.add(List.of(p.revision(), p.date(), p.preparedBy(), "(no history given in the job file)"));
        }
        return rows;
    }

    private ReportModel.Appendix appendix() {
        List<ReportModel.Row> lines = new ArrayList<>();
        String[] text = result.job().sourceText().split("\r?\n", -1);
        int n = text.length;
        if (n > 0 && text[n - 1].isEmpty()) {
            n--;
        }
        for (int i = 0; i < n; i++) {
            lines.add(new ReportModel.Row(Integer.toString(i + 1), text[i].replace("\t", "    ")));
        }
        return new ReportModel.Appendix(lines, result.job().sha256(), Version.get(), result.job().name() + ".yaml");
    }
}
