package org.modetrail.app.editor;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Rectangle;
import java.awt.datatransfer.DataFlavor;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;

import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JSplitPane;
import javax.swing.JToolBar;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import javax.swing.TransferHandler;
import javax.swing.WindowConstants;

import org.modetrail.format.project.AutosaveConfig;
import org.modetrail.format.project.ProjectAutosave;
import org.modetrail.format.project.ProjectFileException;
import org.modetrail.model.Box;
import org.modetrail.model.Edit;
import org.modetrail.model.Edits;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.SiteEdits;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.quality.TrackQualitySummary;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * The editor's window: the frame large (draw a box to start a track, drag a box to correct it), the timeline with
 * a lane per track under it, the track list beside it, and every action on a key (F1 lists them). All decoding
 * and tracking run off the event thread ({@link FrameFetcher}, {@link EditorSession}); this class only wires them
 * to the screen and holds no algorithm.
 */
public final class EditorWindow extends JFrame {
    /** The palette new classes take their colours from (Okabe and Ito's colour-blind-safe set, black left out). */
    static final int[] CLASS_COLOURS = {0xE69F00, 0x56B4E9, 0x009E73, 0xF0E442, 0x0072B2, 0xD55E00, 0xCC79A7};

    /** One action of the editor: its name in menus and help, its key, what it does. */
    record Command(String menu, String name, KeyStroke key, Runnable run) {
    }

    private final EditorPreferences prefs;
    private final Runnable onClosed;
    private final FrameView frameView = new FrameView();
    private final TimelineView timeline = new TimelineView();
    private final TrackListPanel trackList = new TrackListPanel();
    private final JLabel status = new JLabel("Open a video or a project to begin (Ctrl+O), or drop one here");
    private final JLabel frameLabel = new JLabel(" ");
    private final JProgressBar progress = new JProgressBar();
    private final JButton cancelTracking = new JButton("Stop tracking");
    private final List<Command> commands = new ArrayList<>();
    private final Timer player;
    private EditorSession session;
    private FrameFetcher frames;
    private ReviewQueue review;
    /**
     * Works out the timeline's lanes, the track list's figures and the review's spots for each new project version
     * ({@link ProjectDigest}), off the event thread: on an hour-long video that takes longer than a screen refresh.
     */
    private final java.util.concurrent.ExecutorService digester = java.util.concurrent.Executors
            .newSingleThreadExecutor(r -> {
                Thread t = new Thread(r, "editor-digest");
                t.setDaemon(true);
                return t;
            });
    /** The newest project version waiting for its digest, or null when none waits. */
    private final java.util.concurrent.atomic.AtomicReference<Pending> toDigest =
            new java.util.concurrent.atomic.AtomicReference<>();
    /** The digest last made (the digester thread's; unchanged tracks reuse its parts). */
    private volatile ProjectDigest lastDigest;
    /** Counts opened sessions, so a digest of a project no longer open is not shown. Event thread. */
    private long generation;
    private int frame;
    private Integer selected;
    private final SiteCommands site = new SiteCommands(this, frameView, new SiteCommands.Host() {
        @Override
        public EditorSession session() {
            return session;
        }

        @Override
        public void edit(Function<Project, Edit> op) {
            EditorWindow.this.edit(op);
        }

        @Override
        public void status(String text) {
            status.setText(text);
        }

        @Override
        public void deselectTrack() {
            select(null);
        }
    });
    private String lastClass = "object";
    private double playbackRate = 1;
    private ExportDialog exportDialog;

