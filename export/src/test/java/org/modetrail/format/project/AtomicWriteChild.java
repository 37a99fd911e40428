package org.modetrail.format.project;

import java.nio.file.Path;
import org.modetrail.model.Project;

/** Run in a child JVM by {@link AtomicWriteTest}: saves versions 1, 2, 3, … of a large project until killed. */
public final class AtomicWriteChild {
    private AtomicWriteChild() {
    }

    static Project version(int v) {
        return SampleProjects.large(3, 10_000, v);
    }

    public static void main(String[] args) throws Exception {
        Path file = Path.of(args[0]);
        for (int v = 1; v < 10_000; v++) {
            ProjectFile.write(version(v), file);
            System.out.println("saved " + v);
        }
    }
}
