package org.modetrail.demo.scenario;

import java.util.List;

/**
 * Everything a family scenario shows, decided once from its kind and seed.
 *
 * @param kind        the situation
 * @param seed        the seed it was drawn from
 * @param width       frame width, even
 * @param height      frame height, even
 * @param fps         frames per second
 * @param frames      clip length
 * @param bodies      the objects; object 0 is the target a single-object tracker starts on
 * @param floor       the floor under them
 * @param blotches    stains of the target's colours on the floor (clutter)
 * @param posts       full-height occluders in front of every body
 * @param lighting    global light over the clip
 * @param band        a moving band of shade, or {@link ShadowBand#NONE}
 * @param shadows     the bodies' shadows on the floor
 * @param shutter     exposure time as a share of the frame interval, 0..1: the length of the motion blur
 * @param sensorNoise grey levels of fresh noise per frame and pixel, 0..32
 * @param crf         the H.264 constant rate factor the clip is encoded at, 18..34
 */
record FamilyPlan(FamilyKind kind, long seed, int width, int height, int fps, int frames, List<FamilyBody> bodies,
                  FamilyFloor floor, List<Blotch> blotches, List<Post> posts, Lighting lighting, ShadowBand band,
                  SoftShadows shadows, double shutter, int sensorNoise, int crf) {

    /** Most objects a plan may hold: object masks are bits of an int. */
    static final int MAX_BODIES = 30;

    FamilyPlan {
        bodies = List.copyOf(bodies);
        blotches = List.copyOf(blotches);
        posts = List.copyOf(posts);
        if (width < 160 || height < 120 || width % 2 != 0 || height % 2 != 0) {
            throw new IllegalArgumentException("frame size must be even and at least 160 x 120, got " + width + " x "
                    + height);
        }
        if (frames < 2 || fps < 1) {
            throw new IllegalArgumentException("need at least 2 frames and 1 fps");
        }
        if (bodies.isEmpty() || bodies.size() > MAX_BODIES) {
            throw new IllegalArgumentException("need 1.." + MAX_BODIES + " bodies, got " + bodies.size());
        }
        for (FamilyBody b : bodies) {
            if (b.track().frames() != frames) {
                throw new IllegalArgumentException("every body needs a pose for every frame");
            }
        }
        if (!(shutter >= 0 && shutter <= 1)) {
            throw new IllegalArgumentException("shutter must be 0..1 of the frame interval, got " + shutter);
        }
        if (sensorNoise < 0 || sensorNoise > 32 || crf < 0 || crf > 51) {
            throw new IllegalArgumentException("sensor noise must be 0..32 and crf 0..51");
        }
        if (floor == null || lighting == null || band == null || shadows == null) {
            throw new IllegalArgumentException("floor, lighting, band and shadows are required");
        }
    }
}
