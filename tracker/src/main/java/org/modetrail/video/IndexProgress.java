package org.modetrail.video;

/**
 * Told how far the one-time scan of a video's packets has got, so that a user opening an hour-long file for the
 * first time sees it move (later openings read the cached index and report nothing). Called on the opening thread.
 */
@FunctionalInterface
public interface IndexProgress {
    IndexProgress NONE = (done, total) -> { };

    /**
     * @param bytesRead bytes of the file scanned so far
     * @param fileBytes the file's size in bytes
     */
    void scanned(long bytesRead, long fileBytes);
}
