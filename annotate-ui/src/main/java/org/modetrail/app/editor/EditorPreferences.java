package org.modetrail.app.editor;

import java.awt.Rectangle;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;

/**
 * What the editor remembers between runs: the theme, the window's place and size, the last folder, the recent
 * files and the export folder chosen for each of the recent projects. Kept in a {@link Preferences} node the caller gives (the user's by default, a scratch node in tests).
 */
final class EditorPreferences {
    static final int MAX_RECENT = 8;
    private final Preferences node;

    EditorPreferences(Preferences node) {
        this.node = node;
    }

    static EditorPreferences user() {
        return new EditorPreferences(Preferences.userRoot().node("org/modetrail/editor"));
    }

    boolean darkTheme() {
        return node.getBoolean("darkTheme", false);
    }

    void setDarkTheme(boolean dark) {
        node.putBoolean("darkTheme", dark);
    }

    /** The window's last bounds, or null the first time. */
    Rectangle windowBounds() {
        int w = node.getInt("window.width", -1);
        int h = node.getInt("window.height", -1);
        if (w < 200 || h < 150) {
            return null;
        }
        return new Rectangle(node.getInt("window.x", 0), node.getInt("window.y", 0), w, h);
    }

    void setWindowBounds(Rectangle r) {
        node.putInt("window.x", r.x);
        node.putInt("window.y", r.y);
        node.putInt("window.width", r.width);
        node.putInt("window.height", r.height);
    }

    /** The folder of the last file opened or saved, if it still exists. */
    Path lastFolder() {
        String s = node.get("lastFolder", null);
        if (s == null) {
            return null;
        }
        Path p = Path.of(s);
        return Files.isDirectory(p) ? p : null;
    }

    void setLastFolder(Path folder) {
        if (folder != null) {
            node.put("lastFolder", folder.toAbsolutePath().toString());
        }
    }

    /** Recent videos and projects, newest first, those that still exist. */
    List<Path> recent() {
        List<Path> out = new ArrayList<>();
        for (int i = 0; i < MAX_RECENT; i++) {
            String s = node.get("recent." + i, null);
            if (s != null && Files.exists(Path.of(s))) {
                out.add(Path.of(s));
            }
        }
        return out;
    }

    /** The folder the user last exported {@code project} to, if it still exists; null when none was chosen. */
    Path exportFolder(Path project) {
        String key = project.toAbsolutePath().normalize().toString();
        for (int i = 0; i < MAX_RECENT; i++) {
            String s = node.get("export." + i, null);
            int tab = s == null ? -1 : s.indexOf('\t');
            if (tab > 0 && s.substring(0, tab).equals(key)) {
                Path p = Path.of(s.substring(tab + 1));
                return Files.isDirectory(p) ? p : null;
            }
        }
        return null;
    }

    /** Remembers where {@code project} was exported to (the last {@value #MAX_RECENT} projects are kept). */
    void setExportFolder(Path project, Path folder) {
        String key = project.toAbsolutePath().normalize().toString();
        List<String> list = new ArrayList<>();
        list.add(key + "\t" + folder.toAbsolutePath().normalize());
        for (int i = 0; i < MAX_RECENT; i++) {
            String s = node.get("export." + i, null);
            if (s != null && !s.startsWith(key + "\t")) {
                list.add(s);
            }
        }
        for (int i = 0; i < MAX_RECENT; i++) {
            if (i < list.size()) {
                node.put("export." + i, list.get(i));
            } else {
                node.remove("export." + i);
            }
        }
    }

    void addRecent(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        List<Path> list = new ArrayList<>(recent());
        list.remove(abs);
        list.add(0, abs);
        for (int i = 0; i < MAX_RECENT; i++) {
            if (i < list.size()) {
                node.put("recent." + i, list.get(i).toString());
            } else {
                node.remove("recent." + i);
            }
        }
        setLastFolder(abs.getParent());
    }
}
