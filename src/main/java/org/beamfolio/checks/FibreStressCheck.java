package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.GoverningStresses;
import org.beamfolio.analysis.StressDemand;
import org.beamfolio.units.Measure;

/**
 * Extreme fibre bending stress against the material's allowable, in tension and in compression:
 * f = M c / I (the flexure formula of elementary beam theory) at the top and bottom fibres, the
 * largest ratio over every element and every allowable-stress combination, compared with the
 * allowable the engineer gives in the job (materials.*.allowable). The governing point is the
 * analysis's {@link GoverningStresses}, the one the package works out. Lateral-torsional and local
 * buckling are not checked: the allowable must already account for them.
 */
final class FibreStressCheck implements Check {
    enum Kind { TENSION, COMPRESSION }

    private final Kind kind;

    FibreStressCheck(Kind kind) {
        this.kind = kind;
    }

    /** The flexure formula against the engineer's allowable: a rule of mechanics, the limit the engineer's. */
    static final Authority AUTHORITY = new Authority("Mechanics of materials (common practice)", "", "f = M c / I");

    @Override
    public String id() {
        return kind == Kind.TENSION ? "stress-tension" : "stress-compression";
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
        StressDemand d = kind == Kind.TENSION ? g.tension() : g.compression();
        if (d == null || !g.service()) {
            return List.of();
        }
        String what = kind == Kind.TENSION ? "tension" : "compression";
        // tension at the top or compression at the bottom comes from hogging
        boolean hogging = d.topFibre() == (kind == Kind.TENSION);
        String fibre = (d.topFibre() ? "top" : "bottom") + " fibre, " + (hogging ? "hogging" : "sagging") + " moment";
        double ratio = d.demand() / d.allowable();
        return List.of(new CheckOutcome(id(), "Extreme fibre bending stress in " + what + ", f = M c / I (" + fibre
                + "), against the allowable", d.demand(), d.allowable(), ratio, ratio <= 1,
                d.combination().name(), d.at(), Measure.STRESS, CheckKind.STRESS, AUTHORITY.citation()));
    }
}