    public EditorWindow(EditorPreferences prefs, Runnable onClosed) {
        super("Modetrail");
        this.prefs = prefs;
        this.onClosed = onClosed;
        setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                closeWindow();
            }
        });
        player = new Timer(40, e -> step(1));
        buildLayout();
        buildCommands();
        setTransferHandler(new DropHandler());
        Rectangle bounds = prefs.windowBounds();
        if (bounds != null) {
            setBounds(bounds);
        } else {
            setSize(new Dimension(1280, 860));
            setLocationByPlatform(true);
        }
        wireViews();
        updateTitle();
        java.awt.KeyboardFocusManager.getCurrentKeyboardFocusManager().addKeyEventDispatcher(keys);
    }

    @Override
    public void dispose() {
        java.awt.KeyboardFocusManager.getCurrentKeyboardFocusManager().removeKeyEventDispatcher(keys);
        digester.shutdown();
        super.dispose();
    }

    // ---------------------------------------------------------------- layout

    private void buildLayout() {
        JToolBar tools = new JToolBar();
        tools.setFloatable(false);
        tools.add(button("Open…", this::chooseAndOpen));
        tools.add(button("Save", this::save));
        tools.addSeparator();
        tools.add(button("Undo", this::undo));
        tools.add(button("Redo", this::redo));
        tools.addSeparator();
        tools.add(button("◀◀", () -> step(-10)));
        tools.add(button("◀", () -> step(-1)));
        tools.add(button("▶ / ❚❚", this::togglePlay));
        tools.add(button("▶", () -> step(1)));
        tools.add(button("▶▶", () -> step(10)));
        tools.addSeparator();
        tools.add(frameLabel);
        tools.addSeparator();
        tools.add(button("Next check", () -> reviewStep(true)));
        tools.add(button("Keys (F1)", this::showHelp));

        // The frame takes what the track list and the timeline do not need.
        trackList.setPreferredSize(new Dimension(400, 300));
        trackList.setMinimumSize(new Dimension(160, 100));
        frameView.setPreferredSize(new Dimension(640, 480));
        frameView.setMinimumSize(new Dimension(200, 150));
        JSplitPane side = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, frameView, trackList);
        side.setResizeWeight(1.0);
        side.setOneTouchExpandable(true);
        JPanel timelinePanel = new JPanel(new BorderLayout());
        timelinePanel.add(new javax.swing.JScrollPane(timeline), BorderLayout.CENTER);
        timelinePanel.add(new TimelineLegend(timeline), BorderLayout.SOUTH);
        // Room for the ruler and six lanes before the lanes scroll.
        timelinePanel.setPreferredSize(new Dimension(800, 200));
        timelinePanel.setMinimumSize(new Dimension(200, 90));
        JSplitPane main = new JSplitPane(JSplitPane.VERTICAL_SPLIT, side, timelinePanel);
        main.setResizeWeight(1.0);

        progress.setVisible(false);
        progress.setStringPainted(true);
        cancelTracking.setVisible(false);
        cancelTracking.addActionListener(e -> {
            if (session != null) {
                session.cancelTracking();
            }
        });
        JPanel statusBar = new JPanel(new BorderLayout(8, 0));
        statusBar.setBorder(BorderFactory.createEmptyBorder(2, 8, 2, 8));
        statusBar.add(status, BorderLayout.CENTER);
        JPanel right = new JPanel(new BorderLayout(4, 0));
        right.add(progress, BorderLayout.CENTER);
        right.add(cancelTracking, BorderLayout.EAST);
        statusBar.add(right, BorderLayout.EAST);

        getContentPane().add(tools, BorderLayout.NORTH);
        getContentPane().add(main, BorderLayout.CENTER);
        getContentPane().add(statusBar, BorderLayout.SOUTH);
        frameView.setName("frameView");
        timeline.setName("timeline");
        trackList.setName("trackList");
        status.setName("status");
    }

    private static JButton button(String text, Runnable run) {
        JButton b = new JButton(text);
        b.setFocusable(false);
        b.addActionListener(e -> run.run());
        return b;
    }

    private void buildCommands() {
        add("File", "Open video or project…", "control O", this::chooseAndOpen);
        add("File", "Save", "control S", this::save);
        add("File", "Save as…", "control shift S", this::saveAs);
        add("File", "Export tracks, summary, plots, overlay…", "control E", this::showExport);
        add("File", "Close window", "control W", this::closeWindow);
        add("Edit", "Undo", "control Z", this::undo);
        add("Edit", "Redo", "control Y", this::redo);
        add("Edit", "Redo (also)", "control shift Z", this::redo);
        add("Edit", "Delete the selected track's keyframe here", "DELETE", this::deleteKeyframe);
        add("Edit", "Mark hidden from here to the next keyframe", "H", () -> markFromHere(Presence.HIDDEN));
        add("Edit", "Mark absent from here to the next keyframe", "A", () -> markFromHere(Presence.ABSENT));
        add("Edit", "Split the selected track here", "S", this::split);
        add("Edit", "Merge another track into the selected one…", "M", this::merge);
        add("Edit", "Change the selected track's class…", "C", this::changeClass);
        add("Edit", "Delete the selected track", "control DELETE", this::deleteTrack);
        add("Edit", "Calibrate the ground…", "control K", this::calibrate);
        add("Edit", "Stop tracking", "shift ESCAPE", () -> {
            if (session != null) {
                session.cancelTracking();
            }
        });
        add("Zones", "Draw a zone (click its corners)", "Z", site::drawZone);
        add("Zones", "Draw a counting line (drag from end to end)", "L", site::drawLine);
        add("Zones", "Rename the selected zone or line…", "R", site::rename);
        add("Zones", "Delete the selected zone or line", "shift DELETE", site::delete);
        add("Zones", "Import zones and lines from a file…", "control I", site::chooseFile);
        add("Go", "Next frame", "RIGHT", () -> step(1));
        add("Go", "Previous frame", "LEFT", () -> step(-1));
        add("Go", "Ten frames on", "shift RIGHT", () -> step(10));
        add("Go", "Ten frames back", "shift LEFT", () -> step(-10));
        add("Go", "Next keyframe of the selected track", "control RIGHT", () -> toKeyframe(true));
        add("Go", "Previous keyframe of the selected track", "control LEFT", () -> toKeyframe(false));
        add("Go", "Next place to check (review)", "N", () -> reviewStep(true));
        add("Go", "Previous place to check", "shift N", () -> reviewStep(false));
        add("Go", "First frame", "HOME", () -> showFrame(0));
        add("Go", "Last frame", "END", () -> showFrame(frameCount() - 1));
        add("Go", "Go to frame or time…", "control G", this::goTo);
        add("Go", "Play or pause", "P", this::togglePlay);
        add("Go", "Play faster", "CLOSE_BRACKET", () -> setRate(playbackRate * 2));
        add("Go", "Play slower", "OPEN_BRACKET", () -> setRate(playbackRate / 2));
        add("View", "Show or hide zones and lines", "V", site::toggleShown);
        add("View", "Light or dark theme", "control T", this::toggleTheme);
        add("View", "Keys", "F1", this::showHelp);

        JMenuBar bar = new JMenuBar();
        for (String menu : List.of("File", "Edit", "Zones", "Go", "View")) {
            JMenu m = new JMenu(menu);
            m.setName("menu" + menu);
            for (Command c : commands) {
                if (c.menu().equals(menu) && !c.name().endsWith("(also)")) {
                    JMenuItem item = new JMenuItem(c.name());
                    item.setAccelerator(c.key());
                    item.addActionListener(e -> c.run().run());
                    m.add(item);
                }
            }
            if (menu.equals("File")) {
                m.addSeparator();
                JMenu recent = new JMenu("Recent");
                recent.addMenuListener(new javax.swing.event.MenuListener() {
                    @Override
                    public void menuSelected(javax.swing.event.MenuEvent e) {
                        recent.removeAll();
                        for (Path p : prefs.recent()) {
                            JMenuItem item = new JMenuItem(p.getFileName() + "  (" + p.getParent() + ")");
                            item.addActionListener(a -> open(p));
                            recent.add(item);
                        }
                        if (prefs.recent().isEmpty()) {
                            recent.add(new JMenuItem("(none yet)")).setEnabled(false);
                        }
                    }

                    @Override
                    public void menuDeselected(javax.swing.event.MenuEvent e) {
                    }

                    @Override
                    public void menuCanceled(javax.swing.event.MenuEvent e) {
                    }
                });
                m.add(recent);
            }
            bar.add(m);
        }
        setJMenuBar(bar);
    }

    private void add(String menu, String name, String key, Runnable run) {
        KeyStroke stroke = KeyStroke.getKeyStroke(key);
        if (stroke == null) {
            throw new IllegalArgumentException("no key '" + key + "'");
        }
        commands.add(new Command(menu, name, stroke, run));
    }

    /**
     * The commands' keys work wherever the focus is in this window (on the canvas, the timeline, the track list),
     * except while typing in a text field: a dispatcher sees each key before the focused component does. Keys the
     * canvas uses itself (Space to pan, Escape to drop a drag, F to fit) are not commands.
     */
    private final java.awt.KeyEventDispatcher keys = e -> {
        if (e.getID() != KeyEvent.KEY_PRESSED || !isActive()
                || e.getComponent() instanceof javax.swing.text.JTextComponent
                || SwingUtilities.getWindowAncestor(e.getComponent()) != this && e.getComponent() != this) {
            return false;
        }
        KeyStroke pressed = KeyStroke.getKeyStrokeForEvent(e);
        for (Command c : commands) {
            if (c.key().equals(pressed)) {
                c.run().run();
                e.consume();
                return true;
            }
        }
        return false;
    };

    /** The editor's commands with their keys, for the help overlay and its test. */
    List<Command> commands() {
        return List.copyOf(commands);
    }

    // ---------------------------------------------------------------- views

    private void wireViews() {
        frameView.setListener(new FrameView.Listener() {
            @Override
            public void boxDrawn(int f, Box box) {
                newTrack(f, box);
            }

            @Override
            public void boxChanged(int trackId, int f, Box box) {
                edit(p -> Edits.setKeyframe(p, trackId, f, box));
            }

            @Override
            public void trackSelected(Integer id) {
                select(id);
            }

            @Override
            public void message(String text) {
                status.setText(text);
            }

            @Override
            public void zoneDrawn(List<PixelPoint> corners) {
                site.nameAndAdd(SiteItem.Kind.ZONE, corners);
            }

            @Override
            public void lineDrawn(PixelPoint from, PixelPoint to) {
                site.nameAndAdd(SiteItem.Kind.LINE, List.of(from, to));
            }

            @Override
            public void siteSelected(SiteItem item) {
                site.select(item);
            }

            @Override
            public void zoneChanged(String name, List<PixelPoint> polygon) {
                edit(p -> SiteEdits.reshapeZone(p, name, polygon));
            }

            @Override
            public void lineChanged(String name, PixelPoint from, PixelPoint to) {
                edit(p -> SiteEdits.moveLine(p, name, from, to));
            }
        });
        timeline.addListener(new TimelineView.Listener() {
            @Override
            public void frameChosen(int f) {
                showFrame(f);
            }

            @Override
            public void trackChosen(int trackId) {
                select(trackId);
            }
        });
        trackList.addListener(this::selectAndShow);
    }

    private void select(Integer id) {
        if (id != null && site.selected() != null) {
            site.select(null);
        }
        selected = id;
        frameView.setSelectedTrack(id);
        timeline.setSelectedTrack(id);
        trackList.setSelectedTrack(id);
    }

    /** Selects a track as a click on it would (for the screenshots). */
    void selectTrackForTest(int id) {
        select(id);
    }

    /** Selects a zone or line as a click on it would (for the screenshots). */
    void selectSiteForTest(SiteItem item) {
        site.select(item);
    }

    /** The zone or line selected, for tests. */
    SiteItem selectedSiteForTest() {
        return site.selected();
    }

    /** Imports a zones file as the Zones menu's command does, without the file chooser (for tests). */
    void importZones(Path file) {
        site.importFile(file);
    }

    private void selectAndShow(int id) {
        select(id);
        if (session == null) {
            return;
        }
        session.project().track(id).ifPresent(t -> {
            if (!t.isEmpty() && t.at(frame).isEmpty()) {
                showFrame(t.firstFrame());
            }
        });
    }

    // ---------------------------------------------------------------- opening and closing

    private void chooseAndOpen() {
        JFileChooser chooser = new JFileChooser(prefs.lastFolder() == null ? null : prefs.lastFolder().toFile());
        chooser.setDialogTitle("Open a video, a folder of images, or a project (.json)");
        chooser.setFileSelectionMode(JFileChooser.FILES_AND_DIRECTORIES);
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            open(chooser.getSelectedFile().toPath());
        }
    }

    /** Opens a project (.json) or a video; a video's project is NAME.modetrail.json beside it. */
    public void open(Path file) {
        if (!confirmDiscard()) {
            return;
        }
        boolean project = file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json");
        status.setText("Opening " + file.getFileName() + "…");
        Path projectFile = project ? file : projectFileFor(file);
        boolean recover = false;
        if (Files.exists(projectFile) || !project) {
            try {
                Optional<Path> r = ProjectAutosave.findRecovery(projectFile);
                if (r.isPresent()) {
                    int answer = JOptionPane.showConfirmDialog(this, "Unsaved edits of " + projectFile.getFileName()
                            + " were kept after the editor last closed without saving.\nRecover them?",
                            "Recover edits", JOptionPane.YES_NO_OPTION);
                    recover = answer == JOptionPane.YES_OPTION;
                }
            } catch (IOException e) {
                status.setText("Could not look for unsaved edits: " + e.getMessage());
            }
        }
        boolean useRecovery = recover;
        // The first opening of a file scans its packets once (an hour of 1080p: seconds); say how far it got.
        String name = file.getFileName().toString();
        long[] shown = {0};
        org.modetrail.video.IndexProgress scan = (done, total) -> {
            long now = System.nanoTime();
            if (now - shown[0] > 200_000_000L && total > 0) {
                shown[0] = now;
                int percent = (int) (100 * done / total);
                SwingUtilities.invokeLater(() -> status.setText("Opening " + name + ": finding its frames, "
                        + percent + "% (once per file)…"));
            }
        };
        new Thread(() -> {
            try {
                EditorSession s;
                if (project || Files.exists(projectFile) || useRecovery) {
                    s = Files.exists(projectFile) || useRecovery
                            ? EditorSession.forProject(projectFile, useRecovery, AutosaveConfig.DEFAULT, scan)
                            : null;
                } else {
                    s = null;
                }
                if (s == null) {
                    VideoRef ref;
                    try (VideoSource probe = VideoSource.open(file, org.modetrail.video.VideoOptions.defaults(),
                            scan)) {
                        ref = new VideoRef(file.toAbsolutePath().toString(), probe.info().width(),
                                probe.info().height(), probe.frameCount(), "");
                    }
                    s = EditorSession.forVideo(file, ref, projectFile, AutosaveConfig.DEFAULT);
                }
                VideoSource video = VideoSource.open(s.videoFile());
                EditorSession opened = s;
                SwingUtilities.invokeLater(() -> show(opened, new FrameFetcher(video), file));
            } catch (ProjectFileException | VideoException e) {
                SwingUtilities.invokeLater(() -> refuse(file, e.getMessage()));
            } catch (IOException | RuntimeException e) {
                SwingUtilities.invokeLater(() -> refuse(file, e.toString()));
            }
        }, "editor-open").start();
    }

    static Path projectFileFor(Path video) {
        String name = video.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String base = dot > 0 ? name.substring(0, dot) : name;
        return video.toAbsolutePath().resolveSibling(base + ".modetrail.json");
    }

    private void refuse(Path file, String message) {
        status.setText("Could not open " + file.getFileName());
        JOptionPane.showMessageDialog(this, message, "Cannot open " + file.getFileName(), JOptionPane.ERROR_MESSAGE);
    }

    private void show(EditorSession s, FrameFetcher fetcher, Path opened) {
        closeSession();
        session = s;
        frames = fetcher;
        prefs.addRecent(opened);
        s.addListener(new EditorSession.Listener() {
            @Override
            public void projectChanged(Project p) {
                SwingUtilities.invokeLater(() -> projectShown(p));
            }

            @Override
            public void trackingProgress(boolean running, long done, long total) {
                SwingUtilities.invokeLater(() -> trackingShown(running, done, total));
            }

            @Override
            public void problem(String message) {
                SwingUtilities.invokeLater(() -> status.setText(message));
            }
        });
        timeline.setFrameTimes(fetcher.video().index().timesSeconds());
        projectShown(s.project());
        frame = 0;
        showFrame(0);
        status.setText("Draw a box around an object to start its track; F1 lists the keys");
    }

    private void projectShown(Project p) {
        if (session == null) {
            return;
        }
        frameView.setProject(p);
        if (selected != null && p.track(selected).isEmpty()) {
            select(null);
        }
        site.projectShown(p);
        updateTitle();
        if (toDigest.getAndSet(new Pending(p, frameCount(), generation)) == null) {
            digester.submit(this::digestNewest);
        }
    }

    /** A project version waiting for its digest: the video's frame count and the session it belongs to. */
    private record Pending(Project project, int frameCount, long generation) {
    }

    /** On the digester thread: digests the newest waiting version, skipping those overtaken meanwhile. */
    private void digestNewest() {
        Pending p = toDigest.get();
        while (p != null) {
            ProjectDigest d;
            try {
                d = ProjectDigest.of(p.project(), p.frameCount(), timeline.config(), TrackQualitySummary.defaults(),
                        lastDigest);
            } catch (RuntimeException e) {
                toDigest.set(null);
                String message = "Could not update the timeline: " + e;
                SwingUtilities.invokeLater(() -> status.setText(message));
                return;
            }
            lastDigest = d;
            if (toDigest.compareAndSet(p, null)) {
                long gen = p.generation();
                SwingUtilities.invokeLater(() -> digestShown(d, gen));
                return;
            }
            p = toDigest.get(); // a newer version came while this one was worked out
        }
    }

    private void digestShown(ProjectDigest d, long gen) {
        if (session == null || gen != generation) {
            return;
        }
        timeline.setDigest(d);
        trackList.setDigest(d);
        if (review == null) {
            review = ReviewQueue.of(d.spots(), TrackQualitySummary.defaults());
        } else {
            review.rebuild(d.spots());
        }
    }

    private void trackingShown(boolean running, long done, long total) {
        progress.setVisible(running);
        cancelTracking.setVisible(running);
        if (running && total > 0) {
            progress.setMaximum(1000);
            progress.setValue((int) (1000 * done / total));
            progress.setString(String.format(Locale.ROOT, "tracking %d / %d frames", done, total));
        }
    }

    private void updateTitle() {
        String name = session == null ? "" : " — " + session.projectFile().getFileName()
                + (session.isDirty() ? " (unsaved)" : "");
        setTitle("Modetrail" + name);
    }

    private boolean confirmDiscard() {
        if (session == null || !session.isDirty()) {
            return true;
        }
        int answer = JOptionPane.showConfirmDialog(this, session.projectFile().getFileName()
                + " has unsaved edits. Save them first?", "Unsaved edits", JOptionPane.YES_NO_CANCEL_OPTION);
        if (answer == JOptionPane.CANCEL_OPTION || answer == JOptionPane.CLOSED_OPTION) {
            return false;
        }
        if (answer == JOptionPane.YES_OPTION) {
            return save();
        }
        return true;
    }

    private void closeWindow() {
        if (exportDialog != null && exportDialog.busy() && JOptionPane.showConfirmDialog(this,
                "Exports are still running. Stop them and close? (Files not finished are not written.)",
                "Exports running", JOptionPane.YES_NO_OPTION) != JOptionPane.YES_OPTION) {
            return;
        }
        if (!confirmDiscard()) {
            return;
        }
        prefs.setWindowBounds(getBounds());
        closeSession();
        if (exportDialog != null) {
            exportDialog.dispose();
        }
        dispose();
        onClosed.run();
    }

    private void closeSession() {
        player.stop();
        review = null;
        generation++;
        lastDigest = null;
        if (frames != null) {
            frames.close();
            frames = null;
        }
        if (session != null) {
            try {
                session.close();
            } catch (IOException e) {
                status.setText("Closing: " + e.getMessage());
            }
            session = null;
        }
    }

    // ---------------------------------------------------------------- frames

    int frameCount() {
        return frames == null ? 0 : frames.video().frameCount();
    }

    int currentFrame() {
        return frame;
    }

    EditorSession session() {
        return session;
    }

    void showFrame(int n) {
        if (frames == null) {
            return;
        }
        int f = Math.max(0, Math.min(frameCount() - 1, n));
        frame = f;
        timeline.setCurrentFrame(f);
        double t = frames.video().index().timeSeconds(f);
        frameLabel.setText(String.format(Locale.ROOT, "frame %d / %d · %.3f s", f, frameCount() - 1, t));
        frames.request(f, d -> SwingUtilities.invokeLater(() -> {
            if (d.wanted() == frame) {
                frameView.showFrame(d.wanted(), d.image(), d.shown());
            }
        }), msg -> SwingUtilities.invokeLater(() -> status.setText(msg)));
    }

    private void step(int delta) {
        if (frames == null) {
            return;
        }
        int next = frame + delta;
        if (player.isRunning() && next >= frameCount()) {
            player.stop();
            return;
        }
        showFrame(next);
    }

    private void togglePlay() {
        if (frames == null) {
            return;
        }
        if (player.isRunning()) {
            player.stop();
            status.setText("Paused at frame " + frame);
        } else {
            setRate(playbackRate);
            player.start();
        }
    }

    private void setRate(double rate) {
        playbackRate = Math.max(0.125, Math.min(8, rate));
        if (frames != null) {
            double fps = Math.max(1, frames.video().index().meanFrameRate());
            player.setDelay((int) Math.max(5, Math.round(1000 / (fps * playbackRate))));
            status.setText(String.format(Locale.ROOT, "Playing at %.3gx", playbackRate));
        }
    }

    private void goTo() {
        if (frames == null) {
            return;
        }
        String answer = JOptionPane.showInputDialog(this, "Frame number, or a time in seconds (like 12.5s):",
                Integer.toString(frame));
        if (answer == null || answer.isBlank()) {
            return;
        }
        String a = answer.strip().toLowerCase(Locale.ROOT);
        try {
            if (a.endsWith("s")) {
                showFrame(frames.video().index().frameAtTime(Double.parseDouble(a.substring(0, a.length() - 1))));
            } else {
                showFrame(Integer.parseInt(a));
            }
        } catch (NumberFormatException e) {
            status.setText("'" + answer + "' is neither a frame number nor a time like 12.5s");
        }
    }

    private void toKeyframe(boolean forward) {
        Track t = selectedTrack();
        if (t == null) {
            return;
        }
        Optional<FrameAnnotation> k = forward ? t.keyframeAfter(frame) : t.keyframeBefore(frame);
        k.ifPresentOrElse(a -> showFrame(a.frame()), () -> status.setText("no keyframe "
                + (forward ? "after" : "before") + " frame " + frame + " on track " + t.id()));
    }

    private void reviewStep(boolean forward) {
        if (review == null) {
            return;
        }
        Optional<ReviewQueue.Spot> spot = forward ? review.next() : review.previous();
        spot.ifPresentOrElse(s -> {
            select(s.trackId());
            showFrame(s.from());
            status.setText("Check: " + s.describe());
        }, () -> status.setText("Nothing to check"));
    }

    // ---------------------------------------------------------------- edits

    private Track selectedTrack() {
        if (session == null || selected == null) {
            status.setText("Select a track first (click its box or its lane)");
            return null;
        }
        return session.project().track(selected).orElse(null);
    }

    private void edit(Function<Project, Edit> op) {
        if (session == null) {
            return;
        }
        try {
            session.apply(op.apply(session.project()));
        } catch (IllegalArgumentException | IllegalStateException e) {
            status.setText(e.getMessage());
        }
    }

    private void newTrack(int f, Box box) {
        if (session == null) {
            return;
        }
        Project p = session.project();
        List<String> names = new ArrayList<>();
        p.classes().forEach(c -> names.add(c.name()));
        if (!names.contains(lastClass)) {
            names.add(0, lastClass);
        }
        JComboBox<String> choice = new JComboBox<>(names.toArray(String[]::new));
        choice.setEditable(true);
        choice.setSelectedItem(lastClass);
        choice.setName("classChoice");
        int answer = JOptionPane.showConfirmDialog(this, choice, "Class of the new track",
                JOptionPane.OK_CANCEL_OPTION, JOptionPane.QUESTION_MESSAGE);
        Object picked = choice.getSelectedItem();
        frameView.requestFocusInWindow();
        if (answer != JOptionPane.OK_OPTION || picked == null || picked.toString().isBlank()) {
            status.setText("No track started");
            return;
        }
        String name = picked.toString().strip();
        lastClass = name;
        ObjectClass cls = p.objectClass(name)
                .orElse(new ObjectClass(name, CLASS_COLOURS[p.classes().size() % CLASS_COLOURS.length]));
        edit(q -> Edits.newTrack(q, cls, f, box));
        select(session.project().tracks().get(session.project().tracks().size() - 1).id());
        status.setText("Tracking the new " + name + " forward and backward; keep working meanwhile");
    }

    /** Opens the ground calibration screen on the current frame (non-modal; storing it is an undoable edit). */
    private void calibrate() {
        if (frames == null || session == null) {
            return;
        }
        frames.request(frame, d -> {
            if (d.exact()) {
                // The fetcher reuses its pictures: the screen gets a copy of its own.
                BufferedImage copy = new BufferedImage(d.image().getWidth(), d.image().getHeight(),
                        BufferedImage.TYPE_INT_RGB);
                copy.getRaster().setDataElements(0, 0, d.image().getRaster());
                SwingUtilities.invokeLater(() -> CalibrationDialog.forSession(this, copy, session).setVisible(true));
            }
        }, msg -> SwingUtilities.invokeLater(() -> status.setText(msg)));
    }

    private void deleteKeyframe() {
        if (selected == null && site.selected() != null) {
            site.delete(); // Delete on a selected zone or line deletes it, as Shift+Delete does
            return;
        }
        Track t = selectedTrack();
        if (t != null) {
            edit(p -> Edits.deleteKeyframe(p, t.id(), frame));
        }
    }

    private void markFromHere(Presence presence) {
        Track t = selectedTrack();
        if (t == null) {
            return;
        }
        int to = t.keyframeAfter(frame).map(a -> a.frame() - 1).orElse(frameCount() - 1);
        edit(p -> Edits.markSpan(p, t.id(), frame, Math.max(frame, to), presence));
        status.setText("Frames " + frame + "-" + Math.max(frame, to) + " of track " + t.id() + " marked "
                + presence.name().toLowerCase(Locale.ROOT));
    }

    private void split() {
        Track t = selectedTrack();
        if (t != null) {
            edit(p -> Edits.split(p, t.id(), frame));
        }
    }

    private void merge() {
        Track t = selectedTrack();
        if (t == null) {
            return;
        }
        List<String> others = new ArrayList<>();
        session.project().tracks().stream().filter(o -> o.id() != t.id())
                .forEach(o -> others.add(o.id() + " " + o.className()));
        if (others.isEmpty()) {
            status.setText("There is no other track to merge");
            return;
        }
        Object pick = JOptionPane.showInputDialog(this, "Merge which track into track " + t.id() + "?", "Merge",
                JOptionPane.QUESTION_MESSAGE, null, others.toArray(), others.get(0));
        if (pick != null) {
            int other = Integer.parseInt(pick.toString().split(" ")[0]);
            edit(p -> Edits.merge(p, t.id(), other));
        }
    }

    private void changeClass() {
        Track t = selectedTrack();
        if (t == null) {
            return;
        }
        String name = JOptionPane.showInputDialog(this, "New class of track " + t.id() + ":", t.className());
        if (name == null || name.isBlank()) {
            return;
        }
        String n = name.strip();
        edit(p -> {
            Project q = p.objectClass(n).isPresent() ? p
                    : p.withClass(new ObjectClass(n, CLASS_COLOURS[p.classes().size() % CLASS_COLOURS.length]));
            return Edits.changeClass(q, t.id(), n);
        });
    }

    private void deleteTrack() {
        Track t = selectedTrack();
        if (t != null && !t.isEmpty()) {
            edit(p -> Edits.deleteSpan(p, t.id(), 0, frameCount() - 1));
        }
    }

    private void undo() {
        if (session != null) {
            session.undo();
        }
    }

    private void redo() {
        if (session != null) {
            session.redo();
        }
    }

    private boolean save() {
        if (session == null) {
            return true;
        }
        try {
            session.save();
            prefs.addRecent(session.projectFile());
            status.setText("Saved " + session.projectFile());
            updateTitle();
            return true;
        } catch (IOException e) {
            JOptionPane.showMessageDialog(this, "Could not save " + session.projectFile() + ":\n" + e.getMessage()
                    + "\nYour edits are still open here and in the recovery file.", "Not saved",
                    JOptionPane.ERROR_MESSAGE);
            return false;
        }
    }

    private void saveAs() {
        if (session == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser(session.projectFile().getParent().toFile());
        chooser.setSelectedFile(session.projectFile().toFile());
        if (chooser.showSaveDialog(this) == JFileChooser.APPROVE_OPTION) {
            Path target = chooser.getSelectedFile().toPath();
            if (!target.getFileName().toString().endsWith(".json")) {
                target = target.resolveSibling(target.getFileName() + ".json");
            }
            try {
                session.saveAs(target);
                prefs.addRecent(target);
                status.setText("Saved " + target);
                updateTitle();
            } catch (IOException e) {
                JOptionPane.showMessageDialog(this, e.getMessage(), "Not saved", JOptionPane.ERROR_MESSAGE);
            }
        }
    }

    // ---------------------------------------------------------------- export

    /**
     * Opens the export screen for the open project (non-modal; one per project, kept while its jobs run, so
     * closing and reopening it shows how they stand).
     */
    void showExport() {
        if (session == null) {
            status.setText("Open a video or a project first (Ctrl+O)");
            return;
        }
        if (exportDialog == null || !exportDialog.isFor(session.projectFile())) {
            if (exportDialog != null && !exportDialog.busy()) {
                exportDialog.dispose();
            }
            exportDialog = ExportDialog.forSession(this, prefs, session,
                    text -> SwingUtilities.invokeLater(() -> status.setText(text)));
        }
        exportDialog.setVisible(true);
        exportDialog.refresh();
        exportDialog.toFront();
    }

    /** The export screen, once opened (for tests). */
    ExportDialog exportDialog() {
        return exportDialog;
    }

    // ---------------------------------------------------------------- theme and help

    private void toggleTheme() {
        boolean dark = !prefs.darkTheme();
        prefs.setDarkTheme(dark);
        Themes.apply(dark);
        SwingUtilities.updateComponentTreeUI(this);
        for (java.awt.Window owned : getOwnedWindows()) {
            SwingUtilities.updateComponentTreeUI(owned);
        }
        status.setText(dark ? "Dark theme" : "Light theme");
    }

    private void showHelp() {
        ShortcutHelp.show(this, commands);
    }

    /** Opens a dropped video, image folder or project. */
    private final class DropHandler extends TransferHandler {
        @Override
        public boolean canImport(TransferSupport support) {
            return support.isDataFlavorSupported(DataFlavor.javaFileListFlavor);
        }

        @Override
        public boolean importData(TransferSupport support) {
            try {
                @SuppressWarnings("unchecked")
                List<File> files = (List<File>) support.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
                if (!files.isEmpty()) {
                    open(files.get(0).toPath());
                    return true;
                }
            } catch (java.awt.datatransfer.UnsupportedFlavorException | IOException e) {
                status.setText("Could not take the dropped file: " + e.getMessage());
            }
            return false;
        }
    }
}
