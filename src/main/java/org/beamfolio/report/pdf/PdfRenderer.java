package org.beamfolio.report.pdf;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfFileSpecification;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfWriter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
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
import java.util.regex.Matcher;
import java.util.regex.Pattern;
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
    private static final Pattern ID = Pattern.compile("/ID\\s*\\[\\s*<([0-9a-fA-F]+)>\\s*<([0-9a-fA-F]+)>\\s*\\]");

    private final EmbeddedFonts fonts = new EmbeddedFonts();

    /** The job file as it travels inside the package. */
    public record Attachment(String fileName, byte[] bytes, String description) {}

    static {
        // rotated axis titles stay text rather than outlines
        org.jfree.chart.text.TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    public byte[] render(String xhtml, Map<String, Drawing> drawings, Attachment attachment, String isoDate) {
        return render(xhtml, drawings, attachment, isoDate, true, "");
    }

    /**
     * @param archival PDF/A-3b (ISO 19005-3): output intent, XMP, the job as an associated file
     * @param title the document title, repeated in the XMP metadata
     */
    public byte[] render(String xhtml, Map<String, Drawing> drawings, Attachment attachment, String isoDate, boolean archival,
                         String title) {
        try {
            ITextRenderer renderer = new ITextRenderer();
            BaseFont[] documentFonts = fonts.forDocument();
            SecureRandom prefixes = seeded(xhtml);
            for (int i = 0; i < documentFonts.length; i++) {
                documentFonts[i].setSecureRandom(prefixes);
                // PDF/A-2 and later forbid an incomplete CIDSet; none is simplest
                documentFonts[i].setIncludeCidSet(false);
                renderer.getFontResolver().addFont(documentFonts[i], EmbeddedFonts.FILES[i], null);
            }
            fonts.use(documentFonts);
            renderer.getSharedContext().setReplacedElementFactory(
                    new VectorElementFactory(renderer.getSharedContext().getReplacedElementFactory(), drawings, fonts));
            Calendar date = calendar(isoDate);
            renderer.setListener(new DefaultPDFCreationListener() {
                @Override
                public void preWrite(ITextRenderer r, int pageCount) {
                    PdfWriter writer = r.getWriter();
                    writer.getInfo().put(PdfName.CREATIONDATE, new PdfDate(date));
                    writer.getInfo().put(PdfName.MODDATE, new PdfDate(date));
                    try {
                        if (archival) {
                            PdfA.outputIntent(writer);
                            PdfA.attach(writer, attachment, date);
                            writer.setXmpMetadata(PdfA.xmp(title, PRODUCER, iso(date)));
                        } else {
                            PdfFileSpecification file = PdfFileSpecification.fileEmbedded(writer, null, attachment.fileName(),
                                    attachment.bytes());
                            writer.addFileAttachment(attachment.description(), file);
                        }
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                }
            });
            if (archival) {
                renderer.setPDFVersion(PdfWriter.VERSION_1_7);
            }
            renderer.setDocumentFromString(xhtml);
            renderer.layout();
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            renderer.createPDF(out);
            return withContentId(out.toByteArray());
        } catch (com.lowagie.text.DocumentException e) {
            throw new IllegalStateException("PDF layout failed: " + e.getMessage(), e);
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
        String text = new String(pdf, StandardCharsets.ISO_8859_1);
        Matcher m = ID.matcher(text);
        int start = -1;
        while (m.find()) {
            start = m.start();
        }
        if (start < 0) {
            return pdf;
        }
        m.find(start);
        int length = m.group(1).length();
        byte[] blanked = pdf.clone();
        fill(blanked, m.start(1), m.end(1));
        fill(blanked, m.start(2), m.end(2));
        String digest = HexFormat.of().formatHex(sha256(blanked)).toUpperCase();
        while (digest.length() < length) {
            digest = digest + digest;
        }
        byte[] id = digest.substring(0, length).getBytes(StandardCharsets.ISO_8859_1);
        byte[] result = pdf.clone();
        System.arraycopy(id, 0, result, m.start(1), length);
        System.arraycopy(id, 0, result, m.start(2), Math.min(length, m.end(2) - m.start(2)));
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
