package org.beamfolio.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Hinge;
import org.beamfolio.model.Load;
import org.beamfolio.model.Material;
import org.beamfolio.model.Segment;
import org.beamfolio.model.Support;
import org.beamfolio.section.SectionProperties;

/**
 * The beam as a chain of Euler-Bernoulli elements. A node stands at each end, support, hinge,
 * point load, couple, line-load start and end, and section or material change, so that within an
 * element EI is constant and the load is a single linear function: the element solution is then
 * exact. Each node has a deflection unknown and a rotation unknown; a hinge node has two rotation
 * unknowns, one for each side. Unknowns are numbered left to right, so the stiffness matrix is
 * banded.
 */
public final class StructureModel {
    final double[] x;
    final int[] v;
    final int[] thetaLeft;
    final int[] thetaRight;
    final int unknowns;
    /** Per element: EI, section properties, section and material ids. */
    final double[] ei;
    final SectionProperties[] sections;
    final String[] sectionIds;
    final String[] materialIds;
    final int[] supportNode;
    final List<Support> supports;

    private StructureModel(double[] x, int[] v, int[] thetaLeft, int[] thetaRight, int unknowns, double[] ei,
                           SectionProperties[] sections, String[] sectionIds, String[] materialIds,
                           int[] supportNode, List<Support> supports) {
        this.x = x;
        this.v = v;
        this.thetaLeft = thetaLeft;
        this.thetaRight = thetaRight;
        this.unknowns = unknowns;
        this.ei = ei;
        this.sections = sections;
        this.sectionIds = sectionIds;
        this.materialIds = materialIds;
        this.supportNode = supportNode;
        this.supports = supports;
    }

    public int elements() {
        return x.length - 1;
    }

    public double[] nodePositions() {
        return x.clone();
    }

    public double[] elementStarts() {
        return java.util.Arrays.copyOf(x, x.length - 1);
    }

    public double[] elementEnds() {
        return java.util.Arrays.copyOfRange(x, 1, x.length);
    }

    public SectionProperties section(int element) {
        return sections[element];
    }

    public String sectionId(int element) {
        return sectionIds[element];
    }

    public String materialId(int element) {
        return materialIds[element];
    }

    /** How many unknown displacements and rotations the model has (before supports restrain them). */
    public int unknowns() {
        return unknowns;
    }

    public double ei(int element) {
        return ei[element];
    }

    /** The element that holds x (the one to the right at a node). */
    public int elementAt(double at) {
        int node = nodeAt(x, at);
        int e = x[node] <= at ? node : node - 1;
        return Math.max(0, Math.min(elements() - 1, e));
    }

    public List<Support> supports() {
        return supports;
    }

    static StructureModel build(Beam beam, List<Load> loads, Map<String, SectionProperties> properties,
                                Map<String, Material> materials) {
        double length = beam.length();
        double tolerance = 1e-9 * length;
        TreeSet<Double> points = new TreeSet<>();
        points.add(0.0);
        points.add(length);
        beam.supports().forEach(s -> points.add(s.at()));
        beam.hinges().forEach(h -> points.add(h.at()));
        for (Segment s : beam.segments()) {
            points.add(s.from());
            points.add(s.to());
        }
        for (Load load : loads) {
            points.addAll(load.positions());
        }
        List<Double> merged = new ArrayList<>();
        for (double p : points) {
            if (merged.isEmpty() || p - merged.get(merged.size() - 1) > tolerance) {
                merged.add(p);
            }
        }
        if (length - merged.get(merged.size() - 1) > 0) {
            merged.set(merged.size() - 1, length);
        }
        double[] x = merged.stream().mapToDouble(Double::doubleValue).toArray();
        int n = x.length;
        boolean[] hinged = new boolean[n];
        for (Hinge h : beam.hinges()) {
            hinged[nodeAt(x, h.at())] = true;
        }
        int[] v = new int[n];
        int[] thetaLeft = new int[n];
        int[] thetaRight = new int[n];
        int next = 0;
        for (int i = 0; i < n; i++) {
            v[i] = next++;
            thetaLeft[i] = next++;
            thetaRight[i] = hinged[i] ? next++ : thetaLeft[i];
        }
        int elements = n - 1;
        double[] ei = new double[elements];
        SectionProperties[] sections = new SectionProperties[elements];
        String[] sectionIds = new String[elements];
        String[] materialIds = new String[elements];
        for (int e = 0; e < elements; e++) {
            double mid = 0.5 * (x[e] + x[e + 1]);
            String section = beam.sectionAt(mid);
            String material = beam.materialAt(mid);
            sectionIds[e] = section;
            materialIds[e] = material;
            sections[e] = properties.get(section);
            ei[e] = materials.get(material).elasticModulus() * sections[e].inertia();
        }
        int[] supportNode = new int[beam.supports().size()];
        for (int s = 0; s < supportNode.length; s++) {
            supportNode[s] = nodeAt(x, beam.supports().get(s).at());
        }
        return new StructureModel(x, v, thetaLeft, thetaRight, next, ei, sections, sectionIds, materialIds,
                supportNode, beam.supports());
    }

    /** The node nearest to a position (every feature was given a node when the model was built). */
    static int nodeAt(double[] x, double at) {
        int i = java.util.Arrays.binarySearch(x, at);
        if (i >= 0) {
            return i;
        }
        int insertion = -i - 1;
        if (insertion == 0) {
            return 0;
        }
        if (insertion == x.length) {
            return x.length - 1;
        }
        return at - x[insertion - 1] <= x[insertion] - at ? insertion - 1 : insertion;
    }
}
