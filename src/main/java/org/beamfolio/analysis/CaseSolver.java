package org.beamfolio.analysis;

import java.util.List;
import org.beamfolio.model.Load;
import org.beamfolio.model.Support;
import org.beamfolio.model.SupportKind;

/**
 * Solves one load case by the direct stiffness method on a {@link StructureModel}.
 *
 * <p>Element stiffness and consistent (work-equivalent) nodal loads are those of the cubic
 * Hermite beam element; for Euler-Bernoulli elements with polynomial loads these give the exact
 * nodal displacements. Within each element the fields then follow exactly from statics and
 * integration of the elastic curve, from the element's end forces f = k d - f_eq:
 * V(s) = F1 - integral of q, M(s) = -M1 + integral of V, slope = theta1 + integral of M / EI,
 * v = v1 + integral of the slope. Signs inside: deflection v and forces positive up, rotations
 * and couples counter-clockwise, loads q positive down; M positive sagging.
 */
public final class CaseSolver {
    private CaseSolver() {}

    /** Per element, the downward line load as q(s) = q0 + q1 s. */
    public record ElementLoads(double[] q0, double[] q1, double[] nodalForce, double[] nodalCouple) {}

    public static ElementLoads loadsOf(StructureModel m, List<Load> loads) {
        int elements = m.elements();
        double[] q0 = new double[elements];
        double[] q1 = new double[elements];
        double[] force = new double[m.x.length];
        double[] couple = new double[m.x.length];
        for (Load load : loads) {
            if (load instanceof Load.Point p) {
                force[StructureModel.nodeAt(m.x, p.at())] -= p.P();
            } else if (load instanceof Load.Couple c) {
                couple[StructureModel.nodeAt(m.x, c.at())] += c.M();
            } else if (load instanceof Load.Distributed d) {
                int first = StructureModel.nodeAt(m.x, d.from());
                int last = StructureModel.nodeAt(m.x, d.to());
                double slope = (d.wEnd() - d.wStart()) / (d.to() - d.from());
                for (int e = first; e < last; e++) {
                    q0[e] += d.intensityAt(m.x[e]);
                    q1[e] += slope;
                }
            }
        }
        return new ElementLoads(q0, q1, force, couple);
    }

    static Response solve(StructureModel m, ElementLoads loads, String name) throws BandedSolver.NotPositiveDefinite {
        BandedSolver k = new BandedSolver(m.unknowns, 4);
        double[] f = new double[m.unknowns];
        double[][] feq = assemble(m, loads, k, f);
        BandedSolver.Solution d = k.solve(f);
        return fields(m, loads, feq, d.high(), d.low(), name, d.pivotRatio());
    }

    /** Where the assembly puts the stiffness: the banded solver, or a dense matrix to be written out. */
    interface Assembly {
        void add(int i, int j, double value);

        void restrain(int i);
    }

    /**
     * Assembles K (the upper triangle, into {@code k}) and f: element stiffnesses, work-equivalent
     * nodal loads, nodal forces and couples, springs, and the rigid supports' restraints. Returns
     * each element's equivalent nodal loads.
     */
    private static double[][] assemble(StructureModel m, ElementLoads loads, Assembly k, double[] f) {
        int elements = m.elements();
        double[][] feq = new double[elements][];
        for (int e = 0; e < elements; e++) {
            int[] dofs = dofs(m, e);
            double[][] ke = stiffness(m.ei[e], m.x[e + 1] - m.x[e]);
            feq[e] = equivalentLoads(m.x[e + 1] - m.x[e], loads.q0()[e], loads.q1()[e]);
            for (int i = 0; i < 4; i++) {
                f[dofs[i]] += feq[e][i];
                for (int j = i; j < 4; j++) {
                    k.add(dofs[i], dofs[j], ke[i][j]);
                }
            }
        }
        for (int node = 0; node < m.x.length; node++) {
            f[m.v[node]] += loads.nodalForce()[node];
            // a couple at a hinge acts on the part to the right of it
            f[m.thetaRight[node]] += loads.nodalCouple()[node];
        }
        for (int s = 0; s < m.supports.size(); s++) {
            int node = m.supportNode[s];
            SupportKind kind = m.supports.get(s).kind();
            if (kind instanceof SupportKind.Spring spring) {
                k.add(m.v[node], m.v[node], spring.k());
                if (spring.kr() > 0) {
                    k.add(m.thetaLeft[node], m.thetaLeft[node], spring.kr());
                }
            } else {
                k.restrain(m.v[node]);
                if (kind instanceof SupportKind.Fixed) {
                    k.restrain(m.thetaLeft[node]);
                }
            }
        }
        return feq;
    }

