package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;

/**
 * The trackers of the benchmark report by their command-line keys: Modetrail (run as the product runs, through
 * {@code TrackRunner}, so it has no {@link BoxTracker} here) and the peers a user would otherwise pick, each run
 * per object through its {@link BoxTracker} adapter.
 */
public final class PeerTrackers {
    /** Modetrail's key; it runs through the product's track runner, not through a {@link BoxTracker}. */
    public static final String MODETRAIL = "modetrail";

    /**
     * One peer.
     *
     * @param key     command-line key
     * @param label   name in tables
     * @param library where it comes from
     * @param fast    a few milliseconds a frame or less at 640x480, so CI's quick run can afford it
     * @param make    a new tracker
     */
    public record Peer(String key, String label, String library, boolean fast, Supplier<BoxTracker> make) {
    }

    /** Every peer, in table order. */
    public static final List<Peer> ALL = List.of(
            new Peer("boofcv-meanshift", "BoofCV mean-shift (Comaniciu)", "BoofCV", true, BoofComaniciuTracker::new),
            new Peer("boofcv-likelihood", "BoofCV likelihood mean-shift", "BoofCV", true,
                    BoofLikelihoodMeanShiftTracker::new),
            new Peer("boofcv-circulant", "BoofCV Circulant", "BoofCV", true, BoofCirculantTracker::new),
            new Peer("boofcv-tld", "BoofCV TLD", "BoofCV", false, BoofTldTracker::new),
            new Peer("opencv-camshift", "OpenCV CamShift", "OpenCV", true, OpenCvCamShiftTracker::new),
            new Peer("opencv-kcf", "OpenCV KCF", "OpenCV", true, OpenCvKcfTracker::new),
            new Peer("opencv-csrt", "OpenCV CSRT", "OpenCV", false, OpenCvCsrtTracker::new));

    private PeerTrackers() {
    }

    /** Every key, Modetrail first. */
    public static List<String> keys() {
        List<String> keys = new ArrayList<>(List.of(MODETRAIL));
        ALL.forEach(p -> keys.add(p.key()));
        return keys;
    }

    /** Modetrail and the fast peers: CI's quick run (both libraries stay represented). */
    public static List<String> quickKeys() {
        List<String> keys = new ArrayList<>(List.of(MODETRAIL));
        ALL.stream().filter(Peer::fast).forEach(p -> keys.add(p.key()));
        return keys;
    }

    public static Peer peer(String key) {
        for (Peer p : ALL) {
            if (p.key().equals(key)) {
                return p;
            }
        }
        throw new IllegalArgumentException("no tracker '" + key + "'; the trackers are " + keys());
    }

    /** The table name of a key, Modetrail's included. */
    public static String label(String key) {
        return key.equals(MODETRAIL) ? "Modetrail" : peer(key).label();
    }

    /** Keys from a comma-separated list, checked, Modetrail first when it is in it. */
    public static List<String> parse(String list) {
        List<String> keys = new ArrayList<>();
        for (String k : list.split(",")) {
            String key = k.strip().toLowerCase(Locale.ROOT);
            if (key.isEmpty()) {
                continue;
            }
            if (!key.equals(MODETRAIL)) {
                peer(key);
            }
            if (!keys.contains(key)) {
                keys.add(key);
            }
        }
        if (keys.isEmpty()) {
            throw new IllegalArgumentException("--trackers needs at least one of " + keys());
        }
        keys.sort((a, b) -> Integer.compare(keys().indexOf(a), keys().indexOf(b)));
        return keys;
    }
}
