package org.shearstack.io.report;

import java.util.Optional;

/**
 * The assembly picture: a PNG when one was rendered, otherwise the reason none was.
 *
 * @param png   PNG bytes
 * @param note  why there is no picture (empty when there is one)
 */
public record Preview(Optional<byte[]> png, String note) {

    public static Preview none(String why) {
        return new Preview(Optional.empty(), why);
    }

    public static Preview of(byte[] png) {
        return new Preview(Optional.of(png.clone()), "");
    }
}