    /**
     * The system K d = f of the free unknowns (SI: N, m, rad), as a dense matrix to write out for a
     * small model, with each unknown's node (0-based), whether it is a rotation, and for a
     * rotation at a hinge which side.
     */
    public record LinearSystem(double[][] k, double[] f, int[] node, boolean[] rotation, String[] side) {
        public int size() {
            return f.length;
        }
    }

    public static LinearSystem system(StructureModel m, ElementLoads loads) {
        int n = m.unknowns;
        double[][] dense = new double[n][n];
        boolean[] restrained = new boolean[n];
        double[] f = new double[n];
        assemble(m, loads, new Assembly() {
            @Override
            public void add(int i, int j, double value) {
                dense[i][j] += value;
                if (i != j) {
                    dense[j][i] += value;
                }
            }

            @Override
            public void restrain(int i) {
                restrained[i] = true;
            }
        }, f);
        int[] node = new int[n];
        boolean[] rotation = new boolean[n];
        String[] side = new String[n];
        for (int i = 0; i < m.x.length; i++) {
            node[m.v[i]] = i;
            node[m.thetaLeft[i]] = i;
            node[m.thetaRight[i]] = i;
            rotation[m.thetaLeft[i]] = true;
            rotation[m.thetaRight[i]] = true;
            boolean hinge = m.thetaLeft[i] != m.thetaRight[i];
            side[m.v[i]] = "";
            side[m.thetaLeft[i]] = hinge ? "left" : "";
            side[m.thetaRight[i]] = hinge ? "right" : "";
        }
        int free = 0;
        for (boolean r : restrained) {
            free += r ? 0 : 1;
        }
        double[][] kf = new double[free][free];
        double[] ff = new double[free];
        int[] nf = new int[free];
        boolean[] rf = new boolean[free];
        String[] sf = new String[free];
        for (int i = 0, a = 0; i < n; i++) {
            if (restrained[i]) {
                continue;
            }
            for (int j = 0, b = 0; j < n; j++) {
                if (!restrained[j]) {
                    kf[a][b++] = dense[i][j];
                }
            }
            ff[a] = f[i];
            nf[a] = node[i];
            rf[a] = rotation[i];
            sf[a] = side[i];
            a++;
        }
        return new LinearSystem(kf, ff, nf, rf, sf);
    }

