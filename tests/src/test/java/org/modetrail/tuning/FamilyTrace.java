package org.modetrail.tuning;

import java.util.Locale;

import org.modetrail.demo.scenario.FamilyKind;
import org.modetrail.demo.scenario.ScenarioBox;
import org.modetrail.demo.scenario.ScenarioFamily;
import org.modetrail.demo.scenario.TrackingScenario;
import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStep;
import org.modetrail.video.Frame;

/**
 * Scratch: one family clip, every object, a one-character-per-frame timeline (T good, t IoU under 0.5, x IoU 0,
 * c coasting, s searching, R re-acquired, '.' not scored, '-' out of view with no box, '!' box while out of view)
 * and a line at each change of character class with the truth, the box and the similarity.
 * Args: KIND SEED [detail].
 */
public final class FamilyTrace {
    public static void main(String[] args) {
        FamilyKind kind = FamilyKind.ofSlug(args[0]);
        long seed = Long.parseLong(args[1]);
        boolean detail = args.length > 2;
        TrackingScenario s = ScenarioFamily.create(kind, seed);
        int objects = s.objectCount();
        int w = s.width();
        int h = s.height();
        int[] rgb = new int[w * h];
        MeanShiftTracker[] t = new MeanShiftTracker[objects];
        StringBuilder[] line = new StringBuilder[objects];
        StringBuilder log = new StringBuilder();
        char[] last = new char[objects];
        for (int k = 0; k < objects; k++) {
            line[k] = new StringBuilder();
        }
        System.out.printf(Locale.ROOT, "%s seed %d: %dx%d, %d frames, %d objects%n", kind.slug(), seed, w, h,
                s.frameCount(), objects);
        for (int f = 0; f < s.frameCount(); f++) {
            s.render(f, rgb);
            Frame frame = new Frame(f, 0, w, h, rgb);
            for (int k = 0; k < objects; k++) {
                ScenarioBox tb = s.truth(k, f);
                Box truth = tb.width() > 0 ? new Box(tb.x(), tb.y(), tb.width(), tb.height()) : null;
                char c;
                String info = "";
                if (t[k] == null) {
                    if (truth != null && tb.visible() >= 0.5) {
                        t[k] = new MeanShiftTracker(Tune.config());
                        t[k].start(frame, truth);
                        c = 'S';
                        info = "start " + truth;
                    } else {
                        c = ' ';
                    }
                } else if (t[k].isLost()) {
                    c = 'L';
                } else {
                    TrackStep step = t[k].track(frame);
                    Box b = step.status().found() ? step.box() : null;
                    double iou = b == null || truth == null ? 0 : b.iou(truth);
                    switch (step.status()) {
                        case COASTING -> c = 'c';
                        case SEARCHING -> c = 's';
                        case REACQUIRED -> c = 'R';
                        default -> {
                            if (truth == null || tb.visible() < 0.5) {
                                c = b == null ? '-' : '!';
                            } else {
                                c = iou >= 0.5 ? 'T' : iou > 0 ? 't' : 'x';
                            }
                        }
                    }
                    info = String.format(Locale.ROOT, "truth %s vis %.2f box %s rho %.3f iou %.2f",
                            truth == null ? "-" : fmt(truth), tb.visible(), fmt(step.box()), step.similarity(), iou);
                }
                line[k].append(c);
                if (c != last[k] || detail) {
                    log.append(String.format(Locale.ROOT, "  o%d f%4d %c %s%n", k, f, c, info));
                }
                last[k] = c;
            }
        }
        for (int k = 0; k < objects; k++) {
            System.out.println("o" + k + ":");
            String l = line[k].toString();
            for (int i = 0; i < l.length(); i += 100) {
                System.out.printf(Locale.ROOT, "  %4d %s%n", i, l.substring(i, Math.min(l.length(), i + 100)));
            }
        }
        System.out.print(log);
    }

    private static String fmt(Box b) {
        return String.format(Locale.ROOT, "[%.0f,%.0f %.0fx%.0f]", b.x(), b.y(), b.width(), b.height());
    }
}
