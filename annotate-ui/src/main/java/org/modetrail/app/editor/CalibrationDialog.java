package org.modetrail.app.editor;

import java.awt.BasicStroke;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Window;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import javax.swing.AbstractAction;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.KeyStroke;
import javax.swing.ListSelectionModel;
import javax.swing.WindowConstants;
import javax.swing.table.DefaultTableCellRenderer;

import org.modetrail.model.Edit;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;

/**
 * The ground calibration screen: the frame, large, with the points on it (click to add one, drag to move it, Delete
 * to remove the selected one; the wheel zooms about the cursor, a middle or right drag pans, F fits), the table of points where the user types each point's ground position, the fit's
 * errors and warnings, and, once a fit exists, the ground grid drawn over the picture. "Store in project" hands the
 * calibration to {@code store} (the window applies it through the session, so it can be undone).
 */
final class CalibrationDialog extends JDialog {
    private final CalibrationTableModel model = new CalibrationTableModel();
    private final Canvas canvas;
    private final JTable table = new JTable(model);
    private final JTextArea message = new JTextArea(5, 40);
    private final JButton fitButton = new JButton("Fit");
    private final JButton deleteButton = new JButton("Delete point");
    private final JButton storeButton = new JButton("Store in project");

    /**
     * @param owner    the editor window
     * @param frame    the picture to calibrate on
     * @param existing the project's calibration, whose points are loaded; null for none
     * @param store    takes the calibration when the user stores it
     */
    CalibrationDialog(Window owner, BufferedImage frame, GroundCalibration existing,
                      Consumer<GroundCalibration> store) {
        super(owner, "Ground calibration", ModalityType.MODELESS);
        setName("calibrationDialog");
        setDefaultCloseOperation(WindowConstants.DISPOSE_ON_CLOSE);
        canvas = new Canvas(frame);
        canvas.setName("calibrationCanvas");
        table.setName("calibrationTable");
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        DefaultTableCellRenderer numbers = new DefaultTableCellRenderer() {
            @Override
            protected void setValue(Object value) {
                setText(value instanceof Double d ? String.format(Locale.ROOT, "%.3f", d) : "");
            }
        };
        numbers.setHorizontalAlignment(DefaultTableCellRenderer.RIGHT);
        table.setDefaultRenderer(Double.class, numbers);
        table.setDefaultRenderer(Boolean.class, new DefaultTableCellRenderer() {
            @Override
            protected void setValue(Object value) {
                setText(value == null ? "" : (Boolean) value ? "yes" : "no");
            }
        });
        table.getSelectionModel().addListSelectionListener(e -> canvas.repaint());
        message.setName("calibrationMessage");
        message.setEditable(false);
        message.setLineWrap(true);
        message.setWrapStyleWord(true);
        message.setBorder(BorderFactory.createEmptyBorder(4, 6, 4, 6));

        fitButton.setName("fit");
        fitButton.addActionListener(e -> {
            stopEditing();
            model.fit();
        });
        deleteButton.setName("deletePoint");
        deleteButton.addActionListener(e -> deleteSelected());
        storeButton.setName("store");
        storeButton.addActionListener(e -> model.calibration().ifPresent(store));
        model.addFitListener(this::fitChanged);

        AbstractAction delete = new AbstractAction("delete") {
            @Override
            public void actionPerformed(ActionEvent e) {
                deleteSelected();
            }
        };
        for (JComponent c : List.of(canvas, table)) {
            c.getInputMap(JComponent.WHEN_FOCUSED).put(KeyStroke.getKeyStroke(KeyEvent.VK_DELETE, 0), "delete");
            c.getActionMap().put("delete", delete);
        }

        JPanel buttons = new JPanel();
        buttons.add(fitButton);
        buttons.add(deleteButton);
        buttons.add(storeButton);
        JPanel side = new JPanel(new BorderLayout());
        side.add(new JScrollPane(table), BorderLayout.CENTER);
        JPanel bottom = new JPanel(new BorderLayout());
        bottom.add(new JScrollPane(message), BorderLayout.CENTER);
        bottom.add(buttons, BorderLayout.SOUTH);
        side.add(bottom, BorderLayout.SOUTH);
        side.setPreferredSize(new Dimension(520, 400));
        canvas.setPreferredSize(new Dimension(800, 480));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, canvas, side);
        split.setResizeWeight(1);
        getContentPane().add(split);
        if (existing != null) {
            model.load(existing);
        } else {
            fitChanged();
        }
        pack();
        setLocationRelativeTo(owner);
    }

    /** A dialog whose "Store in project" applies the calibration to the session's project, undoably. */
    static CalibrationDialog forSession(Window owner, BufferedImage frame, EditorSession session) {
        GroundCalibration existing = session.project().site().groundCalibration().orElse(null);
        return new CalibrationDialog(owner, frame, existing, c -> session.apply(storeEdit(session.project(), c)));
    }

    /** The edit that puts {@code c} into the project as its ground calibration; nothing to track again. */
    static Edit storeEdit(Project p, GroundCalibration c) {
        return new Edit(p.withSite(p.site().withCalibration(c)), 0, 0, 0, false);
    }

    CalibrationTableModel model() {
        return model;
    }

    JTable table() {
        return table;
    }

    Canvas canvas() {
        return canvas;
    }

    JTextArea messageArea() {
        return message;
    }

    private void fitChanged() {
        message.setText(model.message());
        message.setCaretPosition(0);
        storeButton.setEnabled(model.calibration().isPresent());
        message.setForeground(model.calibration().isPresent() ? null : new Color(0xB0, 0x30, 0x20));
        canvas.refit();
    }

    private void stopEditing() {
        if (table.isEditing()) {
            table.getCellEditor().stopCellEditing();
        }
    }

    private void deleteSelected() {
        int r = table.getSelectedRow();
        if (r >= 0) {
            if (table.isEditing()) {
                table.getCellEditor().cancelCellEditing();
            }
            model.remove(table.convertRowIndexToModel(r));
        }
    }

    private void select(int row) {
        stopEditing();
        if (row < 0) {
            table.clearSelection();
        } else {
            table.setRowSelectionInterval(row, row);
            table.scrollRectToVisible(table.getCellRect(row, 0, true));
        }
    }

    /**
     * The picture with the points and, once fitted, the ground grid: fitted to the panel until the user zooms (the
     * wheel, about the cursor, to place a point on the pixel) or pans (middle or right button drag); F fits again.
     */
    final class Canvas extends JComponent {
        /** View pixels within which a press picks up a point instead of adding one. */
        private static final double PICK = 8;
        /** Zoom per wheel notch. */
        private static final double ZOOM_STEP = 1.25;
        private static final ViewTransform.Limits LIMITS = new ViewTransform.Limits(0.01, 32, 64);
        private final BufferedImage image;
        private GroundGrid grid;
        private int dragging = -1;
        /** The view the user zoomed or panned to; null while the picture follows the panel's size. */
        private ViewTransform zoomed;
        private int panX;
        private int panY;
        private boolean panning;

        Canvas(BufferedImage image) {
            this.image = image;
            setFocusable(true);
            setOpaque(true);
            MouseAdapter mouse = new MouseAdapter() {
                @Override
                public void mousePressed(MouseEvent e) {
                    requestFocusInWindow();
                    if (e.getButton() == MouseEvent.BUTTON2 || e.getButton() == MouseEvent.BUTTON3) {
                        panning = true;
                        panX = e.getX();
                        panY = e.getY();
                        setCursor(java.awt.Cursor.getPredefinedCursor(java.awt.Cursor.MOVE_CURSOR));
                        return;
                    }
                    if (e.getButton() != MouseEvent.BUTTON1) {
                        return;
                    }
                    ViewTransform t = transform();
                    int hit = pick(t, e.getX(), e.getY());
                    if (hit >= 0) {
                        dragging = hit;
                        select(hit);
                        return;
                    }
                    double ix = t.toImageX(e.getX());
                    double iy = t.toImageY(e.getY());
                    if (ix < 0 || iy < 0 || ix > image.getWidth() || iy > image.getHeight()) {
                        return;
                    }
                    select(model.add(new PixelPoint(ix, iy)));
                }

                @Override
                public void mouseDragged(MouseEvent e) {
                    if (panning) {
                        zoomed = transform().panBy(e.getX() - panX, e.getY() - panY);
                        panX = e.getX();
                        panY = e.getY();
                        repaint();
                        return;
                    }
                    if (dragging >= 0) {
                        model.move(dragging, imagePoint(e), false);
                        repaint();
                    }
                }

                @Override
                public void mouseReleased(MouseEvent e) {
                    if (panning) {
                        panning = false;
                        setCursor(null);
                        return;
                    }
                    if (dragging >= 0) {
                        int r = dragging;
                        dragging = -1;
                        model.move(r, imagePoint(e), true);
                    }
                }
            };
            addMouseListener(mouse);
            addMouseMotionListener(mouse);
            addMouseWheelListener(e -> zoomAbout(Math.pow(ZOOM_STEP, -e.getPreciseWheelRotation()), e.getX(),
                    e.getY()));
            getInputMap(JComponent.WHEN_FOCUSED).put(KeyStroke.getKeyStroke(KeyEvent.VK_F, 0), "fit");
            getActionMap().put("fit", new AbstractAction("fit") {
                @Override
                public void actionPerformed(ActionEvent e) {
                    fitToPanel();
                }
            });
        }

        /** How the picture is shown now: as the user zoomed and panned it, else the whole frame fitted. */
        ViewTransform transform() {
            int w = Math.max(1, getWidth());
            int h = Math.max(1, getHeight());
            return zoomed != null ? zoomed.clamped(image.getWidth(), image.getHeight(), w, h, LIMITS)
                    : ViewTransform.fit(image.getWidth(), image.getHeight(), w, h, LIMITS);
        }

        /** Zooms by {@code factor} about a view point: the picture's point under it stays under it. */
        void zoomAbout(double factor, double viewX, double viewY) {
            zoomed = transform().zoomAbout(factor, viewX, viewY, LIMITS);
            repaint();
        }

        /** Back to the whole frame, following the panel's size. */
        void fitToPanel() {
            zoomed = null;
            repaint();
        }

        Optional<GroundGrid> grid() {
            return Optional.ofNullable(grid);
        }

        void refit() {
            grid = model.calibration().map(GroundGrid::of).orElse(null);
            repaint();
        }

        private PixelPoint imagePoint(MouseEvent e) {
            ViewTransform t = transform();
            double ix = Math.max(0, Math.min(image.getWidth(), t.toImageX(e.getX())));
            double iy = Math.max(0, Math.min(image.getHeight(), t.toImageY(e.getY())));
            return new PixelPoint(ix, iy);
        }

        private int pick(ViewTransform t, double vx, double vy) {
            int best = -1;
            double bestD = PICK;
            List<CalibrationTableModel.Row> rows = model.rows();
            for (int i = 0; i < rows.size(); i++) {
                PixelPoint p = rows.get(i).image();
                double d = Math.hypot(t.toViewX(p.x()) - vx, t.toViewY(p.y()) - vy);
                if (d <= bestD) {
                    bestD = d;
                    best = i;
                }
            }
            return best;
        }

        @Override
        protected void paintComponent(Graphics g0) {
            Graphics2D g = (Graphics2D) g0.create();
            try {
                g.setColor(new Color(0x20, 0x20, 0x20));
                g.fillRect(0, 0, getWidth(), getHeight());
                ViewTransform t = transform();
                // Zoomed in past 2x, pixels show as squares, so a point can be put on the pixel it belongs to.
                g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, t.scale() >= FrameView.CRISP_FROM
                        ? RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR
                        : RenderingHints.VALUE_INTERPOLATION_BILINEAR);
                g.drawImage(image, t.toAffine(), null);
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                g.clipRect((int) Math.floor(t.toViewX(0)), (int) Math.floor(t.toViewY(0)),
                        (int) Math.ceil(image.getWidth() * t.scale()), (int) Math.ceil(image.getHeight() * t.scale()));
                if (grid != null) {
                    paintGrid(g, t);
                }
                paintPoints(g, t);
            } finally {
                g.dispose();
            }
        }

        private void paintGrid(Graphics2D g, ViewTransform t) {
            Line2D.Double line = new Line2D.Double();
            BasicStroke halo = new BasicStroke(3.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            BasicStroke haloMajor = new BasicStroke(4.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            BasicStroke thin = new BasicStroke(1.1f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            BasicStroke major = new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            g.setColor(new Color(0, 0, 0, 110));
            for (GroundGrid.Segment s : grid.segments()) {
                g.setStroke(s.major() ? haloMajor : halo);
                g.draw(view(t, s, line));
            }
            for (GroundGrid.Segment s : grid.segments()) {
                g.setStroke(s.major() ? major : thin);
                g.setColor(s.major() ? new Color(255, 230, 90, 235) : new Color(120, 235, 255, 200));
                g.draw(view(t, s, line));
            }
        }

        private static Line2D.Double view(ViewTransform t, GroundGrid.Segment s, Line2D.Double out) {
            out.setLine(t.toViewX(s.a().x()), t.toViewY(s.a().y()), t.toViewX(s.b().x()), t.toViewY(s.b().y()));
            return out;
        }

        private void paintPoints(Graphics2D g, ViewTransform t) {
            List<CalibrationTableModel.Row> rows = model.rows();
            int selected = table.getSelectedRow();
            g.setFont(getFont() == null ? new Font(Font.SANS_SERIF, Font.BOLD, 12)
                    : getFont().deriveFont(Font.BOLD, 12f));
            for (int i = 0; i < rows.size(); i++) {
                PixelPoint p = rows.get(i).image();
                double x = t.toViewX(p.x());
                double y = t.toViewY(p.y());
                boolean bad = model.error(i) != null && !model.error(i).inlier();
                Color fill = !rows.get(i).complete() ? new Color(0xFF, 0xA0, 0x30)
                        : bad ? new Color(0xFF, 0x40, 0x40) : new Color(0x40, 0xE0, 0x70);
                double r = i == selected ? 6 : 4.5;
                Ellipse2D.Double dot = new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r);
                g.setColor(Color.BLACK);
                g.setStroke(new BasicStroke(3f));
                g.draw(dot);
                g.setColor(fill);
                g.fill(dot);
                if (i == selected) {
                    g.setColor(Color.WHITE);
                    g.setStroke(new BasicStroke(1.5f));
                    g.draw(dot);
                }
                String label = Integer.toString(i + 1);
                float lx = (float) (x + r + 3);
                float ly = (float) (y - r - 1);
                g.setColor(Color.BLACK);
                for (int dx = -1; dx <= 1; dx++) {
                    for (int dy = -1; dy <= 1; dy++) {
                        g.drawString(label, lx + dx, ly + dy);
                    }
                }
                g.setColor(Color.WHITE);
                g.drawString(label, lx, ly);
            }
        }
    }
}
