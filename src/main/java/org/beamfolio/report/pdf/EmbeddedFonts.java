package org.beamfolio.report.pdf;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.FontMapper;
import java.awt.Font;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.security.SecureRandom;
import org.xhtmlrenderer.pdf.ITextFontResolver;

/**
 * The DejaVu fonts from fonts/, read and parsed once per renderer, the font resolver the page
 * layout uses, and the mapping that makes Java 2D text in the diagrams use the same embedded
 * fonts as the page.
 *
 * <p>One set serves every document a renderer writes: a parsed font holds no record of the glyphs
 * a document used (each PDF writer keeps its own), so sharing it changes no byte of the output
 * and saves parsing three font files per package. Like the rest of the PDF stack, one instance
 * belongs to one thread at a time.
 */
public final class EmbeddedFonts implements FontMapper {
    public static final String[] FILES = {"fonts/DejaVuSans.ttf", "fonts/DejaVuSans-Bold.ttf", "fonts/DejaVuSansMono.ttf"};
    private static final int REGULAR = 0;
    private static final int BOLD = 1;
    private static final int MONO = 2;

    private final BaseFont[] fonts = new BaseFont[FILES.length];
    private final ITextFontResolver resolver = new ITextFontResolver();

    public EmbeddedFonts() {
        for (int i = 0; i < FILES.length; i++) {
            try {
                // the resolver reads the font's description again by this name: a classpath resource
                fonts[i] = BaseFont.createFont(FILES[i], BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false, read(FILES[i]), null);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } catch (com.lowagie.text.DocumentException e) {
                throw new IllegalStateException("font " + FILES[i] + " cannot be embedded", e);
            }
            // PDF/A-2 and later forbid an incomplete CIDSet; none is simplest
            fonts[i].setIncludeCidSet(false);
            resolver.addFont(fonts[i], FILES[i], null);
        }
    }

    private static byte[] read(String file) throws IOException {
        try (InputStream in = EmbeddedFonts.class.getResourceAsStream("/" + file)) {
            if (in == null) {
                throw new IOException("missing font resource " + file);
            }
            return in.readAllBytes();
        }
    }

    /** The resolver the layout looks fonts up in, with the three embedded fonts registered. */
    ITextFontResolver resolver() {
        return resolver;
    }

    /** Font-subset name prefixes for the next document come from {@code prefixes}, so they are reproducible. */
    void prefixesFrom(SecureRandom prefixes) {
        for (BaseFont font : fonts) {
            font.setSecureRandom(prefixes);
        }
    }

    @Override
    public BaseFont awtToPdf(Font font) {
        // the name the font was made with, not its family: asking for the family starts the
        // platform's font manager, which the diagrams do not otherwise need to draw
        if (font.getName().contains("Mono")) {
            return fonts[MONO];
        }
        return font.isBold() ? fonts[BOLD] : fonts[REGULAR];
    }

    @Override
    public Font pdfToAwt(BaseFont font, int size) {
        return new Font("DejaVu Sans", Font.PLAIN, size);
    }
}
