package org.modetrail.format.project;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;

/**
 * Schema 2 adds what is known of the scene (a {@code "site"} with the ground calibration, zones and counting
 * lines) and each class's ground contact point. A schema-1 file had neither: it reads as a site with nothing in it
 * and classes touching the ground at the bottom centre of their boxes, so the step changes nothing in the tree.
 */
final class Schema1To2 implements SchemaUpgrade {

    @Override
    public int from() {
        return 1;
    }

    @Override
    public void apply(ObjectNode root, Path file) {
        // Nothing to rewrite: both new fields are optional and their defaults are what schema 1 meant.
    }
}
