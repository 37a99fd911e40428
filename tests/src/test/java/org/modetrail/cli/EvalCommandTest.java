package org.modetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import javax.imageio.ImageIO;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The eval command on the generator's truth of the arena demo: the truth against itself, against a copy with every
 * box shifted by a known amount (IoU known analytically), and bad input.
 */
class EvalCommandTest {
    private static final Path TRUTH = Path.of("..", "clips", "arena-truth.csv");

    @TempDir
    Path dir;

    /** The truth with every box moved right by {@code dx} px and track ids offset by {@code idShift}. */
    private Path shifted(double dx, int idShift) throws Exception {
        List<String> lines = Files.readAllLines(TRUTH);
        StringBuilder b = new StringBuilder(lines.get(0)).append('\n');
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            // track_id,class,frame,time_s,x,y,width,height,visible
            f[0] = Integer.toString(Integer.parseInt(f[0]) + idShift);
            f[4] = String.format(Locale.ROOT, "%.4f", Double.parseDouble(f[4]) + dx);
            b.append(String.join(",", f)).append('\n');
        }
        return Files.writeString(dir.resolve("shifted.csv"), b);
    }

    @Test
    void theTruthAgainstItselfScoresPerfectly() {
        RoadFixture.Run r = RoadFixture.run("eval", "--truth", TRUTH.toString(), "--tracks", TRUTH.toString());
        assertEquals(0, r.code(), r.err());
        // OTB's strict "above": no IoU is above 1, so a perfect track's area is 20/21 (Wu, Lim and Yang 2013).
        assertTrue(r.out().contains("success_auc            0.9524"), r.out());
        assertTrue(r.out().contains("mota                   1.0000"), r.out());
        assertTrue(r.out().contains("idf1                   1.0000"), r.out());
        assertTrue(r.out().contains("hota                   1.0000"), r.out());
        assertTrue(r.out().contains("id_switches                 0"), r.out());
    }

    @Test
    void boxesShiftedByAKnownAmountGiveTheirKnownIoUInTheReport() throws Exception {
        // A box moved by dx along its width w keeps IoU (w - dx) / (w + dx). With dx = 4 every arena box (widths
        // 17 to 44 px in the truth) has IoU between 13/21 = 0.619 and 40/48 = 0.833: all above 0.5, so CLEAR MOT
        // matches every box (MOTA 1) and the HOTA true positives at alpha = 0.05 .. 0.60 are every box.
        Path tracks = shifted(4, 0);
        Path report = dir.resolve("report");
        RoadFixture.Run r = RoadFixture.run("eval", "--truth", TRUTH.toString(), "--tracks", tracks.toString(),
                "--report", report.toString());
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(report.resolve("figures.json").toFile());
        JsonNode f = j.get("figures");
        assertEquals(1, f.get("mota").asDouble(), 1e-12);
        assertEquals(0, f.get("id_switches").asInt());
        assertEquals(1, f.get("success_iou50").asDouble(), 1e-12);
        assertEquals(1, f.get("precision_20px").asDouble(), 1e-12, "centres 4 px apart");
        double motp = f.get("motp").asDouble();
        assertTrue(motp > 13.0 / 21 && motp < 40.0 / 48, "MOTP " + motp + " within the IoU range");
        for (int a = 0; a < 12; a++) { // alpha 0.05 .. 0.60
            assertEquals(1, j.get("hota_by_alpha").get("deta").get(a).asDouble(), 1e-12, "alpha index " + a);
        }
        List<String> csv = Files.readAllLines(report.resolve("figures.csv"));
        assertEquals("measure,value,meaning", csv.get(0));
        assertTrue(csv.stream().anyMatch(l -> l.startsWith("mota,1.0000,")), csv.toString());
        List<String> objects = Files.readAllLines(report.resolve("objects.csv"));
        assertEquals(4, objects.size(), "header and the three animals");
        for (String png : List.of("success.png", "precision.png")) {
            BufferedImage img = ImageIO.read(report.resolve(png).toFile());
            assertEquals(1000, img.getWidth(), png);
        }
    }

    @Test
    void idsThatNeverMatchLeaveSingleObjectFiguresAtZeroButTheIdentityFreeOnesWhole() throws Exception {
        // The same boxes under other ids: no truth object finds its track by id (success 0), while CLEAR MOT,
        // which matches by overlap, still matches every box, and IDF1 pairs whole trajectories whatever the ids.
        Path tracks = shifted(0, 100);
        RoadFixture.Run r = RoadFixture.run("eval", "--truth", TRUTH.toString(), "--tracks", tracks.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("success_auc            0.0000"), r.out());
        assertTrue(r.out().contains("mota                   1.0000"), r.out());
        assertTrue(r.out().contains("idf1                   1.0000"), r.out());
    }

    @Test
    void noTracksAndBadInput() throws Exception {
        Path empty = Files.writeString(dir.resolve("empty.csv"), "track_id,frame,x,y,width,height\n");
        RoadFixture.Run none = RoadFixture.run("eval", "--truth", TRUTH.toString(), "--tracks", empty.toString());
        assertEquals(0, none.code(), none.err());
        assertTrue(none.out().contains("mota                   0.0000"), none.out());
        assertTrue(none.out().contains("idf1                   0.0000"), none.out());
        RoadFixture.Run noTruth = RoadFixture.run("eval", "--truth", empty.toString(), "--tracks", TRUTH.toString());
        assertEquals(0, noTruth.code(), noTruth.err());
        assertTrue(noTruth.out().contains("mota                      n/a"), noTruth.out());
        assertTrue(noTruth.err().contains("holds no boxes"), noTruth.err());

        Path bad = Files.writeString(dir.resolve("bad.csv"), "track_id,frame,x,y,width,height\n1,0,1,1,10,10\n"
                + "1,1,1,1,ten,10\n");
        RoadFixture.Run r = RoadFixture.run("eval", "--truth", TRUTH.toString(), "--tracks", bad.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("bad.csv") && r.err().contains("line 3") && r.err().contains("width"), r.err());
        RoadFixture.Run iou = RoadFixture.run("eval", "--truth", TRUTH.toString(), "--tracks", TRUTH.toString(),
                "--iou", "1.5");
        assertEquals(2, iou.code());
        assertTrue(iou.err().contains("--iou"), iou.err());
    }
}
