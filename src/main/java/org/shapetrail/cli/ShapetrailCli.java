package org.shapetrail.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The command line: {@code java -jar shapetrail.jar COMMAND ...}; see docs/cli.md. */
@Command(name = "shapetrail", mixinStandardHelpOptions = true, version = "Shapetrail 0.1",
        description = "Somatotype, growth and measurement-noise tools for practitioners.",
        subcommands = {RateCommand.class, PeopleCommand.class, TemCommand.class, ChangesCommand.class,
            GrowthCommand.class, BlockReportCommand.class, CompareSquadsCommand.class, LettersCommand.class,
            ImportCommand.class, ExportCommand.class, BackupCommand.class, RestoreCommand.class,
            ExportPersonCommand.class, ErasePersonCommand.class, BlockCommand.class, CommandLine.HelpCommand.class})
public final class ShapetrailCli implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line with the given streams and returns the exit code. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new ShapetrailCli());
        cl.setOut(out);
        cl.setErr(err);
        // a failure a person can act on is shown as its message, never as a stack trace
        cl.setExecutionExceptionHandler((ex, line, parsed) -> {
            if (ex instanceof org.shapetrail.ShapetrailException) {
                line.getErr().println(ex.getMessage());
                return 2;
            }
            throw ex;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /** True when the arguments ask for the command line rather than the desktop window. */
    public static boolean wantsCommandLine(String[] args) {
        return args.length > 0 && !args[0].startsWith("--db");
    }
}
