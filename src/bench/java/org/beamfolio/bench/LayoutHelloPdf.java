package org.beamfolio.bench;

import java.io.FileOutputStream;
import java.io.OutputStream;
import org.xhtmlrenderer.pdf.ITextRenderer;

/**
 * A second baseline of the cold-start timing: one page of XHTML with a heading, a line and a
 * two-cell table, laid out by the same layout engine the packages use, on the same PDF library.
 * What it costs is the floor under any package that goes through that engine.
 */
public final class LayoutHelloPdf {
    private LayoutHelloPdf() {}

    public static void main(String[] args) throws Exception {
        ITextRenderer renderer = new ITextRenderer();
        renderer.setDocumentFromString("<html><head><style>td { border: 1px solid black }</style></head>"
                + "<body><h1>hello</h1><p>one page</p><table><tr><td>a</td><td>b</td></tr></table></body></html>");
        renderer.layout();
        try (OutputStream out = new FileOutputStream(args[0])) {
            renderer.createPDF(out);
        }
    }
}
