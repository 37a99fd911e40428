package org.modetrail.video;

import java.util.Arrays;

/**
 * The timestamp each video packet had in the one sequential scan that built the frame index, looked up by the
 * packet's byte position in the file. Demuxers do not always give a packet the same timestamp after a seek as when
 * reading from the start (after a lost chunk, an AVI demuxer reading straight through numbers the following frames
 * one lower, while after a seek it takes the numbers from the file's own index). Stamping every packet with its
 * scan timestamp before decoding makes the pictures' timestamps independent of how the decoder got there, so
 * matching them against the index stays exact.
 *
 * @param positions byte positions, strictly increasing
 * @param stamps    the scan's timestamp for the packet at each position
 * @param fromDts   whether that timestamp was the packet's decode timestamp (it had no presentation timestamp)
 */
record PacketStamps(long[] positions, long[] stamps, boolean[] fromDts) {
    /** No stamps: packets keep what the demuxer gives them. */
    static final PacketStamps NONE = new PacketStamps(new long[0], new long[0], new boolean[0]);

    PacketStamps {
        if (positions.length != stamps.length || positions.length != fromDts.length) {
            throw new IllegalArgumentException("packet stamp arrays differ in length");
        }
    }

    /**
     * Builds the lookup from packets in file order. Positions that are unknown (negative) or shared by several
     * packets (laced containers) cannot identify a packet: then no stamps are kept at all.
     */
    static PacketStamps of(long[] pos, long[] stamp, boolean[] dts, int n) {
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            if (pos[i] < 0) {
                return NONE;
            }
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Long.compare(pos[a], pos[b]));
        long[] p = new long[n];
        long[] s = new long[n];
        boolean[] d = new boolean[n];
        for (int i = 0; i < n; i++) {
            p[i] = pos[order[i]];
            s[i] = stamp[order[i]];
            d[i] = dts[order[i]];
            if (i > 0 && p[i] == p[i - 1]) {
                return NONE;
            }
        }
        return new PacketStamps(p, s, d);
    }

    int size() {
        return positions.length;
    }

    /** Where the packet at byte position {@code pos} is in the lookup, or -1. */
    int find(long pos) {
        int i = Arrays.binarySearch(positions, pos);
        return i >= 0 ? i : -1;
    }
}
