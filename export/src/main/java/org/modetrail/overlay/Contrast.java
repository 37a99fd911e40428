package org.modetrail.overlay;

import java.awt.Color;

/**
 * The text and halo colour that reads on a given colour, for overlay videos and the editor's canvas alike: black
 * on light colours, white on dark ones, whichever contrasts more by the WCAG 2 contrast ratio, (L1 + 0.05) /
 * (L2 + 0.05) on relative luminance. The two are equal at L = 0.179.
 */
public final class Contrast {
    private Contrast() {
    }

    /** @param rgb packed 0xRRGGBB (alpha ignored) */
    public static Color textColourOn(int rgb) {
        double l = 0.2126 * linear((rgb >> 16) & 0xFF) + 0.7152 * linear((rgb >> 8) & 0xFF)
                + 0.0722 * linear(rgb & 0xFF);
        return l > 0.179 ? Color.BLACK : Color.WHITE;
    }

    /** An sRGB channel 0..255 as linear light 0..1. */
    private static double linear(int channel) {
        double c = channel / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }
}
