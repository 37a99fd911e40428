package org.modetrail.demo.scenario;

import java.util.Random;

/**
 * Draws a family scenario's plan from its kind and seed: the common draws of {@link FamilyDesign.Setting} (frame
 * size, clip length 150 to 400 frames, exposure, noise), then the kind's own planner.
 */
final class FamilyPlans {

    private FamilyPlans() {
    }

    static FamilyPlan plan(FamilyKind kind, long seed) {
        if (kind == null) {
            throw new IllegalArgumentException("kind is required");
        }
        Random r = FamilyDesign.random(kind, seed);
        int width = 640;
        int height = 480;
        int frames;
        if (kind == FamilyKind.FAST_LARGE) {
            boolean full = r.nextDouble() < 0.4;
            width = full ? 1920 : 1280;
            height = full ? 1080 : 720;
            frames = 150 + r.nextInt(101);
        } else {
            frames = 150 + r.nextInt(251);
        }
        double[] shutter = switch (kind) {
            case SMALL_ERRATIC -> new double[] {0.3, 1};
            case LOOKALIKES, LIGHTING_OCCLUSION -> new double[] {0.2, 0.8};
            case PUSHED -> new double[] {0.5, 1};
            case PERSPECTIVE, TURNING -> new double[] {0.2, 0.7};
            case PLAZA -> new double[] {0.2, 0.6};
            case FAST_LARGE -> new double[] {0.4, 1};
        };
        double exposure = shutter[0] + (shutter[1] - shutter[0]) * r.nextDouble();
        int noise = kind == FamilyKind.SMALL_ERRATIC ? 3 + r.nextInt(6) : 2 + r.nextInt(5);
        FamilyDesign.Setting s = new FamilyDesign.Setting(kind, seed, r, width, height, frames, exposure, noise);
        return switch (kind) {
            case SMALL_ERRATIC -> TabletopPlans.smallErratic(s);
            case LOOKALIKES -> TabletopPlans.lookalikes(s);
            case PUSHED -> TabletopPlans.pushed(s);
            case PERSPECTIVE -> StreetPlans.perspective(s);
            case PLAZA -> StreetPlans.plaza(s);
            case TURNING -> MotionPlans.turning(s);
            case FAST_LARGE -> MotionPlans.fastLarge(s);
            case LIGHTING_OCCLUSION -> MotionPlans.lightingOcclusion(s);
        };
    }
}
