package org.beamfolio.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Response;
import org.beamfolio.model.DeflectionLimit;
import org.beamfolio.results.CheckOutcome;
import org.beamfolio.results.ReportUnits;

/**
 * Deflection under the sum of the named unfactored cases against the job's limits: a span ratio
 * L/n applied region by region (a span between supports uses its length; an overhang or
 * cantilever uses twice its length, common practice for limits written for spans), or an
 * absolute maximum over the whole beam. The limit values themselves (L/360, L/240) are the
 * engineer's, from the governing code (e.g. IBC 2021 Table 1604.3).
 */
final class DeflectionCheck implements Check {
    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        ReportUnits u = ReportUnits.of(result.job().report().units());
        List<CheckOutcome> out = new ArrayList<>();
        for (DeflectionLimit limit : result.job().deflectionLimits()) {
            Map<String, Double> factors = new LinkedHashMap<>();
            limit.cases().forEach(c -> factors.put(c, 1.0));
            String name = String.join(" + ", limit.cases());
            Response r = sum(result, factors, name);
            Field deflection = r.deflection();
            if (limit.spanRatio() != null) {
                for (AnalysisResult.Span span : result.spans()) {
                    boolean overhang = !span.label().startsWith("span "); // an overhang or a cantilever
                    double effective = (overhang ? 2 : 1) * (span.to() - span.from());
                    double allowed = effective / limit.spanRatio();
                    Extreme worst = largestIn(deflection, span.from(), span.to());
                    double demand = Math.abs(worst.value());
                    String label = span.label().replace("span ", "span").replace(" ", "-");
                    out.add(new CheckOutcome("deflection-" + String.join("+", limit.cases()) + "-" + label,
                            "Deflection under " + name + " in " + span.label() + ", limit " + (overhang ? "2L" : "L") + "/"
                                    + trim(limit.spanRatio()),
                            u.deflection().fromSi(demand), u.deflection().fromSi(allowed), demand / allowed,
                            demand <= allowed, name, worst.at(), u.deflection().symbol()));
                }
            } else {
                Extreme worst = deflection.maxAbs();
                double demand = Math.abs(worst.value());
                out.add(new CheckOutcome("deflection-" + String.join("+", limit.cases()) + "-max",
                        "Largest deflection under " + name + " against a maximum of " + trim(u.deflection().fromSi(limit.maximum()))
                                + " " + u.deflection().symbol(),
                        u.deflection().fromSi(demand), u.deflection().fromSi(limit.maximum()), demand / limit.maximum(),
                        demand <= limit.maximum(), name, worst.at(), u.deflection().symbol()));
            }
        }
        return out;
    }

    private static Response sum(AnalysisResult result, Map<String, Double> factors, String name) {
        Response total = null;
        for (Map.Entry<String, Double> f : factors.entrySet()) {
            Response r = result.cases().get(f.getKey()).times(f.getValue(), name);
            total = total == null ? r : total.plus(r, name);
        }
        return total;
    }

    private static Extreme largestIn(Field f, double from, double to) {
        Extreme best = new Extreme(0, from, null);
        for (int i = 0; i < f.size(); i++) {
            if (f.start(i) >= from - 1e-12 && f.end(i) <= to + 1e-12) {
                for (int sign : new int[] {1, -1}) {
                    Extreme e = f.extremeOf(i, sign);
                    if (Math.abs(e.value()) > Math.abs(best.value())) {
                        best = e;
                    }
                }
            }
        }
        return best;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
