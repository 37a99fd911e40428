package org.modetrail.format.coco;

import java.nio.file.Path;

import org.modetrail.video.VideoSource;

/**
 * Asks the COCO writer to write each annotated frame as a PNG file too, so that tools which read only image sets
 * can use the export. The images are named {@code frame_NNNNNN.png} after the 0-based frame and the JSON's
 * {@code file_name} is their path relative to the JSON file's folder.
 *
 * @param video  the project's video, opened (the caller closes it)
 * @param folder where the PNG files go; created when missing
 */
public record CocoFrameImages(VideoSource video, Path folder) {
    public CocoFrameImages {
        if (video == null || folder == null) {
            throw new IllegalArgumentException("frame images need the opened video and a folder");
        }
    }

    /** The PNG file for frame {@code frame} (0-based). */
    public Path imageFile(int frame) {
        return folder.resolve(CocoWriter.frameFileName(frame));
    }
}
