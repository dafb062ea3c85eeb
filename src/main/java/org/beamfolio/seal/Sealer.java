package org.beamfolio.seal;

import com.lowagie.text.Font;
import com.lowagie.text.pdf.AcroFields;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfSignature;
import com.lowagie.text.pdf.PdfSignatureAppearance;
import com.lowagie.text.pdf.PdfStamper;
import com.lowagie.text.pdf.PdfString;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.security.GeneralSecurityException;
import java.security.KeyStore;
import java.security.PrivateKey;
import java.security.UnrecoverableKeyException;
import java.security.cert.Certificate;
import java.security.cert.CertificateExpiredException;
import java.security.cert.CertificateNotYetValidException;
import java.security.cert.X509Certificate;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.checks.ChecksVerdict;
import org.bouncycastle.asn1.ASN1EncodableVector;
import org.bouncycastle.asn1.DERSet;
import org.bouncycastle.asn1.cms.Attribute;
import org.bouncycastle.asn1.cms.AttributeTable;
import org.bouncycastle.asn1.ess.ESSCertIDv2;
import org.bouncycastle.asn1.ess.SigningCertificateV2;
import org.bouncycastle.asn1.pkcs.PKCSObjectIdentifiers;
import org.bouncycastle.cert.jcajce.JcaCertStore;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedDataGenerator;
import org.bouncycastle.cms.DefaultSignedAttributeTableGenerator;
import org.bouncycastle.cms.jcajce.JcaSignerInfoGeneratorBuilder;
import org.bouncycastle.operator.ContentSigner;
import org.bouncycastle.operator.jcajce.JcaContentSignerBuilder;
import org.bouncycastle.operator.jcajce.JcaDigestCalculatorProviderBuilder;

/**
 * Seals a package: an incremental update (the original bytes stay in the file) that signs the
 * whole file with a detached CAdES signature (PAdES baseline B: subfilter ETSI.CAdES.detached,
 * the signer's certificate referenced by an ESS signing-certificate-v2 attribute, the signing
 * time in the signature dictionary), shown in the cover sheet's seal box.
 */
public final class Sealer {
    private static final int SIGNATURE_SPACE = 16384;

    private Sealer() {}

    /**
     * The seal's details: reason, location and licence number are printed with it; sheet 0 means
     * the cover's seal box; {@code image} is the engineer's seal as PNG bytes (or null);
     * {@code acceptFailing} seals a package whose checks do not all meet their limits.
     */
    public record Request(String alias, String reason, String location, int sheet, String licence, byte[] image,
                          boolean acceptFailing) {
        public Request(String alias, String reason, String location, int sheet) {
            this(alias, reason, location, sheet, null, null, false);
        }
    }

    /** The sealed package and what the engineer should know about it (printed as warnings). */
    public record Sealed(byte[] pdf, List<String> warnings) {}

    public static Sealed seal(byte[] pdf, Path12 keystore, char[] password, Request request, Calendar now) throws SealException {
        String flag = checksFlag(pdf);
        List<String> warnings = new ArrayList<>();
        if (ChecksVerdict.failing(flag) && !request.acceptFailing()) {
            throw new SealException("the package's checks do not all meet their limits (" + flag
                    + "); it is not sealed. Revise the design, or give --accept-failing to seal it marked as failing");
        }
        if (flag == null) {
            warnings.add("the package carries no record of whether its checks pass (it was not built by this version); review its checks sheet");
        }
        KeyStore store = keystore.load(password);
        String alias = request.alias();
        try {
            if (alias == null) {
                List<String> keys = new ArrayList<>();
                for (String a : Collections.list(store.aliases())) {
                    if (store.isKeyEntry(a)) {
                        keys.add(a);
                    }
                }
                if (keys.size() != 1) {
                    throw new SealException("the keystore holds " + keys.size() + " keys (" + String.join(", ", keys) + "): choose one with --alias");
                }
                alias = keys.get(0);
            }
            if (!store.isKeyEntry(alias)) {
                throw new SealException("the keystore has no key named \"" + alias + "\"");
            }
            PrivateKey key = (PrivateKey) store.getKey(alias, password);
            Certificate[] chain = store.getCertificateChain(alias);
            X509Certificate certificate = (X509Certificate) chain[0];
            try {
                certificate.checkValidity(now.getTime());
            } catch (CertificateExpiredException e) {
                throw new SealException("the certificate of \"" + alias + "\" expired on " + certificate.getNotAfter().toInstant()
                        + ": a package cannot be sealed with it");
            } catch (CertificateNotYetValidException e) {
                throw new SealException("the certificate of \"" + alias + "\" is not valid before " + certificate.getNotBefore().toInstant());
            }
            List<X509Certificate> certificates = new ArrayList<>();
            for (Certificate c : chain) {
                certificates.add((X509Certificate) c);
            }
            warnings.addAll(CertificateTrust.concerns(certificates, now.getTime()));
            return new Sealed(sign(pdf, key, chain, request, now, ChecksVerdict.failing(flag) ? flag : null), warnings);
        } catch (UnrecoverableKeyException e) {
            throw new SealException("the password does not open the key \"" + alias + "\"");
        } catch (GeneralSecurityException | IOException | com.lowagie.text.DocumentException e) {
            throw new SealException("the package could not be sealed: " + e.getMessage(), e);
        }
    }

