package org.modetrail.groundtruth;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.modetrail.model.Box;

/**
 * Links the foreground regions of consecutive frames into {@link Tracklet}s by overlap with each tracklet's
 * constant-velocity prediction (the blob-tracking scheme of Intille, Davis and Bobick 1997, "Real-time closed-world
 * tracking", CVPR, and of many surveillance systems since; figures here are common practice, no source):
 *
 * <ul>
 *   <li>a region and a tracklet are linked when the region overlaps the prediction by IoU {@link #MIN_IOU} or
 *       more, or covers half of the smaller of the two;</li>
 *   <li>one tracklet, one region: the tracklet goes on; one tracklet, several regions of about its size together:
 *       fragments of one body, joined;</li>
 *   <li>several tracklets, one region: a group begins, the tracklets become its members and wait;</li>
 *   <li>a group that falls apart: each member takes the part nearest to where it was heading;</li>
 *   <li>a tracklet without a region for more than {@link #MAX_GAP} frames ends.</li>
 * </ul>
 */
final class BlobLinker {
    static final double MIN_IOU = 0.15;
    static final int MAX_GAP = 4;
    static final int VELOCITY_SPAN = 5;

    private final List<Tracklet> all = new ArrayList<>();
    private final List<Tracklet> active = new ArrayList<>();
    private int nextId = 1;

    List<Tracklet> tracklets() {
        return all;
    }

    private Tracklet start(Blob b) {
        Tracklet t = new Tracklet(nextId++);
        t.see(b);
        all.add(t);
        active.add(t);
        return t;
    }

    private static boolean linked(Box pred, Box blob) {
        double inter = pred.intersection(blob);
        return pred.iou(blob) >= MIN_IOU || inter >= 0.5 * Math.min(pred.area(), blob.area());
    }

    void add(int frame, List<Blob> blobs) {
        addLinks(frame, blobs);
        for (Tracklet t : active) {
            if (t.isGroup() && t.seen.containsKey(frame)) {
                t.membersAt.put(frame, t.members.stream().filter(mm -> mm.inGroup == t).toList());
            }
        }
    }

