package org.modetrail.app.editor;

/**
 * A zone or a counting line of the project's site, by its name (unique among its kind), as the canvas and the
 * window refer to the one selected.
 */
public record SiteItem(Kind kind, String name) {
    /** Which list of the site the item is in. */
    public enum Kind {
        ZONE("zone"), LINE("counting line");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        /** How the user reads it: "zone", "counting line". */
        public String word() {
            return word;
        }
    }

    public SiteItem {
        if (kind == null || name == null || name.isBlank()) {
            throw new IllegalArgumentException("a site item needs a kind and a name");
        }
    }

    public static SiteItem zone(String name) {
        return new SiteItem(Kind.ZONE, name);
    }

    public static SiteItem line(String name) {
        return new SiteItem(Kind.LINE, name);
    }

    /** "zone 'nest'", "counting line 'gate'". */
    public String describe() {
        return kind.word() + " '" + name + "'";
    }
}
