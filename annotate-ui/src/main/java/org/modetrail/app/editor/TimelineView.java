package org.modetrail.app.editor;

import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.event.MouseWheelEvent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CopyOnWriteArrayList;

import javax.swing.JComponent;
import javax.swing.ToolTipManager;
import javax.swing.UIManager;

import org.modetrail.app.editor.LaneModel.State;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * The editor's timeline: a frame ruler on top, then one lane per track (in id order) showing what the track is on
 * each frame (see {@link LanePainter} for the shapes and colours, {@link TimelineLegend} for the key), and the
 * current frame as a vertical line across all of them.
 *
 * <p>Mouse: a press sets the current frame (on the ruler or a lane) and, on a lane or its label, selects that
 * lane's track; dragging scrubs; the wheel zooms the visible frames about the frame under the pointer (which stays
 * under the pointer); shift and the wheel scroll. The view follows the current frame when it is set from outside.
 *
 * <p>Lanes are built once per track when the project changes ({@link LaneModel}, reused for tracks an edit left
 * alone) and summed up per pixel column when painted, into a buffer kept between paints. Use on the event thread.
 */
public final class TimelineView extends JComponent {
    /** What the timeline tells the window. */
    public interface Listener {
        /** The user put the current frame on {@code frame} (a click or a drag). */
        default void frameChosen(int frame) {
        }

        /** The user picked the track of a lane. */
        default void trackChosen(int trackId) {
        }
    }

    static final int LANE_HEIGHT = 18;
    static final int RULER_HEIGHT = 30;
    static final int LABEL_WIDTH = 150;
    static final int RIGHT_MARGIN = 8;
    /** The fewest frames the view zooms in to. */
    static final int MIN_SPAN = 10;
    /** Zoom factor for one notch of the wheel. */
    static final double ZOOM_STEP = 1.25;
    private static final int BAR_INSET = 3;
    /** Width and height of a keyframe's diamond. */
    static final int KEY_MARK_SIZE = 10;
    private static final int MIN_TICK_SPACING = 90;
    /** Frames at least this many pixels wide are drawn with a hairline between them. */
    private static final int FRAME_SEPARATOR_WIDTH = 8;

    private final LaneModel.Config config;
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private Map<Track, LaneModel> built = new IdentityHashMap<>();
    private LaneModel[] lanes = new LaneModel[0];
    private Track[] tracks = new Track[0];
    private Color[] classColours = new Color[0];
    private int frameCount = 1;
    private int first;
    private int span = 1;
    private int currentFrame;
    private Integer selectedTrack;
    private double[] frameTimes;
    private byte[] columns = new byte[0];
    private boolean[] keyColumns = new boolean[0];
    private LanePainter painter;

    public TimelineView() {
        this(LaneModel.Config.defaults());
    }

