package org.modetrail.app.editor;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import java.util.function.Supplier;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JSpinner;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.KeyStroke;
import javax.swing.SpinnerNumberModel;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.WindowConstants;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;

import org.modetrail.model.Project;
import org.modetrail.picture.ColourBy;
import org.modetrail.picture.PlotFormat;
import org.modetrail.summary.MeasurementCaution;

/**
 * The editor's export screen (non-modal): the open project's tracks as CSV, COCO-style JSON or MOTChallenge text,
 * the summary, the plots and the overlay video, into one folder, with every file named before anything is
 * written. Each chosen item becomes a job on {@link ExportRunner}'s worker thread; its row shows it waiting,
 * running (frames done, time left, Cancel), done with its files, cancelled or failed with what to do. The screen
 * can be closed and opened again while jobs run; the editor stays usable meanwhile. What is written and how comes
 * from the export library (through {@link ExportPlan} and {@link ExportRunner}); this class only shows it.
 */
final class ExportDialog extends JDialog {
    private static final String[] PLOT_FORMATS = {"PNG", "SVG", "PNG and SVG"};
    private static final String[] PLOT_COLOURS = {"by class", "by track"};

    private final EditorPreferences prefs;
    private final Supplier<Project> project;
    private final Path projectFile;
    private final ExportRunner runner;
    private final Consumer<String> status;
    private final String baseName;
    private final JTextField folderField = new JTextField(40);
    private final Map<ExportItem, ExportRow> rows = new EnumMap<>(ExportItem.class);
    private final JLabel csvNote = muted("");
    private final JCheckBox cocoFrames = new JCheckBox();
    private final JComboBox<String> plotFormat = new JComboBox<>(PLOT_FORMATS);
    private final JComboBox<String> plotColour = new JComboBox<>(PLOT_COLOURS);
    private final JCheckBox groundPlots = new JCheckBox("ground paths and speed");
    private final JLabel groundReason = muted("");
    private final JSpinner overlayFrom;
    private final JSpinner overlayTo;
    private final JSpinner overlayTrail;
    private final JTextArea caution = new JTextArea("Caution: " + MeasurementCaution.TEXT);
    private final JLabel pixelsOnly = muted("No ground calibration: everything is in pixels. Edit → Calibrate the "
            + "ground… (Ctrl+K) adds metres and speeds.");
    private final JLabel problem = new JLabel(" ");
    private final JButton exportButton = new JButton("Export");
    private ExportRunner.Batch batch;
    private boolean groundWasAvailable;

