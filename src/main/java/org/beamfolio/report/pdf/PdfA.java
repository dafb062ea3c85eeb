package org.beamfolio.report.pdf;

import com.lowagie.text.pdf.PdfArray;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfFileSpecification;
import com.lowagie.text.pdf.PdfICCBased;
import com.lowagie.text.pdf.PdfIndirectReference;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfNumber;
import com.lowagie.text.pdf.PdfString;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Calendar;

/**
 * What ISO 19005-3 (PDF/A-3, level B) asks of a package beyond a plain PDF: an sRGB output intent
 * (the platform's own sRGB profile), XMP metadata that states the conformance and repeats the
 * document information, and the job file attached as an associated file with relationship
 * Source, listed in the catalog's AF array.
 */
final class PdfA {
    private PdfA() {}

    static void outputIntent(PdfWriter writer) throws IOException {
        PdfICCBased icc = new PdfICCBased(ICC_Profile.getInstance(ColorSpace.CS_sRGB));
        icc.put(PdfName.N, new PdfNumber(3));
        PdfIndirectReference profile = writer.addToBody(icc).getIndirectReference();
        PdfDictionary intent = new PdfDictionary(PdfName.OUTPUTINTENT);
        intent.put(PdfName.S, PdfName.GTS_PDFA1);
        intent.put(PdfName.OUTPUTCONDITIONIDENTIFIER, new PdfString("sRGB IEC61966-2.1"));
        intent.put(PdfName.INFO, new PdfString("sRGB IEC61966-2.1"));
        intent.put(PdfName.REGISTRYNAME, new PdfString("http://www.color.org"));
        intent.put(PdfName.DESTOUTPUTPROFILE, profile);
        PdfArray intents = new PdfArray();
        intents.add(intent);
        writer.getExtraCatalog().put(PdfName.OUTPUTINTENTS, intents);
    }

    /** The job file as an associated file (relationship Source), with its MIME type and date. */
    static void attach(PdfWriter writer, java.util.List<PdfRenderer.Attachment> attachments, Calendar date) throws IOException {
        PdfArray associated = new PdfArray();
        for (PdfRenderer.Attachment attachment : attachments) {
            associated.add(attach(writer, attachment, date));
        }
        writer.getExtraCatalog().put(new PdfName("AF"), associated);
    }

    /** One job file embedded as an associated file of the document; returns its file specification's reference. */
    private static com.lowagie.text.pdf.PdfIndirectReference attach(PdfWriter writer, PdfRenderer.Attachment attachment,
                                                                    Calendar date) throws IOException {
        PdfDictionary parameters = new PdfDictionary();
        parameters.put(PdfName.MODDATE, new PdfDate(date));
        PdfFileSpecification file = PdfFileSpecification.fileEmbedded(writer, null, attachment.fileName(), attachment.bytes(),
                "application/x-yaml", parameters, PdfStream9.DEFAULT_COMPRESSION);
        file.setUnicodeFileName(attachment.fileName(), true);
        file.put(new PdfName("AFRelationship"), new PdfName("Source"));
        file.put(PdfName.DESC, new PdfString(attachment.description()));
        writer.addFileAttachment(attachment.description(), file);
        return file.getReference();
    }

    /** XMP metadata: PDF/A-3 level B, and the same title, producer and dates as the information dictionary. */
    static byte[] xmp(String title, String producer, String isoDate) {
        String xml = "<?xpacket begin=\"\uFEFF\" id=\"W5M0MpCehiHzreSzNTczkc9d\"?>\n"
                + "<x:xmpmeta xmlns:x=\"adobe:ns:meta/\">\n"
                + " <rdf:RDF xmlns:rdf=\"http://www.w3.org/1999/02/22-rdf-syntax-ns#\">\n"
                + "  <rdf:Description rdf:about=\"\" xmlns:pdfaid=\"http://www.aiim.org/pdfa/ns/id/\">\n"
                + "   <pdfaid:part>3</pdfaid:part>\n   <pdfaid:conformance>B</pdfaid:conformance>\n  </rdf:Description>\n"
                + "  <rdf:Description rdf:about=\"\" xmlns:dc=\"http://purl.org/dc/elements/1.1/\">\n"
                + "   <dc:title><rdf:Alt><rdf:li xml:lang=\"x-default\">" + escape(title) + "</rdf:li></rdf:Alt></dc:title>\n"
                + "   <dc:format>application/pdf</dc:format>\n  </rdf:Description>\n"
                + "  <rdf:Description rdf:about=\"\" xmlns:pdf=\"http://ns.adobe.com/pdf/1.3/\">\n"
                + "   <pdf:Producer>" + escape(producer) + "</pdf:Producer>\n  </rdf:Description>\n"
                + "  <rdf:Description rdf:about=\"\" xmlns:xmp=\"http://ns.adobe.com/xap/1.0/\">\n"
                + "   <xmp:CreateDate>" + isoDate + "</xmp:CreateDate>\n   <xmp:ModifyDate>" + isoDate + "</xmp:ModifyDate>\n"
                + "  </rdf:Description>\n </rdf:RDF>\n</x:xmpmeta>\n<?xpacket end=\"w\"?>";
        return xml.getBytes(StandardCharsets.UTF_8);
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    /** The stream compression OpenPDF uses by default. */
    private static final class PdfStream9 {
        static final int DEFAULT_COMPRESSION = com.lowagie.text.pdf.PdfStream.DEFAULT_COMPRESSION;
    }
}
