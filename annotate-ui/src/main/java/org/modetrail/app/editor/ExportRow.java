package org.modetrail.app.editor;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.UIManager;

import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.util.UIScale;

/**
 * One item's row on the export screen: its check box; under it the files it will write, or, once started, its
 * state in words (waiting, writing, done with the files and folder, failed with what to do, cancelled), beside a
 * progress bar with Cancel while it waits or runs. The bar's room is kept when it is hidden so the screen does not
 * jump.
 */
final class ExportRow {
    /** Where the second line wraps, in CSS pixels (Swing's HTML draws them a third wider on screen). */
    private static final int WRAP_WIDTH = 440;

    final ExportItem item;
    final JCheckBox choose;
    final JLabel files = new JLabel(" ");
    final JProgressBar bar = new JProgressBar(0, 1000);
    final JButton cancel = new JButton("Cancel");
    /** The bar and Cancel, or nothing in the same room. */
    final JPanel progress = new JPanel(new CardLayout());
    private ExportJobState state;

    ExportRow(ExportItem item, Runnable toggled, Runnable cancelled) {
        this.item = item;
        choose = new JCheckBox(item.label());
        choose.setName("export." + item.name());
        choose.addActionListener(e -> toggled.run());
        files.setName("exportFiles." + item.name());
        bar.setName("exportBar." + item.name());
        bar.setStringPainted(true);
        bar.setString("");
        bar.setPreferredSize(new Dimension(UIScale.scale(230), cancel.getPreferredSize().height));
        cancel.setName("exportCancel." + item.name());
        cancel.setEnabled(false);
        cancel.addActionListener(e -> {
            cancelled.run();
            cancel.setEnabled(false);
            bar.setString("cancelling…");
        });
        JPanel shown = new JPanel(new BorderLayout(6, 0));
        shown.add(bar, BorderLayout.CENTER);
        shown.add(cancel, BorderLayout.EAST);
        progress.add(new JPanel(), "idle");
        progress.add(shown, "shown");
        progress.setMinimumSize(shown.getPreferredSize());
    }

    /** The state of its last job, or null before one (or once the row shows its plan again). */
    ExportJobState state() {
        return state;
    }

    /** Forgets the last job's state (a new one is about to start). */
    void clear() {
        state = null;
    }

    /** Shows the files the plan would write here, and whether some exist. */
    void showPlanned(ExportPlan plan, List<Path> existing) {
        state = null;
        showProgress(false);
        cancel.setEnabled(false);
        List<String> names = new ArrayList<>();
        boolean exists = false;
        for (Path f : plan.files(item)) {
            names.add(f.getFileName().toString());
            exists |= existing.contains(f);
        }
        if (item == ExportItem.COCO && plan.cocoFrames()) {
            names.add(plan.framesFolder().orElseThrow().getFileName() + "/frame_NNNNNN.png");
            exists |= existing.contains(plan.framesFolder().orElseThrow());
        }
        boolean chosen = choose.isSelected();
        files.setForeground(UIManager.getColor(chosen ? "Label.foreground" : "Label.disabledForeground"));
        files.setText(wrapped("", (chosen ? "will write " : "would write ") + String.join(", ", names)
                + (chosen && exists ? "  — exists; you will be asked before it is replaced" : "")));
        files.setToolTipText(plan.folder().toString());
    }

    /**
     * Shows a job's state; a progress report that arrives after the job's end is ignored.
     *
     * @param names the files being written, for the running line
     */
    void show(ExportJobState s, String names) {
        if (state != null && state.finished() && !s.finished()) {
            return;
        }
        state = s;
        showProgress(true);
        cancel.setEnabled(!s.finished());
        cancel.setVisible(!s.finished());
        bar.setIndeterminate(s.stage() == ExportJobState.Stage.RUNNING && s.total() == 0);
        bar.setValue(s.finished() ? (s.stage() == ExportJobState.Stage.DONE ? 1000 : 0)
                : s.total() == 0 ? 0 : (int) (1000L * s.done() / s.total()));
        bar.setString(s.shortText());
        files.setForeground(UIManager.getColor("Label.foreground"));
        files.setToolTipText(null);
        switch (s.stage()) {
            case WAITING -> files.setText(wrapped("", "waiting for the jobs before it"));
            case RUNNING -> files.setText(wrapped("", "writing " + names + "…"));
            case DONE -> {
                files.setText(wrapped("Done:", String.join(", ", s.files().stream()
                        .map(f -> f.getFileName().toString()).toList()) + " in " + s.files().get(0).getParent()
                        + (s.message().isEmpty() ? "" : " — " + s.message())));
                files.setToolTipText(s.files().get(0).toString());
            }
            case FAILED -> {
                files.setForeground(FlatLaf.isLafDark() ? new Color(0xFF8A80) : new Color(0xB00020));
                files.setText(wrapped("Failed:", s.message()));
            }
            case CANCELLED -> files.setText(wrapped("Cancelled:", s.message()));
            default -> throw new IllegalStateException(s.stage().name());
        }
    }

    private void showProgress(boolean on) {
        ((CardLayout) progress.getLayout()).show(progress, on ? "shown" : "idle");
    }

    /** HTML wrapped at a fixed width, so the screen does not widen with long paths. */
    private static String wrapped(String boldPrefix, String text) {
        return "<html><body style='width:" + UIScale.scale(WRAP_WIDTH) + "px'>" + (boldPrefix.isEmpty() ? ""
                : "<b>" + escape(boldPrefix) + "</b> ") + escape(text) + "</body></html>";
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
