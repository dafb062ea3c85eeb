package org.beamfolio.derivation;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CaseSolver;
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
    private static final int ROWS = 40;
    /** Up to this many free unknowns, K and f are written out in full. */
    static final int WRITTEN_OUT = 8;

    private final AnalysisResult result;
    private final CombinationResult combination;
    private final List<Load> loads;
    private final Notation n;
    private final Steps steps;

    StiffnessDerivation(AnalysisResult result, CombinationResult combination, List<Load> loads, Notation n, Steps steps) {
        this.result = result;
        this.combination = combination;
        this.loads = loads;
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
        CaseSolver.LinearSystem system = CaseSolver.system(m, CaseSolver.loadsOf(m, loads));
        steps.note(system.size() <= WRITTEN_OUT
                ? "After the supports remove their unknowns, K is " + system.size() + " × " + system.size() + ": K, f and the solved d are "
                        + "written out in the table \"" + SYSTEM_TITLE + "\" below; multiplying each row of K by d gives that row's f."
                : "After the supports remove their unknowns, K is " + system.size() + " × " + system.size() + " (banded): too large to write "
                        + "out, it is solved numerically by Cholesky factorisation with iterative refinement; the solved displacements "
                        + "are tabled below.", "direct stiffness method (matrix structural analysis)");
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

    private static final String SYSTEM_TITLE = "Stiffness equations K d = f of the free unknowns";

    /**
     * K, d and f of the free unknowns in the report's force and length units: rows and columns
     * for a deflection v (up positive) and a rotation θ (counter-clockwise positive, rad); K of
     * two deflections in force per length, of a deflection and a rotation in force, of two
     * rotations in force times length; f in force (v rows) and moment (θ rows).
     */
    private Derivation.Table systemTable(StructureModel m) {
        CaseSolver.LinearSystem system = CaseSolver.system(m, CaseSolver.loadsOf(m, loads));
        double perForce = n.force.fromSi(1);
        double perLength = n.length.fromSi(1);
        Response r = combination.response();
        double[] x = m.nodePositions();
        List<String> header = new java.util.ArrayList<>();
        header.add("Unknown");
        for (int j = 0; j < system.size(); j++) {
            header.add(label(system, j));
        }
        header.add("d (" + n.xu() + ", rad)");
        header.add("f (" + n.fu() + ", " + n.mu() + ")");
        List<List<String>> rows = new java.util.ArrayList<>();
        for (int i = 0; i < system.size(); i++) {
            List<String> row = new java.util.ArrayList<>();
            row.add(label(system, i));
            for (int j = 0; j < system.size(); j++) {
                int rotations = (system.rotation()[i] ? 1 : 0) + (system.rotation()[j] ? 1 : 0);
                row.add(fmt(system.k()[i][j] * perForce * Math.pow(perLength, rotations - 1)));
            }
            double at = x[system.node()[i]];
            double d = system.rotation()[i]
                    ? ("left".equals(system.side()[i]) || system.node()[i] == x.length - 1 ? r.slope().leftOf(at) : r.slope().at(at))
                    : -r.deflection().at(at) * perLength;
            row.add(fmt(d));
            row.add(fmt(system.f()[i] * perForce * (system.rotation()[i] ? perLength : 1)));
            rows.add(row);
        }
        return new Derivation.Table(SYSTEM_TITLE + " (v up +, θ counter-clockwise +; K in " + n.fu() + "/" + n.xu() + ", " + n.fu()
                + " and " + n.mu() + ")", header, rows);
    }

    private static String label(CaseSolver.LinearSystem system, int i) {
        String side = system.side()[i].isEmpty() ? "" : (system.side()[i].equals("left") ? "L" : "R");
        return (system.rotation()[i] ? "θ" : "v") + (system.node()[i] + 1) + side;
    }

    /** K d = f written out for a small model, the equivalent nodal loads of each element and the solved displacements at each node. */
    List<Derivation.Table> tables() {
        StructureModel m = result.model();
        List<Derivation.Table> out = new java.util.ArrayList<>();
        if (CaseSolver.system(m, CaseSolver.loadsOf(m, loads)).size() <= WRITTEN_OUT) {
            out.add(systemTable(m));
        }
        CaseSolver.ElementLoads element = CaseSolver.loadsOf(m, loads);
        String f = Notation.sym(n.force);
        String mu = Notation.sym(n.moment);
        String w = Notation.sym(n.distributed);
        List<List<String>> rows = new java.util.ArrayList<>();
        double[] starts = m.elementStarts();
        double[] ends = m.elementEnds();
        for (int e = 0; e < m.elements() && rows.size() < ROWS; e++) {
            double length = ends[e] - starts[e];
            double q0 = element.q0()[e];
            double q1 = element.q1()[e];
            if (q0 == 0 && q1 == 0) {
                continue;
            }
            double[] eq = CaseSolver.equivalentLoads(length, q0, q1);
            rows.add(List.of(Integer.toString(e + 1), fmt(n.x(starts[e])) + " to " + fmt(n.x(ends[e])), fmt(n.w(q0)), fmt(n.w(q0 + q1 * length)),
                    fmt(n.f(eq[0])), fmt(n.m(eq[1])), fmt(n.f(eq[2])), fmt(n.m(eq[3]))));
        }
        Derivation.Table equivalent = new Derivation.Table("Work-equivalent nodal loads of the loaded elements (up and counter-clockwise positive)",
                List.of("Element", "x (" + n.xu() + ")", "q start (" + w + ")", "q end (" + w + ")", "F1 (" + f + ")", "M1 (" + mu + ")",
                        "F2 (" + f + ")", "M2 (" + mu + ")"), rows);
        List<List<String>> nodes = new java.util.ArrayList<>();
        Response r = combination.response();
        double[] x = m.nodePositions();
        String du = Notation.sym(n.deflection);
        for (int i = 0; i < x.length && nodes.size() < ROWS; i++) {
            nodes.add(List.of(Integer.toString(i + 1), fmt(n.x(x[i])), fmt(n.deflection.fromSi(r.deflection().at(x[i]))),
                    org.beamfolio.units.Numbers.format(i == x.length - 1 ? r.slope().leftOf(x[i]) : r.slope().at(x[i]))));
        }
        Derivation.Table displacements = new Derivation.Table("Solved nodal displacements (deflection down positive, rotation counter-clockwise)",
                List.of("Node", "x (" + n.xu() + ")", "deflection (" + du + ")", "rotation (rad)"), nodes);
        out.add(equivalent);
        out.add(displacements);
        return out;
    }

    private static String fmt(double v) {
        return org.beamfolio.units.Numbers.format(v);
    }
}
