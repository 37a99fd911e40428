package org.modetrail.testsupport;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

/** Makes damaged copies of clips and works out, from ffprobe's packet positions, which frames the damage hits. */
public final class Damage {
    private Damage() {
    }

    /** The first {@code keep} bytes of {@code source} as {@code target}. */
    public static Path truncate(Path source, Path target, long keep) {
        try {
            Files.copy(source, target, StandardCopyOption.REPLACE_EXISTING);
            try (RandomAccessFile f = new RandomAccessFile(target.toFile(), "rw")) {
                f.setLength(keep);
            }
            return target;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A copy of {@code source} with {@code length} pseudo-random bytes (fixed seed) written at {@code offset}. */
    public static Path overwrite(Path source, Path target, long offset, int length, long seed) {
        try {
            Files.copy(source, target, StandardCopyOption.REPLACE_EXISTING);
            byte[] junk = new byte[length];
            new Random(seed).nextBytes(junk);
            try (RandomAccessFile f = new RandomAccessFile(target.toFile(), "rw")) {
                f.seek(offset);
                f.write(junk);
            }
            return target;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Presentation-order frames of the intact {@code original} that damage to bytes [from, to) can touch: from the
     * keyframe at or before the first packet that overlaps the range to the first keyframe after the last one (a
     * packet is taken to run from its pos to the next video packet's pos, so container overhead counts). Frames
     * outside this zone decode from intact data only (the clips have closed GOPs).
     *
     * @return {first, end} with end exclusive
     */
    public static int[] zoneHit(Path original, long from, long to) {
        List<Ffprobe.ProbePacket> fileOrder = new ArrayList<>(Ffprobe.packets(original));
        fileOrder.sort(Comparator.comparingLong(Ffprobe.ProbePacket::pos));
        List<Ffprobe.ProbePacket> presentation = new ArrayList<>(fileOrder);
        presentation.sort(Comparator.comparingLong(Ffprobe.ProbePacket::ptsOrDts));
        int first = Integer.MAX_VALUE;
        int last = -1;
        for (int i = 0; i < fileOrder.size(); i++) {
            Ffprobe.ProbePacket p = fileOrder.get(i);
            long end = i + 1 < fileOrder.size() ? fileOrder.get(i + 1).pos() : Long.MAX_VALUE;
            end = Math.max(end, p.pos() + p.size());
            if (p.pos() < to && end > from) {
                int n = presentation.indexOf(p);
                first = Math.min(first, n);
                last = Math.max(last, n);
            }
        }
        if (last < 0) {
            throw new AssertionError("no video packet of " + original + " lies in bytes " + from + ".." + to);
        }
        while (first > 0 && !presentation.get(first).key()) {
            first--;
        }
        int end = last + 1;
        while (end < presentation.size() && !presentation.get(end).key()) {
            end++;
        }
        return new int[] {first, end};
    }
}
