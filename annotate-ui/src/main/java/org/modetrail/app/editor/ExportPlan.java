package org.modetrail.app.editor;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;

import org.modetrail.exports.ExportNotes;
import org.modetrail.model.Project;
import org.modetrail.overlay.OverlayStyle;
import org.modetrail.picture.ColourBy;
import org.modetrail.picture.PlotFormat;
import org.modetrail.picture.ProjectPlots;

/**
 * What the export screen is set to write, free of Swing: the folder, the name every file starts with, the items
 * chosen and their options (the same the {@code export}, {@code summary}, {@code plot} and {@code overlay} commands
 * take). It names every file before anything is written, says which options a project allows, and which files
 * already exist (those are replaced only when the user agrees).
 *
 * @param folder       where the files go
 * @param baseName     what every file name starts with, derived from the project's name ({@link #baseName(Path)})
 * @param items        what to write; may be empty (nothing to do)
 * @param cocoFrames   the COCO export also writes each annotated frame as PNG into {@code BASE-frames/}
 *                     (the {@code export --frames} option)
 * @param plotFormats  PNG, SVG or both (the {@code plot --format} option)
 * @param plotColour   by class or by track (the {@code plot --colour} option)
 * @param groundPlots  also the paths on the ground and the speed; needs a calibrated project
 * @param overlayFrom  first frame of the overlay video (the {@code overlay --from} option)
 * @param overlayTo    last frame of it, inclusive ({@code --to})
 * @param overlayTrail frames of trail behind each object ({@code --trail}), 0 to 10000
 */
