package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.PrettyPrinter;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Set;

/**
 * Lays the file out for people and for diffs: the top-level fields, each class, each track and each frame on a
 * line of its own, while the video, a class, a track's header and one frame stay on one line; the site's fields,
 * calibration points, zones and counting lines likewise a line each. One frame per line
 * keeps a long video's file compact and makes error line numbers point at one frame. Holds the nesting of one
 * document, so each write makes its own.
 */
final class LayoutPrinter implements PrettyPrinter {
    private final Deque<Boolean> multiline = new ArrayDeque<>();

    /** Lists whose entries each take a line: classes, tracks, a track's frames, and the site's lists. */
    private static final Set<String> MULTILINE_LISTS =
            Set.of("classes", "tracks", "frames", "points", "errors", "warnings", "zones", "lines");
    /** Objects whose fields each take a line besides the root: the site and its calibration. */
    private static final Set<String> MULTILINE_OBJECTS = Set.of("site", "calibration");

    /** Decided by the field the new object or list is the value of (the generator's context is already inside it). */
    private static boolean isMultiline(JsonGenerator g, int depth, boolean array) {
        if (depth == 1) {
            return true;
        }
        JsonStreamContext parent = g.getOutputContext().getParent();
        String field = parent != null && parent.inObject() ? parent.getCurrentName() : null;
        return field != null && (array ? MULTILINE_LISTS : MULTILINE_OBJECTS).contains(field);
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
        multiline.push(isMultiline(g, multiline.size() + 1, false));
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
        multiline.push(isMultiline(g, multiline.size() + 1, true));
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
