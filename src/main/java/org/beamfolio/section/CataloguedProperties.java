package org.beamfolio.section;

import static org.beamfolio.catalogue.ShapeProperty.A;
import static org.beamfolio.catalogue.ShapeProperty.B;
import static org.beamfolio.catalogue.ShapeProperty.BF;
import static org.beamfolio.catalogue.ShapeProperty.D;
import static org.beamfolio.catalogue.ShapeProperty.HT;
import static org.beamfolio.catalogue.ShapeProperty.IX;
import static org.beamfolio.catalogue.ShapeProperty.OD;
import static org.beamfolio.catalogue.ShapeProperty.QF;
import static org.beamfolio.catalogue.ShapeProperty.QW;
import static org.beamfolio.catalogue.ShapeProperty.TDES;
import static org.beamfolio.catalogue.ShapeProperty.TF;
import static org.beamfolio.catalogue.ShapeProperty.TW;
import static org.beamfolio.catalogue.ShapeProperty.Y_BAR;

import java.util.List;
import org.beamfolio.catalogue.Shape;
import org.beamfolio.model.SectionShape;

/**
 * The elastic properties of a catalogue shape about its major axis from the table, not from a
 * plate model: A and Ix as tabulated (so analysis uses the catalogue's Ix, fillets included).
 * For the shear stress, I-shapes and channels use the tabulated Qw at mid-depth and Qf at the
 * flange-web junction with the web thickness; tees, HSS and pipe, for which the database gives no
 * Q, take Q of the plate or tube model of their tabulated dimensions (design thickness for HSS).
 * A tee's flange is at the top unless flipped (as the format's tee), its centroid y below the
 * flange face.
 */
final class CataloguedProperties {
    private CataloguedProperties() {}

    static SectionProperties of(Shape s, boolean flip) {
        double area = s.get(A);
        double ix = s.get(IX);
        return switch (s.family().kind()) {
            case I_SHAPE, CHANNEL -> {
                double d = s.get(D);
                double tw = s.get(TW);
                var junctions = List.of(new SectionProperties.Junction(s.get(TF), s.get(QF), tw),
                        new SectionProperties.Junction(d - s.get(TF), s.get(QF), tw));
                yield new SectionProperties(area, d / 2, ix, d, s.get(QW), tw, junctions, List.of());
            }
            case TEE -> {
                double d = s.get(D);
                double yBottom = flip ? s.get(Y_BAR) : d - s.get(Y_BAR);
                SectionProperties plates = SectionCalculator.fromRects(SectionCalculator.rects(
                        new SectionShape.Tee(d, s.get(BF),
                                s.get(TF), s.get(TW))), flip);
                yield new SectionProperties(area, yBottom, ix, d, plates.qNeutral(), plates.tNeutral(),
                        plates.junctions(), List.of());
            }
            case RECTANGULAR_HSS -> {
                double h = s.get(HT);
                SectionProperties tube = SectionCalculator.fromRects(SectionCalculator.rects(
                        new SectionShape.Tube(s.get(B), h,
                                s.get(TDES))), false);
                yield new SectionProperties(area, h / 2, ix, h, tube.qNeutral(), tube.tNeutral(), tube.junctions(),
                        List.of());
            }
            case ROUND_HSS -> {
                double od = s.get(OD);
                double id = od - 2 * s.get(TDES);
                double q = (Math.pow(od, 3) - Math.pow(id, 3)) / 12;
                yield new SectionProperties(area, od / 2, ix, od, q, od - id, List.of(), List.of());
            }
        };
    }
}
