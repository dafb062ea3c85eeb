package org.beamfolio.results;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Extremes;
import org.beamfolio.model.Support;
import org.beamfolio.section.SectionProperties;

/**
 * Writes the results file, format {@code beamfolio-results/1}, in the report's units and at full
 * precision (each double printed as the shortest decimal that reads back to the same value).
 */
public final class ResultsWriter {
    public static final String FORMAT = "beamfolio-results/1";
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultsWriter() {}

    public static String write(AnalysisResult result, List<CheckOutcome> checks) {
        ReportUnits u = ReportUnits.of(result.job().report().units());
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("tool_version", Version.get());
        root.put("input_sha256", result.job().sha256());
        ObjectNode units = root.putObject("units");
        units.put("length", u.length().symbol());
        units.put("force", u.force().symbol());
        units.put("moment", u.moment().symbol());
        units.put("distributed", u.distributed().symbol());
        units.put("stress", u.stress().symbol());
        units.put("deflection", u.deflection().symbol());
        units.put("section", u.sectionLength().symbol());
        ObjectNode solver = root.putObject("solver");
        solver.put("method", "direct stiffness, exact Euler-Bernoulli elements");
        solver.put("elements", result.model().elements());
        solver.put("unknowns", result.model().unknowns());
        solver.put("pivot_ratio", result.pivotRatio());
        solver.put("poorly_conditioned", result.pivotRatio() < AnalysisResult.POOR_CONDITIONING);
        ObjectNode sections = root.putObject("sections");
        for (Map.Entry<String, SectionProperties> e : result.sections().entrySet()) {
            sections.set(e.getKey(), section(e.getValue(), u));
        }
        ArrayNode combinations = root.putArray("combinations");
        for (CombinationResult c : result.combinations()) {
            ObjectNode node = combinations.addObject();
            node.put("name", c.name());
            ObjectNode factors = node.putObject("factors");
            c.factors().forEach(factors::put);
            node.put("source", c.reference());
            if (!c.arrangement().isEmpty()) {
                node.put("pattern", c.arrangement());
            }
            ArrayNode reactions = node.putArray("reactions");
            List<Support> supports = result.job().beam().supports();
            for (int i = 0; i < supports.size(); i++) {
                ObjectNode r = reactions.addObject();
                r.put("at", u.length().fromSi(supports.get(i).at()));
                r.put("type", supports.get(i).kind().label());
                r.put("force", u.force().fromSi(c.response().reactionForce()[i]));
                r.put("moment", u.moment().fromSi(c.response().reactionMoment()[i]));
            }
            node.set("extremes", extremes(c.extremes(), u, false));
        }
        if (result.envelope() != null) {
            root.set("envelope", extremes(result.envelope(), u, true));
        } else {
            root.putObject("envelope");
        }
        ArrayNode checkArray = root.putArray("checks");
        for (CheckOutcome check : checks) {
            ObjectNode node = checkArray.addObject();
            node.put("id", check.id());
            node.put("description", check.description());
            node.put("demand", check.demand());
            node.put("limit", check.limit());
            node.put("ratio", check.ratio());
            node.put("pass", check.pass());
            node.put("combination", check.combination());
            node.put("at", u.length().fromSi(check.at()));
            node.put("unit", check.unit());
        }
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("results tree could not be written", e);
        }
    }

    private static ObjectNode section(SectionProperties p, ReportUnits u) {
        ObjectNode node = MAPPER.createObjectNode();
        if (p.area() != null) {
            node.put("A", u.area().fromSi(p.area()));
        }
        node.put("I", u.secondMoment().fromSi(p.inertia()));
        node.put("depth", u.sectionLength().fromSi(p.depth()));
        node.put("y_bottom", u.sectionLength().fromSi(p.yBottom()));
        node.put("c_top", u.sectionLength().fromSi(p.cTop()));
        node.put("c_bottom", u.sectionLength().fromSi(p.cBottom()));
        node.put("S_top", u.firstMoment().fromSi(p.sTop()));
        node.put("S_bottom", u.firstMoment().fromSi(p.sBottom()));
        if (p.qNeutral() != null) {
            node.put("Q", u.firstMoment().fromSi(p.qNeutral()));
        }
        if (p.tNeutral() != null) {
            node.put("t", u.sectionLength().fromSi(p.tNeutral()));
        }
        return node;
    }

    private static ObjectNode extremes(Extremes e, ReportUnits u, boolean named) {
        ObjectNode node = MAPPER.createObjectNode();
        pair(node, "shear", e.shearMax(), e.shearMin(), u.force(), u, named);
        pair(node, "moment", e.momentMax(), e.momentMin(), u.moment(), u, named);
        pair(node, "deflection", e.deflectionMax(), e.deflectionMin(), u.deflection(), u, named);
        pair(node, "stress_top", e.stressTopMax(), e.stressTopMin(), u.stress(), u, named);
        pair(node, "stress_bottom", e.stressBottomMax(), e.stressBottomMin(), u.stress(), u, named);
        if (e.shearStressMax() != null) {
            ObjectNode tau = node.putObject("shear_stress");
            tau.set("max", point(e.shearStressMax(), u.stress(), u, named));
        }
        return node;
    }

    private static void pair(ObjectNode parent, String key, Extreme max, Extreme min, org.beamfolio.units.Unit unit,
                             ReportUnits u, boolean named) {
        ObjectNode node = parent.putObject(key);
        node.set("max", point(max, unit, u, named));
        node.set("min", point(min, unit, u, named));
    }

    private static ObjectNode point(Extreme e, org.beamfolio.units.Unit unit, ReportUnits u, boolean named) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("value", unit.fromSi(e.value()) + 0.0);
        node.put("at", u.length().fromSi(e.at()));
        if (named) {
            node.put("combination", e.combination());
        }
        return node;
    }
}