    public TimelineView(LaneModel.Config config) {
        if (config == null) {
            throw new IllegalArgumentException("the timeline needs its lane settings");
        }
        this.config = config;
        setOpaque(true);
        setFocusable(true);
        MouseAdapter mouse = new MouseAdapter() {
            @Override
            public void mousePressed(MouseEvent e) {
                pressed(e.getX(), e.getY());
            }

            @Override
            public void mouseDragged(MouseEvent e) {
                dragged(e.getX());
            }

            @Override
            public void mouseWheelMoved(MouseWheelEvent e) {
                wheel(e);
            }
        };
        addMouseListener(mouse);
        addMouseMotionListener(mouse);
        addMouseWheelListener(mouse);
        ToolTipManager.sharedInstance().registerComponent(this);
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public void removeListener(Listener l) {
        listeners.remove(l);
    }

    /**
     * Shows {@code p}'s tracks over a video of {@code frameCount} frames. Lanes of tracks unchanged since the last
     * call are reused. A new frame count shows the whole video; otherwise the visible frames stay.
     */
    public void setProject(Project p, int frameCount) {
        if (frameCount <= 0) {
            throw new IllegalArgumentException("a timeline needs at least one frame, got " + frameCount);
        }
        Map<Track, LaneModel> reused = frameCount == this.frameCount ? built : Map.of();
        Map<Track, LaneModel> next = new IdentityHashMap<>();
        for (Track t : p == null ? List.<Track>of() : p.tracks()) {
            LaneModel m = reused.get(t);
            next.put(t, m != null ? m : LaneModel.of(t, frameCount, config));
        }
        show(p, frameCount, next::get);
    }

    /**
     * Shows a project whose lanes were worked out already (off the event thread, with this timeline's
     * {@link #config()}): nothing is computed here but the order and colours.
     */
    public void setDigest(ProjectDigest d) {
        show(d.project(), d.frameCount(), d::lane);
    }

    private void show(Project p, int frameCount, java.util.function.Function<Track, LaneModel> laneOf) {
        boolean newLength = frameCount != this.frameCount || lanes.length == 0;
        List<Track> sorted = new ArrayList<>(p == null ? List.of() : p.tracks());
        sorted.sort((a, b) -> Integer.compare(a.id(), b.id()));
        Map<Track, LaneModel> next = new IdentityHashMap<>();
        LaneModel[] l = new LaneModel[sorted.size()];
        Color[] colours = new Color[sorted.size()];
        for (int i = 0; i < l.length; i++) {
            Track t = sorted.get(i);
            LaneModel m = laneOf.apply(t);
            next.put(t, m);
            l[i] = m;
            colours[i] = new Color(p.objectClass(t.className()).map(ObjectClass::colour).orElse(0x999999));
        }
        built = next;
        lanes = l;
        tracks = sorted.toArray(new Track[0]);
        classColours = colours;
        this.frameCount = frameCount;
        if (newLength) {
            first = 0;
            span = frameCount;
        } else {
            setRange(first, span);
        }
        currentFrame = clampFrame(currentFrame);
        revalidate();
        repaint();
    }

    /** Times of the frames in seconds, for the ruler's labels; null labels it with frame numbers. */
    public void setFrameTimes(double[] seconds) {
        frameTimes = seconds == null || seconds.length == 0 ? null : seconds.clone();
        repaint();
    }

    /** Moves the cursor to {@code frame} (clamped to the video) and scrolls to it if it is out of view. */
    public void setCurrentFrame(int frame) {
        currentFrame = clampFrame(frame);
        follow();
        repaint();
    }

    public int currentFrame() {
        return currentFrame;
    }

    /** Highlights the lane of track {@code id}; null for none. Does not tell the listeners. */
    public void setSelectedTrack(Integer id) {
        selectedTrack = id;
        repaint();
    }

    public Integer selectedTrack() {
        return selectedTrack;
    }

    /** Shows frames {@code first .. first + span - 1}, kept within the video and at least {@link #MIN_SPAN}. */
    public void setVisibleRange(int first, int span) {
        setRange(first, span);
        repaint();
    }

    public int visibleFirst() {
        return first;
    }

    public int visibleSpan() {
        return span;
    }

    public int frameCount() {
        return frameCount;
    }

    /** The lanes, in the order drawn (track id order). */
    public List<LaneModel> lanes() {
        return List.of(lanes);
    }

    /** The frame under pixel column {@code x} (clamped to the lanes' area and the video). */
    public int frameAtX(int x) {
        int w = laneWidth();
        int col = Math.max(0, Math.min(w - 1, x - LABEL_WIDTH));
        return clampFrame(LaneModel.frameAtColumn(first, span, w, col));
    }

    /** The pixel column in the middle of the columns that show {@code frame}; frames out of view fall outside. */
    public int xOfFrame(int frame) {
        int w = laneWidth();
        long k = frame - (long) first;
        // Column c shows frame first + floor(c * span / w): the columns of frame k are ceil(k w / span) up to
        // ceil((k + 1) w / span) - 1, or just the last of those when several frames share a column.
        long last = ceilDiv((k + 1) * w, span) - 1;
        long firstCol = Math.min(ceilDiv(k * w, span), last);
        return LABEL_WIDTH + (int) ((firstCol + last) / 2);
    }

    /** The track whose lane is at height {@code y}, or null above the lanes or below the last. */
    public Integer trackAtY(int y) {
        int i = laneAtY(y);
        return i < 0 ? null : tracks[i].id();
    }

    /** The top edge of the lane of track {@code id}, or -1 when it has none. */
    public int laneTop(int id) {
        for (int i = 0; i < tracks.length; i++) {
            if (tracks[i].id() == id) {
                return RULER_HEIGHT + i * LANE_HEIGHT;
            }
        }
        return -1;
    }

    /**
     * Zooms by {@code factor} (above 1 shows more frames) keeping the frame under column {@code x} there, as far
     * as the ends of the video allow.
     */
    public void zoom(double factor, int x) {
        int w = laneWidth();
        int col = Math.max(0, Math.min(w - 1, x - LABEL_WIDTH));
        int anchor = LaneModel.frameAtColumn(first, span, w, col);
        int newSpan = (int) Math.round(Math.max(1, Math.min((double) frameCount, span * factor)));
        newSpan = Math.max(Math.min(MIN_SPAN, frameCount), newSpan);
        int newFirst = anchor - (int) ((long) col * newSpan / w);
        setVisibleRange(newFirst, newSpan);
    }

    /** Scrolls the view by {@code frames} (negative to the start). */
    public void scroll(int frames) {
        setVisibleRange(first + frames, span);
    }

    @Override
    public Dimension getPreferredSize() {
        if (isPreferredSizeSet()) {
            return super.getPreferredSize();
        }
        return new Dimension(LABEL_WIDTH + 600, RULER_HEIGHT + Math.max(1, lanes.length) * LANE_HEIGHT + 4);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        painter = null;
    }

    @Override
    public String getToolTipText(MouseEvent e) {
        int i = laneAtY(e.getY());
        if (i < 0) {
            return null;
        }
        Track t = tracks[i];
        if (e.getX() < LABEL_WIDTH) {
            return "Track " + t.id() + " (" + t.className() + "), " + t.frames().size() + " annotated frames";
        }
        int f = frameAtX(e.getX());
        int w = laneWidth();
        int col = Math.max(0, Math.min(w - 1, e.getX() - LABEL_WIDTH));
        int from = LaneModel.frameAtColumn(first, span, w, col);
        int to = Math.max(from + 1, LaneModel.frameAtColumn(first, span, w, col + 1));
        State bar = State.ofPriority(lanes[i].barOver(from, to));
        boolean key = lanes[i].maxOver(from, to) == State.KEYFRAME.priority();
        String where = to - from > 1 ? "frames " + from + "-" + (to - 1) : "frame " + f + timeSuffix(f);
        String what;
        if (to - from == 1) {
            what = describe(lanes[i].stateAt(f));
            FrameAnnotation a = t.frames().get(f);
            if (a != null && a.source() == BoxSource.TRACKED && a.isVisible()) {
                what += String.format(Locale.ROOT, " (similarity %.2f)", a.score());
            }
        } else {
            // A column of several frames: its most telling state, and whether a keyframe is among them.
            what = bar == State.EMPTY ? describe(bar) : "at least one " + describe(bar).toLowerCase(Locale.ROOT)
                    + " frame";
            if (key) {
                what += ", with a keyframe";
            }
        }
        return "Track " + t.id() + " (" + t.className() + "), " + where + ": " + what;
    }

    String describe(State s) {
        return switch (s) {
            case KEYFRAME -> "Keyframe";
            case TRACKED -> "Tracked";
            case WEAK -> String.format(Locale.ROOT, "Weak (similarity under %.2f)", config.weakScore());
            case INTERPOLATED -> "Interpolated";
            case HIDDEN -> "Hidden";
            case ABSENT -> "Absent";
            case EMPTY -> "Not annotated";
        };
    }

    LaneModel.Config config() {
        return config;
    }

    // ---- mouse

    private void pressed(int x, int y) {
        requestFocusInWindow();
        int lane = laneAtY(y);
        if (lane >= 0) {
            int id = tracks[lane].id();
            selectedTrack = id;
            for (Listener l : listeners) {
                l.trackChosen(id);
            }
        }
        if (x >= LABEL_WIDTH && y >= 0 && frameCount > 0) {
            chooseFrame(frameAtX(x), true);
        }
        repaint();
    }

    private void dragged(int x) {
        if (x >= LABEL_WIDTH - 4) {
            chooseFrame(frameAtX(x), false);
        }
    }

    private void chooseFrame(int frame, boolean always) {
        if (frame == currentFrame && !always) {
            return;
        }
        currentFrame = frame;
        repaint();
        for (Listener l : listeners) {
            l.frameChosen(frame);
        }
    }

    private void wheel(MouseWheelEvent e) {
        double notches = e.getPreciseWheelRotation();
        if (notches == 0) {
            return;
        }
        if (e.isShiftDown()) {
            scroll((int) Math.round(notches * Math.max(1, span / 10.0)));
        } else {
            zoom(Math.pow(ZOOM_STEP, notches), e.getX());
        }
    }

    // ---- geometry

    private int laneWidth() {
        return Math.max(1, getWidth() - LABEL_WIDTH - RIGHT_MARGIN);
    }

    private int laneAtY(int y) {
        if (y < RULER_HEIGHT) {
            return -1;
        }
        int i = (y - RULER_HEIGHT) / LANE_HEIGHT;
        return i < tracks.length ? i : -1;
    }

    private int clampFrame(int f) {
        return Math.max(0, Math.min(frameCount - 1, f));
    }

    private void setRange(int newFirst, int newSpan) {
        span = Math.max(Math.min(MIN_SPAN, frameCount), Math.min(frameCount, newSpan));
        first = Math.max(0, Math.min(frameCount - span, newFirst));
    }

    /** Scrolls so that the current frame is in view, a tenth of the view in from the edge it left by. */
    private void follow() {
        if (currentFrame < first) {
            setRange(currentFrame - span * 9 / 10, span);
        } else if (currentFrame >= first + span) {
            setRange(currentFrame - span / 10, span);
        }
    }

    private static long ceilDiv(long a, long b) {
        return -Math.floorDiv(-a, b);
    }

    // ---- painting

    @Override
    protected void paintComponent(Graphics graphics) {
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            if (painter == null) {
                painter = LanePainter.forTheme();
            }
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            Rectangle clip = g.getClipBounds();
            if (clip == null) {
                clip = new Rectangle(0, 0, getWidth(), getHeight());
            }
            g.setColor(painter.background);
            g.fillRect(clip.x, clip.y, clip.width, clip.height);
            paintRuler(g);
            int firstLane = Math.max(0, (clip.y - RULER_HEIGHT) / LANE_HEIGHT);
            int lastLane = Math.min(tracks.length - 1, (clip.y + clip.height - RULER_HEIGHT) / LANE_HEIGHT);
            int w = laneWidth();
            if (columns.length < w) {
                columns = new byte[w];
                keyColumns = new boolean[w];
            }
            for (int i = firstLane; i <= lastLane; i++) {
                paintLane(g, i, w);
            }
            paintCursor(g);
        } finally {
            g.dispose();
        }
    }