    private ExportDialog(java.awt.Window owner, EditorPreferences prefs, Supplier<Project> project, Path projectFile,
                         Path videoFile, Consumer<String> status) {
        super(owner, "Export — " + ExportPlan.baseName(projectFile), ModalityType.MODELESS);
        this.prefs = prefs;
        this.project = project;
        this.projectFile = projectFile;
        this.status = status;
        this.runner = new ExportRunner(videoFile, "Modetrail " + org.modetrail.app.Version.text() + " (editor)");
        this.baseName = ExportPlan.baseName(projectFile);
        Project p = project.get();
        int last = p.video().frameCount() - 1;
        Path remembered = prefs.exportFolder(projectFile);
        ExportPlan start = ExportPlan.defaults(projectFile, p,
                remembered != null ? remembered : projectFile.toAbsolutePath().getParent());
        folderField.setText(start.folder().toString());
        overlayFrom = new JSpinner(new SpinnerNumberModel(start.overlayFrom(), 0, last, 1));
        overlayTo = new JSpinner(new SpinnerNumberModel(start.overlayTo(), 0, last, 1));
        overlayTrail = new JSpinner(new SpinnerNumberModel(start.overlayTrail(), 0, 10_000, 1));
        for (ExportItem item : ExportItem.values()) {
            ExportRow row = new ExportRow(item, this::refresh, () -> {
                if (batch != null) {
                    batch.cancel(item);
                }
            });
            row.choose.setSelected(start.items().contains(item));
            rows.put(item, row);
        }
        groundWasAvailable = ExportPlan.groundPlotsAvailable(p);
        groundPlots.setSelected(start.groundPlots());
        buildLayout();
        setDefaultCloseOperation(WindowConstants.HIDE_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowActivated(WindowEvent e) {
                refresh();
            }

            @Override
            public void windowOpened(WindowEvent e) {
                exportButton.requestFocusInWindow();
            }
        });
        getRootPane().registerKeyboardAction(e -> setVisible(false), KeyStroke.getKeyStroke("ESCAPE"),
                JComponent.WHEN_IN_FOCUSED_WINDOW);
        getRootPane().setDefaultButton(exportButton);
        refresh();
        pack();
        setLocationRelativeTo(owner);
    }

    /** The screen for the session's project; its jobs export the project as it is when Export is pressed. */
    static ExportDialog forSession(java.awt.Window owner, EditorPreferences prefs, EditorSession session,
                                   Consumer<String> status) {
        return new ExportDialog(owner, prefs, session::project, session.projectFile(), session.videoFile(), status);
    }

    /** Whether this screen exports {@code file}. */
    boolean isFor(Path file) {
        return projectFile.equals(file);
    }

    /** Whether jobs are waiting or running. */
    boolean busy() {
        return batch != null && !batch.isFinished();
    }

    @Override
    public void dispose() {
        if (batch != null) {
            batch.cancelAll();
        }
        runner.close();
        super.dispose();
    }

    // ---------------------------------------------------------------- layout

    private void buildLayout() {
        JPanel content = new JPanel(new BorderLayout(0, 10));
        content.setBorder(BorderFactory.createEmptyBorder(12, 14, 12, 14));

        JPanel folder = new JPanel(new BorderLayout(8, 4));
        JLabel folderLabel = new JLabel("Folder:");
        folder.add(folderLabel, BorderLayout.WEST);
        folderField.setName("exportFolder");
        folderField.putClientProperty("JTextField.selectAllOnFocusPolicy", "never");
        folderField.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                refresh();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                refresh();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                refresh();
            }
        });
        folder.add(folderField, BorderLayout.CENTER);
        JButton choose = new JButton("Choose…");
        choose.addActionListener(e -> chooseFolder());
        folder.add(choose, BorderLayout.EAST);
        folder.add(muted("File names start with the project's name, \"" + baseName + "\"; a file that exists is "
                + "replaced only when you agree."), BorderLayout.SOUTH);
        content.add(folder, BorderLayout.NORTH);

        // Two lines an item: its check box and options; under them its files (or its state) with, while it waits
        // or runs, the progress bar and Cancel (whose room is kept, so the screen does not jump).
        JPanel jobs = new JPanel(new GridBagLayout());
        int y = 0;
        for (ExportItem item : ExportItem.values()) {
            ExportRow r = rows.get(item);
            GridBagConstraints c = new GridBagConstraints();
            c.gridy = y;
            c.gridx = 0;
            c.anchor = GridBagConstraints.WEST;
            c.insets = new Insets(y == 0 ? 0 : 8, 0, 0, 8);
            jobs.add(r.choose, c);
            c.gridx = 1;
            c.gridwidth = 2;
            c.weightx = 1;
            c.fill = GridBagConstraints.HORIZONTAL;
            c.insets.right = 0;
            jobs.add(options(item), c);
            GridBagConstraints f = new GridBagConstraints();
            f.gridy = y + 1;
            f.gridx = 0;
            f.gridwidth = 2;
            f.weightx = 1;
            f.fill = GridBagConstraints.HORIZONTAL;
            f.anchor = GridBagConstraints.NORTHWEST;
            f.insets = new Insets(2, 28, 0, 8);
            jobs.add(r.files, f);
            f.gridx = 2;
            f.gridwidth = 1;
            f.weightx = 0;
            f.fill = GridBagConstraints.NONE;
            f.anchor = GridBagConstraints.NORTHEAST;
            f.insets = new Insets(2, 0, 0, 0);
            jobs.add(r.progress, f);
            y += 2;
        }
        jobs.setBorder(BorderFactory.createCompoundBorder(BorderFactory.createTitledBorder("What to write"),
                BorderFactory.createEmptyBorder(4, 8, 8, 8)));
        content.add(jobs, BorderLayout.CENTER);

        JPanel bottom = new JPanel(new BorderLayout(0, 8));
        caution.setName("exportCaution");
        caution.setEditable(false);
        caution.setFocusable(false);
        caution.setLineWrap(true);
        caution.setWrapStyleWord(true);
        caution.setOpaque(false);
        caution.setFont(UIManager.getFont("Label.font"));
        caution.setRows(3);
        caution.setColumns(60);
        caution.setBorder(BorderFactory.createCompoundBorder(
                BorderFactory.createMatteBorder(0, 3, 0, 0, new Color(0xE69F00)),
                BorderFactory.createEmptyBorder(2, 8, 2, 4)));
        JPanel notes = new JPanel(new BorderLayout(0, 4));
        notes.add(caution, BorderLayout.CENTER);
        notes.add(pixelsOnly, BorderLayout.SOUTH);
        bottom.add(notes, BorderLayout.NORTH);
        problem.setName("exportProblem");
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 0));
        exportButton.setName("exportStart");
        exportButton.addActionListener(e -> export());
        JButton close = new JButton("Close");
        close.setName("exportClose");
        close.addActionListener(e -> setVisible(false));
        buttons.add(exportButton);
        buttons.add(close);
        JPanel last = new JPanel(new BorderLayout(8, 0));
        last.add(problem, BorderLayout.CENTER);
        last.add(buttons, BorderLayout.EAST);
        bottom.add(last, BorderLayout.SOUTH);
        content.add(bottom, BorderLayout.SOUTH);
        setContentPane(content);
    }

    /** The options an item takes: the same as its command's. */
    private JComponent options(ExportItem item) {
        JPanel p = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        switch (item) {
            case CSV -> p.add(csvNote);
            case COCO -> {
                cocoFrames.setName("cocoFrames");
                cocoFrames.setText("also each annotated frame as PNG, in " + baseName + "-frames");
                cocoFrames.addActionListener(e -> refresh());
                p.add(cocoFrames);
            }
            case MOT -> p.add(muted("ids, frames, boxes and scores (no classes)"));
            case SUMMARY -> p.add(muted("duration, path length, speeds, time in zones, line crossings"));
            case PLOTS -> {
                plotFormat.setName("plotFormat");
                plotColour.setName("plotColour");
                groundPlots.setName("groundPlots");
                groundReason.setName("groundReason");
                plotFormat.addActionListener(e -> refresh());
                plotColour.addActionListener(e -> refresh());
                groundPlots.addActionListener(e -> refresh());
                p.add(plotFormat);
                p.add(new JLabel("colour"));
                p.add(plotColour);
                p.add(new JLabel(" paths on the image,"));
                p.add(groundPlots);
                JPanel both = new JPanel(new BorderLayout(0, 2));
                both.add(p, BorderLayout.NORTH);
                groundReason.setBorder(BorderFactory.createEmptyBorder(0, 6, 0, 0));
                both.add(groundReason, BorderLayout.SOUTH);
                return both;
            }
            case OVERLAY -> {
                overlayFrom.setName("overlayFrom");
                overlayTo.setName("overlayTo");
                overlayTrail.setName("overlayTrail");
                overlayFrom.addChangeListener(e -> refresh());
                overlayTo.addChangeListener(e -> refresh());
                overlayTrail.addChangeListener(e -> refresh());
                p.add(new JLabel("frames"));
                p.add(overlayFrom);
                p.add(new JLabel("to"));
                p.add(overlayTo);
                p.add(new JLabel(", trail"));
                p.add(overlayTrail);
                p.add(new JLabel("frames"));
            }
            default -> throw new IllegalStateException(item.name());
        }
        return p;
    }

    /** A label in the theme's quieter text colour, kept when the theme changes. */
    private static JLabel muted(String text) {
        return new JLabel(text) {
            @Override
            public void updateUI() {
                super.updateUI();
                setForeground(UIManager.getColor("Label.disabledForeground"));
            }
        };
    }

    // ---------------------------------------------------------------- state

    /** The plan the screen is set to now; throws IllegalArgumentException with a sentence when it cannot be. */
    ExportPlan plan() {
        Path folder;
        try {
            folder = Path.of(folderField.getText().strip());
        } catch (InvalidPathException e) {
            throw new IllegalArgumentException("'" + folderField.getText() + "' is not a folder name");
        }
        if (folderField.getText().isBlank()) {
            throw new IllegalArgumentException("choose a folder for the exports");
        }
        Set<ExportItem> items = EnumSet.noneOf(ExportItem.class);
        rows.forEach((item, r) -> {
            if (r.choose.isSelected()) {
                items.add(item);
            }
        });
        List<PlotFormat> formats = switch (plotFormat.getSelectedIndex()) {
            case 1 -> List.of(PlotFormat.SVG);
            case 2 -> List.of(PlotFormat.PNG, PlotFormat.SVG);
            default -> List.of(PlotFormat.PNG);
        };
        ColourBy colour = plotColour.getSelectedIndex() == 1 ? ColourBy.TRACK : ColourBy.CLASS;
        return new ExportPlan(folder.toAbsolutePath(), baseName, items, cocoFrames.isSelected(), formats, colour,
                groundPlots.isSelected() && ExportPlan.groundPlotsAvailable(project.get()), (Integer) overlayFrom.getValue(),
                (Integer) overlayTo.getValue(), (Integer) overlayTrail.getValue());
    }

    /** The state of an item's last job, or null before its first. */
    ExportJobState state(ExportItem item) {
        return rows.get(item).state();
    }

    /** Shows what the settings would write, which options the project allows and whether the caution applies. */
    void refresh() {
        Project p = project.get();
        boolean calibrated = ExportPlan.groundPlotsAvailable(p);
        if (calibrated != groundWasAvailable) {
            groundPlots.setSelected(calibrated);
            groundWasAvailable = calibrated;
        }
        groundPlots.setEnabled(calibrated && rows.get(ExportItem.PLOTS).choose.isSelected());
        groundReason.setText(ExportPlan.whyNoGroundPlots(p).map(ExportDialog::sentence).orElse(""));
        groundReason.setVisible(!calibrated);
        groundPlots.setToolTipText(ExportPlan.whyNoGroundPlots(p).orElse(null));
        csvNote.setText(calibrated ? "boxes, with ground positions, speeds and their uncertainties"
                : "boxes in pixels, sources and similarity scores");
        cocoFrames.setEnabled(rows.get(ExportItem.COCO).choose.isSelected());
        boolean plots = rows.get(ExportItem.PLOTS).choose.isSelected();
        plotFormat.setEnabled(plots);
        plotColour.setEnabled(plots);
        boolean overlay = rows.get(ExportItem.OVERLAY).choose.isSelected();
        overlayFrom.setEnabled(overlay);
        overlayTo.setEnabled(overlay);
        overlayTrail.setEnabled(overlay);
        ExportPlan plan;
        try {
            plan = plan();
        } catch (IllegalArgumentException e) {
            problem.setText(sentence(e.getMessage()));
            exportButton.setEnabled(false);
            return;
        }
        List<String> problems = plan.problems(p);
        problem.setText(problems.isEmpty() ? " " : problems.get(0));
        exportButton.setEnabled(problems.isEmpty() && !busy());
        caution.setVisible(plan.carriesSpeeds(p));
        pixelsOnly.setVisible(!calibrated);
        List<Path> existing = plan.existing();
        for (ExportRow r : rows.values()) {
            if (r.state() == null || !r.choose.isSelected() && r.state().finished()) {
                r.showPlanned(plan, existing);
            }
        }
        if (isShowing()) {
            growToFit();
        }
    }

    private static String sentence(String s) {
        String t = s.strip();
        return t.isEmpty() ? " " : Character.toUpperCase(t.charAt(0)) + t.substring(1) + (t.endsWith(".") ? "" : ".");
    }

    private void chooseFolder() {
        JFileChooser chooser = new JFileChooser(folderField.getText());
        chooser.setDialogTitle("Folder for the exports");
        chooser.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        if (chooser.showDialog(this, "Export here") == JFileChooser.APPROVE_OPTION) {
            folderField.setText(chooser.getSelectedFile().getAbsolutePath());
        }
    }

    // ---------------------------------------------------------------- running

    /** Starts the chosen jobs after asking about files they would replace. */
    private void export() {
        if (busy()) {
            return;
        }
        ExportPlan plan;
        try {
            plan = plan();
        } catch (IllegalArgumentException e) {
            problem.setText(sentence(e.getMessage()));
            return;
        }
        Project p = project.get();
        List<String> problems = plan.problems(p);
        if (!problems.isEmpty()) {
            problem.setText(problems.get(0));
            return;
        }
        List<Path> existing = plan.existing();
        boolean agreed = false;
        if (!existing.isEmpty()) {
            StringBuilder list = new StringBuilder();
            for (int i = 0; i < existing.size() && i < 8; i++) {
                list.append("\n    ").append(existing.get(i).getFileName())
                        .append(Files.isDirectory(existing.get(i)) ? "/ (its frame images)" : "");
            }
            if (existing.size() > 8) {
                list.append("\n    and ").append(existing.size() - 8).append(" more");
            }
            Object[] choices = {"Replace them", "Keep them"};
            int answer = JOptionPane.showOptionDialog(this, "These files in " + plan.folder() + " exist:" + list
                    + "\n\nReplace them with the new export, or keep them (and export nothing yet)?",
                    "Replace existing files?", JOptionPane.YES_NO_OPTION, JOptionPane.WARNING_MESSAGE, null,
                    choices, choices[1]);
            agreed = answer == 0;
        }
        if (!plan.mayWrite(agreed)) {
            problem.setText("Nothing written: choose another folder, or agree to replace the files.");
            return;
        }
        prefs.setExportFolder(projectFile, plan.folder());
        problem.setText(" ");
        for (ExportRow r : rows.values()) {
            if (plan.items().contains(r.item)) {
                r.clear();
            }
        }
        batch = runner.start(p, plan, new ExportRunner.Listener() {
            @Override
            public void changed(ExportItem item, ExportJobState state) {
                SwingUtilities.invokeLater(() -> show(item, state));
            }

            @Override
            public void batchFinished() {
                SwingUtilities.invokeLater(() -> finished());
            }
        });
        exportButton.setEnabled(false);
    }

    private void show(ExportItem item, ExportJobState s) {
        rows.get(item).show(s, plannedNames(item));
        growToFit();
    }

    /** The batch is over: Export again, and the editor's status line says how it went. */
    private void finished() {
        status.accept(summaryLine());
        refresh();
    }

    /**
     * Grows the screen when its content needs more room (a longer note, a state that wraps onto another line, the
     * caution shown); it never shrinks under the user. Twice at most, since wrapped text is as high as it is wide.
     */
    private void growToFit() {
        for (int i = 0; i < 2; i++) {
            getContentPane().invalidate();
            validate();
            Dimension wanted = getPreferredSize();
            if (wanted.width <= getWidth() && wanted.height <= getHeight()) {
                return;
            }
            setSize(Math.max(getWidth(), wanted.width), Math.max(getHeight(), wanted.height));
            validate();
        }
    }

    private String plannedNames(ExportItem item) {
        try {
            return String.join(", ", plan().files(item).stream().map(f -> f.getFileName().toString()).toList());
        } catch (IllegalArgumentException e) {
            return item.label();
        }
    }

    private String summaryLine() {
        int done = 0, failed = 0, cancelled = 0;
        for (ExportRow r : rows.values()) {
            if (r.state() != null) {
                switch (r.state().stage()) {
                    case DONE -> done++;
                    case FAILED -> failed++;
                    case CANCELLED -> cancelled++;
                    default -> { }
                }
            }
        }
        return "Export: " + done + " done" + (failed > 0 ? ", " + failed + " failed (see the export screen, Ctrl+E)"
                : "") + (cancelled > 0 ? ", " + cancelled + " cancelled" : "");
    }
}
