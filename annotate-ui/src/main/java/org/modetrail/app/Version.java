package org.modetrail.app;

import picocli.CommandLine.IVersionProvider;

/** The version from the jar's manifest, or "development" when run from classes. */
public final class Version implements IVersionProvider {
    public static String text() {
        String v = Main.class.getPackage().getImplementationVersion();
        return v != null ? v : "development";
    }

    @Override
    public String[] getVersion() {
        return new String[] {"modetrail " + text()};
    }
}
