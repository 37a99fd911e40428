package org.modetrail.format;

import java.io.IOException;
import java.nio.file.Path;

/** The user cancelled an export; the file asked for was left as it was (not written, or its old version kept). */
public final class ExportCancelledException extends IOException {
    public ExportCancelledException(Path out) {
        super("export cancelled; " + out + " was left as it was");
    }
}
