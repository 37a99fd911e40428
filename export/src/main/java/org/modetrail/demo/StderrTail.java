package org.modetrail.demo;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Reads a child process's error stream on its own thread and keeps its last lines. The stream must be drained
 * continuously: a child that fills the pipe buffer stops, and would then stop reading our frames too.
 */
final class StderrTail {

    private static final int KEPT_LINES = 30;

    private final Deque<String> lines = new ArrayDeque<>();
    private final Thread reader;

    StderrTail(InputStream stream, String threadName) {
        reader = new Thread(() -> drain(stream), threadName);
        reader.setDaemon(true);
        reader.start();
    }

    private void drain(InputStream stream) {
        try (BufferedReader in = new BufferedReader(new InputStreamReader(stream, StandardCharsets.UTF_8))) {
            String line;
            while ((line = in.readLine()) != null) {
                synchronized (lines) {
                    lines.addLast(line);
                    if (lines.size() > KEPT_LINES) {
                        lines.removeFirst();
                    }
                }
            }
        } catch (IOException e) {
            // The process went away; whatever was read so far is the tail.
        }
    }

    /** Waits briefly for the stream to end, then returns the kept lines. */
    String text() {
        try {
            reader.join(5_000);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        synchronized (lines) {
            return String.join("\n", lines);
        }
    }
}
