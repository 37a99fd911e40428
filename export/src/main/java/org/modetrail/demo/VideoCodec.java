package org.modetrail.demo;

import java.util.Set;

/** Encoders the clip writer can ask ffmpeg for, and the containers each may go in. */
public enum VideoCodec {
    /** H.264 through libx264: the usual delivery format, with B-frames and long GOPs. */
    H264("libx264", Set.of(Container.MP4, Container.MKV, Container.MOV)),
    /** MPEG-4 Part 2 (ffmpeg's own {@code mpeg4} encoder): an older long-GOP codec common in AVI files. */
    MPEG4("mpeg4", Set.of(Container.AVI, Container.MP4, Container.MKV, Container.MOV)),
    /** Motion JPEG: every frame a key frame, as many lab cameras record. */
    MJPEG("mjpeg", Set.of(Container.AVI, Container.MKV, Container.MOV));

    private final String encoder;
    private final Set<Container> containers;

    VideoCodec(String encoder, Set<Container> containers) {
        this.encoder = encoder;
        this.containers = containers;
    }

    /** The name ffmpeg's {@code -c:v} takes. */
    public String encoder() {
        return encoder;
    }

    public boolean fits(Container container) {
        return containers.contains(container);
    }

    /** Containers chosen by the output file's extension. */
    public enum Container {
        MP4("mp4", "mp4"), MKV("mkv", "matroska"), MOV("mov", "mov"), AVI("avi", "avi");

        private final String extension;
        private final String muxer;

        Container(String extension, String muxer) {
            this.extension = extension;
            this.muxer = muxer;
        }

        /** The name ffmpeg's {@code -f} takes; given explicitly because the file is first written under a temp name. */
        public String muxer() {
            return muxer;
        }

        public static Container of(String fileName) {
            int dot = fileName.lastIndexOf('.');
            String ext = dot < 0 ? "" : fileName.substring(dot + 1).toLowerCase(java.util.Locale.ROOT);
            for (Container c : values()) {
                if (c.extension.equals(ext)) {
                    return c;
                }
            }
            throw new IllegalArgumentException("unsupported clip extension in '" + fileName
                    + "': use .mp4, .mkv, .mov or .avi");
        }
    }
}
