package org.beamfolio.report.pdf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/**
 * The byte scans against hand-written fragments of PDF syntax (ISO 32000-1, 7.3.5 names, 7.3.4.3
 * hexadecimal strings, 7.5.5 the trailer's ID, 7.7.3 the page tree): only a page's
 * {@code /Type /Page} counts, and the ID taken is the last well-formed one.
 */
class PdfBytesTest {
    @Test
    void countsPageObjectsButNotThePageTreeOrLongerNames() {
        String pdf = "1 0 obj <</Type /Pages /Count 3>> endobj 2 0 obj <</Type/Page>> endobj 3 0 obj <</Type\n\t/Page /Parent 1 0 R>>"
                + " 4 0 obj <</Type /PageLabel>> 5 0 obj <</Type /Page_x>> 6 0 obj <</Type /Type /Page>> <</Type /Page";
        assertEquals(4, PdfBytes.pages(bytes(pdf)));
        assertEquals(0, PdfBytes.pages(bytes("/Type /Pag")));
    }

    @Test
    void findsTheLastWellFormedIdOfTheFile() {
        String pdf = "trailer <</ID [<AA><BB>]>> trailer <</ID [ <0a1B>\n<c2d3> ] /Size 3>> /ID [<12> (x)] /ID";
        int first = pdf.indexOf("0a1B");
        int second = pdf.indexOf("c2d3");
        assertArrayEquals(new int[] {first, first + 4, second, second + 4}, PdfBytes.lastId(bytes(pdf)));
        assertNull(PdfBytes.lastId(bytes("/ID [<> <00>] /ID [<0G> <00>]")));
    }

    private static byte[] bytes(String s) {
        return s.getBytes(StandardCharsets.ISO_8859_1);
    }
}
