package org.modetrail.app.editor;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.Graphics;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CopyOnWriteArrayList;

import javax.swing.Icon;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.SwingConstants;
import javax.swing.UIManager;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.TableRowSorter;

import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.quality.TrackQuality;
import org.modetrail.quality.TrackQualitySummary;

/**
 * The project's tracks in a sortable table: id, class (with its colour), frames with a box, keyframes, the mean
 * similarity of the tracked frames and the number of places to check, both from {@link TrackQualitySummary}.
 * Choosing a row tells the listeners; {@link #setSelectedTrack(Integer)} selects a row without telling them. Use
 * on the event thread.
 */
public final class TrackListPanel extends JPanel {
    /** What the list tells the window. */
    public interface Listener {
        /** The user chose the row of track {@code trackId}. */
        void trackChosen(int trackId);
    }

    /** A class as the table shows it; sorts by name. */
    public record ClassCell(String name, int colour) implements Comparable<ClassCell> {
        @Override
        public int compareTo(ClassCell o) {
            return name.compareTo(o.name);
        }

        @Override
        public String toString() {
            return name;
        }
    }

    /** One row: a track and what its quality summary says. */
    public record Row(int trackId, ClassCell objectClass, int boxes, int keyframes, Double meanSimilarity,
                      int concerns) {
    }

    static final int COL_ID = 0;
    static final int COL_CLASS = 1;
    static final int COL_BOXES = 2;
    static final int COL_KEYFRAMES = 3;
    static final int COL_SIMILARITY = 4;
    static final int COL_CONCERNS = 5;
    private static final String[] NAMES = {"Track", "Class", "Boxes", "Keyframes", "Mean similarity", "To check"};
    private static final Class<?>[] TYPES = {Integer.class, ClassCell.class, Integer.class, Integer.class,
        Double.class, Integer.class};

    private final TrackQualitySummary summary;
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private final Model model = new Model();
    private final JTable table = new JTable(model);
    private Map<Track, TrackQuality> qualities = new IdentityHashMap<>();
    private int frameCount = -1;
    private boolean quiet;

    public TrackListPanel() {
        this(TrackQualitySummary.defaults());
    }

