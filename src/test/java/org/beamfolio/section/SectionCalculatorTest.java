package org.beamfolio.section;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Section properties against closed forms (any mechanics of materials text, e.g. Gere and
 * Goodno, Mechanics of Materials, appendix of plane-area properties), a rolled shape against the
 * AISC Manual, and a built-up tee computed by hand here.
 */
class SectionCalculatorTest {
    static final double MM = 1e-3;

    static SectionProperties of(SectionShape shape, boolean flip) {
        return SectionCalculator.of(new Section("x", shape, flip));
    }

    static void near(double expected, double actual) {
        assertEquals(expected, actual, 1e-12 * Math.abs(expected));
    }

    @Test
    void rectangle() {
        // A = bh, I = bh^3/12, Q at the neutral axis = bh^2/8, width there b
        double b = 0.2;
        double h = 0.4;
        SectionProperties p = of(new SectionShape.Rectangle(b, h), false);
        near(b * h, p.area());
        near(b * h * h * h / 12, p.inertia());
        near(b * h * h / 8, p.qNeutral());
        near(b, p.tNeutral());
        near(h / 2, p.yBottom());
    }

    @Test
    void circleAndPipe() {
        // I = pi d^4 / 64, Q = d^3 / 12 for a solid circle; hollow: differences of the two
        double d = 0.3;
        SectionProperties c = of(new SectionShape.Circle(d), false);
        near(Math.PI * Math.pow(d, 4) / 64, c.inertia());
        near(d * d * d / 12, c.qNeutral());
        double t = 0.01;
        double di = d - 2 * t;
        SectionProperties p = of(new SectionShape.Pipe(d, t), false);
        near(Math.PI * (Math.pow(d, 4) - Math.pow(di, 4)) / 64, p.inertia());
        near((d * d * d - di * di * di) / 12, p.qNeutral());
        near(2 * t, p.tNeutral());
    }

    @Test
    void tube() {
        // rectangular hollow section, square corners: I = (b h^3 - (b - 2t)(h - 2t)^3) / 12
        double b = 0.1;
        double h = 0.2;
        double t = 0.008;
        SectionProperties p = of(new SectionShape.Tube(b, h, t), false);
        near((b * h * h * h - (b - 2 * t) * Math.pow(h - 2 * t, 3)) / 12, p.inertia());
        near(b * h - (b - 2 * t) * (h - 2 * t), p.area());
    }

    @Test
    void rolledWideFlangeAgainstTheManual() {
        // W14x22, AISC Steel Construction Manual Table 1-1 (values from memory): d = 13.7 in,
        // bf = 5.00 in, tf = 0.335 in, tw = 0.230 in; A = 6.49 in^2, Ix = 199 in^4. The plate
        // model leaves out the web-to-flange fillets, so it comes out low: within 5 % here.
        double in = Units.INCH;
        SectionProperties p = of(new SectionShape.IBeam(13.7 * in, 5.00 * in, 0.335 * in, 0.230 * in), false);
        assertEquals(6.49, p.area() / (in * in), 0.05 * 6.49);
        assertEquals(199, p.inertia() / Math.pow(in, 4), 0.05 * 199);
        assertEquals(13.7 / 2, p.yBottom() / in, 1e-12);
    }

