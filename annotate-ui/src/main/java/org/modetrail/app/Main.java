package org.modetrail.app;

import org.modetrail.app.cli.BenchCommand;
import org.modetrail.app.cli.CalibrateCommand;
import org.modetrail.app.cli.EvalCommand;
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
import picocli.CommandLine.Parameters;

/** The {@code modetrail} program: with no arguments it opens the editor, otherwise it runs one command. */
@Command(name = "modetrail", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Turns video of moving objects into corrected, analysis-ready trajectories.",
        subcommands = {TrackCommand.class, CalibrateCommand.class, SummaryCommand.class, ExportCommand.class,
                EvalCommand.class,
                ImportCommand.class, PlotCommand.class, OverlayCommand.class, InfoCommand.class, FrameCommand.class, DemoCommand.class, MakeDemoCommand.class,
                BenchCommand.class, CommandLine.HelpCommand.class},
        footer = {"", "With no command, the editor opens (on FILE, when given).",
                "Exit codes: 0 done, 1 failed, 2 bad input (the message names the file and frame)."})
public final class Main implements Callable<Integer> {

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE",
            description = "a video, a folder of numbered images or a project (.json) for the editor to open")
    java.nio.file.Path file;

    @Override
    public Integer call() {
        if (file != null && !java.nio.file.Files.exists(file)) {
            System.err.println("modetrail: " + file + ": no such file or command; `modetrail --help` lists the "
                    + "commands");
            return ExitCodes.BAD_INPUT;
        }
        EditorLauncher.open(file);
        return ExitCodes.OK;
    }

    public static void main(String[] args) {
        CommandLine cli = commandLine();
        int code = cli.execute(args);
        boolean editor = cli.getParseResult() != null && cli.getParseResult().subcommand() == null
                && !cli.getParseResult().isUsageHelpRequested() && !cli.getParseResult().isVersionHelpRequested();
        if (code != ExitCodes.OK || !editor) {
            System.exit(code);
        }
        // The editor's window keeps the program running.
    }

    /** The configured command line, shared by main and the tests. */
    public static CommandLine commandLine() {
        CommandLine cli = new CommandLine(new Main());
        cli.setExecutionExceptionHandler(ExitCodes::handle);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        return cli;
    }
}