    private Color faded(Color c, int alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), alpha);
    }

    private void paintLane(Graphics2D g, int i, int w) {
        Track t = tracks[i];
        int top = RULER_HEIGHT + i * LANE_HEIGHT;
        boolean selected = selectedTrack != null && selectedTrack == t.id();
        if (selected) {
            Color sel = UIManager.getColor("Table.selectionBackground");
            g.setColor(faded(sel == null ? painter.tracked : sel, painter.dark ? 110 : 70));
            g.fillRect(0, top, getWidth(), LANE_HEIGHT);
        } else if (i % 2 == 1) {
            g.setColor(faded(painter.text, 12));
            g.fillRect(0, top, getWidth(), LANE_HEIGHT);
        }
        // Label: class colour swatch, id, class name.
        g.setColor(classColours[i]);
        g.fillRect(6, top + 4, 10, 10);
        g.setColor(faded(painter.text, 160));
        g.drawRect(6, top + 4, 10, 10);
        Font base = getFont() != null ? getFont() : UIManager.getFont("Label.font");
        Font font = selected ? base.deriveFont(Font.BOLD) : base;
        g.setFont(font);
        FontMetrics fm = g.getFontMetrics();
        g.setColor(painter.text);
        String label = t.id() + "  " + t.className();
        int room = LABEL_WIDTH - 26;
        if (fm.stringWidth(label) > room) {
            while (label.length() > 1 && fm.stringWidth(label + "…") > room) {
                label = label.substring(0, label.length() - 1);
            }
            label += "…";
        }
        g.drawString(label, 22, top + (LANE_HEIGHT + fm.getAscent() - fm.getDescent()) / 2);

        // Bar: runs of equal columns.
        lanes[i].columns(first, span, w, columns, keyColumns);
        int barTop = top + BAR_INSET;
        int barHeight = LANE_HEIGHT - 2 * BAR_INSET;
        Rectangle oldClip = g.getClipBounds();
        g.clipRect(LABEL_WIDTH - KEY_MARK_SIZE / 2, top, w + KEY_MARK_SIZE / 2 + RIGHT_MARGIN, LANE_HEIGHT);
        // Low-priority states first, so that widened weak or hidden marks are drawn over their neighbours.
        for (int pass = 0; pass < 2; pass++) {
            int c = 0;
            while (c < w) {
                byte v = columns[c];
                int end = c + 1;
                while (end < w && columns[end] == v) {
                    end++;
                }
                State s = State.ofPriority(v);
                boolean mark = s == State.WEAK || s == State.HIDDEN;
                if (mark == (pass == 1)) {
                    painter.paintRun(g, s, LABEL_WIDTH + c, end - c, barTop, barHeight);
                }
                c = end;
            }
        }
        double frameWidth = (double) w / span;
        if (frameWidth >= FRAME_SEPARATOR_WIDTH) {
            // Zoomed in far enough to tell frames apart: a hairline of background between them.
            g.setColor(painter.background);
            for (int f = first + 1; f < first + span; f++) {
                int col = (int) ceilDiv((long) (f - first) * w, span);
                int v = col < w ? columns[col] : 0;
                // Only across filled bars: an outline (hidden) or a line (absent) is left whole.
                if (v == State.TRACKED.priority() || v == State.WEAK.priority()
                        || v == State.INTERPOLATED.priority()) {
                    g.drawLine(LABEL_WIDTH + col, barTop, LABEL_WIDTH + col, barTop + barHeight - 1);
                }
            }
        }
        paintKeyMarks(g, w, barTop);
        g.setClip(oldClip);
    }

    /**
     * Diamonds for the keyframes, centred on the bar's top edge so that the lower part of the bar shows beside
     * them: one per keyframe when zoomed in, one per run of keyframe columns when zoomed out (a little smaller), and
     * none closer to the one before than a little over its size zoomed in, twice that zoomed out (dense keyframes
     * make a loose chain, not a pile that hides the bar).
     */
    private void paintKeyMarks(Graphics2D g, int w, int barTop) {
        boolean zoomedIn = w >= span;
        int size = zoomedIn ? KEY_MARK_SIZE : KEY_MARK_SIZE - 2;
        int spacing = zoomedIn ? KEY_MARK_SIZE + 2 : 2 * KEY_MARK_SIZE;
        double last = Double.NEGATIVE_INFINITY;
        int c = 0;
        while (c < w) {
            if (!keyColumns[c]) {
                c++;
                continue;
            }
            // The columns showing the same frames as column c (one frame zoomed in; the run zoomed out).
            int end = c + 1;
            if (zoomedIn) {
                int f = LaneModel.frameAtColumn(first, span, w, c);
                while (end < w && keyColumns[end] && LaneModel.frameAtColumn(first, span, w, end) == f) {
                    end++;
                }
            } else {
                while (end < w && keyColumns[end]) {
                    end++;
                }
            }
            double centre = LABEL_WIDTH + (c + end - 1) / 2.0;
            if (centre - last >= spacing) {
                painter.diamond(g, centre, barTop + 2, size);
                last = centre;
            }
            c = end;
        }
    }

    private void paintCursor(Graphics2D g) {
        if (currentFrame < first || currentFrame >= first + span) {
            return;
        }
        int x = xOfFrame(currentFrame);
        g.setColor(painter.text);
        g.drawLine(x, RULER_HEIGHT - 8, x, Math.max(RULER_HEIGHT, RULER_HEIGHT + tracks.length * LANE_HEIGHT));
        g.fillPolygon(new int[] {x - 5, x + 6, x}, new int[] {RULER_HEIGHT - 9, RULER_HEIGHT - 9, RULER_HEIGHT - 2}, 3);
    }

    private void paintRuler(Graphics2D g) {
        Font small = (getFont() != null ? getFont() : UIManager.getFont("Label.font"));
        small = small.deriveFont(small.getSize2D() - 1f);
        g.setFont(small);
        FontMetrics fm = g.getFontMetrics();
        g.setColor(faded(painter.text, 20));
        g.fillRect(0, 0, getWidth(), RULER_HEIGHT);
        g.setColor(faded(painter.text, 90));
        g.drawLine(0, RULER_HEIGHT - 1, getWidth(), RULER_HEIGHT - 1);
        // The current frame, in the label column.
        g.setColor(painter.text);
        g.drawString("frame " + currentFrame + timeSuffix(currentFrame), 6, 12);
        g.setColor(faded(painter.text, 170));
        g.drawString(first + "–" + (first + span - 1) + " of " + frameCount, 6, 25);

        int w = laneWidth();
        double pxPerFrame = (double) w / span;
        Rectangle oldClip = g.getClipBounds();
        g.clipRect(LABEL_WIDTH - 2, 0, w + RIGHT_MARGIN + 2, RULER_HEIGHT);
        double fps = framesPerSecond();
        if (fps > 0) {
            double step = niceTimeStep(MIN_TICK_SPACING / (pxPerFrame * fps));
            double t0 = frameTimes[first];
            double t1 = frameTimes[Math.min(frameTimes.length - 1, first + span - 1)];
            double minor = step / 5;
            for (long k = (long) Math.ceil(t0 / minor); k * minor <= t1; k++) {
                int f = frameAtTime(k * minor);
                boolean major = k % 5 == 0;
                tick(g, fm, f, major, major ? clock(k * minor, step) : null);
            }
        } else {
            long step = niceFrameStep(MIN_TICK_SPACING / pxPerFrame);
            long minor = Math.max(1, step / 5);
            for (long f = (first + minor - 1) / minor * minor; f < first + span; f += minor) {
                boolean major = f % step == 0;
                tick(g, fm, (int) f, major, major ? Long.toString(f) : null);
            }
        }
        g.setClip(oldClip);
    }

    private void tick(Graphics2D g, FontMetrics fm, int frame, boolean major, String label) {
        int x = xOfFrame(frame);
        g.setColor(faded(painter.text, major ? 200 : 110));
        g.drawLine(x, RULER_HEIGHT - (major ? 10 : 5), x, RULER_HEIGHT - 1);
        if (label != null) {
            g.setColor(painter.text);
            g.drawString(label, x + 3, 13);
        }
    }

    private String timeSuffix(int frame) {
        return frameTimes != null && frame < frameTimes.length ? " (" + clock(frameTimes[frame], 0.1) + ")" : "";
    }

    /** Frames per second from the frame times, or 0 without them. */
    private double framesPerSecond() {
        if (frameTimes == null || frameTimes.length < 2 || frameTimes.length < frameCount) {
            return 0;
        }
        double d = frameTimes[frameTimes.length - 1] - frameTimes[0];
        return d > 0 ? (frameTimes.length - 1) / d : 0;
    }

    /** The first frame at or after time {@code t}. */
    private int frameAtTime(double t) {
        int i = Arrays.binarySearch(frameTimes, 0, frameCount, t - 1e-9);
        return clampFrame(i >= 0 ? i : -i - 1);
    }

    private static final double[] TIME_STEPS = {0.1, 0.2, 0.5, 1, 2, 5, 10, 15, 30, 60, 120, 300, 600, 900, 1800,
        3600, 7200};

    static double niceTimeStep(double atLeast) {
        for (double s : TIME_STEPS) {
            if (s >= atLeast) {
                return s;
            }
        }
        return TIME_STEPS[TIME_STEPS.length - 1] * Math.ceil(atLeast / TIME_STEPS[TIME_STEPS.length - 1]);
    }

    static long niceFrameStep(double atLeast) {
        long s = 1;
        while (true) {
            for (long m : new long[] {1, 2, 5}) {
                if (s * m >= atLeast) {
                    return s * m;
                }
            }
            s *= 10;
        }
    }

    /** "1:05", "1:05.4" when the step is under a second, "1:02:05" past an hour. */
    static String clock(double seconds, double step) {
        double tenths = Math.round(seconds * 10) / 10.0;
        long whole = (long) Math.floor(tenths);
        long h = whole / 3600;
        long m = whole / 60 % 60;
        double s = tenths - whole + whole % 60;
        String sec = step < 1 ? String.format(Locale.ROOT, "%04.1f", s) : String.format(Locale.ROOT, "%02d",
                (long) Math.floor(s));
        return h > 0 ? String.format(Locale.ROOT, "%d:%02d:%s", h, m, sec)
                : String.format(Locale.ROOT, "%d:%s", m, sec);
    }
}
