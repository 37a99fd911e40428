package org.modetrail.app.editor;

import java.awt.Cursor;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;

import org.modetrail.model.CountingLine;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Site;
import org.modetrail.model.SiteEdits;
import org.modetrail.model.Zone;

/**
 * The zones and counting lines on the canvas: what is shown and selected, the drawing tools, and the drags of a
 * selected item's corners or ends. {@link FrameView} owns one and passes it the mouse and keys it does not use for
 * boxes; what the user made is told to the canvas's {@link FrameView.Listener} in image coordinates, and the window
 * answers with a new site ({@link #setSite}). Drawing is {@link SitePainter}'s, hit testing {@link SiteHandles}'.
 *
 * <p>Zone tool: each click adds a corner; a click on the first corner (with three or more), a double click or
 * Enter closes it; Backspace takes back the last corner; Escape drops the zone. Line tool: press at one end, drag
 * to the other and release, or click both ends. Points are kept inside the frame. Use on the event thread only.
 */
final class SiteLayer {
    /** What a drawing tool needs from the canvas. */
    interface Host {
        ViewTransform transform();

        int frameWidth();

        int frameHeight();

        FrameView.Listener listener();

        void repaintView(Rectangle area);
    }

    enum Tool { NONE, ZONE, LINE }

    static final String ZONE_HINT = "Zone: click its corners; click the first corner again, double-click or press "
            + "Enter to close it; Backspace takes back a corner; Escape cancels";
    static final String LINE_HINT = "Counting line: drag from one end to the other, or click both ends; Escape "
            + "cancels";
    static final String LINE_TOO_SHORT = "a counting line needs two different ends: drag from one end to the other";
    static final String KEPT_INSIDE = "kept inside the frame: the point was past the frame's edge";

    /** Room round a shape's points for its strokes, arrows and labels when only its part of the view is repainted. */
    private static final int MARGIN_X = 220, MARGIN_Y = 70;

    private final Host host;
    private final SiteHandles handles;
    private final SitePainter painter = new SitePainter();

    private Site site = Site.NONE;
    private boolean visible = true;
    private SiteItem selected;

    private Tool tool = Tool.NONE;
    private final List<PixelPoint> corners = new ArrayList<>();
    private PixelPoint lineStart;
    private boolean linePressed, lineFirstPress;
    /** A press closed the zone: it is handed over on the release, so no dialog opens between press and release. */
    private boolean closeOnRelease;
    private double pointerX = Double.NaN, pointerY = Double.NaN;
    /** A shape drawn and handed over, shown until the window answers with a site or drops it. */
    private List<PixelPoint> pending;
    private SiteItem.Kind pendingKind;

    private SiteItem dragItem;
    private int dragPoint;
    private List<PixelPoint> dragStart;
    private SiteHandles.Moved preview;
    private boolean dragging;
    private int pressX, pressY;

    SiteLayer(Host host, SiteHandles handles) {
        this.host = host;
        this.handles = handles;
    }

    // -------------------------------------------------------------------------------------------- state

    void setSite(Site s) {
        site = s == null ? Site.NONE : s;
        pending = null;
        if (selected != null && SiteHandles.points(site, selected) == null) {
            selected = null;
        }
        if (dragItem != null && SiteHandles.points(site, dragItem) == null) {
            cancelDrag();
        }
        repaintAll();
    }

    Site site() {
        return site;
    }

    void setVisible(boolean show) {
        visible = show;
        if (!show) {
            cancelDrag();
            cancelTool();
        }
        repaintAll();
    }

    boolean visible() {
        return visible;
    }

    SiteItem selected() {
        return selected;
    }

    void setSelected(SiteItem item) {
        if (dragItem != null && !dragItem.equals(item)) {
            cancelDrag();
        }
        selected = item;
        repaintAll();
    }

    Tool tool() {
        return tool;
    }

    /** Starts drawing a zone or a line (shows the site if it was hidden); the selection is dropped. */
    void start(Tool t) {
        cancelDrag();
        corners.clear();
        lineStart = null;
        linePressed = false;
        tool = t;
        closeOnRelease = false;
        visible = true;
        selected = null;
        repaintAll();
    }

