package org.modetrail.app.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

import org.modetrail.model.VideoRef;
import org.modetrail.video.VideoSource;

/** The project's reference to its video, as the commands that make projects write it. */
final class VideoRefs {
    private VideoRefs() {
    }

    /**
     * @param video     the video file as the user named it
     * @param referring the file that will refer to it (the project, or the output beside which one would go): the
     *                  path is stored relative to that file's folder when it can be
     */
    static VideoRef of(Path video, VideoSource source, Path referring) throws IOException {
        return new VideoRef(pathFor(video, referring), source.info().width(), source.info().height(),
                source.frameCount(), fingerprint(video));
    }

    private static String pathFor(Path video, Path referring) {
        Path base = referring.toAbsolutePath().getParent();
        Path abs = video.toAbsolutePath().normalize();
        try {
            return base.relativize(abs).toString();
        } catch (IllegalArgumentException e) {
            return abs.toString();
        }
    }

    /** Size and the SHA-256 of the first MiB: enough to notice a replaced file without reading an hour of video. */
    static String fingerprint(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            return "folder";
        }
        try (InputStream in = Files.newInputStream(file)) {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(in.readNBytes(1 << 20));
            return "size:" + Files.size(file) + ";head-sha256:" + HexFormat.of().formatHex(sha.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }
}
