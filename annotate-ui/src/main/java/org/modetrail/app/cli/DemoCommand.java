package org.modetrail.app.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;

import org.modetrail.app.editor.EditorLauncher;
import org.modetrail.format.csv.KeyframeRow;
import org.modetrail.format.csv.KeyframesCsv;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.run.RunProgress;
import org.modetrail.run.TrackRunner;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;

/**
 * {@code modetrail demo}: the editor on the bundled demo project, the synthetic arena with its three animals
 * tracked from one keyframe each, ready to review and correct. The project is made in the user's cache folder (the
 * installation's clips are never written to) the first time, and again when it is missing or damaged.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Opens the editor on the demo project: the bundled arena clip (clips/arena.mp4) with three "
                + "animals tracked from one box each, kept in the user's cache folder.")
public final class DemoCommand implements Callable<Integer> {

    @Override
    public Integer call() throws Exception {
        Path project = demoProject();
        EditorLauncher.open(project);
        EditorLauncher.awaitClose();
        return ExitCodes.OK;
    }

    /** The bundled demo clip, found from the installation folder the launcher names, or from the working folder. */
    public static Path demoClip() throws BadInputException {
        String home = System.getProperty("modetrail.home", ".");
        Path clip = Path.of(home, "clips", "arena.mp4");
        if (!Files.isRegularFile(clip)) {
            throw new BadInputException(clip + ": the demo clip is missing; run ./modetrail from the project folder "
                    + "or regenerate the clips with ./modetrail make-demo clips");
        }
        return clip;
    }

    /** The demo project, made when it is missing or unreadable: the clip's keyframes tracked through the clip. */
    public static Path demoProject() throws Exception {
        Path clip = demoClip();
        Path file = cacheFolder().resolve("demo").resolve("arena.json");
        if (Files.isRegularFile(file)) {
            try {
                ProjectFile.read(file);
                return file;
            } catch (IOException e) {
                // Damaged (or from another version): made again below, the old one kept as .bak by the write.
            }
        }
        Path keys = clip.resolveSibling("arena-keys.csv");
        try (VideoSource video = VideoSource.open(clip)) {
            List<KeyframeRow> rows = KeyframesCsv.read(keys, video.info().width(), video.info().height(),
                    video.frameCount());
            Map<Integer, Map<Integer, FrameAnnotation>> frames = new TreeMap<>();
            Map<String, ObjectClass> classes = new LinkedHashMap<>();
            Map<Integer, String> classOf = new TreeMap<>();
            for (KeyframeRow r : rows) {
                String cls = r.className() != null ? r.className() : "animal";
                classes.computeIfAbsent(cls, n -> new ObjectClass(n, 0xE69F00));
                classOf.put(r.trackId(), cls);
                frames.computeIfAbsent(r.trackId(), k -> new TreeMap<>())
                        .put(r.frame(), FrameAnnotation.keyframe(r.frame(), r.box()));
            }
            List<Track> tracks = new ArrayList<>();
            frames.forEach((id, f) -> tracks.add(new Track(id, classOf.get(id), "", f)));
            Project keyed = new Project(VideoRefs.of(clip, video, file), new ArrayList<>(classes.values()), tracks);
            Project tracked = new TrackRunner().trackAll(video, keyed, RunProgress.NONE, () -> false);
            ProjectWriting.write(tracked, file);
        }
        return file;
    }

    /** $XDG_CACHE_HOME/modetrail, or ~/.cache/modetrail: where the frame indexes live too. */
    static Path cacheFolder() {
        return VideoOptions.defaultIndexCacheDir().getParent();
    }
}
