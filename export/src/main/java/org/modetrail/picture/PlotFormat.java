package org.modetrail.picture;

import java.nio.file.Path;
import java.util.Locale;

/** The picture file formats a plot is written in. */
public enum PlotFormat {
    PNG("png"),
    SVG("svg");

    private final String extension;

    PlotFormat(String extension) {
        this.extension = extension;
    }

    public String extension() {
        return extension;
    }

    /** The format a file name's extension names (.png or .svg, any case). */
    public static PlotFormat of(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        for (PlotFormat f : values()) {
            if (name.endsWith("." + f.extension)) {
                return f;
            }
        }
        throw new IllegalArgumentException("a plot is written as .png or .svg, not '" + file.getFileName() + "'");
    }
}
