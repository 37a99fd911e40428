package org.modetrail.summary;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.ContactPoint;
import org.modetrail.model.CountingLine;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.Zone;

/**
 * Per-track summaries of a project: duration, path length, speeds from the ground paths, time in each zone and
 * counting-line crossings with direction. Positions are each class's ground contact point on the box. Zones and
 * lines are judged in the image, so they work without a calibration; a frame counts towards a zone for its own
 * duration (the time to the next frame). Paths and crossings run between consecutive frames that both have a box:
 * across a hidden span or frames without a box nothing is inferred.
 *
 * <p>The peak speed is the largest speed among the frames whose speed is measured well enough to stand as a peak: a
 * maximum picks out the frames whose error happens to be largest, so a frame of doubtful size or place would
 * otherwise make the peak. Left out are interpolated boxes (the tracker did not see the object there) and speeds
 * whose standard uncertainty is above {@link #PEAK_MAX_RELATIVE_SIGMA} of the speed; how many were left out is in
 * {@link TrackSummary#peakLeftOut()}. The mean speed keeps every frame.
 */
public final class TrackSummaries {
    /**
     * A speed whose standard uncertainty is above this share of it is left out of the peak: 0.1, so a peak's 95%
     * interval (k = 1.96, JCGM 100:2008 annex G) is within about ±20% of it. Rule of thumb, no source.
     */
    public static final double PEAK_MAX_RELATIVE_SIGMA = 0.1;

    private TrackSummaries() {
    }

    /**
     * @param timeOfFrame presentation time of every frame of the video, in seconds, increasing
     * @param paths       ground paths by track id; empty without a calibration
     */
    public static List<TrackSummary> of(Project project, double[] timeOfFrame, Map<Integer, GroundPath> paths) {
        if (timeOfFrame.length != project.video().frameCount()) {
            throw new IllegalArgumentException("the video has " + project.video().frameCount()
                    + " frames but " + timeOfFrame.length + " frame times were given");
        }
        double typicalFrame = typicalFrameDuration(timeOfFrame);
        List<TrackSummary> out = new ArrayList<>();
        for (Track t : project.tracks()) {
            out.add(summarise(project, t, timeOfFrame, typicalFrame, paths.get(t.id())));
        }
        return out;
    }

