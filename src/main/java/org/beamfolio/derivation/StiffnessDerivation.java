package org.beamfolio.derivation;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Response;
import org.beamfolio.analysis.StructureModel;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;

/**
 * Beams the three-moment equation does not cover (springs, hinges in continuous spans, varying
 * EI): the direct stiffness method, stated plainly as a matrix solution, with its unknowns, the
 * solved displacements at the supports and the reactions, which the equilibrium check then
 * tests independently.
 */
final class StiffnessDerivation {
    private final AnalysisResult result;
    private final CombinationResult combination;
    private final Notation n;
    private final Steps steps;

    StiffnessDerivation(AnalysisResult result, CombinationResult combination, List<Load> loads, Notation n, Steps steps) {
        this.result = result;
        this.combination = combination;
        this.n = n;
        this.steps = steps;
    }

    String write() {
        StructureModel m = result.model();
        steps.note("Method: direct stiffness method. The beam is divided into " + m.elements() + " Euler-Bernoulli elements with "
                + m.unknowns() + " nodal unknowns (a deflection and a rotation at each node, two rotations at a hinge). "
                + "Each element's stiffness is the standard 4 x 4 matrix EI/L^3 [12, 6L, -12, 6L; ...]; its loads enter as "
                + "work-equivalent nodal loads; springs add their stiffness to the diagonal; rigid supports remove their unknowns. "
                + "The numbers below come from the matrix solution K d = f, not from a hand method, and the equilibrium check "
                + "that follows verifies them independently.", "direct stiffness method (matrix structural analysis)");
        Response r = combination.response();
        List<Support> supports = result.job().beam().supports();
        for (int i = 0; i < supports.size(); i++) {
            Support s = supports.get(i);
            double delta = r.deflection().at(s.at());
            steps.add("Solved deflection at support " + (i + 1) + " (" + s.kind().label() + " at " + Steps.n(n.x(s.at()), n.xu()) + ")",
                    "d from K d = f", "δ" + (i + 1) + " = " + Steps.n(n.deflection.fromSi(delta), Notation.sym(n.deflection)), n.deflection.fromSi(delta),
                    Notation.sym(n.deflection),
                    "matrix solution");
            steps.add("Reaction R" + (i + 1), "R = K_r d − f_r (the restrained rows), or −k δ for a spring",
                    "R" + (i + 1) + " = " + Steps.n(n.f(r.reactionForce()[i]), n.fu())
                            + (r.reactionMoment()[i] != 0 ? " ;  M_R" + (i + 1) + " = " + Steps.n(n.m(r.reactionMoment()[i]), n.mu()) : ""),
                    n.f(r.reactionForce()[i]), n.fu(), "matrix solution");
        }
        return "Direct stiffness method (matrix solution)";
    }
}
