package org.modetrail.picture;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;

/**
 * How the i-th series is told apart besides its colour: one of four line dashes and one of six marker shapes,
 * so the first twelve series all differ in dash and marker together.
 */
final class SeriesLook {
    private static final float LINE = 2f;
    private static final float[][] DASHES = {null, {10f, 5f}, {2f, 4f}, {10f, 4f, 2f, 4f}};
    private static final double M = 5; // marker half size in pixels

    private SeriesLook() {
    }

    static Stroke stroke(int i) {
        float[] dash = DASHES[Math.floorMod(i, DASHES.length)];
        return dash == null
                ? new BasicStroke(LINE, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND)
                : new BasicStroke(LINE, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    static Shape shape(int i) {
        return switch (Math.floorMod(i, 6)) {
            case 0 -> new Ellipse2D.Double(-M, -M, 2 * M, 2 * M);
            case 1 -> new Rectangle2D.Double(-M, -M, 2 * M, 2 * M);
            case 2 -> polygon(0, -M - 1, M + 1, M, -M - 1, M);                      // triangle up
            case 3 -> polygon(0, -M - 1, M + 1, 0, 0, M + 1, -M - 1, 0);             // diamond
            case 4 -> polygon(0, M + 1, M + 1, -M, -M - 1, -M);                      // triangle down
            default -> cross();
        };
    }

    static Color colour(int rgb) {
        return new Color(rgb & 0xFFFFFF);
    }

    private static Shape polygon(double... xy) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(xy[0], xy[1]);
        for (int i = 2; i < xy.length; i += 2) {
            p.lineTo(xy[i], xy[i + 1]);
        }
        p.closePath();
        return p;
    }

    private static Shape cross() {
        double a = M, b = M / 3;
        return polygon(-b, -a, b, -a, b, -b, a, -b, a, b, b, b, b, a, -b, a, -b, b, -a, b, -a, -b, -b, -b);
    }

    /** Every {@code step}-th item (and the first and last) of a series carries a marker. */
    static int step(int items, int markers) {
        return markers <= 0 ? Integer.MAX_VALUE : Math.max(1, (items + markers - 1) / markers);
    }

    /** Lines with markers on every few items only, so long series are not buried under their markers. */
    static final class Lines extends XYLineAndShapeRenderer {
        private static final long serialVersionUID = 1L;
        private final int[] steps;
        private final int[] lengths;

        Lines(int[] steps, int[] lengths) {
            super(true, true);
            this.steps = steps.clone();
            this.lengths = lengths.clone();
            setDrawSeriesLineAsPath(true);
        }

        @Override
        public boolean getItemShapeVisible(int series, int item) {
            return series < steps.length && steps[series] != Integer.MAX_VALUE
                    && (item % steps[series] == 0 || item == lengths[series] - 1);
        }
    }

    /** Bands only (speed ± sigma), drawn under the lines; no legend entries of their own. */
    static final class Bands extends DeviationRenderer {
        private static final long serialVersionUID = 1L;

        Bands() {
            super(false, false);
            setAlpha(0.22f);
            setDefaultSeriesVisibleInLegend(false);
        }
    }
}
