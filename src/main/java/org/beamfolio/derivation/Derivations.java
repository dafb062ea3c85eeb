package org.beamfolio.derivation;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Load;
import org.beamfolio.model.SupportKind;

/**
 * The derivation stage's entry point: for a combination, the worked solution a reviewer can
 * follow by hand, chosen by what the beam is. Two vertical supports: statics. One fixed support:
 * statics of a cantilever. Rigid supports, constant EI, no hinges: Clapeyron's three-moment
 * equation. Anything else (springs, hinges in continuous spans, varying EI): the stiffness
 * method, stated as such. Every derivation ends with the shear and moment table by the area method.
 */
public final class Derivations {
    private Derivations() {}

    public enum Method { STATICS, CANTILEVER, THREE_MOMENT, STIFFNESS }

    public static Method methodFor(AnalysisResult result) {
        Beam beam = result.job().beam();
        boolean rigid = beam.supports().stream().noneMatch(s -> s.kind() instanceof SupportKind.Spring);
        boolean noHinges = beam.hinges().isEmpty();
        long fixed = beam.supports().stream().filter(s -> s.kind() instanceof SupportKind.Fixed).count();
        if (rigid && noHinges && beam.supports().size() == 2 && fixed == 0) {
            return Method.STATICS;
        }
        if (rigid && noHinges && beam.supports().size() == 1 && fixed == 1) {
            return Method.CANTILEVER;
        }
        boolean constantEi = true;
        double ei = result.model().ei(0);
        for (int e = 1; e < result.model().elements(); e++) {
            constantEi &= Math.abs(result.model().ei(e) - ei) <= 1e-12 * ei;
        }
        // a fixed support must be the beam's end: with an overhang beyond it the moment jumps there
        boolean fixedOnlyAtEnds = beam.supports().stream().filter(s -> s.kind() instanceof SupportKind.Fixed)
                .allMatch(s -> s.at() == 0 || s.at() == beam.length());
        boolean noCoupleOnInteriorSupports = result.loads().stream().filter(l -> l instanceof Load.Couple)
                .noneMatch(l -> beam.supports().stream().anyMatch(s -> s.at() == ((Load.Couple) l).at()));
        if (rigid && noHinges && constantEi && fixedOnlyAtEnds && noCoupleOnInteriorSupports
                && beam.supports().size() >= 2 && beam.supports().size() <= 60) {
            return Method.THREE_MOMENT;
        }
        return Method.STIFFNESS;
    }

    public static Derivation of(AnalysisResult result, CombinationResult combination) {
        List<Load> loads = FactoredLoads.of(result, combination);
        Notation n = new Notation(result);
        Steps steps = new Steps();
        Method method = methodFor(result);
        List<Derivation.Table> tables = new java.util.ArrayList<>();
        String title = switch (method) {
            case STATICS -> new StaticsDerivation(result, loads, n, steps).write();
            case CANTILEVER -> new CantileverDerivation(result, loads, n, steps).write();
            case THREE_MOMENT -> new ThreeMomentDerivation(result, loads, n, steps).write();
            case STIFFNESS -> {
                StiffnessDerivation stiffness = new StiffnessDerivation(result, combination, loads, n, steps);
                String written = stiffness.write();
                tables.addAll(stiffness.tables());
                yield written;
            }
        };
        AreaMethod area = new AreaMethod(result, combination, loads, n, steps);
        area.zeroShearSteps();
        new DeflectionSteps(result, combination, loads, n, steps).write();
        tables.add(new Derivation.Table("Shear and moment by the area method between key points", area.header(), area.rows()));
        return new Derivation(combination.name(), title, steps.list(), tables);
    }
}