    private static Response fields(StructureModel m, ElementLoads loads, double[][] feq, double[] d, double[] dLow, String name,
                                   double pivotRatio) {
        int elements = m.elements();
        Compensated[] force = new Compensated[m.x.length];
        Compensated[] couple = new Compensated[m.x.length];
        for (int i = 0; i < m.x.length; i++) {
            force[i] = new Compensated(0);
            couple[i] = new Compensated(0);
        }
        for (int e = 0; e < elements; e++) {
            double length = m.x[e + 1] - m.x[e];
            int[] dofs = dofs(m, e);
            double[][] ke = stiffness(m.ei[e], length);
            for (int i = 0; i < 4; i++) {
                Compensated sum = i % 2 == 0 ? force[i < 2 ? e : e + 1] : couple[i < 2 ? e : e + 1];
                sum.add(-feq[e][i]);
                for (int j = 0; j < 4; j++) {
                    sum.addProduct(ke[i][j], d[dofs[j]]);
                    sum.add(ke[i][j] * dLow[dofs[j]]);
                }
            }
        }
        double[] nodeForce = new double[m.x.length];
        double[] nodeCouple = new double[m.x.length];
        for (int i = 0; i < m.x.length; i++) {
            nodeForce[i] = force[i].value();
            nodeCouple[i] = couple[i].value();
        }
        int supports = m.supports.size();
        double[] reactionForce = new double[supports];
        double[] reactionMoment = new double[supports];
        double[] nodeReaction = new double[m.x.length];
        double[] nodeReactionMoment = new double[m.x.length];
        for (int s = 0; s < supports; s++) {
            int node = m.supportNode[s];
            Support support = m.supports.get(s);
            if (support.kind() instanceof SupportKind.Spring spring) {
                // a spring's force follows from its own deflection, free of the elements' cancellation
                reactionForce[s] = -spring.k() * (d[m.v[node]] + dLow[m.v[node]]);
                reactionMoment[s] = -spring.kr() * (d[m.thetaLeft[node]] + dLow[m.thetaLeft[node]]);
            } else {
                // node equilibrium: reaction + applied load = what the elements draw from the node
                reactionForce[s] = nodeForce[node] - loads.nodalForce()[node];
                if (support.kind() instanceof SupportKind.Fixed) {
                    reactionMoment[s] = nodeCouple[node] - loads.nodalCouple()[node];
                }
            }
        }
        closeByStatics(m, loads, reactionForce, reactionMoment);
        for (int s = 0; s < supports; s++) {
            nodeReaction[m.supportNode[s]] = reactionForce[s];
            nodeReactionMoment[m.supportNode[s]] = reactionMoment[s];
        }
        // Shear and moment by statics, marching from the left end with the reactions: the internal
        // forces then balance the loads exactly, even where a short stiff element makes its own end
        // forces (k d) lose digits to cancellation.
        // Flat coefficients, six to an element, integrated term by term as Polynomial.integral does.
        int stride = Field.STRIDE;
        double[] shear = new double[elements * stride];
        double[] moment = new double[elements * stride];
        double[] slope = new double[elements * stride];
        double[] deflection = new double[elements * stride];
        double v = 0;
        double mo = 0;
        for (int e = 0; e < elements; e++) {
            v += nodeReaction[e] + loads.nodalForce()[e];
            mo -= nodeReactionMoment[e] + loads.nodalCouple()[e];
            double length = m.x[e + 1] - m.x[e];
            int[] dofs = dofs(m, e);
            int b = e * stride;
            // V = v - (q0 s + q1 s^2 / 2)
            // + 0.0 turns the -0.0 of an unloaded element into 0.0, so a zero term is a plain zero
            shear[b] = v;
            shear[b + 1] = -loads.q0()[e] + 0.0;
            shear[b + 2] = -(loads.q1()[e] / 2) + 0.0;
            // M = mo + integral of V
            moment[b] = mo;
            for (int k = 0; k < 3; k++) {
                moment[b + k + 1] = shear[b + k] / (k + 1);
            }
            // slope = theta_left + integral of M / EI
            double flexibility = 1 / m.ei[e];
            slope[b] = d[dofs[1]];
            for (int k = 0; k < 4; k++) {
                slope[b + k + 1] = moment[b + k] * flexibility / (k + 1);
            }
            // deflection (downward positive) = -(v_left + integral of slope)
            deflection[b] = -d[dofs[0]];
            for (int k = 0; k < 5; k++) {
                deflection[b + k + 1] = -(slope[b + k] / (k + 1));
            }
            v = Polynomial.horner(shear, b, 2, length);
            mo = Polynomial.horner(moment, b, 3, length);
        }
        double[] starts = m.elementStarts();
        double[] ends = m.elementEnds();
        return new Response(name, reactionForce, reactionMoment, Field.of(starts, ends, shear), Field.of(starts, ends, moment),
                Field.of(starts, ends, slope), Field.of(starts, ends, deflection), pivotRatio);
    }

