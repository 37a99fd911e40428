package org.modetrail.tuning;

import java.awt.Graphics2D;


import org.modetrail.demo.scenario.FamilyKind;
import org.modetrail.trackbench.ContactSheet;
import org.modetrail.demo.scenario.ScenarioBox;
import org.modetrail.demo.scenario.ScenarioFamily;
import org.modetrail.demo.scenario.TrackingScenario;
import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStep;
import org.modetrail.video.Frame;

/**
 * A contact sheet for looking at one object's track: crops round the true box on every STEP-th frame from FROM to
 * TO, the truth in green, the tracker's box in magenta. The tracker runs on raw frames, as in {@link FamilyTrace}.
 * Args: KIND SEED OBJECT FROM TO STEP OUT.png.
 */
public final class FamilySheet {
    public static void main(String[] args) throws Exception {
        FamilyKind kind = FamilyKind.ofSlug(args[0]);
        TrackingScenario s = ScenarioFamily.create(kind, Long.parseLong(args[1]));
        int k = Integer.parseInt(args[2]);
        int from = Integer.parseInt(args[3]);
        int to = Integer.parseInt(args[4]);
        int step = Integer.parseInt(args[5]);
        int w = s.width();
        int h = s.height();
        ContactSheet sheet = new ContactSheet((to - from) / step + 1);
        int[] rgb = new int[w * h];
        MeanShiftTracker t = null;
        for (int f = 0; f <= to; f++) {
            s.render(f, rgb);
            Frame frame = new Frame(f, 0, w, h, rgb);
            ScenarioBox tb = s.truth(k, f);
            Box truth = tb.width() > 0 ? new Box(tb.x(), tb.y(), tb.width(), tb.height()) : null;
            Box box = null;
            if (t == null) {
                if (truth != null && tb.visible() >= 0.5) {
                    t = new MeanShiftTracker(Tune.config());
                    t.start(frame, truth);
                    box = truth;
                }
            } else if (!t.isLost()) {
                TrackStep st = t.track(frame);
                box = st.status().found() ? st.box() : null;
            }
            if (f >= from && (f - from) % step == 0) {
                sheet.add(rgb, w, h, truth, box,
                        f + (truth == null ? " out" : String.format(java.util.Locale.ROOT, " v%.2f", tb.visible())));
            }
        }
        sheet.write(java.nio.file.Path.of(args[6]));
    }
}
