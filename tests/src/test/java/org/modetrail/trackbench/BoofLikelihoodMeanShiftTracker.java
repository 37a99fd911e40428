package org.modetrail.trackbench;

import boofcv.abst.tracker.MeanShiftLikelihoodType;
import boofcv.factory.tracker.FactoryTrackerObjectQuad;
import boofcv.struct.image.GrayU8;
import boofcv.struct.image.ImageType;
import boofcv.struct.image.Planar;

/**
 * Peer tracker: BoofCV's mean shift on a likelihood image ({@code FactoryTrackerObjectQuad.meanShiftLikelihood},
 * class {@code TrackerMeanShiftLikelihood}): each pixel is weighted by the likelihood of its colour under the
 * start box's colour histogram (a back-projection, as in Bradski's CamShift, "Computer vision face tracking for use
 * in a perceptual user interface", 1998) and a window is moved by mean shift (Fukunaga and Hostetler 1975; Cheng
 * 1995). It is not CamShift: BoofCV's window keeps the start box's size (its location is an integer rectangle of
 * fixed size; BoofCV has no CamShift, as far as its factory shows). Its {@code process} reports failure when the
 * likelihood inside the window drops too far; such frames have no box.
 *
 * <p>Settings: 30 mean-shift iterations, pixel values up to 255 and {@code MeanShiftLikelihoodType.HISTOGRAM} (a
 * joint histogram of the three RGB bands) as BoofCV's object-tracking example sets this tracker up (from memory),
 * on a 3-band RGB {@code Planar<GrayU8>}; 16 bins per band, as the Comaniciu peer and Comaniciu et al. use, instead
 * of the example's 5, with which the box trailed the object by about 24 px on the translation scenario.
 */
public final class BoofLikelihoodMeanShiftTracker extends BoofQuadAdapter<Planar<GrayU8>> {
    private Planar<GrayU8> image;

    public BoofLikelihoodMeanShiftTracker() {
        super(FactoryTrackerObjectQuad.meanShiftLikelihood(30, 16, 255, MeanShiftLikelihoodType.HISTOGRAM,
                ImageType.pl(3, GrayU8.class)));
    }

    @Override
    public String name() {
        return "BoofCV likelihood mean-shift";
    }

    @Override
    Planar<GrayU8> image() {
        return image;
    }

    @Override
    public void load(int[] rgb, int width, int height) {
        if (image == null || image.width != width || image.height != height) {
            image = new Planar<>(GrayU8.class, width, height, 3);
        }
        PlanarRgb.fill(image, rgb, width, height);
    }
}
