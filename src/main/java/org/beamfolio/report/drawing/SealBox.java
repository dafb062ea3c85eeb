package org.beamfolio.report.drawing;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;

/**
 * The box reserved for the engineer's seal and signature on the cover sheet. The renderer also
 * places an empty signature field named {@link #FIELD} over it, which {@code seal} fills.
 */
public final class SealBox implements Drawing {
    public static final String FIELD = org.beamfolio.model.PackageSeal.FIELD;

    @Override
    public void draw(Graphics2D g, double width, double height) {
        g.setColor(Style.STRUCTURE);
        g.setStroke(new java.awt.BasicStroke(1.2f));
        g.draw(new Rectangle2D.Double(0.6, 0.6, width - 1.2, height - 1.2));
        g.setColor(Style.GUIDE);
        g.setFont(Style.font(7f));
        String[] lines = {"Reserved for the engineer's", "seal and signature"};
        for (int i = 0; i < lines.length; i++) {
            double w = g.getFontMetrics().stringWidth(lines[i]);
            g.drawString(lines[i], (float) ((width - w) / 2), (float) (height * 0.18 + i * 9));
        }
    }
}
