package org.beamfolio.report.pdf;

import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfString;
import org.beamfolio.checks.ChecksVerdict;

/** Writes the package's {@link ChecksVerdict} into the PDF's document information dictionary. */
final class ChecksFlag {
    static final PdfName KEY = new PdfName(ChecksVerdict.INFO_KEY);

    private ChecksFlag() {}

    static void write(PdfDictionary info, String verdict) {
        if (verdict != null) {
            info.put(KEY, new PdfString(verdict));
        }
    }
}
