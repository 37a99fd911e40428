package org.modetrail.picture;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** Plots checked as a reader would open them: PNG through ImageIO, SVG through the JDK's XML parser. */
class PlotsTest {
    @TempDir
    Path dir;

    /** Three tracks in three palette colours, 100 points each, on a 640 x 480 image. */
    static List<PlotSeries> threeTracks() {
        List<PlotSeries> out = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            int n = 100;
            double[] t = new double[n], x = new double[n], y = new double[n];
            for (int i = 0; i < n; i++) {
                t[i] = i / 25.0;
                x[i] = 100 + 150 * k + 60 * Math.cos(i / 15.0);
                y[i] = 100 + 3 * i;
            }
            out.add(new PlotSeries(k + 1, (k + 1) + " animal", Palette.colour(k), t, x, y));
        }
        return out;
    }

    @Test
    void pngDecodesAtTheSizeAskedForAndShowsEverySeriesColour() throws Exception {
        Path png = dir.resolve("image.png");
        Plots.writeImageTrajectoryPng(threeTracks(), 640, 480, PlotOptions.defaults().withSize(900, 600), png);
        // Reference: ImageIO's PNG reader.
        BufferedImage img = ImageIO.read(png.toFile());
        assertNotNull(img, "ImageIO cannot read the PNG");
        assertEquals(900, img.getWidth());
        assertEquals(600, img.getHeight());
        Set<Integer> colours = new HashSet<>();
        for (int k = 0; k < 3; k++) {
            // Markers are filled in exactly the series colour.
            assertTrue(count(img, Palette.colour(k)) >= 50, "series " + k + " colour "
                    + Integer.toHexString(Palette.colour(k)) + " appears on " + count(img, Palette.colour(k))
                    + " pixels");
        }
        for (int y = 0; y < img.getHeight(); y += 3) {
            for (int x = 0; x < img.getWidth(); x += 3) {
                colours.add(img.getRGB(x, y) & 0xFFFFFF);
            }
        }
        assertTrue(colours.size() > 20, "only " + colours.size() + " colours: nearly blank");
    }

    @Test
    void imageYAxisPointsDown() throws Exception {
        // One track near the top of the frame (y = 20 px): on the plot it must be in the top half.
        PlotSeries top = new PlotSeries(1, "top", 0xD55E00, new double[] {0, 1, 2}, new double[] {100, 320, 540},
                new double[] {20, 20, 20});
        Path png = dir.resolve("top.png");
        Plots.writeImageTrajectoryPng(List.of(top), 640, 480, PlotOptions.defaults(), png);
        BufferedImage img = ImageIO.read(png.toFile()); // reference: ImageIO
        double[] c = centroid(img, 0xD55E00);
        assertTrue(c[2] > 30, "marker pixels found: " + c[2]);
        assertTrue(c[1] < img.getHeight() * 0.3, "the track at y = 20 px is drawn at picture row " + c[1]);
    }

    @Test
    void groundPlaneHasEqualScale() throws Exception {
        // A 10 m square in a wide picture: it must come out square, however wide the picture.
        double[] t = {0, 1, 2, 3, 4};
        PlotSeries square = new PlotSeries(1, "square", 0x0072B2, t, new double[] {0, 10, 10, 0, 0},
                new double[] {0, 0, 10, 10, 0});
        Path png = dir.resolve("square.png");
        Plots.writeGroundTrajectoryPng(List.of(square), PlotOptions.defaults().withSize(1200, 500)
                .withMarkerCount(0), png);
        BufferedImage img = ImageIO.read(png.toFile()); // reference: ImageIO
        // Rows above the legend, which carries a sample of the line at the bottom.
        int[] b = bounds(img.getSubimage(0, 0, img.getWidth(), img.getHeight() - 40), 0x0072B2, 60);
        int w = b[2] - b[0], h = b[3] - b[1];
        assertTrue(h > 100, "square is " + w + " x " + h + " px");
        assertEquals(1.0, w / (double) h, 0.03, "square drawn " + w + " x " + h + " px");
    }

    @Test
    void svgParsesWithAPathPerSeriesAndTheAxisLabels() throws Exception {
        Path svg = dir.resolve("image.svg");
        List<PlotSeries> series = threeTracks();
        Plots.writeImageTrajectorySvg(series, 640, 480, PlotOptions.defaults(), svg);
        Document doc = parse(Files.readAllBytes(svg)); // reference: the JDK's XML parser
        Element root = doc.getDocumentElement();
        assertEquals("svg", root.getLocalName());
        assertEquals("http://www.w3.org/2000/svg", root.getNamespaceURI());
        for (PlotSeries s : series) {
            assertTrue(longPathsIn(doc, s.colour()) >= 1, "no line path in " + Integer.toHexString(s.colour()));
        }
        List<String> texts = texts(doc);
        assertTrue(texts.contains("x (px)"), texts.toString());
        assertTrue(texts.contains("y (px, downwards as on the image)"), texts.toString());
        assertTrue(texts.contains("Trajectories in the image"), texts.toString());
        for (PlotSeries s : series) {
            assertTrue(texts.contains(s.label()), "legend lacks " + s.label());
        }
    }

    @Test
    void speedSvgHasLinesBandsAndUnits() throws Exception {
        Path svg = dir.resolve("speed.svg");
        List<SpeedSeries> speeds = TruthProjects.roadSpeeds(true);
        Plots.writeSpeedSvg(speeds, PlotOptions.defaults(), svg);
        Document doc = parse(Files.readAllBytes(svg)); // reference: the JDK's XML parser
        List<String> texts = texts(doc);
        assertTrue(texts.contains("time (s)"), texts.toString());
        assertTrue(texts.contains("speed (m/s)"), texts.toString());
        for (SpeedSeries s : speeds) {
            assertTrue(longPathsIn(doc, s.colour()) >= 1, "no line for " + s.label());
        }
        // The band is a filled, half-transparent shape in the series colour.
        String text = Files.readString(svg);
        int c = speeds.get(0).colour();
        String rgb = "rgb(" + (c >> 16) + "," + ((c >> 8) & 0xFF) + "," + (c & 0xFF) + ")";
        assertTrue(text.contains("fill:" + rgb + ";fill-opacity:0.22") || text.contains("fill:" + rgb
                + ";fill-opacity:0.2199"), "no band in " + rgb);
    }

    @Test
    void groundPlaneOfTheRoadHasMetreAxes() throws Exception {
        Path svg = dir.resolve("ground.svg");
        Plots.writeGroundTrajectorySvg(TruthProjects.roadGround(), PlotOptions.defaults(), svg);
        List<String> texts = texts(parse(Files.readAllBytes(svg))); // reference: the JDK's XML parser
        assertTrue(texts.contains("x (m)") && texts.contains("y (m)"), texts.toString());
    }

    @Test
    void emptyInputGivesAValidChartSayingSo() throws Exception {
        Path png = dir.resolve("empty.png");
        Path svg = dir.resolve("empty.svg");
        Plots.writeSpeedPng(List.of(), PlotOptions.defaults(), png);
        Plots.writeImageTrajectorySvg(List.of(), 640, 480, PlotOptions.defaults(), svg);
        BufferedImage img = ImageIO.read(png.toFile()); // reference: ImageIO
        assertEquals(PlotOptions.DEFAULT_WIDTH, img.getWidth());
        List<String> texts = texts(parse(Files.readAllBytes(svg))); // reference: the JDK's XML parser
        assertTrue(texts.contains("No tracks to plot"), texts.toString());
        assertTrue(texts.contains("x (px)"), texts.toString());
    }

    @Test
    void sameInputGivesTheSameBytes() throws Exception {
        for (PlotFormat f : PlotFormat.values()) {
            Path a = dir.resolve("a." + f.extension()), b = dir.resolve("b." + f.extension());
            Plots.writeImageTrajectory(threeTracks(), 640, 480, PlotOptions.defaults(), f, a);
            Plots.writeImageTrajectory(threeTracks(), 640, 480, PlotOptions.defaults(), f, b);
            assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b), f + " differs between runs");
        }
    }

    @Test
    void writingLeavesNoTemporaryFiles() throws Exception {
        Path png = dir.resolve("only.png");
        Plots.writeSpeedPng(TruthProjects.roadSpeeds(false), PlotOptions.defaults(), png);
        Plots.writeSpeedPng(TruthProjects.roadSpeeds(false), PlotOptions.defaults(), png);
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(png), files.toList());
        }
    }

    @Test
    void seriesFromAProjectFollowTheContactPointAndBreakAtGaps() {
        ObjectClass cls = new ObjectClass("animal", 0x123456);
        Track t = new Track(7, "animal", "", java.util.Map.of(
                0, FrameAnnotation.keyframe(0, new Box(10, 20, 30, 40)),
                1, FrameAnnotation.tracked(1, new Box(12, 20, 30, 40), 0.9),
                2, FrameAnnotation.markedBy(2, Presence.HIDDEN),
                3, FrameAnnotation.keyframe(3, new Box(20, 20, 30, 40))));
        Track hiddenOnly = new Track(8, "animal", "", java.util.Map.of(0, FrameAnnotation.markedBy(0,
                Presence.ABSENT)));
        Project p = new Project(new VideoRef("v.mp4", 640, 480, 10, ""), List.of(cls), List.of(t, hiddenOnly));
        List<PlotSeries> s = ProjectSeries.imagePlane(p, n -> n * 0.5, TrajectoryPoint.CONTACT, ColourBy.CLASS);
        assertEquals(1, s.size(), "a track without boxes gives no series");
        PlotSeries a = s.get(0);
        assertEquals(0x123456, a.colour());
        assertEquals("7 animal", a.label());
        // Bottom centre of each box, and a NaN gap where the track is hidden.
        assertArrayEquals(new double[] {25, 27, Double.NaN, 35}, a.x());
        assertArrayEquals(new double[] {60, 60, Double.NaN, 60}, a.y());
        assertArrayEquals(new double[] {0, 0.5, 1.0, 1.5}, a.timeS());
        PlotSeries c = ProjectSeries.imagePlane(p, n -> n, TrajectoryPoint.CENTRE, ColourBy.TRACK).get(0);
        assertEquals(40, c.y()[0]);
        assertEquals(Palette.colour(0), c.colour());
    }

    @Test
    void badInputIsRefused() {
        double[] two = {0, 1};
        assertThrows(IllegalArgumentException.class, () -> new PlotSeries(1, "a", 0, two, two, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> new PlotSeries(1, " ", 0, two, two, two));
        assertThrows(IllegalArgumentException.class,
                () -> new PlotSeries(1, "a", 0, two, new double[] {0, Double.POSITIVE_INFINITY}, two));
        assertThrows(IllegalArgumentException.class,
                () -> new SpeedSeries(1, "a", 0, two, two, new double[] {-1, 0}));
        assertThrows(IllegalArgumentException.class, () -> new PlotOptions(100, 100, "", 12));
        assertThrows(IllegalArgumentException.class, () -> PlotFormat.of(Path.of("plot.jpg")));
        assertEquals(PlotFormat.SVG, PlotFormat.of(Path.of("Plot.SVG")));
        assertThrows(IllegalArgumentException.class, () -> Plots.writeImageTrajectoryPng(List.of(), 0, 480,
                PlotOptions.defaults(), dir.resolve("x.png")));
    }

    // --- helpers -------------------------------------------------------------------------------------------

    static int count(BufferedImage img, int rgb) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                if ((img.getRGB(x, y) & 0xFFFFFF) == rgb) {
                    n++;
                }
            }
        }
        return n;
    }

    /** Mean x, mean y and count of the pixels of exactly {@code rgb}. */
    static double[] centroid(BufferedImage img, int rgb) {
        double sx = 0, sy = 0, n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                if ((img.getRGB(x, y) & 0xFFFFFF) == rgb) {
                    sx += x;
                    sy += y;
                    n++;
                }
            }
        }
        return new double[] {sx / n, sy / n, n};
    }

    /** Bounds (x0, y0, x1, y1) of the pixels within {@code tolerance} per channel of {@code rgb}. */
    static int[] bounds(BufferedImage img, int rgb, int tolerance) {
        int x0 = Integer.MAX_VALUE, y0 = Integer.MAX_VALUE, x1 = -1, y1 = -1;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int p = img.getRGB(x, y);
                boolean near = true;
                for (int s = 0; s <= 16; s += 8) {
                    near &= Math.abs(((p >> s) & 0xFF) - ((rgb >> s) & 0xFF)) <= tolerance;
                }
                if (near) {
                    x0 = Math.min(x0, x);
                    y0 = Math.min(y0, y);
                    x1 = Math.max(x1, x);
                    y1 = Math.max(y1, y);
                }
            }
        }
        return new int[] {x0, y0, x1, y1};
    }

    static Document parse(byte[] xml) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        // The file names the SVG 1.0 DTD; the test parses without fetching it.
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        DocumentBuilder b = f.newDocumentBuilder();
        return b.parse(new ByteArrayInputStream(xml));
    }

    static List<String> texts(Document doc) {
        NodeList nodes = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        List<String> out = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            out.add(nodes.item(i).getTextContent().strip());
        }
        return out;
    }

    /** Paths of more than 20 segments stroked in {@code rgb} (on the path or its group): series lines. */
    static int longPathsIn(Document doc, int rgb) {
        String stroke = "stroke:rgb(" + (rgb >> 16) + "," + ((rgb >> 8) & 0xFF) + "," + (rgb & 0xFF) + ")";
        NodeList paths = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "path");
        int n = 0;
        for (int i = 0; i < paths.getLength(); i++) {
            Element p = (Element) paths.item(i);
            String style = p.getAttribute("style") + ";" + (p.getParentNode() instanceof Element g
                    ? g.getAttribute("style") : "");
            long segments = p.getAttribute("d").chars().filter(ch -> ch == 'L').count();
            if (style.replace(" ", "").contains(stroke) && segments > 20) {
                n++;
            }
        }
        return n;
    }
}
