package org.modetrail.testsupport;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;

/**
 * Runs FFmpeg's command-line tool, the reference for decoded pixels. Frames are extracted the way the issue
 * states it: {@code ffmpeg -i FILE -vf select='eq(n\,A)+eq(n\,B)+...' -fps_mode passthrough}, here to rawvideo
 * rgb24 on stdout, where n counts decoded frames in presentation order from 0 (FFmpeg's select filter docs).
 */
public final class Ffmpeg {
    private static final long TIMEOUT_SECONDS = 300;

    private Ffmpeg() {
    }

    /** Output of one tool run. */
    public record Result(int exitCode, byte[] stdout, String stderr) {
        public String stdoutText() {
            return new String(stdout, StandardCharsets.UTF_8);
        }
    }

    /** Runs a command and returns what it wrote; never throws on a non-zero exit. */
    public static Result exec(List<String> command) {
        ProcessBuilder pb = new ProcessBuilder(command);
        try {
            Process p = pb.start();
            p.getOutputStream().close();
            CompletableFuture<byte[]> out = CompletableFuture.supplyAsync(() -> readAll(p.getInputStream()));
            CompletableFuture<byte[]> err = CompletableFuture.supplyAsync(() -> readAll(p.getErrorStream()));
            if (!p.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new AssertionError("timed out after " + TIMEOUT_SECONDS + " s: " + command);
            }
            return new Result(p.exitValue(), out.join(), new String(err.join(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot run " + command, e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted: " + command, e);
        }
    }

    /** Runs a command and fails the test with the tool's message when it exits with an error. */
    public static Result check(List<String> command) {
        Result r = exec(command);
        if (r.exitCode() != 0) {
            String err = r.stderr();
            throw new AssertionError("reference tool failed (exit " + r.exitCode() + "): " + String.join(" ", command)
                    + "\n" + err.substring(Math.max(0, err.length() - 4000)));
        }
        return r;
    }

    /** {@code ffmpeg -nostdin -v error -y ARGS}. */
    public static Result ffmpeg(String... args) {
        List<String> cmd = new ArrayList<>(List.of(RefData.ffmpeg().toString(), "-nostdin", "-v", "error", "-y"));
        cmd.addAll(Arrays.asList(args));
        return check(cmd);
    }

    /** {@code ffprobe -v error ARGS}, stdout as text. */
    public static String ffprobe(String... args) {
        List<String> cmd = new ArrayList<>(List.of(RefData.ffprobe().toString(), "-v", "error"));
        cmd.addAll(Arrays.asList(args));
        return check(cmd).stdoutText();
    }

    /**
     * The frames FFmpeg's command-line tool decodes at the given presentation-order numbers, as packed
     * 0xFFRRGGBB pixels (ffmpeg's automatic conversion to rgb24; its default scaler flags are bicubic).
     */
    public static Map<Integer, int[]> selectFrames(Path video, int width, int height, Collection<Integer> frames) {
        return selectFrames(List.of("-i", video.toString()), width, height, frames);
    }

    /** As {@link #selectFrames(Path, int, int, Collection)} with any input options, e.g. an image pattern. */
    public static Map<Integer, int[]> selectFrames(List<String> input, int width, int height,
                                                   Collection<Integer> frames) {
        TreeSet<Integer> wanted = new TreeSet<>(frames);
        StringBuilder expr = new StringBuilder();
        for (int n : wanted) {
            if (expr.length() > 0) {
                expr.append('+');
            }
            expr.append("eq(n\\,").append(n).append(')');
        }
        List<String> args = new ArrayList<>(input);
        args.addAll(List.of("-map", "0:v:0", "-vf", "select='" + expr + "'", "-fps_mode", "passthrough",
                "-f", "rawvideo", "-pix_fmt", "rgb24", "-"));
        byte[] raw = ffmpeg(args.toArray(String[]::new)).stdout();
        int frameBytes = width * height * 3;
        if (raw.length != (long) frameBytes * wanted.size()) {
            throw new AssertionError("ffmpeg gave " + raw.length + " bytes for " + wanted.size() + " frames of "
                    + width + "x" + height + " (expected " + (long) frameBytes * wanted.size() + ") from " + input);
        }
        Map<Integer, int[]> result = new TreeMap<>();
        int k = 0;
        for (int n : wanted) {
            result.put(n, Pixels.fromRgb24(raw, k * frameBytes, width, height));
            k++;
        }
        return result;
    }

    private static byte[] readAll(InputStream in) {
        try (in) {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            in.transferTo(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
