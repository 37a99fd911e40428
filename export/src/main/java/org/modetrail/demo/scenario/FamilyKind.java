package org.modetrail.demo.scenario;

import java.util.Locale;

/**
 * The situations of the scenario family: each is a kind of clip users met where trackers failed, rendered from a
 * seed that varies what real clips vary (sizes, speeds, turns, floors, light, blur, crowding, clip length, encoding
 * quality). Object 0 is the target a single-object tracker starts on; it is in view in frame 0. Sizes are the
 * length of the target's body (its longer side before turning) in pixels of the kind's frame, speeds the target's
 * centre's travel in pixels per frame; {@link #minSize()}, {@link #maxSize()} and {@link #maxSpeed()} state them.
 */
public enum FamilyKind {

    /**
     * A small object, 10 to 30 px long, dark or light, on a pale noisy floor, darting at 2 to 8 px a frame with
     * abrupt turns and short rests, turning its body to where it goes; one or two small bodies of other tones and a
     * few stains nearby. 640 x 480.
     */
    SMALL_ERRATIC(10, 30, 8, ScenarioKind.SMALL_DARK),

    /**
     * Two look-alikes (one colour family, 20 to 60 px) whose paths cross twice, the target passing under the other
     * first and over it the second time, plus a two-colour object circling a loop and sometimes a fourth body; all
     * turn with their paths at 1.5 to 6 px a frame. 640 x 480.
     */
    LOOKALIKES(20, 60, 6, ScenarioKind.CROSSING),

    /**
     * A small object, 14 to 40 px, at rest and then pushed 15 to 40 px in one motion-blurred frame, sliding a little
     * and resting again, two to five times; in about half the clips a tool-like body of another colour comes in from
     * the edge beside it before each push and withdraws after, otherwise another object rests nearby. 640 x 480.
     */
    PUSHED(14, 40, 40, ScenarioKind.FAST_MOTION),

    /**
     * Vehicle-like bodies on a road converging to a vanishing point, approaching (growing up to ten times) and
     * receding (shrinking to a tenth), entering and leaving the frame; 8 to 260 px wide, up to 24 px a frame wholly
     * in view and up to 38 as they leave across the bottom. 640 x 480.
     */
    PERSPECTIVE(8, 260, 24, ScenarioKind.SCALE_CHANGE),

    /**
     * Upright people-like bodies (width a third to a half of the height, 30 to 140 px tall, head, top and bottom in
     * their own colours, many in similar dark clothes) walking across a plaza, entering and leaving, a group standing
     * together, pillars hiding them in part or in full, soft shadows at their feet. 640 x 480.
     */
    PLAZA(30, 140, 4, ScenarioKind.OCCLUSION),

    /**
     * A long body (3 to 4.5 times as long as wide, 60 to 140 px) turning round again and again, so its box goes from
     * tall to wide; and a body walking away up the frame and back, a third of its size at the far end. 640 x 480.
     */
    TURNING(60, 140, 4.5, ScenarioKind.SCALE_CHANGE),

    /**
     * A large target, 80 to 250 px, moving fast (15 to 40 px a frame) with abrupt turns and strong motion blur, at
     * 1280 x 720 or 1920 x 1080, and a second large body wandering slower. Shorter clips (150 to 250 frames).
     */
    FAST_LARGE(80, 250, 40, ScenarioKind.FAST_MOTION),

    /**
     * A target of 30 to 90 px among stains of its own colours, passing behind pillars (fully hidden behind some)
     * while the light dims or brightens with a colour cast and a soft band of shade sweeps across; a second body,
     * often of the target's colours. 640 x 480.
     */
    LIGHTING_OCCLUSION(30, 90, 6, ScenarioKind.LIGHTING_DRIFT);

    private final double minSize;
    private final double maxSize;
    private final double maxSpeed;
    private final ScenarioKind nearest;

    FamilyKind(double minSize, double maxSize, double maxSpeed, ScenarioKind nearest) {
        this.minSize = minSize;
        this.maxSize = maxSize;
        this.maxSpeed = maxSpeed;
        this.nearest = nearest;
    }

    /** Lower-case name with hyphens, for file names and table rows, e.g. {@code small-erratic}. */
    public String slug() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The kind whose {@link #slug()} is {@code slug}. */
    public static FamilyKind ofSlug(String slug) {
        for (FamilyKind k : values()) {
            if (k.slug().equals(slug)) {
                return k;
            }
        }
        throw new IllegalArgumentException("no scenario family kind '" + slug + "'; expected one of "
                + java.util.Arrays.stream(values()).map(FamilyKind::slug).toList());
    }

    /** Shortest target body length in px over the kind's seeds (its longer side). */
    public double minSize() {
        return minSize;
    }

    /** Longest target body length in px. */
    public double maxSize() {
        return maxSize;
    }

    /** Fastest the target's centre moves, px per frame. */
    public double maxSpeed() {
        return maxSpeed;
    }

    /** The single-difficulty scenario kind nearest this situation, for code that knows only those. */
    public ScenarioKind nearest() {
        return nearest;
    }
}
