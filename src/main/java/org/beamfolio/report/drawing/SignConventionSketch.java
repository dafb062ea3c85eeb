package org.beamfolio.report.drawing;

import java.awt.Graphics2D;
import java.awt.geom.Arc2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

/**
 * A short length of beam with the positive senses the package uses: x to the right, loads and
 * deflection down, shear up on the left face and down on the right, sagging moment.
 */
public final class SignConventionSketch implements Drawing {
    @Override
    public void draw(Graphics2D g, double width, double height) {
        double cx = width / 2;
        double cy = height / 2 + 4;
        double w = 60;
        double h = 18;
        g.setColor(Style.STRUCTURE);
        g.setStroke(Style.THIN);
        g.draw(new Rectangle2D.Double(cx - w / 2, cy - h / 2, w, h));
        g.setFont(Style.font(7f));
        g.setStroke(Style.ARROW);
        g.setColor(Style.LOAD);
        // shear: up on the left face, down on the right
        arrow(g, cx - w / 2 - 6, cy + 12, cx - w / 2 - 6, cy - 12);
        arrow(g, cx + w / 2 + 6, cy - 12, cx + w / 2 + 6, cy + 12);
        g.setColor(Style.TEXT);
        g.drawString("V+", (float) (cx - w / 2 - 22), (float) cy);
        g.drawString("V+", (float) (cx + w / 2 + 10), (float) cy);
        // sagging moment: clockwise on the left face, counter-clockwise on the right
        g.setColor(Style.LOAD);
        g.draw(new Arc2D.Double(cx - w / 2 - 30, cy - 14, 28, 28, 60, 120, Arc2D.OPEN));
        g.draw(new Arc2D.Double(cx + w / 2 + 2, cy - 14, 28, 28, 0, 120, Arc2D.OPEN));
        g.setColor(Style.TEXT);
        g.drawString("M+ (sagging)", (float) (cx - 24), (float) (cy - h / 2 - 6));
        // axes
        g.setColor(Style.GUIDE);
        arrow(g, 12, height - 10, 52, height - 10);
        arrow(g, 12, 10, 12, 34);
        g.setColor(Style.TEXT);
        g.drawString("x", 55f, (float) (height - 7));
        g.drawString("load, deflection +", 16f, 30f);
        g.drawString("tension +", (float) (cx - 16), (float) (cy + h / 2 + 12));
    }

    private static void arrow(Graphics2D g, double x0, double y0, double x1, double y1) {
        g.draw(new Line2D.Double(x0, y0, x1, y1));
        double angle = Math.atan2(y1 - y0, x1 - x0);
        Path2D p = new Path2D.Double();
        p.moveTo(x1, y1);
        p.lineTo(x1 - 4 * Math.cos(angle - 0.4), y1 - 4 * Math.sin(angle - 0.4));
        p.lineTo(x1 - 4 * Math.cos(angle + 0.4), y1 - 4 * Math.sin(angle + 0.4));
        p.closePath();
        g.fill(p);
    }
}
