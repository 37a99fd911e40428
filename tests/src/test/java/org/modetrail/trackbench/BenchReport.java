package org.modetrail.trackbench;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.zip.CRC32;

import org.modetrail.testsupport.RefData;

/**
 * The benchmark report: every tracker on every object of the clip set's clips (generated, encoded as H.264 and
 * decoded) and of the real footage (vtest.avi with the team's truth, when there), per kind: mean and worst-seed
 * success AUC, precision at 20 px, frames to the first failure and the share of tracks that end or balloon, false
 * re-acquisitions, the simulated annotator's keyframes per 1000 frames, and ms per frame beside decoding (see
 * {@link BenchReportWriter#DEFINITIONS}). Writes {@value #REPORT}, {@value #FIGURES} (one line per kind and
 * tracker), {@value #OBJECTS} (one line per object run) and a success plot per kind.
 *
 * <pre>
 * mvn -B -q -pl tests verify -P bench-report -Dbench.out=$PWD/bench-report [-Dbench.mode="--quick ..."]
 * </pre>
 * Options: {@code --seeds tuning|report} (default report), {@code --quick} (CI: {@value #QUICK_SEEDS} seeds per kind,
 * the first {@value #QUICK_FRAMES} frames, Modetrail and the fast peers), {@code --trackers a,b,...}
 * ({@link PeerTrackers#keys()}), {@code --clips auto|family|scenarios}, {@code --threads N} (default 2),
 * {@code --frames N}, {@code --seeds-per-kind N} (the first N of
 * the split's seeds of each kind), {@code --vtest-truth FILE}, {@code --fresh}. Each clip's runs are kept under
 * {@code OUT/runs/} as they finish; a second run with the same options reuses them (so a long run can be stopped
 * and resumed) unless {@code --fresh}.
 */
public final class BenchReport {
    static final String REPORT = "report.md";
    static final String FIGURES = "figures.csv";
    static final String OBJECTS = "objects.csv";
    static final String VTEST = "vtest";
    static final int QUICK_SEEDS = 2;
    static final int QUICK_FRAMES = 100;
    static final int QUICK_VTEST_FRAMES = 150;

    private BenchReport() {
    }

    /** The command line, checked. */
    record Options(Path out, boolean quick, ClipSet.Split split, List<String> trackers, String clips,
                   Optional<Path> vtestTruth, int threads, int frames, boolean fresh, int seedsPerKind) {

        static Options parse(String[] args) {
            Path out = null;
            boolean quick = false;
            ClipSet.Split split = ClipSet.Split.REPORT;
            String trackers = null;
            String clips = "auto";
            Path truth = null;
            int threads = 2;
            int frames = -1;
            boolean fresh = false;
            int perKind = -1;
            for (int i = 0; i < args.length; i++) {
                String a = args[i];
                if (a.isBlank()) {
                    continue;
                }
                switch (a) {
                    case "--out" -> out = Path.of(value(args, ++i, a));
                    case "--quick" -> quick = true;
                    case "--fresh" -> fresh = true;
                    case "--seeds" -> {
                        String v = value(args, ++i, a);
                        split = switch (v) {
                            case "tuning" -> ClipSet.Split.TUNING;
                            case "report" -> ClipSet.Split.REPORT;
                            default -> throw new IllegalArgumentException("--seeds takes tuning or report, got '"
                                    + v + "'");
                        };
                    }
                    case "--trackers" -> trackers = value(args, ++i, a);
                    case "--clips" -> clips = value(args, ++i, a);
                    case "--vtest-truth" -> truth = Path.of(value(args, ++i, a));
                    case "--threads" -> threads = positive(value(args, ++i, a), a);
                    case "--frames" -> frames = positive(value(args, ++i, a), a);
                    case "--seeds-per-kind" -> perKind = positive(value(args, ++i, a), a);
                    default -> throw new IllegalArgumentException("unknown argument '" + a + "'; the arguments are "
                            + "--out DIR [--quick] [--seeds tuning|report] [--trackers a,b,...] "
                            + "[--clips auto|family|scenarios] [--threads N] [--frames N] [--seeds-per-kind N] "
                            + "[--vtest-truth FILE] "
                            + "[--fresh]");
                }
            }
            if (out == null) {
                throw new IllegalArgumentException("give the report's folder with --out DIR");
            }
            List<String> keys = trackers != null ? PeerTrackers.parse(trackers)
                    : quick ? PeerTrackers.quickKeys() : PeerTrackers.keys();
            return new Options(out, quick, split, keys, clips, Optional.ofNullable(truth), threads,
                    frames > 0 ? frames : quick ? QUICK_FRAMES : Integer.MAX_VALUE, fresh,
                    perKind > 0 ? perKind : quick ? QUICK_SEEDS : Integer.MAX_VALUE);
        }

        private static String value(String[] args, int i, String option) {
            if (i >= args.length) {
                throw new IllegalArgumentException(option + " needs a value");
            }
            return args[i];
        }

        private static int positive(String v, String option) {
            try {
                int n = Integer.parseInt(v);
                if (n > 0) {
                    return n;
                }
            } catch (NumberFormatException e) {
                // below
            }
            throw new IllegalArgumentException(option + " takes a whole number above 0, got '" + v + "'");
        }

        int vtestFrames() {
            return frames != Integer.MAX_VALUE ? Math.max(frames, quick ? QUICK_VTEST_FRAMES : frames)
                    : Integer.MAX_VALUE;
        }
    }

