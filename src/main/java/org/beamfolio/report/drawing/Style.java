package org.beamfolio.report.drawing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;

/** The package's own drawing palette and type: navy structure, amber loads, grey guides. */
final class Style {
    static final Color STRUCTURE = new Color(0x1f, 0x3b, 0x57);
    static final Color LOAD = new Color(0xb3, 0x6b, 0x00);
    static final Color GUIDE = new Color(0x99, 0x99, 0x99);
    static final Color TEXT = new Color(0x11, 0x11, 0x11);
    static final BasicStroke BEAM = new BasicStroke(2.2f);
    static final BasicStroke THIN = new BasicStroke(0.7f);
    static final BasicStroke ARROW = new BasicStroke(0.9f);

    private Style() {}

    static Font font(float size) {
        return new Font("DejaVu Sans", Font.PLAIN, 1).deriveFont(size);
    }
}
