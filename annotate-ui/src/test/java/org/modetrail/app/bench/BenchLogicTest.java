package org.modetrail.app.bench;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.modetrail.app.Main;

/** The bench's own arithmetic and input checks; no video is decoded and nothing is timed here. */
class BenchLogicTest {

    @Test
    void medianOfOddAndEvenCounts() {
        assertEquals(3, Summary.of(5, 1, 3).median());
        assertEquals(2.5, Summary.of(4, 1, 3, 2).median());
        assertEquals(7, Summary.of(7).median());
    }

    @Test
    void p90InterpolatesBetweenRanks() {
        Summary s = Summary.of(1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11);
        assertEquals(10, s.p90(), 1e-12);
        assertEquals(1, s.min());
        assertEquals(11, s.max());
    }

    @Test
    void ratioIsTheMedianOfPairedRatios() {
        // Pass 2 ran while the machine was busy: both sides slowed, the pair's ratio stayed.
        double[] ours = {90, 45, 92};
        double[] reference = {100, 50, 100};
        assertEquals(0.90, Summary.medianRatio(ours, reference), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> Summary.medianRatio(new double[2], new double[3]));
        assertThrows(IllegalArgumentException.class, () -> Summary.of());
    }

    @Test
    void targetsAreJudgedAsStated() {
        assertTrue(Targets.sequentialRatio(Figure.value("k", "l", "x", 0.90)).met());
        assertFalse(Targets.sequentialRatio(Figure.value("k", "l", "x", 0.89)).met());
        assertTrue(Targets.randomAccessRatio(Figure.value("k", "l", "x", 1.0)).met());
        assertFalse(Targets.randomAccessRatio(Figure.value("k", "l", "x", 1.01)).met());
        // Steps are judged on their p90: a median under 20 ms is not enough.
        assertFalse(Targets.step(Figure.measured("k", "l", "ms", new double[] {1, 1, 1, 1, 1, 1, 1, 1, 40, 40}))
                .met());
        assertTrue(Targets.step(Figure.measured("k", "l", "ms", new double[] {1, 2, 3})).met());
    }

    @Test
    void settingsRejectNonsense() {
        BenchSettings d = BenchSettings.defaults();
        assertEquals(600, d.frames());
        assertEquals(250, d.gop());
        assertNull(d.clip());
        assertThrows(IllegalArgumentException.class,
                () -> new BenchSettings(2, 250, null, 3, 15, 0, 1, null, false, null));
        assertThrows(IllegalArgumentException.class,
                () -> new BenchSettings(600, 0, null, 3, 15, 0, 1, null, false, null));
        assertThrows(IllegalArgumentException.class,
                () -> new BenchSettings(600, 250, null, 0, 15, 0, 1, null, false, null));
        assertThrows(IllegalArgumentException.class,
                () -> new BenchSettings(600, 250, null, 3, 0, 0, 1, null, false, null));
        assertThrows(IllegalArgumentException.class,
                () -> new BenchSettings(600, 250, null, 3, 15, -1, 1, null, false, null));
    }

    @Test
    void randomFramesHaveNeighboursAndRepeatWithTheSeed() {
        int[] a = RandomAccessBench.pick(10, 200, 7);
        for (int n : a) {
            assertTrue(n >= 1 && n <= 8, "frame " + n + " lacks a neighbour");
        }
        assertArrayEquals(a, RandomAccessBench.pick(10, 200, 7));
        assertThrows(IllegalArgumentException.class, () -> RandomAccessBench.pick(2, 1, 7));
    }

    @Test
    void jsonWritesNumbersStringsAndNullForNaN() {
        String json = Json.write(Map.of("a", List.of(1.5, Double.NaN, "q\"t"), "b", true));
        assertTrue(json.contains("[1.5, null, \"q\\\"t\"]"), json);
        assertTrue(json.contains("\"b\": true"), json);
        assertEquals("[0.333333]\n", Json.write(new double[] {1.0 / 3}));
    }

    @Test
    void reportListsMissedTargets() {
        Figure ok = Targets.sequentialRatio(Figure.value("seq", "ratio", "x", 0.95));
        Figure missed = Targets.randomAccessRatio(Figure.value("rand", "ratio", "x", 1.2));
        BenchReport report = new BenchReport(Map.of("clip", "c.mp4"),
                List.of(new Section("s", "Section", List.of(ok, missed), List.of("a note"))));
        assertEquals(List.of(missed), report.missedTargets());
        StringWriter text = new StringWriter();
        report.print(new PrintWriter(text));
        assertTrue(text.toString().contains("Targets missed: rand"), text.toString());
        assertTrue(report.toJson().contains("\"targets_missed\": [\"rand\"]"), report.toJson());
    }

    @Test
    void badArgumentsExitWithTwo() {
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setErr(new PrintWriter(err)).execute("bench", "--repeats", "0");
        assertEquals(2, code, err.toString());
        assertTrue(err.toString().contains("--repeats"), err.toString());
        code = Main.commandLine().setErr(new PrintWriter(new StringWriter()))
                .execute("bench", "--clip", "/no/such/clip.mp4");
        assertEquals(2, code);
        code = Main.commandLine().setErr(new PrintWriter(new StringWriter())).execute("bench", "--frames", "many");
        assertEquals(2, code);
    }
}
