package org.modetrail.overlay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import org.junit.jupiter.api.Test;

class OverlayConfigTest {
    @Test
    void defaultsAreValidAndAsDocumented() {
        OverlayStyle s = OverlayStyle.defaults();
        assertEquals(25, s.trailLength());
        assertEquals(2f, s.lineWidth());
        assertEquals(4f, s.keyframeLineWidth());
        assertEquals(13, s.fontSize());
        assertTrue(s.showLabels());
        assertEquals(OverlayStyle.TrailPoint.CONTACT, s.trailPoint());
        OverlayEncoding e = OverlayEncoding.defaults();
        assertEquals(OverlayCodec.AUTO, e.codec());
        assertEquals(3, e.mpeg4Quantiser());
        OverlayStyle big = OverlayStyle.forFrameHeight(1080);
        assertEquals(4f, big.lineWidth());
        assertEquals(26, big.fontSize());
        assertEquals(OverlayStyle.defaults(), OverlayStyle.forFrameHeight(480));
    }

    @Test
    void badValuesAreRefusedWithTheirRange() {
        OverlayStyle s = OverlayStyle.defaults();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> s.withTrailLength(-1));
        assertTrue(e.getMessage().contains("0 to 10000"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> s.withLineWidths(0.1f, 4f));
        assertThrows(IllegalArgumentException.class, () -> s.withLineWidths(3f, 2f));
        assertThrows(IllegalArgumentException.class, () -> s.withLineWidths(Float.NaN, 2f));
        assertThrows(IllegalArgumentException.class, () -> s.withFontSize(5));
        assertEquals(OverlayStyle.TrailPoint.CONTACT, new OverlayStyle(1, 1, 1, 10, false, null).trailPoint());
        OverlayEncoding d = OverlayEncoding.defaults();
        assertThrows(IllegalArgumentException.class, () -> d.withMpeg4Quantiser(0));
        assertThrows(IllegalArgumentException.class, () -> d.withMpeg4Quantiser(32));
        assertThrows(IllegalArgumentException.class, () -> d.withH264BitsPerPixel(0));
        assertThrows(IllegalArgumentException.class, () -> new OverlayEncoding(null, 3, 0.25, 0));
    }

    @Test
    void frameRatesSnapToWholeAndNtscRates() {
        assertEquals(25.0, OverlayVideo.snapFrameRate(24.99999));
        assertEquals(30000 / 1001.0, OverlayVideo.snapFrameRate(29.97), 1e-12);
        assertEquals(12.345, OverlayVideo.snapFrameRate(12.345));
    }

    @Test
    void labelTextContrastsWithTheTag() {
        assertEquals(Color.BLACK, OverlayPainter.textColourOn(0xF0E442));
        assertEquals(Color.WHITE, OverlayPainter.textColourOn(0x0072B2));
        assertEquals(Color.BLACK, OverlayPainter.textColourOn(0xFF00FF));
        assertEquals(Color.WHITE, OverlayPainter.textColourOn(0x000000));
        assertEquals(Color.BLACK, OverlayPainter.textColourOn(0x009E73));
    }
}
