package org.modetrail.app.editor;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;

/** The editor's two looks, FlatLaf's light and dark themes; the choice is remembered in the preferences. */
final class Themes {
    private Themes() {
    }

    static void apply(boolean dark) {
        if (dark) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
    }
}
