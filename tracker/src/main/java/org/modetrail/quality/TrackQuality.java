package org.modetrail.quality;

import java.util.List;

/**
 * What a track is made of and where to look first.
 *
 * @param keyframes    frames with the user's box
 * @param tracked      frames the tracker found
 * @param interpolated frames filled in by interpolation
 * @param marked       frames the user marked hidden or absent
 * @param empty        frames of the video without any annotation
 * @param meanScore    mean similarity over tracked frames (0 when there are none)
 * @param concerns     places to check, ordered by kind (jumps first) then by how bad they are
 */
public record TrackQuality(int keyframes, int tracked, int interpolated, int marked, int empty, double meanScore,
                           List<Concern> concerns) {
    public TrackQuality {
        concerns = List.copyOf(concerns);
    }
}
