package org.modetrail.format.project;

import java.time.Duration;

/**
 * How often the autosave may write.
 *
 * @param interval the longest an edit waits before it is in the recovery file, and the shortest time between two
 *                 recovery writes; default 5 s, from 100 ms to 10 min
 */
public record AutosaveConfig(Duration interval) {
    public static final AutosaveConfig DEFAULT = new AutosaveConfig(Duration.ofSeconds(5));

    public AutosaveConfig {
        if (interval == null || interval.compareTo(Duration.ofMillis(100)) < 0
                || interval.compareTo(Duration.ofMinutes(10)) > 0) {
            throw new IllegalArgumentException("the autosave interval must be from 100 ms to 10 min, got " + interval);
        }
    }
}
