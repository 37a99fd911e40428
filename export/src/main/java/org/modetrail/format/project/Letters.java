package org.modetrail.format.project;

import org.modetrail.model.BoxSource;
import org.modetrail.model.Presence;

/** The one-letter codes a frame entry uses for source and presence (documented in docs/project-file.md). */
final class Letters {
    private Letters() {
    }

    static String of(BoxSource source) {
        return switch (source) {
            case KEYFRAME -> "k";
            case TRACKED -> "t";
            case INTERPOLATED -> "i";
        };
    }

    static String of(Presence presence) {
        return switch (presence) {
            case VISIBLE -> "v";
            case HIDDEN -> "h";
            case ABSENT -> "a";
        };
    }

    /** The source for a letter, or null when the letter is not one. */
    static BoxSource source(String letter) {
        return switch (letter) {
            case "k" -> BoxSource.KEYFRAME;
            case "t" -> BoxSource.TRACKED;
            case "i" -> BoxSource.INTERPOLATED;
            default -> null;
        };
    }

    /** The presence for a letter, or null when the letter is not one. */
    static Presence presence(String letter) {
        return switch (letter) {
            case "v" -> Presence.VISIBLE;
            case "h" -> Presence.HIDDEN;
            case "a" -> Presence.ABSENT;
            default -> null;
        };
    }
}
