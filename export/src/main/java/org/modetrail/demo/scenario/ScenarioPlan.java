package org.modetrail.demo.scenario;

import java.util.List;

/**
 * Everything a scenario shows, decided once from its kind and configuration: the objects' looks and motion, which
 * object is in front in each frame, the floor, blotches, posts and lighting.
 *
 * @param kind     the difficulty exercised
 * @param looks    appearance of each object; object 0 is the target
 * @param tracks   motion of each object, one per look
 * @param front    per frame, the object painted last (seen where bodies overlap); internal array, not copied
 * @param floor    the floor under the objects
 * @param blotches stains on the floor
 * @param posts    occluders in front of every object
 * @param lighting global illumination over the clip
 */
record ScenarioPlan(ScenarioKind kind, List<ObjectLook> looks, List<Track> tracks, int[] front,
                    Backdrop.Floor floor, List<Blotch> blotches, List<Post> posts, Lighting lighting) {

    ScenarioPlan {
        looks = List.copyOf(looks);
        tracks = List.copyOf(tracks);
        blotches = List.copyOf(blotches);
        posts = List.copyOf(posts);
        if (looks.isEmpty() || looks.size() != tracks.size()) {
            throw new IllegalArgumentException("need one track per object look, at least one");
        }
        for (Track t : tracks) {
            if (t.frames() != front.length) {
                throw new IllegalArgumentException("every track needs a value for every frame");
            }
        }
        for (int f : front) {
            if (f < 0 || f >= looks.size()) {
                throw new IllegalArgumentException("front object " + f + " does not exist");
            }
        }
    }

    int frames() {
        return front.length;
    }

    /** A plan of one object on a plain lit floor. */
    static ScenarioPlan single(ScenarioKind kind, ObjectLook look, Track track, Backdrop.Floor floor) {
        return new ScenarioPlan(kind, List.of(look), List.of(track), new int[track.frames()], floor, List.of(),
                List.of(), Lighting.CONSTANT);
    }

    ScenarioPlan withBlotches(List<Blotch> newBlotches) {
        return new ScenarioPlan(kind, looks, tracks, front, floor, newBlotches, posts, lighting);
    }

    ScenarioPlan withPosts(List<Post> newPosts) {
        return new ScenarioPlan(kind, looks, tracks, front, floor, blotches, newPosts, lighting);
    }

    ScenarioPlan withLighting(Lighting newLighting) {
        return new ScenarioPlan(kind, looks, tracks, front, floor, blotches, posts, newLighting);
    }
}
