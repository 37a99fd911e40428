package org.modetrail.app.editor;

import org.modetrail.format.TracksFormat;

/** One thing the export screen can write, in the order the screen lists them. */
enum ExportItem {
    CSV("Tracks as CSV", TracksFormat.CSV),
    COCO("Tracks as COCO-style JSON", TracksFormat.COCO),
    MOT("Tracks as MOTChallenge text", TracksFormat.MOT),
    SUMMARY("Summary per track (CSV)", null),
    PLOTS("Plots", null),
    OVERLAY("Overlay video (MP4)", null);

    private final String label;
    private final TracksFormat format;

    ExportItem(String label, TracksFormat format) {
        this.label = label;
        this.format = format;
    }

    String label() {
        return label;
    }

    /** The tracks format this item writes, or null when it is not a tracks export. */
    TracksFormat tracksFormat() {
        return format;
    }
}
