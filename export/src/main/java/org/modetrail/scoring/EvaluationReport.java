package org.modetrail.scoring;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.modetrail.evaluation.ClearMotScore;
import org.modetrail.evaluation.EvaluationResult;
import org.modetrail.evaluation.Hota;
import org.modetrail.evaluation.HotaScore;
import org.modetrail.evaluation.IdentityScore;
import org.modetrail.evaluation.SingleObjectEvaluation;
import org.modetrail.evaluation.SingleObjectScore;
import org.modetrail.format.project.AtomicWrite;
import org.modetrail.picture.Palette;
import org.modetrail.picture.PlotFormat;
import org.modetrail.picture.PlotOptions;
import org.modetrail.picture.PlotSeries;
import org.modetrail.picture.Plots;

/**
 * An evaluation's figures for people and for programs: plain text, and a folder with {@value #FIGURES_CSV} (one
 * measure a row), {@value #OBJECTS_CSV} (the single-object figures a truth object a row), {@value #FIGURES_JSON}
 * (everything, with the curves) and the success and precision plots as PNG. A figure that is not defined (MOTA
 * without truth boxes, say) is "n/a" in text and CSV and null in JSON. Every file is replaced atomically.
 */
public final class EvaluationReport {
    public static final String FIGURES_CSV = "figures.csv";
    public static final String OBJECTS_CSV = "objects.csv";
    public static final String FIGURES_JSON = "figures.json";
    public static final String SUCCESS_PNG = "success.png";
    public static final String PRECISION_PNG = "precision.png";
    /** Objects drawn one by one in the plots; with more, only the pooled curve. */
    static final int MAX_CURVES = 8;

    private EvaluationReport() {
    }

    /** One measure: its name in the files, its value, and what it is. */
    record Figure(String name, double value, String meaning, boolean count) {
        Figure(String name, double value, String meaning) {
            this(name, value, meaning, false);
        }

        Figure(String name, int value, String meaning) {
            this(name, value, meaning, true);
        }

        String formatted() {
            return count ? Long.toString((long) value) : format(value);
        }
    }

    /** The measures in the order the text, CSV and JSON give them. */
    static List<Figure> figures(EvaluationResult r) {
        ClearMotScore c = r.clearMot();
        IdentityScore i = r.identity();
        HotaScore h = r.hota();
        double[] success = r.pooledSuccessCurve();
        double auc = 0;
        for (double s : success) {
            auc += s;
        }
        boolean scored = r.framesScored() > 0;
        List<Figure> f = new ArrayList<>();
        f.add(new Figure("success_auc", scored ? auc / success.length : Double.NaN,
                "area under the success plot, all scored frames (Wu, Lim and Yang 2013)"));
        f.add(new Figure("precision_20px", scored ? r.pooledPrecisionCurve()[20] : Double.NaN,
                "fraction of scored frames with centres at most 20 px apart"));
        f.add(new Figure("success_iou50", scored ? success[10] : Double.NaN,
                "fraction of scored frames with IoU above 0.5"));
        f.add(new Figure("frames_scored", r.framesScored(), "truth frames at least half visible"));
        f.add(new Figure("mota", c.mota(), "CLEAR MOT accuracy (Bernardin and Stiefelhagen 2008)"));
        f.add(new Figure("motp", c.motp(), "mean IoU of matched boxes"));
        f.add(new Figure("id_switches", c.idSwitches(), "truth objects matched to another track than before"));
        f.add(new Figure("misses", c.misses(), "truth boxes with no match"));
        f.add(new Figure("false_positives", c.falsePositives(), "track boxes with no match"));
        f.add(new Figure("matches", c.matches(), "matched boxes"));
        f.add(new Figure("mostly_tracked", c.mostlyTracked(), "truth objects matched on 80% of their frames or more"));
        f.add(new Figure("partially_tracked", c.partiallyTracked(), "truth objects matched on 20% to 80%"));
        f.add(new Figure("mostly_lost", c.mostlyLost(), "truth objects matched on less than 20% of their frames"));
        f.add(new Figure("idf1", i.idf1(), "identity F1 (Ristani et al. 2016)"));
        f.add(new Figure("id_precision", i.idPrecision(), "IDTP / track boxes"));
        f.add(new Figure("id_recall", i.idRecall(), "IDTP / truth boxes"));
        f.add(new Figure("hota", h.hota(), "higher order tracking accuracy (Luiten et al. 2021)"));
        f.add(new Figure("deta", h.detA(), "HOTA's detection accuracy"));
        f.add(new Figure("assa", h.assA(), "HOTA's association accuracy"));
        f.add(new Figure("loca", h.locA(), "HOTA's localisation accuracy"));
        f.add(new Figure("truth_objects", r.truthObjects(), "ids in the truth"));
        f.add(new Figure("track_objects", r.trackObjects(), "ids in the tracks"));
        f.add(new Figure("truth_boxes", c.truthBoxes(), "boxes in the truth"));
        f.add(new Figure("track_boxes", c.trackBoxes(), "boxes in the tracks"));
        return f;
    }

