package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.graphics.PDXObject;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotation;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotationWidget;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.verapdf.gf.foundry.VeraGreenfieldFoundryProvider;
import org.verapdf.pdfa.Foundries;
import org.verapdf.pdfa.PDFAParser;
import org.verapdf.pdfa.flavours.PDFAFlavour;

/**
 * A package whose checks do not all meet their limits: written and flagged (exit 3, a banner on
 * the cover and the checks sheet, a flag in the document information), refused by {@code seal}
 * unless accepted, and reported by {@code verify}. The failing job is the balcony example with
 * its 8 mm tip-deflection limit tightened to 0.5 mm: by hand (EN 1993 tube 100 x 200 x 8 mm,
 * I = (100 * 200^3 - 84 * 184^3) / 12 = 23.06e6 mm^4, E = 210 GPa) the tip deflection under D + L
 * is about w L^4 / 8EI + P L^3 / 3EI = 1.34 + 0.96 = 2.3 mm (cantilever formulas, common practice),
 * so the 0.5 mm check fails by a ratio near 4.6 while the L/180 limit (20 mm) still passes.
 */
class FailingPackageTest {
    private static final String BANNER = "DOES NOT MEET";

    @TempDir
    Path temp;

    Path failingJob;

    @BeforeEach
    void write() throws Exception {
        String passing = Files.readString(Path.of("example-jobs/balcony-cantilever.yaml"));
        assertTrue(passing.contains("max: 8 mm"));
        failingJob = Files.writeString(temp.resolve("balcony-too-stiff.yaml"), passing.replace("max: 8 mm", "max: 0.5 mm"));
        SealCommand.environment = name -> name.equals(SealCommand.PASSWORD_VARIABLE) ? "secret123" : null;
    }

    @AfterEach
    void restore() {
        SealCommand.environment = System::getenv;
    }

    private Path build(Path job, int expected) {
        Path out = temp.resolve("out");
        Run run = Run.of("build", job.toString(), "--out", out.toString());
        assertEquals(expected, run.status(), run.err());
        return out.resolve(job.getFileName().toString().replace(".yaml", ".pdf"));
    }

    @Test
    void aFailingPackageIsWrittenFlaggedAndExitsThree() throws Exception {
        Path out = temp.resolve("out");
        Run run = Run.of("build", failingJob.toString(), "--out", out.toString());
        assertEquals(Main.CHECKS_FAIL, run.status(), run.err());
        assertTrue(Files.exists(out.resolve("balcony-too-stiff.pdf")) && Files.exists(out.resolve("balcony-too-stiff.results.json")),
                "the package is written");
        assertTrue(run.err().contains("DOES NOT MEET deflection-D+L-max"), run.err());
        try (PDDocument doc = Loader.loadPDF(out.resolve("balcony-too-stiff.pdf").toFile())) {
            String cover = pages(doc, 1, 1);
            assertTrue(cover.contains(BANNER), cover);
            assertTrue(cover.contains("deflection-D+L-max,"), cover);
            assertFalse(cover.contains("Deflection under D + L in"), "the passing L/180 check is not listed as failing:\n" + cover);
            String checksSheet = checksSheet(doc);
            assertTrue(checksSheet.contains(BANNER) && checksSheet.contains("deflection-D+L-max,"), checksSheet);
            assertEquals("fail: deflection-D+L-max", doc.getDocumentInformation().getCustomMetadataValue("BeamfolioChecks"));
        }
        Run check = Run.of("check", failingJob.toString());
        assertEquals(Main.CHECKS_FAIL, check.status(), "check exits 3 too");
        assertTrue(check.out().contains("DOES NOT MEET: deflection-D+L-max"), check.out());
    }

