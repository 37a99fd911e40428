package org.modetrail.app.editor;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;

import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JOptionPane;

import org.modetrail.format.project.ProjectFileException;
import org.modetrail.format.project.ZonesFile;
import org.modetrail.model.CountingLine;
import org.modetrail.model.Edit;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.Site;
import org.modetrail.model.SiteEdits;
import org.modetrail.model.Zone;

/**
 * The editor's commands on zones and counting lines: the drawing tools, naming what was drawn, selecting, renaming,
 * deleting, showing or hiding, importing a zones file. Every change is a {@link SiteEdits} edit applied through the
 * window (so undo, autosave and save cover it); refusals go to the status line and change nothing. Use on the
 * event thread only.
 */
final class SiteCommands {
    /** What the commands need from the window. */
    interface Host {
        /** The open session, or null. */
        EditorSession session();

        /** Applies an edit of the current project; a refused one is told in the status line. */
        void edit(Function<Project, Edit> op);

        void status(String text);

        /** Drops the track selection (a zone or line is never selected with a track). */
        void deselectTrack();
    }

    private final JFrame owner;
    private final FrameView view;
    private final Host host;
    private SiteItem selected;

    SiteCommands(JFrame owner, FrameView view, Host host) {
        this.owner = owner;
        this.view = view;
        this.host = host;
    }

    SiteItem selected() {
        return selected;
    }

    void drawZone() {
        if (host.session() != null) {
            startTool();
            view.startZoneTool();
        }
    }

    void drawLine() {
        if (host.session() != null) {
            startTool();
            view.startLineTool();
        }
    }

    private void startTool() {
        host.deselectTrack();
        select(null);
        view.requestFocusInWindow();
    }

    /** Selects a zone or line (null for none), on the canvas too; a selection drops the track's. */
    void select(SiteItem item) {
        selected = item;
        view.setSelectedSite(item);
        if (item != null) {
            host.deselectTrack();
            host.status("Selected " + item.describe() + ": drag its " + (item.kind() == SiteItem.Kind.ZONE
                    ? "corners" : "ends") + " or its outline to move them; R renames it, Shift+Delete deletes it");
        }
    }

    /** After a change of the project (an edit, undo, redo): a selected item that is gone is no longer selected. */
    void projectShown(Project p) {
        if (selected != null && SiteHandles.points(p.site(), selected) == null) {
            select(null);
        }
    }

    /** Asks for the name of a zone or line just drawn and adds it; a taken name is asked again, nothing is lost. */
    void nameAndAdd(SiteItem.Kind kind, List<PixelPoint> points) {
        EditorSession session = host.session();
        if (session == null) {
            return;
        }
        Site site = session.project().site();
        String suggested = kind == SiteItem.Kind.ZONE ? SiteEdits.freeZoneName(site) : SiteEdits.freeLineName(site);
        String name = askName(kind, "Name of the new " + kind.word() + ":", suggested, null);
        if (name == null) {
            view.dropDrawnSite();
            host.status("No " + kind.word() + " added");
            return;
        }
        SiteItem item = new SiteItem(kind, name);
        Project before = session.project();
        host.edit(p -> kind == SiteItem.Kind.ZONE ? SiteEdits.addZone(p, new Zone(name, points))
                : SiteEdits.addLine(p, new CountingLine(name, points.get(0), points.get(1))));
        if (session.project() == before) {
            view.dropDrawnSite(); // refused: the status line says why
            return;
        }
        select(item);
        host.status("Added " + item.describe() + " (Ctrl+Z takes it back); the summary counts "
                + (kind == SiteItem.Kind.ZONE ? "the time tracks spend in it" : "the tracks crossing it"));
    }

    /**
     * Asks for a name until it is one no other zone (or line) has; null when the user cancels. {@code own} is the
     * item's present name when renaming.
     */
    private String askName(SiteItem.Kind kind, String question, String suggested, String own) {
        String message = question;
        String value = suggested;
        while (true) {
            // The option pane's own text field: it takes the focus with the name selected, so typing replaces it.
            Object answer = JOptionPane.showInputDialog(owner, message, "Name of the " + kind.word(),
                    JOptionPane.QUESTION_MESSAGE, null, null, value);
            view.requestFocusInWindow();
            if (answer == null || host.session() == null) {
                return null;
            }
            String name = answer.toString().strip();
            Site site = host.session().project().site();
            if (name.isEmpty()) {
                message = "A " + kind.word() + " needs a name:";
            } else if (!name.equals(own) && SiteHandles.points(site, new SiteItem(kind, name)) != null) {
                message = "There is a " + kind.word() + " named '" + name + "' already; choose another name:";
            } else {
                return name;
            }
            host.status(message.substring(0, message.length() - 1));
            value = name.isEmpty() ? suggested : name;
        }
    }

    private SiteItem selectedOrSay() {
        if (host.session() == null || selected == null) {
            host.status("Select a zone or a counting line first (click its outline, or inside a zone)");
            return null;
        }
        return selected;
    }

    void rename() {
        SiteItem item = selectedOrSay();
        if (item == null) {
            return;
        }
        String name = askName(item.kind(), "New name of " + item.describe() + ":", item.name(), item.name());
        if (name == null || name.equals(item.name())) {
            return;
        }
        Project before = host.session().project();
        host.edit(p -> item.kind() == SiteItem.Kind.ZONE ? SiteEdits.renameZone(p, item.name(), name)
                : SiteEdits.renameLine(p, item.name(), name));
        if (host.session().project() != before) {
            select(new SiteItem(item.kind(), name));
            host.status("Renamed " + item.describe() + " to '" + name + "'");
        }
    }

    void delete() {
        SiteItem item = selectedOrSay();
        if (item == null) {
            return;
        }
        host.edit(p -> item.kind() == SiteItem.Kind.ZONE ? SiteEdits.removeZone(p, item.name())
                : SiteEdits.removeLine(p, item.name()));
        select(null);
        host.status("Deleted " + item.describe() + " (Ctrl+Z brings it back)");
    }

    void toggleShown() {
        boolean show = !view.siteVisible();
        if (!show) {
            select(null);
        }
        view.setSiteVisible(show);
        host.status(show ? "Zones and counting lines shown" : "Zones and counting lines hidden (V shows them)");
    }

    void chooseFile() {
        EditorSession session = host.session();
        if (session == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser(session.projectFile().getParent().toFile());
        chooser.setDialogTitle("Import zones and counting lines (a zones file, .json)");
        if (chooser.showOpenDialog(owner) == JFileChooser.APPROVE_OPTION) {
            importFile(chooser.getSelectedFile().toPath());
        }
    }

    /** Adds the zones and lines of a zones file to the project (same names replaced), as one undoable edit. */
    void importFile(Path file) {
        if (host.session() == null) {
            return;
        }
        Site given;
        try {
            given = ZonesFile.read(file);
        } catch (ProjectFileException e) {
            host.status("Not imported: " + e.getMessage());
            return;
        }
        host.edit(p -> SiteEdits.merge(p, given));
        view.setSiteVisible(true);
        host.status("Imported " + given.zones().size() + " zones and " + given.lines().size()
                + " counting lines from " + file.getFileName() + " (same names replaced; Ctrl+Z takes it back)");
    }
}