    /** The package's {@link ChecksVerdict}, or null when it has none. */
    static String checksFlag(byte[] pdf) throws SealException {
        try {
            PdfReader reader = new PdfReader(pdf);
            return ChecksEntry.read(reader.getTrailer().getAsDict(PdfName.INFO));
        } catch (IOException e) {
            throw new SealException("not a readable PDF: " + e.getMessage(), e);
        }
    }

    /** @param failing the checks flag of a package sealed although it fails, printed in the seal; else null */
    private static byte[] sign(byte[] pdf, PrivateKey key, Certificate[] chain, Request request, Calendar now, String failing)
            throws IOException, com.lowagie.text.DocumentException, GeneralSecurityException, SealException {
        PdfReader reader = new PdfReader(pdf);
        AcroFields fields = reader.getAcroFields();
        List<String> signedFields = new ArrayList<>(fields.getSignatureTypes().keySet());
        signedFields.removeAll(fields.getFieldNamesWithBlankSignatures());
        if (!signedFields.isEmpty()) {
            throw new SealException("the package is sealed already (field " + String.join(", ", signedFields)
                    + "); seal a fresh build of it instead");
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfStamper stamper = PdfStamper.createSignature(reader, out, '\0', null, true);
        PdfSignatureAppearance appearance = stamper.getSignatureAppearance();
        X509Certificate certificate = (X509Certificate) chain[0];
        String signer = Names.commonName(certificate);
        appearance.setReason(request.reason());
        appearance.setLocation(request.location());
        appearance.setSignDate(now);
        appearance.setAcro6Layers(true);
        BaseFont font = BaseFont.createFont("fonts/DejaVuSans.ttf", BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false,
                readFont(), null);
        // archival PDF forbids a CIDSet that lists only the glyphs used
        font.setIncludeCidSet(false);
        appearance.setLayer2Font(new Font(font, 7));
        appearance.setLayer2Text("Digitally sealed by\n" + signer
                + (request.licence() == null ? "" : "\nLicence No. " + request.licence())
                + "\n" + new PdfDate(now).getW3CDate()
                + (request.reason() == null ? "" : "\n" + request.reason())
                + (failing == null ? "" : "\nSEALED WITH FAILING CHECKS (" + failing.substring("fail: ".length()) + ")"));
        if (request.image() != null) {
            appearance.setSignatureGraphic(SealImage.read(request.image()));
            appearance.setRender(PdfSignatureAppearance.SignatureRenderGraphicAndDescription);
        }
        if (request.sheet() > 0 || fields.getFieldNamesWithBlankSignatures().isEmpty()) {
            int sheet = Math.max(1, request.sheet());
            if (sheet > reader.getNumberOfPages()) {
                throw new SealException("the package has " + reader.getNumberOfPages() + " sheets, not " + sheet);
            }
            com.lowagie.text.Rectangle size = reader.getPageSize(sheet);
            appearance.setVisibleSignature(new com.lowagie.text.Rectangle(size.getRight() - 220, size.getTop() - 260,
                    size.getRight() - 60, size.getTop() - 140), sheet, null);
        } else {
            appearance.setVisibleSignature(org.beamfolio.model.PackageSeal.FIELD);
        }
        whiteGround(appearance);
        PdfSignature dictionary = new PdfSignature(PdfName.ADOBE_PPKLITE, new PdfName("ETSI.CAdES.detached"));
        dictionary.setDate(new PdfDate(now));
        dictionary.setName(signer);
        if (request.reason() != null) {
            dictionary.setReason(request.reason());
        }
        if (request.location() != null) {
            dictionary.setLocation(request.location());
        }
        appearance.setCryptoDictionary(dictionary);
        Map<PdfName, Integer> space = new HashMap<>();
        space.put(PdfName.CONTENTS, SIGNATURE_SPACE * 2 + 2);
        appearance.preClose(space);
        byte[] signed;
        try (InputStream range = appearance.getRangeStream()) {
            signed = cades(range.readAllBytes(), key, chain);
        }
        if (signed.length > SIGNATURE_SPACE) {
            throw new SealException("the signature is larger than the space kept for it");
        }
        byte[] padded = new byte[SIGNATURE_SPACE];
        System.arraycopy(signed, 0, padded, 0, signed.length);
        PdfDictionary update = new PdfDictionary();
        update.put(PdfName.CONTENTS, new PdfString(padded).setHexWriting(true));
        appearance.close(update);
        return out.toByteArray();
    }

    /**
     * An opaque white ground under the seal, inset from the box's frame, so that the seal never
     * prints over the placeholder words of an unsealed box.
     */
    private static void whiteGround(PdfSignatureAppearance appearance) {
        com.lowagie.text.pdf.PdfTemplate ground = appearance.getLayer(0);
        com.lowagie.text.Rectangle box = appearance.getRect();
        ground.setRGBColorFill(255, 255, 255);
        ground.rectangle(2, 2, box.getWidth() - 4, box.getHeight() - 4);
        ground.fill();
    }

    /** A detached CMS signature with the ESS signing-certificate-v2 attribute (CAdES-BES). */
    static byte[] cades(byte[] content, PrivateKey key, Certificate[] chain) throws GeneralSecurityException, IOException {
        try {
            X509Certificate certificate = (X509Certificate) chain[0];
            String algorithm = key.getAlgorithm().equals("EC") ? "SHA256withECDSA" : "SHA256withRSA";
            ContentSigner signer = new JcaContentSignerBuilder(algorithm).build(key);
            byte[] certificateHash = java.security.MessageDigest.getInstance("SHA-256").digest(certificate.getEncoded());
            SigningCertificateV2 signingCertificate = new SigningCertificateV2(new ESSCertIDv2(certificateHash));
            ASN1EncodableVector attributes = new ASN1EncodableVector();
            attributes.add(new Attribute(PKCSObjectIdentifiers.id_aa_signingCertificateV2, new DERSet(signingCertificate)));
            AttributeTable table = new AttributeTable(attributes);
            CMSSignedDataGenerator generator = new CMSSignedDataGenerator();
            generator.addSignerInfoGenerator(new JcaSignerInfoGeneratorBuilder(new JcaDigestCalculatorProviderBuilder().build())
                    .setSignedAttributeGenerator(new DefaultSignedAttributeTableGenerator(table) {
                        @Override
                        protected java.util.Hashtable createStandardAttributeTable(Map parameters) {
                            java.util.Hashtable standard = super.createStandardAttributeTable(parameters);
                            // PAdES keeps the signing time in the signature dictionary, not in the CMS
                            standard.remove(org.bouncycastle.asn1.cms.CMSAttributes.signingTime);
                            return standard;
                        }
                    })
                    .build(signer, certificate));
            generator.addCertificates(new JcaCertStore(java.util.Arrays.asList(chain)));
            return generator.generate(new CMSProcessableByteArray(content), false).getEncoded();
        } catch (org.bouncycastle.operator.OperatorCreationException | org.bouncycastle.cms.CMSException e) {
            throw new GeneralSecurityException("the CMS signature could not be made: " + e.getMessage(), e);
        }
    }

    private static byte[] readFont() throws IOException {
        try (InputStream in = Sealer.class.getResourceAsStream("/fonts/DejaVuSans.ttf")) {
            if (in == null) {
                throw new IOException("missing font resource");
            }
            return in.readAllBytes();
        }
    }
}
