package org.beamfolio.seal;

import com.lowagie.text.BadElementException;
import com.lowagie.text.Image;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import javax.imageio.ImageIO;

/**
 * The engineer's seal image for the visible seal. Archival PDF is kept free of transparency, so a
 * PNG with an alpha channel is composited onto white (the paper it will be printed on) and
 * written as opaque RGB.
 */
final class SealImage {
    /** Larger images are refused: a seal image is a stamp, not a photograph of a drawing sheet. */
    static final int MAX_PIXELS = 4096 * 4096;

    private SealImage() {}

    static Image read(byte[] png) throws SealException {
        BufferedImage source;
        try {
            source = ImageIO.read(new ByteArrayInputStream(png));
        } catch (IOException e) {
            throw new SealException("the seal image cannot be read: " + e.getMessage(), e);
        }
        if (source == null) {
            throw new SealException("the seal image is not a PNG (or any image format the Java runtime reads)");
        }
        if ((long) source.getWidth() * source.getHeight() > MAX_PIXELS) {
            throw new SealException("the seal image is " + source.getWidth() + " x " + source.getHeight()
                    + " pixels; give one of at most " + MAX_PIXELS + " pixels");
        }
        try {
            return Image.getInstance(opaque(source), null);
        } catch (BadElementException | IOException e) {
            throw new SealException("the seal image cannot be placed: " + e.getMessage(), e);
        }
    }

    /** The image composited onto white, with no alpha channel. */
    static BufferedImage opaque(BufferedImage source) {
        BufferedImage flat = new BufferedImage(source.getWidth(), source.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = flat.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, flat.getWidth(), flat.getHeight());
            g.drawImage(source, 0, 0, null);
        } finally {
            g.dispose();
        }
        return flat;
    }
}
