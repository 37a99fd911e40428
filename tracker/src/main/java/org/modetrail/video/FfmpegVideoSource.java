package org.modetrail.video;

import static org.bytedeco.ffmpeg.global.avutil.av_frame_free;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.BitSet;
import java.util.Optional;

import org.bytedeco.ffmpeg.avutil.AVFrame;

/**
 * A video file read through FFmpeg, frame-exact. The frame index (one packet scan, cached on disk) says where
 * every frame is; {@link #frame(int)} seeks to the last keyframe at or before the wanted frame and decodes forward
 * until the picture whose timestamp is the wanted frame's comes out. Pictures are matched by timestamp, never by
 * counting from the seek point, so a demuxer that lands somewhere else than asked cannot shift the result.
 *
 * <p>Pictures decoded on the way to the wanted frame are held as the decoder gave them (reference-counted, not yet
 * converted: no cost unless used), so that stepping back costs one colour conversion instead of a seek; stepping
 * forward continues the same decoder without a seek. Converted frames live in the decoded-frame cache.
 */
final class FfmpegVideoSource implements VideoSource {
    /** Seeks that landed after the wanted frame are retried from an earlier keyframe this many times. */
    private static final int SEEK_ATTEMPTS = 4;
    /** Frames to keep around a random access: enough to step back through, few enough to leave room for others. */
    private static final int MAX_KEPT_BEHIND = 8;

    private final Path file;
    private final VideoOptions options;
    private final FrameIndex index;
    private final PacketStamps stamps;
    private final VideoInfo info;
    private final DecodedFrameCache cache;
    private final HeldPictures held;
    private final BitSet unreadable = new BitSet();
    private FfmpegDecoder decoder;
    /** Presentation index of the last picture the decoder gave out, or -1 when unknown (after a seek). */
    private int decoderPosition = -1;
    /** Pictures before this index, after the last seek, may miss their references and are never used. */
    private int firstTrusted;

    private FfmpegVideoSource(Path file, VideoOptions options, IndexedVideo indexed, VideoInfo info,
                              FfmpegDecoder decoder) {
        this.file = file;
        this.options = options;
        this.index = indexed.index();
        this.stamps = indexed.stamps();
        decoder.stampPackets(stamps);
        this.info = info;
        this.decoder = decoder;
        this.cache = new DecodedFrameCache(options.cacheBudgetBytes());
        this.held = new HeldPictures(Math.min(MAX_KEPT_BEHIND, cache.capacityFor(frameBytes()) / 2));
    }

    static FfmpegVideoSource open(Path file, VideoOptions options, IndexProgress progress) throws VideoException {
        if (!Files.isReadable(file)) {
            throw new VideoException(file, "the file cannot be read; check its permissions");
        }
        FrameIndexCache indexCache = new FrameIndexCache(options.indexCacheDir());
        Optional<IndexedVideo> cached = indexCache.load(file);
        IndexedVideo entry;
        if (cached.isPresent()) {
            entry = cached.get();
        } else {
            entry = FrameIndexer.scan(file, progress);
            indexCache.store(file, entry);
        }
        FfmpegDecoder decoder = FfmpegDecoder.open(file, options.decoderThreads());
        if (cached.isPresent() && (entry.width() != decoder.width() || entry.height() != decoder.height())) {
            // A cache entry that disagrees with the file itself is not believed.
            entry = FrameIndexer.scan(file, progress);
            indexCache.store(file, entry);
        }
        if (entry.index().keyframeCount() == 0) {
            decoder.close();
            int n = entry.index().frameCount();
            throw new VideoException(file, (n == 1 ? "its one frame is not" : "none of its " + n + " frames is")
                    + " a keyframe, where decoding can start; the file is cut short or damaged: copy it again from "
                    + "the original");
        }
        VideoInfo info = VideoInfo.of(entry.width(), entry.height(), entry.index(), entry.codec(), entry.container());
        return new FfmpegVideoSource(file, options, entry, info, decoder);
    }

    @Override
    public Path path() {
        return file;
    }

    @Override
    public VideoInfo info() {
        return info;
    }

    @Override
    public FrameIndex index() {
        return index;
    }

    @Override
    public synchronized int[] unreadableFrames() {
        return unreadable.stream().toArray();
    }

