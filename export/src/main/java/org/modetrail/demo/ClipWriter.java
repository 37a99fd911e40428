package org.modetrail.demo;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Encodes frames into a clip by piping raw RGB into the ffmpeg command-line tool. The clip is written under a
 * temporary name in the target folder and moved into place only when ffmpeg has succeeded, so a failed or
 * interrupted run never leaves a half-written clip under the real name.
 *
 * <p>Use as {@code try (ClipWriter w = ClipWriter.open(path, options)) { ...w.write(rgb)...; w.finish(); }}; closing
 * without {@link #finish()} abandons the clip.
 */
public final class ClipWriter implements AutoCloseable {

    private static final long FINISH_TIMEOUT_MINUTES = 10;

    private final Path target;
    private final Path partial;
    private final ClipOptions options;
    private final Process process;
    private final OutputStream stdin;
    private final StderrTail stderr;
    private final byte[] frameBytes;
    private int written;
    private boolean done;

    private ClipWriter(Path target, Path partial, ClipOptions options, Process process) {
        this.target = target;
        this.partial = partial;
        this.options = options;
        this.process = process;
        this.stdin = process.getOutputStream();
        this.stderr = new StderrTail(process.getErrorStream(), "ffmpeg-stderr " + target.getFileName());
        this.frameBytes = new byte[options.width() * options.height() * 3];
    }

    /** Starts ffmpeg for {@code target}; the container is chosen by the file extension. */
    public static ClipWriter open(Path target, ClipOptions options) throws IOException {
        Path absolute = target.toAbsolutePath();
        VideoCodec.Container container = VideoCodec.Container.of(absolute.getFileName().toString());
        if (!options.codec().fits(container)) {
            throw new IllegalArgumentException(options.codec() + " cannot be written to a ." 
                    + container.name().toLowerCase(java.util.Locale.ROOT) + " file");
        }
        Path dir = absolute.getParent();
        Files.createDirectories(dir);
        Path partial = Files.createTempFile(dir, "." + absolute.getFileName(), ".part");
        List<String> command = command(options, container, partial);
        ProcessBuilder builder = new ProcessBuilder(command).redirectOutput(ProcessBuilder.Redirect.DISCARD);
        try {
            return new ClipWriter(absolute, partial, options, builder.start());
        } catch (IOException e) {
            Files.deleteIfExists(partial);
            throw new ClipWriteException(absolute, "could not start '" + options.ffmpeg()
                    + "' (is ffmpeg installed? on Debian: apt-get install ffmpeg): " + e.getMessage(), e);
        }
    }

    static List<String> command(ClipOptions o, VideoCodec.Container container, Path output) {
        List<String> c = new ArrayList<>(List.of(o.ffmpeg(), "-hide_banner", "-nostats", "-loglevel", "error", "-y",
                "-f", "rawvideo", "-pix_fmt", "rgb24", "-video_size", o.width() + "x" + o.height(),
                "-framerate", Integer.toString(o.fps()), "-i", "pipe:0", "-an", "-c:v", o.codec().encoder()));
        switch (o.codec()) {
            case H264 -> c.addAll(List.of("-preset", o.preset(), "-crf", Integer.toString(o.crf()),
                    "-g", Integer.toString(o.gopLength()), "-bf", Integer.toString(o.bFrames())));
            case MPEG4 -> c.addAll(List.of("-q:v", Integer.toString(o.qscale()),
                    "-g", Integer.toString(o.gopLength()), "-bf", Integer.toString(o.bFrames())));
            case MJPEG -> c.addAll(List.of("-q:v", Integer.toString(o.qscale())));
        }
        c.addAll(List.of("-pix_fmt", o.pixelFormat()));
        if (o.fastStart() && (container == VideoCodec.Container.MP4 || container == VideoCodec.Container.MOV)) {
            c.addAll(List.of("-movflags", "+faststart"));
        }
        c.addAll(List.of("-f", container.muxer(), output.toString()));
        return c;
    }

    /** Appends a frame of packed {@code 0x00RRGGBB} pixels, row-major. */
    public void write(int[] rgb) throws IOException {
        if (done) {
            throw new IllegalStateException("clip " + target + " is already finished");
        }
        if (rgb.length != options.width() * options.height()) {
            throw new IllegalArgumentException("frame must hold " + options.width() + " x " + options.height()
                    + " pixels, got " + rgb.length);
        }
        byte[] out = frameBytes;
        for (int i = 0, k = 0; i < rgb.length; i++, k += 3) {
            int c = rgb[i];
            out[k] = (byte) (c >>> 16);
            out[k + 1] = (byte) (c >>> 8);
            out[k + 2] = (byte) c;
        }
        try {
            stdin.write(out);
        } catch (IOException e) {
            // Usually a broken pipe: ffmpeg has stopped, and its error output says why.
            throw failure("ffmpeg stopped reading frames after " + written + " of them", e);
        }
        written++;
    }

    /** Ends the input, waits for ffmpeg and moves the clip into place. */
    public void finish() throws IOException {
        if (done) {
            return;
        }
        done = true;
        try {
            stdin.close();
        } catch (IOException e) {
            throw failure("ffmpeg stopped before the end of the input", e);
        }
        boolean exited;
        try {
            exited = process.waitFor(FINISH_TIMEOUT_MINUTES, TimeUnit.MINUTES);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw failure("interrupted while ffmpeg was finishing", e);
        }
        if (!exited) {
            throw failure("ffmpeg did not finish within " + FINISH_TIMEOUT_MINUTES + " minutes", null);
        }
        if (process.exitValue() != 0) {
            throw failure("ffmpeg exited with status " + process.exitValue(), null);
        }
        if (written != options.frameCount()) {
            throw failure("expected " + options.frameCount() + " frames, got " + written, null);
        }
        AtomicFiles.moveIntoPlace(partial, target);
    }

    /** Abandons an unfinished clip: stops ffmpeg and deletes the partial file. */
    @Override
    public void close() throws IOException {
        if (process.isAlive()) {
            process.destroyForcibly();
        }
        Files.deleteIfExists(partial);
    }

    private ClipWriteException failure(String message, Throwable cause) {
        done = true;
        try {
            process.waitFor(10, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        // Read the tail before any destroy: destroying a process also closes our end of its error stream.
        String tail = process.isAlive() ? "" : stderr.text();
        if (process.isAlive()) {
            process.destroyForcibly();
            tail = stderr.text();
        }
        return new ClipWriteException(target, message + (tail.isBlank() ? "" : "; ffmpeg said:\n" + tail), cause);
    }
}
