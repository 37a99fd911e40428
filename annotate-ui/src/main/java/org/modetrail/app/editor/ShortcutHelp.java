package org.modetrail.app.editor;

import java.awt.BorderLayout;
import java.awt.Font;
import java.awt.event.KeyEvent;
import java.util.List;

import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.KeyStroke;
import javax.swing.table.DefaultTableModel;

/** The list of every command and its key, over the window (F1 opens it, Escape or F1 closes it). */
final class ShortcutHelp {
    /** What the mouse and the canvas's own keys do. */
    static final String[][] MOUSE = {
        {"Frame", "Start a track: drag a box on empty space", "Drag"},
        {"Frame", "Select a track", "Click its box"},
        {"Frame", "Move or resize the selected box", "Drag it or a handle"},
        {"Frame", "Zoom about the pointer", "Wheel"},
        {"Frame", "Pan", "Space+drag, middle drag"},
        {"Frame", "Fit the frame to the window", "F, double-click"},
        {"Frame", "Drop the drag under way", "Escape"},
        {"Frame", "Select a zone or counting line", "Click its outline, or inside a zone"},
        {"Frame", "Move a corner or end of the selected zone or line", "Drag it"},
        {"Frame", "Move the whole zone or line", "Drag its outline"},
        {"Zone tool", "Add a corner", "Click"},
        {"Zone tool", "Close the zone", "Click the first corner, double-click, Enter"},
        {"Zone tool", "Take back the last corner", "Backspace"},
        {"Zone and line tools", "Cancel the drawing", "Escape"},
        {"Line tool", "Draw the line", "Drag from end to end, or click both ends"},
        {"Timeline", "Go to a frame, select a track", "Click a lane"},
        {"Timeline", "Zoom, scroll", "Wheel, Shift+Wheel"}};

    private ShortcutHelp() {
    }

    static JDialog show(JFrame owner, List<EditorWindow.Command> commands) {
        DefaultTableModel model = new DefaultTableModel(new Object[] {"Menu", "Command", "Key"}, 0) {
            @Override
            public boolean isCellEditable(int row, int column) {
                return false;
            }
        };
        for (EditorWindow.Command c : commands) {
            model.addRow(new Object[] {c.menu(), c.name(), keyText(c.key())});
        }
        for (String[] row : MOUSE) {
            model.addRow(row);
        }
        JTable table = new JTable(model);
        table.setName("shortcuts");
        table.setFillsViewportHeight(true);
        table.getColumnModel().getColumn(1).setPreferredWidth(380);
        JDialog d = new JDialog(owner, "Keys", false);
        JLabel hint = new JLabel("<html>Draw a box on the frame to start a track; drag a box or its handles to "
                + "correct it (it becomes a keyframe and only the frames around it are tracked again). Every command "
                + "has a key:</html>");
        hint.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        hint.setFont(hint.getFont().deriveFont(Font.PLAIN));
        d.getContentPane().add(hint, BorderLayout.NORTH);
        d.getContentPane().add(new JScrollPane(table), BorderLayout.CENTER);
        for (String key : new String[] {"ESCAPE", "F1"}) {
            d.getRootPane().registerKeyboardAction(e -> d.dispose(), KeyStroke.getKeyStroke(key),
                    JComponent.WHEN_IN_FOCUSED_WINDOW);
        }
        d.setSize(640, 560);
        d.setLocationRelativeTo(owner);
        d.setVisible(true);
        return d;
    }

    static String keyText(KeyStroke k) {
        String mods = KeyEvent.getModifiersExText(k.getModifiers());
        String key = KeyEvent.getKeyText(k.getKeyCode());
        return mods.isEmpty() ? key : mods + "+" + key;
    }
}
