package org.modetrail.groundtruth;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.NavigableMap;
import java.util.TreeMap;

import org.modetrail.model.Box;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Makes the ground truth of every pedestrian of vtest.avi who is in view for {@value #MIN_FRAMES} frames or more:
 * a median background ({@link MedianBackground}), foreground regions ({@link ForegroundBlobs}), regions linked into
 * tracklets ({@link BlobLinker}), tracklets turned into persons, then the hand corrections of
 * {@link VtestCorrections}. Independent of Modetrail's tracker: only Modetrail's video reader is used, so frame
 * numbers are Modetrail's.
 *
 * <p>Regenerate the committed truth (from the repository root):
 * <pre>
 * mvn -B -q -o -pl tests -am test-compile
 * mvn -B -q -o -pl tests exec:java -Dexec.mainClass=org.modetrail.groundtruth.VtestTruth -Dexec.classpathScope=test \
 *     -Dexec.args="--video PATH/vtest.avi --csv tests/src/test/resources/org/modetrail/vtest/vtest-truth.csv --sheets tests/target/vtest-sheets"
 * </pre>
 * {@code --sheets DIR} also writes the contact sheets; {@code --raw} writes the automatic pass without corrections.
 */
public final class VtestTruth {
    static final int MIN_FRAMES = 50;
    static final int BACKGROUND_STEP = 3;
    /** The longest gap in a person's measured boxes that the automatic pass bridges by interpolation. */
    static final int MAX_AUTO_GAP = 12;
    /** A box this close to the frame's border (px) is taken to be cut by it. */
    static final int EDGE = 3;
    static final String HEADER = "track_id,frame,x,y,width,height,visible";

    /** The automatic pass: tracklets of the clip, plus its size. */
    record Pass(List<Tracklet> tracklets, int width, int height, int frames) {
    }

    /** One person of the truth: id and per frame its box and visible fraction. */
    record TruthTrack(int id, NavigableMap<Integer, Box> boxes, NavigableMap<Integer, Double> visible,
                      NavigableMap<Integer, Character> source) {
    }

    private VtestTruth() {
    }

    static Pass automatic(Path video, Path indexCache) throws VideoException {
        try (VideoSource src = VideoSource.open(video, VideoOptions.defaults().withIndexCacheDir(indexCache))) {
            int w = src.info().width();
            int h = src.info().height();
            int n = src.frameCount();
            int[] bg = MedianBackground.of(src, 0, n, BACKGROUND_STEP);
            ForegroundBlobs fb = new ForegroundBlobs(ForegroundBlobs.Config.defaults(), w, h);
            BlobLinker linker = new BlobLinker();
            src.read(0, n, frame -> {
                linker.add(frame.index(), fb.find(frame.index(), frame.rgb(), bg));
                return true;
            });
            linker.finish();
            return new Pass(linker.tracklets(), w, h, n);
        }
    }

    /** Persons from the tracklets (one per tracklet that is not a group), then the corrections in order. */
    static List<Person> assemble(Pass pass, List<Correction> table) {
        List<Person> persons = new ArrayList<>();
        Map<Tracklet, Person> byTracklet = new java.util.HashMap<>();
        for (Tracklet t : pass.tracklets()) {
            if (t.isGroup()) {
                continue;
            }
            Person p = new Person(t.id);
            p.measured.putAll(t.seen);
            p.blobs.putAll(t.blobs);
            p.origin.append("T").append(t.id);
            persons.add(p);
            byTracklet.put(t, p);
        }
        for (Tracklet g : pass.tracklets()) {
            if (g.isGroup()) {
                splitGroup(g, byTracklet);
            }
        }
        int created = 10_000;
        for (Person p : new ArrayList<>(persons)) {
            // a life with a long unmeasured gap is two lives until a hand join says otherwise: a tracklet that
            // came back out of a group long after it went in is as often someone else
            Integer prev = null;
            Person cur = p;
            for (int f : new ArrayList<>(p.measured.keySet())) {
                if (prev != null && f - prev > MAX_AUTO_GAP) {
                    Person q = new Person(created++);
                    q.origin.append(p.origin).append("@").append(f);
                    q.measured.putAll(p.measured.tailMap(f, true));
                    q.blobs.putAll(p.blobs.tailMap(f, true));
                    q.split.addAll(p.split.tailSet(f, true));
                    cur.measured.tailMap(f, true).clear();
                    cur.blobs.tailMap(f, true).clear();
                    persons.add(q);
                    cur = q;
                }
                prev = f;
            }
        }
        persons.removeIf(Person::isEmpty);
        for (Correction c : table) {
            if (c instanceof Correction.Drop d) {
                persons.remove(find(persons, d.who(), c));
            } else if (c instanceof Correction.Join j) {
                Person a = find(persons, j.first(), c);
                Person b = find(persons, j.second(), c);
                if (a == b) {
                    throw new IllegalArgumentException(c + ": both picks name " + a);
                }
                a.measured.putAll(b.measured);
                a.keys.putAll(b.keys);
                a.cut.addAll(b.cut);
                a.blobs.putAll(b.blobs);
                a.split.addAll(b.split);
                a.visible.putAll(b.visible);
                a.origin.append("+").append(b.origin);
                persons.remove(b);
            } else if (c instanceof Correction.Cut k) {
                Person p = find(persons, k.who(), c);
                for (int f = k.from(); f <= k.to(); f++) {
                    p.cut.add(f);
                }
            } else if (c instanceof Correction.Key k) {
                find(persons, k.who(), c).keys.put(k.frame(), k.box());
            } else if (c instanceof Correction.Create k) {
                Person p = new Person(created++);
                p.keys.put(k.frame(), k.box());
                p.origin.append("hand");
                persons.add(p);
            } else if (c instanceof Correction.Limit l) {
                Person p = find(persons, l.who(), c);
                for (var m : List.of(p.measured, p.keys, p.blobs)) {
                    m.headMap(l.first(), false).clear();
                    m.tailMap(l.last(), false).clear();
                }
            } else if (c instanceof Correction.Visible v) {
                Person p = find(persons, v.who(), c);
                for (int f = v.from(); f <= v.to(); f++) {
                    p.visible.put(f, v.fraction());
                }
            } else if (c instanceof Correction.Crowd cr) {
                Person p = find(persons, cr.who(), c);
                List<Person> parts = new ArrayList<>(List.of(p));
                for (int i = 1; i < cr.count(); i++) {
                    Person q = new Person(created++);
                    q.origin.append(p.origin).append("/").append(i);
                    parts.add(q);
                    persons.add(q);
                }
                double[] widths = new double[cr.count()];
                for (int f = cr.from(); f <= cr.to(); f++) {
                    Blob b = p.blobs.get(f);
                    if (b == null) {
                        continue;
                    }
                    java.util.Arrays.fill(widths, (double) b.width() / cr.count());
                    Box[] boxes = GroupSplit.split(b, widths);
                    p.measured.remove(f);
                    p.blobs.remove(f);
                    if (boxes != null) {
                        for (int i = 0; i < boxes.length; i++) {
                            parts.get(i).measured.put(f, boxes[i]);
                            parts.get(i).split.add(f);
                        }
                    }
                }
            } else if (c instanceof Correction.Split s) {
                Person p = find(persons, s.who(), c);
                Person q = new Person(created++);
                q.origin.append(p.origin).append("@").append(s.frame());
                q.measured.putAll(p.measured.tailMap(s.frame(), true));
                q.keys.putAll(p.keys.tailMap(s.frame(), true));
                q.cut.addAll(p.cut.tailSet(s.frame(), true));
                q.blobs.putAll(p.blobs.tailMap(s.frame(), true));
                q.split.addAll(p.split.tailSet(s.frame(), true));
                p.blobs.tailMap(s.frame(), true).clear();
                q.visible.putAll(p.visible.tailMap(s.frame(), true));
                p.measured.tailMap(s.frame(), true).clear();
                p.keys.tailMap(s.frame(), true).clear();
                persons.add(q);
            }
            persons.removeIf(Person::isEmpty);
        }
        return persons;
    }

    /** Gives the members of a group a box on each frame of the group where the region parts by columns. */
    private static void splitGroup(Tracklet g, Map<Tracklet, Person> byTracklet) {
        for (Map.Entry<Integer, List<Tracklet>> e : g.membersAt.entrySet()) {
            int f = e.getKey();
            List<Tracklet> ms = new ArrayList<>(e.getValue());
            if (ms.size() < 2) {
                continue;
            }
            Map<Tracklet, Double> at = new java.util.HashMap<>();
            for (Tracklet m : ms) {
                var before = m.seen.headMap(f, false);
                if (before.isEmpty()) {
                    at.put(m, g.seen.get(f).centreX());
                    continue;
                }
                int last = before.lastKey();
                var from = before.ceilingEntry(last - BlobLinker.VELOCITY_SPAN);
                double v = last == from.getKey() ? 0
                        : (before.get(last).centreX() - from.getValue().centreX()) / (last - from.getKey());
                at.put(m, before.get(last).centreX() + v * (f - last));
            }
            ms.sort(Comparator.comparingDouble(at::get));
            double[] widths = new double[ms.size()];
            for (int i = 0; i < ms.size(); i++) {
                var before = ms.get(i).seen.headMap(f, false);
                widths[i] = before.isEmpty() ? g.seen.get(f).width() / ms.size() : before.lastEntry().getValue().width();
            }
            Box[] parts = GroupSplit.split(g.blobs.get(f), widths);
            if (parts == null) {
                continue;
            }
            for (int i = 0; i < ms.size(); i++) {
                Person p = byTracklet.get(ms.get(i));
                if (p != null && !p.measured.containsKey(f)) {
                    p.measured.put(f, parts[i]);
                    p.split.add(f);
                }
            }
        }
    }

    /** The person whose box on the pick's frame holds the point (the smallest such box when several do). */
    static Person find(List<Person> persons, Correction.Pick pick, Correction c) {
        Person best = null;
        double bestArea = Double.MAX_VALUE;
        for (Person p : persons) {
            if (p.isEmpty() || pick.frame() < p.first() || pick.frame() > p.last()) {
                continue;
            }
            Box b = p.boxes().get(pick.frame());
            if (b != null && pick.x() >= b.x() && pick.x() <= b.right() && pick.y() >= b.y() && pick.y() <= b.bottom()
                    && b.area() < bestArea) {
                best = p;
                bestArea = b.area();
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("correction " + c + ": no person's box holds " + pick);
        }
        return best;
    }

    /**
     * The truth tracks: persons in view for {@value #MIN_FRAMES} frames or more, numbered from 1 by first frame,
     * boxes clipped to the frame, visible fraction from the hand table or, at the frame's edge, the clipped box's
     * area over the area of the person's nearest whole box.
     */
    static List<TruthTrack> truth(List<Person> persons, int width, int height) {
        List<Person> kept = new ArrayList<>(persons.stream().filter(p -> p.last() - p.first() + 1 >= MIN_FRAMES)
                .toList());
        kept.sort(Comparator.comparingInt(Person::first).thenComparingDouble(p -> p.boxes().firstEntry().getValue().x()));
        List<TruthTrack> out = new ArrayList<>();
        int id = 1;
        for (Person p : kept) {
            NavigableMap<Integer, Box> raw = p.boxes();
            NavigableMap<Integer, Box> boxes = new TreeMap<>();
            NavigableMap<Integer, Double> vis = new TreeMap<>();
            NavigableMap<Integer, Character> src = new TreeMap<>();
            NavigableMap<Integer, Box> whole = new TreeMap<>();
            for (Map.Entry<Integer, Box> e : raw.entrySet()) {
                Box b = round(clip(e.getValue(), width, height));
                boxes.put(e.getKey(), b);
                if (!touches(b, width, height)) {
                    whole.put(e.getKey(), b);
                }
                src.put(e.getKey(), p.keys.containsKey(e.getKey()) ? 'K' : p.interpolated(e.getKey()) ? 'I'
                        : p.split.contains(e.getKey()) ? 'S' : 'M');
            }
            for (Map.Entry<Integer, Box> e : boxes.entrySet()) {
                int f = e.getKey();
                double v = 1;
                if (p.visible.containsKey(f)) {
                    v = p.visible.get(f);
                } else if (touches(e.getValue(), width, height) && !whole.isEmpty()) {
                    Integer lo = whole.floorKey(f);
                    Integer hi = whole.ceilingKey(f);
                    int near = lo == null ? hi : hi == null ? lo : (f - lo <= hi - f ? lo : hi);
                    v = Math.min(1, e.getValue().area() / whole.get(near).area());
                }
                vis.put(f, Math.round(v * 100) / 100.0);
            }
            out.add(new TruthTrack(id++, boxes, vis, src));
        }
        return out;
    }

    static boolean touches(Box b, int width, int height) {
        return b.x() <= EDGE || b.y() <= EDGE || b.right() >= width - EDGE || b.bottom() >= height - EDGE;
    }

    static Box clip(Box b, int width, int height) {
        double x0 = Math.max(0, b.x());
        double y0 = Math.max(0, b.y());
        double x1 = Math.min(width, b.right());
        double y1 = Math.min(height, b.bottom());
        return new Box(x0, y0, Math.max(1, x1 - x0), Math.max(1, y1 - y0));
    }

    /** Whole pixels: the truth is no finer than that. */
    static Box round(Box b) {
        double x0 = Math.round(b.x());
        double y0 = Math.round(b.y());
        return new Box(x0, y0, Math.max(1, Math.round(b.right()) - x0), Math.max(1, Math.round(b.bottom()) - y0));
    }

    static String csv(List<TruthTrack> tracks) {
        StringBuilder sb = new StringBuilder(HEADER).append('\n');
        for (TruthTrack t : tracks) {
            for (Map.Entry<Integer, Box> e : t.boxes().entrySet()) {
                Box b = e.getValue();
                sb.append(String.format(Locale.ROOT, "%d,%d,%d,%d,%d,%d,%.2f%n", t.id(), e.getKey(), (int) b.x(),
                        (int) b.y(), (int) b.width(), (int) b.height(), t.visible().get(e.getKey())));
            }
        }
        return sb.toString();
    }

    /** The whole method: automatic pass, corrections, truth tracks. */
    static List<TruthTrack> make(Path video, Path indexCache, List<Correction> table) throws VideoException {
        Pass pass = automatic(video, indexCache);
        return truth(assemble(pass, table), pass.width(), pass.height());
    }

    public static void main(String[] args) throws Exception {
        Path video = null;
        Path csv = null;
        Path sheets = null;
        boolean raw = false;
        List<Correction.Pick> show = new ArrayList<>();
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--video" -> video = Path.of(args[++i]);
                case "--csv" -> csv = Path.of(args[++i]);
                case "--sheets" -> sheets = Path.of(args[++i]);
                case "--raw" -> raw = true;
                case "--show" -> {
                    String[] v = args[++i].split(",");
                    show.add(new Correction.Pick(Integer.parseInt(v[0]), Integer.parseInt(v[1]),
                            Integer.parseInt(v[2])));
                }
                default -> throw new IllegalArgumentException("unknown argument " + args[i]
                        + "; use --video FILE [--csv FILE] [--sheets DIR] [--raw]");
            }
        }
        if (video == null) {
            throw new IllegalArgumentException("--video FILE is needed (vtest.avi from Debian's opencv-doc)");
        }
        Path cache = Files.createTempDirectory("vtest-truth-index");
        Pass pass = automatic(video, cache);
        List<Person> persons = assemble(pass, raw ? List.of() : VtestCorrections.TABLE);
        List<TruthTrack> tracks = truth(persons, pass.width(), pass.height());
        int rows = tracks.stream().mapToInt(t -> t.boxes().size()).sum();
        System.out.println(pass.tracklets().size() + " tracklets, " + persons.size() + " persons, " + tracks.size()
                + " in view for " + MIN_FRAMES + "+ frames, " + rows + " rows");
        for (Correction.Pick pick : show) {
            Person p = find(persons, pick, null);
            StringBuilder sb = new StringBuilder(p + ":");
            p.boxes().forEach((f, b) -> sb.append(String.format(Locale.ROOT, "%n  %d %c %.0f,%.0f %.0fx%.0f", f,
                    p.keys.containsKey(f) ? 'K' : p.interpolated(f) ? 'I' : p.split.contains(f) ? 'S' : 'M', b.x(),
                    b.y(), b.width(), b.height())));
            System.out.println(sb);
        }
        if (csv != null) {
            Files.createDirectories(csv.toAbsolutePath().getParent());
            Files.writeString(csv, csv(tracks), StandardCharsets.UTF_8);
        }
        if (sheets != null) {
            ContactSheets.write(video, cache, sheets, tracks, persons, pass);
        }
    }

    static void writeString(Path p, String s) throws IOException {
        Files.writeString(p, s, StandardCharsets.UTF_8);
    }
}