    @Override
    public synchronized Frame frame(int n) throws VideoException {
        return fetch(n, null);
    }

    @Override
    public synchronized Frame frame(int n, int[] into) throws VideoException {
        int size = info.width() * info.height();
        if (into.length < size) {
            throw new IllegalArgumentException("pixel array holds " + into.length + " entries, a frame needs " + size);
        }
        return fetch(n, into);
    }

    /** Frame n into {@code into}, or into a new array that the cache keeps when {@code into} is null. */
    private Frame fetch(int n, int[] into) throws VideoException {
        checkRange(n);
        Frame cached = cache.get(n);
        if (cached != null) {
            if (into == null) {
                return cached;
            }
            System.arraycopy(cached.rgb(), 0, into, 0, info.width() * info.height());
            return new Frame(n, cached.timeSeconds(), info.width(), info.height(), into);
        }
        if (unreadable.get(n)) {
            throw unreadable(n, "it could not be decoded before");
        }
        AVFrame picture = held.take(n);
        if (picture != null) {
            // Passed on the way to an earlier random access: convert it now that it is wanted.
            try {
                int[] pixels = into != null ? into : new int[info.width() * info.height()];
                decoder.convert(picture, pixels);
                Frame f = new Frame(n, index.timeSeconds(n), info.width(), info.height(), pixels);
                if (into == null) {
                    cache.put(f);
                }
                return f;
            } finally {
                av_frame_free(picture);
            }
        }
        Frame[] found = new Frame[1];
        decodeRange(n, n + 1, f -> {
            if (into == null) {
                cache.put(f);
            }
            found[0] = f;
            return true;
        }, n - MAX_KEPT_BEHIND, true, into);
        if (found[0] == null) {
            unreadable.set(n);
            throw unreadable(n, "the decoder produced no picture for it");
        }
        return found[0];
    }

    @Override
    public synchronized void read(int from, int to, FrameSink sink) throws VideoException {
        if (from < 0 || to > index.frameCount() || from > to) {
            throw new VideoException(file, "frames " + from + " to " + to + " are outside 0.." + index.frameCount()
                    + " of this video");
        }
        if (from == to) {
            return;
        }
        decodeRange(from, to, sink, to, false, null);
    }

    /**
     * Decodes frames [from, to) in order and hands those from {@code convertFrom} on (and every one in
     * [from, to)) to the sink, reporting frames the decoder skipped as unreadable. With {@code holdBehind} (random
     * access) every frame gets a pixel array of its own that the sink may keep; without, one array is reused.
     * A non-null {@code into} is the array the (single) wanted frame is written to.
     */
    private void decodeRange(int from, int to, FrameSink sink, int convertFrom, boolean holdBehind, int[] into)
            throws VideoException {
        int key = index.keyframeAtOrBefore(from);
        // Frames before the wanted one are worth converting only when they come on the way anyway.
        int first = Math.max(Math.min(convertFrom, from), key);
        if (decoderPosition >= 0 && decoderPosition < from && key <= decoderPosition + 1) {
            // No keyframe between here and there: going on is never slower than a seek.
            decodeForward(from, to, sink, first, true, holdBehind, into);
            return;
        }
        for (int attempt = 0; attempt < SEEK_ATTEMPTS; attempt++) {
            seekTo(key);
            if (decodeForward(from, to, sink, first, false, holdBehind, into) == Outcome.DONE) {
                return;
            }
            if (key == 0) {
                break;
            }
            key = index.keyframeAtOrBefore(key - 1);
        }
        reopen();
        decodeForward(from, to, sink, first, true, holdBehind, into);
    }

    private enum Outcome { DONE, LANDED_TOO_LATE }

