package org.beamfolio.report.drawing;

import java.awt.Graphics2D;
import java.awt.geom.Arc2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

/**
 * The beam to scale with its supports drawn by kind, its hinges, and the loads of one case, each
 * labelled with its value. Line loads are drawn as bands whose height follows the intensity;
 * point forces as arrows; couples as curved arrows in their sense.
 */
public final class LoadingDiagram implements Drawing {
    private final BeamSketch sketch;

    public LoadingDiagram(BeamSketch sketch) {
        this.sketch = sketch;
    }

    @Override
    public void draw(Graphics2D g, double width, double height) {
        double left = 36;
        double right = width - 36;
        double beamY = height * 0.62;
        double scale = (right - left) / sketch.length();
        g.setFont(Style.font(7f));
        double maxLine = 0;
        for (BeamSketch.LoadMark l : sketch.loads()) {
            if (l.kind() == BeamSketch.LoadMark.Kind.LINE) {
                maxLine = Math.max(maxLine, Math.max(Math.abs(l.start()), Math.abs(l.end())));
            }
        }
        double bandTop = 16;
        double bandHeight = beamY - bandTop - 14;
        int lineIndex = 0;
        for (BeamSketch.LoadMark l : sketch.loads()) {
            double x0 = left + l.from() * scale;
            switch (l.kind()) {
                case LINE -> {
                    double x1 = left + l.to() * scale;
                    double h0 = maxLine == 0 ? 0 : bandHeight * 0.5 * Math.abs(l.start()) / maxLine + 4;
                    double h1 = maxLine == 0 ? 0 : bandHeight * 0.5 * Math.abs(l.end()) / maxLine + 4;
                    double base = beamY - 3 - lineIndex * 3;
                    Path2D band = new Path2D.Double();
                    band.moveTo(x0, base);
                    band.lineTo(x0, base - h0);
                    band.lineTo(x1, base - h1);
                    band.lineTo(x1, base);
                    band.closePath();
                    // a solid tint rather than transparency, which archival PDF would have to qualify
                    g.setColor(new java.awt.Color(0xf5, 0xe8, 0xd6));
                    g.fill(band);
                    g.setColor(Style.LOAD);
                    g.setStroke(Style.THIN);
                    g.draw(band);
                    int arrows = Math.max(2, (int) ((x1 - x0) / 14));
                    for (int i = 0; i <= arrows; i++) {
                        double x = x0 + (x1 - x0) * i / arrows;
                        double h = h0 + (h1 - h0) * i / arrows;
                        arrowDown(g, x, base - h, base, l.start() < 0 && l.end() < 0);
                    }
                    g.setColor(Style.TEXT);
                    // several line loads can share a stretch: their labels step up and along
                    double labelY = base - Math.max(h0, h1) - 3 - lineIndex * 9;
                    double labelX = (x0 + x1) / 2 - textWidth(g, l.label()) / 2 + lineIndex * 0.1 * (x1 - x0);
                    g.drawString(l.label(), (float) Math.max(2, Math.min(width - textWidth(g, l.label()) - 2, labelX)), (float) labelY);
                    lineIndex++;
                }
                case POINT -> {
                    g.setColor(Style.LOAD);
                    g.setStroke(Style.ARROW);
                    arrowDown(g, x0, beamY - bandHeight - 6, beamY - 3, l.start() < 0);
                    g.setColor(Style.TEXT);
                    g.drawString(l.label(), (float) (x0 + 3), (float) (beamY - bandHeight - 6));
                }
                case COUPLE_CCW, COUPLE_CW -> {
                    g.setColor(Style.LOAD);
                    g.setStroke(Style.ARROW);
                    double r = 10;
                    g.draw(new Arc2D.Double(x0 - r, beamY - r, 2 * r, 2 * r, 200, 250, Arc2D.OPEN));
                    double angle = Math.toRadians(l.kind() == BeamSketch.LoadMark.Kind.COUPLE_CCW ? 90 : 200);
                    double tipX = x0 + r * Math.cos(angle);
                    double tipY = beamY - r * Math.sin(angle);
                    head(g, tipX, tipY, l.kind() == BeamSketch.LoadMark.Kind.COUPLE_CCW ? Math.PI : -Math.PI / 2);
                    g.setColor(Style.TEXT);
                    g.drawString(l.label(), (float) (x0 + r + 2), (float) (beamY - r - 2));
                }
                default -> throw new IllegalStateException();
            }
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
