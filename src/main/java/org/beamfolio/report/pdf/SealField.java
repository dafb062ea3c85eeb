package org.beamfolio.report.pdf;

import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfAnnotation;
import com.lowagie.text.pdf.PdfAppearance;
import com.lowagie.text.pdf.PdfFormField;
import com.lowagie.text.pdf.PdfWriter;
import org.beamfolio.report.drawing.SealBox;

/**
 * An empty signature field over the cover sheet's seal box, printable and with an (empty)
 * appearance as archival PDF requires, so that sealing later signs exactly there.
 */
final class SealField {
    private SealField() {}

    static void add(PdfWriter writer, Rectangle area, float width, float height) {
        PdfFormField field = PdfFormField.createSignature(writer);
        field.setFieldName(SealBox.FIELD);
        field.setWidget(new Rectangle(area.getLeft(), area.getBottom(), area.getRight(), area.getTop()), null);
        field.setFlags(PdfAnnotation.FLAGS_PRINT);
        field.setPage();
        PdfAppearance appearance = PdfAppearance.createAppearance(writer, width, height);
        field.setAppearance(PdfAnnotation.APPEARANCE_NORMAL, appearance);
        writer.addAnnotation(field);
    }
}
