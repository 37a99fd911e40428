package org.modetrail.format.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.ContactPoint;
import org.modetrail.model.CountingLine;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.Homography;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.PointError;
import org.modetrail.model.Project;
import org.modetrail.model.Site;
import org.modetrail.model.WorldPoint;
import org.modetrail.model.Zone;

/** Schema 2's scene: calibration, zones, counting lines and contact points, written, read, upgraded and refused. */
class SiteInProjectFileTest {
    @TempDir
    Path dir;

    static Project withSite() {
        Project p = SampleProjects.small();
        List<GroundPoint> points = List.of(
                new GroundPoint(new PixelPoint(100, 400), new WorldPoint(0, 0)),
                new GroundPoint(new PixelPoint(540, 400), new WorldPoint(7.5, 0)),
                new GroundPoint(new PixelPoint(500.5, 120), new WorldPoint(7.5, 30)),
                new GroundPoint(new PixelPoint(140, 120), new WorldPoint(0, 30)),
                new GroundPoint(new PixelPoint(320, 250), new WorldPoint(3.9, 12.25)));
        GroundCalibration c = new GroundCalibration(points,
                new Homography(new double[] {0.017, 0.0012, -1.9, 0, -0.09, 36.1, 0, 0.0021, 1}),
                List.of(new PointError(0.31, 0.02, true), new PointError(0.2, 0.01, true),
                        new PointError(0.44, 0.09, true), new PointError(0.12, 0.03, true),
                        new PointError(14.5, 1.7, false)),
                0.29, 0.047, List.of("point 5 is an outlier (14.5 px) and was left out of the fit"));
        Site site = new Site(c,
                List.of(new Zone("nest", List.of(new PixelPoint(10, 10), new PixelPoint(60, 12.5),
                        new PixelPoint(40, 80)))),
                List.of(new CountingLine("gate", new PixelPoint(0, 240), new PixelPoint(640, 240.5))));
        Project q = p.withSite(site);
        return new Project(q.video(), List.of(q.classes().get(0).withContact(ContactPoint.CENTRE),
                q.classes().get(1)), q.tracks(), q.site());
    }

    @Test
    void theSiteAndContactPointsRoundTrip() throws Exception {
        Path file = dir.resolve("road.json");
        Project p = withSite();
        ProjectFile.write(p, file);
        Project back = ProjectFile.read(file);
        assertEquals(p, back);
        assertEquals(ContactPoint.CENTRE, back.contactPoint("mouse"));
        assertEquals(ContactPoint.BOTTOM_CENTRE, back.contactPoint("käfer"));
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        // The layout docs/project-file.md shows: one calibration point, zone and line per line.
        assertTrue(lines.contains("      [100,400,0,0],"), lines.toString());
        assertTrue(lines.contains("      {\"name\": \"nest\", \"polygon\": [[10,10],[60,12.5],[40,80]]}"),
                lines.toString());
        assertTrue(lines.contains("      {\"name\": \"gate\", \"from\": [0,240], \"to\": [640,240.5]}"),
                lines.toString());
    }

    @Test
    void aSchemaOneFileHasNoSiteAndBottomCentreContacts() throws Exception {
        Path file = dir.resolve("old.json");
        Files.writeString(file, DamagedFileTest.VALID.replace("\"schema\": 2,", "\"schema\": 1,"));
        Project p = ProjectFile.read(file);
        assertEquals(Site.NONE, p.site());
        assertEquals(new ObjectClass("ant", 0x00FF00, ContactPoint.BOTTOM_CENTRE), p.classes().get(0));
    }

    private ProjectFileException refused(String from, String to) throws Exception {
        Path file = dir.resolve("p.json");
        ProjectFile.write(withSite(), file);
        String text = Files.readString(file);
        assertTrue(text.contains(from), "the test's edit must apply: " + from);
        Files.writeString(file, text.replace(from, to));
        byte[] before = Files.readAllBytes(file);
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals(new String(before, StandardCharsets.UTF_8), Files.readString(file), "nothing changes on disk");
        return e;
    }

    @Test
    void aDamagedSiteIsRefusedWithItsLine() throws Exception {
        ProjectFileException twoCorners = refused("[[10,10],[60,12.5],[40,80]]", "[[10,10],[60,12.5]]");
        assertTrue(twoCorners.getMessage().contains("zone 'nest' needs at least 3 corners"), twoCorners.getMessage());
        assertTrue(twoCorners.line() > 0, "the error names its line");
        ProjectFileException contact = refused("\"contact\": [0.5,0.5]", "\"contact\": [2,0.5]");
        assertTrue(contact.getMessage().contains("fractions 0 to 1"), contact.getMessage());
        assertEquals(6, contact.line(), contact.getMessage());
        ProjectFileException field = refused("\"rms_px\"", "\"rms_pixels\"");
        assertTrue(field.getMessage().contains("unknown field \"rms_pixels\" in \"calibration\""),
                field.getMessage());
        ProjectFileException gate = refused("\"to\": [640,240.5]", "\"to\": [0,240]");
        assertTrue(gate.getMessage().contains("two different end points"), gate.getMessage());
    }
}
