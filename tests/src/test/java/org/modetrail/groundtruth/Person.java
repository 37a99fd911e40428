package org.modetrail.groundtruth;

import java.util.Map;
import java.util.NavigableMap;
import java.util.NavigableSet;
import java.util.TreeMap;
import java.util.TreeSet;

import org.modetrail.model.Box;

/**
 * One person of the truth while it is being assembled: the boxes measured from the foreground, the hand keyframes,
 * frames whose measured box is thrown out, and hand visible fractions. Every frame of the person's life gets a box:
 * a hand keyframe, else the measured box, else the linear interpolation between the nearest of those on either side.
 */
final class Person {
    int id;
    final NavigableMap<Integer, Box> measured = new TreeMap<>();
    final NavigableMap<Integer, Box> keys = new TreeMap<>();
    final NavigableSet<Integer> cut = new TreeSet<>();
    /** The foreground regions of measured frames (absent for frames measured by splitting a group). */
    final NavigableMap<Integer, Blob> blobs = new TreeMap<>();
    /** Frames whose measured box comes from splitting a group's region by columns. */
    final NavigableSet<Integer> split = new TreeSet<>();
    final NavigableMap<Integer, Double> visible = new TreeMap<>();
    /** The tracklets this person was made from, for messages. */
    final StringBuilder origin = new StringBuilder();

    Person(int id) {
        this.id = id;
    }

    private NavigableMap<Integer, Box> anchors() {
        NavigableMap<Integer, Box> a = new TreeMap<>();
        for (Map.Entry<Integer, Box> e : measured.entrySet()) {
            if (!cut.contains(e.getKey())) {
                a.put(e.getKey(), e.getValue());
            }
        }
        a.putAll(keys);
        return a;
    }

    boolean isEmpty() {
        return anchors().isEmpty();
    }

    int first() {
        return anchors().firstKey();
    }

    int last() {
        return anchors().lastKey();
    }

    /** The box on every frame of the life. */
    NavigableMap<Integer, Box> boxes() {
        NavigableMap<Integer, Box> a = anchors();
        NavigableMap<Integer, Box> out = new TreeMap<>();
        if (a.isEmpty()) {
            return out;
        }
        for (int f = first(); f <= last(); f++) {
            Box exact = a.get(f);
            if (exact != null) {
                out.put(f, exact);
                continue;
            }
            Map.Entry<Integer, Box> lo = a.lowerEntry(f);
            Map.Entry<Integer, Box> hi = a.higherEntry(f);
            if (lo == null || hi == null) {
                out.put(f, (lo != null ? lo : hi).getValue());
                continue;
            }
            double t = (double) (f - lo.getKey()) / (hi.getKey() - lo.getKey());
            Box p = lo.getValue();
            Box q = hi.getValue();
            out.put(f, new Box(p.x() + t * (q.x() - p.x()), p.y() + t * (q.y() - p.y()),
                    p.width() + t * (q.width() - p.width()), p.height() + t * (q.height() - p.height())));
        }
        return out;
    }

    /** True when frame f's box is neither measured (uncut) nor a hand keyframe. */
    boolean interpolated(int f) {
        return !keys.containsKey(f) && (!measured.containsKey(f) || cut.contains(f));
    }

    @Override
    public String toString() {
        return "P" + id + (isEmpty() ? "[]" : "[" + first() + "-" + last() + "]") + " from " + origin;
    }
}
