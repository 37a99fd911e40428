package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.OutputStream;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/** Writes the current schema with a streaming generator (docs/project-file.md describes the layout). */
final class ProjectWriter {
    private static final long NEGATIVE_ZERO_BITS = Double.doubleToRawLongBits(-0.0);
    /** Below 2^53 every whole double is exactly a long. */
    private static final double EXACT_LONG_LIMIT = 9.007199254740992E15;

    private ProjectWriter() {
    }

    /** Writes {@code project}, whose video path is already as it should be stored, to {@code out} (UTF-8). */
    static void write(Project project, String storedVideoPath, OutputStream out) throws IOException {
        JsonFactory factory = ProjectJson.factory(ProjectLimits.DEFAULT);
        try (JsonGenerator g = factory.createGenerator(out, JsonEncoding.UTF8)) {
            g.setPrettyPrinter(new LayoutPrinter());
            g.writeStartObject();
            g.writeStringField("format", ProjectJson.FORMAT);
            g.writeNumberField("schema", ProjectFile.CURRENT_SCHEMA);
            writeVideo(g, project.video(), storedVideoPath);
            g.writeArrayFieldStart("classes");
            for (ObjectClass c : project.classes()) {
                g.writeStartObject();
                g.writeStringField("name", c.name());
                g.writeStringField("colour", String.format(java.util.Locale.ROOT, "#%06X", c.colour()));
                g.writeArrayFieldStart("contact");
                number(g, c.contact().alongWidth());
                number(g, c.contact().alongHeight());
                g.writeEndArray();
                g.writeEndObject();
            }
            g.writeEndArray();
            SiteJson.write(g, project.site(), ProjectWriter::number);
            g.writeArrayFieldStart("tracks");
            for (Track t : project.tracks()) {
                writeTrack(g, t);
            }
            g.writeEndArray();
            g.writeEndObject();
            g.writeRaw('\n');
        }
    }

    private static void writeVideo(JsonGenerator g, VideoRef v, String path) throws IOException {
        g.writeObjectFieldStart("video");
        g.writeStringField("path", path);
        g.writeNumberField("width", v.width());
        g.writeNumberField("height", v.height());
        g.writeNumberField("frames", v.frameCount());
        g.writeStringField("fingerprint", v.fingerprint());
        g.writeEndObject();
    }

    private static void writeTrack(JsonGenerator g, Track t) throws IOException {
        g.writeStartObject();
        g.writeNumberField("id", t.id());
        g.writeStringField("class", t.className());
        g.writeStringField("note", t.note());
        g.writeArrayFieldStart("frames");
        for (FrameAnnotation a : t.frames().values()) {
            g.writeStartArray();
            g.writeNumber(a.frame());
            g.writeString(Letters.of(a.source()));
            g.writeString(Letters.of(a.presence()));
            Box b = a.box();
            if (b != null) {
                number(g, b.x());
                number(g, b.y());
                number(g, b.width());
                number(g, b.height());
            }
            number(g, a.score());
            if (a.hasUncertainty()) {
                number(g, a.uncertaintyPx());
            }
            g.writeEndArray();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    /**
     * Whole numbers without ".0" (most keyframe boxes are whole pixels, and scores of keyframes are 1); others in
     * Java's shortest round-trip form, which never depends on the locale. -0.0 keeps its sign, since the model
     * tells it apart from 0.
     */
    private static void number(JsonGenerator g, double d) throws IOException {
        if (d == Math.rint(d) && Math.abs(d) < EXACT_LONG_LIMIT
                && Double.doubleToRawLongBits(d) != NEGATIVE_ZERO_BITS) {
            g.writeNumber((long) d);
        } else {
            g.writeNumber(d);
        }
    }
}
