package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.List;

import javax.swing.JComponent;
import javax.swing.KeyStroke;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.CountingLine;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Site;
import org.modetrail.model.Zone;

/**
 * Drawing, selecting and moving zones and counting lines on the canvas, with mouse events and key bindings sent
 * straight to it (headless). As in {@link FrameViewTest}, an 800x600 canvas shows the 640x480 frame at 1.25x with
 * no offset: image (x, y) is view (1.25x, 1.25y). Track 1's box covers image (80, 80) 120x96.
 */
class FrameViewSiteTest {
    /** Zone "pen", image (400, 40)-(600, 40)-(600, 200)-(400, 200); line "gate", image (40, 400) to (300, 400). */
    private static final Site SITE = new Site(null,
            List.of(new Zone("pen", List.of(new PixelPoint(400, 40), new PixelPoint(600, 40),
                    new PixelPoint(600, 200), new PixelPoint(400, 200)))),
            List.of(new CountingLine("gate", new PixelPoint(40, 400), new PixelPoint(300, 400))));

    private FrameView view;
    private final List<String> heard = new ArrayList<>();

    @BeforeEach
    void canvas() {
        FrameViewTest.onEdt(() -> {
            view = new FrameView();
            view.setSize(800, 600);
            view.showFrame(0, FrameViewTest.grey(640, 480));
            view.setProject(FrameViewTest.project().withSite(SITE));
            view.setListener(new FrameView.Listener() {
                @Override
                public void zoneDrawn(List<PixelPoint> corners) {
                    heard.add("zone " + corners);
                }

                @Override
                public void lineDrawn(PixelPoint from, PixelPoint to) {
                    heard.add("line " + from + " " + to);
                }

                @Override
                public void siteSelected(SiteItem item) {
                    heard.add("site " + item);
                }

                @Override
                public void zoneChanged(String name, List<PixelPoint> polygon) {
                    heard.add("zone changed " + name + " " + polygon);
                }

                @Override
                public void lineChanged(String name, PixelPoint from, PixelPoint to) {
                    heard.add("line changed " + name + " " + from + " " + to);
                }

                @Override
                public void trackSelected(Integer trackId) {
                    heard.add("track " + trackId);
                }

                @Override
                public void boxDrawn(int frame, Box box) {
                    heard.add("box " + box);
                }

                @Override
                public void message(String text) {
                    heard.add("message " + text);
                }
            });
        });
    }

    private void mouse(int id, int x, int y, int clicks) {
        FrameViewTest.onEdt(() -> view.dispatchEvent(new MouseEvent(view, id, System.currentTimeMillis(),
                id == MouseEvent.MOUSE_RELEASED ? 0 : InputEvent.BUTTON1_DOWN_MASK, x, y, clicks, false,
                MouseEvent.BUTTON1)));
    }

    private void click(int x, int y) {
        click(x, y, 1);
    }

    private void click(int x, int y, int clicks) {
        mouse(MouseEvent.MOUSE_PRESSED, x, y, clicks);
        mouse(MouseEvent.MOUSE_RELEASED, x, y, clicks);
    }

    private void drag(int fromX, int fromY, int toX, int toY) {
        mouse(MouseEvent.MOUSE_PRESSED, fromX, fromY, 1);
        mouse(MouseEvent.MOUSE_DRAGGED, (fromX + toX) / 2, (fromY + toY) / 2, 0);
        mouse(MouseEvent.MOUSE_DRAGGED, toX, toY, 0);
        mouse(MouseEvent.MOUSE_RELEASED, toX, toY, 1);
    }

    /** Runs a key binding of the canvas (key events need a focus owner, which a headless run has not). */
    private void key(String stroke) {
        FrameViewTest.onEdt(() -> view.getActionMap().get(view.getInputMap(JComponent.WHEN_FOCUSED)
                .get(KeyStroke.getKeyStroke(stroke))).actionPerformed(new ActionEvent(view, 0, stroke)));
    }

    private static PixelPoint p(double x, double y) {
        return new PixelPoint(x, y);
    }

    private List<String> messages() {
        return heard.stream().filter(h -> h.startsWith("message ")).toList();
    }

    @Test
    void theZoneToolTakesCornersEvenOnABoxAndClosesOnTheFirstCorner() {
        FrameViewTest.onEdt(view::startZoneTool);
        heard.clear();
        click(100, 100); // track 1's top-left corner: a corner of the zone, not a track selection
        click(300, 100);
        click(300, 300);
        assertEquals(List.of(p(80, 80), p(240, 80), p(240, 240)), view.zoneDraft());
        click(102, 98); // within reach of the first corner
        assertEquals(List.of("zone " + List.of(p(80, 80), p(240, 80), p(240, 240))), heard);
        assertFalse(view.drawsSite(), "the tool ends with the zone");
        assertNull(view.selectedTrack());
    }

    @Test
    void tooFewCornersAreExplainedAndKeptBackspaceTakesOneBackEnterAndDoubleClickClose() {
        FrameViewTest.onEdt(view::startZoneTool);
        heard.clear();
        click(100, 400);
        click(200, 400);
        key("ENTER");
        assertEquals(1, messages().size(), heard.toString());
        assertTrue(messages().get(0).contains("at least 3 corners"), heard.toString());
        assertEquals(2, view.zoneDraft().size(), "nothing lost");
        click(200, 500);
        click(150, 550);
        key("BACK_SPACE");
        assertEquals(List.of(p(80, 320), p(160, 320), p(160, 400)), view.zoneDraft());
        key("ENTER");
        assertEquals("zone " + List.of(p(80, 320), p(160, 320), p(160, 400)), heard.get(heard.size() - 1));

        FrameViewTest.onEdt(view::startZoneTool);
        heard.clear();
        click(100, 400);
        click(200, 400);
        click(200, 500, 1);
        click(200, 500, 2); // the second click of a double click closes, adding nothing
        assertEquals(List.of("zone " + List.of(p(80, 320), p(160, 320), p(160, 400))), heard);
    }

