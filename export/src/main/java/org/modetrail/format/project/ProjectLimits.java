package org.modetrail.format.project;

/**
 * Bounds on what a project file may hold, so a damaged or hostile file is refused early instead of exhausting
 * memory. The defaults fit a long video (100,000 frames) with dozens of tracks with room to spare.
 *
 * @param maxDocumentBytes size of the file; default 512 MiB
 * @param maxNestingDepth  arrays and objects inside each other; default 32 (the layout needs 5)
 * @param maxStringChars   one string (a note, a path); default 1,000,000 characters
 * @param maxNumberChars   digits of one number; default 64 (a double needs at most 24)
 * @param maxTracks        tracks in a project; default 100,000
 * @param maxClasses       object classes in a project; default 10,000
 * @param maxAnnotations   frame annotations over all tracks; default 20,000,000 (about 2.5 GB of heap once read,
 *                         200 tracks over every frame of a 100,000-frame video)
 */
public record ProjectLimits(long maxDocumentBytes, int maxNestingDepth, int maxStringChars, int maxNumberChars,
                            int maxTracks, int maxClasses, long maxAnnotations) {

    public static final ProjectLimits DEFAULT =
            new ProjectLimits(512L << 20, 32, 1_000_000, 64, 100_000, 10_000, 20_000_000L);

    public ProjectLimits {
        if (maxDocumentBytes < 1024) {
            throw new IllegalArgumentException("maxDocumentBytes must be at least 1024, got " + maxDocumentBytes);
        }
        // Depth 5 is the deepest the layout goes (root, tracks, track, frames, one frame).
        if (maxNestingDepth < 5) {
            throw new IllegalArgumentException("maxNestingDepth must be at least 5, got " + maxNestingDepth);
        }
        if (maxStringChars < 256) {
            throw new IllegalArgumentException("maxStringChars must be at least 256, got " + maxStringChars);
        }
        if (maxNumberChars < 24) {
            throw new IllegalArgumentException("maxNumberChars must be at least 24, got " + maxNumberChars);
        }
        if (maxTracks < 1 || maxClasses < 1 || maxAnnotations < 1) {
            throw new IllegalArgumentException("track, class and annotation limits must be positive, got "
                    + maxTracks + ", " + maxClasses + ", " + maxAnnotations);
        }
    }

    public ProjectLimits withMaxDocumentBytes(long bytes) {
        return new ProjectLimits(bytes, maxNestingDepth, maxStringChars, maxNumberChars, maxTracks, maxClasses,
                maxAnnotations);
    }

    public ProjectLimits withMaxAnnotations(long annotations) {
        return new ProjectLimits(maxDocumentBytes, maxNestingDepth, maxStringChars, maxNumberChars, maxTracks,
                maxClasses, annotations);
    }
}
