package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.StructureModel;
import org.beamfolio.analysis.Stresses;
import org.beamfolio.results.CheckOutcome;
import org.beamfolio.results.ReportUnits;

/**
 * Shear stress at the neutral axis, f_v = V Q / (I t) (the shear formula of elementary beam
 * theory), over every element and allowable-stress combination, against the allowable shear
 * stress the engineer gives in the job. A section without Q or t is not checked.
 */
final class ShearStressCheck implements Check {
    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        StructureModel model = result.model();
        Stresses stresses = new Stresses(model);
        ReportUnits u = ReportUnits.of(result.job().report().units());
        double bestRatio = -1;
        double bestDemand = 0;
        double bestLimit = 0;
        double bestAt = 0;
        String bestCombination = "";
        for (CombinationResult c : StressCombinations.of(result)) {
            Field tau = stresses.shearStress(c.response());
            if (tau == null) {
                return List.of();
            }
            for (int e = 0; e < model.elements(); e++) {
                double allowable = result.job().materials().get(model.materialId(e)).allowableShear();
                for (int sign : new int[] {1, -1}) {
                    Extreme x = tau.extremeOf(e, sign);
                    double demand = Math.abs(x.value());
                    if (demand / allowable > bestRatio) {
                        bestRatio = demand / allowable;
                        bestDemand = demand;
                        bestLimit = allowable;
                        bestAt = x.at();
                        bestCombination = c.name();
                    }
                }
            }
        }
        if (bestRatio < 0) {
            return List.of();
        }
        return List.of(new CheckOutcome("stress-shear", "Shear stress at the neutral axis, f_v = V Q / (I t), against the allowable",
                u.stress().fromSi(bestDemand), u.stress().fromSi(bestLimit), bestRatio, bestRatio <= 1, bestCombination,
                bestAt, u.stress().symbol()));
    }
}