    @Test
    void builtUpTeeByHand() {
        // Flange 200 x 20 mm on a stem 10 x 180 mm, worked by hand with the parallel axis theorem:
        // A = 4000 + 1800 = 5800 mm^2; y = (1800 * 90 + 4000 * 190) / 5800 = 158.9655 mm
        // I = 10*180^3/12 + 1800*(90 - y)^2 + 200*20^3/12 + 4000*(190 - y)^2
        // Q above the neutral axis = 4000*(190 - y) + 10*(180 - y)^2/2
        double y = (1800 * 90.0 + 4000 * 190.0) / 5800;
        double i = 10 * Math.pow(180, 3) / 12 + 1800 * Math.pow(90 - y, 2) + 200 * Math.pow(20, 3) / 12 + 4000 * Math.pow(190 - y, 2);
        double q = 4000 * (190 - y) + 10 * Math.pow(180 - y, 2) / 2;
        SectionProperties p = of(new SectionShape.Tee(200 * MM, 200 * MM, 20 * MM, 10 * MM), false);
        near(5800 * MM * MM, p.area());
        near(y * MM, p.yBottom());
        near(i * Math.pow(MM, 4), p.inertia());
        near(q * Math.pow(MM, 3), p.qNeutral());
        near(10 * MM, p.tNeutral());
        // the junction under the flange: Q of the flange alone, the stem's width
        SectionProperties.Junction j = p.junctions().get(0);
        near(180 * MM, j.height());
        near(4000 * (190 - y) * Math.pow(MM, 3), j.q());
        near(10 * MM, j.width());
        List<SectionProperties.Part> parts = p.parts();
        assertEquals(2, parts.size());
        SectionProperties flipped = of(new SectionShape.Tee(200 * MM, 200 * MM, 20 * MM, 10 * MM), true);
        near((200 - y) * MM, flipped.yBottom());
        near(p.inertia(), flipped.inertia());
    }

    @Test
    void dressedLumberAgainstTheNdsSupplement() {
        // NDS Supplement (2018), Table 1B, section properties of dressed sawn lumber (values from
        // memory): 2x10 (1.5 x 9.25 in) A = 13.88 in^2, Sx = 21.39 in^3, Ix = 98.93 in^4;
        // 4x12 (3.5 x 11.25 in) A = 39.38 in^2, Sx = 73.83 in^3, Ix = 415.3 in^4. The table rounds.
        double in = Units.INCH;
        SectionProperties joist = of(new SectionShape.Rectangle(1.5 * in, 9.25 * in), false);
        assertEquals(13.88, joist.area() / (in * in), 0.0051);
        assertEquals(21.39, joist.sBottom() / Math.pow(in, 3), 0.0051);
        assertEquals(98.93, joist.inertia() / Math.pow(in, 4), 0.0051);
        SectionProperties beam = of(new SectionShape.Rectangle(3.5 * in, 11.25 * in), false);
        assertEquals(39.38, beam.area() / (in * in), 0.0051);
        assertEquals(73.83, beam.sTop() / Math.pow(in, 3), 0.0051);
        assertEquals(415.3, beam.inertia() / Math.pow(in, 4), 0.05);
    }

    @Test
    void shearStressCanGovernAtTheJunctionOfAThinStem() {
        // Flange 300 x 60 mm on a 6 x 60 mm stem: the neutral axis lies in the flange, where the
        // width is 300 mm, so V Q / (I t) is larger at the flange-stem junction (width 6 mm).
        // By hand: A = 18000 + 360 = 18360 mm^2, y = (360 * 30 + 18000 * 90) / 18360 = 88.82 mm;
        // Q at the junction (y = 60 mm, area above it is the flange) = 18000 * (90 - y).
        SectionProperties p = of(new SectionShape.Tee(120 * MM, 300 * MM, 60 * MM, 6 * MM), false);
        double y = (360 * 30.0 + 18000 * 90.0) / 18360;
        near(y * MM, p.yBottom());
        double qJunction = 18000 * (90 - y) * Math.pow(MM, 3);
        assertEquals(true, p.shearGovernsAtJunction());
        near(qJunction / (p.inertia() * 6 * MM), p.shearStressFactor());
    }

    @Test
    void platesMatchTheSameShapeBuiltIn() {
        // an I built of three plates is the I shape (same rectangles)
        SectionProperties plates = of(new SectionShape.Plates(List.of(
                new SectionShape.Plate(0.15, 0.012, 0), new SectionShape.Plate(0.008, 0.276, 0.012),
                new SectionShape.Plate(0.15, 0.012, 0.288))), false);
        SectionProperties shape = of(new SectionShape.IBeam(0.3, 0.15, 0.012, 0.008), false);
        near(shape.inertia(), plates.inertia());
        near(shape.qNeutral(), plates.qNeutral());
    }
}
