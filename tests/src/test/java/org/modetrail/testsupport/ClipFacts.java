package org.modetrail.testsupport;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/** Facts about a clip taken from ffprobe, to check that a generated clip really is the hard case it should be. */
public final class ClipFacts {
    private ClipFacts() {
    }

    /** Presentation-order indexes of frames whose packet ffprobe flags K. */
    public static List<Integer> keyframes(Path video) {
        List<Ffprobe.ProbePacket> packets = Ffprobe.packetsInPresentationOrder(video);
        List<Integer> keys = new ArrayList<>();
        for (int i = 0; i < packets.size(); i++) {
            if (packets.get(i).key()) {
                keys.add(i);
            }
        }
        return keys;
    }

    /** Longest run from one keyframe to the next (or to the end), in frames. */
    public static int longestGop(Path video, int frameCount) {
        List<Integer> keys = keyframes(video);
        int longest = 0;
        for (int i = 0; i < keys.size(); i++) {
            int next = i + 1 < keys.size() ? keys.get(i + 1) : frameCount;
            longest = Math.max(longest, next - keys.get(i));
        }
        return longest;
    }

    public static boolean hasBFrames(List<Ffprobe.ProbeFrame> frames) {
        return frames.stream().anyMatch(f -> "B".equals(f.pictType()));
    }

    /** Distinct intervals between consecutive frames' ffprobe timestamps. */
    public static TreeSet<Long> distinctIntervals(List<Ffprobe.ProbeFrame> frames) {
        TreeSet<Long> intervals = new TreeSet<>();
        for (int i = 1; i < frames.size(); i++) {
            intervals.add(frames.get(i).ptsOrBestEffort() - frames.get(i - 1).ptsOrBestEffort());
        }
        return intervals;
    }
}