    /**
     * Sets the vertical reactions of the first and last supports (or the force and moment of a
     * lone support) from the two equations of global equilibrium, the other reactions being those
     * of the stiffness solution. The stiffness solution already satisfies equilibrium to its
     * round-off; this makes it exact, so the statics that follow close at the free ends.
     */
    private static void closeByStatics(StructureModel m, ElementLoads loads, double[] force, double[] moment) {
        Compensated f = new Compensated(0);
        Compensated mo = new Compensated(0);
        for (int node = 0; node < m.x.length; node++) {
            f.add(loads.nodalForce()[node]);
            mo.addProduct(loads.nodalForce()[node], m.x[node]);
            mo.add(loads.nodalCouple()[node]);
        }
        for (int e = 0; e < m.elements(); e++) {
            double length = m.x[e + 1] - m.x[e];
            double q0 = loads.q0()[e];
            double q1 = loads.q1()[e];
            double total = q0 * length + q1 * length * length / 2;
            double firstMoment = q0 * length * length / 2 + q1 * length * length * length / 3;
            f.add(-total);
            mo.addProduct(-total, m.x[e]);
            mo.add(-firstMoment);
        }
        int n = force.length;
        if (n == 1) {
            force[0] = -f.value();
            // moments about the support: the reaction force there has no arm
            moment[0] = -(mo.value() - f.value() * m.x[m.supportNode[0]]);
            return;
        }
        int a = 0;
        int b = n - 1;
        for (int s = 0; s < n; s++) {
            if (s != a && s != b) {
                f.add(force[s]);
                mo.addProduct(force[s], m.x[m.supportNode[s]]);
            }
            mo.add(moment[s]);
        }
        double xa = m.x[m.supportNode[a]];
        double xb = m.x[m.supportNode[b]];
        // R_a + R_b = -F;  R_a xa + R_b xb = -M
        double rb = (-mo.value() + f.value() * xa) / (xb - xa);
        force[b] = rb;
        force[a] = -f.value() - rb;
    }

    private static int[] dofs(StructureModel m, int e) {
        return new int[] {m.v[e], m.thetaRight[e], m.v[e + 1], m.thetaLeft[e + 1]};
    }

    static double[][] stiffness(double ei, double l) {
        double a = ei / (l * l * l);
        return new double[][] {
            {12 * a, 6 * l * a, -12 * a, 6 * l * a},
            {6 * l * a, 4 * l * l * a, -6 * l * a, 2 * l * l * a},
            {-12 * a, -6 * l * a, 12 * a, -6 * l * a},
            {6 * l * a, 2 * l * l * a, -6 * l * a, 4 * l * l * a}
        };
    }

    /**
     * Work-equivalent nodal loads (up and counter-clockwise positive) of a downward load
     * q0 + q1 s: minus the integral of each Hermite shape function times q.
     */
    public static double[] equivalentLoads(double l, double q0, double q1) {
        if (q0 == 0 && q1 == 0) {
            // minus a zero integral, signed as the general case below gives it
            return new double[] {-0.0, -0.0, -0.0, -0.0};
        }
        double[][] shape = {
            {1, 0, -3 / (l * l), 2 / (l * l * l)},
            {0, 1, -2 / l, 1 / (l * l)},
            {0, 0, 3 / (l * l), -2 / (l * l * l)},
            {0, 0, -1 / l, 1 / (l * l)}
        };
        double[] q = q1 != 0 ? new double[] {q0, q1} : new double[] {q0};
        double[] result = new double[4];
        double[] product = new double[5];
        for (int i = 0; i < 4; i++) {
            java.util.Arrays.fill(product, 0.0);
            for (int a = 0; a < 4; a++) {
                for (int j = 0; j < q.length; j++) {
                    product[a + j] = product[a + j] + shape[i][a] * q[j];
                }
            }
            // the integral of N_i q from 0 to l, by Horner's rule on its antiderivative
            double value = 0;
            for (int k = product.length - 1; k >= 0; k--) {
                value = value * l + product[k] / (k + 1);
            }
            result[i] = -(value * l + 0.0);
        }
        return result;
    }
}
