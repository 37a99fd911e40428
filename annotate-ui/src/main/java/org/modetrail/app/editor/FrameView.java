package org.modetrail.app.editor;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Cursor;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Stroke;
import java.awt.event.ActionEvent;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.event.MouseWheelEvent;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

import javax.swing.AbstractAction;
import javax.swing.ActionMap;
import javax.swing.InputMap;
import javax.swing.JComponent;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;

import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * The editor's large frame canvas: the current frame, zoomed and panned, with the boxes of every track on it, on
 * which the user draws new boxes and moves and resizes the selected track's box. It changes nothing itself: what
 * the user did is told to the {@link Listener} in image coordinates, and the window answers with a new project
 * ({@link #setProject}) and selection ({@link #setSelectedTrack}).
 *
 * <p>Boxes are drawn as in overlay videos: the class colour on a halo of the opposite lightness, a user's keyframe
 * thick, a tracked box plain, an interpolated one dashed, with an "id class" tag; the selected track's box is
 * thicker, lightly filled and shows its eight grips. Line widths are in view pixels, the same at every zoom.
 *
 * <p>Mouse: the wheel zooms about the pointer; a middle drag, or a left drag with Space held, pans; a left drag on
 * empty space draws a box; a left click on a box selects its track (and a drag from there moves it), a click on
 * empty space clears the selection; a drag inside the selected box moves it, on a grip resizes it; a double click on
 * empty space fits the frame to the view. Keys (when the canvas has focus): F fits, Space held pans, Escape drops
 * the drag under way. Edited boxes are kept inside the frame ({@link BoxHandles}).
 *
 * <p>The project's zones and counting lines are drawn under the boxes on every frame ({@link SitePainter}) unless
 * hidden; their tools, selection and drags are {@link SiteLayer}'s. While a zone or line tool is on, left clicks
 * belong to it, boxes included (Enter closes a zone, Backspace takes back a corner, Escape drops the drawing).
 * Otherwise the selected zone's or line's corners and ends come first, then boxes, then the outlines of zones and
 * lines (a click selects one, a drag moves it whole); a click, not a drag, inside a zone selects it. A track and a
 * zone or line are never selected together. Use on the event thread only.
 */
public class FrameView extends JComponent {

    /** What the user did on the canvas; every method does nothing unless overridden. */
    public interface Listener {
        /** A new box was drawn on {@code frame} (image coordinates, inside the frame, at least 2 x 2 pixels). */
        default void boxDrawn(int frame, Box box) {
        }

        /** The user clicked a box of track {@code trackId}, or empty space ({@code null}). */
        default void trackSelected(Integer trackId) {
        }

        /** The user moved or resized track {@code trackId}'s box on {@code frame}; {@code box} is the new one. */
        default void boxChanged(int trackId, int frame, Box box) {
        }

        /** Something to tell the user in the status line (a refused or adjusted box). */
        default void message(String text) {
        }

        /** A zone was drawn with these corners (image coordinates, inside the frame, at least 3); it needs a name. */
        default void zoneDrawn(List<PixelPoint> corners) {
        }

        /** A counting line was drawn from {@code from} to {@code to} (image coordinates, inside the frame). */
        default void lineDrawn(PixelPoint from, PixelPoint to) {
        }

        /** The user clicked a zone or a counting line, or empty space ({@code null}). */
        default void siteSelected(SiteItem item) {
        }

        /** The user moved zone {@code name}'s corners (one, or all of them); {@code polygon} is the new outline. */
        default void zoneChanged(String name, List<PixelPoint> polygon) {
        }

        /** The user moved counting line {@code name}'s ends (one, or both). */
        default void lineChanged(String name, PixelPoint from, PixelPoint to) {
        }
    }

    /** Told when a drawn box is refused for its size. */
    public static final String TOO_SMALL = "box too small: drag a larger box";
    /** Told when a drawn, moved or resized box reached past the frame's edge and was brought inside. */
    public static final String KEPT_INSIDE = "box kept inside the frame: it reached past the frame's edge";

    /** Zoom per wheel notch. */
    static final double WHEEL_STEP = 1.2;
    /** A press that moves less than this (view pixels) before release is a click, not a drag. */
    static final int DRAG_THRESHOLD = 3;
    /** From this zoom up, image pixels are drawn as crisp squares. */
    static final double CRISP_FROM = 2;
    private static final int UNKNOWN_CLASS = 0x9A9A9A;
    private static final float PLAIN_WIDTH = 2f, KEY_WIDTH = 3.5f, SELECTED_EXTRA = 1f;
    private static final int GRIP_SIZE = 8;
    private static final Listener SILENT = new Listener() {
    };

    private enum Drag { NONE, PAN, DRAW, MOVE, RESIZE, SITE, SITE_TOOL }

    /** A track with what drawing it needs, worked out when the project is set. */
    private record Painted(Track track, Color colour, Color text, Color halo, Color wash, String label) {
    }

    private final ViewTransform.Limits limits;
    private final BoxHandles handles;
    private Listener listener = SILENT;
    private final SiteLayer site = new SiteLayer(new SiteLayer.Host() {
        @Override
        public ViewTransform transform() {
            return transform;
        }

        @Override
        public int frameWidth() {
            return image == null ? 0 : image.getWidth();
        }

        @Override
        public int frameHeight() {
            return image == null ? 0 : image.getHeight();
        }

        @Override
        public Listener listener() {
            return listener;
        }

        @Override
        public void repaintView(java.awt.Rectangle area) {
            if (area == null) {
                repaint();
            } else {
                repaint(area);
            }
        }
    }, SiteHandles.defaults());

    private BufferedImage image;
    private int frame = -1;
    /** The frame whose picture is on screen: not {@link #frame} while a stand-in shows during a jump. */
    private int pictureFrame = -1;
    private final List<Painted> painted = new ArrayList<>();
    private Integer selected;
    private ViewTransform transform = ViewTransform.IDENTITY;
    /** True until the user zooms or pans: the frame then follows the view's size. */
    private boolean following = true;

    private Drag drag = Drag.NONE;
    private boolean dragging;
    private int pressX, pressY, lastX, lastY;
    private BoxHandles.Grip grip = BoxHandles.Grip.NONE;
    private int dragTrack;
    private Box dragStart;
    private BoxHandles.Adjusted preview;
    private boolean spaceDown;

    /** Strokes over and under (halo), by box source, plain and emphasised. */
    private final Stroke[] over = new Stroke[2 * BoxSource.values().length];
    private final Stroke[] under = new Stroke[over.length];
    private final Stroke thin = new BasicStroke(1f);
    private final Stroke bandHalo = new BasicStroke(3f);
    private final Stroke band = new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10,
            new float[] {5, 4}, 0);
    private final Color bandShade = new Color(0, 0, 0, 160);
    private final Rectangle2D.Double rect = new Rectangle2D.Double();
    private final Rectangle2D.Double grab = new Rectangle2D.Double();
    private final org.modetrail.overlay.TagPlacement tags = new org.modetrail.overlay.TagPlacement();
    private Font tagFont;

    /** A canvas with the default zoom limits and grips. */
    public FrameView() {
        this(ViewTransform.Limits.DEFAULT, BoxHandles.defaults());
    }

    public FrameView(ViewTransform.Limits limits, BoxHandles handles) {
        if (limits == null || handles == null) {
            throw new IllegalArgumentException("limits and handles are required");
        }
        this.limits = limits;
        this.handles = handles;
        setFocusable(true);
        setOpaque(true);
        setPreferredSize(new Dimension(960, 600));
        Mouse mouse = new Mouse();
        addMouseListener(mouse);
        addMouseMotionListener(mouse);
        addMouseWheelListener(mouse);
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) {
                if (following) {
                    fitToView();
                } else {
                    clampTransform();
                }
            }
        });
        addFocusListener(new FocusAdapter() {
            @Override
            public void focusLost(FocusEvent e) {
                spaceDown = false;
            }
        });
        for (BoxSource source : BoxSource.values()) {
            for (int emphasised = 0; emphasised < 2; emphasised++) {
                float w = (source == BoxSource.KEYFRAME ? KEY_WIDTH : PLAIN_WIDTH) + emphasised * SELECTED_EXTRA;
                float[] dash = source == BoxSource.INTERPOLATED
                        ? new float[] {Math.max(4, 4 * w), Math.max(3, 2.5f * w)} : null;
                int i = strokeIndex(source, emphasised == 1);
                over[i] = stroke(w, dash);
                // The halo is wider by a pixel each side, more for thick lines, as in overlay videos.
                under[i] = stroke(w + Math.max(2f, w * 0.5f), dash);
            }
        }
        bindKeys();
        updateFont();
    }

    private static int strokeIndex(BoxSource source, boolean emphasised) {
        return 2 * source.ordinal() + (emphasised ? 1 : 0);
    }

    private static Stroke stroke(float width, float[] dash) {
        return dash != null ? new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, dash, 0)
                : new BasicStroke(width, BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER);
    }

    /** Where user actions go; {@code null} for nowhere. */
    public void setListener(Listener l) {
        listener = l == null ? SILENT : l;
    }

    /**
     * Shows frame {@code frameIndex}. A frame of a new size is fitted to the view; one of the same size keeps the
     * zoom and pan, so stepping through frames stays where the user looks. A drag under way is dropped.
     */
    public void showFrame(int frameIndex, BufferedImage frameImage) {
        showFrame(frameIndex, frameImage, frameIndex);
    }

    /**
     * Shows frame {@code pictureIndex}'s picture for frame {@code frameIndex}: a stand-in while the exact picture is
     * decoded after a jump. A stand-in is marked as such, shows no boxes (they belong to another picture) and takes
     * no edits; zoom and pan still work.
     */
    public void showFrame(int frameIndex, BufferedImage frameImage, int pictureIndex) {
        if (frameIndex < 0) {
            throw new IllegalArgumentException("frame must be 0 or more, got " + frameIndex);
        }
        pictureFrame = pictureIndex;
        boolean newSize = frameImage != null && (image == null || image.getWidth() != frameImage.getWidth()
                || image.getHeight() != frameImage.getHeight());
        if (frameIndex != frame) {
            cancelDrag();
        }
        frame = frameIndex;
        image = frameImage;
        if (newSize) {
            site.cancelTool(); // another video: a zone or line half drawn on the last one is dropped
            following = true;
            fitToView();
        }
        repaint();
    }

    /** The tracks, zones and counting lines to draw (null for none). */
    public void setProject(Project p) {
        site.setSite(p == null ? null : p.site());
        painted.clear();
        if (p != null) {
            for (Track t : p.tracks()) {
                int rgb = p.objectClass(t.className()).map(ObjectClass::colour).orElse(UNKNOWN_CLASS);
                Color text = textColourOn(rgb);
                painted.add(new Painted(t, new Color(rgb), text,
                        new Color(text.getRed(), text.getGreen(), text.getBlue(), 210),
                        new Color((rgb >> 16) & 0xFF, (rgb >> 8) & 0xFF, rgb & 0xFF, 40),
                        t.id() + " " + t.className()));
            }
        }
        repaint();
    }

    /** The track shown emphasised with its grips, or none. */
    public void setSelectedTrack(Integer trackId) {
        if (drag == Drag.MOVE || drag == Drag.RESIZE) {
            if (trackId == null || trackId != dragTrack) {
                cancelDrag();
            }
        }
        selected = trackId;
        repaint();
    }

    public Integer selectedTrack() {
        return selected;
    }

    // ------------------------------------------------------------------------------ zones and counting lines

    /** Starts the zone tool: clicks add corners until the zone is closed (see {@link SiteLayer}). */
    public void startZoneTool() {
        cancelDrag();
        site.start(SiteLayer.Tool.ZONE);
        listener.message(SiteLayer.ZONE_HINT);
        updateCursor(lastX, lastY);
    }

    /** Starts the counting-line tool: a drag, or two clicks, gives the line's ends. */
    public void startLineTool() {
        cancelDrag();
        site.start(SiteLayer.Tool.LINE);
        listener.message(SiteLayer.LINE_HINT);
        updateCursor(lastX, lastY);
    }

    /** Whether a zone or counting line is being drawn. */
    public boolean drawsSite() {
        return site.tool() != SiteLayer.Tool.NONE;
    }

    /** Shows or hides the zones and counting lines (hidden, they cannot be clicked either). */
    public void setSiteVisible(boolean show) {
        site.setVisible(show);
    }

    public boolean siteVisible() {
        return site.visible();
    }

    /** The zone or counting line shown selected with its grips, or none. */
    public void setSelectedSite(SiteItem item) {
        site.setSelected(item);
    }

    public SiteItem selectedSite() {
        return site.selected();
    }

    /** Forgets a zone or line drawn and handed over for a name the user then did not give. */
    public void dropDrawnSite() {
        site.dropPending();
    }

    /** The corners of the zone being drawn, for tests. */
    List<PixelPoint> zoneDraft() {
        return site.draftCorners();
    }

    /** The frame shown, -1 before the first. */
    public int frame() {
        return frame;
    }

    /** How the frame is shown now. */
    public ViewTransform transform() {
        return transform;
    }

    /** The whole frame as large as fits; the frame then follows the view's size until the user zooms or pans. */
    public void fitToView() {
        if (image != null) {
            transform = ViewTransform.fit(image.getWidth(), image.getHeight(), getWidth(), getHeight(), limits);
            following = true;
            repaint();
        }
    }

    /** Zooms by {@code factor} about view point (viewX, viewY), within the limits. */
    public void zoomBy(double factor, double viewX, double viewY) {
        if (image != null) {
            transform = transform.zoomAbout(factor, viewX, viewY, limits);
            following = false;
            clampTransform();
            repaint();
        }
    }

    private void clampTransform() {
        if (image != null && getWidth() > 0 && getHeight() > 0) {
            transform = transform.clamped(image.getWidth(), image.getHeight(), getWidth(), getHeight(), limits);
        }
    }

    @Override
    public void updateUI() {
        super.updateUI();
        updateFont();
    }

    private void updateFont() {
        Font base = UIManager.getFont("Label.font");
        if (base == null) {
            base = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
        }
        tagFont = base.deriveFont(Font.BOLD);
    }

    // ---------------------------------------------------------------------------------------------- keyboard

    private void bindKeys() {
        InputMap in = getInputMap(JComponent.WHEN_FOCUSED);
        ActionMap act = getActionMap();
        key(in, act, "F", "fit", this::fitToView);
        key(in, act, "pressed SPACE", "pan-on", () -> {
            spaceDown = true;
            updateCursor(lastX, lastY);
        });
        key(in, act, "released SPACE", "pan-off", () -> {
            spaceDown = false;
            updateCursor(lastX, lastY);
        });
        key(in, act, "ESCAPE", "drop-drag", () -> {
            if (site.cancelTool()) {
                listener.message("Drawing cancelled");
            }
            site.cancelDrag();
            cancelDrag();
            updateCursor(lastX, lastY);
        });
        key(in, act, "ENTER", "close-zone", site::finishZone);
        key(in, act, "BACK_SPACE", "take-back-corner", site::removeLast);
    }

    private static void key(InputMap in, ActionMap act, String stroke, String name, Runnable r) {
        in.put(KeyStroke.getKeyStroke(stroke), name);
        act.put(name, new AbstractAction() {
            @Override
            public void actionPerformed(ActionEvent e) {
                r.run();
            }
        });
    }

    // ------------------------------------------------------------------------------------------------- mouse

    private final class Mouse extends MouseAdapter {
        @Override
        public void mousePressed(MouseEvent e) {
            requestFocusInWindow();
            if (drag != Drag.NONE || image == null) {
                return;
            }
            if (showsStandIn() && !SwingUtilities.isMiddleMouseButton(e) && !spaceDown) {
                return; // no edits on another frame's picture; the exact one is on its way
            }
            pressX = lastX = e.getX();
            pressY = lastY = e.getY();
            dragging = false;
            preview = null;
            if (SwingUtilities.isMiddleMouseButton(e) || (SwingUtilities.isLeftMouseButton(e) && spaceDown)) {
                drag = Drag.PAN;
                setCursor(Cursor.getPredefinedCursor(Cursor.MOVE_CURSOR));
                return;
            }
            if (!SwingUtilities.isLeftMouseButton(e)) {
                return;
            }
            if (site.tool() != SiteLayer.Tool.NONE) {
                drag = Drag.SITE_TOOL;
                site.pressTool(pressX, pressY, e.getClickCount());
                return;
            }
            if (site.pressSelectedPoint(pressX, pressY)) {
                drag = Drag.SITE;
                return;
            }
            FrameAnnotation sel = selected == null ? null : visibleAt(selected);
            Painted under = trackAt(pressX, pressY);
            if (sel != null) {
                BoxHandles.Grip g = handles.hit(sel.box(), transform, pressX, pressY);
                // The selected box's grips come first; inside it, a smaller box under the pointer is chosen.
                if (g.resizes() || (g == BoxHandles.Grip.INSIDE && under.track().id() == selected)) {
                    startEdit(selected, sel.box(), g);
                    return;
                }
            }
            if (under != null) {
                int id = under.track().id();
                selected = id;
                listener.trackSelected(id);
                if (site.selected() != null) {
                    site.setSelected(null);
                    listener.siteSelected(null);
                }
                startEdit(id, under.track().frames().get(frame).box(), BoxHandles.Grip.INSIDE);
                repaint();
                return;
            }
            if (site.pressItem(pressX, pressY)) {
                drag = Drag.SITE;
                dropTrackSelection();
                return;
            }
            if (e.getClickCount() >= 2) {
                fitToView();
                return;
            }
            drag = Drag.DRAW;
        }

        @Override
        public void mouseDragged(MouseEvent e) {
            int x = e.getX(), y = e.getY();
            if (!dragging && (Math.abs(x - pressX) >= DRAG_THRESHOLD || Math.abs(y - pressY) >= DRAG_THRESHOLD)) {
                dragging = true;
            }
            Box before = preview != null ? preview.box() : drag == Drag.DRAW ? null : dragStart;
            switch (drag) {
                case SITE -> site.drag(x, y);
                case SITE_TOOL -> site.moveTo(x, y);
                case PAN -> {
                    transform = transform.panBy(x - lastX, y - lastY);
                    following = false;
                    clampTransform();
                    repaint();
                }
                case DRAW -> {
                    preview = dragging ? drawn(x, y) : null;
                    repaintAround(before, preview);
                }
                case MOVE, RESIZE -> {
                    preview = dragging ? handles.resize(dragStart, grip, (x - pressX) / transform.scale(),
                            (y - pressY) / transform.scale(), image.getWidth(), image.getHeight()) : null;
                    repaintAround(before, preview);
                }
                default -> {
                    return;
                }
            }
            lastX = x;
            lastY = y;
        }

        @Override
        public void mouseReleased(MouseEvent e) {
            Drag was = drag;
            boolean pan = was == Drag.PAN;
            if (was == Drag.NONE || (!pan && !SwingUtilities.isLeftMouseButton(e))) {
                return;
            }
            if (was == Drag.SITE || was == Drag.SITE_TOOL) {
                drag = Drag.NONE;
                if (was == Drag.SITE) {
                    site.release(e.getX(), e.getY());
                } else {
                    site.releaseTool(e.getX(), e.getY());
                }
                updateCursor(e.getX(), e.getY());
                return;
            }
            if (!pan && dragging) {
                mouseDragged(e); // the release point counts, even without a last drag event there
            }
            BoxHandles.Adjusted result = preview;
            boolean moved = dragging;
            int track = dragTrack;
            Box start = dragStart;
            cancelDrag();
            if (was == Drag.DRAW) {
                if (!moved) {
                    site.click(pressX, pressY); // selects the zone there, or drops the selected zone or line
                    dropTrackSelection();
                } else if (result == null || !handles.bigEnough(result.box())) {
                    listener.message(TOO_SMALL);
                } else {
                    listener.boxDrawn(frame, result.box());
                    if (result.clamped()) {
                        listener.message(KEPT_INSIDE);
                    }
                }
            } else if ((was == Drag.MOVE || was == Drag.RESIZE) && moved && result != null
                    && !result.box().equals(start)) {
                listener.boxChanged(track, frame, result.box());
                if (result.clamped()) {
                    listener.message(KEPT_INSIDE);
                }
            }
            updateCursor(e.getX(), e.getY());
            repaint();
        }

        @Override
        public void mouseMoved(MouseEvent e) {
            lastX = e.getX();
            lastY = e.getY();
            site.moveTo(lastX, lastY);
            updateCursor(lastX, lastY);
        }

        @Override
        public void mouseWheelMoved(MouseWheelEvent e) {
            double notches = e.getPreciseWheelRotation();
            if (notches != 0 && drag != Drag.DRAW && drag != Drag.MOVE && drag != Drag.RESIZE && drag != Drag.SITE) {
                zoomBy(Math.pow(WHEEL_STEP, -notches), e.getX(), e.getY());
            }
        }
    }

    /**
     * Repaints only where a box being drawn or edited was and now is, with room for its strokes, grips and tag: on a
     * large frame a drag then redraws a small part of it per mouse event.
     */
    private void repaintAround(Box before, BoxHandles.Adjusted now) {
        Box after = now == null ? null : now.box();
        if (before == null && after == null) {
            return;
        }
        Rectangle2D.Double area = null;
        for (Box b : new Box[] {before, after}) {
            if (b == null) {
                continue;
            }
            transform.toView(b, rect);
            int reach = GRIP_SIZE + 8;
            int tagHeight = 3 * (tagFont.getSize() + 8); // room for a tag above, below or inside the box
            int tagWidth = 24 * tagFont.getSize();
            double left = Math.min(rect.x - reach, getWidth() - tagWidth); // tags near the right edge shift left
            Rectangle2D.Double r = new Rectangle2D.Double(left, rect.y - tagHeight,
                    Math.max(rect.x + rect.width + reach, left + tagWidth) - left, rect.height + 2 * tagHeight);
            if (area == null) {
                area = r;
            } else {
                area.add(r);
            }
        }
        repaint(area.getBounds());
    }

    private void dropTrackSelection() {
        if (selected != null) {
            selected = null;
            listener.trackSelected(null);
        }
    }

    private void startEdit(int trackId, Box box, BoxHandles.Grip g) {
        drag = g.resizes() ? Drag.RESIZE : Drag.MOVE;
        grip = g;
        dragTrack = trackId;
        dragStart = box;
    }

    /** The rubber band from the press to (x, y), cut to the frame; a null box when it lies outside it. */
    private BoxHandles.Adjusted drawn(int x, int y) {
        return handles.inFrame(transform.toImage(pressX, pressY, x, y), image.getWidth(), image.getHeight());
    }

    private void cancelDrag() {
        site.cancelDrag();
        drag = Drag.NONE;
        dragging = false;
        preview = null;
        dragStart = null;
        grip = BoxHandles.Grip.NONE;
        repaint();
    }

    /** The track's annotation on the current frame when it has a box there. */
    private FrameAnnotation visibleAt(int trackId) {
        for (Painted p : painted) {
            if (p.track().id() == trackId) {
                FrameAnnotation a = p.track().frames().get(frame);
                return a != null && a.isVisible() ? a : null;
            }
        }
        return null;
    }

    /** The smallest box under view point (x, y) or within grip reach of its outline, so nested boxes can be reached. */
    private Painted trackAt(int x, int y) {
        Painted best = null;
        double bestArea = Double.POSITIVE_INFINITY;
        for (Painted p : painted) {
            FrameAnnotation a = p.track().frames().get(frame);
            if (a != null && a.isVisible() && handles.hit(a.box(), transform, x, y) != BoxHandles.Grip.NONE
                    && a.box().area() < bestArea) {
                best = p;
                bestArea = a.box().area();
            }
        }
        return best;
    }

    private void updateCursor(int x, int y) {
        int type;
        if (drag == Drag.PAN || spaceDown) {
            type = Cursor.MOVE_CURSOR;
        } else if (drag == Drag.MOVE) {
            type = Cursor.MOVE_CURSOR;
        } else if (drag == Drag.RESIZE) {
            type = cursorFor(grip);
        } else if (image == null) {
            type = Cursor.DEFAULT_CURSOR;
        } else {
            FrameAnnotation sel = selected == null ? null : visibleAt(selected);
            BoxHandles.Grip g = sel == null ? BoxHandles.Grip.NONE : handles.hit(sel.box(), transform, x, y);
            int onSite = site.cursorAt(x, y);
            if (onSite == Cursor.MOVE_CURSOR || onSite == Cursor.CROSSHAIR_CURSOR) {
                type = onSite; // a grip of the selected zone or line, or a drawing tool
            } else if (g != BoxHandles.Grip.NONE) {
                type = cursorFor(g);
            } else if (trackAt(x, y) != null) {
                type = Cursor.HAND_CURSOR;
            } else {
                type = onSite >= 0 ? onSite : Cursor.CROSSHAIR_CURSOR;
            }
        }
        if (getCursor().getType() != type) {
            setCursor(Cursor.getPredefinedCursor(type));
        }
    }

    static int cursorFor(BoxHandles.Grip g) {
        return switch (g) {
            case NORTH -> Cursor.N_RESIZE_CURSOR;
            case SOUTH -> Cursor.S_RESIZE_CURSOR;
            case EAST -> Cursor.E_RESIZE_CURSOR;
            case WEST -> Cursor.W_RESIZE_CURSOR;
            case NORTH_EAST -> Cursor.NE_RESIZE_CURSOR;
            case NORTH_WEST -> Cursor.NW_RESIZE_CURSOR;
            case SOUTH_EAST -> Cursor.SE_RESIZE_CURSOR;
            case SOUTH_WEST -> Cursor.SW_RESIZE_CURSOR;
            case INSIDE -> Cursor.MOVE_CURSOR;
            case NONE -> Cursor.DEFAULT_CURSOR;
        };
    }

    // ---------------------------------------------------------------------------------------------- painting

    @Override
    protected void paintComponent(Graphics g) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setColor(emptyBackground());
            g2.fillRect(0, 0, getWidth(), getHeight());
            if (image == null) {
                return;
            }
            double s = transform.scale();
            if (s == 1 && transform.offsetX() == Math.rint(transform.offsetX())
                    && transform.offsetY() == Math.rint(transform.offsetY())) {
                g2.drawImage(image, (int) transform.offsetX(), (int) transform.offsetY(), null); // a plain copy
            } else {
                g2.setRenderingHint(RenderingHints.KEY_INTERPOLATION, s >= CRISP_FROM
                        ? RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR
                        : RenderingHints.VALUE_INTERPOLATION_BILINEAR);
                g2.drawImage(image, transform.toAffine(), null);
            }
            // A thin line round the frame, so its edge shows where the footage is as dark or light as the theme.
            Color edge = UIManager.getColor("Component.borderColor");
            g2.setColor(edge != null ? edge : Color.GRAY);
            g2.drawRect((int) Math.floor(transform.offsetX()) - 1, (int) Math.floor(transform.offsetY()) - 1,
                    (int) Math.ceil(image.getWidth() * transform.scale()) + 1,
                    (int) Math.ceil(image.getHeight() * transform.scale()) + 1);
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            // Zones and lines under the boxes: they are the same on every frame, so a stand-in shows them too.
            site.paint(g2, tagFont, getWidth(), getHeight());
            if (showsStandIn()) {
                paintStandInNote(g2);
                return;
            }
            paintBoxes(g2);
            if (drag == Drag.DRAW && preview != null && preview.box() != null) {
                paintBand(g2, preview.box());
            }
        } finally {
            g2.dispose();
        }
    }

    /** Whether the picture on screen is another frame's, shown while the wanted one is decoded. */
    public boolean showsStandIn() {
        return image != null && pictureFrame != frame;
    }

    /** A note in the top-left corner saying whose picture this is, in the theme's tooltip colours. */
    private void paintStandInNote(Graphics2D g) {
        String text = "showing frame " + pictureFrame + " while frame " + frame + " is decoded";
        if (getFont() != null) {
            g.setFont(getFont());
        }
        FontMetrics fm = g.getFontMetrics();
        int pad = 4;
        int w = fm.stringWidth(text) + 2 * pad;
        int h = fm.getAscent() + fm.getDescent() + 2 * pad;
        Color back = UIManager.getColor("ToolTip.background");
        Color fore = UIManager.getColor("ToolTip.foreground");
        g.setColor(back != null ? back : Color.WHITE);
        g.fillRect(pad, pad, w, h);
        g.setColor(fore != null ? fore : Color.BLACK);
        g.setStroke(thin);
        g.drawRect(pad, pad, w, h);
        g.drawString(text, 2 * pad, pad + pad + fm.getAscent());
    }

    /** The look and feel's panel colour, a step darker on light themes and a step lighter on dark ones. */
    private static Color emptyBackground() {
        Color c = UIManager.getColor("Panel.background");
        if (c == null) {
            return Color.DARK_GRAY;
        }
        boolean light = (c.getRed() * 299 + c.getGreen() * 587 + c.getBlue() * 114) / 1000 > 128;
        int d = light ? -28 : -10;
        return new Color(clamp(c.getRed() + d), clamp(c.getGreen() + d), clamp(c.getBlue() + d));
    }

    private static int clamp(int v) {
        return Math.max(0, Math.min(255, v));
    }

    private void paintBoxes(Graphics2D g) {
        Painted chosen = null;
        Box chosenBox = null;
        BoxSource chosenSource = null;
        for (Painted p : painted) {
            FrameAnnotation a = p.track().frames().get(frame);
            Box b = a != null && a.isVisible() ? a.box() : null;
            BoxSource source = b != null ? a.source() : null;
            boolean editing = (drag == Drag.MOVE || drag == Drag.RESIZE) && p.track().id() == dragTrack;
            if (editing && preview != null) {
                b = preview.box();
                source = BoxSource.KEYFRAME; // what the edit will make it
            }
            if (selected != null && p.track().id() == selected) {
                chosen = p;
                chosenBox = b;
                chosenSource = source;
            } else if (b != null) {
                paintBox(g, p, b, source, false);
            }
        }
        if (chosenBox != null) {
            paintBox(g, chosen, chosenBox, chosenSource, true);
        }
        tags.clear();
        g.setFont(tagFont);
        FontMetrics fm = g.getFontMetrics();
        String note = null;
        Rectangle2D.Double noteTag = null;
        if (chosen != null && chosenBox == null) {
            // Placed first so the other tags keep clear of it; drawn last.
            FrameAnnotation a = chosen.track().frames().get(frame);
            Presence mark = a == null ? null : a.presence();
            note = chosen.label() + " · " + (mark == Presence.HIDDEN ? "hidden here"
                    : mark == Presence.ABSENT ? "absent here" : "no box on this frame");
            noteTag = new Rectangle2D.Double(8, 8, fm.stringWidth(note) + 8, fm.getAscent() + fm.getDescent() + 2);
            tags.reserve(noteTag);
        }
        for (Painted p : painted) {
            if (p == chosen) {
                continue;
            }
            FrameAnnotation a = p.track().frames().get(frame);
            boolean editing = (drag == Drag.MOVE || drag == Drag.RESIZE) && p.track().id() == dragTrack;
            Box b = editing && preview != null ? preview.box() : a != null && a.isVisible() ? a.box() : null;
            if (b != null) {
                paintTag(g, fm, p, b, p.label());
            }
        }
        if (chosenBox != null) {
            paintTag(g, fm, chosen, chosenBox, chosen.label());
            paintGrips(g, chosen, chosenBox);
        } else if (noteTag != null) {
            drawTag(g, fm, chosen, noteTag, note, 4);
        }
    }

    private void paintBox(Graphics2D g, Painted p, Box b, BoxSource source, boolean emphasised) {
        transform.toView(b, rect);
        if (emphasised) {
            g.setColor(p.wash());
            g.fill(rect);
        }
        int i = strokeIndex(source, emphasised);
        g.setColor(p.halo());
        g.setStroke(under[i]);
        g.draw(rect);
        g.setColor(p.colour());
        g.setStroke(over[i]);
        g.draw(rect);
    }

    /** The selected box's eight grips: squares of the class colour ringed by the halo colour. */
    private void paintGrips(Graphics2D g, Painted p, Box b) {
        transform.toView(b, rect);
        double[] xs = {rect.x, rect.x + rect.width / 2, rect.x + rect.width};
        double[] ys = {rect.y, rect.y + rect.height / 2, rect.y + rect.height};
        g.setStroke(thin);
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                if (i == 1 && j == 1) {
                    continue;
                }
                grab.setRect(Math.round(xs[i] - GRIP_SIZE / 2.0) + 0.5, Math.round(ys[j] - GRIP_SIZE / 2.0) + 0.5,
                        GRIP_SIZE, GRIP_SIZE);
                g.setColor(p.colour());
                g.fill(grab);
                g.setColor(p.text());
                g.draw(grab);
            }
        }
    }

    /**
     * The tag above the box's top-left corner; where that would leave the view or cover a tag already drawn, below
     * the box, then inside its top.
     */
    private void paintTag(Graphics2D g, FontMetrics fm, Painted p, Box b, String text) {
        transform.toView(b, rect);
        if (!rect.intersects(0, 0, getWidth(), getHeight())) {
            return; // the box is out of view: so is its tag
        }
        int pad = 3;
        int tw = fm.stringWidth(text) + 2 * pad;
        int th = fm.getAscent() + fm.getDescent() + 2;
        Rectangle2D.Double tag = tags.place(rect.x, rect.y, rect.y + rect.height, KEY_WIDTH / 2 + 1, tw, th,
                getWidth(), getHeight());
        drawTag(g, fm, p, tag, text, pad);
    }

    private void drawTag(Graphics2D g, FontMetrics fm, Painted p, Rectangle2D.Double tag, String text, int pad) {
        g.setColor(p.colour());
        g.fill(tag);
        g.setStroke(thin);
        g.setColor(p.halo());
        grab.setRect(tag.x - 0.5, tag.y - 0.5, tag.width + 1, tag.height + 1);
        g.draw(grab);
        g.setColor(p.text());
        g.drawString(text, (float) (tag.x + pad), (float) (tag.y + 1 + fm.getAscent()));
    }

    /** The box being drawn: a dashed line over a solid halo, in the theme's text and background colours. */
    private void paintBand(Graphics2D g, Box b) {
        transform.toView(b, rect);
        g.setStroke(bandHalo);
        g.setColor(bandShade);
        g.draw(rect);
        g.setStroke(thin);
        g.setColor(Color.WHITE);
        g.draw(rect);
        g.setStroke(band);
        g.setColor(Color.BLACK);
        g.draw(rect);
    }

    // --------------------------------------------------------------------------------------------- look rules

    /** The text and halo colour that reads on {@code rgb} ({@link org.modetrail.overlay.Contrast}). */
    static Color textColourOn(int rgb) {
        return org.modetrail.overlay.Contrast.textColourOn(rgb);
    }
}
