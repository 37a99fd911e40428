package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import javax.swing.JTable;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.Test;
import org.modetrail.app.editor.TrackListPanel.Row;
import org.modetrail.model.Box;
import org.modetrail.model.Edits;
import org.modetrail.model.Project;

/**
 * The track list's figures, sorting and selection, on the event thread but without a display. The figures are
 * worked by hand from {@link TimelineDemo#project} with fixed boxes.
 */
class TrackListPanelTest {

    private static void onEdt(Runnable r) throws Exception {
        SwingUtilities.invokeAndWait(r);
    }

    @Test
    void rowsCarryTheQualityFigures() throws Exception {
        onEdt(() -> {
            TrackListPanel list = new TrackListPanel();
            list.setProject(TimelineDemo.project(null), TimelineDemo.FRAMES);
            List<Row> rows = list.rows();
            assertEquals(4, rows.size());
            // Track 1: 450 frames less 31 hidden = 419 boxes; keyframes 0, 75, 150, 225, 331, 375, 449;
            // 412 tracked, 16 at 0.35 and 396 at 0.85: mean 342.2 / 412 = 0.8306; one weak span (200-215).
            Row r1 = rows.get(0);
            assertEquals(1, r1.trackId());
            assertEquals("animal", r1.objectClass().name());
            assertEquals(0xE69F00, r1.objectClass().colour());
            assertEquals(419, r1.boxes());
            assertEquals(7, r1.keyframes());
            assertEquals(0.8306, r1.meanSimilarity(), 1e-4);
            assertEquals(1, r1.concerns());
            // Track 3: 1 + 150 + 49 + 1 + 99 = 300 boxes; a weak span 101-250 and two jumps (frames 379-380
            // and 383-384, 120 px on a box of diagonal 46.6).
            Row r3 = rows.get(2);
            assertEquals(300, r3.boxes());
            assertEquals(2, r3.keyframes());
            assertEquals(3, r3.concerns());
            // Track 4: 40 tracked at 0.8 and 10 at 0.4: 36 / 50 = 0.72.
            assertEquals(0.72, rows.get(3).meanSimilarity(), 1e-9);
            assertEquals("handler", rows.get(3).objectClass().name());
        });
    }

    @Test
    void aTrackWithoutTrackedFramesHasNoSimilarity() throws Exception {
        onEdt(() -> {
            Project p = Edits.newTrack(TimelineDemo.project(null), TimelineDemo.ANIMAL, 5, new Box(1, 1, 9, 9))
                    .project();
            TrackListPanel list = new TrackListPanel();
            list.setProject(p, TimelineDemo.FRAMES);
            Row added = list.rows().get(4);
            assertEquals(5, added.trackId());
            assertNull(added.meanSimilarity());
            assertEquals(1, added.keyframes());
            assertEquals("–", ((javax.swing.JLabel) list.table().prepareRenderer(
                    list.table().getCellRenderer(4, TrackListPanel.COL_SIMILARITY), 4,
                    TrackListPanel.COL_SIMILARITY)).getText());
        });
    }

    @Test
    void sortingAndSelection() throws Exception {
        onEdt(() -> {
            List<Integer> heard = new CopyOnWriteArrayList<>();
            TrackListPanel list = new TrackListPanel();
            list.addListener(heard::add);
            list.setProject(TimelineDemo.project(null), TimelineDemo.FRAMES);
            JTable table = list.table();
            table.getRowSorter().toggleSortOrder(TrackListPanel.COL_CONCERNS);
            // Concerns 1, 1, 3, 1 for tracks 1 to 4: ascending puts track 3 last.
            assertEquals(3, table.getValueAt(3, TrackListPanel.COL_ID));
            // A user's choice of a row is heard ...
            table.setRowSelectionInterval(3, 3);
            assertEquals(List.of(3), heard);
            // ... setting it from outside is not, and selects the row wherever sorting put it.
            list.setSelectedTrack(1);
            assertEquals(List.of(3), heard);
            assertEquals(1, list.selectedTrack());
            assertEquals(1, table.getValueAt(table.getSelectedRow(), TrackListPanel.COL_ID));
            // A new project keeps the selection, quietly.
            list.setProject(TimelineDemo.project(null), TimelineDemo.FRAMES);
            assertEquals(1, list.selectedTrack());
            list.setSelectedTrack(null);
            assertNull(list.selectedTrack());
            list.setSelectedTrack(99);
            assertNull(list.selectedTrack());
            assertEquals(List.of(3), heard);
        });
    }
}
