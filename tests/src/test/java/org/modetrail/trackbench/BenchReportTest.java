package org.modetrail.trackbench;

import org.junit.jupiter.api.Test;

class BenchReportTest {
    @Test
    void placeholder() {
    }
}
