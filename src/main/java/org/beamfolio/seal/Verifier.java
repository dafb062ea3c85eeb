package org.beamfolio.seal;

import com.lowagie.text.pdf.AcroFields;
import com.lowagie.text.pdf.PRStream;
import com.lowagie.text.pdf.PdfArray;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfString;
import com.lowagie.text.pdf.parser.PdfTextExtractor;
import java.io.IOException;
import java.security.cert.X509Certificate;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.beamfolio.checks.ChecksVerdict;
import org.bouncycastle.cert.X509CertificateHolder;
import org.bouncycastle.cert.jcajce.JcaX509CertificateConverter;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedData;
import org.bouncycastle.cms.SignerInformation;
import org.bouncycastle.cms.jcajce.JcaSimpleSignerInfoVerifierBuilder;

/**
 * Checks a package: whether its seal's signature matches the bytes it covers, who sealed it and
 * when, whether bytes were added after sealing, and whether the attached job file still has the
 * SHA-256 digest printed in the package.
 */
public final class Verifier {
    // the text extractor may put the digest a line or two after its label
    private static final Pattern PRINTED_DIGEST = Pattern.compile("(?s)SHA-256.*?\\b([0-9a-f]{64})\\b");

    private Verifier() {}

    /** What verification found; {@code intact} is the overall verdict. */
    /**
     * @param checksFlag the package's {@link ChecksVerdict} ({@code pass}, {@code fail: ...}, {@code none}), null when it has none
     * @param certificateConcerns why the seal's certificate is not vouched for by an authority the system trusts; empty when it is
     */
    public record Report(boolean sealed, boolean signatureValid, boolean coversWholeFile, String signer, String when,
                         String printedDigest, String attachedDigest, List<String> problems, String checksFlag,
                         List<String> certificateConcerns) {
        public boolean intact() {
            return sealed && signatureValid && coversWholeFile && printedDigest != null && printedDigest.equals(attachedDigest)
                    && problems.isEmpty();
        }
    }

    public static Report verify(byte[] pdf) throws SealException {
        List<String> problems = new ArrayList<>();
        PdfReader reader;
        try {
            reader = new PdfReader(pdf);
        } catch (IOException e) {
            throw new SealException("not a readable PDF: " + e.getMessage(), e);
        }
        String flag = ChecksEntry.read(reader.getTrailer().getAsDict(PdfName.INFO));
        String printed = printedDigest(reader);
        String attached = attachedDigest(reader);
        if (printed == null) {
            problems.add("no SHA-256 digest is printed in the package");
        }
        if (attached == null) {
            problems.add("no job file is attached");
        } else if (printed != null && !printed.equals(attached)) {
            problems.add("the attached job file does not match the digest printed in the package");
        }
        AcroFields fields = reader.getAcroFields();
        List<String> names = new ArrayList<>(fields.getSignatureTypes().keySet());
        names.removeAll(fields.getFieldNamesWithBlankSignatures());
        if (names.isEmpty()) {
            return new Report(false, false, false, null, null, printed, attached, problems, flag, List.of());
        }
        PdfDictionary signature = fields.getSignatureDictionary(names.get(0));
        PdfArray range = signature.getAsArray(PdfName.BYTERANGE);
        long[] r = new long[4];
        for (int i = 0; i < 4; i++) {
            r[i] = range.getAsNumber(i).intValue();
        }
        boolean whole = r[0] == 0 && r[2] + r[3] == pdf.length;
        if (!whole) {
            problems.add("bytes were added to the file after it was sealed");
        }
        byte[] signed = new byte[(int) (r[1] + r[3])];
        boolean inside = r[1] <= pdf.length && r[2] + r[3] <= pdf.length;
        boolean valid = false;
        String signer = null;
        List<String> concerns = List.of();
        PdfString date = signature.getAsString(PdfName.M);
        if (inside) {
            System.arraycopy(pdf, 0, signed, 0, (int) r[1]);
            System.arraycopy(pdf, (int) r[2], signed, (int) r[1], (int) r[3]);
            PdfString contents = signature.getAsString(PdfName.CONTENTS);
            try {
                CMSSignedData cms = new CMSSignedData(new CMSProcessableByteArray(signed), contents.getOriginalBytes());
                for (SignerInformation info : cms.getSignerInfos().getSigners()) {
                    @SuppressWarnings("unchecked")
                    X509CertificateHolder holder = (X509CertificateHolder) cms.getCertificates().getMatches(info.getSID()).iterator().next();
                    X509Certificate certificate = new JcaX509CertificateConverter().getCertificate(holder);
                    valid = info.verify(new JcaSimpleSignerInfoVerifierBuilder().build(certificate));
                    signer = Names.commonName(certificate);
                    List<X509Certificate> carried = new ArrayList<>();
                    for (Object h : cms.getCertificates().getMatches(null)) {
                        carried.add(new JcaX509CertificateConverter().getCertificate((X509CertificateHolder) h));
                    }
                    concerns = CertificateTrust.concerns(CertificateTrust.chain(certificate, carried),
                            date == null ? new java.util.Date() : com.lowagie.text.pdf.PdfDate.decode(date.toString()).getTime());
                }
            } catch (Exception e) {
                problems.add("the signature cannot be checked: " + e.getMessage());
            }
        }
        if (!valid) {
            problems.add("the signature does not match the sealed bytes: the package was changed after sealing");
        }
        return new Report(true, valid, whole, signer, date == null ? null : com.lowagie.text.pdf.PdfDate.getW3CDate(date.toString()),
                printed, attached, problems, flag, concerns);
    }

    private static String printedDigest(PdfReader reader) {
        PdfTextExtractor extractor = new PdfTextExtractor(reader);
        for (int page = reader.getNumberOfPages(); page >= 1; page--) {
            try {
                String text = extractor.getTextFromPage(page).replaceAll("\\s+", " ");
                Matcher m = PRINTED_DIGEST.matcher(text);
                if (m.find()) {
                    return m.group(1);
                }
            } catch (IOException e) {
                return null;
            }
        }
        return null;
    }

    private static String attachedDigest(PdfReader reader) {
        PdfDictionary names = reader.getCatalog().getAsDict(PdfName.NAMES);
        PdfDictionary files = names == null ? null : names.getAsDict(PdfName.EMBEDDEDFILES);
        PdfArray list = files == null ? null : files.getAsArray(PdfName.NAMES);
        if (list == null || list.size() < 2) {
            return null;
        }
        PdfDictionary spec = list.getAsDict(1);
        PdfDictionary ef = spec == null ? null : spec.getAsDict(PdfName.EF);
        if (ef == null) {
            return null;
        }
        try {
            PRStream stream = (PRStream) PdfReader.getPdfObject(ef.get(PdfName.F));
            byte[] bytes = PdfReader.getStreamBytes(stream);
            return HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (IOException | java.security.NoSuchAlgorithmException e) {
            return null;
        }
    }
}