    /** The figures as plain text for a terminal. */
    public static String text(EvaluationResult r, Path truth, Path tracks) {
        StringBuilder b = new StringBuilder();
        b.append("tracks ").append(tracks).append("\nagainst the truth ").append(truth).append(String.format(
                Locale.ROOT, "\nIoU threshold for matching: %.2f%n%n", r.config().iouThreshold()));
        for (Figure f : figures(r)) {
            b.append(String.format(Locale.ROOT, "%-18s %10s   %s%n", f.name(), f.formatted(), f.meaning()));
        }
        b.append("\nper truth object (the track with the same id):\n");
        b.append(String.format(Locale.ROOT, "%8s %8s %12s %14s %13s %16s%n", "id", "frames", "success_auc",
                "precision_20px", "success_iou50", "frames_to_fail"));
        for (SingleObjectScore s : r.singleObject()) {
            b.append(String.format(Locale.ROOT, "%8d %8d %12s %14s %13s %16d%n", s.id(), s.framesScored(),
                    format(s.successAuc()), format(s.precisionAt20()), format(s.successAt50()),
                    s.framesUntilFailure()));
        }
        return b.toString();
    }

    /** Writes the CSV, JSON and PNG files into {@code dir} (made if missing); returns the files written. */
    public static List<Path> write(EvaluationResult r, Path truth, Path tracks, Path dir) throws IOException {
        Files.createDirectories(dir);
        List<Path> written = new ArrayList<>();
        Path figures = dir.resolve(FIGURES_CSV);
        AtomicWrite.replace(figures, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            w.write("measure,value,meaning\n");
            for (Figure f : figures(r)) {
                w.write(f.name() + "," + f.formatted() + ",\"" + f.meaning().replace("\"", "\"\"") + "\"\n");
            }
            w.flush();
        });
        written.add(figures);
        Path objects = dir.resolve(OBJECTS_CSV);
        AtomicWrite.replace(objects, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            w.write("id,frames_scored,success_auc,precision_20px,success_iou50,frames_until_failure\n");
            for (SingleObjectScore s : r.singleObject()) {
                w.write(s.id() + "," + s.framesScored() + "," + format(s.successAuc()) + ","
                        + format(s.precisionAt20()) + "," + format(s.successAt50()) + "," + s.framesUntilFailure()
                        + "\n");
            }
            w.flush();
        });
        written.add(objects);
        Path json = dir.resolve(FIGURES_JSON);
        ObjectNode root = json(r, truth, tracks);
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        AtomicWrite.replace(json, out -> mapper.writeValue(new NonClosing(out), root));
        written.add(json);
        PlotOptions o = new PlotOptions(PlotOptions.DEFAULT_WIDTH, PlotOptions.DEFAULT_HEIGHT, null,
                PlotOptions.DEFAULT_MARKERS);
        Path success = dir.resolve(SUCCESS_PNG);
        Plots.writeCurves(curves(r, true), "Success plot", "IoU threshold", "fraction of frames above it", 0, 1, 0,
                1.02, o, PlotFormat.PNG, success);
        written.add(success);
        Path precision = dir.resolve(PRECISION_PNG);
        Plots.writeCurves(curves(r, false), "Precision plot", "centre error threshold (px)",
                "fraction of frames within it", 0, SingleObjectEvaluation.PRECISION_POINTS - 1, 0, 1.02, o,
                PlotFormat.PNG, precision);
        written.add(precision);
        return written;
    }

    /** The pooled curve, with each object's own when there are few, labelled with their figure. */
    static List<PlotSeries> curves(EvaluationResult r, boolean success) {
        List<PlotSeries> out = new ArrayList<>();
        if (r.framesScored() == 0) {
            return out;
        }
        double[] xs = success ? successThresholds() : precisionThresholds();
        double[] pooled = success ? r.pooledSuccessCurve() : r.pooledPrecisionCurve();
        out.add(new PlotSeries(0, "all objects " + label(pooled, success), 0x000000, xs, xs, pooled));
        if (r.singleObject().size() > 1 && r.singleObject().size() <= MAX_CURVES) {
            int k = 0;
            for (SingleObjectScore s : r.singleObject()) {
                if (s.framesScored() == 0) {
                    continue;
                }
                double[] y = success ? s.successCurve() : s.precisionCurve();
                out.add(new PlotSeries(s.id(), "object " + s.id() + " " + label(y, success), Palette.colour(k++), xs,
                        xs, y));
            }
        }
        return out;
    }

    private static String label(double[] curve, boolean success) {
        if (success) {
            double auc = 0;
            for (double v : curve) {
                auc += v;
            }
            return String.format(Locale.ROOT, "[AUC %.3f]", auc / curve.length);
        }
        return String.format(Locale.ROOT, "[at 20 px %.3f]", curve[20]);
    }

    private static double[] successThresholds() {
        double[] t = new double[SingleObjectEvaluation.SUCCESS_POINTS];
        for (int i = 0; i < t.length; i++) {
            t[i] = i / 20.0;
        }
        return t;
    }

    private static double[] precisionThresholds() {
        double[] t = new double[SingleObjectEvaluation.PRECISION_POINTS];
        for (int i = 0; i < t.length; i++) {
            t[i] = i;
        }
        return t;
    }

    private static ObjectNode json(EvaluationResult r, Path truth, Path tracks) {
        ObjectMapper m = new ObjectMapper();
        ObjectNode root = m.createObjectNode();
        root.put("truth", truth.toString());
        root.put("tracks", tracks.toString());
        root.put("iou_threshold", r.config().iouThreshold());
        ObjectNode figures = root.putObject("figures");
        for (Figure f : figures(r)) {
            if (f.count()) {
                figures.put(f.name(), (long) f.value());
            } else {
                put(figures, f.name(), f.value());
            }
        }
        ArrayNode objects = root.putArray("objects");
        for (SingleObjectScore s : r.singleObject()) {
            ObjectNode o = objects.addObject();
            o.put("id", s.id());
            o.put("frames_scored", s.framesScored());
            put(o, "success_auc", s.successAuc());
            put(o, "precision_20px", s.precisionAt20());
            put(o, "success_iou50", s.successAt50());
            o.put("frames_until_failure", s.framesUntilFailure());
            array(o.putArray("success_curve"), s.successCurve());
            array(o.putArray("precision_curve"), s.precisionCurve());
        }
        ObjectNode curves = root.putObject("curves");
        array(curves.putArray("success_thresholds"), successThresholds());
        array(curves.putArray("success_all_objects"), r.pooledSuccessCurve());
        array(curves.putArray("precision_thresholds_px"), precisionThresholds());
        array(curves.putArray("precision_all_objects"), r.pooledPrecisionCurve());
        ObjectNode hota = root.putObject("hota_by_alpha");
        double[] alphas = new double[Hota.ALPHAS];
        for (int i = 0; i < alphas.length; i++) {
            alphas[i] = Hota.alpha(i);
        }
        array(hota.putArray("alpha"), alphas);
        array(hota.putArray("hota"), r.hota().hotaByAlpha());
        array(hota.putArray("deta"), r.hota().detAByAlpha());
        array(hota.putArray("assa"), r.hota().assAByAlpha());
        return root;
    }

    private static void put(ObjectNode o, String name, double v) {
        if (Double.isNaN(v)) {
            o.putNull(name);
        } else {
            o.put(name, v);
        }
    }

    private static void array(ArrayNode a, double[] values) {
        for (double v : values) {
            if (Double.isNaN(v)) {
                a.addNull();
            } else {
                a.add(v);
            }
        }
    }

    /** A fraction as the text and CSV give it: 4 decimals, "n/a" when undefined. */
    static String format(double v) {
        return Double.isNaN(v) ? "n/a" : String.format(Locale.ROOT, "%.4f", v);
    }

    /** Jackson closes the stream it writes to; the atomic writer closes it itself. */
    private static final class NonClosing extends java.io.FilterOutputStream {
        NonClosing(java.io.OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }

    static Map<String, Double> figureMap(EvaluationResult r) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (Figure f : figures(r)) {
            m.put(f.name(), f.value());
        }
        return m;
    }
}
