package org.shearstack.view;

import java.util.Locale;

/**
 * How to render a still picture.
 *
 * @param widthPx   image width, 16..8192
 * @param heightPx  image height, 16..8192
 * @param exploded  parts at full exploded offset
 * @param section   cut through the axis (half y &lt; 0 removed)
 */
public record SnapshotOptions(int widthPx, int heightPx, boolean exploded, boolean section) {

    public static final int MIN_PX = 16;
    public static final int MAX_PX = 8192;

    public SnapshotOptions {
        if (widthPx < MIN_PX || widthPx > MAX_PX || heightPx < MIN_PX || heightPx > MAX_PX) {
            throw new IllegalArgumentException("snapshot size: expected each side in " + MIN_PX + ".." + MAX_PX
                    + " pixels, found " + widthPx + "x" + heightPx);
        }
    }

    /** 1200 x 800, assembled, uncut. */
    public static SnapshotOptions defaults() {
        return new SnapshotOptions(1200, 800, false, false);
    }

    /** Parses {@code WxH} such as {@code 1200x800}. */
    public static int[] parseSize(String text) {
        String[] parts = text.trim().toLowerCase(Locale.ROOT).split("x", -1);
        if (parts.length == 2) {
            try {
                return new int[] {Integer.parseInt(parts[0]), Integer.parseInt(parts[1])};
            } catch (NumberFormatException e) {
                // fall through to the message below
            }
        }
        throw new IllegalArgumentException("size: expected WIDTHxHEIGHT in pixels such as 1200x800, found '" + text + "'");
    }

    public SnapshotOptions withExploded(boolean value) {
        return new SnapshotOptions(widthPx, heightPx, value, section);
    }

    public SnapshotOptions withSection(boolean value) {
        return new SnapshotOptions(widthPx, heightPx, exploded, value);
    }
}
