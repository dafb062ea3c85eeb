package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.ZX;
import static org.beamfolio.design.steel.Us.FT;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.beamfolio.catalogue.Shape;
import org.beamfolio.catalogue.ShapeCatalogue;
import org.beamfolio.catalogue.ShapeFamily;
import org.beamfolio.catalogue.SteelGrade;
import org.junit.jupiter.api.Test;

/**
 * Rules every flexural strength obeys, over every shape of the catalogue in its usual grade (AISC
 * Manual 15th edition Table 2-4, common practice: A992 for W, A36 for M, S, HP, channels and
 * tees cut from them, A500 Grade C for HSS, A53 Grade B for pipe), the editions in turn, and both tee
 * orientations: Mn never exceeds Mp = Fy Zx (F2-1, F7-1, F8-1, and F9-2's cap); Mn does not
 * increase as Lb grows; a larger Cb never lowers Mn; available strengths relate by phi Omega.
 */
class SteelDesignPropertiesTest {
    static final double[] LENGTHS_FT = {0, 2, 4, 6, 8, 10, 13, 16, 20, 25, 30, 40, 60, 80};

    static SteelGrade usualGrade(ShapeFamily f) {
        return switch (f) {
            case W, WT -> SteelGrade.A992;
            case HSS_RECTANGULAR, HSS_ROUND -> SteelGrade.A500C;
            case PIPE -> SteelGrade.A53B;
            default -> SteelGrade.A36;
        };
    }

    /** Every shape in its usual grade, the editions taken in turn (they differ only in notes for these rules). */
    static List<SteelMember> members() {
        List<SteelMember> all = new ArrayList<>();
        Edition[] editions = Edition.values();
        List<Shape> shapes = ShapeCatalogue.aisc().shapes();
        for (int i = 0; i < shapes.size(); i++) {
            Shape s = shapes.get(i);
            SteelGrade g = usualGrade(s.family());
            all.add(new SteelMember(s, g.fy(s.family()), g.fu(), g.elasticModulus(), editions[i % editions.length]));
        }
        return all;
    }

    @Test
    void mnNeverExceedsMpNeverRisesWithLbAndNeverFallsWithCb() {
        int checked = 0;
        for (SteelMember m : members()) {
            if (Flexure.outOfScope(m).isPresent()) {
                continue;
            }
            double mp = m.fy() * m.shape().get(ZX);
            for (boolean stemDown : new boolean[] {false, true}) {
                if (stemDown && m.shape().family().kind() != ShapeFamily.Kind.TEE) {
                    continue;
                }
                double[] previous = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
                double[] cbs = {1.0, 2.3};
                for (double lbFt : LENGTHS_FT) {
                    double[] mn = new double[2];
                    for (int k = 0; k < 2; k++) {
                        mn[k] = Flexure.strength(m, new FlexureCase(lbFt * FT, cbs[k], stemDown)).nominal();
                        String where = m.shape() + " " + m.edition().label() + " Lb = " + lbFt + " ft, Cb = " + cbs[k]
                                + (stemDown ? ", stem in compression" : "");
                        assertTrue(mn[k] > 0, where);
                        assertTrue(mn[k] <= mp * (1 + 1e-12), where + ": Mn = " + mn[k] + " > Mp = " + mp);
                        assertTrue(mn[k] <= previous[k] * (1 + 1e-12), where + ": Mn rose from " + previous[k] + " to " + mn[k]);
                        previous[k] = mn[k];
                        checked++;
                    }
                    assertTrue(mn[1] >= mn[0] * (1 - 1e-12), m.shape() + " Lb = " + lbFt + " ft: a larger Cb lowered Mn");
                }
            }
        }
        assertTrue(checked > 30_000, "checked " + checked);
    }

    @Test
    void asdAndLrfdRatiosRelateByTheLoadFactors() {
        // ASCE 7-22 2.3.1 combination 2 (1.2 D + 1.6 L) and 2.4.1 combination 2 (D + L); AISC 360
        // B3.1, B3.2: phi Mn against Mu, Mn / Omega against Ma. So ratio_LRFD / ratio_ASD =
        // (1.2 D + 1.6 L) / (D + L) / (phi Omega), phi Omega = 0.90 x 1.67 for flexure.
        Random random = new Random(360);
        List<SteelMember> all = members();
        for (int trial = 0; trial < 500; trial++) {
            SteelMember m = all.get(random.nextInt(all.size()));
            if (Flexure.outOfScope(m).isPresent()) {
                continue;
            }
            Strength s = Flexure.strength(m, FlexureCase.unbraced(random.nextDouble() * 40 * FT, 1 + random.nextDouble()));
            double dead = random.nextDouble() * 1e5;
            double live = random.nextDouble() * 1e5;
            double asd = s.ratio(dead + live, Method.ASD);
            double lrfd = s.ratio(1.2 * dead + 1.6 * live, Method.LRFD);
            double expected = (1.2 * dead + 1.6 * live) / (dead + live) / (0.90 * 1.67);
            assertEquals(expected, lrfd / asd, 1e-12 * expected, "trial " + trial + ", " + m.shape());
        }
    }

    @Test
    void everyEquationPrintsWithItsNumbersAndNoPlaceholderLeft() {
        for (SteelMember m : members()) {
            if (Flexure.outOfScope(m).isPresent()) {
                continue;
            }
            List<Strength> strengths = new ArrayList<>();
            strengths.add(Flexure.strength(m, FlexureCase.unbraced(15 * FT, 1.1)));
            strengths.add(Shear.strength(m, 10 * FT));
            for (Strength s : strengths) {
                assertTrue(s.evaluated().stream().anyMatch(LimitStateResult::applies));
                for (LimitStateResult r : s.evaluated()) {
                    assertFalse(r.clause().toString().isBlank());
                    for (Equation e : r.equations()) {
                        String printed = e.substituted(v -> String.format(java.util.Locale.ROOT, "%.6g", v.value()));
                        assertFalse(printed.contains("{") || e.symbolic().contains("{"), e.template());
                        assertTrue(Double.isFinite(e.value()), m.shape() + " " + e.result().symbol() + " = " + e.symbolic());
                    }
                }
            }
        }
    }
}
