package org.modetrail.video;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * A folder of numbered PNG or JPEG images read as a video: frame n is the image with the n-th smallest number in
 * its name (so {@code img_9.png} comes before {@code img_10.png}), frame times follow a stated frame rate, and every
 * frame is a keyframe. Images are decoded by FFmpeg, like video. Images of another size than the first are an error naming the file.
 */
final class ImageSequenceSource implements VideoSource {
    private static final Pattern NUMBERED = Pattern.compile("^(.*?)(\\d+)\\.(png|jpe?g)$", Pattern.CASE_INSENSITIVE);

    private final Path folder;
    private final List<Path> images;
    private final FrameIndex index;
    private final VideoInfo info;
    private final DecodedFrameCache cache;
    private final java.util.BitSet unreadable = new java.util.BitSet();

    private ImageSequenceSource(Path folder, List<Path> images, FrameIndex index, VideoInfo info, long budget) {
        this.folder = folder;
        this.images = images;
        this.index = index;
        this.info = info;
        this.cache = new DecodedFrameCache(budget);
    }

    static ImageSequenceSource open(Path folder, VideoOptions options) throws VideoException {
        List<Path> images = numberedImages(folder);
        if (images.isEmpty()) {
            throw new VideoException(folder, "the folder holds no numbered PNG or JPEG images (such as frame_0001.png)");
        }
        Decoded first = decode(folder, images.get(0), 0);
        // Times in microseconds keep fractional rates such as 29.97 exact to well under a frame.
        int tbDen = 1_000_000;
        long[] pts = new long[images.size()];
        boolean[] key = new boolean[images.size()];
        for (int i = 0; i < pts.length; i++) {
            pts[i] = Math.round(i * tbDen / options.imageSequenceFps());
            key[i] = true;
        }
        FrameIndex index = new FrameIndex(pts, key, 1, tbDen);
        String ext = extension(images.get(0));
        VideoInfo info = VideoInfo.of(first.width(), first.height(), index, ext + "-sequence", "folder");
        ImageSequenceSource source = new ImageSequenceSource(folder, images, index, info, options.cacheBudgetBytes());
        source.cache.put(source.toFrame(0, first));
        return source;
    }

    private static List<Path> numberedImages(Path folder) throws VideoException {
        record Numbered(Path path, long number) {
        }
        List<Numbered> found = new ArrayList<>();
        try (Stream<Path> files = Files.list(folder)) {
            files.forEach(p -> {
                Matcher m = NUMBERED.matcher(p.getFileName().toString());
                if (m.matches() && Files.isRegularFile(p)) {
                    String digits = m.group(2);
                    long number = digits.length() > 18 ? Long.MAX_VALUE : Long.parseLong(digits);
                    found.add(new Numbered(p, number));
                }
            });
        } catch (IOException e) {
            throw new VideoException(folder, "the folder cannot be listed: " + e.getMessage(), e);
        }
        found.sort(Comparator.comparingLong(Numbered::number).thenComparing(n -> n.path().getFileName().toString()));
        List<Path> paths = new ArrayList<>(found.size());
        for (Numbered n : found) {
            paths.add(n.path());
        }
        return paths;
    }

    private static String extension(Path p) {
        String name = p.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".png") ? "png" : "jpeg";
    }

    /**
     * Decodes one image through FFmpeg, the same decoder and colour conversion as for video files, so that a folder
     * of frames exported by FFmpeg reads back as the same pixels (JPEG leaves chroma upsampling to the decoder, and
     * Java's ImageIO upsamples differently).
     */
    private static Decoded decode(Path folder, Path image, int n) throws VideoException {
        try (FfmpegDecoder decoder = FfmpegDecoder.open(image, 1)) {
            if (decoder.decodeNext() == FfmpegDecoder.END) {
                throw new FrameUnreadableException(folder, n, image.getFileName() + " holds no picture");
            }
            int[] rgb = new int[decoder.width() * decoder.height()];
            decoder.convertTo(rgb);
            return new Decoded(decoder.width(), decoder.height(), rgb);
        } catch (FrameUnreadableException e) {
            throw e;
        } catch (VideoException e) {
            throw new FrameUnreadableException(folder, n, image.getFileName() + " is not a readable PNG or JPEG ("
                    + e.getMessage() + ")");
        }
    }

    private record Decoded(int width, int height, int[] rgb) {
    }

    private Frame toFrame(int n, Decoded img) throws VideoException {
        if (img.width() != info.width() || img.height() != info.height()) {
            throw new FrameUnreadableException(folder, n, images.get(n).getFileName() + " is " + img.width() + "x"
                    + img.height() + " but the sequence is " + info.width() + "x" + info.height()
                    + "; all images must have one size");
        }
        return new Frame(n, index.timeSeconds(n), info.width(), info.height(), img.rgb());
    }

    @Override
    public Path path() {
        return folder;
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
    public synchronized Frame frame(int n) throws VideoException {
        if (n < 0 || n >= images.size()) {
            throw new VideoException(folder, n, "no such frame: this image sequence has frames 0 to "
                    + (images.size() - 1));
        }
        Frame cached = cache.get(n);
        if (cached != null) {
            return cached;
        }
        try {
            Frame f = toFrame(n, decode(folder, images.get(n), n));
            cache.put(f);
            return f;
        } catch (FrameUnreadableException e) {
            unreadable.set(n);
            throw e;
        }
    }

    @Override
    public synchronized void read(int from, int to, FrameSink sink) throws VideoException {
        if (from < 0 || to > images.size() || from > to) {
            throw new VideoException(folder, "frames " + from + " to " + to + " are outside 0.." + images.size()
                    + " of this image sequence");
        }
        for (int n = from; n < to; n++) {
            Frame f;
            try {
                Frame c = cache.get(n);
                f = c != null ? c : toFrame(n, decode(folder, images.get(n), n));
            } catch (FrameUnreadableException e) {
                unreadable.set(n);
                sink.unreadable(n, e.getMessage());
                continue;
            }
            if (!sink.accept(f)) {
                return;
            }
        }
    }

    @Override
    public synchronized int[] unreadableFrames() {
        return unreadable.stream().toArray();
    }

    /** The image file behind frame n. */
    Path imageOf(int n) {
        return images.get(n);
    }

    @Override
    public void close() {
        cache.clear();
    }
}
