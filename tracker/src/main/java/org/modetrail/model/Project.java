package org.modetrail.model;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * What one annotation job holds: the video, the object classes, the tracks, and what is known of the scene (ground
 * calibration, zones, counting lines). Immutable; edits ({@link Edits}) make new projects, so undo is keeping the
 * old one ({@link History}).
 */
public record Project(VideoRef video, List<ObjectClass> classes, List<Track> tracks, Site site) {

    public Project {
        if (video == null) {
            throw new IllegalArgumentException("a project annotates a video");
        }
        if (site == null) {
            site = Site.NONE;
        }
        classes = List.copyOf(classes);
        tracks = List.copyOf(tracks);
        Set<String> names = new HashSet<>();
        for (ObjectClass c : classes) {
            if (!names.add(c.name())) {
                throw new IllegalArgumentException("class '" + c.name() + "' is listed twice");
            }
        }
        Set<Integer> ids = new HashSet<>();
        for (Track t : tracks) {
            if (!ids.add(t.id())) {
                throw new IllegalArgumentException("track id " + t.id() + " is used twice");
            }
            if (!names.contains(t.className())) {
                throw new IllegalArgumentException("track " + t.id() + " has class '" + t.className()
                        + "', which the project does not list");
            }
            if (!t.isEmpty() && t.lastFrame() >= video.frameCount()) {
                throw new IllegalArgumentException("track " + t.id() + " has frame " + t.lastFrame()
                        + " but the video has frames 0 to " + (video.frameCount() - 1));
            }
        }
    }

    /** A project with nothing known of the scene yet. */
    public Project(VideoRef video, List<ObjectClass> classes, List<Track> tracks) {
        this(video, classes, tracks, Site.NONE);
    }

    public static Project of(VideoRef video) {
        return new Project(video, List.of(), List.of());
    }

    public Optional<Track> track(int id) {
        for (Track t : tracks) {
            if (t.id() == id) {
                return Optional.of(t);
            }
        }
        return Optional.empty();
    }

    public Optional<ObjectClass> objectClass(String name) {
        for (ObjectClass c : classes) {
            if (c.name().equals(name)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }

    /** The smallest id above every track's. */
    public int nextTrackId() {
        int max = 0;
        for (Track t : tracks) {
            max = Math.max(max, t.id());
        }
        return max + 1;
    }

    public Project withClass(ObjectClass c) {
        if (objectClass(c.name()).isPresent()) {
            return this;
        }
        List<ObjectClass> more = new ArrayList<>(classes);
        more.add(c);
        return new Project(video, more, tracks, site);
    }

    /** This project with {@code t} replacing the track of the same id, or added if there is none. */
    public Project withTrack(Track t) {
        List<Track> list = new ArrayList<>(tracks);
        boolean replaced = false;
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i).id() == t.id()) {
                list.set(i, t);
                replaced = true;
            }
        }
        if (!replaced) {
            list.add(t);
        }
        return new Project(video, classes, list, site);
    }

    public Project withSite(Site s) {
        return new Project(video, classes, tracks, s);
    }

    /** The class {@code name}'s ground contact point, bottom centre for a class the project does not list. */
    public ContactPoint contactPoint(String className) {
        return objectClass(className).map(ObjectClass::contact).orElse(ContactPoint.BOTTOM_CENTRE);
    }

    public Project withoutTrack(int id) {
        List<Track> list = new ArrayList<>(tracks);
        list.removeIf(t -> t.id() == id);
        return new Project(video, classes, list, site);
    }
}