    /**
     * Decodes pictures until frame {@code to - 1} has been handed over. With {@code lateStartIsGap} false, a first
     * picture after the wanted one means the seek overshot and the caller should start earlier; with it true, the
     * frames skipped over are unreadable. For a random access ({@code holdBehind}), pictures before {@code from}
     * are held unconverted for a later step back, and each frame handed over has a pixel array of its own
     * ({@code into} when given).
     */
    private Outcome decodeForward(int from, int to, FrameSink sink, int convertFrom, boolean lateStartIsGap,
                                  boolean holdBehind, int[] into) throws VideoException {
        int[] pixels = into;
        int expected = from;
        boolean first = true;
        while (expected < to) {
            long pts = decoder.decodeNext();
            if (pts == FfmpegDecoder.END) {
                decoderPosition = -1;
                if (first && !lateStartIsGap) {
                    // The seek landed past the keyframe (MPEG-TS seeks by DTS without regard to keyframes) and no
                    // usable picture came before the end: start earlier rather than call the frames unreadable.
                    return Outcome.LANDED_TOO_LATE;
                }
                break;
            }
            // A picture with no timestamp at all (the last one of some AVI files, as ffprobe shows too) is the one
            // after the picture before it.
            int i = pts == FfmpegDecoder.NO_TIMESTAMP
                    ? (decoderPosition >= 0 && decoderPosition + 1 < index.frameCount() ? decoderPosition + 1 : -1)
                    : index.frameWithPts(pts);
            if (i < 0 || i < firstTrusted || (decoderPosition >= 0 && i <= decoderPosition)) {
                continue; // a picture the index does not know, or one whose references may be missing
            }
            if (first && !lateStartIsGap && i > from) {
                decoderPosition = i;
                return Outcome.LANDED_TOO_LATE;
            }
            first = false;
            decoderPosition = i;
            if (i < convertFrom) {
                continue;
            }
            if (holdBehind && i < from) {
                if (!cache.contains(i)) {
                    held.hold(i, decoder.holdCurrent());
                }
                continue;
            }
            if (i >= to) {
                cacheAhead(i);
                break;
            }
            for (int missing = Math.max(expected, from); missing < i; missing++) {
                unreadable.set(missing);
                sink.unreadable(missing, "the decoder produced no picture for it");
            }
            if (pixels == null || (holdBehind && into == null)) {
                pixels = new int[info.width() * info.height()];
            }
            decoder.convertTo(pixels);
            boolean goOn = sink.accept(new Frame(i, index.timeSeconds(i), info.width(), info.height(), pixels));
            expected = Math.max(expected, i + 1);
            if (!goOn) {
                return Outcome.DONE;
            }
        }
        for (int missing = expected; missing < to; missing++) {
            unreadable.set(missing);
            sink.unreadable(missing, "the file ended before it could be decoded");
        }
        return Outcome.DONE;
    }

    /** A picture decoded past the end of a request is the likeliest next request: keep it rather than lose it. */
    private void cacheAhead(int i) {
        int[] pixels = new int[info.width() * info.height()];
        decoder.convertTo(pixels);
        cache.put(new Frame(i, index.timeSeconds(i), info.width(), info.height(), pixels));
    }

    private void seekTo(int keyframe) throws VideoException {
        decoder.seek(index.pts(keyframe));
        decoderPosition = -1;
        firstTrusted = keyframe;
    }

    /** Starts again from the top of the file: the one way to the first frames that never fails. */
    private void reopen() throws VideoException {
        decoder.close();
        decoder = FfmpegDecoder.open(file, options.decoderThreads());
        decoder.stampPackets(stamps);
        decoderPosition = -1;
        firstTrusted = 0;
    }

    /** Frames in the decoded-frame cache (for tests). */
    synchronized int cachedFrames() {
        return cache.size();
    }

    private long frameBytes() {
        return (long) info.width() * info.height() * Integer.BYTES;
    }

    private void checkRange(int n) throws VideoException {
        if (n < 0 || n >= index.frameCount()) {
            throw new VideoException(file, n, "no such frame: this video has frames 0 to "
                    + (index.frameCount() - 1));
        }
    }

    private FrameUnreadableException unreadable(int n, String why) {
        return new FrameUnreadableException(file, n, "frame is unreadable: " + why
                + "; the file is damaged there, the other frames can still be used");
    }

    @Override
    public synchronized void close() {
        if (decoder != null) {
            decoder.close();
            decoder = null;
        }
        held.clear();
        cache.clear();
    }

    @Override
    public String toString() {
        return "FfmpegVideoSource[" + file + ", " + info.frameCount() + " frames, unreadable "
                + Arrays.toString(unreadableFrames()) + "]";
    }
}
