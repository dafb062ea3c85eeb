package org.beamfolio.bench;

import com.lowagie.text.Document;
import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.PdfWriter;
import java.io.FileOutputStream;

/** The baseline of the cold-start timing: a one-page PDF written with plain OpenPDF. */
public final class HelloPdf {
    private HelloPdf() {}

    public static void main(String[] args) throws Exception {
        Document document = new Document();
        try (FileOutputStream out = new FileOutputStream(args[0])) {
            PdfWriter.getInstance(document, out);
            document.open();
            document.add(new Paragraph("hello"));
            document.close();
        }
    }
}
