package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.GoverningStresses;
import org.beamfolio.analysis.StressDemand;
import org.beamfolio.units.Measure;

/**
 * Shear stress, f_v = V Q / (I t) (the shear formula of elementary beam theory), at the neutral
 * axis or the flange-to-web junction where Q / t is largest, over every element and
 * allowable-stress combination, against the allowable shear stress the engineer gives in the job.
 * The governing point is the analysis's {@link GoverningStresses}, the one the package works out.
 * A section without Q or t is not checked.
 */
final class ShearStressCheck implements Check {
    static final Authority AUTHORITY = new Authority("Mechanics of materials (common practice)", "", "f_v = V Q / (I t)");

    @Override
    public String id() {
        return "stress-shear";
    }

    @Override
    public Authority authority() {
        return AUTHORITY;
    }

    @Override
    public List<CheckOutcome> run(AnalysisResult result) {
        if (!result.job().stressCheck()) {
            return List.of();
        }
        GoverningStresses g = result.stresses();
        StressDemand d = g.shear();
        if (d == null || !g.service()) {
            return List.of();
        }
        double ratio = d.demand() / d.allowable();
        String cut = Double.isNaN(d.cutHeight()) ? "at the neutral axis" : "at the flange-to-web junction";
        return List.of(new CheckOutcome(id(), "Shear stress " + cut + ", f_v = V Q / (I t), against the allowable",
                d.demand(), d.allowable(), ratio, ratio <= 1, d.combination().name(),
                d.at(), Measure.STRESS, CheckKind.STRESS, AUTHORITY.citation()));
    }
}
