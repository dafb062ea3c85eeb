package org.beamfolio.checks.timber;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.model.timber.Factor;
import org.beamfolio.checks.Authority;
import org.beamfolio.checks.Check;
import org.beamfolio.checks.CheckKind;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.units.Measure;

/**
 * The NDS 2018 checks of a timber beam (allowable stress design), each the governing one over the
 * allowable-stress combinations with each combination's own load-duration factor: bending,
 * shear, bearing at each support given a bearing length, and long-term deflection with creep.
 * The numbers are {@link TimberBeamDesign}'s, the ones the timber design sheet prints.
 */
public final class TimberChecks implements Check {
    @Override
    public String id() {
        return "nds";
    }

    @Override
    public Authority authority() {
        return new Authority("NDS 2018", "2018", "3.3, 3.4, 3.10, 3.5.2");
    }

    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        return outcomes(result);
    }

    public static List<CheckOutcome> outcomes(AnalysisResult result) {
        TimberDesignResult d = TimberBeamDesign.of(result);
        if (d == null) {
            return List.of();
        }
        int count = d.bending().size();
        List<CheckOutcome> out = new ArrayList<>();
        TimberDesignResult.Bending b = d.governingBending();
        if (b != null) {
            String face = b.hogging() ? "hogging, top face in tension" : "sagging, bottom face in tension";
            String stability = b.adjusted().has("CV") ? b.adjusted().governingStability() + " (lesser of CL and CV)" : "CL";
            out.add(new CheckOutcome("nds-bending", "Bending stress fb = M / S against Fb' (" + face + "), "
                    + "CD = " + b.cd().factor() + " (" + b.durationCase() + ", " + b.cd().key().replace('_', ' ') + "), "
                    + stability + " = " + String.format(java.util.Locale.ROOT, "%.3f", b.adjusted().factor(b.adjusted().governingStability()))
                    + "; governing of " + count + " combinations",
                    b.fb(), b.limit(), b.ratio(), b.ratio() <= 1, b.combination(), b.at(), Measure.STRESS,
                    CheckKind.FLEXURE, "NDS 2018 3.3.1, " + d.values().kind().applicability(),
                    b.adjusted().stability() != null ? "bending with lateral stability (CL)" : "bending",
                    new CheckOutcome.Segment(b.segment().from(), b.segment().to()),
                    factors(b.adjusted().factors())));
        }
        TimberDesignResult.Shear s = d.governingShear();
        if (s != null) {
            Map<String, Double> f = new LinkedHashMap<>();
            f.put("CD", s.cd().factor());
            f.putAll(factors(s.adjusted().factors()));
            out.add(new CheckOutcome("nds-shear", "Shear stress fv = 1.5 V / A against Fv', CD = " + s.cd().factor()
                    + " (" + s.durationCase() + "); " + (s.nearSupportsReduced()
                    ? "loads within d of the bearings' faces left out, concentrated ones times x/d (NDS 3.4.3.1(a))"
                    : "no support has a bearing length, so every load is kept (conservative)"),
                    s.fv(), s.adjusted().value(), s.ratio(), s.ratio() <= 1,
                    s.combination(), s.at(), Measure.STRESS,
                    CheckKind.SHEAR, "NDS 2018 3.4.2, Eq. 3.4-2", "shear parallel to grain", null, f));
        }
        for (TimberDesignResult.Bearing br : d.bearing()) {
            out.add(new CheckOutcome("nds-bearing-R" + br.support(), "Bearing at R" + br.support()
                    + ", fc_perp = R / (b lb) against Fc_perp' (no load-duration factor)",
                    br.stress(), br.adjusted().value(), br.ratio(), br.ratio() <= 1,
                    br.combination(), br.at(), Measure.STRESS,
                    CheckKind.BEARING, "NDS 2018 3.10.2, 3.10.4", "compression perpendicular to grain", null,
                    factors(br.adjusted().factors())));
        }
        for (TimberDesignResult.LongTerm lt : d.deflection()) {
            out.add(new CheckOutcome("nds-long-term-" + String.join("+", lt.limitCases().split(" \\+ ")) + "-"
                    + lt.region().replace("span ", "span").replace(" ", "-"),
                    "Long-term deflection in " + lt.region() + ", Kcr (" + String.join(" + ", lt.longTermCases()) + ")"
                            + (lt.shortTermCases().isEmpty() ? "" : " + " + String.join(" + ", lt.shortTermCases()))
                            + " with Kcr = " + d.kcr().value() + ", limit " + lt.limitText(),
                    lt.deflection(), lt.allowed(), lt.ratio(), lt.ratio() <= 1,
                    lt.limitCases(), lt.at(), Measure.DEFLECTION,
                    CheckKind.DEFLECTION, "NDS 2018 3.5.2, Eq. 3.5-1", "long-term deflection with creep", null,
                    Map.of("Kcr", d.kcr().value())));
        }
        return out;
    }

    private static Map<String, Double> factors(List<Factor> factors) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (Factor f : factors) {
            out.put(f.symbol(), f.value());
        }
        return out;
    }
}
