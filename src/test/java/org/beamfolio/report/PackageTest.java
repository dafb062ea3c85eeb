package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.PDXObject;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
import org.apache.pdfbox.text.PDFTextStripper;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.Checks;
import org.beamfolio.job.JobReader;
import org.beamfolio.job.JobReading;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The package PDF read back with PDFBox: what a reviewer and an archive rely on. */
class PackageTest {
    static final Path JOB = Path.of("example-jobs/footbridge-continuous-three-span.yaml");
    static byte[] pdf;
    static byte[] jobBytes;

    @BeforeAll
    static void build() throws Exception {
        jobBytes = Files.readAllBytes(JOB);
        pdf = render(JOB);
    }

    static byte[] render(Path job) throws Exception {
        JobReading reading = JobReader.read(job);
        assertTrue(reading.ok(), reading.report());
        AnalysisResult result = org.beamfolio.analysis.Analysis.run(reading.job());
        return new PackageRenderer().render(result, Checks.run(result));
    }

    @Test
    void everySheetCarriesItsNumberAndTheProjectNumber() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            int pages = doc.getNumberOfPages();
            assertTrue(pages >= 8, "a full package, got " + pages + " sheets");
            for (int i = 1; i <= pages; i++) {
                PDFTextStripper s = new PDFTextStripper();
                s.setStartPage(i);
                s.setEndPage(i);
                String text = s.getText(doc);
                assertTrue(text.contains("Sheet " + i + " of " + pages), "sheet " + i);
                assertTrue(text.contains(i + " of " + pages), "title block sheet number on " + i);
                assertTrue(text.contains("26-077"), "project number on sheet " + i);
            }
        }
    }

    @Test
    void everyFontIsEmbeddedAndThereIsNoRasterImage() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            for (PDPage page : doc.getPages()) {
                check(page.getResources());
            }
        }
    }

    private static void check(PDResources resources) throws IOException {
        if (resources == null) {
            return;
        }
        for (COSName name : resources.getFontNames()) {
            PDFont font = resources.getFont(name);
            assertTrue(font.isEmbedded(), font.getName() + " is embedded");
        }
        for (COSName name : resources.getXObjectNames()) {
            PDXObject x = resources.getXObject(name);
            assertFalse(x instanceof PDImageXObject, "no raster image in the package");
            if (x instanceof PDFormXObject form) {
                check(form.getResources());
            }
        }
    }

    @Test
    void theJobFileIsAttachedByteForByteAndItsDigestPrinted() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDDocumentNameDictionary names = doc.getDocumentCatalog().getNames();
            assertNotNull(names, "the catalog has a name tree");
            Map<String, PDComplexFileSpecification> files = names.getEmbeddedFiles().getNames();
            assertNotNull(files);
            PDComplexFileSpecification spec = files.values().iterator().next();
            assertEquals("footbridge-continuous-three-span.yaml", spec.getFilename());
            assertArrayEquals(jobBytes, spec.getEmbeddedFile().toByteArray());
            String text = new PDFTextStripper().getText(doc);
            assertTrue(text.contains(JobReader.sha256(jobBytes)), "the SHA-256 digest is printed");
        }
    }

    @Test
    void theSameJobGivesTheSameBytes() throws Exception {
        assertArrayEquals(pdf, render(JOB));
    }

    @Test
    void theCautionsAndTheSignOffAreThere() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("signed and sealed by a licensed professional engineer"));
            assertTrue(text.contains("authority having jurisdiction"));
            assertTrue(text.contains("Licence number"));
            assertTrue(text.contains("Reserved for the engineer's"));
            assertTrue(text.contains("Revision history"));
        }
    }

    @Test
    void freeTextIsPrintedExactlyAsTyped() throws Exception {
        String text = TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m, note: \"<i>wet</i> & heavy\" }\n")
                .replace("title: Test beam", "title: \"Tom & Jerry's <b>bold</b> beam\"");
        AnalysisResult result = org.beamfolio.analysis.Analysis.run(TestJobs.job(text));
        PackageRenderer renderer = new PackageRenderer();
        String xhtml = renderer.xhtml(result, List.of());
        assertTrue(xhtml.contains("Tom &amp; Jerry&apos;s &lt;b&gt;bold&lt;/b&gt; beam"), () -> "escaped in the XHTML: "
                + xhtml.substring(xhtml.indexOf("<title>"), xhtml.indexOf("</title>")));
        try (PDDocument doc = Loader.loadPDF(renderer.render(result, List.of()))) {
            String printed = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(printed.contains("Tom & Jerry's <b>bold</b> beam"), "printed as typed");
            assertTrue(printed.contains("<i>wet</i> & heavy"), "notes as typed");
        }
    }

    @Test
    void aRendererUsedForOneJobAfterAnotherGivesTheBytesOfAFreshOne() throws Exception {
        // fonts and the font resolver are shared by the documents of one renderer: nothing of one
        // package (glyphs used, subset names) may leak into the next
        AnalysisResult other = org.beamfolio.analysis.Analysis.run(JobReader.read(Path.of("example-jobs/balcony-cantilever.yaml")).job());
        AnalysisResult footbridge = org.beamfolio.analysis.Analysis.run(JobReader.read(JOB).job());
        PackageRenderer reused = new PackageRenderer();
        byte[] first = reused.render(other, Checks.run(other));
        byte[] after = reused.render(footbridge, Checks.run(footbridge));
        assertArrayEquals(pdf, after, "the footbridge package after another job");
        assertArrayEquals(new PackageRenderer().render(other, Checks.run(other)), first, "the first job, fresh renderer");
        assertArrayEquals(first, reused.render(other, Checks.run(other)), "the first job again, third document of the renderer");
    }
}
