package org.modetrail.format.project;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.List;

/**
 * The chain of upgrade steps on the JSON tree, one per schema version, applied in order until the document is in
 * the current schema. A new schema adds a step here and never changes the old ones, so any old file can be read.
 */
final class SchemaUpgrades {
    private static final List<SchemaUpgrade> STEPS = List.of(new Schema0To1(), new Schema1To2(), new Schema2To3());

    private SchemaUpgrades() {
    }

    static void upgrade(ObjectNode root, int schema, Path file) throws ProjectFileException {
        for (int s = schema; s < ProjectFile.CURRENT_SCHEMA; s++) {
            SchemaUpgrade step = STEPS.get(s);
            if (step.from() != s) {
                throw new IllegalStateException("upgrade step " + s + " is for schema " + step.from());
            }
            step.apply(root, file);
            root.put("schema", s + 1);
        }
    }
}