    @Test
    void escapeDropsTheZoneBeingDrawn() {
        FrameViewTest.onEdt(view::startZoneTool);
        click(100, 400);
        click(200, 400);
        key("ESCAPE");
        assertFalse(view.drawsSite());
        heard.clear();
        click(300, 300);
        assertTrue(heard.stream().noneMatch(h -> h.startsWith("zone")), heard.toString());
    }

    @Test
    void cornersPastTheFrameAreKeptInsideWithAMessage() {
        // A middle drag pans the frame by (100, 50), leaving room above and left of it.
        FrameViewTest.onEdt(() -> {
            for (int id : new int[] {MouseEvent.MOUSE_PRESSED, MouseEvent.MOUSE_DRAGGED, MouseEvent.MOUSE_RELEASED}) {
                int at = id == MouseEvent.MOUSE_PRESSED ? 0 : 1;
                view.dispatchEvent(new MouseEvent(view, id, System.currentTimeMillis(),
                        id == MouseEvent.MOUSE_RELEASED ? 0 : InputEvent.BUTTON2_DOWN_MASK, 300 + 100 * at,
                        300 + 50 * at, 1, false, MouseEvent.BUTTON2));
            }
        });
        assertEquals(new ViewTransform(1.25, 100, 50), view.transform());
        FrameViewTest.onEdt(view::startZoneTool);
        heard.clear();
        click(20, 20); // left of and above the frame, image (-64, -24): its top-left corner
        click(400, 100);
        click(300, 300);
        key("ENTER");
        assertEquals("zone " + List.of(p(0, 0), p(240, 40), p(160, 200)), heard.get(heard.size() - 1));
        assertTrue(messages().stream().anyMatch(m -> m.contains("inside the frame")), heard.toString());
    }

    @Test
    void aLineByDragOrByTwoClicksAndAZeroLengthOneRefused() {
        FrameViewTest.onEdt(view::startLineTool);
        heard.clear();
        drag(100, 500, 400, 550);
        assertEquals(List.of("line " + p(80, 400) + " " + p(320, 440)), heard);

        FrameViewTest.onEdt(view::startLineTool);
        heard.clear();
        click(100, 100); // on track 1's box: an end of the line, not a selection
        assertTrue(view.drawsSite(), "waits for the other end");
        click(101, 101); // the same place: refused, the first end kept
        assertEquals(1, messages().size(), heard.toString());
        assertTrue(messages().get(0).contains("two different ends"), heard.toString());
        click(200, 125);
        assertEquals("line " + p(80, 80) + " " + p(160, 100), heard.get(heard.size() - 1));
    }

    @Test
    void clickingALineSelectsItAndDraggingItsEndMovesOnlyThatEnd() {
        // Line "gate" runs along view y = 500 from x = 50 to 375.
        click(200, 503);
        assertEquals(List.of("site " + SiteItem.line("gate")), heard);
        assertEquals(SiteItem.line("gate"), view.selectedSite());
        heard.clear();
        drag(375, 500, 500, 450);
        assertEquals(List.of("line changed gate " + p(40, 400) + " " + p(400, 360)), heard);
    }

    @Test
    void draggingAZoneCornerMovesItAndItsOutlineMovesTheWholeZoneWithinTheFrame() {
        click(500, 50); // on the top edge of "pen" (view 500..750 x 50..250)
        assertEquals(SiteItem.zone("pen"), view.selectedSite());
        heard.clear();
        drag(750, 250, 775, 275);
        assertEquals(List.of("zone changed pen " + List.of(p(400, 40), p(600, 40), p(620, 220), p(400, 200))),
                heard);
        heard.clear();
        drag(625, 50, 725, -10); // 80 image px right, 48 up: stops at the frame's right and top edges
        assertEquals("zone changed pen " + List.of(p(440, 0), p(640, 0), p(640, 160), p(440, 160)), heard.get(0));
        assertTrue(messages().stream().anyMatch(m -> m.contains("inside the frame")), heard.toString());
    }

    @Test
    void aClickInsideAZoneSelectsItButADragThereStillDrawsABox() {
        drag(560, 100, 640, 180);
        assertEquals(List.of("box " + new Box(448, 80, 64, 64)), heard);
        heard.clear();
        click(600, 150);
        assertEquals(List.of("site " + SiteItem.zone("pen")), heard);
        // A click on a box selects the track and drops the zone.
        heard.clear();
        click(140, 130);
        assertEquals(List.of("track 1", "site null"), heard);
        assertNull(view.selectedSite());
    }

    @Test
    void hiddenZonesAndLinesCannotBeClicked() {
        FrameViewTest.onEdt(() -> view.setSiteVisible(false));
        click(200, 500);
        click(600, 150);
        assertTrue(heard.stream().noneMatch(h -> h.startsWith("site SiteItem")), heard.toString());
        assertNull(view.selectedSite());
    }
}
