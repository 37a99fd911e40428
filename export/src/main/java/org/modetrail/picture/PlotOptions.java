package org.modetrail.picture;

/**
 * How a plot is drawn.
 *
 * @param width       picture width in pixels (PNG) or user units (SVG), 200 to 10000; default 1000
 * @param height      picture height, 150 to 10000; default 750
 * @param title       the title, or blank for the plot's own default title
 * @param markerCount about how many markers each series carries along its line (0 for none), 0 to 1000;
 *                    default 12. Markers and line dashes differ from series to series, so colour is not the
 *                    only way to tell them apart
 */
public record PlotOptions(int width, int height, String title, int markerCount) {

    public static final int DEFAULT_WIDTH = 1000;
    public static final int DEFAULT_HEIGHT = 750;
    public static final int DEFAULT_MARKERS = 12;

    public PlotOptions {
        if (width < 200 || width > 10_000 || height < 150 || height > 10_000) {
            throw new IllegalArgumentException("plot size must be 200 to 10000 wide and 150 to 10000 high, got "
                    + width + "x" + height);
        }
        if (markerCount < 0 || markerCount > 1000) {
            throw new IllegalArgumentException("markers per series must be 0 to 1000, got " + markerCount);
        }
        title = title == null ? "" : title.strip();
    }

    public static PlotOptions defaults() {
        return new PlotOptions(DEFAULT_WIDTH, DEFAULT_HEIGHT, "", DEFAULT_MARKERS);
    }

    public PlotOptions withSize(int newWidth, int newHeight) {
        return new PlotOptions(newWidth, newHeight, title, markerCount);
    }

    public PlotOptions withTitle(String newTitle) {
        return new PlotOptions(width, height, newTitle, markerCount);
    }

    public PlotOptions withMarkerCount(int n) {
        return new PlotOptions(width, height, title, n);
    }

    String titleOr(String fallback) {
        return title.isEmpty() ? fallback : title;
    }
}
