package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;

import org.modetrail.format.ImportException;
import org.modetrail.format.ImportLimits;
import org.modetrail.format.TracksFormat;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code modetrail import FILE --format csv|coco|mot --project PROJECT.json [--video VIDEO] [--class NAME]}: reads
 * tracks (earlier work, another tool's detections) into a project, a new one for VIDEO or an existing one.
 */
@Command(name = "import", mixinStandardHelpOptions = true,
        description = {"Reads tracks from CSV (the track command's layout), COCO-style JSON or MOTChallenge text "
                + "into a project. Into an existing project the tracks are added (renumbered after its own when "
                + "their ids are taken); a new project needs --video.",
            "Every problem in the file is reported with its line (and for JSON its column and place) and nothing "
                + "is written."})
public final class ImportCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "FILE", description = "the tracks to read")
    Path file;

    @Option(names = "--format", required = true, paramLabel = "csv|coco|mot", description = "the file's format")
    String format;

    @Option(names = "--project", required = true, paramLabel = "PROJECT.json",
            description = "the project to add the tracks to, or to create")
    Path projectFile;

    @Option(names = "--video", paramLabel = "VIDEO", description = "the video, when the project is new")
    Path video;

    @Option(names = "--class", paramLabel = "NAME", defaultValue = "object",
            description = "MOT only: the class of every track (the format has none); default ${DEFAULT-VALUE}")
    String className;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter out = spec.commandLine().getOut();
        TracksFormat f;
        try {
            f = TracksFormat.named(format);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--format: " + e.getMessage(), e);
        }
        boolean exists = Files.exists(projectFile);
        Project base;
        if (exists) {
            if (video != null) {
                throw new BadInputException(projectFile + " exists and names its own video; leave out --video, or "
                        + "give a new --project");
            }
            base = ProjectOpening.read(projectFile, err);
        } else {
            if (video == null) {
                throw new BadInputException(projectFile + " does not exist yet: give --video VIDEO for the new "
                        + "project");
            }
            try (VideoSource source = VideoSource.open(video)) {
                base = Project.of(VideoRefs.of(video, source, projectFile));
            } catch (VideoException e) {
                throw new BadInputException(video + ": " + e.getMessage(), e);
            }
        }
        Project imported;
        try {
            imported = f.read(file, base.video(), new ObjectClass(className, 0x0072B2), ImportLimits.DEFAULT);
        } catch (ImportException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        Project merged = merge(base, imported, out);
        ProjectWriting.write(merged, projectFile);
        long boxes = imported.tracks().stream().mapToLong(t -> t.frames().size()).sum();
        out.println(imported.tracks().size() + " tracks, " + boxes + " boxes imported from " + file + " into "
                + projectFile + (exists ? " (the previous version is kept as .bak)" : ""));
        return ExitCodes.OK;
    }

    /** {@code base} with {@code imported}'s classes and tracks added; tracks renumbered if any id is taken. */
    static Project merge(Project base, Project imported, PrintWriter out) {
        Project p = base;
        for (ObjectClass c : imported.classes()) {
            p = p.withClass(c);
        }
        Set<Integer> taken = new HashSet<>();
        base.tracks().forEach(t -> taken.add(t.id()));
        boolean clash = imported.tracks().stream().anyMatch(t -> taken.contains(t.id()));
        int next = base.nextTrackId();
        List<String> renamed = new ArrayList<>();
        for (Track t : imported.tracks()) {
            Track added = t;
            if (clash) {
                added = new Track(next++, t.className(), t.note(), t.frames());
                renamed.add(t.id() + "->" + added.id());
            }
            p = p.withTrack(added);
        }
        if (!renamed.isEmpty()) {
            out.println("track ids already in the project, so the imported tracks were renumbered: "
                    + String.join(", ", renamed));
        }
        return p;
    }
}