    public TrackListPanel(TrackQualitySummary summary) {
        super(new BorderLayout());
        if (summary == null) {
            throw new IllegalArgumentException("the track list needs its quality summary settings");
        }
        this.summary = summary;
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setFillsViewportHeight(true);
        table.setAutoCreateRowSorter(false);
        TableRowSorter<Model> sorter = new TableRowSorter<>(model);
        sorter.setComparator(COL_CLASS, Comparator.naturalOrder());
        table.setRowSorter(sorter);
        table.getColumnModel().getColumn(COL_CLASS).setCellRenderer(new ClassRenderer());
        table.getColumnModel().getColumn(COL_SIMILARITY).setCellRenderer(new SimilarityRenderer());
        table.getColumnModel().getColumn(COL_ID).setPreferredWidth(50);
        table.getColumnModel().getColumn(COL_CLASS).setPreferredWidth(110);
        table.getColumnModel().getColumn(COL_SIMILARITY).setPreferredWidth(110);
        table.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && !quiet) {
                Integer id = selectedTrack();
                if (id != null) {
                    for (Listener l : listeners) {
                        l.trackChosen(id);
                    }
                }
            }
        });
        add(new JScrollPane(table), BorderLayout.CENTER);
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public void removeListener(Listener l) {
        listeners.remove(l);
    }

    /** Lists {@code p}'s tracks over a video of {@code frameCount} frames, keeping the selected track selected. */
    public void setProject(Project p, int frameCount) {
        Map<Track, TrackQuality> reused = frameCount == this.frameCount ? qualities : Map.of();
        Map<Track, TrackQuality> next = new IdentityHashMap<>();
        for (Track t : p == null ? List.<Track>of() : p.tracks()) {
            TrackQuality q = reused.get(t);
            next.put(t, q != null ? q : summary.of(t, frameCount));
        }
        show(p, frameCount, next::get);
    }

    /** Lists a project whose quality summaries were worked out already (off the event thread). */
    public void setDigest(ProjectDigest d) {
        show(d.project(), d.frameCount(), d::quality);
    }

    private void show(Project p, int frameCount, java.util.function.Function<Track, TrackQuality> qualityOf) {
        Integer selected = selectedTrack();
        Map<Track, TrackQuality> next = new IdentityHashMap<>();
        List<Row> rows = new ArrayList<>();
        for (Track t : p == null ? List.<Track>of() : p.tracks()) {
            TrackQuality q = qualityOf.apply(t);
            next.put(t, q);
            int colour = p.objectClass(t.className()).map(ObjectClass::colour).orElse(0x999999);
            rows.add(new Row(t.id(), new ClassCell(t.className(), colour), q.keyframes() + q.tracked()
                    + q.interpolated(), q.keyframes(), q.tracked() > 0 ? q.meanScore() : null,
                    q.concerns().size()));
        }
        qualities = next;
        this.frameCount = frameCount;
        quiet = true;
        try {
            model.setRows(rows);
            select(selected);
        } finally {
            quiet = false;
        }
    }

    /** Selects the row of track {@code id} (none for null or an unknown id) without telling the listeners. */
    public void setSelectedTrack(Integer id) {
        quiet = true;
        try {
            select(id);
        } finally {
            quiet = false;
        }
    }

    /** The track of the selected row, or null. */
    public Integer selectedTrack() {
        int view = table.getSelectedRow();
        return view < 0 ? null : model.rows.get(table.convertRowIndexToModel(view)).trackId();
    }

    /** The rows in model order (the project's track order). */
    public List<Row> rows() {
        return List.copyOf(model.rows);
    }

    /** The table, for layout and tests. */
    public JTable table() {
        return table;
    }

    private void select(Integer id) {
        int modelRow = -1;
        if (id != null) {
            for (int i = 0; i < model.rows.size(); i++) {
                if (model.rows.get(i).trackId() == id) {
                    modelRow = i;
                }
            }
        }
        if (modelRow < 0) {
            table.clearSelection();
            return;
        }
        int view = table.convertRowIndexToView(modelRow);
        table.setRowSelectionInterval(view, view);
        table.scrollRectToVisible(table.getCellRect(view, 0, true));
    }

    private static final class Model extends AbstractTableModel {
        private List<Row> rows = List.of();

        void setRows(List<Row> r) {
            rows = List.copyOf(r);
            fireTableDataChanged();
        }

        @Override
        public int getRowCount() {
            return rows.size();
        }

        @Override
        public int getColumnCount() {
            return NAMES.length;
        }

        @Override
        public String getColumnName(int column) {
            return NAMES[column];
        }

        @Override
        public Class<?> getColumnClass(int column) {
            return TYPES[column];
        }

        @Override
        public Object getValueAt(int row, int column) {
            Row r = rows.get(row);
            return switch (column) {
                case COL_ID -> r.trackId();
                case COL_CLASS -> r.objectClass();
                case COL_BOXES -> r.boxes();
                case COL_KEYFRAMES -> r.keyframes();
                case COL_SIMILARITY -> r.meanSimilarity();
                case COL_CONCERNS -> r.concerns();
                default -> throw new IllegalArgumentException("no column " + column);
            };
        }
    }

    /** The class name after a square of its colour. */
    private static final class ClassRenderer extends DefaultTableCellRenderer {
        private final Swatch swatch = new Swatch();

        @Override
        public Component getTableCellRendererComponent(JTable table, Object value, boolean isSelected,
                                                       boolean hasFocus, int row, int column) {
            JLabel l = (JLabel) super.getTableCellRendererComponent(table, value, isSelected, hasFocus, row, column);
            swatch.colour = value instanceof ClassCell c ? new Color(c.colour()) : null;
            l.setIcon(swatch.colour == null ? null : swatch);
            l.setIconTextGap(6);
            return l;
        }
    }

    private static final class Swatch implements Icon {
        private Color colour;

        @Override
        public void paintIcon(Component c, Graphics g, int x, int y) {
            g.setColor(colour);
            g.fillRect(x, y, 10, 10);
            Color edge = UIManager.getColor("Label.foreground");
            g.setColor(edge == null ? Color.BLACK : edge);
            g.drawRect(x, y, 10, 10);
        }

        @Override
        public int getIconWidth() {
            return 11;
        }

        @Override
        public int getIconHeight() {
            return 11;
        }
    }

    /** Two decimals, or a dash for a track with no tracked frames. */
    private static final class SimilarityRenderer extends DefaultTableCellRenderer {
        SimilarityRenderer() {
            setHorizontalAlignment(SwingConstants.RIGHT);
        }

        @Override
        protected void setValue(Object value) {
            setText(value instanceof Double d ? String.format(Locale.ROOT, "%.2f", d) : "–");
        }
    }
}
