package org.modetrail.picture;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.jfree.svg.SVGGraphics2D;
import org.modetrail.format.project.AtomicWrite;

/**
 * Trajectory and speed plots, drawn with JFreeChart and written as PNG (through ImageIO) or SVG (through
 * JFreeSVG). Files are replaced atomically: a reader sees the old plot or the new one, never half of one. The
 * same input gives the same bytes.
 *
 * <p>An empty list of series is not an error: it gives a valid chart with its axes and the message
 * "No tracks to plot" in place of the data, so a command run on a project without tracks still leaves a picture.
 */
public final class Plots {
    private Plots() {
    }

    /**
     * Trajectories in the image plane: x and y in pixels, y pointing down as on the image, the frame's edges drawn
     * and both axes at the same scale.
     */
    public static void writeImageTrajectory(List<PlotSeries> series, int frameWidth, int frameHeight,
                                            PlotOptions options, PlotFormat format, Path out) throws IOException {
        write(Charts.imagePlane(List.copyOf(series), frameWidth, frameHeight, options), options, format, out);
    }

    public static void writeImageTrajectoryPng(List<PlotSeries> series, int frameWidth, int frameHeight,
                                               PlotOptions options, Path out) throws IOException {
        writeImageTrajectory(series, frameWidth, frameHeight, options, PlotFormat.PNG, out);
    }

    public static void writeImageTrajectorySvg(List<PlotSeries> series, int frameWidth, int frameHeight,
                                               PlotOptions options, Path out) throws IOException {
        writeImageTrajectory(series, frameWidth, frameHeight, options, PlotFormat.SVG, out);
    }

    /** Trajectories on the ground plane: x and y in metres, y up, both axes at the same scale. */
    public static void writeGroundTrajectory(List<PlotSeries> series, PlotOptions options, PlotFormat format,
                                             Path out) throws IOException {
        write(Charts.groundPlane(List.copyOf(series), options), options, format, out);
    }

    public static void writeGroundTrajectoryPng(List<PlotSeries> series, PlotOptions options, Path out)
            throws IOException {
        writeGroundTrajectory(series, options, PlotFormat.PNG, out);
    }

    public static void writeGroundTrajectorySvg(List<PlotSeries> series, PlotOptions options, Path out)
            throws IOException {
        writeGroundTrajectory(series, options, PlotFormat.SVG, out);
    }

    /** Speed (m/s) over time (s), one line per track, shaded by ± sigma where the series carries it. */
    public static void writeSpeed(List<SpeedSeries> series, PlotOptions options, PlotFormat format, Path out)
            throws IOException {
        write(Charts.speed(List.copyOf(series), options), options, format, out);
    }

    public static void writeSpeedPng(List<SpeedSeries> series, PlotOptions options, Path out) throws IOException {
        writeSpeed(series, options, PlotFormat.PNG, out);
    }

    public static void writeSpeedSvg(List<SpeedSeries> series, PlotOptions options, Path out) throws IOException {
        writeSpeed(series, options, PlotFormat.SVG, out);
    }

    /**
     * Curves of y over x on the given fixed ranges, such as an evaluation's success plot (the fraction of frames
     * above each IoU threshold) or precision plot; each series' {@code x} and {@code y} are the curve's points.
     */
    public static void writeCurves(List<PlotSeries> series, String title, String xLabel, String yLabel,
                                   double xMin, double xMax, double yMin, double yMax, PlotOptions options,
                                   PlotFormat format, Path out) throws IOException {
        write(Charts.curves(List.copyOf(series), title, xLabel, yLabel, new org.jfree.data.Range(xMin, xMax),
                new org.jfree.data.Range(yMin, yMax), options), options, format, out);
    }

    private static void write(Charts.Chart c, PlotOptions o, PlotFormat format, Path out) throws IOException {
        if (c.equalScale()) {
            Charts.equaliseScale(c.chart(), o.width(), o.height());
        }
        Rectangle2D area = new Rectangle2D.Double(0, 0, o.width(), o.height());
        switch (format) {
            case PNG -> {
                BufferedImage image = new BufferedImage(o.width(), o.height(), BufferedImage.TYPE_INT_RGB);
                Graphics2D g = image.createGraphics();
                try {
                    hints(g);
                    c.chart().draw(g, area);
                } finally {
                    g.dispose();
                }
                AtomicWrite.replace(out, stream -> {
                    if (!ImageIO.write(image, "png", stream)) {
                        throw new IOException("this Java has no PNG writer");
                    }
                });
            }
            case SVG -> {
                SVGGraphics2D g = new SVGGraphics2D(o.width(), o.height());
                // The default prefix holds the clock time; a fixed one keeps the file the same from run to run.
                g.setDefsKeyPrefix("modetrail");
                hints(g);
                c.chart().draw(g, area);
                byte[] svg = g.getSVGDocument().getBytes(StandardCharsets.UTF_8);
                g.dispose();
                AtomicWrite.replace(out, stream -> stream.write(svg));
            }
        }
    }

    private static void hints(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
    }
}
