package org.beamfolio.seal;

import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfString;
import org.beamfolio.checks.ChecksVerdict;

/** Reads the package's {@link ChecksVerdict} back from its document information dictionary. */
public final class ChecksEntry {
    private static final PdfName KEY = new PdfName(ChecksVerdict.INFO_KEY);

    private ChecksEntry() {}

    /** The verdict, or null when the package has none (not written by this tool). */
    public static String read(PdfDictionary info) {
        PdfString value = info == null ? null : info.getAsString(KEY);
        return value == null ? null : value.toUnicodeString();
    }
}