record ExportPlan(Path folder, String baseName, Set<ExportItem> items, boolean cocoFrames,
                  List<PlotFormat> plotFormats, ColourBy plotColour, boolean groundPlots, int overlayFrom,
                  int overlayTo, int overlayTrail) {
    /** The overlay's default trail, as the {@code overlay} command's. */
    static final int DEFAULT_TRAIL = 25;
    /** Why the ground plots cannot be chosen without a calibration. */
    static final String GROUND_NEEDS_CALIBRATION = "ground paths and speed need a ground calibration "
            + "(Edit → Calibrate the ground…, Ctrl+K)";

    ExportPlan {
        if (folder == null) {
            throw new IllegalArgumentException("choose a folder for the exports");
        }
        if (baseName == null || baseName.isBlank() || baseName.matches(".*[/\\\\:*?\"<>|].*")) {
            throw new IllegalArgumentException("file names cannot start with '" + baseName + "'");
        }
        items = items.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(items));
        plotFormats = List.copyOf(plotFormats);
        new ProjectPlots(plotFormats, plotColour, groundPlots);
        if (overlayFrom < 0 || overlayTo < overlayFrom) {
            throw new IllegalArgumentException("the overlay's frames run from " + overlayFrom + " to " + overlayTo
                    + ": the first must be 0 or more and not after the last");
        }
        // The overlay's own rule for the trail (its style for any frame height), so both say the same.
        OverlayStyle.forFrameHeight(480).withTrailLength(overlayTrail);
    }

    /** The screen's first settings for a project: its folder, the tracks as CSV, everything else at the commands' defaults. */
    static ExportPlan defaults(Path projectFile, Project project, Path folder) {
        return new ExportPlan(folder, baseName(projectFile), Set.of(ExportItem.CSV), false,
                List.of(PlotFormat.PNG), ColourBy.CLASS, groundPlotsAvailable(project), 0,
                project.video().frameCount() - 1, DEFAULT_TRAIL);
    }

    /** The project's name: its file name without {@code .json} and without the editor's {@code .modetrail}. */
    static String baseName(Path projectFile) {
        String name = projectFile.getFileName().toString();
        String lower = name.toLowerCase(Locale.ROOT);
        for (String end : List.of(".modetrail.json", ".json")) {
            if (lower.endsWith(end) && name.length() > end.length()) {
                return name.substring(0, name.length() - end.length());
            }
        }
        return name;
    }

    /** Whether the ground plots can be chosen: only for a calibrated project. */
    static boolean groundPlotsAvailable(Project project) {
        return project.site().calibration() != null;
    }

    /** Why the ground plots cannot be chosen, when they cannot. */
    static Optional<String> whyNoGroundPlots(Project project) {
        return groundPlotsAvailable(project) ? Optional.empty() : Optional.of(GROUND_NEEDS_CALIBRATION);
    }

    /**
     * Whether the chosen items carry metres or speeds for this project (the tracks CSV's ground columns, the
     * summary's speeds, the ground plots), so the screen shows the measurement caution with them.
     */
    boolean carriesSpeeds(Project project) {
        if (!groundPlotsAvailable(project)) {
            return false;
        }
        return items.contains(ExportItem.CSV) || items.contains(ExportItem.SUMMARY)
                || items.contains(ExportItem.PLOTS) && groundPlots;
    }

    /** The files an item writes, data first; the notes beside a tracks export; not the COCO frames' folder. */
    List<Path> files(ExportItem item) {
        return switch (item) {
            case CSV -> withNotes(folder.resolve(baseName + "-tracks.csv"));
            case COCO -> withNotes(folder.resolve(baseName + "-coco.json"));
            case MOT -> withNotes(folder.resolve(baseName + "-mot.txt"));
            case SUMMARY -> List.of(folder.resolve(baseName + "-summary.csv"));
            case PLOTS -> plots().files(folder, baseName + "-");
            case OVERLAY -> List.of(folder.resolve(baseName + "-overlay.mp4"));
        };
    }

    /** The folder the COCO export's frame images go to, when it writes them. */
    Optional<Path> framesFolder() {
        return cocoFrames ? Optional.of(folder.resolve(baseName + "-frames")) : Optional.empty();
    }

    /** The plots' settings for {@link ProjectPlots}. */
    ProjectPlots plots() {
        return new ProjectPlots(plotFormats, plotColour, groundPlots);
    }

    /**
     * The chosen items' files (and the COCO frames' folder when it holds files) that exist now: writing would
     * replace them, so the screen asks first.
     */
    List<Path> existing() {
        List<Path> out = new ArrayList<>();
        for (ExportItem item : ExportItem.values()) {
            if (!items.contains(item)) {
                continue;
            }
            for (Path p : files(item)) {
                if (Files.exists(p)) {
                    out.add(p);
                }
            }
            if (item == ExportItem.COCO && framesFolder().isPresent() && holdsFiles(framesFolder().get())) {
                out.add(framesFolder().get());
            }
        }
        return out;
    }

    /** Whether writing may go ahead: nothing would be replaced, or the user agreed to replace it. */
    boolean mayWrite(boolean userAgreedToReplace) {
        return userAgreedToReplace || existing().isEmpty();
    }

    /** Problems that stop this plan on this project, one sentence each (none when it can run). */
    List<String> problems(Project project) {
        List<String> out = new ArrayList<>();
        if (items.isEmpty()) {
            out.add("Choose at least one thing to export.");
        }
        if (items.contains(ExportItem.PLOTS) && groundPlots && !groundPlotsAvailable(project)) {
            out.add("The ground plots cannot be drawn: " + GROUND_NEEDS_CALIBRATION + ".");
        }
        int last = project.video().frameCount() - 1;
        if (items.contains(ExportItem.OVERLAY) && overlayTo > last) {
            out.add("The overlay's last frame is " + overlayTo + " but the video has frames 0 to " + last
                    + "; choose a last frame within them.");
        }
        return out;
    }

    ExportPlan withItems(Set<ExportItem> newItems) {
        return new ExportPlan(folder, baseName, newItems, cocoFrames, plotFormats, plotColour, groundPlots,
                overlayFrom, overlayTo, overlayTrail);
    }

    ExportPlan withFolder(Path newFolder) {
        return new ExportPlan(newFolder, baseName, items, cocoFrames, plotFormats, plotColour, groundPlots,
                overlayFrom, overlayTo, overlayTrail);
    }

    private static List<Path> withNotes(Path data) {
        return List.of(data, ExportNotes.fileFor(data));
    }

    private static boolean holdsFiles(Path dir) {
        if (!Files.isDirectory(dir)) {
            return false;
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isPresent();
        } catch (IOException e) {
            return true;
        }
    }
}
