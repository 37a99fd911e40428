package org.modetrail.trackbench;

import org.modetrail.demo.scenario.ScenarioBox;
import org.modetrail.demo.scenario.TrackingScenario;
import org.modetrail.model.Box;

/** One of the generator's tracking scenarios seen as a bench clip: object 0 is the one tracked. */
public record ScenarioClip(TrackingScenario scenario) implements BenchClip {

    @Override
    public String name() {
        return scenario.kind().slug();
    }

    @Override
    public int width() {
        return scenario.width();
    }

    @Override
    public int height() {
        return scenario.height();
    }

    @Override
    public int frameCount() {
        return scenario.frameCount();
    }

    @Override
    public void render(int frame, int[] rgb) {
        scenario.render(frame, rgb);
    }

    @Override
    public TruthBox truth(int frame) {
        ScenarioBox t = scenario.truth(0, frame);
        return new TruthBox(new Box(t.x(), t.y(), t.width(), t.height()), t.visible());
    }
}
