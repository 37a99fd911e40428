package org.modetrail.picture;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYShapeAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.Range;
import org.jfree.data.xy.DefaultXYDataset;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/** Builds the JFreeChart charts behind {@link Plots}; each chart is new, so nothing is shared between calls. */
final class Charts {
    static final String NO_DATA = "No tracks to plot";
    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 18);
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 14);
    private static final Font TICK = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    private static final Color GRID = new Color(0xD0D0D0);

    private Charts() {
    }

    /** A chart with whether its two axes must have the same scale (units per pixel). */
    record Chart(JFreeChart chart, boolean equalScale) {
    }

    static Chart imagePlane(List<PlotSeries> series, int frameWidth, int frameHeight, PlotOptions o) {
        if (frameWidth <= 0 || frameHeight <= 0) {
            throw new IllegalArgumentException("frame size must be positive, got " + frameWidth + "x" + frameHeight);
        }
        XYPlot plot = trajectoryPlot(series, "x (px)", "y (px, downwards as on the image)", o);
        plot.getDomainAxis().setRange(0, frameWidth);
        plot.getRangeAxis().setRange(0, frameHeight);
        plot.getRangeAxis().setInverted(true);
        // The frame's edges, so they stay visible when the equal scale widens one axis.
        plot.addAnnotation(new XYShapeAnnotation(new Rectangle2D.Double(0, 0, frameWidth, frameHeight),
                new BasicStroke(1.5f), new Color(0x707070)));
        JFreeChart chart = chart(o.titleOr("Trajectories in the image"), plot,
                "frame " + frameWidth + " x " + frameHeight + " px");
        return new Chart(chart, true);
    }

    static Chart groundPlane(List<PlotSeries> series, PlotOptions o) {
        XYPlot plot = trajectoryPlot(series, "x (m)", "y (m)", o);
        double minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (PlotSeries s : series) {
            for (int i = 0; i < s.size(); i++) {
                double x = s.xAt(i), y = s.yAt(i);
                if (!Double.isNaN(x) && !Double.isNaN(y)) {
                    minX = Math.min(minX, x);
                    maxX = Math.max(maxX, x);
                    minY = Math.min(minY, y);
                    maxY = Math.max(maxY, y);
                }
            }
        }
        if (minX > maxX) {
            minX = 0;
            maxX = 1;
            minY = 0;
            maxY = 1;
        }
        plot.getDomainAxis().setRange(padded(minX, maxX));
        plot.getRangeAxis().setRange(padded(minY, maxY));
        return new Chart(chart(o.titleOr("Trajectories on the ground"), plot, "equal scale on both axes"), true);
    }

    static Chart speed(List<SpeedSeries> series, PlotOptions o) {
        DefaultXYDataset lines = new DefaultXYDataset();
        YIntervalSeriesCollection bands = new YIntervalSeriesCollection();
        List<Integer> bandColours = new ArrayList<>();
        int[] steps = new int[series.size()];
        int[] lengths = new int[series.size()];
        boolean anySigma = false;
        List<String> keys = keys(series.stream().map(SpeedSeries::label).toList());
        for (int k = 0; k < series.size(); k++) {
            SpeedSeries s = series.get(k);
            lines.addSeries(keys.get(k), new double[][] {s.timeS(), s.speed()});
            steps[k] = SeriesLook.step(s.size(), o.markerCount());
            lengths[k] = s.size();
            // One band per unbroken run of known speed and sigma, so a gap leaves a gap in the band too.
            YIntervalSeries run = null;
            int runs = 0;
            for (int i = 0; i < s.size(); i++) {
                double v = s.speedAt(i), sd = s.sigmaAt(i);
                if (Double.isNaN(v) || Double.isNaN(sd)) {
                    run = null;
                    continue;
                }
                if (run == null) {
                    run = new YIntervalSeries("band " + k + "." + runs++, false, true);
                    bands.addSeries(run);
                    bandColours.add(s.colour());
                }
                run.add(s.timeAt(i), v, Math.max(0, v - sd), v + sd);
                anySigma = true;
            }
        }
        NumberAxis time = axis("time (s)");
        NumberAxis speed = axis("speed (m/s)");
        speed.setAutoRangeIncludesZero(true);
        XYPlot plot = new XYPlot(lines, time, speed, lineRenderer(colours(series), steps, lengths));
        if (anySigma) {
            SeriesLook.Bands band = new SeriesLook.Bands();
            for (int i = 0; i < bandColours.size(); i++) {
                Color c = SeriesLook.colour(bandColours.get(i));
                band.setSeriesFillPaint(i, c);
                band.setSeriesPaint(i, c);
            }
            plot.setDataset(1, bands);
            plot.setRenderer(1, band);
            plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        }
        style(plot);
        return new Chart(chart(o.titleOr("Speed over time"), plot, anySigma ? "shaded: speed \u00b1 1 standard"
                + " uncertainty" : null), false);
    }

    /**
     * Curves of y over x on fixed ranges (evaluation plots: success over the IoU threshold, precision over the
     * centre error), one per series, in the series' colours with dashes and markers.
     */
    static Chart curves(List<PlotSeries> series, String title, String xLabel, String yLabel, Range x, Range y,
                        PlotOptions o) {
        XYPlot plot = trajectoryPlot(series, xLabel, yLabel, o);
        plot.getDomainAxis().setRange(x);
        plot.getRangeAxis().setRange(y);
        return new Chart(chart(o.titleOr(title), plot, null), false);
    }

    private static XYPlot trajectoryPlot(List<PlotSeries> series, String xLabel, String yLabel, PlotOptions o) {
        DefaultXYDataset data = new DefaultXYDataset();
        int[] steps = new int[series.size()];
        int[] lengths = new int[series.size()];
        int[] colours = new int[series.size()];
        List<String> keys = keys(series.stream().map(PlotSeries::label).toList());
        for (int k = 0; k < series.size(); k++) {
            PlotSeries s = series.get(k);
            data.addSeries(keys.get(k), new double[][] {s.x(), s.y()});
            steps[k] = SeriesLook.step(s.size(), o.markerCount());
            lengths[k] = s.size();
            colours[k] = s.colour();
        }
        XYPlot plot = new XYPlot(data, axis(xLabel), axis(yLabel), lineRenderer(colours, steps, lengths));
        style(plot);
        return plot;
    }

    /** Series keys must be unique in a dataset, and two tracks may carry the same label: the later get a number. */
    private static List<String> keys(List<String> labels) {
        java.util.Set<String> used = new java.util.HashSet<>();
        List<String> keys = new ArrayList<>();
        for (int k = 0; k < labels.size(); k++) {
            String key = labels.get(k);
            for (int n = 2; !used.add(key); n++) {
                key = labels.get(k) + " (" + n + ")";
            }
            keys.add(key);
        }
        return keys;
    }

    private static int[] colours(List<SpeedSeries> series) {
        int[] c = new int[series.size()];
        for (int k = 0; k < c.length; k++) {
            c[k] = series.get(k).colour();
        }
        return c;
    }

    private static SeriesLook.Lines lineRenderer(int[] colours, int[] steps, int[] lengths) {
        SeriesLook.Lines r = new SeriesLook.Lines(steps, lengths);
        for (int k = 0; k < colours.length; k++) {
            Color c = SeriesLook.colour(colours[k]);
            r.setSeriesPaint(k, c);
            r.setSeriesFillPaint(k, c);
            r.setSeriesStroke(k, SeriesLook.stroke(k));
            r.setSeriesShape(k, SeriesLook.shape(k));
        }
        r.setUseFillPaint(true);
        return r;
    }

    private static NumberAxis axis(String label) {
        NumberAxis a = new TextLabelAxis(label);
        a.setLabelFont(LABEL);
        a.setTickLabelFont(TICK);
        a.setAutoRangeIncludesZero(false);
        return a;
    }

    private static void style(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(GRID);
        plot.setRangeGridlinePaint(GRID);
        plot.setDomainGridlineStroke(new BasicStroke(1f));
        plot.setRangeGridlineStroke(new BasicStroke(1f));
        plot.setOutlinePaint(new Color(0x404040));
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        plot.setNoDataMessage(NO_DATA);
        plot.setNoDataMessageFont(new Font(Font.SANS_SERIF, Font.ITALIC, 16));
    }

    private static JFreeChart chart(String title, XYPlot plot, String subtitle) {
        JFreeChart chart = new JFreeChart(title, TITLE, plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        if (subtitle != null) {
            TextTitle sub = new TextTitle(subtitle, new Font(Font.SANS_SERIF, Font.PLAIN, 12));
            sub.setPaint(new Color(0x505050));
            chart.addSubtitle(sub);
        }
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setItemFont(LABEL);
        legend.setFrame(BlockBorder.NONE);
        if (plot.getDataset() == null || plot.getDataset().getSeriesCount() == 0) {
            chart.removeLegend();
        }
        return chart;
    }

    private static Range padded(double min, double max) {
        double span = max - min;
        double pad = span > 0 ? span * 0.05 : 1;
        return new Range(min - pad, max + pad);
    }

    /**
     * Widens one axis so both have the same units per pixel in a picture of {@code width} x {@code height},
     * measured by laying the chart out on a scratch image (tick labels change the data area, so twice).
     */
    static void equaliseScale(JFreeChart chart, int width, int height) {
        XYPlot plot = chart.getXYPlot();
        for (int pass = 0; pass < 3; pass++) {
            ChartRenderingInfo info = new ChartRenderingInfo();
            BufferedImage scratch = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = scratch.createGraphics();
            try {
                g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
                chart.draw(g, new Rectangle2D.Double(0, 0, width, height), info);
            } finally {
                g.dispose();
            }
            Rectangle2D area = info.getPlotInfo().getDataArea();
            if (area.getWidth() <= 1 || area.getHeight() <= 1) {
                return;
            }
            Range xr = plot.getDomainAxis().getRange();
            Range yr = plot.getRangeAxis().getRange();
            double sx = xr.getLength() / area.getWidth();
            double sy = yr.getLength() / area.getHeight();
            if (Math.abs(sx - sy) <= 1e-4 * Math.max(sx, sy)) {
                return;
            }
            if (sx > sy) {
                plot.getRangeAxis().setRange(around(yr.getCentralValue(), sx * area.getHeight()));
            } else {
                plot.getDomainAxis().setRange(around(xr.getCentralValue(), sy * area.getWidth()));
            }
        }
    }

    private static Range around(double centre, double length) {
        return new Range(centre - length / 2, centre + length / 2);
    }
}
