package org.modetrail.format.coco;

/**
 * What a COCO export wrote.
 *
 * @param images       image entries (annotated frames)
 * @param annotations  annotation entries (boxes)
 * @param clippedBoxes boxes that reached outside the frame and were clipped to it
 * @param droppedBoxes boxes left out because nothing of them lies inside the frame
 * @param imageFiles   PNG files written (0 without {@link CocoFrameImages})
 */
public record CocoSummary(int images, int annotations, int clippedBoxes, int droppedBoxes, int imageFiles) {
}
