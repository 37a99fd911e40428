package org.modetrail.format.project;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;

/**
 * Schema 3 lets a visible frame carry a ninth value, the box's uncertainty in pixels
 * ({@code [frame, source, "v", x, y, width, height, score, uncertainty_px]}). A schema-2 file has none: its boxes
 * read with the uncertainty not known, so the step changes nothing in the tree. The schema number goes up so that
 * an older Modetrail refuses a file with the new value as newer, rather than as damaged.
 */
final class Schema2To3 implements SchemaUpgrade {

    @Override
    public int from() {
        return 2;
    }

    @Override
    public void apply(ObjectNode root, Path file) {
        // Nothing to rewrite: the new value is optional and its absence means "not known".
    }
}
