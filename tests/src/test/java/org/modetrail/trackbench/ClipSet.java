package org.modetrail.trackbench;

import java.util.List;

/**
 * The generated clips the benchmark report runs on: kinds (a difficulty each), the seeds of each kind split into
 * tuning and report seeds, and the H.264 quality each clip is encoded at. {@link ClipSets#standard()} picks the one
 * in use; switching the report to another set is that one class.
 */
public interface ClipSet {
    /** Which seeds: defaults are chosen on tuning seeds only, the report gives report seeds only. */
    enum Split {
        TUNING, REPORT
    }

    /** What the set is, for the report's heading. */
    String name();

    /** The kinds' slugs (lower-case, hyphenated), in table order. */
    List<String> kinds();

    long[] seeds(String kind, Split split);

    MultiClip clip(String kind, long seed);

    /** The H.264 constant rate factor to encode that clip at. */
    int crf(String kind, long seed);
}
