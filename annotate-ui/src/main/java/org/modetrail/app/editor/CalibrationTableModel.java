package org.modetrail.app.editor;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import javax.swing.table.AbstractTableModel;

import org.modetrail.calibration.HomographyFit;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.PointError;
import org.modetrail.model.WorldPoint;

/**
 * The calibration screen's points and their latest fit, as a table: image x, image y, ground x, ground y (the last
 * two typed by the user, empty until then), then the fit's error in pixels and metres and whether the fit used the
 * point. The fitting itself is {@link HomographyFit}'s; this only collects the complete rows, hands them over and
 * keeps what came back (the calibration, or the message saying why there is none). Every change of the points
 * refits automatically once 4 rows are complete (unless the change asks not to, as a drag in progress does).
 * Headless-safe: no component, only a table model.
 */
final class CalibrationTableModel extends AbstractTableModel {
    /** One point: where it was clicked, and its ground position once typed (null until then). */
    record Row(PixelPoint image, Double groundX, Double groundY) {
        Row {
            if (image == null) {
                throw new IllegalArgumentException("a calibration row needs its image point");
            }
        }

        boolean complete() {
            return groundX != null && groundY != null;
        }
    }

    static final int IMAGE_X = 0;
    static final int IMAGE_Y = 1;
    static final int GROUND_X = 2;
    static final int GROUND_Y = 3;
    static final int ERROR_PX = 4;
    static final int ERROR_M = 5;
    static final int USED = 6;
    private static final String[] NAMES = {"image x", "image y", "ground x m", "ground y m", "error px", "error m",
        "used"};

    private final List<Row> rows = new ArrayList<>();
    private GroundCalibration fit;
    /** For each row, its index among the fitted points, or -1 (incomplete rows are not fitted). */
    private int[] fitIndex = new int[0];
    private String message = "";
    private final List<Runnable> fitListeners = new ArrayList<>();

    /** Runs after every fit attempt or change of the fit (message, calibration). */
    void addFitListener(Runnable r) {
        fitListeners.add(r);
    }

    /** Replaces the points with a stored calibration's, its fit shown as stored. */
    void load(GroundCalibration c) {
        rows.clear();
        for (GroundPoint p : c.points()) {
            rows.add(new Row(p.image(), p.world().x(), p.world().y()));
        }
        fireTableDataChanged();
        fit();
    }

    List<Row> rows() {
        return List.copyOf(rows);
    }

    Row row(int i) {
        return rows.get(i);
    }

    /** Adds a point at an image position, ground position still to type; returns its row. */
    int add(PixelPoint image) {
        rows.add(new Row(image, null, null));
        int r = rows.size() - 1;
        fireTableRowsInserted(r, r);
        changed(true);
        return r;
    }

    /** Moves a point in the image; {@code refit} false while a drag is still going on. */
    void move(int row, PixelPoint image, boolean refit) {
        Row old = rows.get(row);
        rows.set(row, new Row(image, old.groundX(), old.groundY()));
        fireTableRowsUpdated(row, row);
        changed(refit);
    }

    void setGround(int row, Double x, Double y) {
        Row old = rows.get(row);
        rows.set(row, new Row(old.image(), x, y));
        fireTableRowsUpdated(row, row);
        changed(true);
    }

    void remove(int row) {
        rows.remove(row);
        fireTableRowsDeleted(row, row);
        changed(true);
    }

    /** The complete rows as the fit's input, in table order. */
    List<GroundPoint> completePoints() {
        List<GroundPoint> out = new ArrayList<>();
        for (Row r : rows) {
            if (r.complete()) {
                out.add(new GroundPoint(r.image(), new WorldPoint(r.groundX(), r.groundY())));
            }
        }
        return out;
    }

    /**
     * Fits the complete rows now (the Fit button): the calibration on success, otherwise empty with the fit's own
     * message (fewer than 4 points, points on one line, ...) in {@link #message()}.
     */
    Optional<GroundCalibration> fit() {
        List<GroundPoint> points = completePoints();
        try {
            fit = HomographyFit.fit(points);
            message = summary(fit);
        } catch (IllegalArgumentException e) {
            fit = null;
            message = "No fit: " + e.getMessage() + ".";
        }
        indexRows();
        fireTableRowsUpdated(0, Math.max(0, rows.size() - 1));
        fitListeners.forEach(Runnable::run);
        return Optional.ofNullable(fit);
    }

    /** The latest fit, matching the rows as they are now. */
    Optional<GroundCalibration> calibration() {
        return Optional.ofNullable(fit);
    }

    /** What the user should read about the fit: RMS and warnings, or why there is no fit. */
    String message() {
        return message;
    }

    /** Row {@code row}'s error in the latest fit, or null (no fit, or the row is incomplete). */
    PointError error(int row) {
        if (fit == null || row >= fitIndex.length || fitIndex[row] < 0) {
            return null;
        }
        return fit.errors().get(fitIndex[row]);
    }

    private void changed(boolean refit) {
        int complete = (int) rows.stream().filter(Row::complete).count();
        if (refit && complete >= 4) {
            fit();
            return;
        }
        fit = null;
        indexRows();
        message = refit
                ? "A fit needs at least 4 points with ground positions; " + complete + " so far. Click the picture to"
                        + " add a point (the wheel zooms to place it on the pixel, a right-button drag pans, F fits the"
                        + " frame again), then type its ground x and y (metres) in the table."
                : "Moving a point…";
        fireTableRowsUpdated(0, Math.max(0, rows.size() - 1));
        fitListeners.forEach(Runnable::run);
    }

    private void indexRows() {
        fitIndex = new int[rows.size()];
        int k = 0;
        for (int i = 0; i < rows.size(); i++) {
            fitIndex[i] = fit != null && rows.get(i).complete() ? k++ : -1;
        }
    }

    private static String summary(GroundCalibration c) {
        long used = c.errors().stream().filter(PointError::inlier).count();
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT,
                "Fitted on %d of %d points: RMS error %.3f px in the image, %.3f m on the ground.", used,
                c.points().size(), c.rmsPixels(), c.rmsMetres()));
        for (String w : c.warnings()) {
            s.append("\n• ").append(w);
        }
        return s.toString();
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
        return column == USED ? Boolean.class : Double.class;
    }

    @Override
    public boolean isCellEditable(int row, int column) {
        return column <= GROUND_Y;
    }

    @Override
    public Object getValueAt(int row, int column) {
        Row r = rows.get(row);
        PointError e = error(row);
        return switch (column) {
            case IMAGE_X -> r.image().x();
            case IMAGE_Y -> r.image().y();
            case GROUND_X -> r.groundX();
            case GROUND_Y -> r.groundY();
            case ERROR_PX -> e == null ? null : e.pixels();
            case ERROR_M -> e == null ? null : e.metres();
            case USED -> e == null ? null : e.inlier();
            default -> throw new IndexOutOfBoundsException("column " + column);
        };
    }

    @Override
    public void setValueAt(Object value, int row, int column) {
        Double d = value == null || value.toString().isBlank() ? null : Double.valueOf(value.toString().trim());
        if (d != null && !Double.isFinite(d)) {
            return;
        }
        Row r = rows.get(row);
        switch (column) {
            case IMAGE_X -> {
                if (d != null) {
                    move(row, new PixelPoint(d, r.image().y()), true);
                }
            }
            case IMAGE_Y -> {
                if (d != null) {
                    move(row, new PixelPoint(r.image().x(), d), true);
                }
            }
            case GROUND_X -> setGround(row, d, r.groundY());
            case GROUND_Y -> setGround(row, r.groundX(), d);
            default -> {
            }
        }
    }
}
