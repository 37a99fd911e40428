package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;

/**
 * The Jackson set-up for project files: plain data only (no default typing, no class names from the file), with
 * the stream limits of {@link ProjectLimits} enforced by the parser itself while it reads.
 */
final class ProjectJson {
    static final String FORMAT = "modetrail-project";

    private ProjectJson() {
    }

    static JsonFactory factory(ProjectLimits limits) {
        StreamReadConstraints constraints = StreamReadConstraints.builder()
                .maxDocumentLength(limits.maxDocumentBytes())
                .maxNestingDepth(limits.maxNestingDepth())
                .maxStringLength(limits.maxStringChars())
                .maxNumberLength(limits.maxNumberChars())
                .maxNameLength(1000)
                .build();
        return JsonFactory.builder()
                .streamReadConstraints(constraints)
                // A duplicated field would silently win or lose; the user should hear about it.
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .disable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
                // We close the file ourselves, after fsync.
                .disable(StreamWriteFeature.AUTO_CLOSE_TARGET)
                .build();
    }

    /** A mapper for the tree model only (schema upgrades); it never binds to classes named by the file. */
    static ObjectMapper treeMapper(ProjectLimits limits) {
        return JsonMapper.builder(factory(limits)).build();
    }
}