    /** One clip to run: its group (kind or vtest), seed, and how to get its frames and truth. */
    private record Job(String group, long seed, String cacheName, ClipWork work) {
    }

    private interface ClipWork {
        List<ObjectFigures> run(List<String> trackers, Path scratch) throws Exception;
    }

    public static void main(String[] args) throws Exception {
        Options o = Options.parse(args);
        run(o);
        System.out.println("wrote " + o.out().resolve(REPORT));
    }

    static void run(Options o) throws Exception {
        long t0 = System.nanoTime();
        ClipSet set = ClipSets.named(o.clips());
        Files.createDirectories(o.out());
        String setTag = (set instanceof ScenarioClipSet ? "scenarios" : "family") + "-"
                + o.split().name().toLowerCase(Locale.ROOT) + "-" + (o.frames() == Integer.MAX_VALUE ? "all"
                        : o.frames() + "f");
        Path runs = o.out().resolve("runs").resolve(setTag);
        Files.createDirectories(runs);
        List<Job> jobs = new ArrayList<>();
        List<String> groups = new ArrayList<>();
        int seedsPerKind = 0;
        for (String kind : set.kinds()) {
            groups.add(kind);
            long[] seeds = set.seeds(kind, o.split());
            int n = Math.min(o.seedsPerKind(), seeds.length);
            seedsPerKind = Math.max(seedsPerKind, n);
            for (int i = 0; i < n; i++) {
                long seed = seeds[i];
                jobs.add(new Job(kind, seed, kind + "-s" + seed, (trackers, scratch) -> {
                    MultiClip clip = set.clip(kind, seed);
                    DecodedVideo video = DecodedVideo.encodeAndDecode(clip, o.frames(), set.crf(kind, seed),
                            scratch);
                    return ClipBench.run(kind, seed, video, BenchClips.objects(clip, video.frameCount()),
                            trackers);
                }));
            }
        }
        String realNote = realFootage(o, jobs, groups);

        warmUp(o.trackers());
        List<ObjectFigures> rows = runAll(jobs, o, runs);
        List<String> rowTrackers = new ArrayList<>(o.trackers());
        rowTrackers.add(ClipBench.INTERPOLATION);
        List<BenchSummary> summaries = BenchSummary.of(rows, groups, rowTrackers);
        Duration took = Duration.ofNanos(System.nanoTime() - t0);
        String heading = String.format(Locale.ROOT, "%s run on %s, %s seeds (%d per kind), %s; trackers: %s. "
                        + "%s %s on %d cores, %d clips at a time; took %d min %d s.", o.quick() ? "Quick" : "Full",
                set.name(), o.split().name().toLowerCase(Locale.ROOT), seedsPerKind,
                o.frames() == Integer.MAX_VALUE ? "every frame" : "the first " + o.frames() + " frames of each clip",
                String.join(", ", o.trackers().stream().map(PeerTrackers::label).toList()),
                System.getProperty("java.vm.name"), System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors(), o.threads(), took.toMinutes(), took.toSecondsPart());
        BenchReportWriter.writeObjects(rows, o.out().resolve(OBJECTS));
        BenchReportWriter.writeFigures(summaries, o.out().resolve(FIGURES));
        BenchReportWriter.writeReport(o.out(), heading, summaries, groups, rowTrackers, realNote);
    }

    /** Adds the real footage's job when its truth and vtest.avi are there; says why not otherwise. */
    private static String realFootage(Options o, List<Job> jobs, List<String> groups) throws IOException {
        Path truth = o.vtestTruth().orElse(null);
        if (truth == null) {
            URL url = BenchReport.class.getResource(BenchClips.VTEST_TRUTH_RESOURCE);
            if (url == null) {
                String note = "Real footage (vtest.avi): rows missing, there is no truth file "
                        + "tests/src/test/resources" + BenchClips.VTEST_TRUTH_RESOURCE + " yet.";
                System.out.println(note);
                return note;
            }
            try {
                truth = Path.of(url.toURI());
            } catch (URISyntaxException e) {
                throw new IOException(e);
            }
        }
        Optional<Path> vtest = RefData.vtestIfPresent();
        if (vtest.isEmpty()) {
            String note = "Real footage (vtest.avi): rows missing, vtest.avi was not found (set "
                    + RefData.VTEST_ENV + ").";
            System.out.println(note);
            return note;
        }
        Path truthFile = truth;
        byte[] bytes = Files.readAllBytes(truthFile);
        CRC32 crc = new CRC32();
        crc.update(bytes);
        int frames = o.vtestFrames();
        groups.add(VTEST);
        jobs.add(new Job(VTEST, 0, String.format(Locale.ROOT, "vtest-%08x", crc.getValue()), (trackers, scratch) -> {
            DecodedVideo video = DecodedVideo.decode(vtest.get(), frames, scratch);
            return ClipBench.run(VTEST, 0, video, BenchClips.objects(truthFile, video.frameCount()), trackers);
        }));
        return "Real footage: vtest.avi (Debian's opencv-doc, 768x576), every pedestrian of the truth file "
                + truthFile.getFileName() + (frames == Integer.MAX_VALUE ? "" : ", first " + frames + " frames")
                + "; started on the first frame on which each is at least half visible; a frame without a row for a "
                + "pedestrian counts as out of view.";
    }

