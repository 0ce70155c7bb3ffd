package org.shearstack.view;

import java.util.Locale;

/**
 * An opaque display colour, 8 bits per channel.
 *
 * @param red   0..255
 * @param green 0..255
 * @param blue  0..255
 */
public record Rgb(int red, int green, int blue) {

    public Rgb {
        checkChannel("red", red);
        checkChannel("green", green);
        checkChannel("blue", blue);
    }

    /** Parses {@code #rrggbb} (the leading # is optional). */
    public static Rgb parse(String hex) {
        String h = hex.startsWith("#") ? hex.substring(1) : hex;
        if (h.length() != 6 || !h.chars().allMatch(c -> Character.digit(c, 16) >= 0)) {
            throw new IllegalArgumentException("colour: expected #rrggbb (six hex digits), found '" + hex + "'");
        }
        int v = Integer.parseInt(h, 16);
        return new Rgb((v >> 16) & 0xff, (v >> 8) & 0xff, v & 0xff);
    }

    /** Lower-case {@code #rrggbb}. */
    public String hex() {
        return String.format(Locale.ROOT, "#%02x%02x%02x", red, green, blue);
    }

    /** This colour moved towards {@code other} by {@code fraction} (0 = this, 1 = other). */
    public Rgb mix(Rgb other, double fraction) {
        double f = Math.max(0, Math.min(1, fraction));
        return new Rgb(
                (int) Math.round(red + (other.red - red) * f),
                (int) Math.round(green + (other.green - green) * f),
                (int) Math.round(blue + (other.blue - blue) * f));
    }

    /** Hue in degrees [0, 360); 0 for greys. */
    public double hueDegrees() {
        return hsv(red, green, blue)[0];
    }

    /** Saturation in [0, 1] (HSV). */
    public double saturation() {
        return hsv(red, green, blue)[1];
    }

    /** HSV of an 8-bit colour: hue degrees [0, 360), saturation [0, 1], value [0, 1]. */
    public static double[] hsv(int red, int green, int blue) {
        double r = red / 255.0;
        double g = green / 255.0;
        double b = blue / 255.0;
        double max = Math.max(r, Math.max(g, b));
        double min = Math.min(r, Math.min(g, b));
        double delta = max - min;
        double hue;
        if (delta == 0) {
            hue = 0;
        } else if (max == r) {
            hue = 60 * (((g - b) / delta) % 6);
        } else if (max == g) {
            hue = 60 * ((b - r) / delta + 2);
        } else {
            hue = 60 * ((r - g) / delta + 4);
        }
        if (hue < 0) {
            hue += 360;
        }
        return new double[] {hue, max == 0 ? 0 : delta / max, max};
    }

    private static void checkChannel(String name, int value) {
        if (value < 0 || value > 255) {
            throw new IllegalArgumentException("colour " + name + ": expected 0..255, found " + value);
        }
    }
}