    private void addLinks(int frame, List<Blob> blobs) {
        active.removeIf(t -> {
            if (frame - t.last() > MAX_GAP + 1) {
                t.ended = true;
                for (Tracklet m : t.members) {
                    if (m.inGroup == t) {
                        m.ended = true;
                    }
                }
                return true;
            }
            return false;
        });
        List<Tracklet> ts = new ArrayList<>(active);
        List<Box> preds = new ArrayList<>();
        for (Tracklet t : ts) {
            preds.add(t.predict(frame, VELOCITY_SPAN));
        }
        int k = ts.size();
        int m = blobs.size();
        boolean[][] link = new boolean[k][m];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < m; j++) {
                link[i][j] = linked(preds.get(i), blobs.get(j).box());
            }
        }
        // connected components of the link graph (tracklets 0..k-1, blobs k..k+m-1)
        int[] comp = new int[k + m];
        java.util.Arrays.fill(comp, -1);
        int nc = 0;
        for (int s = 0; s < k + m; s++) {
            if (comp[s] >= 0) {
                continue;
            }
            java.util.ArrayDeque<Integer> q = new java.util.ArrayDeque<>();
            q.add(s);
            comp[s] = nc;
            while (!q.isEmpty()) {
                int u = q.poll();
                for (int v = 0; v < k + m; v++) {
                    if (comp[v] >= 0) {
                        continue;
                    }
                    boolean e = u < k ? (v >= k && link[u][v - k]) : (v < k && link[v][u - k]);
                    if (e) {
                        comp[v] = nc;
                        q.add(v);
                    }
                }
            }
            nc++;
        }
        for (int c = 0; c < nc; c++) {
            List<Integer> ti = new ArrayList<>();
            List<Blob> bs = new ArrayList<>();
            for (int i = 0; i < k; i++) {
                if (comp[i] == c) {
                    ti.add(i);
                }
            }
            for (int j = 0; j < m; j++) {
                if (comp[k + j] == c) {
                    bs.add(blobs.get(j));
                }
            }
            resolve(frame, ti.stream().map(ts::get).toList(), ti.stream().map(preds::get).toList(), bs);
        }
    }

    private void resolve(int frame, List<Tracklet> ts, List<Box> preds, List<Blob> bs) {
        if (ts.isEmpty()) {
            bs.forEach(this::start);
            return;
        }
        if (bs.isEmpty()) {
            return; // missed this frame
        }
        if (ts.size() == 1) {
            Tracklet t = ts.get(0);
            Box pred = preds.get(0);
            if (bs.size() == 1) {
                t.see(bs.get(0));
                return;
            }
            if (t.isGroup()) {
                splitGroup(frame, t, bs);
                return;
            }
            Blob union = bs.get(0);
            for (int i = 1; i < bs.size(); i++) {
                union = union.union(bs.get(i));
            }
            Box last = t.lastBox();
            if (union.height() <= 1.3 * last.height() && union.width() <= 1.5 * last.width()) {
                t.see(union);
                return;
            }
            Blob best = bs.stream().max(Comparator.comparingDouble(b -> b.box().iou(pred))).orElseThrow();
            t.see(best);
            bs.stream().filter(b -> b != best).forEach(this::start);
            return;
        }
        if (bs.size() == 1) {
            Tracklet g = start(bs.get(0));
            for (Tracklet t : ts) {
                active.remove(t);
                if (t.isGroup()) {
                    t.ended = true;
                    for (Tracklet mm : t.members) {
                        if (mm.inGroup == t) {
                            mm.inGroup = g;
                            g.members.add(mm);
                        }
                    }
                } else {
                    t.inGroup = g;
                    g.members.add(t);
                }
            }
            return;
        }
        // several tracklets and several regions: pair them greedily by overlap
        List<int[]> pairs = new ArrayList<>();
        for (int i = 0; i < ts.size(); i++) {
            for (int j = 0; j < bs.size(); j++) {
                pairs.add(new int[] {i, j});
            }
        }
        pairs.sort(Comparator.comparingDouble((int[] p) -> -preds.get(p[0]).iou(bs.get(p[1]).box())));
        boolean[] tUsed = new boolean[ts.size()];
        boolean[] bUsed = new boolean[bs.size()];
        for (int[] p : pairs) {
            if (!tUsed[p[0]] && !bUsed[p[1]] && preds.get(p[0]).iou(bs.get(p[1]).box()) > 0) {
                tUsed[p[0]] = true;
                bUsed[p[1]] = true;
                ts.get(p[0]).see(bs.get(p[1]));
            }
        }
        for (int j = 0; j < bs.size(); j++) {
            if (!bUsed[j]) {
                start(bs.get(j));
            }
        }
    }

    /** A group region fell into several: members go to the part nearest to their own prediction. */
    private void splitGroup(int frame, Tracklet g, List<Blob> bs) {
        List<Tracklet> members = g.members.stream().filter(mm -> mm.inGroup == g).toList();
        double smallest = members.stream().mapToDouble(mm -> mm.lastBox().area()).min().orElse(0);
        List<Blob> big = new ArrayList<>(bs.stream().filter(b -> b.box().area() >= 0.3 * smallest).toList());
        if (big.size() < 2) {
            Blob union = bs.get(0);
            for (int i = 1; i < bs.size(); i++) {
                union = union.union(bs.get(i));
            }
            g.see(union);
            return;
        }
        // small pieces join the nearest big one
        for (Blob b : bs) {
            if (!big.contains(b)) {
                int near = 0;
                for (int i = 1; i < big.size(); i++) {
                    if (big.get(i).box().centreDistance(b.box()) < big.get(near).box().centreDistance(b.box())) {
                        near = i;
                    }
                }
                big.set(near, big.get(near).union(b));
            }
        }
        List<List<Tracklet>> to = new ArrayList<>();
        big.forEach(b -> to.add(new ArrayList<>()));
        Box gb = g.lastBox();
        for (Tracklet mm : members) {
            // the member's prediction, kept inside the group's last box
            Box p = mm.predict(frame, VELOCITY_SPAN);
            double cx = Math.max(gb.x(), Math.min(gb.right(), p.centreX()));
            double cy = Math.max(gb.y(), Math.min(gb.bottom(), p.centreY()));
            int near = 0;
            for (int i = 1; i < big.size(); i++) {
                if (dist(big.get(i).box(), cx, cy) < dist(big.get(near).box(), cx, cy)) {
                    near = i;
                }
            }
            to.get(near).add(mm);
        }
        g.ended = true;
        active.remove(g);
        for (int i = 0; i < big.size(); i++) {
            List<Tracklet> who = to.get(i);
            if (who.size() == 1) {
                Tracklet mm = who.get(0);
                mm.inGroup = null;
                mm.see(big.get(i));
                active.add(mm);
            } else {
                Tracklet ng = start(big.get(i));
                for (Tracklet mm : who) {
                    mm.inGroup = ng;
                    ng.members.add(mm);
                }
            }
        }
    }

    private static double dist(Box b, double x, double y) {
        return Math.hypot(b.centreX() - x, b.centreY() - y);
    }

    /** Ends what is still open at the end of the clip. */
    void finish() {
        for (Tracklet t : active) {
            t.ended = true;
        }
        active.clear();
    }
}
