package org.modetrail.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The zone and counting-line edits the editor makes: names, refusals, and that nothing else changes. */
class SiteEditsTest {
    private static final List<PixelPoint> SQUARE = List.of(new PixelPoint(10, 10), new PixelPoint(50, 10),
            new PixelPoint(50, 50), new PixelPoint(10, 50));

    private static Project empty() {
        return Project.of(new VideoRef("clip.mp4", 640, 480, 10, ""));
    }

    private static Project withOneOfEach() {
        Project p = SiteEdits.addZone(empty(), new Zone("nest", SQUARE)).project();
        return SiteEdits.addLine(p, new CountingLine("gate", new PixelPoint(0, 100), new PixelPoint(100, 100)))
                .project();
    }

    @Test
    void defaultNamesCountUpAndFillGaps() {
        Project p = empty();
        assertEquals("zone 1", SiteEdits.freeZoneName(p.site()));
        assertEquals("line 1", SiteEdits.freeLineName(p.site()));
        p = SiteEdits.addZone(p, new Zone("zone 1", SQUARE)).project();
        p = SiteEdits.addZone(p, new Zone("zone 3", SQUARE)).project();
        assertEquals("zone 2", SiteEdits.freeZoneName(p.site()));
        p = SiteEdits.addZone(p, new Zone("zone 2", SQUARE)).project();
        assertEquals("zone 4", SiteEdits.freeZoneName(p.site()));
        assertEquals("line 1", SiteEdits.freeLineName(p.site()), "zone names do not take line names");
    }

    @Test
    void addingKeepsTracksAndCalibrationAndTracksNothing() {
        Edit e = SiteEdits.addZone(empty(), new Zone("nest", SQUARE));
        assertFalse(e.retrack());
        assertEquals(List.of(new Zone("nest", SQUARE)), e.project().site().zones());
        assertEquals(empty().video(), e.project().video());
    }

    @Test
    void aDuplicateNameIsRefusedWithTheName() {
        Project p = withOneOfEach();
        IllegalArgumentException z = assertThrows(IllegalArgumentException.class,
                () -> SiteEdits.addZone(p, new Zone(" nest ", SQUARE)));
        assertTrue(z.getMessage().contains("'nest'") && z.getMessage().contains("another name"), z.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SiteEdits.addLine(p,
                new CountingLine("gate", new PixelPoint(1, 1), new PixelPoint(2, 2))));
        assertThrows(IllegalArgumentException.class, () -> SiteEdits.renameLine(
                SiteEdits.addLine(p, new CountingLine("exit", new PixelPoint(1, 1), new PixelPoint(2, 2))).project(),
                "exit", "gate"));
        // A zone and a line may share a name: the summary's columns tell them apart.
        assertEquals(2, SiteEdits.addLine(p, new CountingLine("nest", new PixelPoint(1, 1), new PixelPoint(2, 2)))
                .project().site().lines().size());
    }

    @Test
    void aZoneWithoutAreaIsRefused() {
        List<PixelPoint> flat = List.of(new PixelPoint(0, 0), new PixelPoint(10, 10), new PixelPoint(20, 20));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SiteEdits.addZone(empty(), new Zone("flat", flat)));
        assertTrue(e.getMessage().contains("one line"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SiteEdits.reshapeZone(withOneOfEach(), "nest", flat));
        assertThrows(IllegalArgumentException.class, () -> SiteEdits.reshapeZone(withOneOfEach(), "nest",
                SQUARE.subList(0, 2)));
    }

    @Test
    void theShoelaceAreaOfASquareAndATriangle() {
        assertEquals(1600, SiteEdits.area(SQUARE), 1e-9);
        assertEquals(1600, SiteEdits.area(List.of(SQUARE.get(3), SQUARE.get(2), SQUARE.get(1), SQUARE.get(0))), 1e-9, "either winding");
        // Half of base 4 times height 3.
        assertEquals(6, SiteEdits.area(List.of(new PixelPoint(0, 0), new PixelPoint(4, 0), new PixelPoint(1, 3))),
                1e-9);
    }

    @Test
    void renameReshapeMoveAndRemoveChangeOnlyTheNamedOne() {
        Project p = withOneOfEach();
        Project renamed = SiteEdits.renameZone(p, "nest", "  burrow ").project();
        assertEquals("burrow", renamed.site().zones().get(0).name());
        assertEquals(SQUARE, renamed.site().zones().get(0).polygon());
        assertSame(p.site().lines().get(0), renamed.site().lines().get(0));
        assertEquals("nest", SiteEdits.renameZone(p, "nest", "nest").project().site().zones().get(0).name(),
                "renaming to its own name is no clash");
        List<PixelPoint> moved = List.of(new PixelPoint(0, 0), new PixelPoint(9, 0), new PixelPoint(0, 9));
        assertEquals(moved, SiteEdits.reshapeZone(p, "nest", moved).project().site().zones().get(0).polygon());
        CountingLine l = SiteEdits.moveLine(p, "gate", new PixelPoint(5, 5), new PixelPoint(5, 90)).project()
                .site().lines().get(0);
        assertEquals(new CountingLine("gate", new PixelPoint(5, 5), new PixelPoint(5, 90)), l);
        Project noZone = SiteEdits.removeZone(p, "nest").project();
        assertTrue(noZone.site().zones().isEmpty());
        assertEquals(1, noZone.site().lines().size());
        assertTrue(SiteEdits.removeLine(p, "gate").project().site().lines().isEmpty());
        IllegalArgumentException none = assertThrows(IllegalArgumentException.class,
                () -> SiteEdits.removeZone(p, "pond"));
        assertTrue(none.getMessage().contains("'pond'"), none.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SiteEdits.renameZone(p, "nest", "  "));
    }

    @Test
    void anImportReplacesSameNamedOnesInPlaceAndAddsTheRest() {
        Project p = SiteEdits.addZone(withOneOfEach(), new Zone("pond", SQUARE)).project();
        List<PixelPoint> triangle = List.of(new PixelPoint(0, 0), new PixelPoint(9, 0), new PixelPoint(0, 9));
        Site file = new Site(null, List.of(new Zone("nest", triangle), new Zone("field", triangle)),
                List.of(new CountingLine("gate", new PixelPoint(1, 2), new PixelPoint(3, 4))));
        Site merged = SiteEdits.merge(p, file).project().site();
        assertEquals(List.of("nest", "pond", "field"), merged.zones().stream().map(Zone::name).toList());
        assertEquals(triangle, merged.zones().get(0).polygon());
        assertEquals(SQUARE, merged.zones().get(1).polygon());
        assertEquals(new PixelPoint(1, 2), merged.lines().get(0).from());
        assertEquals(1, merged.lines().size());
    }
}
