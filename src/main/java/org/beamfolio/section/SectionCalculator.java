package org.beamfolio.section;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;

/**
 * Computes section properties. Shapes made of rectangles (rectangle, tube, I, tee, channel,
 * plates) use the parallel axis theorem, I = sum(b h^3 / 12 + A d^2), and Q as the first moment
 * of the area above a cut; round shapes use their closed forms (I = pi d^4 / 64, Q = d^3 / 12).
 * Fillets and rounded corners are not modelled. A channel is taken about its strong axis, where
 * its plate model has the same properties as an I of the same dimensions.
 */
public final class SectionCalculator {
    private SectionCalculator() {}

    public static SectionProperties of(Section section) {
        SectionShape shape = section.shape();
        if (shape instanceof SectionShape.Circle c) {
            return round(c.d(), 0);
        }
        if (shape instanceof SectionShape.Pipe p) {
            return round(p.d(), p.d() - 2 * p.t());
        }
        if (shape instanceof SectionShape.Given g) {
            return given(g, section.flip());
        }
        if (shape instanceof SectionShape.Catalogued c) {
            return CataloguedProperties.of(c.shape(), section.flip());
        }
        return fromRects(rects(shape), section.flip());
    }

    static List<Rect> rects(SectionShape shape) {
        if (shape instanceof SectionShape.Rectangle r) {
            return List.of(new Rect(r.b(), r.h(), 0));
        }
        if (shape instanceof SectionShape.Tube t) {
            return List.of(
                    new Rect(t.b(), t.t(), 0),
                    new Rect(2 * t.t(), t.h() - 2 * t.t(), t.t()),
                    new Rect(t.b(), t.t(), t.h() - t.t()));
        }
        if (shape instanceof SectionShape.IBeam i) {
            return flanged(i.d(), i.bf(), i.tf(), i.tw());
        }
        if (shape instanceof SectionShape.Channel c) {
            return flanged(c.d(), c.bf(), c.tf(), c.tw());
        }
        if (shape instanceof SectionShape.Tee t) {
            return List.of(new Rect(t.tw(), t.d() - t.tf(), 0), new Rect(t.bf(), t.tf(), t.d() - t.tf()));
        }
        if (shape instanceof SectionShape.Plates p) {
            return p.plates().stream().map(pl -> new Rect(pl.b(), pl.h(), pl.y())).toList();
        }
        throw new IllegalArgumentException("not built of rectangles: " + shape);
    }

    private static List<Rect> flanged(double d, double bf, double tf, double tw) {
        return List.of(new Rect(bf, tf, 0), new Rect(tw, d - 2 * tf, tf), new Rect(bf, tf, d - tf));
    }

    static SectionProperties fromRects(List<Rect> input, boolean flip) {
        double depth = input.stream().mapToDouble(Rect::top).max().orElseThrow();
        List<Rect> rects = flip ? input.stream().map(r -> new Rect(r.b(), r.h(), depth - r.top())).toList() : input;
        double area = 0;
        double moment = 0;
        for (Rect r : rects) {
            area += r.area();
            moment += r.area() * r.centroid();
        }
        double yBar = moment / area;
        double inertia = 0;
        List<SectionProperties.Part> parts = new ArrayList<>();
        for (Rect r : rects) {
            double own = r.b() * r.h() * r.h() * r.h() / 12;
            double d = r.centroid() - yBar;
            double transfer = r.area() * d * d;
            inertia += own + transfer;
            parts.add(new SectionProperties.Part(r.b(), r.h(), r.y(), r.area(), r.centroid(), own, transfer));
        }
        TreeSet<Double> cuts = new TreeSet<>();
        for (Rect r : rects) {
            cuts.add(r.y());
            cuts.add(r.top());
        }
        List<SectionProperties.Junction> junctions = new ArrayList<>();
        double previous = Double.NEGATIVE_INFINITY;
        for (double cut : cuts) {
            // the top of one plate and the bottom of the next may differ by round-off only
            if (cut - previous <= 1e-9 * depth) {
                continue;
            }
            previous = cut;
            if (cut > 1e-12 * depth && cut < depth * (1 - 1e-12)) {
                double below = widthAt(rects, cut - 1e-9 * depth);
                double above = widthAt(rects, cut + 1e-9 * depth);
                if (Math.abs(below - above) > 1e-12 * depth) {
                    junctions.add(new SectionProperties.Junction(cut, firstMomentAbove(rects, cut, yBar), Math.min(below, above)));
                }
            }
        }
        return new SectionProperties(area, yBar, inertia, depth, Math.abs(firstMomentAbove(rects, yBar, yBar)),
                widthAt(rects, yBar), junctions, parts);
    }

    /** First moment, about the neutral axis at yBar, of the area above the cut at height y. */
    static double firstMomentAbove(List<Rect> rects, double y, double yBar) {
        double q = 0;
        for (Rect r : rects) {
            double bottom = Math.max(y, r.y());
            double h = r.top() - bottom;
            if (h > 0) {
                q += r.b() * h * (bottom + h / 2 - yBar);
            }
        }
        return q;
    }

    /** Width at height y: the sum of the rectangles the cut passes through (the narrower at a joint). */
    static double widthAt(List<Rect> rects, double y) {
        double width = 0;
        for (Rect r : rects) {
            if (y > r.y() && y < r.top()) {
                width += r.b();
            }
        }
        if (width == 0) {
            double below = 0;
            double above = 0;
            for (Rect r : rects) {
                if (r.top() == y) {
                    below += r.b();
                }
                if (r.y() == y) {
                    above += r.b();
                }
            }
            width = Math.min(below, above);
        }
        return width;
    }

    /** Solid (inner diameter 0) or hollow circle. */
    private static SectionProperties round(double outer, double inner) {
        double area = Math.PI / 4 * (outer * outer - inner * inner);
        double inertia = Math.PI / 64 * (Math.pow(outer, 4) - Math.pow(inner, 4));
        double q = (Math.pow(outer, 3) - Math.pow(inner, 3)) / 12;
        return new SectionProperties(area, outer / 2, inertia, outer, q, outer - inner, List.of(), List.of());
    }

    private static SectionProperties given(SectionShape.Given g, boolean flip) {
        double yBottom = flip ? g.depth() - g.yBottom() : g.yBottom();
        return new SectionProperties(g.A(), yBottom, g.I(), g.depth(), g.Q(), g.t(), List.of(), List.of());
    }
}
