package org.modetrail.summary;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;
import org.modetrail.calibration.GroundSample;
import org.modetrail.calibration.GroundTrajectory;
import org.modetrail.calibration.TrajectoryConfig;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/** The ground paths of a calibrated project's tracks, for the summary; none without a calibration. */
public final class GroundPaths {
    private GroundPaths() {
    }

    public static Map<Integer, GroundPath> of(Project project, double[] timeOfFrame) {
        return of(project, timeOfFrame, TrajectoryConfig.defaults());
    }

    public static Map<Integer, GroundPath> of(Project project, double[] timeOfFrame, TrajectoryConfig config) {
        Map<Integer, GroundPath> out = new HashMap<>();
        samples(project, GroundTrajectory.table(timeOfFrame), config).forEach((id, s) -> out.put(id, of(id, s)));
        return out;
    }

    /** Every track's ground samples by track id; none without a calibration. */
    public static Map<Integer, List<GroundSample>> samples(Project project, IntToDoubleFunction timeOfFrame,
                                                           TrajectoryConfig config) {
        Map<Integer, List<GroundSample>> out = new HashMap<>();
        if (project.site().calibration() == null) {
            return out;
        }
        for (Track t : project.tracks()) {
            out.put(t.id(), GroundTrajectory.of(project, t, timeOfFrame, config));
        }
        return out;
    }

    static GroundPath of(int trackId, List<GroundSample> samples) {
        int n = samples.size();
        int[] frames = new int[n];
        double[] x = new double[n];
        double[] y = new double[n];
        double[] v = new double[n];
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            GroundSample g = samples.get(i);
            frames[i] = g.frame();
            x[i] = g.smoothed().x();
            y[i] = g.smoothed().y();
            v[i] = g.speedMs();
            s[i] = g.speedSigmaMs();
        }
        return new GroundPath(trackId, frames, x, y, v, s);
    }
}
