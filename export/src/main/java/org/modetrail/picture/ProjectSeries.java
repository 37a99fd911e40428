package org.modetrail.picture;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToDoubleFunction;
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
            int colour = colourBy == ColourBy.TRACK ? Palette.colour(k)
                    : project.objectClass(t.className()).map(ObjectClass::colour).orElse(0x808080);
            out.add(new PlotSeries(t.id(), label(t), colour, time, x, y));
            k++;
        }
        return out;
    }

    /** The legend text for a track: its id and class. */
    public static String label(Track t) {
        return t.id() + " " + t.className();
    }
}
