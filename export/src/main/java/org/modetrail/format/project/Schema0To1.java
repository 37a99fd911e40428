package org.modetrail.format.project;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;

/**
 * Schema 0 was the development layout: every frame was a visible box written as an object,
 * {@code [frame, source, {"x":…, "y":…, "w":…, "h":…}, score]}, there were no hidden or absent marks, and the video
 * had no fingerprint. Schema 1 adds the presence letter, flattens the box and adds an empty fingerprint (the editor
 * fills it in when it next opens the video).
 */
final class Schema0To1 implements SchemaUpgrade {

    @Override
    public int from() {
        return 0;
    }

    @Override
    public void apply(ObjectNode root, Path file) throws ProjectFileException {
        if (root.get("video") instanceof ObjectNode video && !video.has("fingerprint")) {
            video.put("fingerprint", "");
        }
        JsonNode tracks = root.get("tracks");
        if (tracks == null || !tracks.isArray()) {
            throw fail(file, "the project has no \"tracks\" list");
        }
        for (JsonNode track : tracks) {
            if (!(track.get("frames") instanceof ArrayNode frames)) {
                continue; // the schema-1 reader names the track and what is missing
            }
            String name = "track " + track.path("id").asText("?");
            for (int i = 0; i < frames.size(); i++) {
                frames.set(i, upgradeFrame(frames.get(i), name, i, file));
            }
        }
    }

    private static JsonNode upgradeFrame(JsonNode entry, String track, int index, Path file)
            throws ProjectFileException {
        String where = track + ", frame entry " + (index + 1);
        if (!entry.isArray() || entry.size() != 4 || !entry.get(2).isObject()) {
            throw fail(file, where + " should be [frame, source, {\"x\", \"y\", \"w\", \"h\"}, score] in schema 0");
        }
        JsonNode box = entry.get(2);
        ArrayNode up = ((ArrayNode) entry).arrayNode();
        up.add(entry.get(0));
        up.add(entry.get(1));
        up.add("v");
        for (String k : new String[] {"x", "y", "w", "h"}) {
            JsonNode v = box.get(k);
            if (v == null || !v.isNumber()) {
                throw fail(file, where + ": the box has no number \"" + k + "\"");
            }
            up.add(v);
        }
        up.add(entry.get(3));
        return up;
    }

    private static ProjectFileException fail(Path file, String detail) {
        return new ProjectFileException(file, 0, 0, "while upgrading from schema 0: " + detail);
    }
}
