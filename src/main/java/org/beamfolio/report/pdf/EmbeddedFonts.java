package org.beamfolio.report.pdf;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.FontMapper;
import java.awt.Font;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The DejaVu fonts from fonts/, read once from the classpath, and the mapping that makes Java 2D
 * text in the diagrams use the same embedded fonts as the page.
 */
public final class EmbeddedFonts implements FontMapper {
    public static final String[] FILES = {"fonts/DejaVuSans.ttf", "fonts/DejaVuSans-Bold.ttf", "fonts/DejaVuSansMono.ttf"};

    private final byte[][] bytes = new byte[FILES.length][];

    public EmbeddedFonts() {
        for (int i = 0; i < FILES.length; i++) {
            try (InputStream in = EmbeddedFonts.class.getResourceAsStream("/" + FILES[i])) {
                if (in == null) {
                    throw new IOException("missing font resource " + FILES[i]);
                }
                bytes[i] = in.readAllBytes();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    /** Fresh base fonts for one document (a base font keeps the glyphs a document used). */
    public BaseFont[] forDocument() {
        BaseFont[] fonts = new BaseFont[FILES.length];
        for (int i = 0; i < FILES.length; i++) {
            try {
                // the renderer reads the font's description again by this name: a classpath resource
                fonts[i] = BaseFont.createFont(FILES[i], BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false, bytes[i], null);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } catch (com.lowagie.text.DocumentException e) {
                throw new IllegalStateException("font " + FILES[i] + " cannot be embedded", e);
            }
        }
        return fonts;
    }

    private BaseFont[] current;

    void use(BaseFont[] fonts) {
        current = fonts;
    }

    @Override
    public BaseFont awtToPdf(Font font) {
        if (font.getFamily().contains("Mono")) {
            return current[2];
        }
        return font.isBold() ? current[1] : current[0];
    }

    @Override
    public Font pdfToAwt(BaseFont font, int size) {
        return new Font("DejaVu Sans", Font.PLAIN, size);
    }
}
