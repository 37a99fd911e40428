package org.modetrail.trackbench;

import org.modetrail.demo.scenario.ScenarioBox;
import org.modetrail.demo.scenario.TrackingScenario;
import org.modetrail.model.Box;

/** One of the generator's tracking scenarios (of the eight kinds or of the family) as a multi-object clip. */
public record ScenarioMultiClip(String name, TrackingScenario scenario) implements MultiClip {
    @Override
    public int width() {
        return scenario.width();
    }

    @Override
    public int height() {
        return scenario.height();
    }

    @Override
    public int fps() {
        return scenario.fps();
    }

    @Override
    public int frameCount() {
        return scenario.frameCount();
    }

    @Override
    public int objectCount() {
        return scenario.objectCount();
    }

    @Override
    public void render(int frame, int[] rgb) {
        scenario.render(frame, rgb);
    }

    @Override
    public TruthBox truth(int object, int frame) {
        ScenarioBox t = scenario.truth(object, frame);
        return new TruthBox(new Box(t.x(), t.y(), t.width(), t.height()), t.visible());
    }
}
