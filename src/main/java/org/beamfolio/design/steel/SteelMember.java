package org.beamfolio.design.steel;

import org.beamfolio.catalogue.Shape;
import org.beamfolio.catalogue.SteelGrade;

/**
 * A catalogue shape of a steel with its yield and tensile strengths and E (SI), to an edition of
 * AISC 360: what every limit state reads.
 */
public record SteelMember(Shape shape, double fy, double fu, double e, Edition edition) {
    public SteelMember {
        if (!(fy > 0) || !(fu >= fy) || !(e > 0)) {
            throw new IllegalArgumentException(shape + ": Fy, Fu and E must be positive with Fu >= Fy, got Fy = "
                    + fy + " Pa, Fu = " + fu + " Pa, E = " + e + " Pa");
        }
    }

    /** The shape in a grade: Fy for its family (A500 Grade C differs for round HSS), Fu and E of the grade. */
    public static SteelMember of(Shape shape, SteelGrade grade, Edition edition) {
        return new SteelMember(shape, grade.fy(shape.family()), grade.fu(), grade.elasticModulus(), edition);
    }

    /**
     * The shape in a job's material: Fy and Fu as the engineer gave them, else from the material's
     * grade (for the shape's family); E of the material.
     *
     * @throws IllegalArgumentException when neither the material nor its grade gives Fy or Fu
     */
    public static SteelMember of(Shape shape, org.beamfolio.model.Material material, Edition edition) {
        var grade = material.grade() == null ? java.util.Optional.<SteelGrade>empty() : SteelGrade.find(material.grade());
        Double fy = material.yieldStress() != null ? material.yieldStress()
                : grade.map(g -> g.fy(shape.family())).orElse(null);
        Double fu = material.tensileStrength() != null ? material.tensileStrength() : grade.map(SteelGrade::fu).orElse(null);
        if (fy == null || fu == null) {
            throw new IllegalArgumentException("material " + material.id() + " gives no " + (fy == null ? "Fy" : "Fu")
                    + " and names no steel grade");
        }
        return new SteelMember(shape, fy, fu, material.elasticModulus(), edition);
    }

    /** Sqrt(E/Fy), the root of most slenderness limits. */
    double rootEOverFy() {
        return Math.sqrt(e / fy);
    }
}
