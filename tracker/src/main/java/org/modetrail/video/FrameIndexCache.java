package org.modetrail.video;

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Optional;

/**
 * Frame indexes kept on disk so that reopening a long file costs a file read instead of a packet scan. An entry is
 * keyed by the video's absolute path, size and modification time: change any of them and the index is built anew.
 * A damaged or foreign cache file is ignored, never trusted.
 */
final class FrameIndexCache {
    private static final int MAGIC = 0x4D544958; // "MTIX"
    private static final int VERSION = 1;

    private final Path dir;

    FrameIndexCache(Path dir) {
        this.dir = dir;
    }

    /** What the cache stores about one video: its index and the facts needed to describe it without a scan. */
    record Entry(FrameIndex index, int width, int height, String codec, String container) {
    }

    Optional<Entry> load(Path video) {
        if (dir == null) {
            return Optional.empty();
        }
        try {
            String key = key(video);
            Path file = dir.resolve(key + ".idx");
            if (!Files.isRegularFile(file)) {
                return Optional.empty();
            }
            try (DataInputStream in = new DataInputStream(new BufferedInputStream(Files.newInputStream(file)))) {
                if (in.readInt() != MAGIC || in.readInt() != VERSION || !in.readUTF().equals(key)) {
                    return Optional.empty();
                }
                int width = in.readInt();
                int height = in.readInt();
                String codec = in.readUTF();
                String container = in.readUTF();
                int tbNum = in.readInt();
                int tbDen = in.readInt();
                int count = in.readInt();
                if (count < 0 || count > 100_000_000) {
                    return Optional.empty();
                }
                long[] pts = new long[count];
                boolean[] key2 = new boolean[count];
                for (int i = 0; i < count; i++) {
                    pts[i] = in.readLong();
                }
                byte[] flags = in.readNBytes(count);
                if (flags.length != count) {
                    return Optional.empty();
                }
                for (int i = 0; i < count; i++) {
                    key2[i] = flags[i] != 0;
                }
                return Optional.of(new Entry(new FrameIndex(pts, key2, tbNum, tbDen), width, height, codec, container));
            }
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** Stores an entry atomically; a failure to write the cache never stops the user's work. */
    void store(Path video, Entry entry) {
        if (dir == null) {
            return;
        }
        Path tmp = null;
        try {
            Files.createDirectories(dir);
            String key = key(video);
            Path file = dir.resolve(key + ".idx");
            tmp = Files.createTempFile(dir, key, ".tmp");
            FrameIndex index = entry.index();
            try (OutputStream raw = Files.newOutputStream(tmp);
                 DataOutputStream out = new DataOutputStream(new BufferedOutputStream(raw, 1 << 16))) {
                out.writeInt(MAGIC);
                out.writeInt(VERSION);
                out.writeUTF(key);
                out.writeInt(entry.width());
                out.writeInt(entry.height());
                out.writeUTF(entry.codec());
                out.writeUTF(entry.container());
                out.writeInt(index.timeBaseNum());
                out.writeInt(index.timeBaseDen());
                int count = index.frameCount();
                out.writeInt(count);
                for (int i = 0; i < count; i++) {
                    out.writeLong(index.pts(i));
                }
                for (int i = 0; i < count; i++) {
                    out.writeByte(index.isKeyframe(i) ? 1 : 0);
                }
            }
            try {
                Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
        } catch (IOException | RuntimeException e) {
            // The cache is an optimisation: the index in memory is still right.
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // best effort
                }
            }
        }
    }

    static String key(Path video) throws IOException {
        Path abs = video.toAbsolutePath().normalize();
        BasicFileAttributes attrs = Files.readAttributes(abs, BasicFileAttributes.class);
        String id = abs + "|" + attrs.size() + "|" + attrs.lastModifiedTime().toMillis();
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            return HexFormat.of().formatHex(sha.digest(id.getBytes(StandardCharsets.UTF_8))).substring(0, 32);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

}
