package org.modetrail.testsupport;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Synthetic test clips made with FFmpeg's command-line tool from its own lavfi test sources (testsrc2,
 * mandelbrot). Each clip is made once per build into {@code target/reference-clips} (named with a hash of its
 * recipe, so a changed recipe makes a new file) and shared by the test classes; tests that change a file copy it
 * into their own {@code @TempDir} first.
 */
public enum ReferenceClips {
    /** H.264 in MP4, 3 B-frames, GOP 250 (two full GOPs and a bit), 600 frames at 25 fps. */
    MP4_H264_BFRAMES_GOP250("mp4", "testsrc2=size=320x240:rate=25", 600,
            "-c:v", "libx264", "-preset", "veryfast", "-bf", "3", "-g", "250", "-pix_fmt", "yuv420p"),
    /** H.264 in Matroska, 3 B-frames, GOP 100. */
    MKV_H264_BFRAMES("mkv", "testsrc2=size=320x240:rate=25", 300,
            "-c:v", "libx264", "-preset", "veryfast", "-bf", "3", "-g", "100", "-pix_fmt", "yuv420p"),
    /** H.264 in QuickTime MOV, 2 B-frames, GOP 60, from the mandelbrot source (every pixel changes). */
    MOV_H264("mov", "mandelbrot=size=320x240:rate=30", 300,
            "-c:v", "libx264", "-preset", "veryfast", "-bf", "2", "-g", "60", "-pix_fmt", "yuv420p"),
    /**
     * Variable frame rate MP4: intervals of 40, 50, 60 or 70 ms from a setpts expression on a 1 ms time base,
     * kept by -fps_mode vfr; H.264 with 2 B-frames, GOP 50.
     */
    MP4_H264_VFR("mp4", "testsrc2=size=320x240:rate=25", 300,
            "-vf", "settb=1/1000,setpts='(N+0.25*floor(N/3)+0.5*floor(N/5))/25/TB'", "-fps_mode", "vfr",
            "-enc_time_base", "1:1000", "-video_track_timescale", "1000",
            "-c:v", "libx264", "-preset", "veryfast", "-bf", "2", "-g", "50", "-pix_fmt", "yuv420p"),
    /** Motion JPEG in AVI (every frame a keyframe, full-range yuvj420p). */
    AVI_MJPEG("avi", "testsrc2=size=320x240:rate=25", 200, "-c:v", "mjpeg", "-q:v", "3"),
    /** MPEG-4 part 2 in AVI, no B-frames, GOP 50. */
    AVI_MPEG4("avi", "testsrc2=size=320x240:rate=25", 300, "-c:v", "mpeg4", "-q:v", "3", "-g", "50", "-bf", "0"),
    /** MPEG-4 part 2 in AVI with 2 B-frames: AVI has no reordering, a known hard case. */
    AVI_MPEG4_BF2("avi", "testsrc2=size=320x240:rate=25", 300, "-c:v", "mpeg4", "-q:v", "3", "-g", "50", "-bf", "2"),
    /** H.264 in MPEG-TS, 2 B-frames, GOP 25: the damage tests' container, which resynchronises after damage. */
    TS_H264("ts", "testsrc2=size=320x240:rate=25", 300,
            "-c:v", "libx264", "-preset", "veryfast", "-bf", "2", "-g", "25", "-pix_fmt", "yuv420p"),
    /** H.264 in MP4 with the moov box at the front (-movflags +faststart), GOP 25. */
    MP4_H264_FASTSTART("mp4", "testsrc2=size=320x240:rate=25", 300,
            "-c:v", "libx264", "-preset", "veryfast", "-bf", "2", "-g", "25", "-pix_fmt", "yuv420p",
            "-movflags", "+faststart"),
    /** H.264 in MP4 with the moov box at the end (ffmpeg's default), GOP 25. */
    MP4_H264_MOOV_AT_END("mp4", "testsrc2=size=320x240:rate=25", 300,
            "-c:v", "libx264", "-preset", "veryfast", "-bf", "2", "-g", "25", "-pix_fmt", "yuv420p");

    public static final int WIDTH = 320;
    public static final int HEIGHT = 240;

    private final String extension;
    private final String source;
    private final int frames;
    private final String[] encode;

    ReferenceClips(String extension, String source, int frames, String... encode) {
        this.extension = extension;
        this.source = source;
        this.frames = frames;
        this.encode = encode;
    }

    /** Frames the recipe asks for (ffmpeg -frames:v); the tests check what ffprobe finds, not this. */
    public int requestedFrames() {
        return frames;
    }

    public String extension() {
        return extension;
    }

    /** The command line the clip is made with, for messages. */
    public List<String> recipe() {
        List<String> args = new ArrayList<>(List.of("-f", "lavfi", "-i", source, "-frames:v",
                Integer.toString(frames)));
        args.addAll(Arrays.asList(encode));
        return args;
    }

    /** The clip, made on first use. */
    public synchronized Path path() {
        Path dir = Path.of("target", "reference-clips").toAbsolutePath();
        Path file = dir.resolve(name().toLowerCase() + "-" + Integer.toHexString(recipe().hashCode()) + "."
                + extension);
        if (Files.isRegularFile(file)) {
            return file;
        }
        try {
            Files.createDirectories(dir);
            Path tmp = dir.resolve("making-" + ProcessHandle.current().pid() + "-" + file.getFileName());
            List<String> args = new ArrayList<>(recipe());
            args.add(tmp.toString());
            Ffmpeg.ffmpeg(args.toArray(String[]::new));
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A private copy in {@code dir}, for tests that damage, touch or extend the file. */
    public Path copyTo(Path dir) {
        try {
            Path copy = dir.resolve(name().toLowerCase() + "." + extension);
            Files.copy(path(), copy, StandardCopyOption.REPLACE_EXISTING);
            return copy;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
