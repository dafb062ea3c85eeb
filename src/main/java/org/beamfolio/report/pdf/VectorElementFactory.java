package org.beamfolio.report.pdf;

import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;
import java.awt.Graphics2D;
import java.awt.Point;
import java.util.Map;
import org.beamfolio.report.drawing.Drawing;
import org.w3c.dom.Element;
import org.xhtmlrenderer.extend.ReplacedElement;
import org.xhtmlrenderer.extend.ReplacedElementFactory;
import org.xhtmlrenderer.extend.UserAgentCallback;
import org.xhtmlrenderer.layout.LayoutContext;
import org.xhtmlrenderer.pdf.ITextOutputDevice;
import org.xhtmlrenderer.pdf.ITextReplacedElement;
import org.xhtmlrenderer.render.BlockBox;
import org.xhtmlrenderer.render.RenderingContext;
import org.xhtmlrenderer.simple.extend.FormSubmissionListener;

/**
 * Puts {@code <object type="application/x-beamfolio-drawing" data="ID"/>} on the page as vector
 * graphics: the drawing is painted with Java 2D into a PDF form XObject, so diagrams stay sharp
 * and searchable, with no raster image. Every other element goes to the renderer's own factory.
 */
final class VectorElementFactory implements ReplacedElementFactory {
    static final String TYPE = "application/x-beamfolio-drawing";

    private final ReplacedElementFactory fallback;
    private final Map<String, Drawing> drawings;
    private final EmbeddedFonts fonts;

    VectorElementFactory(ReplacedElementFactory fallback, Map<String, Drawing> drawings, EmbeddedFonts fonts) {
        this.fallback = fallback;
        this.drawings = drawings;
        this.fonts = fonts;
    }

    @Override
    public ReplacedElement createReplacedElement(LayoutContext c, BlockBox box, UserAgentCallback uac, int width, int height) {
        Element e = box.getElement();
        if (e != null && e.getNodeName().equals("object") && TYPE.equals(e.getAttribute("type"))) {
            Drawing drawing = drawings.get(e.getAttribute("data"));
            if (drawing == null) {
                throw new IllegalStateException("no drawing " + e.getAttribute("data"));
            }
            return new VectorElement(drawing, Math.max(width, 1), Math.max(height, 1));
        }
        return fallback.createReplacedElement(c, box, uac, width, height);
    }

    @Override
    public void reset() {
        fallback.reset();
    }

    @Override
    public void remove(Element e) {
        fallback.remove(e);
    }

    @Override
    public void setFormSubmissionListener(FormSubmissionListener listener) {
        fallback.setFormSubmissionListener(listener);
    }

    private final class VectorElement implements ITextReplacedElement {
        private final Drawing drawing;
        private final int width;
        private final int height;
        private Point location = new Point(0, 0);

        VectorElement(Drawing drawing, int width, int height) {
            this.drawing = drawing;
            this.width = width;
            this.height = height;
        }

        @Override
        public void paint(RenderingContext c, ITextOutputDevice device, BlockBox box) {
            Rectangle area = device.createLocalTargetArea(c, box);
            float w = area.getWidth();
            float h = area.getHeight();
            PdfContentByte page = device.getCurrentPage();
            PdfTemplate template = page.createTemplate(w, h);
            Graphics2D g = template.createGraphics(w, h, fonts);
            try {
                drawing.draw(g, w, h);
            } finally {
                g.dispose();
            }
            page.addTemplate(template, area.getLeft(), area.getBottom());
            if (drawing instanceof org.beamfolio.report.drawing.SealBox) {
                SealField.add(device.getWriter(), area, w, h);
            }
        }

        @Override
        public int getIntrinsicWidth() {
            return width;
        }

        @Override
        public int getIntrinsicHeight() {
            return height;
        }

        @Override
        public Point getLocation() {
            return location;
        }

        @Override
        public void setLocation(int x, int y) {
            location = new Point(x, y);
        }

        @Override
        public void detach(LayoutContext c) {
        }

        @Override
        public boolean isRequiresInteractivePaint() {
            return false;
        }

        @Override
        public boolean hasBaseline() {
            return false;
        }

        @Override
        public int getBaseline() {
            return 0;
        }
    }
}
