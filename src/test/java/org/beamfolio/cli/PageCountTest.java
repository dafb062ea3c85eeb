package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The sheet count the tool reports and the document ID it writes, both found by scanning the
 * bytes, against the same facts read independently by PDFBox: the page tree's count, and the
 * trailer's ID, which must be the SHA-256 of the file with the ID's digits set to '0'.
 */
class PageCountTest {
    @TempDir
    Path temp;

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"warehouse-mezzanine-simple-span", "footbridge-continuous-three-span", "two-storey-framing-project"})
    void pagesAndDocumentIdAgreeWithPdfbox(String example) throws Exception {
        for (boolean archival : new boolean[] {true, false}) {
            Path out = temp.resolve(archival ? "pdfa" : "plain");
            Run run = archival ? Run.of("build", "example-jobs/" + example + ".yaml", "--out", out.toString())
                    : Run.of("build", "example-jobs/" + example + ".yaml", "--no-pdfa", "--out", out.toString());
            assertEquals(Main.OK, run.status(), run.err());
            byte[] pdf = Files.readAllBytes(out.resolve(example + ".pdf"));
            try (PDDocument doc = Loader.loadPDF(pdf)) {
                assertEquals(doc.getNumberOfPages(), Pipeline.pages(pdf), example);
                assertTrue(doc.getNumberOfPages() > 1, example);
                COSArray id = doc.getDocument().getTrailer().getCOSArray(COSName.ID);
                String first = HexFormat.of().formatHex(((COSString) id.get(0)).getBytes()).toUpperCase();
                String second = HexFormat.of().formatHex(((COSString) id.get(1)).getBytes()).toUpperCase();
                assertEquals(first, second, "both halves of the ID are the content digest");
                assertEquals(digestWithIdBlanked(pdf, first).substring(0, first.length()), first, example);
            }
        }
    }

    /** The file's SHA-256 in upper-case hexadecimal, with both strings of its last {@code /ID} entry set to '0'. */
    private static String digestWithIdBlanked(byte[] pdf, String id) throws Exception {
        String text = new String(pdf, StandardCharsets.ISO_8859_1);
        int key = text.lastIndexOf("/ID");
        byte[] blanked = pdf.clone();
        for (int from = key, n = 0; n < 2; n++) {
            int at = text.indexOf("<" + id + ">", from);
            assertTrue(at > key, "the ID's strings follow the trailer's /ID key");
            java.util.Arrays.fill(blanked, at + 1, at + 1 + id.length(), (byte) '0');
            from = at + id.length() + 2;
        }
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(blanked)).toUpperCase();
    }
}