    /** Every tracker once over a short clip, so the first measured clip does not pay for the JIT. Not reported. */
    private static void warmUp(List<String> trackers) throws Exception {
        Path scratch = Files.createTempDirectory("modetrail-bench-warmup");
        try {
            ScenarioClipSet set = new ScenarioClipSet();
            MultiClip clip = set.clip(set.kinds().get(0), 1);
            DecodedVideo video = DecodedVideo.encodeAndDecode(clip, 40, set.crf(set.kinds().get(0), 1), scratch);
            ClipBench.run("warm-up", 1, video, BenchClips.objects(clip, video.frameCount()), trackers);
        } finally {
            delete(scratch);
        }
    }

    private static List<ObjectFigures> runAll(List<Job> jobs, Options o, Path runs) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(o.threads());
        AtomicInteger done = new AtomicInteger();
        List<Future<List<ObjectFigures>>> futures = new ArrayList<>();
        try {
            for (Job job : jobs) {
                futures.add(pool.submit(() -> {
                    long t0 = System.nanoTime();
                    Path cache = runs.resolve(job.cacheName() + ".csv");
                    List<ObjectFigures> have = o.fresh() ? List.of() : read(cache);
                    List<String> missing = o.trackers().stream()
                            .filter(t -> have.stream().noneMatch(r -> r.tracker().equals(t))).toList();
                    List<ObjectFigures> rows = new ArrayList<>(have);
                    if (!missing.isEmpty() || have.isEmpty()) {
                        Path scratch = Files.createTempDirectory("modetrail-bench");
                        try {
                            List<ObjectFigures> fresh = job.work().run(missing, scratch);
                            rows.removeIf(r -> r.tracker().equals(ClipBench.INTERPOLATION));
                            rows.addAll(fresh);
                        } finally {
                            delete(scratch);
                        }
                        write(cache, rows);
                    }
                    System.out.printf(Locale.ROOT, "[%d/%d] %s: %.1f s%s%n", done.incrementAndGet(), jobs.size(),
                            job.cacheName(), (System.nanoTime() - t0) / 1e9, aucLine(rows, o.trackers()));
                    return rows.stream().filter(r -> o.trackers().contains(r.tracker())
                            || r.tracker().equals(ClipBench.INTERPOLATION)).toList();
                }));
            }
            List<ObjectFigures> all = new ArrayList<>();
            for (Future<List<ObjectFigures>> f : futures) {
                all.addAll(f.get());
            }
            return all;
        } finally {
            pool.shutdownNow();
        }
    }

    private static String aucLine(List<ObjectFigures> rows, List<String> trackers) {
        StringBuilder sb = new StringBuilder("; AUC");
        for (String t : trackers) {
            double m = rows.stream().filter(r -> r.tracker().equals(t) && r.scored() > 0)
                    .mapToDouble(ObjectFigures::auc).average().orElse(Double.NaN);
            sb.append(String.format(Locale.ROOT, " %s %.2f", t, m));
        }
        return sb.toString();
    }

    private static List<ObjectFigures> read(Path cache) {
        if (!Files.isRegularFile(cache)) {
            return List.of();
        }
        try {
            List<String> lines = Files.readAllLines(cache, StandardCharsets.UTF_8);
            if (lines.isEmpty() || !lines.get(0).equals(ObjectFigures.HEADER)) {
                return List.of();
            }
            return lines.stream().skip(1).filter(l -> !l.isBlank()).map(ObjectFigures::parse).toList();
        } catch (IOException | RuntimeException e) {
            System.out.println("ignoring unreadable " + cache + ": " + e.getMessage());
            return List.of();
        }
    }

    /** Written under a temporary name and moved into place, so a stopped run leaves no half file. */
    private static void write(Path cache, List<ObjectFigures> rows) throws IOException {
        StringBuilder sb = new StringBuilder(ObjectFigures.HEADER).append('\n');
        rows.forEach(r -> sb.append(r.csv()).append('\n'));
        Path tmp = Files.createTempFile(cache.getParent(), "." + cache.getFileName(), ".part");
        Files.writeString(tmp, sb, StandardCharsets.UTF_8);
        Files.move(tmp, cache, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    private static void delete(Path dir) throws IOException {
        try (var files = Files.walk(dir)) {
            files.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        }
    }
}
