package org.beamfolio.report.pdf;

import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfFileSpecification;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfWriter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringReader;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.w3c.dom.Document;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.HexFormat;
import java.util.Map;
import java.util.TimeZone;
import org.beamfolio.report.drawing.Drawing;
import org.xhtmlrenderer.pdf.DefaultPDFCreationListener;
import org.xhtmlrenderer.pdf.ITextRenderer;

/**
 * Lays XHTML out as PDF with Flying Saucer on OpenPDF, reproducibly: the creation and
 * modification dates are the job's date, the font-subset prefixes come from a generator seeded by
 * the content, and the document ID is a digest of the finished file. The same job and tool
 * version therefore give the same bytes. The job file travels inside as an attachment.
 */
public final class PdfRenderer {
    private final EmbeddedFonts fonts = new EmbeddedFonts();
    private final DocumentBuilder parser = xhtmlParser();

    /**
     * A renderer that has drawn {@code rehearsal} once into a throwaway page, so the platform's
     * font manager, the PDF writer and the drawing code are loaded and initialised before the
     * first package needs them: done while the job is still being read and solved, that takes
     * them off the time a one-job build waits for.
     */
    public PdfRenderer(Drawing rehearsal) {
        try {
            com.lowagie.text.Document page = new com.lowagie.text.Document();
            PdfWriter writer = PdfWriter.getInstance(page, java.io.OutputStream.nullOutputStream());
            page.open();
            PdfContentByte content = writer.getDirectContent();
            PdfTemplate figure = content.createTemplate(200, 100);
            java.awt.Graphics2D g = figure.createGraphics(200, 100, fonts);
            try {
                rehearsal.draw(g, 200, 100);
            } finally {
                g.dispose();
            }
            content.addTemplate(figure, 0, 0);
            page.close();
            parse("<html xmlns=\"http://www.w3.org/1999/xhtml\"><body><p>-</p></body></html>");
        } catch (com.lowagie.text.DocumentException e) {
            throw new IllegalStateException("the PDF writer failed on a blank page: " + e.getMessage(), e);
        }
    }

    /** The job file as it travels inside the package. */
    public record Attachment(String fileName, byte[] bytes, String description) {}

