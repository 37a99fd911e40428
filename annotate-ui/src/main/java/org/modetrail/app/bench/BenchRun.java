package org.modetrail.app.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.bytedeco.ffmpeg.global.avutil;
import org.bytedeco.javacv.FrameGrabber;
import org.modetrail.video.FrameIndex;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * One bench run: makes or takes the clip, measures opening, sequential decoding and random access, each against
 * its reference in the same run, and puts the figures into a {@link BenchReport}. Progress goes to {@code log}
 * so that the report stays alone on standard output.
 */
public final class BenchRun {
    private final BenchSettings settings;
    private final PrintWriter log;

    public BenchRun(BenchSettings settings, PrintWriter log) {
        this.settings = settings;
        this.log = log;
    }

    /** Thrown for what the user must fix: a missing clip, no ffmpeg to make one. */
    public static final class BadBenchInput extends Exception {
        BadBenchInput(String message) {
            super(message);
        }
    }

    public BenchReport run() throws BadBenchInput, IOException, VideoException, FrameGrabber.Exception {
        Optional<FfmpegCli> ffmpeg = FfmpegCli.find();
        if (settings.clip() != null && !Files.isRegularFile(settings.clip())) {
            throw new BadBenchInput(settings.clip() + ": no such file; pass an existing video to --clip, or leave "
                    + "--clip out to generate the 1080p test clip");
        }
        if (settings.clip() == null && ffmpeg.isEmpty()) {
            throw new BadBenchInput("the ffmpeg command is needed to generate the test clip and was not found; "
                    + "install it (apt-get install ffmpeg) or pass an existing clip with --clip FILE");
        }
        String loadBefore = loadAverage();
        try (Workspace work = Workspace.open(settings.work(), settings.keep())) {
            Path clip = clip(work, ffmpeg);
            VideoOptions options = VideoOptions.defaults()
                    .withIndexCacheDir(work.indexCacheDir())
                    .withDecoderThreads(settings.threads());
            VideoInfo info;
            FrameIndex index;
            log.println("bench: index build and reopen, " + settings.repeats() + " passes");
            log.flush();
            IndexBench.Result opening = IndexBench.run(clip, options, settings.repeats());
            try (VideoSource s = VideoSource.open(clip, options)) {
                info = s.info();
                index = s.index();
            }
            if (info.frameCount() < 3) {
                throw new BadBenchInput(clip + ": the clip has " + info.frameCount()
                        + " frames; the bench needs at least 3");
            }
            log.println("bench: sequential decoding, " + settings.repeats() + " passes of " + info.frameCount()
                    + " frames, four readers each");
            log.flush();
            SequentialBench.Result sequential = SequentialBench.run(clip, options, settings.threads(),
                    settings.repeats(), ffmpeg);
            log.println("bench: random access, " + settings.samples() + " random frames");
            log.flush();
            int[] wanted = RandomAccessBench.pick(info.frameCount(), settings.samples(), settings.seed());
            RandomAccessBench.Result random = RandomAccessBench.run(clip, options, settings.threads(), wanted);

            Map<String, String> facts = facts(clip, info, ffmpeg, loadBefore);
            List<Section> sections = List.of(
                    sequentialSection(sequential),
                    indexSection(opening, info),
                    randomSection(random, index));
            if (settings.keep()) {
                facts.put("work folder kept", work.dir().toString());
            }
            return new BenchReport(facts, sections);
        }
    }

    private Path clip(Workspace work, Optional<FfmpegCli> ffmpeg) throws IOException {
        if (settings.clip() != null) {
            return settings.clip();
        }
        Path clip = work.clipPath(settings.frames(), settings.gop());
        if (Files.isRegularFile(clip) && settings.work() != null) {
            log.println("bench: reusing " + clip);
            return clip;
        }
        log.println("bench: generating the 1080p test clip (" + settings.frames() + " frames, GOP " + settings.gop()
                + ") in " + work.dir());
        log.flush();
        work.madeHere(clip);
        ffmpeg.orElseThrow().makeClip(clip, settings.frames(), settings.gop());
        return clip;
    }

    private Map<String, String> facts(Path clip, VideoInfo info, Optional<FfmpegCli> ffmpeg, String loadBefore) {
        Map<String, String> f = new LinkedHashMap<>();
        f.put("clip", clip + (settings.clip() == null ? " (generated: testsrc2, libx264 veryfast, 3 B-frames)" : ""));
        f.put("video", String.format(Locale.ROOT, "%dx%d %s in %s, %d frames, %.2f s, %d keyframes%s",
                info.width(), info.height(), info.codec(), info.container(), info.frameCount(),
                info.durationSeconds(), info.keyframeCount(),
                settings.clip() == null ? ", GOP " + settings.gop() : ""));
        f.put("decoder threads", settings.threads() == 0 ? "automatic (FFmpeg's choice), the same for every decoder"
                : settings.threads() + ", the same for every decoder");
        f.put("passes", settings.repeats() + " per sequential and opening figure; " + settings.samples()
                + " random frames (seed " + settings.seed() + ")");
        f.put("FFmpeg libraries", avutil.av_version_info().getString() + " (JavaCV's, used by VideoSource and the "
                + "bare grabber)");
        f.put("ffmpeg command", ffmpeg.map(c -> c.version() + " (the system's, a separate build)")
                .orElse("not found: its figures are left out"));
        f.put("machine", Runtime.getRuntime().availableProcessors() + " cores, Java "
                + System.getProperty("java.version") + ", load average " + loadBefore + " before, "
                + loadAverage() + " after");
        return f;
    }

