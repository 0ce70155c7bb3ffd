package org.shearstack.view;

/** Simple measurements on a rendered picture, for tests. */
final class PixelStats {

    /** A pixel differing from the background by more than this in any channel counts as drawn. */
    static final int BACKGROUND_TOLERANCE = 10;

    private PixelStats() {
    }

    static boolean isBackground(int argb, Rgb background) {
        return Math.abs(((argb >> 16) & 0xff) - background.red()) <= BACKGROUND_TOLERANCE
                && Math.abs(((argb >> 8) & 0xff) - background.green()) <= BACKGROUND_TOLERANCE
                && Math.abs((argb & 0xff) - background.blue()) <= BACKGROUND_TOLERANCE;
    }

    static int drawnCount(ImagePixels img, Rgb background) {
        int n = 0;
        for (int p : img.argb()) {
            n += isBackground(p, background) ? 0 : 1;
        }
        return n;
    }

    /** x0, y0, x1, y1 of the drawn pixels (inclusive), or null when nothing is drawn. */
    static int[] drawnBox(ImagePixels img, Rgb background) {
        int x0 = Integer.MAX_VALUE;
        int y0 = Integer.MAX_VALUE;
        int x1 = -1;
        int y1 = -1;
        for (int y = 0; y < img.height(); y++) {
            for (int x = 0; x < img.width(); x++) {
                if (!isBackground(img.argbAt(x, y), background)) {
                    x0 = Math.min(x0, x);
                    y0 = Math.min(y0, y);
                    x1 = Math.max(x1, x);
                    y1 = Math.max(y1, y);
                }
            }
        }
        return x1 < 0 ? null : new int[] {x0, y0, x1, y1};
    }

    /**
     * Pixels whose hue lies within {@code hueToleranceDegrees} of the colour's hue, saturated and not dark:
     * white lights scale channels equally, so a lit surface keeps its hue.
     */
    static int countHue(ImagePixels img, Rgb colour, double hueToleranceDegrees) {
        double target = colour.hueDegrees();
        int n = 0;
        for (int p : img.argb()) {
            double[] hsv = Rgb.hsv((p >> 16) & 0xff, (p >> 8) & 0xff, p & 0xff);
            double d = Math.abs(hsv[0] - target);
            d = Math.min(d, 360 - d);
            if (hsv[1] > 0.35 && hsv[2] > 0.12 && d <= hueToleranceDegrees) {
                n++;
            }
        }
        return n;
    }

    /** Pixels matching the colour in hue within the tolerance, in the given column band [x0, x1). */
    static int countHueInColumns(ImagePixels img, Rgb colour, double hueToleranceDegrees, int x0, int x1) {
        double target = colour.hueDegrees();
        int n = 0;
        for (int y = 0; y < img.height(); y++) {
            for (int x = Math.max(0, x0); x < Math.min(img.width(), x1); x++) {
                int p = img.argbAt(x, y);
                double[] hsv = Rgb.hsv((p >> 16) & 0xff, (p >> 8) & 0xff, p & 0xff);
                double d = Math.abs(hsv[0] - target);
                d = Math.min(d, 360 - d);
                if (hsv[1] > 0.35 && hsv[2] > 0.12 && d <= hueToleranceDegrees) {
                    n++;
                }
            }
        }
        return n;
    }
}