    /** Drops the drawing under way; false when there was none. */
    boolean cancelTool() {
        if (tool == Tool.NONE) {
            return false;
        }
        tool = Tool.NONE;
        corners.clear();
        closeOnRelease = false;
        lineStart = null;
        linePressed = false;
        repaintAll();
        return true;
    }

    /** Forgets a shape handed over for naming (the user cancelled the name). */
    void dropPending() {
        pending = null;
        repaintAll();
    }

    /** The corners of the zone being drawn (for tests). */
    List<PixelPoint> draftCorners() {
        return List.copyOf(corners);
    }

    // -------------------------------------------------------------------------------------------- tools

    void pressTool(int x, int y, int clicks) {
        ViewTransform t = host.transform();
        if (tool == Tool.ZONE) {
            if (clicks >= 2 || (corners.size() >= 3 && handles.nearestPoint(List.of(corners.get(0)), t, x, y) == 0)) {
                closeOnRelease = true;
                return;
            }
            if (!corners.isEmpty() && handles.nearestPoint(List.of(corners.get(corners.size() - 1)), t, x, y) == 0) {
                return; // the same corner again
            }
            corners.add(inFrame(x, y));
            moveTo(x, y);
        } else if (tool == Tool.LINE) {
            linePressed = true;
            pressX = x;
            pressY = y;
            lineFirstPress = lineStart == null;
            if (lineFirstPress) {
                lineStart = inFrame(x, y);
            }
            moveTo(x, y);
        }
    }

    void releaseTool(int x, int y) {
        if (tool == Tool.ZONE && closeOnRelease) {
            closeOnRelease = false;
            finishZone();
            return;
        }
        if (tool != Tool.LINE || !linePressed) {
            return;
        }
        linePressed = false;
        boolean moved = Math.abs(x - pressX) >= FrameView.DRAG_THRESHOLD
                || Math.abs(y - pressY) >= FrameView.DRAG_THRESHOLD;
        if (lineFirstPress && !moved) {
            return; // a click: the other end comes with the next click
        }
        PixelPoint end = inFrame(x, y);
        ViewTransform t = host.transform();
        if (Math.hypot(t.toViewX(end.x()) - t.toViewX(lineStart.x()), t.toViewY(end.y()) - t.toViewY(lineStart.y()))
                < FrameView.DRAG_THRESHOLD) {
            host.listener().message(LINE_TOO_SHORT);
            if (lineFirstPress) {
                lineStart = null;
            }
            repaintAll();
            return;
        }
        PixelPoint start = lineStart;
        tool = Tool.NONE;
        lineStart = null;
        pending = List.of(start, end);
        pendingKind = SiteItem.Kind.LINE;
        repaintAll();
        host.listener().lineDrawn(start, end);
    }

    /** Closes the zone being drawn (Enter); with fewer than three corners it says so and goes on. */
    void finishZone() {
        if (tool != Tool.ZONE) {
            return;
        }
        if (corners.size() < 3) {
            host.listener().message("a zone needs at least 3 corners, it has " + corners.size()
                    + " so far: click more corners, or Escape to cancel");
            return;
        }
        if (SiteEdits.area(corners) < SiteEdits.MIN_AREA) {
            host.listener().message("these corners lie on one line and enclose nothing: click a corner off the line,"
                    + " or Backspace to take one back");
            return;
        }
        List<PixelPoint> zone = List.copyOf(corners);
        tool = Tool.NONE;
        corners.clear();
        pending = zone;
        pendingKind = SiteItem.Kind.ZONE;
        repaintAll();
        host.listener().zoneDrawn(zone);
    }

    /** Takes back the last corner of the zone (Backspace), or the first end of the line, being drawn. */
    void removeLast() {
        if (tool == Tool.ZONE && !corners.isEmpty()) {
            corners.remove(corners.size() - 1);
        } else if (tool == Tool.LINE && !linePressed) {
            lineStart = null;
        }
        repaintAll();
    }