    private static Section sequentialSection(SequentialBench.Result r) {
        List<Figure> figures = new ArrayList<>();
        figures.add(Figure.measured("sequential.source_fps", "VideoSource.read, all frames", "fps", r.sourceFps()));
        figures.add(Figure.measured("sequential.grabber_fps", "bare FFmpegFrameGrabber.grabImage() loop", "fps",
                r.grabberFps()));
        if (r.ffmpegNullFps() != null) {
            figures.add(Figure.measured("sequential.ffmpeg_null_fps", "ffmpeg -f null (decode only)", "fps",
                    r.ffmpegNullFps()));
            figures.add(Figure.measured("sequential.ffmpeg_bgr0_fps", "ffmpeg -pix_fmt bgr0 -f null", "fps",
                    r.ffmpegBgr0Fps()));
        }
        figures.add(Targets.sequentialRatio(Figure.value("sequential.ratio_source_to_grabber",
                "ratio VideoSource / bare grabber", "x", Summary.medianRatio(r.sourceFps(), r.grabberFps()))));
        if (r.ffmpegNullFps() != null) {
            figures.add(Figure.value("sequential.ratio_source_to_ffmpeg_null", "ratio VideoSource / ffmpeg -f null",
                    "x", Summary.medianRatio(r.sourceFps(), r.ffmpegNullFps())));
            figures.add(Figure.value("sequential.ratio_source_to_ffmpeg_bgr0",
                    "ratio VideoSource / ffmpeg -pix_fmt bgr0", "x",
                    Summary.medianRatio(r.sourceFps(), r.ffmpegBgr0Fps())));
        }
        return new Section("sequential", "Sequential decode of " + r.frames() + " frames", figures, List.of(
                "VideoSource.read: demux, decode, swscale bicubic to BGR0 in native memory, bulk copy into one reused "
                        + "int[] (0xFFRRGGBB); the sink reads one pixel.",
                "bare grabber: JavaCV defaults (demux, decode, swscale bicubic to BGR24 into JavaCV's reused native "
                        + "buffer, no copy to the Java heap); the loop reads one byte.",
                "ffmpeg: its own rtime from -benchmark (process start-up left out); -f null passes decoded pictures "
                        + "on without converting; -pix_fmt bgr0 adds the same conversion as VideoSource.",
                "ratios are medians of per-pass ratios (each pass runs the readers back to back); opening is not "
                        + "timed."));
    }

    private static Section indexSection(IndexBench.Result r, VideoInfo info) {
        double hours = info.durationSeconds() / 3600;
        Figure cold = Figure.measured("index.cold_open_ms", "VideoSource.open, index cache off (scan + decoder)",
                "ms", r.coldOpenMs());
        Figure cached = Figure.measured("index.cached_open_ms", "VideoSource.open, index cached on disk", "ms",
                r.cachedOpenMs());
        Figure scan = Figure.measured("index.bare_scan_ms", "bare av_read_frame loop over all packets", "ms",
                r.bareScanMs());
        return new Section("index", "Opening (index build and reopen)", List.of(
                cold,
                Figure.value("index.cold_open_s_per_hour", "  the same per hour of video", "s/h",
                        cold.median() / 1000 / hours),
                scan,
                Figure.value("index.bare_scan_s_per_hour", "  the same per hour of video", "s/h",
                        scan.median() / 1000 / hours),
                Figure.value("index.ratio_cold_to_bare_scan", "ratio cold open / bare packet scan", "x",
                        Summary.medianRatio(r.coldOpenMs(), r.bareScanMs())),
                cached,
                Figure.value("index.cached_open_s_per_hour", "  the same per hour of video", "s/h",
                        cached.median() / 1000 / hours)),
                List.of("per hour of video = time / clip duration * 3600 s; a cold open also opens the decoder, "
                                + "which a cached reopen does too, so cold - cached is the scan itself.",
                        "bare packet scan: avformat_open_input, find_stream_info, av_read_frame to the end, "
                                + "no decoding: the floor for any index build."));
    }

    private static Section randomSection(RandomAccessBench.Result r, FrameIndex index) {
        double[] distance = new double[r.frames().length];
        for (int i = 0; i < distance.length; i++) {
            distance[i] = r.frames()[i] - index.keyframeAtOrBefore(r.frames()[i]);
        }
        return new Section("random", "Random access, fresh cache, " + r.frames().length + " random frames",
                List.of(
                        Figure.measured("random.source_ms", "VideoSource.frame(n)", "ms", r.sourceMs()),
                        Figure.measured("random.bare_seek_ms", "bare grabber setVideoFrameNumber(n) + grabImage()",
                                "ms", r.bareSeekMs()),
                        Targets.randomAccessRatio(Figure.value("random.ratio_source_to_bare_seek",
                                "ratio VideoSource / bare seek", "x",
                                Summary.medianRatio(r.sourceMs(), r.bareSeekMs()))),
                        Targets.step(Figure.measured("random.step_forward_ms", "then frame(n+1)", "ms",
                                r.stepForwardMs())),
                        Targets.step(Figure.measured("random.step_back_ms", "then frame(n-1)", "ms",
                                r.stepBackMs())),
                        Figure.measured("random.frames_after_keyframe", "frames from the keyframe before n to n",
                                "", distance)),
                List.of("each sample opens a new VideoSource (index from the disk cache) and a new grabber; "
                                + "opening is not timed; both go to the same n, back to back.",
                        "the bare seek gave the same picture as frame(n) in " + r.bareSeekExact() + " of "
                                + r.frames().length + " samples (64 pixels compared, within 2 levels).",
                        "frames asked: " + java.util.Arrays.toString(r.frames())));
    }

    private static String loadAverage() {
        try {
            String[] parts = Files.readString(Path.of("/proc/loadavg")).trim().split("\\s+");
            return parts[0] + " " + parts[1] + " " + parts[2];
        } catch (IOException | RuntimeException e) {
            return "unknown";
        }
    }
}
