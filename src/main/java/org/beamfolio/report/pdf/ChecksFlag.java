package org.beamfolio.report.pdf;

import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfString;
import java.util.List;

/**
 * Whether a package's checks meet their limits, written into the PDF's document information
 * dictionary as {@code /BeamfolioChecks} so that {@code seal} and {@code verify} (or any other
 * program) can read it without reading the pages: {@code pass}, {@code fail: D1, S2} (the ids of
 * the checks that do not meet their limits) or {@code none} (no checks were requested).
 */
public final class ChecksFlag {
    public static final PdfName KEY = new PdfName("BeamfolioChecks");

    private ChecksFlag() {}

    /** The flag's text for the ids of the failing checks, given whether any check was made. */
    public static String of(boolean anyCheck, List<String> failingIds) {
        if (!failingIds.isEmpty()) {
            return "fail: " + String.join(", ", failingIds);
        }
        return anyCheck ? "pass" : "none";
    }

    /** The flag of a package's information dictionary, or null when it has none (not written by this tool). */
    public static String read(PdfDictionary info) {
        PdfString value = info == null ? null : info.getAsString(KEY);
        return value == null ? null : value.toUnicodeString();
    }

    /** True when the flag says some check does not meet its limit. */
    public static boolean failing(String flag) {
        return flag != null && flag.startsWith("fail");
    }

    static void write(PdfDictionary info, String flag) {
        if (flag != null) {
            info.put(KEY, new PdfString(flag));
        }
    }
}
