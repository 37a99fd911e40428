package org.modetrail.testsupport;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * FFmpeg's ffprobe as the reference for frame counts, timestamps and keyframes, read with
 * {@code -of compact=p=0} (key=value pairs separated by |, one section per line).
 */
public final class Ffprobe {
    /** Value given for a field that ffprobe prints as N/A. */
    public static final long NA = Long.MIN_VALUE;

    private Ffprobe() {
    }

    /** One decoded frame as {@code ffprobe -show_frames} reports it, in decoder output (presentation) order. */
    public record ProbeFrame(long pts, double ptsTime, long bestEffortTimestamp, boolean keyFrame, String pictType) {
        /** pts when ffprobe gives one, else best_effort_timestamp. */
        public long ptsOrBestEffort() {
            return pts != NA ? pts : bestEffortTimestamp;
        }
    }

    /** One demuxed packet as {@code ffprobe -show_packets} reports it, in file (decode) order. */
    public record ProbePacket(long pts, long dts, long pos, int size, String flags) {
        public boolean key() {
            return flags.indexOf('K') >= 0;
        }

        public long ptsOrDts() {
            return pts != NA ? pts : dts;
        }
    }

    /** Stream facts of the first video stream. */
    public record ProbeStream(String codecName, int width, int height, int timeBaseNum, int timeBaseDen,
                              String avgFrameRate, String nbFrames) {
    }

    /** {@code ffprobe -v error -select_streams v:0 -show_frames -show_entries frame=pts,pts_time,best_effort_timestamp,key_frame,pict_type}. */
    public static List<ProbeFrame> frames(Path video) {
        String out = Ffmpeg.ffprobe("-select_streams", "v:0", "-show_frames", "-show_entries",
                "frame=pts,pts_time,best_effort_timestamp,key_frame,pict_type", "-of", "compact=p=0", video.toString());
        List<ProbeFrame> frames = new ArrayList<>();
        for (Map<String, String> f : sections(out, "pts")) {
            frames.add(new ProbeFrame(num(f.get("pts")), dbl(f.get("pts_time")), num(f.get("best_effort_timestamp")),
                    "1".equals(f.get("key_frame")), f.getOrDefault("pict_type", "?")));
        }
        return frames;
    }

    /** {@code ffprobe -v error -select_streams v:0 -show_packets -show_entries packet=pts,dts,pos,size,flags}. */
    public static List<ProbePacket> packets(Path video) {
        String out = Ffmpeg.ffprobe("-select_streams", "v:0", "-show_packets", "-show_entries",
                "packet=pts,dts,pos,size,flags", "-of", "compact=p=0", video.toString());
        List<ProbePacket> packets = new ArrayList<>();
        for (Map<String, String> p : sections(out, "flags")) {
            packets.add(new ProbePacket(num(p.get("pts")), num(p.get("dts")), num(p.get("pos")),
                    (int) num(p.get("size")), p.get("flags")));
        }
        return packets;
    }

    /** Packets sorted by presentation timestamp (pts, or dts where the container gives no pts). */
    public static List<ProbePacket> packetsInPresentationOrder(Path video) {
        List<ProbePacket> p = new ArrayList<>(packets(video));
        p.sort(Comparator.comparingLong(ProbePacket::ptsOrDts));
        return p;
    }

    public static ProbeStream stream(Path video) {
        String out = Ffmpeg.ffprobe("-select_streams", "v:0", "-show_entries",
                "stream=codec_name,width,height,time_base,avg_frame_rate,nb_frames", "-of", "compact=p=0",
                video.toString());
        Map<String, String> s = sections(out, "codec_name").get(0);
        String[] tb = s.get("time_base").split("/");
        return new ProbeStream(s.get("codec_name"), Integer.parseInt(s.get("width")), Integer.parseInt(s.get("height")),
                Integer.parseInt(tb[0]), Integer.parseInt(tb[1]), s.get("avg_frame_rate"), s.get("nb_frames"));
    }

    private static List<Map<String, String>> sections(String out, String mustHave) {
        List<Map<String, String>> result = new ArrayList<>();
        for (String line : out.split("\n")) {
            Map<String, String> kv = new HashMap<>();
            for (String field : line.split("\\|")) {
                int eq = field.indexOf('=');
                if (eq > 0) {
                    kv.putIfAbsent(field.substring(0, eq).trim(), field.substring(eq + 1).trim());
                }
            }
            if (kv.containsKey(mustHave)) {
                result.add(kv);
            }
        }
        return result;
    }

    private static long num(String v) {
        return v == null || v.equals("N/A") ? NA : Long.parseLong(v);
    }

    private static double dbl(String v) {
        return v == null || v.equals("N/A") ? Double.NaN : Double.parseDouble(v);
    }
}