    @Test
    void aPassingPackageShowsNoBanner() throws Exception {
        Path pdf = build(Path.of("example-jobs/balcony-cantilever.yaml"), Main.OK);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String all = new PDFTextStripper().getText(doc);
            assertFalse(all.contains(BANNER), "no banner on a passing package");
            assertTrue(checksSheet(doc).contains("Every check meets its limit"), checksSheet(doc));
            assertEquals("pass", doc.getDocumentInformation().getCustomMetadataValue("BeamfolioChecks"));
        }
    }

    @Test
    void aFolderWithAFailingJobExitsThreeAndBadInputStillWins() throws Exception {
        Path folder = Files.createDirectories(temp.resolve("jobs"));
        Files.copy(failingJob, folder.resolve("a-failing.yaml"));
        Files.copy(Path.of("example-jobs/balcony-cantilever.yaml"), folder.resolve("b-passing.yaml"));
        Run run = Run.of("build", folder.toString(), "--out", temp.resolve("out").toString());
        assertEquals(Main.CHECKS_FAIL, run.status(), run.err());
        assertTrue(run.out().lines().anyMatch(l -> l.contains("a-failing") && l.contains("FAIL")), run.out());
        assertTrue(run.out().lines().anyMatch(l -> l.contains("b-passing") && l.contains("pass")), run.out());

        Files.writeString(folder.resolve("c-bad.yaml"), "beamfolio: 1\n");
        Run mixed = Run.of("build", folder.toString(), "--out", temp.resolve("out2").toString());
        assertEquals(Main.BAD_INPUT, mixed.status(), "bad input outranks a failing check");
        assertEquals(Main.BAD_INPUT, Run.of("check", folder.toString()).status());
    }

    @Test
    void sealRefusesAFailingPackageAndLeavesItUntouched() throws Exception {
        Path pdf = build(failingJob, Main.CHECKS_FAIL);
        byte[] before = Files.readAllBytes(pdf);
        Run run = Run.of("seal", pdf.toString(), "--keystore", SealKeys.selfSigned(temp, "pe").toString());
        assertEquals(Main.BAD_INPUT, run.status(), run.err());
        assertTrue(run.err().contains("do not all meet their limits") && run.err().contains("--accept-failing"), run.err());
        assertArrayEquals(before, Files.readAllBytes(pdf), "the file is untouched");
    }

    @Test
    void anAcceptedFailingPackageIsSealedAndSaysSo() throws Exception {
        Path pdf = build(failingJob, Main.CHECKS_FAIL);
        Run run = Run.of("seal", pdf.toString(), "--keystore", SealKeys.selfSigned(temp, "pe").toString(), "--accept-failing",
                "--licence", "PE-04417");
        assertEquals(Main.OK, run.status(), run.err());
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            String seal = sealText(doc);
            assertTrue(seal.replaceAll("\\s+", "").contains("SEALEDWITHFAILINGCHECKS(deflection-D+L-max)"), seal);
            assertTrue(seal.contains("Licence No. PE-04417"), seal);
        }
        Run verify = Run.of("verify", pdf.toString());
        assertTrue(verify.out().contains("checks:              FAIL") && verify.out().contains("deflection-D+L-max"), verify.out());
        assertTrue(verify.out().contains("verdict: intact"), "integrity and checks are separate findings:\n" + verify.out());
    }

    @Test
    void aSelfSignedCertificateIsWarnedAboutBySealAndVerify() throws Exception {
        Path pdf = build(Path.of("example-jobs/balcony-cantilever.yaml"), Main.OK);
        Run run = Run.of("seal", pdf.toString(), "--keystore", SealKeys.selfSigned(temp, "pe").toString());
        assertEquals(Main.OK, run.status(), run.err());
        assertTrue(run.err().contains("warning:") && run.err().contains("self-signed"), run.err());
        Run verify = Run.of("verify", pdf.toString());
        assertEquals(Main.OK, verify.status(), verify.out());
        assertTrue(verify.out().contains("NOT vouched for") && verify.out().contains("self-signed"), verify.out());
        assertTrue(verify.out().contains("every check meets its limit"), verify.out());
    }

    @Test
    void aCertificateFromAnUntrustedAuthorityIsWarnedAbout() throws Exception {
        Path pdf = build(Path.of("example-jobs/balcony-cantilever.yaml"), Main.OK);
        Run run = Run.of("seal", pdf.toString(), "--keystore", SealKeys.issuedByPrivateAuthority(temp).toString());
        assertEquals(Main.OK, run.status(), run.err());
        assertTrue(run.err().contains("not issued by a certification authority the system trusts"), run.err());
        assertFalse(run.err().contains("self-signed"), run.err());
        Run verify = Run.of("verify", pdf.toString());
        assertTrue(verify.out().contains("not issued by a certification authority the system trusts"), verify.out());
    }

    @Test
    void theSealImageIsPlacedOpaqueAndThePackageStaysArchival() throws Exception {
        Path pdf = build(Path.of("example-jobs/balcony-cantilever.yaml"), Main.OK);
        BufferedImage stamp = new BufferedImage(120, 120, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = stamp.createGraphics();
        g.setColor(new Color(200, 0, 0, 255));
        g.fillOval(10, 10, 100, 100);
        g.dispose();
        Path png = temp.resolve("stamp.png");
        ImageIO.write(stamp, "png", png.toFile());
        Run run = Run.of("seal", pdf.toString(), "--keystore", SealKeys.selfSigned(temp, "pe").toString(), "--image", png.toString());
        assertEquals(Main.OK, run.status(), run.err());
        byte[] bytes = Files.readAllBytes(pdf);
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            List<PDImageXObject> images = new ArrayList<>();
            collectImages(sealAppearance(doc).getResources(), images, 0);
            assertEquals(1, images.size(), "one image in the seal's appearance");
            PDImageXObject image = images.get(0);
            assertEquals(120, image.getWidth());
            assertNull(image.getCOSObject().getDictionaryObject(COSName.SMASK), "no soft mask: the alpha was flattened");
            BufferedImage placed = image.getImage();
            assertEquals(Color.WHITE.getRGB(), placed.getRGB(2, 2), "transparent corners became white");
            assertEquals(new Color(200, 0, 0).getRGB(), placed.getRGB(60, 60), "the stamp itself is kept");
        }
        VeraGreenfieldFoundryProvider.initialise();
        try (PDFAParser parser = Foundries.defaultInstance().createParser(new ByteArrayInputStream(bytes), PDFAFlavour.PDFA_3_B)) {
            assertTrue(Foundries.defaultInstance().createValidator(PDFAFlavour.PDFA_3_B, false).validate(parser).isCompliant(),
                    "the package sealed with an image is still PDF/A-3b");
        }
    }

    private static String pages(PDDocument doc, int from, int to) throws Exception {
        PDFTextStripper stripper = new PDFTextStripper();
        stripper.setStartPage(from);
        stripper.setEndPage(to);
        return stripper.getText(doc);
    }

    /** The text of the sheet headed "Checks and summary" (the cover lists it too, without the governing ratio). */
    private static String checksSheet(PDDocument doc) throws Exception {
        for (int page = 2; page <= doc.getNumberOfPages(); page++) {
            String text = pages(doc, page, page);
            if (text.contains("Checks and summary") && text.contains("Governing ratio")) {
                return text;
            }
        }
        throw new AssertionError("no checks sheet");
    }

    private static PDFormXObject sealAppearance(PDDocument doc) throws Exception {
        for (PDAnnotation a : doc.getPage(0).getAnnotations()) {
            if (a instanceof PDAnnotationWidget w && "Sig".equals(w.getCOSObject().getNameAsString(COSName.FT))) {
                PDFormXObject form = new PDFormXObject(w.getNormalAppearanceStream().getCOSObject());
                assertNotNull(form);
                return form;
            }
        }
        throw new AssertionError("no seal on the cover");
    }

    /** The seal's words, read back by drawing its appearance on a page of a scratch document. */
    private static String sealText(PDDocument doc) throws Exception {
        PDFormXObject appearance = sealAppearance(doc);
        try (PDDocument scratch = new PDDocument()) {
            PDPage page = new PDPage();
            scratch.addPage(page);
            try (PDPageContentStream content = new PDPageContentStream(scratch, page)) {
                content.drawForm(appearance);
            }
            return new PDFTextStripper().getText(scratch);
        }
    }

    private static void collectImages(PDResources resources, List<PDImageXObject> images, int depth) throws Exception {
        if (resources == null || depth > 6) {
            return;
        }
        for (COSName name : resources.getXObjectNames()) {
            PDXObject x = resources.getXObject(name);
            if (x instanceof PDImageXObject image) {
                images.add(image);
            } else if (x instanceof PDFormXObject form) {
                collectImages(form.getResources(), images, depth + 1);
            }
        }
    }
}
