package org.beamfolio.report.drawing;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Arc2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * The beam to scale with its supports drawn by kind, its hinges, and the loads of one case, each
 * labelled with its value. Line loads are bands whose height is to one scale for the whole
 * diagram (a 7.8 kN/m peak is drawn 4.9 times as tall as 1.6 kN/m); line loads that share a
 * stretch are stacked, not overlapped. Point forces stand on top of the bands at their place;
 * couples are curved arrows in their sense. Labels are placed where they overlap neither another
 * label nor a band ({@link #layout}, which the tests check on the drawing's own geometry).
 */
public final class LoadingDiagram implements Drawing {
    private static final double MARGIN = 36;
    private static final double ROW = 9;
    /** Room above the bands for point-load shafts and labels. */
    private static final double HEADROOM = 30;

    private final BeamSketch sketch;

    public LoadingDiagram(BeamSketch sketch) {
        this.sketch = sketch;
    }

    /** Where everything goes: each band (a closed outline), each label's box and baseline, each point arrow. */
    public record Layout(double beamY, double scale, List<Band> bands, List<Label> labels, List<Arrow> arrows) {}

    /**
     * A line load's outline, and its bottom and top (page y) at the points xs along it, where a
     * point repeats at a jump of the stack below.
     */
    public record Band(Path2D outline, double[] xs, double[] bottoms, double[] tops, boolean upward) {
        double x0() {
            return xs[0];
        }

        double x1() {
            return xs[xs.length - 1];
        }

        /** Bottom (which 0) or top (which 1) at x, the right-hand value at a jump. */
        double at(double x, int which) {
            double[] y = which == 0 ? bottoms : tops;
            for (int k = xs.length - 1; k > 0; k--) {
                if (x >= xs[k - 1] && xs[k] > xs[k - 1] && x <= xs[k]) {
                    return y[k - 1] + (y[k] - y[k - 1]) * (x - xs[k - 1]) / (xs[k] - xs[k - 1]);
                }
            }
            return y[0];
        }
    }

    /**
     * Line load i on those before it, in units of intensity: the points along it (a point twice
     * where a load below starts or ends), the bottom there (the sum of the loads below) and the top.
     */
    private static double[][] profile(List<BeamSketch.LoadMark> lines, int i) {
        BeamSketch.LoadMark l = lines.get(i);
        java.util.TreeSet<Double> breaks = new java.util.TreeSet<>(List.of(l.from(), l.to()));
        for (int j = 0; j < i; j++) {
            for (double x : new double[] {lines.get(j).from(), lines.get(j).to()}) {
                if (x > l.from() && x < l.to()) {
                    breaks.add(x);
                }
            }
        }
        List<double[]> points = new ArrayList<>();
        for (double x : breaks) {
            for (int side : new int[] {-1, 1}) {
                if ((x == l.from() && side < 0) || (x == l.to() && side > 0)) {
                    continue;
                }
                double below = 0;
                for (int j = 0; j < i; j++) {
                    below += intensity(lines.get(j), x, side);
                }
                points.add(new double[] {x, below, below + intensity(l, x, x == l.to() ? -1 : 1)});
            }
        }
        double[][] out = new double[3][points.size()];
        for (int k = 0; k < points.size(); k++) {
            for (int c = 0; c < 3; c++) {
                out[c][k] = points.get(k)[c];
            }
        }
        return out;
    }

    /** The magnitude of a line load at x, approached from the left (side -1) or the right (+1); zero outside it. */
    private static double intensity(BeamSketch.LoadMark l, double x, int side) {
        boolean inside = side < 0 ? x > l.from() && x <= l.to() : x >= l.from() && x < l.to();
        if (!inside) {
            return 0;
        }
        double t = l.to() == l.from() ? 0 : (x - l.from()) / (l.to() - l.from());
        return Math.abs(l.start() + (l.end() - l.start()) * t);
    }

    public record Label(String text, Rectangle2D box, float x, float baseline) {}

    public record Arrow(double x, double top, double tip, boolean upward) {
        /** The shaft and head as a thin box, for keeping labels off it. */
        public Rectangle2D shaft() {
            return new Rectangle2D.Double(x - 3, Math.min(top, tip), 6, Math.abs(tip - top));
        }
    }

    /** Horizontal clearance between two labels, so that two values never read as one. */
    static final double GAP = 6;

    public Layout layout(double width, double height, FontMetrics fm) {
        double left = MARGIN;
        double right = width - MARGIN;
        // below the beam: support symbols and labels (to y + 24) and the length dimension line
        double beamY = height - 40;
        double scale = (right - left) / sketch.length();
        List<BeamSketch.LoadMark> lines = sketch.loads().stream().filter(l -> l.kind() == BeamSketch.LoadMark.Kind.LINE).toList();
        // each line load stands on the ones before it that share its stretch, following their
        // outline, so that the top of the stack is the sum of the intensities: one scale for all
        List<double[][]> profiles = new ArrayList<>();
        double required = 0;
        for (int i = 0; i < lines.size(); i++) {
            double[][] p = profile(lines, i);
            profiles.add(p);
            for (double top : p[2]) {
                required = Math.max(required, top);
            }
        }
        double available = beamY - 3 - HEADROOM;
        double perUnit = required == 0 ? 0 : available / required;
        List<Band> bands = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            BeamSketch.LoadMark l = lines.get(i);
            double[][] p = profiles.get(i);
            int n = p[0].length;
            double[] xs = new double[n];
            double[] bottoms = new double[n];
            double[] tops = new double[n];
            Path2D band = new Path2D.Double();
            for (int k = 0; k < n; k++) {
                xs[k] = left + p[0][k] * scale;
                bottoms[k] = beamY - 3 - p[1][k] * perUnit;
                tops[k] = beamY - 3 - p[2][k] * perUnit;
                if (k == 0) {
                    band.moveTo(xs[k], bottoms[k]);
                }
                band.lineTo(xs[k], tops[k]);
            }
            for (int k = n - 1; k >= 0; k--) {
                band.lineTo(xs[k], bottoms[k]);
            }
            band.closePath();
            bands.add(new Band(band, xs, bottoms, tops, l.start() < 0 && l.end() < 0));
        }
        List<Label> labels = new ArrayList<>();
        List<Arrow> arrows = new ArrayList<>();
        double ascent = fm.getAscent();
        double descent = fm.getDescent();
        // the arrows first, so that no label is put where an arrow's shaft will be drawn
        for (BeamSketch.LoadMark l : sketch.loads()) {
            if (l.kind() == BeamSketch.LoadMark.Kind.POINT) {
                double x0 = left + l.from() * scale;
                double tip = stackTop(bands, x0, beamY - 3);
                arrows.add(new Arrow(x0, tip - 16, tip, l.start() < 0));
            }
        }
        int lineIndex = 0;
        int pointIndex = 0;
        for (BeamSketch.LoadMark l : sketch.loads()) {
            double x0 = left + l.from() * scale;
            double w = fm.stringWidth(l.label());
            switch (l.kind()) {
                case LINE -> {
                    Band b = bands.get(lineIndex++);
                    double top = b.outline().getBounds2D().getMinY() - 3;
                    labels.add(place(l.label(), (b.x0() + b.x1()) / 2 - w / 2, top, w, ascent, descent, width, bands, arrows, labels));
                }
                case POINT -> {
                    Arrow a = arrows.get(pointIndex++);
                    labels.add(place(l.label(), x0 + 3, a.top() + ascent, w, ascent, descent, width, bands, arrows, labels));
                }
                case COUPLE_CCW, COUPLE_CW -> labels.add(place(l.label(), x0 + 12, beamY - 12, w, ascent, descent, width, bands,
                        arrows, labels));
                default -> throw new IllegalStateException();
            }
        }
        return new Layout(beamY, scale, bands, labels, arrows);
    }

    private static double peak(BeamSketch.LoadMark l) {
        return Math.max(Math.abs(l.start()), Math.abs(l.end()));
    }

    /** The top of the bands at x (the beam's top where there is none). */
    private static double stackTop(List<Band> bands, double x, double beamTop) {
        double top = beamTop;
        for (Band b : bands) {
            if (x >= b.x0() && x <= b.x1()) {
                top = Math.min(top, b.at(x, 1));
            }
        }
        return top;
    }

    /**
     * A label at the first of these places that overlaps no band and no label placed before it:
     * where it belongs, then a row higher each time, then the same rows moved along by half its
     * width at a time, up to four widths either way. The first place if none is free.
     */
    private static Label place(String text, double x, double baseline, double w, double ascent, double descent, double width,
                               List<Band> bands, List<Arrow> arrows, List<Label> placed) {
        Label first = null;
        for (double shift : new double[] {0, -0.5, 0.5, -1, 1, -1.5, 1.5, -2, 2, -3, 3, -4, 4}) {
            for (int row = 0; row < 8; row++) {
                double lx = Math.max(2, Math.min(width - w - 2, x + shift * w));
                double ly = baseline - row * ROW;
                if (ly - ascent < 0) {
                    break;
                }
                Label candidate = new Label(text, new Rectangle2D.Double(lx, ly - ascent, w, ascent + descent), (float) lx, (float) ly);
                if (first == null) {
                    first = candidate;
                }
                if (free(candidate.box(), bands, arrows, placed)) {
                    return candidate;
                }
            }
        }
        return first != null ? first
                : new Label(text, new Rectangle2D.Double(x, baseline - ascent, w, ascent + descent), (float) x, (float) baseline);
    }

    /** Free of every band and arrow shaft, and at least {@link #GAP} clear of every label placed before. */
    private static boolean free(Rectangle2D box, List<Band> bands, List<Arrow> arrows, List<Label> placed) {
        for (Band b : bands) {
            if (b.outline().intersects(box)) {
                return false;
            }
        }
        for (Arrow a : arrows) {
            if (a.shaft().intersects(box)) {
                return false;
            }
        }
        Rectangle2D padded = new Rectangle2D.Double(box.getX() - GAP, box.getY(), box.getWidth() + 2 * GAP, box.getHeight());
        for (Label l : placed) {
            if (l.box().intersects(padded)) {
                return false;
            }
        }
        return true;
    }

    @Override
    public void draw(Graphics2D g, double width, double height) {
        double left = MARGIN;
        double right = width - MARGIN;
        g.setFont(Style.font(7f));
        Layout layout = layout(width, height, g.getFontMetrics());
        double beamY = layout.beamY();
        double scale = layout.scale();
        for (Band b : layout.bands()) {
            // a solid tint rather than transparency, which archival PDF would have to qualify
            g.setColor(new java.awt.Color(0xf5, 0xe8, 0xd6));
            g.fill(b.outline());
            g.setColor(Style.LOAD);
            g.setStroke(Style.THIN);
            g.draw(b.outline());
            int arrows = Math.max(2, (int) ((b.x1() - b.x0()) / 14));
            for (int i = 0; i <= arrows; i++) {
                double x = b.x0() + (b.x1() - b.x0()) * i / arrows;
                double bottom = b.at(x, 0);
                double top = b.at(x, 1);
                if (bottom - top > 4) {
                    arrowDown(g, x, top, bottom, b.upward());
                }
            }
        }
        g.setColor(Style.LOAD);
        g.setStroke(Style.ARROW);
        for (Arrow a : layout.arrows()) {
            arrowDown(g, a.x(), a.top(), a.tip(), a.upward());
        }
        for (BeamSketch.LoadMark l : sketch.loads()) {
            if (l.kind() == BeamSketch.LoadMark.Kind.COUPLE_CCW || l.kind() == BeamSketch.LoadMark.Kind.COUPLE_CW) {
                double x0 = left + l.from() * scale;
                g.setColor(Style.LOAD);
                g.setStroke(Style.ARROW);
                double r = 10;
                g.draw(new Arc2D.Double(x0 - r, beamY - r, 2 * r, 2 * r, 200, 250, Arc2D.OPEN));
                double angle = Math.toRadians(l.kind() == BeamSketch.LoadMark.Kind.COUPLE_CCW ? 90 : 200);
                double tipX = x0 + r * Math.cos(angle);
                double tipY = beamY - r * Math.sin(angle);
                head(g, tipX, tipY, l.kind() == BeamSketch.LoadMark.Kind.COUPLE_CCW ? Math.PI : -Math.PI / 2);
            }
        }
        g.setColor(Style.TEXT);
        for (Label l : layout.labels()) {
            g.drawString(l.text(), l.x(), l.baseline());
        }
        g.setColor(Style.STRUCTURE);
        g.setStroke(Style.BEAM);
        g.draw(new Line2D.Double(left, beamY, right, beamY));
        for (double h : sketch.hinges()) {
            double x = left + h * scale;
            g.setColor(java.awt.Color.WHITE);
            g.fill(new java.awt.geom.Ellipse2D.Double(x - 3, beamY - 3, 6, 6));
            g.setColor(Style.STRUCTURE);
            g.setStroke(Style.THIN);
            g.draw(new java.awt.geom.Ellipse2D.Double(x - 3, beamY - 3, 6, 6));
        }
        for (BeamSketch.SupportMark s : sketch.supports()) {
            support(g, left + s.at() * scale, beamY, s, s.at() < sketch.length() / 2);
        }
        g.setColor(Style.GUIDE);
        g.setStroke(Style.THIN);
        double dimY = height - 6;
        g.draw(new Line2D.Double(left, dimY, right, dimY));
        g.draw(new Line2D.Double(left, dimY - 3, left, dimY + 3));
        g.draw(new Line2D.Double(right, dimY - 3, right, dimY + 3));
        g.setColor(Style.TEXT);
        g.drawString(sketch.lengthLabel(), (float) ((left + right) / 2 - textWidth(g, sketch.lengthLabel()) / 2), (float) (dimY - 2));
    }

    private static double textWidth(Graphics2D g, String s) {
        return g.getFontMetrics().stringWidth(s);
    }

    private static void arrowDown(Graphics2D g, double x, double from, double to, boolean upward) {
        g.draw(new Line2D.Double(x, from, x, to));
        if (upward) {
            head(g, x, from, -Math.PI / 2);
        } else {
            head(g, x, to, Math.PI / 2);
        }
    }

    /** An arrow head with its tip at (x, y), pointing along the angle (screen coordinates). */
    private static void head(Graphics2D g, double x, double y, double angle) {
        double size = 3.5;
        Path2D p = new Path2D.Double();
        p.moveTo(x, y);
        p.lineTo(x - size * Math.cos(angle - 0.4), y - size * Math.sin(angle - 0.4));
        p.lineTo(x - size * Math.cos(angle + 0.4), y - size * Math.sin(angle + 0.4));
        p.closePath();
        g.fill(p);
    }

    private static void support(Graphics2D g, double x, double y, BeamSketch.SupportMark s, boolean leftHalf) {
        g.setColor(Style.STRUCTURE);
        g.setStroke(Style.THIN);
        switch (s.kind()) {
            case PIN, ROLLER -> {
                Path2D t = new Path2D.Double();
                t.moveTo(x, y + 1);
                t.lineTo(x - 6, y + 10);
                t.lineTo(x + 6, y + 10);
                t.closePath();
                g.draw(t);
                if (s.kind() == BeamSketch.SupportKind.ROLLER) {
                    g.draw(new java.awt.geom.Ellipse2D.Double(x - 5, y + 10.5, 3.5, 3.5));
                    g.draw(new java.awt.geom.Ellipse2D.Double(x + 1.5, y + 10.5, 3.5, 3.5));
                    g.draw(new Line2D.Double(x - 8, y + 14.5, x + 8, y + 14.5));
                } else {
                    hatch(g, x - 8, y + 10, 16, true);
                }
            }
            case FIXED -> {
                double side = leftHalf ? -1 : 1;
                g.setStroke(Style.ARROW);
                g.draw(new Line2D.Double(x, y - 10, x, y + 10));
                g.setStroke(Style.THIN);
                for (int i = 0; i < 5; i++) {
                    double yy = y - 10 + i * 5;
                    g.draw(new Line2D.Double(x, yy, x + side * 5, yy + 5));
                }
            }
            case SPRING -> {
                Path2D z = new Path2D.Double();
                z.moveTo(x, y + 1);
                for (int i = 0; i < 6; i++) {
                    z.lineTo(x + (i % 2 == 0 ? 4 : -4), y + 3 + i * 2);
                }
                z.lineTo(x, y + 16);
                g.draw(z);
                hatch(g, x - 7, y + 16, 14, true);
            }
            default -> throw new IllegalStateException();
        }
        g.setColor(Style.TEXT);
        g.setFont(Style.font(6.5f));
        g.drawString(s.label(), (float) (x - g.getFontMetrics().stringWidth(s.label()) / 2.0), (float) (y + 24));
        g.setFont(Style.font(7f));
    }

    private static void hatch(Graphics2D g, double x, double y, double w, boolean below) {
        g.draw(new Line2D.Double(x, y, x + w, y));
        for (double i = 0; i < w; i += 3) {
            g.draw(new Line2D.Double(x + i, y, x + i - 2.5, y + 3));
        }
    }
}
