package org.modetrail.picture;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;
import java.util.function.ToDoubleFunction;
import org.modetrail.calibration.GroundSample;
import org.modetrail.model.Box;
import org.modetrail.model.ContactPoint;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/** Builds plot series from a project's tracks. */
public final class ProjectSeries {
    private ProjectSeries() {
    }

    /**
     * One image-plane series per track that has at least one box, in the project's track order: a point per
     * visible frame, and a gap (NaN) wherever the track is hidden, absent or not annotated between two boxes.
     *
     * @param project   the project
     * @param frameTime the time in seconds of frame n, e.g. {@code source.index()::timeSeconds}, or
     *                  {@code n -> n / fps}
     * @param point     which point of the box is plotted
     * @param colourBy  class colour or one palette colour per track
     */
    public static List<PlotSeries> imagePlane(Project project, IntToDoubleFunction frameTime, TrajectoryPoint point,
                                              ColourBy colourBy) {
        List<PlotSeries> out = new ArrayList<>();
        int k = 0;
        for (Track t : project.tracks()) {
            ContactPoint where = point == TrajectoryPoint.CENTRE ? ContactPoint.CENTRE
                    : project.contactPoint(t.className());
            List<double[]> points = new ArrayList<>();
            int lastFrame = Integer.MIN_VALUE;
            for (FrameAnnotation a : t.frames().values()) {
                if (!a.isVisible()) {
                    continue;
                }
                if (lastFrame != Integer.MIN_VALUE && a.frame() != lastFrame + 1) {
                    points.add(new double[] {frameTime.applyAsDouble(lastFrame + 1), Double.NaN, Double.NaN});
                }
                Box b = a.box();
                PixelPoint p = where.on(b);
                points.add(new double[] {frameTime.applyAsDouble(a.frame()), p.x(), p.y()});
                lastFrame = a.frame();
            }
            if (points.isEmpty()) {
                continue;
            }
            double[] time = new double[points.size()];
            double[] x = new double[points.size()];
            double[] y = new double[points.size()];
            for (int i = 0; i < points.size(); i++) {
                time[i] = points.get(i)[0];
                x[i] = points.get(i)[1];
                y[i] = points.get(i)[2];
            }
            out.add(new PlotSeries(t.id(), label(t), colour(project, t, colourBy, k), time, x, y));
            k++;
        }
        return out;
    }

    /**
     * One ground-plane series per track with ground samples (metres, the smoothed positions), and a gap wherever
     * consecutive samples are not consecutive frames.
     *
     * @param ground per track id its ground samples, as the calibration code gives them
     */
    public static List<PlotSeries> groundPlane(Project project, Map<Integer, List<GroundSample>> ground,
                                               ColourBy colourBy) {
        List<PlotSeries> out = new ArrayList<>();
        int k = 0;
        for (Track t : project.tracks()) {
            List<GroundSample> g = ground.getOrDefault(t.id(), List.of());
            if (!g.isEmpty()) {
                double[][] c = columns(g, s -> s.smoothed().x(), s -> s.smoothed().y());
                out.add(new PlotSeries(t.id(), label(t), colour(project, t, colourBy, k), c[0], c[1], c[2]));
            }
            k++;
        }
        return out;
    }

    /** One speed series per track with ground samples: the smoothed speed and its standard uncertainty. */
    public static List<SpeedSeries> speeds(Project project, Map<Integer, List<GroundSample>> ground,
                                           ColourBy colourBy) {
        List<SpeedSeries> out = new ArrayList<>();
        int k = 0;
        for (Track t : project.tracks()) {
            List<GroundSample> g = ground.getOrDefault(t.id(), List.of());
            if (!g.isEmpty()) {
                double[][] c = columns(g, GroundSample::speedMs, GroundSample::speedSigmaMs);
                out.add(new SpeedSeries(t.id(), label(t), colour(project, t, colourBy, k), c[0], c[1], c[2]));
            }
            k++;
        }
        return out;
    }

    /** Time and two values per sample, with a NaN row between samples that are not consecutive frames. */
    private static double[][] columns(List<GroundSample> g, ToDoubleFunction<GroundSample> a,
                                      ToDoubleFunction<GroundSample> b) {
        int gaps = 0;
        for (int i = 1; i < g.size(); i++) {
            if (g.get(i).frame() != g.get(i - 1).frame() + 1) {
                gaps++;
            }
        }
        int n = g.size() + gaps;
        double[][] c = new double[3][n];
        int j = 0;
        for (int i = 0; i < g.size(); i++) {
            GroundSample s = g.get(i);
            if (i > 0 && s.frame() != g.get(i - 1).frame() + 1) {
                c[0][j] = (g.get(i - 1).timeS() + s.timeS()) / 2;
                c[1][j] = Double.NaN;
                c[2][j] = Double.NaN;
                j++;
            }
            c[0][j] = s.timeS();
            c[1][j] = a.applyAsDouble(s);
            c[2][j] = b.applyAsDouble(s);
            j++;
        }
        return c;
    }

    private static int colour(Project project, Track t, ColourBy colourBy, int k) {
        return colourBy == ColourBy.TRACK ? Palette.colour(k)
                : project.objectClass(t.className()).map(ObjectClass::colour).orElse(0x808080);
    }

    /** The legend text for a track: its id and class. */
    public static String label(Track t) {
        return t.id() + " " + t.className();
    }
}
