package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import org.modetrail.evaluation.Annotations;
import org.modetrail.evaluation.EvaluationConfig;
import org.modetrail.evaluation.EvaluationResult;
import org.modetrail.format.csv.CsvFormatException;
import org.modetrail.format.csv.EvaluationCsv;
import org.modetrail.scoring.EvaluationReport;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code modetrail eval --truth TRUTH.csv --tracks TRACKS.csv [--iou 0.5] [--report DIR]}. */
@Command(name = "eval", mixinStandardHelpOptions = true,
        description = {"Measures tracks against a ground truth: per truth object the track of the same id (success "
                + "AUC as in Wu, Lim and Yang 2013, precision at 20 px, success at IoU 0.5, frames until the first "
                + "failure), and for all objects at once with identities matched frame by frame (CLEAR MOT's MOTA "
                + "and MOTP, identity switches, mostly tracked and mostly lost; IDF1; HOTA).",
            "Both files are in the track command's CSV layout; only track_id, frame, x, y, width and height are "
                + "needed, and the truth may carry a visible column (0 to 1): frames under 0.5 visible are left "
                + "out of the single-object figures.",
            "Two annotators of the same video are compared the same way: give one annotator's file as the truth.",
            "Exit codes: 0 done, 2 bad input (the message names the file and line)."})
public final class EvalCommand implements Callable<Integer> {
    @Option(names = "--truth", required = true, paramLabel = "TRUTH.csv", description = "the ground truth")
    Path truth;

    @Option(names = "--tracks", required = true, paramLabel = "TRACKS.csv", description = "the tracks to measure")
    Path tracks;

    @Option(names = "--iou", defaultValue = "0.5", paramLabel = "T",
            description = "IoU at which a track box and a truth box may be matched, in (0, 1]; default "
                    + "${DEFAULT-VALUE}")
    double iou;

    @Option(names = "--report", paramLabel = "DIR", description = "write figures.csv, objects.csv, figures.json, "
            + "success.png and precision.png there, instead of text on the terminal")
    Path report;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (!(iou > 0 && iou <= 1)) {
            throw new BadInputException("--iou must be above 0 and at most 1, got " + iou);
        }
        Annotations truthBoxes;
        Annotations trackBoxes;
        try {
            truthBoxes = EvaluationCsv.read(truth, "--truth");
            trackBoxes = EvaluationCsv.read(tracks, "--tracks");
        } catch (CsvFormatException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        if (truthBoxes.isEmpty()) {
            spec.commandLine().getErr().println("modetrail: " + truth + " holds no boxes: the figures that need a "
                    + "truth are n/a");
        }
        EvaluationResult r = EvaluationResult.of(truthBoxes, trackBoxes, new EvaluationConfig(iou));
        if (report == null) {
            out.print(EvaluationReport.text(r, truth, tracks));
        } else {
            List<Path> written = EvaluationReport.write(r, truth, tracks, report);
            for (Path p : written) {
                out.println("wrote " + p);
            }
        }
        out.flush();
        return ExitCodes.OK;
    }
}