    private static TrackSummary summarise(Project project, Track t, double[] time, double typicalFrame,
                                          GroundPath path) {
        ContactPoint contact = project.contactPoint(t.className());
        List<Zone> zones = project.site().zones();
        List<CountingLine> lines = project.site().lines();
        double[] inZone = new double[zones.size()];
        List<LineCrossing> crossings = new ArrayList<>();
        int first = -1;
        int last = -1;
        int boxed = 0;
        double pathPx = 0;
        PixelPoint previous = null;
        // Per line: the side of the last point that was not on it, and that point.
        double[] lastSide = new double[lines.size()];
        PixelPoint[] lastOffLine = new PixelPoint[lines.size()];
        int previousFrame = -2;
        for (FrameAnnotation a : t.frames().values()) {
            Box b = a.box();
            int f = a.frame();
            if (b == null || f != previousFrame + 1) {
                // A hidden or absent mark, or frames without any box, break the path: neither distance nor a
                // crossing is inferred across the gap.
                previous = null;
                java.util.Arrays.fill(lastSide, 0);
            }
            previousFrame = f;
            if (b == null) {
                continue;
            }
            PixelPoint p = contact.on(b);
            if (first < 0) {
                first = f;
            }
            last = f;
            boxed++;
            double dt = f + 1 < time.length ? time[f + 1] - time[f] : typicalFrame;
            for (int z = 0; z < zones.size(); z++) {
                if (zones.get(z).contains(p)) {
                    inZone[z] += dt;
                }
            }
            if (previous != null) {
                pathPx += Math.hypot(p.x() - previous.x(), p.y() - previous.y());
            }
            for (int k = 0; k < lines.size(); k++) {
                CountingLine l = lines.get(k);
                double side = side(l, p);
                if (side == 0) {
                    continue; // on the line: wait for the side it leaves to
                }
                if (lastSide[k] != 0 && (side < 0) != (lastSide[k] < 0) && withinEnds(l, lastOffLine[k], p)) {
                    crossings.add(new LineCrossing(l.name(), f, time[f], lastSide[k] < 0
                            ? CrossingDirection.LEFT_TO_RIGHT : CrossingDirection.RIGHT_TO_LEFT));
                }
                lastSide[k] = side;
                lastOffLine[k] = p;
            }
            previous = p;
        }
        Map<String, Double> zoneSeconds = new LinkedHashMap<>();
        for (int z = 0; z < zones.size(); z++) {
            zoneSeconds.put(zones.get(z).name(), inZone[z]);
        }
        double duration = first < 0 ? 0 : time[last] - time[first]
                + (last + 1 < time.length ? time[last + 1] - time[last] : typicalFrame);
        double pathM = Double.NaN;
        double mean = Double.NaN;
        double peak = Double.NaN;
        double peakSigma = Double.NaN;
        int leftOut = 0;
        if (path != null && path.frames().length > 0) {
            pathM = 0;
            for (int i = 1; i < path.frames().length; i++) {
                if (path.frames()[i] == path.frames()[i - 1] + 1) {
                    pathM += Math.hypot(path.xM()[i] - path.xM()[i - 1], path.yM()[i] - path.yM()[i - 1]);
                }
            }
            double sum = 0;
            int n = 0;
            for (int i = 0; i < path.speedMs().length; i++) {
                double v = path.speedMs()[i];
                if (Double.isFinite(v)) {
                    sum += v;
                    n++;
                    if (!peakWorthy(t.frames().get(path.frames()[i]), v, path.speedSigmaMs()[i])) {
                        leftOut++;
                    } else if (!(v <= peak)) {
                        peak = v;
                        peakSigma = path.speedSigmaMs()[i];
                    }
                }
            }
            mean = n > 0 ? sum / n : Double.NaN;
        }
        return new TrackSummary(t.id(), t.className(), first, last, boxed, duration, pathPx, pathM, mean, peak,
                peakSigma, leftOut, zoneSeconds, crossings);
    }

    /** Whether a frame's speed may stand as a peak (see the class comment). */
    static boolean peakWorthy(FrameAnnotation a, double speed, double sigma) {
        if (a != null && a.source() == BoxSource.INTERPOLATED) {
            return false;
        }
        return !(sigma > PEAK_MAX_RELATIVE_SIGMA * speed);
    }

    /**
     * Whether the step from {@code a} to {@code b}, which are on opposite sides of the line through {@code l},
     * passes it between its end points rather than beyond them. The side of a point is the sign of the cross
     * product of the line's direction and the point's offset from its first end; with y down on the image,
     * negative is the left as one looks along the line. Points exactly on the line are skipped by the caller, so
     * an object that stops on the line and goes back is not counted, and one that pauses on it and goes on is.
     */
    static boolean withinEnds(CountingLine l, PixelPoint a, PixelPoint b) {
        double sa = side(l, a);
        double sb = side(l, b);
        double ex = l.to().x() - l.from().x();
        double ey = l.to().y() - l.from().y();
        double t = sa / (sa - sb);
        double px = a.x() + t * (b.x() - a.x()) - l.from().x();
        double py = a.y() + t * (b.y() - a.y()) - l.from().y();
        double along = (px * ex + py * ey) / (ex * ex + ey * ey);
        return along >= 0 && along <= 1;
    }

    private static double side(CountingLine l, PixelPoint p) {
        double ex = l.to().x() - l.from().x();
        double ey = l.to().y() - l.from().y();
        return ex * (p.y() - l.from().y()) - ey * (p.x() - l.from().x());
    }

    /** The median gap between frame times, for the last frame's duration. */
    static double typicalFrameDuration(double[] time) {
        if (time.length < 2) {
            return 0;
        }
        double[] gaps = new double[time.length - 1];
        for (int i = 1; i < time.length; i++) {
            gaps[i - 1] = time[i] - time[i - 1];
        }
        java.util.Arrays.sort(gaps);
        return gaps[gaps.length / 2];
    }
}
