package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.PrettyPrinter;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Lays the file out for people and for diffs: the top-level fields, each class, each track and each frame on a
 * line of its own, while the video, a class, a track's header and one frame stay on one line. One frame per line
 * keeps a long video's file compact and makes error line numbers point at one frame. Holds the nesting of one
 * document, so each write makes its own.
 */
final class LayoutPrinter implements PrettyPrinter {
    private final Deque<Boolean> multiline = new ArrayDeque<>();

    /** Root object (depth 1), the classes and tracks lists (2), a track's frames list (4). */
    private static boolean isMultiline(int depth, boolean array) {
        return depth == 1 || (array && (depth == 2 || depth == 4));
    }

    private void newLine(JsonGenerator g, int depth) throws IOException {
        // Indentation stops growing at the frames so that each of possibly millions of lines stays short.
        g.writeRaw('\n');
        for (int i = 0; i < Math.min(depth, 3); i++) {
            g.writeRaw("  ");
        }
    }

    @Override
    public void writeRootValueSeparator(JsonGenerator g) throws IOException {
        g.writeRaw('\n');
    }

    @Override
    public void writeStartObject(JsonGenerator g) throws IOException {
        g.writeRaw('{');
        multiline.push(isMultiline(multiline.size() + 1, false));
    }

    /** A line break if the current object or array is laid out over several lines. */
    private void breakIfMultiline(JsonGenerator g) throws IOException {
        if (multiline.peek()) {
            newLine(g, multiline.size());
        }
    }

    @Override
    public void beforeObjectEntries(JsonGenerator g) throws IOException {
        breakIfMultiline(g);
    }

    @Override
    public void writeObjectEntrySeparator(JsonGenerator g) throws IOException {
        g.writeRaw(',');
        if (multiline.peek()) {
            newLine(g, multiline.size());
        } else {
            g.writeRaw(' ');
        }
    }

    @Override
    public void writeObjectFieldValueSeparator(JsonGenerator g) throws IOException {
        g.writeRaw(": ");
    }

    @Override
    public void writeEndObject(JsonGenerator g, int entries) throws IOException {
        boolean wasMultiline = multiline.pop();
        if (wasMultiline && entries > 0) {
            newLine(g, multiline.size());
        }
        g.writeRaw('}');
    }

    @Override
    public void writeStartArray(JsonGenerator g) throws IOException {
        g.writeRaw('[');
        multiline.push(isMultiline(multiline.size() + 1, true));
    }

    @Override
    public void beforeArrayValues(JsonGenerator g) throws IOException {
        breakIfMultiline(g);
    }

    @Override
    public void writeArrayValueSeparator(JsonGenerator g) throws IOException {
        g.writeRaw(',');
        breakIfMultiline(g);
    }

    @Override
    public void writeEndArray(JsonGenerator g, int values) throws IOException {
        boolean wasMultiline = multiline.pop();
        if (wasMultiline && values > 0) {
            newLine(g, multiline.size());
        }
        g.writeRaw(']');
    }
}
