package org.modetrail.format;

/**
 * Bounds on what an imported tracks file (TRACKS.csv, MOTChallenge text, COCO JSON) may hold, so that a damaged or
 * hostile file is refused early instead of exhausting memory. The defaults fit a long video (100,000 frames) with
 * 200 objects on every frame, with room to spare.
 *
 * @param maxFileBytes    size of the file; default 512 MiB
 * @param maxLineChars    characters on one line of a text file; default 65,536
 * @param maxBoxes        boxes (rows, annotations, images) in one file; default 20,000,000
 * @param maxTracks       distinct tracks; default 100,000
 * @param maxClasses      distinct classes (categories); default 10,000
 * @param maxNestingDepth JSON arrays and objects inside each other; default 32 (COCO needs 4)
 * @param maxStringChars  one JSON string; default 1,000,000 characters
 * @param maxNumberChars  digits of one JSON number; default 64
 */
public record ImportLimits(long maxFileBytes, int maxLineChars, long maxBoxes, int maxTracks, int maxClasses,
                           int maxNestingDepth, int maxStringChars, int maxNumberChars) {

    public static final ImportLimits DEFAULT =
            new ImportLimits(512L << 20, 65_536, 20_000_000L, 100_000, 10_000, 32, 1_000_000, 64);

    public ImportLimits {
        if (maxFileBytes < 1024) {
            throw new IllegalArgumentException("maxFileBytes must be at least 1024, got " + maxFileBytes);
        }
        if (maxLineChars < 256) {
            throw new IllegalArgumentException("maxLineChars must be at least 256, got " + maxLineChars);
        }
        if (maxBoxes < 1 || maxTracks < 1 || maxClasses < 1) {
            throw new IllegalArgumentException("box, track and class limits must be positive, got " + maxBoxes
                    + ", " + maxTracks + ", " + maxClasses);
        }
        if (maxNestingDepth < 4) {
            throw new IllegalArgumentException("maxNestingDepth must be at least 4, got " + maxNestingDepth);
        }
        if (maxStringChars < 256) {
            throw new IllegalArgumentException("maxStringChars must be at least 256, got " + maxStringChars);
        }
        if (maxNumberChars < 24) {
            throw new IllegalArgumentException("maxNumberChars must be at least 24, got " + maxNumberChars);
        }
    }

    public ImportLimits withMaxFileBytes(long bytes) {
        return new ImportLimits(bytes, maxLineChars, maxBoxes, maxTracks, maxClasses, maxNestingDepth,
                maxStringChars, maxNumberChars);
    }

    public ImportLimits withMaxBoxes(long boxes) {
        return new ImportLimits(maxFileBytes, maxLineChars, boxes, maxTracks, maxClasses, maxNestingDepth,
                maxStringChars, maxNumberChars);
    }
}
