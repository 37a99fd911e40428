package org.modetrail.evaluation;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.Set;
import java.util.TreeMap;

/**
 * The boxes of one side of an evaluation (the truth, or the tracks under test), by frame and by id. At most one box
 * per id and frame. Immutable.
 */
public final class Annotations {
    private final NavigableMap<Integer, List<LabelledBox>> byFrame;
    private final NavigableMap<Integer, NavigableMap<Integer, LabelledBox>> byId;
    private final int count;

    private Annotations(NavigableMap<Integer, List<LabelledBox>> byFrame,
                        NavigableMap<Integer, NavigableMap<Integer, LabelledBox>> byId, int count) {
        this.byFrame = byFrame;
        this.byId = byId;
        this.count = count;
    }

    /**
     * The boxes given, in any order.
     *
     * @throws IllegalArgumentException when an id has two boxes on one frame (the message names both)
     */
    public static Annotations of(List<LabelledBox> boxes) {
        NavigableMap<Integer, List<LabelledBox>> frames = new TreeMap<>();
        NavigableMap<Integer, NavigableMap<Integer, LabelledBox>> ids = new TreeMap<>();
        for (LabelledBox b : boxes) {
            LabelledBox before = ids.computeIfAbsent(b.id(), k -> new TreeMap<>()).put(b.frame(), b);
            if (before != null) {
                throw new IllegalArgumentException("id " + b.id() + " has two boxes on frame " + b.frame());
            }
            frames.computeIfAbsent(b.frame(), k -> new ArrayList<>()).add(b);
        }
        NavigableMap<Integer, List<LabelledBox>> f = new TreeMap<>();
        frames.forEach((k, v) -> {
            v.sort((a, b) -> Integer.compare(a.id(), b.id()));
            f.put(k, List.copyOf(v));
        });
        NavigableMap<Integer, NavigableMap<Integer, LabelledBox>> i = new TreeMap<>();
        ids.forEach((k, v) -> i.put(k, Collections.unmodifiableNavigableMap(v)));
        return new Annotations(Collections.unmodifiableNavigableMap(f), Collections.unmodifiableNavigableMap(i),
                boxes.size());
    }

    public static Annotations empty() {
        return of(List.of());
    }

    /** The boxes on one frame, by ascending id; empty when none. */
    public List<LabelledBox> onFrame(int frame) {
        return byFrame.getOrDefault(frame, List.of());
    }

    /** One id's boxes by frame; empty when the id is unknown. */
    public NavigableMap<Integer, LabelledBox> ofId(int id) {
        return byId.getOrDefault(id, Collections.emptyNavigableMap());
    }

    public Set<Integer> ids() {
        return byId.keySet();
    }

    /** Frames that hold at least one box, ascending. */
    public Set<Integer> frames() {
        return byFrame.keySet();
    }

    /** All boxes. */
    public int count() {
        return count;
    }

    public boolean isEmpty() {
        return count == 0;
    }

    Map<Integer, List<LabelledBox>> byFrame() {
        return byFrame;
    }
}
