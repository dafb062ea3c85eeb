package org.beamfolio.results;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.analysis.ReactionEnvelope;
import org.beamfolio.analysis.Response;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.checks.CheckedMember;
import org.beamfolio.model.Support;
import org.beamfolio.section.SectionProperties;
import org.beamfolio.units.ReportUnits;
import org.beamfolio.units.Unit;

/**
 * Writes the results file, format {@code beamfolio-results/1}, in the report's units and at full
 * precision (each double printed as the shortest decimal that reads back to the same value),
 * with Jackson's streaming generator: the tree model would cost start-up time for nothing.
 */
public final class ResultsWriter {
    public static final String FORMAT = "beamfolio-results/1";
    private static final JsonFactory JSON = new JsonFactory();

    private ResultsWriter() {}

    public static String write(AnalysisResult result, List<CheckOutcome> checks) {
        StringWriter text = new StringWriter();
        try (JsonGenerator g = JSON.createGenerator(text)) {
            g.useDefaultPrettyPrinter();
            write(g, result, checks, ReportUnits.of(result.job().report().units()));
        } catch (IOException e) {
            throw new UncheckedIOException("results could not be written", e);
        }
        return text + "\n";
    }

    /**
     * The results file of a job with members: the format, the tool and the input's digest once,
     * then under {@code members} each member's results exactly as a single-beam job's, with its id.
     * A package gathered from several job files ({@code sha256} null) gives each member its own
     * file's digest instead.
     */
    public static String writeMembers(String sha256, List<CheckedMember> members) {
        StringWriter text = new StringWriter();
        try (JsonGenerator g = JSON.createGenerator(text)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            g.writeStringField("tool_version", Version.get());
            if (sha256 != null) {
                g.writeStringField("input_sha256", sha256);
            }
            g.writeArrayFieldStart("members");
            for (CheckedMember m : members) {
                g.writeStartObject();
                g.writeStringField("id", m.id());
                if (sha256 == null) {
                    g.writeStringField("input_sha256", m.result().job().sha256());
                }
                body(g, m.result(), m.checks(), ReportUnits.of(m.result().job().report().units()));
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException("results could not be written", e);
        }
        return text + "\n";
    }

    private static void write(JsonGenerator g, AnalysisResult result, List<CheckOutcome> checks, ReportUnits u) throws IOException {
        g.writeStartObject();
        g.writeStringField("format", FORMAT);
        g.writeStringField("tool_version", Version.get());
        g.writeStringField("input_sha256", result.job().sha256());
        body(g, result, checks, u);
        g.writeEndObject();
    }

    /** Everything after the header: solver, units, sections, combinations, envelope, reactions, checks. */
    private static void body(JsonGenerator g, AnalysisResult result, List<CheckOutcome> checks, ReportUnits u) throws IOException {
        g.writeObjectFieldStart("solver");
        g.writeStringField("method", "direct stiffness, exact Euler-Bernoulli elements");
        g.writeNumberField("elements", result.model().elements());
        g.writeNumberField("unknowns", result.model().unknowns());
        g.writeNumberField("pivot_ratio", result.pivotRatio());
        g.writeBooleanField("poorly_conditioned", result.pivotRatio() < AnalysisResult.POOR_CONDITIONING);
        g.writeEndObject();
        g.writeObjectFieldStart("units");
        g.writeStringField("length", u.length().symbol());
        g.writeStringField("force", u.force().symbol());
        g.writeStringField("moment", u.moment().symbol());
        g.writeStringField("distributed", u.distributed().symbol());
        g.writeStringField("stress", u.stress().symbol());
        g.writeStringField("deflection", u.deflection().symbol());
        g.writeStringField("section", u.sectionLength().symbol());
        g.writeEndObject();
        g.writeObjectFieldStart("sections");
        for (Map.Entry<String, SectionProperties> e : result.sections().entrySet()) {
            g.writeFieldName(e.getKey());
            section(g, e.getValue(), u, result.job().sections().get(e.getKey()));
        }
        g.writeEndObject();
        g.writeArrayFieldStart("combinations");
        List<Support> supports = result.job().beam().supports();
        for (CombinationResult c : result.combinations()) {
            g.writeStartObject();
            g.writeStringField("name", c.name());
            g.writeObjectFieldStart("factors");
            for (Map.Entry<String, Double> f : c.factors().entrySet()) {
                g.writeNumberField(f.getKey(), f.getValue());
            }
            g.writeEndObject();
            g.writeStringField("source", c.reference());
            if (!c.arrangement().isEmpty()) {
                g.writeStringField("pattern", c.arrangement());
            }
            g.writeArrayFieldStart("reactions");
            for (int i = 0; i < supports.size(); i++) {
                g.writeStartObject();
                g.writeNumberField("at", u.length().fromSi(supports.get(i).at()));
                g.writeStringField("type", supports.get(i).kind().label());
                g.writeNumberField("force", u.force().fromSi(c.response().reactionForce()[i]));
                g.writeNumberField("moment", u.moment().fromSi(c.response().reactionMoment()[i]));
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeFieldName("extremes");
            extremes(g, c.extremes(), u, false);
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeFieldName("envelope");
        if (result.envelope() != null) {
            extremes(g, result.envelope(), u, true);
        } else {
            g.writeStartObject();
            g.writeEndObject();
        }
        reactions(g, result, u);
        g.writeArrayFieldStart("checks");
        for (CheckOutcome check : checks) {
            g.writeStartObject();
            g.writeStringField("id", check.id());
            g.writeStringField("description", check.description());
            g.writeNumberField("demand", u.inReportUnit(check.demand(), check.measure()));
            g.writeNumberField("limit", u.inReportUnit(check.limit(), check.measure()));
            g.writeNumberField("ratio", check.ratio());
            g.writeBooleanField("pass", check.pass());
            g.writeStringField("combination", check.combination());
            g.writeNumberField("at", u.length().fromSi(check.at()));
            g.writeStringField("unit", u.unitOf(check.measure()).symbol());
            g.writeStringField("kind", check.kind().key());
            g.writeStringField("clause", check.clause());
            if (check.limitState() != null) {
                g.writeStringField("limit_state", check.limitState());
            }
            if (check.segment() != null) {
                g.writeArrayFieldStart("segment");
                g.writeNumber(u.length().fromSi(check.segment().from()));
                g.writeNumber(u.length().fromSi(check.segment().to()));
                g.writeEndArray();
            }
            if (!check.factors().isEmpty()) {
                g.writeObjectFieldStart("factors");
                for (Map.Entry<String, Double> f : check.factors().entrySet()) {
                    g.writeNumberField(f.getKey(), f.getValue());
                }
                g.writeEndObject();
            }
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    /**
     * Per support: the unfactored reaction of each load case (and its moment where the support
     * restrains rotation), for the designer of the supporting structure; and the largest and
     * smallest reaction over every combination and pattern arrangement, with the one that gives it.
     */
    private static void reactions(JsonGenerator g, AnalysisResult result, ReportUnits u) throws IOException {
        List<Support> supports = result.job().beam().supports();
        g.writeArrayFieldStart("reactions_by_case");
        for (int i = 0; i < supports.size(); i++) {
            Support s = supports.get(i);
            g.writeStartObject();
            g.writeNumberField("at", u.length().fromSi(s.at()));
            g.writeStringField("type", s.kind().label());
            g.writeObjectFieldStart("cases");
            for (Map.Entry<String, Response> c : result.cases().entrySet()) {
                g.writeNumberField(c.getKey(), u.force().fromSi(c.getValue().reactionForce()[i]));
            }
            g.writeEndObject();
            if (s.kind().restrainsRotation()) {
                g.writeObjectFieldStart("moments");
                for (Map.Entry<String, Response> c : result.cases().entrySet()) {
                    g.writeNumberField(c.getKey(), u.moment().fromSi(c.getValue().reactionMoment()[i]));
                }
                g.writeEndObject();
            }
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("reactions_extreme");
        List<ReactionEnvelope.AtSupport> extremes = result.reactions().supports();
        for (int i = 0; i < extremes.size(); i++) {
            g.writeStartObject();
            g.writeNumberField("at", u.length().fromSi(supports.get(i).at()));
            g.writeStringField("type", supports.get(i).kind().label());
            bound(g, "max", extremes.get(i).max(), u);
            bound(g, "min", extremes.get(i).min(), u);
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private static void bound(JsonGenerator g, String key, ReactionEnvelope.Bound b, ReportUnits u) throws IOException {
        g.writeObjectFieldStart(key);
        g.writeNumberField("force", u.force().fromSi(b.force()));
        g.writeStringField("combination", b.combination());
        g.writeEndObject();
    }

    private static void section(JsonGenerator g, SectionProperties p, ReportUnits u, org.beamfolio.model.Section s)
            throws IOException {
        g.writeStartObject();
        if (p.area() != null) {
            g.writeNumberField("A", u.area().fromSi(p.area()));
        }
        g.writeNumberField("I", u.secondMoment().fromSi(p.inertia()));
        g.writeNumberField("depth", u.sectionLength().fromSi(p.depth()));
        g.writeNumberField("y_bottom", u.sectionLength().fromSi(p.yBottom()));
        g.writeNumberField("c_top", u.sectionLength().fromSi(p.cTop()));
        g.writeNumberField("c_bottom", u.sectionLength().fromSi(p.cBottom()));
        g.writeNumberField("S_top", u.firstMoment().fromSi(p.sTop()));
        g.writeNumberField("S_bottom", u.firstMoment().fromSi(p.sBottom()));
        if (p.qNeutral() != null) {
            g.writeNumberField("Q", u.firstMoment().fromSi(p.qNeutral()));
        }
        if (p.tNeutral() != null) {
            g.writeNumberField("t", u.sectionLength().fromSi(p.tNeutral()));
        }
        if (s != null) {
            ChoiceResults.write(g, s, u);
        }
        g.writeEndObject();
    }

    private static void extremes(JsonGenerator g, Extremes e, ReportUnits u, boolean named) throws IOException {
        g.writeStartObject();
        pair(g, "shear", e.shearMax(), e.shearMin(), u.force(), u, named);
        pair(g, "moment", e.momentMax(), e.momentMin(), u.moment(), u, named);
        pair(g, "deflection", e.deflectionMax(), e.deflectionMin(), u.deflection(), u, named);
        pair(g, "stress_top", e.stressTopMax(), e.stressTopMin(), u.stress(), u, named);
        pair(g, "stress_bottom", e.stressBottomMax(), e.stressBottomMin(), u.stress(), u, named);
        if (e.shearStressMax() != null) {
            g.writeObjectFieldStart("shear_stress");
            g.writeFieldName("max");
            point(g, e.shearStressMax(), u.stress(), u, named);
            g.writeEndObject();
        }
        g.writeEndObject();
    }

    private static void pair(JsonGenerator g, String key, Extreme max, Extreme min, Unit unit, ReportUnits u, boolean named)
            throws IOException {
        g.writeObjectFieldStart(key);
        g.writeFieldName("max");
        point(g, max, unit, u, named);
        g.writeFieldName("min");
        point(g, min, unit, u, named);
        g.writeEndObject();
    }

    private static void point(JsonGenerator g, Extreme e, Unit unit, ReportUnits u, boolean named) throws IOException {
        g.writeStartObject();
        g.writeNumberField("value", unit.fromSi(e.value()) + 0.0);
        g.writeNumberField("at", u.length().fromSi(e.at()));
        if (named) {
            g.writeStringField("combination", e.combination());
        }
        g.writeEndObject();
    }
}
