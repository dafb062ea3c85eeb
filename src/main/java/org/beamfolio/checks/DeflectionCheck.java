package org.beamfolio.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Patterns;
import org.beamfolio.model.DeflectionLimit;
import org.beamfolio.model.SupportKind;
import org.beamfolio.units.Measure;
import org.beamfolio.units.ReportUnits;

/**
 * Deflection under the sum of the named unfactored cases against the job's limits: a span ratio
 * L/n applied region by region (a span between supports uses its length; an overhang or
 * cantilever uses twice its length, common practice for limits written for spans), or an
 * absolute maximum over the whole beam. A pattern case among the named cases is also placed on
 * every arrangement the envelope examines, and each region is checked under the arrangement that
 * deflects it most (one span of two loaded deflects more than both: common practice). With
 * spring supports the limit applies to the deflection relative to the supports' movement
 * ({@link SupportChord}) unless the job says {@code relative: false}; the absolute deflection is
 * stated beside it. The limit values themselves (L/360, L/240) are the engineer's, from the
 * governing code (e.g. IBC 2021 Table 1604.3).
 */
final class DeflectionCheck implements Check {
    /** One loading the check examines: the named cases on every region, or one pattern arrangement. */
    private record Loading(String name, Field deflection) {}

    /** The worst deflection found and the loading that gives it. */
    private record Worst(Extreme extreme, Loading loading) {}

    /** The limits are the engineer's, usually from IBC 2021 Table 1604.3 or the governing code. */
    static final Authority AUTHORITY = new Authority("IBC 2021", "2021", "Table 1604.3 (limit given in the job)");

    @Override
    public String id() {
        return "deflection";
    }

    @Override
    public Authority authority() {
        return AUTHORITY;
    }

    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        ReportUnits u = ReportUnits.of(result.job().report().units());
        List<Double> supportsAt = result.job().beam().supports().stream().map(s -> s.at()).toList();
        boolean springs = result.job().beam().supports().stream().anyMatch(s -> s.kind() instanceof SupportKind.Spring);
        List<CheckOutcome> out = new ArrayList<>();
        for (DeflectionLimit limit : result.job().deflectionLimits()) {
            boolean relative = springs && limit.relative();
            List<Loading> loadings = loadings(result, limit);
            String measured = !springs ? "" : relative ? " relative to the supports' movement" : " (absolute, supports' movement included)";
            if (limit.spanRatio() != null) {
                for (AnalysisResult.Span span : result.spans()) {
                    boolean overhang = span.overhang();
                    double effective = span.limitLength();
                    double allowed = effective / limit.spanRatio();
                    Worst worst = worstIn(loadings, List.of(span), relative, supportsAt);
                    double demand = Math.abs(worst.extreme().value());
                    String label = span.label().replace("span ", "span").replace(" ", "-");
                    out.add(new CheckOutcome("deflection-" + String.join("+", limit.cases()) + "-" + label,
                            "Deflection under " + worst.loading().name() + " in " + span.label() + measured + ", limit "
                                    + (overhang ? "2L" : "L") + "/" + trim(limit.spanRatio())
                                    + absoluteBeside(relative, worst, List.of(span), u),
                            demand, allowed, demand / allowed,
                            demand <= allowed, worst.loading().name(), worst.extreme().at(), Measure.DEFLECTION, CheckKind.DEFLECTION,
                            AUTHORITY.citation()));
                }
            } else {
                Worst worst = worstIn(loadings, result.spans(), relative, supportsAt);
                double demand = Math.abs(worst.extreme().value());
                out.add(new CheckOutcome("deflection-" + String.join("+", limit.cases()) + "-max",
                        "Largest deflection under " + worst.loading().name() + measured + " against a maximum of "
                                + trim(u.deflection().fromSi(limit.maximum())) + " " + u.deflection().symbol()
                                + absoluteBeside(relative, worst, result.spans(), u),
                        demand, limit.maximum(), demand / limit.maximum(),
                        demand <= limit.maximum(), worst.loading().name(), worst.extreme().at(), Measure.DEFLECTION,
                        CheckKind.DEFLECTION, AUTHORITY.citation()));
            }
        }
        return out;
    }

    /** The named cases on every region, then (when a pattern case is among them) each arrangement of the envelope. */
    private static List<Loading> loadings(AnalysisResult result, DeflectionLimit limit) {
        Map<String, Double> factors = new LinkedHashMap<>();
        limit.cases().forEach(c -> factors.put(c, 1.0));
        String name = String.join(" + ", limit.cases());
        Patterns patterns = result.patterns();
        List<Loading> loadings = new ArrayList<>();
        loadings.add(new Loading(name, patterns.deflection(factors, null)));
        if (!patterns.casesIn(factors).isEmpty()) {
            for (boolean[] loaded : patterns.arrangements()) {
                String arrangement = patterns.name(name, factors, loaded);
                loadings.add(new Loading(arrangement, patterns.deflection(factors, loaded)));
            }
        }
        return loadings;
    }

    /** The largest deflection in the regions over every loading; on a tie the earlier loading (all regions loaded) is kept. */
    private static Worst worstIn(List<Loading> loadings, List<AnalysisResult.Span> regions, boolean relative, List<Double> supportsAt) {
        Worst best = null;
        for (Loading loading : loadings) {
            for (AnalysisResult.Span region : regions) {
                Field f = relative ? SupportChord.relative(loading.deflection(), region, supportsAt) : loading.deflection();
                Extreme e = f.largestWithin(region.from(), region.to());
                if (best == null || Math.abs(e.value()) > Math.abs(best.extreme().value())) {
                    best = new Worst(e, loading);
                }
            }
        }
        return best;
    }

    /** With the relative deflection checked, the absolute one under the same loading, for the reader. */
    private static String absoluteBeside(boolean relative, Worst worst, List<AnalysisResult.Span> regions, ReportUnits u) {
        if (!relative) {
            return "";
        }
        Extreme absolute = new Extreme(0, regions.get(0).from(), null);
        for (AnalysisResult.Span region : regions) {
            Extreme e = worst.loading().deflection().largestWithin(region.from(), region.to());
            if (Math.abs(e.value()) > Math.abs(absolute.value())) {
                absolute = e;
            }
        }
        return "; absolute deflection " + org.beamfolio.units.Numbers.format(u.deflection().fromSi(Math.abs(absolute.value())),
                u.deflection().symbol()) + " at " + org.beamfolio.units.Numbers.format(u.length().fromSi(absolute.at()), u.length().symbol());
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
