package org.beamfolio.report.drawing;

import java.awt.Graphics2D;

/** A vector figure of the package, drawn with Java 2D into a box of the given size in points. */
public interface Drawing {
    void draw(Graphics2D g, double width, double height);
}
