package org.beamfolio.checks;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.StructureModel;
import org.beamfolio.analysis.Stresses;
import org.beamfolio.model.Material;
import org.beamfolio.results.CheckOutcome;
import org.beamfolio.results.ReportUnits;

/**
 * Extreme fibre bending stress against the material's allowable, in tension and in compression:
 * f = M c / I (the flexure formula of elementary beam theory) at the top and bottom fibres, the
 * larger of the two over every element and every allowable-stress combination, compared with
 * the allowable the engineer gives in the job (materials.*.allowable). Lateral-torsional and
 * local buckling are not checked: the allowable must already account for them.
 */
final class FibreStressCheck implements Check {
    enum Kind { TENSION, COMPRESSION }

    private final Kind kind;

    FibreStressCheck(Kind kind) {
        this.kind = kind;
    }

    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        StructureModel model = result.model();
        Stresses stresses = new Stresses(model);
        ReportUnits u = ReportUnits.of(result.job().report().units());
        int sign = kind == Kind.TENSION ? 1 : -1;
        double bestRatio = -1;
        double bestDemand = 0;
        double bestLimit = 0;
        double bestAt = 0;
        String bestCombination = "";
        String bestFibre = "";
        for (CombinationResult c : StressCombinations.of(result)) {
            Field top = stresses.top(c.response());
            Field bottom = stresses.bottom(c.response());
            for (int e = 0; e < model.elements(); e++) {
                Material m = result.job().materials().get(model.materialId(e));
                double allowable = kind == Kind.TENSION ? m.allowableTension() : m.allowableCompression();
                for (Field f : List.of(top, bottom)) {
                    Extreme x = f.extremeOf(e, sign);
                    String fibre = f == top ? "top" : "bottom";
                    double demand = Math.max(0, sign * x.value());
                    double ratio = demand / allowable;
                    if (ratio > bestRatio) {
                        bestRatio = ratio;
                        bestDemand = demand;
                        bestLimit = allowable;
                        bestAt = x.at();
                        bestCombination = c.name();
                        // tension at the top or compression at the bottom comes from hogging
                        boolean hogging = (f == top) == (kind == Kind.TENSION);
                        bestFibre = fibre + " fibre, " + (hogging ? "hogging" : "sagging") + " moment";
                    }
                }
            }
        }
        if (bestRatio < 0) {
            return List.of();
        }
        String what = kind == Kind.TENSION ? "tension" : "compression";
        List<CheckOutcome> out = new ArrayList<>();
        out.add(new CheckOutcome("stress-" + what, "Extreme fibre bending stress in " + what + ", f = M c / I (" + bestFibre + "), against the allowable",
                u.stress().fromSi(bestDemand), u.stress().fromSi(bestLimit), bestRatio, bestRatio <= 1, bestCombination,
                bestAt, u.stress().symbol()));
        return out;
    }
}
