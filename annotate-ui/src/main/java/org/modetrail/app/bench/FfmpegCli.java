package org.modetrail.app.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The system's {@code ffmpeg} command-line tool, used to make the test clip and as an outside reference for decode
 * speed. It is a separate build of FFmpeg (Debian's), not the libraries JavaCV ships, so its figures are a
 * yardstick, not a like-for-like comparison.
 */
final class FfmpegCli {
    private static final Pattern RTIME = Pattern.compile("rtime=([0-9.]+)s");
    private static final Pattern FRAMES = Pattern.compile("frame=\\s*(\\d+)");
    private static final Pattern VERSION = Pattern.compile("ffmpeg version (\\S+)");

    private final Path executable;

    private FfmpegCli(Path executable) {
        this.executable = executable;
    }

    /** The ffmpeg on PATH (or /usr/bin/ffmpeg), if there is one. */
    static Optional<FfmpegCli> find() {
        List<Path> candidates = new ArrayList<>();
        String path = System.getenv("PATH");
        if (path != null) {
            for (String dir : path.split(java.io.File.pathSeparator)) {
                if (!dir.isEmpty()) {
                    candidates.add(Path.of(dir, "ffmpeg"));
                }
            }
        }
        candidates.add(Path.of("/usr/bin/ffmpeg"));
        return candidates.stream().filter(Files::isExecutable).findFirst().map(FfmpegCli::new);
    }

    String version() {
        try {
            Matcher m = VERSION.matcher(run(List.of("-version")).output);
            return m.find() ? m.group(1) : "unknown";
        } catch (IOException e) {
            return "unknown";
        }
    }

    /**
     * Encodes a synthetic 1080p clip: FFmpeg's testsrc2 pattern (moving shapes and a frame counter, so every
     * frame differs), H.264 with B-frames and a fixed keyframe interval. Scene-cut keyframes are off so that the
     * GOP is exactly what was asked: random-access cost depends on it.
     */
    void makeClip(Path out, int frames, int gop) throws IOException {
        Result r = run(List.of("-y", "-f", "lavfi", "-i", "testsrc2=size=1920x1080:rate=25",
                "-frames:v", Integer.toString(frames), "-c:v", "libx264", "-preset", "veryfast", "-bf", "3",
                "-g", Integer.toString(gop), "-sc_threshold", "0", "-pix_fmt", "yuv420p", out.toString()));
        if (r.exitCode != 0 || !Files.isRegularFile(out)) {
            throw new IOException("ffmpeg could not make the test clip (exit " + r.exitCode + "): " + tail(r.output));
        }
    }

    /** A decode-only run, {@code ffmpeg -benchmark [-threads N] -i clip [-pix_fmt F] -f null -}. */
    DecodeRun decode(Path clip, int threads, String pixelFormat) throws IOException {
        List<String> args = new ArrayList<>(List.of("-benchmark"));
        if (threads > 0) {
            args.addAll(List.of("-threads", Integer.toString(threads)));
        }
        args.addAll(List.of("-i", clip.toString()));
        if (pixelFormat != null) {
            args.addAll(List.of("-pix_fmt", pixelFormat));
        }
        args.addAll(List.of("-f", "null", "-"));
        Result r = run(args);
        Matcher time = RTIME.matcher(r.output);
        if (r.exitCode != 0 || !time.find()) {
            throw new IOException("ffmpeg -f null failed (exit " + r.exitCode + "): " + tail(r.output));
        }
        int frames = -1;
        Matcher f = FRAMES.matcher(r.output);
        while (f.find()) {
            frames = Integer.parseInt(f.group(1)); // the last report counts them all
        }
        return new DecodeRun(frames, Double.parseDouble(time.group(1)));
    }

    /** Frames ffmpeg reported and its own wall time for them ({@code rtime}, which leaves out process start-up). */
    record DecodeRun(int frames, double seconds) {
        double fps() {
            return frames / seconds;
        }
    }

    private record Result(int exitCode, String output) {
    }

    private Result run(List<String> args) throws IOException {
        List<String> command = new ArrayList<>(List.of(executable.toString(), "-hide_banner", "-nostdin", "-nostats"));
        command.addAll(args);
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        try {
            if (!p.waitFor(10, TimeUnit.MINUTES)) {
                p.destroyForcibly();
                throw new IOException("ffmpeg did not finish within 10 minutes");
            }
        } catch (InterruptedException e) {
            p.destroyForcibly();
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while ffmpeg ran", e);
        }
        return new Result(p.exitValue(), output);
    }

    private static String tail(String output) {
        String s = output.strip();
        return s.length() <= 400 ? s : "..." + s.substring(s.length() - 400);
    }
}
