package org.modetrail.app.bench;

import java.util.List;

/** A group of figures measured together, with notes that say precisely what each loop did. */
public record Section(String key, String title, List<Figure> figures, List<String> notes) {
    public Section {
        figures = List.copyOf(figures);
        notes = List.copyOf(notes);
    }
}
