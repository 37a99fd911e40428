package org.modetrail.demo.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class ScenarioConfigTest {

    @Test
    void defaultsAreTheDocumentedOnes() {
        ScenarioConfig d = ScenarioConfig.defaults();
        assertEquals(new ScenarioConfig(640, 480, 25, 200, 1, 3, true), d);
        assertEquals(1.0, d.scale());
        assertEquals(0.5, d.withSize(320, 240).scale());
    }

    @Test
    void rejectsWhatCannotBeRenderedOrEncoded() {
        ScenarioConfig d = ScenarioConfig.defaults();
        // Odd sizes cannot be encoded as 4:2:0 H.264.
        assertThrows(IllegalArgumentException.class, () -> d.withSize(641, 480));
        assertThrows(IllegalArgumentException.class, () -> d.withSize(158, 480));
        assertThrows(IllegalArgumentException.class, () -> d.withTiming(0, 200));
        assertThrows(IllegalArgumentException.class, () -> d.withTiming(25, 99));
        assertThrows(IllegalArgumentException.class, () -> d.withTiming(25, 2001));
        assertThrows(IllegalArgumentException.class, () -> d.withSensorNoise(-1));
        assertThrows(IllegalArgumentException.class, () -> d.withSensorNoise(33));
    }

    @Test
    void rendersRejectWrongFramesAndBuffers() {
        TrackingScenario s = TrackingScenarios.create(ScenarioKind.TRANSLATION, ScenarioConfig.defaults()
                .withSize(320, 240));
        assertThrows(IllegalArgumentException.class, () -> s.render(-1, new int[320 * 240]));
        assertThrows(IllegalArgumentException.class, () -> s.render(200, new int[320 * 240]));
        assertThrows(IllegalArgumentException.class, () -> s.render(0, new int[320 * 239]));
        assertThrows(IllegalArgumentException.class, () -> s.truth(1, 0));
        assertThrows(IllegalArgumentException.class, () -> s.truth(0, 200));
    }

    @Test
    void boxIouIsOverlapOverUnion() {
        ScenarioBox a = new ScenarioBox(0, 0, 10, 10, 1);
        assertEquals(1.0, a.iou(a));
        // Half overlap: 50 / (100 + 100 - 50).
        assertEquals(50.0 / 150, a.iou(new ScenarioBox(5, 0, 10, 10, 1)), 1e-12);
        assertEquals(0.0, a.iou(new ScenarioBox(10, 0, 10, 10, 1)));
        assertThrows(IllegalArgumentException.class, () -> new ScenarioBox(0, 0, -1, 10, 1));
        assertThrows(IllegalArgumentException.class, () -> new ScenarioBox(0, 0, 1, 10, 1.5));
    }
}
