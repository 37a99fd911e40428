package org.modetrail.app.editor;

import java.awt.Dimension;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.RenderingHints;

import javax.swing.JComponent;
import javax.swing.UIManager;

import org.modetrail.app.editor.LaneModel.State;

/**
 * The key to the timeline's lanes: one sample of each state, drawn by the same painter as the lanes, with its
 * name, in one row from most to least important. Place it under a {@link TimelineView}.
 */
public final class TimelineLegend extends JComponent {
    private static final State[] SHOWN = {State.KEYFRAME, State.WEAK, State.HIDDEN, State.INTERPOLATED,
        State.TRACKED, State.ABSENT, State.EMPTY};
    private static final int SAMPLE_WIDTH = 30;
    private static final int SAMPLE_HEIGHT = 12;
    private static final int GAP = 16;

    private final TimelineView timeline;
    private LanePainter painter;

    /** The legend of {@code timeline}'s lanes (for its weak threshold). */
    public TimelineLegend(TimelineView timeline) {
        this.timeline = timeline;
        setOpaque(true);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        painter = null;
    }

    @Override
    public Dimension getPreferredSize() {
        if (isPreferredSizeSet()) {
            return super.getPreferredSize();
        }
        FontMetrics fm = getFontMetrics(font());
        int w = 8;
        for (State s : SHOWN) {
            w += SAMPLE_WIDTH + 6 + fm.stringWidth(name(s)) + GAP;
        }
        return new Dimension(w, Math.max(SAMPLE_HEIGHT, fm.getHeight()) + 10);
    }

    private java.awt.Font font() {
        return getFont() != null ? getFont() : UIManager.getFont("Label.font");
    }

    private String name(State s) {
        return s == State.EMPTY ? "Not annotated" : timeline.describe(s);
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            if (painter == null) {
                painter = LanePainter.forTheme();
            }
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(painter.background);
            g.fillRect(0, 0, getWidth(), getHeight());
            g.setFont(font());
            FontMetrics fm = g.getFontMetrics();
            int x = 8;
            int top = (getHeight() - SAMPLE_HEIGHT) / 2;
            for (State s : SHOWN) {
                Rectangle r = new Rectangle(x, top, SAMPLE_WIDTH, SAMPLE_HEIGHT);
                if (s == State.EMPTY) {
                    g.setColor(painter.absent);
                    g.drawRect(r.x, r.y, r.width - 1, r.height - 1);
                    // A dotted frame for "nothing here"; the lanes themselves leave empty frames blank.
                    g.setColor(painter.background);
                    for (int i = r.x + 2; i < r.x + r.width - 2; i += 4) {
                        g.drawLine(i, r.y, i + 1, r.y);
                        g.drawLine(i, r.y + r.height - 1, i + 1, r.y + r.height - 1);
                    }
                } else {
                    painter.paintSample(g, s, r);
                }
                x += SAMPLE_WIDTH + 6;
                g.setColor(painter.text);
                String n = name(s);
                g.drawString(n, x, (getHeight() + fm.getAscent() - fm.getDescent()) / 2);
                x += fm.stringWidth(n) + GAP;
            }
        } finally {
            g.dispose();
        }
    }
}
