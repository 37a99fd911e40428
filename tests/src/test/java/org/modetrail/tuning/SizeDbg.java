package org.modetrail.tuning;

import java.util.Locale;

import org.modetrail.demo.scenario.ScenarioConfig;
import org.modetrail.demo.scenario.ScenarioKind;
import org.modetrail.demo.scenario.TrackingScenarios;
import org.modetrail.model.Box;
import org.modetrail.trackbench.ModetrailTracker;
import org.modetrail.trackbench.ScenarioClip;
import org.modetrail.trackbench.TrackRun;

public final class SizeDbg {
    public static void main(String[] args) {
        ScenarioKind kind = ScenarioKind.valueOf(args[0]);
        ScenarioConfig c = ScenarioConfig.defaults().withSeed(Long.parseLong(args[1]));
        ScenarioClip clip = new ScenarioClip(TrackingScenarios.create(kind, c));
        TrackRun run = TrackRun.of(new ModetrailTracker(Tune.config()), clip);
        for (int f = 0; f < clip.frameCount(); f += 10) {
            Box b = run.boxes().get(f);
            Box t = clip.truth(f).box();
            System.out.printf(Locale.ROOT, "%3d box %5.1f,%5.1f %5.1fx%5.1f truth %5.1f,%5.1f %5.1fx%5.1f iou %.2f%n", f,
                    b.centreX(), b.centreY(), b.width(), b.height(), t.centreX(), t.centreY(), t.width(), t.height(),
                    b.iou(t));
        }
    }
}
