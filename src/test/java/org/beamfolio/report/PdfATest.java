package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Collectors;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.Checks;
import org.beamfolio.job.JobReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.verapdf.gf.foundry.VeraGreenfieldFoundryProvider;
import org.verapdf.pdfa.Foundries;
import org.verapdf.pdfa.PDFAParser;
import org.verapdf.pdfa.PDFAValidator;
import org.verapdf.pdfa.flavours.PDFAFlavour;
import org.verapdf.pdfa.results.ValidationResult;

/** Packages conform to PDF/A-3b (ISO 19005-3), checked by veraPDF, with the job file as the Source associated file. */
class PdfATest {
    @BeforeAll
    static void validator() {
        VeraGreenfieldFoundryProvider.initialise();
    }

    static byte[] render(String job) throws Exception {
        AnalysisResult r = Analysis.run(JobReader.read(Path.of(job)).job());
        return new PackageRenderer().render(r, Checks.run(r));
    }

    @org.junit.jupiter.api.Test
    void aPlainPdfIsNotPdfA() throws Exception {
        // the control: with --no-pdfa the same package has no output intent or XMP, and the validator says so
        AnalysisResult r = Analysis.run(JobReader.read(Path.of("example-jobs/balcony-cantilever.yaml")).job());
        byte[] pdf = new PackageRenderer().render(r, Checks.run(r), null, false);
        try (PDFAParser parser = Foundries.defaultInstance().createParser(new ByteArrayInputStream(pdf), PDFAFlavour.PDFA_3_B)) {
            ValidationResult result = Foundries.defaultInstance().createValidator(PDFAFlavour.PDFA_3_B, false).validate(parser);
            org.junit.jupiter.api.Assertions.assertFalse(result.isCompliant());
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"example-jobs/warehouse-mezzanine-simple-span.yaml", "example-jobs/footbridge-continuous-three-span.yaml",
            "example-jobs/school-lintel-given-properties.yaml"})
    void packagesValidateAsPdfA3b(String job) throws Exception {
        byte[] pdf = render(job);
        try (PDFAParser parser = Foundries.defaultInstance().createParser(new ByteArrayInputStream(pdf), PDFAFlavour.PDFA_3_B)) {
            PDFAValidator validator = Foundries.defaultInstance().createValidator(PDFAFlavour.PDFA_3_B, false);
            ValidationResult result = validator.validate(parser);
            assertTrue(result.isCompliant(), () -> result.getTestAssertions().stream()
                    .filter(a -> a.getStatus() != org.verapdf.pdfa.results.TestAssertion.Status.PASSED)
                    .map(a -> a.getRuleId().getClause() + "-" + a.getRuleId().getTestNumber() + ": " + a.getMessage())
                    .distinct().limit(15).collect(Collectors.joining("\n")));
        }
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            var af = doc.getDocumentCatalog().getCOSObject().getCOSArray(COSName.getPDFName("AF"));
            assertEquals(1, af.size(), "the job file is the one associated file");
            var spec = (org.apache.pdfbox.cos.COSDictionary) af.getObject(0);
            assertEquals("Source", spec.getNameAsString(COSName.getPDFName("AFRelationship")));
            var embedded = new org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification(spec).getEmbeddedFile();
            assertEquals("application/x-yaml", embedded.getSubtype(), "the attachment's MIME type");
            assertArrayEquals(Files.readAllBytes(Path.of(job)), embedded.toByteArray(), "the job file attached byte for byte");
        }
    }
}
