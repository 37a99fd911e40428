package org.modetrail.video;

import java.io.ByteArrayInputStream;
import java.io.BufferedOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
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
import java.util.zip.CRC32;
import java.util.zip.CheckedOutputStream;

/**
 * Frame indexes kept on disk so that reopening a long file costs a file read instead of a packet scan. An entry is
 * keyed by the video's absolute path, size and modification time: change any of them and the index is built anew.
 * A damaged or foreign cache file is ignored, never trusted.
 */
final class FrameIndexCache {
    private static final int MAGIC = 0x4D544958; // "MTIX"
    private static final int VERSION = 3;

    private final Path dir;

    FrameIndexCache(Path dir) {
        this.dir = dir;
    }

    Optional<IndexedVideo> load(Path video) {
        if (dir == null) {
            return Optional.empty();
        }
        try {
            String key = key(video);
            Path file = dir.resolve(key + ".idx");
            if (!Files.isRegularFile(file)) {
                return Optional.empty();
            }
            byte[] bytes = Files.readAllBytes(file);
            if (bytes.length < Long.BYTES) {
                return Optional.empty();
            }
            // The last 8 bytes are a CRC-32 of everything before: a flipped bit anywhere means a new scan.
            CRC32 crc = new CRC32();
            crc.update(bytes, 0, bytes.length - Long.BYTES);
            if (ByteBuffer.wrap(bytes, bytes.length - Long.BYTES, Long.BYTES).getLong() != crc.getValue()) {
                return Optional.empty();
            }
            try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(bytes, 0,
                    bytes.length - Long.BYTES))) {
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
                int stampCount = in.readInt();
                if (stampCount < 0 || stampCount > count * 2 + 16) {
                    return Optional.empty();
                }
                long[] positions = new long[stampCount];
                long[] stamps = new long[stampCount];
                boolean[] fromDts = new boolean[stampCount];
                for (int i = 0; i < stampCount; i++) {
                    positions[i] = in.readLong();
                    stamps[i] = in.readLong();
                    fromDts[i] = in.readBoolean();
                }
                return Optional.of(new IndexedVideo(new FrameIndex(pts, key2, tbNum, tbDen),
                        new PacketStamps(positions, stamps, fromDts), width, height, codec, container));
            }
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** Stores an entry atomically; a failure to write the cache never stops the user's work. */
    void store(Path video, IndexedVideo entry) {
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
            CRC32 crc = new CRC32();
            try (OutputStream raw = Files.newOutputStream(tmp);
                 CheckedOutputStream checked = new CheckedOutputStream(new BufferedOutputStream(raw, 1 << 16), crc);
                 DataOutputStream out = new DataOutputStream(checked)) {
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
                PacketStamps stamps = entry.stamps();
                out.writeInt(stamps.size());
                for (int i = 0; i < stamps.size(); i++) {
                    out.writeLong(stamps.positions()[i]);
                    out.writeLong(stamps.stamps()[i]);
                    out.writeBoolean(stamps.fromDts()[i]);
                }
                out.flush();
                // Written past the checked stream so that the checksum does not cover itself.
                new DataOutputStream(raw).writeLong(crc.getValue());
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
