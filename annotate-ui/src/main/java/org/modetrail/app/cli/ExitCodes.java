package org.modetrail.app.cli;

import org.modetrail.video.VideoException;

import picocli.CommandLine;
import picocli.CommandLine.ParseResult;

/** The program's exit codes and the one place that turns an exception into a message and a code. */
public final class ExitCodes {
    public static final int OK = 0;
    public static final int FAILED = 1;
    public static final int BAD_INPUT = 2;

    private ExitCodes() {
    }

    /** Bad input (a file that is not video, a frame out of range) is the user's to fix: say what and where. */
    public static int handle(Exception e, CommandLine cli, ParseResult parsed) {
        if (e instanceof VideoException || e instanceof BadInputException) {
            cli.getErr().println("modetrail: " + e.getMessage());
            return BAD_INPUT;
        }
        cli.getErr().println("modetrail: " + e);
        e.printStackTrace(cli.getErr());
        return FAILED;
    }
}