    static {
        // rotated axis titles stay text rather than outlines
        org.jfree.chart.text.TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    /**
     * @param archival PDF/A-3b (ISO 19005-3): output intent, XMP, the job as an associated file
     * @param title the document title, repeated in the XMP metadata
     * @param checksFlag the package's {@link ChecksFlag}, written to the document information; null for none
     */
    public byte[] render(String xhtml, Map<String, Drawing> drawings, Attachment attachment, String isoDate, boolean archival,
                         String title, String checksFlag) {
        return render(xhtml, drawings, java.util.List.of(attachment), isoDate, archival, title, checksFlag);
    }

    /** As above, with every job file the package was built from attached. */
    public byte[] render(String xhtml, Map<String, Drawing> drawings, java.util.List<Attachment> attachments, String isoDate,
                         boolean archival, String title, String checksFlag) {
        try {
            ITextRenderer renderer = new ITextRenderer(fonts.resolver());
            fonts.prefixesFrom(seeded(xhtml));
            renderer.getSharedContext().setReplacedElementFactory(
                    new VectorElementFactory(renderer.getSharedContext().getReplacedElementFactory(), drawings, fonts));
            Calendar date = calendar(isoDate);
            renderer.setListener(new DefaultPDFCreationListener() {
                @Override
                public void preWrite(ITextRenderer r, int pageCount) {
                    PdfWriter writer = r.getWriter();
                    writer.getInfo().put(PdfName.CREATIONDATE, new PdfDate(date));
                    writer.getInfo().put(PdfName.MODDATE, new PdfDate(date));
                    ChecksFlag.write(writer.getInfo(), checksFlag);
                    try {
                        if (archival) {
                            PdfA.outputIntent(writer);
                            PdfA.attach(writer, attachments, date);
                            writer.setXmpMetadata(PdfA.xmp(title, PRODUCER, iso(date)));
                        } else {
                            for (Attachment attachment : attachments) {
                                PdfFileSpecification file = PdfFileSpecification.fileEmbedded(writer, null, attachment.fileName(),
                                        attachment.bytes());
                                writer.addFileAttachment(attachment.description(), file);
                            }
                        }
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                }
            });
            if (archival) {
                renderer.setPDFVersion(PdfWriter.VERSION_1_7);
            }
            renderer.setDocument(parse(xhtml), null);
            renderer.layout();
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            renderer.createPDF(out);
            return withContentId(out.toByteArray());
        } catch (com.lowagie.text.DocumentException e) {
            throw new IllegalStateException("PDF layout failed: " + e.getMessage(), e);
        }
    }

    /**
     * A namespace-aware XML parser that reads no external entity or DTD. The renderer's own
     * string entry point builds the same tree through an identity XSLT transform, which costs a
     * cold start the loading of a whole XSLT compiler.
     */
    private static DocumentBuilder xhtmlParser() {
        try {
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setNamespaceAware(true);
            factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            factory.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
            factory.setAttribute(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
            factory.setExpandEntityReferences(false);
            return factory.newDocumentBuilder();
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the platform's XML parser cannot be configured", e);
        }
    }

    private Document parse(String xhtml) {
        try {
            parser.reset();
            return parser.parse(new InputSource(new StringReader(xhtml)));
        } catch (SAXException | IOException e) {
            throw new IllegalStateException("the package's XHTML is not well formed: " + e.getMessage(), e);
        }
    }

    /** What OpenPDF writes as the producer; the XMP metadata must say the same. */
    static final String PRODUCER = "OpenPDF " + com.lowagie.text.Document.getVersion().replace("OpenPDF ", "").trim();

    private static String iso(Calendar c) {
        return String.format(java.util.Locale.ROOT, "%04d-%02d-%02dT00:00:00Z", c.get(Calendar.YEAR), c.get(Calendar.MONTH) + 1,
                c.get(Calendar.DAY_OF_MONTH));
    }

    private static SecureRandom seeded(String content) {
        try {
            SecureRandom random = SecureRandom.getInstance("SHA1PRNG");
            random.setSeed(sha256(content.getBytes(StandardCharsets.UTF_8)));
            return random;
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA1PRNG is part of every Java platform", e);
        }
    }

    private static Calendar calendar(String isoDate) {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
        c.clear();
        if (isoDate != null && isoDate.matches("\\d{4}-\\d{2}-\\d{2}")) {
            c.set(Integer.parseInt(isoDate.substring(0, 4)), Integer.parseInt(isoDate.substring(5, 7)) - 1,
                    Integer.parseInt(isoDate.substring(8, 10)), 0, 0, 0);
        } else {
            c.set(2000, Calendar.JANUARY, 1, 0, 0, 0);
        }
        return c;
    }

    /**
     * Replaces the trailer's random document ID by a digest of the file with the ID blanked; both
     * are hexadecimal strings of the same length, so no offset in the file moves.
     */
    static byte[] withContentId(byte[] pdf) {
        int[] id = PdfBytes.lastId(pdf);
        if (id == null) {
            return pdf;
        }
        int length = id[1] - id[0];
        byte[] blanked = pdf.clone();
        fill(blanked, id[0], id[1]);
        fill(blanked, id[2], id[3]);
        String digest = HexFormat.of().formatHex(sha256(blanked)).toUpperCase();
        while (digest.length() < length) {
            digest = digest + digest;
        }
        byte[] hex = digest.substring(0, length).getBytes(StandardCharsets.ISO_8859_1);
        byte[] result = pdf.clone();
        System.arraycopy(hex, 0, result, id[0], length);
        System.arraycopy(hex, 0, result, id[2], Math.min(length, id[3] - id[2]));
        return result;
    }

    private static void fill(byte[] bytes, int from, int to) {
        for (int i = from; i < to; i++) {
            bytes[i] = '0';
        }
    }

    private static byte[] sha256(byte[] bytes) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(bytes);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
