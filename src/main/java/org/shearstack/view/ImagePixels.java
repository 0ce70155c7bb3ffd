package org.shearstack.view;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import javax.imageio.ImageIO;

/**
 * A rendered picture as opaque ARGB pixels, row by row from the top left.
 */
public record ImagePixels(int width, int height, int[] argb) {

    public ImagePixels {
        if (argb.length != width * height) {
            throw new IllegalArgumentException("pixels: expected " + width * height + " values for " + width + "x"
                    + height + ", found " + argb.length);
        }
    }

    public int argbAt(int x, int y) {
        return argb[y * width + x];
    }

    /** PNG bytes (RGB, no metadata, so the same pixels give the same bytes). */
    public byte[] toPng() {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        image.setRGB(0, 0, width, height, argb, 0, width);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            if (!ImageIO.write(image, "png", out)) {
                throw new IllegalStateException("no PNG encoder available in this Java runtime");
            }
        } catch (IOException e) {
            throw new UncheckedIOException("encoding PNG in memory", e);
        }
        return out.toByteArray();
    }
}
