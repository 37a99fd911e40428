package org.modetrail.app;

import org.modetrail.app.cli.BenchCommand;
import org.modetrail.app.cli.CalibrateCommand;
import org.modetrail.app.cli.ExportCommand;
import org.modetrail.app.cli.ImportCommand;
import org.modetrail.app.cli.OverlayCommand;
import org.modetrail.app.cli.PlotCommand;
import org.modetrail.app.cli.SummaryCommand;
import org.modetrail.app.cli.DemoCommand;
import org.modetrail.app.cli.ExitCodes;
import org.modetrail.app.cli.FrameCommand;
import org.modetrail.app.cli.InfoCommand;
import org.modetrail.app.cli.MakeDemoCommand;
import org.modetrail.app.cli.TrackCommand;
import org.modetrail.app.editor.EditorLauncher;

import java.util.concurrent.Callable;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code modetrail} program: with no arguments it opens the editor, otherwise it runs one command. */
@Command(name = "modetrail", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Turns video of moving objects into corrected, analysis-ready trajectories.",
        subcommands = {TrackCommand.class, CalibrateCommand.class, SummaryCommand.class, ExportCommand.class,
                ImportCommand.class, PlotCommand.class, OverlayCommand.class, InfoCommand.class, FrameCommand.class, DemoCommand.class, MakeDemoCommand.class,
                BenchCommand.class, CommandLine.HelpCommand.class},
        footer = {"", "With no command, the editor opens.",
                "Exit codes: 0 done, 1 failed, 2 bad input (the message names the file and frame)."})
public final class Main implements Callable<Integer> {

    @Override
    public Integer call() {
        EditorLauncher.open(null);
        return ExitCodes.OK;
    }

    public static void main(String[] args) {
        int code = commandLine().execute(args);
        if (code != ExitCodes.OK || args.length > 0) {
            System.exit(code);
        }
        // With no command the editor's window keeps the program running.
    }

    /** The configured command line, shared by main and the tests. */
    public static CommandLine commandLine() {
        CommandLine cli = new CommandLine(new Main());
        cli.setExecutionExceptionHandler(ExitCodes::handle);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        return cli;
    }
}
