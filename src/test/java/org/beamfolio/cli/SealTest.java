package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.interactive.digitalsignature.PDSignature;
import org.bouncycastle.cert.X509CertificateHolder;
import org.bouncycastle.cert.jcajce.JcaX509CertificateConverter;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedData;
import org.bouncycastle.cms.SignerInformation;
import org.bouncycastle.cms.jcajce.JcaSimpleSignerInfoVerifierBuilder;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.verapdf.gf.foundry.VeraGreenfieldFoundryProvider;
import org.verapdf.pdfa.Foundries;
import org.verapdf.pdfa.PDFAParser;
import org.verapdf.pdfa.flavours.PDFAFlavour;

/**
 * Sealing with a throwaway self-signed PKCS#12 made here by keytool (no key is kept in the
 * repository), verified by the tool and independently with PDFBox and BouncyCastle.
 */
class SealTest {
    @TempDir
    Path temp;

    Path pdf;

    private Path keystore(String name, String... validity) throws Exception {
        Path file = temp.resolve(name + ".p12");
        List<String> command = new java.util.ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "keytool").toString(),
                "-genkeypair", "-alias", "pe", "-keyalg", "RSA", "-keysize", "2048", "-dname", "CN=Test Engineer PE, O=Test",
                "-storetype", "PKCS12", "-keystore", file.toString(), "-storepass", "secret123", "-keypass", "secret123"));
        command.addAll(List.of(validity.length == 0 ? new String[] {"-validity", "30"} : validity));
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        p.getInputStream().readAllBytes();
        assertEquals(0, p.waitFor(), "keytool made the keystore");
        return file;
    }

    @BeforeEach
    void build() throws Exception {
        Run run = Run.of("build", "example-jobs/balcony-cantilever.yaml", "--out", temp.toString());
        assertEquals(Main.OK, run.status(), run.err());
        pdf = temp.resolve("balcony-cantilever.pdf");
        SealCommand.environment = name -> name.equals(SealCommand.PASSWORD_VARIABLE) ? "secret123" : null;
    }

    @AfterEach
    void restore() {
        SealCommand.environment = System::getenv;
    }

    @Test
    void aSealedPackageVerifiesHereAndIndependently() throws Exception {
        byte[] original = Files.readAllBytes(pdf);
        Path sealed = temp.resolve("sealed.pdf");
        Run seal = Run.of("seal", pdf.toString(), "--keystore", keystore("good").toString(), "--reason", "Issued for permit", "--out", sealed.toString());
        assertEquals(Main.OK, seal.status(), seal.err());
        byte[] bytes = Files.readAllBytes(sealed);
        assertArrayEquals(original, Arrays.copyOf(bytes, original.length), "append mode: the original bytes are still there");

        Run verify = Run.of("verify", sealed.toString());
        assertEquals(Main.OK, verify.status(), verify.out());
        assertTrue(verify.out().contains("yes, by Test Engineer PE"), verify.out());
        assertTrue(verify.out().contains("verdict: intact"), verify.out());

        try (PDDocument doc = Loader.loadPDF(bytes)) {
            PDSignature signature = doc.getLastSignatureDictionary();
            assertEquals("ETSI.CAdES.detached", signature.getSubFilter());
            int[] range = signature.getByteRange();
            assertEquals(bytes.length, range[2] + range[3], "the signature covers the whole file");
            byte[] signed = new byte[range[1] + range[3]];
            System.arraycopy(bytes, range[0], signed, 0, range[1]);
            System.arraycopy(bytes, range[2], signed, range[1], range[3]);
            CMSSignedData cms = new CMSSignedData(new CMSProcessableByteArray(signed), signature.getContents(bytes));
            SignerInformation signer = cms.getSignerInfos().getSigners().iterator().next();
            @SuppressWarnings("unchecked")
            X509CertificateHolder holder = (X509CertificateHolder) cms.getCertificates().getMatches(signer.getSID()).iterator().next();
            assertTrue(signer.verify(new JcaSimpleSignerInfoVerifierBuilder().build(new JcaX509CertificateConverter().getCertificate(holder))),
                    "BouncyCastle verifies the CMS signature over the byte range PDFBox reads");
            assertTrue(signer.getSignedAttributes().get(org.bouncycastle.asn1.pkcs.PKCSObjectIdentifiers.id_aa_signingCertificateV2) != null,
                    "CAdES: the signing certificate is bound by signing-certificate-v2");
        }

        VeraGreenfieldFoundryProvider.initialise();
        try (PDFAParser parser = Foundries.defaultInstance().createParser(new ByteArrayInputStream(bytes), PDFAFlavour.PDFA_3_B)) {
            assertTrue(Foundries.defaultInstance().createValidator(PDFAFlavour.PDFA_3_B, false).validate(parser).isCompliant(),
                    "the sealed package is still PDF/A-3b");
        }

        byte[] flipped = bytes.clone();
        flipped[original.length / 2] ^= 1;
        Path tampered = Files.write(temp.resolve("tampered.pdf"), flipped);
        Run bad = Run.of("verify", tampered.toString());
        assertEquals(Main.BAD_INPUT, bad.status(), bad.out());
        assertTrue(bad.out().contains("NOT intact"), bad.out());

        Path appended = Files.write(temp.resolve("appended.pdf"), concat(bytes, "\n% added later\n".getBytes()));
        Run added = Run.of("verify", appended.toString());
        assertEquals(Main.BAD_INPUT, added.status());
        assertTrue(added.out().contains("bytes were added to the file after it was sealed"), added.out());

        Run twice = Run.of("seal", sealed.toString(), "--keystore", temp.resolve("good.p12").toString());
        assertEquals(Main.BAD_INPUT, twice.status());
        assertTrue(twice.err().contains("sealed already"), twice.err());
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] r = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, r, a.length, b.length);
        return r;
    }

    @Test
    void aWrongPasswordLeavesThePackageUntouched() throws Exception {
        byte[] original = Files.readAllBytes(pdf);
        Path keys = keystore("good");
        SealCommand.environment = name -> "not-the-password";
        Run run = Run.of("seal", pdf.toString(), "--keystore", keys.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("password does not open"), run.err());
        assertArrayEquals(original, Files.readAllBytes(pdf));
    }

    @Test
    void anExpiredCertificateIsRefused() throws Exception {
        byte[] original = Files.readAllBytes(pdf);
        Path keys = keystore("expired", "-startdate", "-2y", "-validity", "30");
        Run run = Run.of("seal", pdf.toString(), "--keystore", keys.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("expired"), run.err());
        assertArrayEquals(original, Files.readAllBytes(pdf));
    }

    @Test
    void thePasswordIsNeverAnArgument() throws Exception {
        SealCommand.environment = name -> null;
        Run run = Run.of("seal", pdf.toString(), "--keystore", keystore("good").toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains(SealCommand.PASSWORD_VARIABLE), run.err());
        assertEquals(Main.BAD_INPUT, Run.of("seal", pdf.toString(), "--keystore", "k.p12", "--password", "x").status(),
                "there is no --password option");
    }

    @Test
    void anUnsealedPackageIsReportedAsSuch() {
        Run run = Run.of("verify", pdf.toString());
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.out().contains("sealed:              no"), run.out());
        assertTrue(run.out().contains("attached file matches the printed SHA-256"), run.out());
    }
}