    /** The pointer moved to (x, y) with or without a button held. */
    void moveTo(int x, int y) {
        pointerX = x;
        pointerY = y;
        if (tool != Tool.NONE) {
            repaintAll();
        }
    }

    private PixelPoint inFrame(int x, int y) {
        ViewTransform t = host.transform();
        double ix = t.toImageX(x), iy = t.toImageY(y);
        PixelPoint p = SiteHandles.inFrame(ix, iy, host.frameWidth(), host.frameHeight());
        if (p.x() != ix || p.y() != iy) {
            host.listener().message(KEPT_INSIDE);
        }
        return p;
    }

    // --------------------------------------------------------------------------------- select and drag

    /** A press on the selected item's corner or end starts dragging it; false when the press is not on one. */
    boolean pressSelectedPoint(int x, int y) {
        List<PixelPoint> points = visible ? SiteHandles.points(site, selected) : null;
        if (points == null) {
            return false;
        }
        int i = handles.nearestPoint(points, host.transform(), x, y);
        if (i < 0) {
            return false;
        }
        startDrag(selected, i, points, x, y);
        return true;
    }

    /** A press on an item's outline selects it, and a drag from there moves it whole; false when on none. */
    boolean pressItem(int x, int y) {
        if (!visible) {
            return false;
        }
        SiteHandles.Hit hit = handles.hit(site, selected, host.transform(), x, y);
        if (hit == null) {
            return false;
        }
        if (!hit.item().equals(selected)) {
            select(hit.item());
        }
        startDrag(hit.item(), hit.point(), SiteHandles.points(site, hit.item()), x, y);
        return true;
    }

    /**
     * A click (no drag) on empty space at (x, y): selects the smallest zone there and returns true, or drops the
     * selected item and returns false.
     */
    boolean click(int x, int y) {
        ViewTransform t = host.transform();
        SiteItem zone = visible ? SiteHandles.zoneAt(site, t.toImageX(x), t.toImageY(y)) : null;
        if (zone != null) {
            select(zone);
            return true;
        }
        if (selected != null) {
            select(null);
        }
        return false;
    }

    private void select(SiteItem item) {
        selected = item;
        host.listener().siteSelected(item);
        repaintAll();
    }

    private void startDrag(SiteItem item, int point, List<PixelPoint> points, int x, int y) {
        dragItem = item;
        dragPoint = point;
        dragStart = points;
        preview = null;
        dragging = false;
        pressX = x;
        pressY = y;
    }

    boolean dragsItem() {
        return dragItem != null;
    }

    void drag(int x, int y) {
        if (dragItem == null) {
            return;
        }
        if (!dragging && (Math.abs(x - pressX) >= FrameView.DRAG_THRESHOLD
                || Math.abs(y - pressY) >= FrameView.DRAG_THRESHOLD)) {
            dragging = true;
        }
        if (!dragging) {
            return;
        }
        List<PixelPoint> before = shown(dragItem);
        double s = host.transform().scale();
        double dx = (x - pressX) / s, dy = (y - pressY) / s;
        preview = dragPoint >= 0
                ? SiteHandles.movePoint(dragStart, dragPoint, dx, dy, host.frameWidth(), host.frameHeight())
                : SiteHandles.moveAll(dragStart, dx, dy, host.frameWidth(), host.frameHeight());
        repaintAround(before, preview.points());
    }

    /** Ends a drag of an item: tells the listener of the change, unless nothing moved. */
    void release(int x, int y) {
        if (dragItem == null) {
            return;
        }
        if (dragging) {
            drag(x, y);
        }
        SiteItem item = dragItem;
        SiteHandles.Moved result = preview;
        List<PixelPoint> start = dragStart;
        cancelDrag();
        if (result == null || result.points().equals(start)) {
            return;
        }
        List<PixelPoint> p = result.points();
        if (item.kind() == SiteItem.Kind.ZONE) {
            host.listener().zoneChanged(item.name(), p);
        } else {
            ViewTransform t = host.transform();
            if (Math.hypot(t.toViewX(p.get(1).x()) - t.toViewX(p.get(0).x()),
                    t.toViewY(p.get(1).y()) - t.toViewY(p.get(0).y())) < FrameView.DRAG_THRESHOLD) {
                host.listener().message(LINE_TOO_SHORT);
                return;
            }
            host.listener().lineChanged(item.name(), p.get(0), p.get(1));
        }
        if (result.clamped()) {
            host.listener().message(KEPT_INSIDE);
        }
    }

