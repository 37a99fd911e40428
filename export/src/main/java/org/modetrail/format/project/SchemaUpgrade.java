package org.modetrail.format.project;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;

/** One step of the upgrade chain: turns a document of schema {@link #from()} into schema {@code from() + 1}. */
interface SchemaUpgrade {
    int from();

    /** Rewrites {@code root} in place; {@code file} is for error messages. */
    void apply(ObjectNode root, Path file) throws ProjectFileException;
}