    void cancelDrag() {
        if (dragItem != null) {
            dragItem = null;
            preview = null;
            dragging = false;
            repaintAll();
        }
    }

    /** The cursor for the pointer at (x, y), or -1 when the site has nothing there. */
    int cursorAt(int x, int y) {
        if (tool != Tool.NONE) {
            return Cursor.CROSSHAIR_CURSOR;
        }
        if (dragItem != null) {
            return Cursor.MOVE_CURSOR;
        }
        if (!visible) {
            return -1;
        }
        List<PixelPoint> sel = SiteHandles.points(site, selected);
        if (sel != null && handles.nearestPoint(sel, host.transform(), x, y) >= 0) {
            return Cursor.MOVE_CURSOR;
        }
        return handles.hit(site, selected, host.transform(), x, y) != null ? Cursor.HAND_CURSOR : -1;
    }

    // ---------------------------------------------------------------------------------------- painting

    /** The points of an item as shown: the drag's preview while it is dragged. */
    private List<PixelPoint> shown(SiteItem item) {
        return item.equals(dragItem) && preview != null ? preview.points() : SiteHandles.points(site, item);
    }

    void paint(Graphics2D g, java.awt.Font font, int viewWidth, int viewHeight) {
        if (!visible) {
            return;
        }
        ViewTransform t = host.transform();
        painter.begin(g, font, viewWidth, viewHeight);
        for (Zone z : site.zones()) {
            SiteItem item = SiteItem.zone(z.name());
            if (!item.equals(selected)) {
                painter.zone(g, t, z.name(), shown(item), false);
            }
        }
        for (CountingLine l : site.lines()) {
            SiteItem item = SiteItem.line(l.name());
            if (!item.equals(selected)) {
                List<PixelPoint> p = shown(item);
                painter.line(g, t, l.name(), p.get(0), p.get(1), false);
            }
        }
        List<PixelPoint> sel = selected == null ? null : shown(selected);
        if (sel != null) {
            if (selected.kind() == SiteItem.Kind.ZONE) {
                painter.zone(g, t, selected.name(), sel, true);
            } else {
                painter.line(g, t, selected.name(), sel.get(0), sel.get(1), true);
            }
        }
        if (pending != null) {
            painter.draft(g, t, pending, pendingKind == SiteItem.Kind.ZONE, Double.NaN, Double.NaN, false);
        }
        if (tool == Tool.ZONE) {
            boolean closing = corners.size() >= 3 && Double.isFinite(pointerX)
                    && handles.nearestPoint(List.of(corners.get(0)), t, pointerX, pointerY) == 0;
            painter.draft(g, t, corners, true, pointerX, pointerY, closing);
        } else if (tool == Tool.LINE && lineStart != null) {
            painter.draft(g, t, List.of(lineStart), false, pointerX, pointerY, false);
        }
    }

    private void repaintAll() {
        host.repaintView(null);
    }

    /** Repaints where a dragged item was and is, with room for its labels, not the whole frame. */
    private void repaintAround(List<PixelPoint> before, List<PixelPoint> after) {
        ViewTransform t = host.transform();
        Rectangle area = null;
        for (List<PixelPoint> points : List.of(before, after)) {
            for (PixelPoint p : points) {
                Rectangle r = new Rectangle((int) t.toViewX(p.x()) - MARGIN_X, (int) t.toViewY(p.y()) - MARGIN_Y,
                        2 * MARGIN_X, 2 * MARGIN_Y);
                area = area == null ? r : area.union(r);
            }
        }
        host.repaintView(area);
    }
}
