package org.shapetrail.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The command line: {@code java -jar shapetrail.jar COMMAND ...}; see docs/cli.md. */
@Command(name = "shapetrail", mixinStandardHelpOptions = true, versionProvider = ShapetrailCli.Version.class,
        description = "Somatotype, growth and measurement-noise tools for practitioners.",
        subcommands = {RateCommand.class, PeopleCommand.class, TemCommand.class, ChangesCommand.class,
            GrowthCommand.class, BlockReportCommand.class, CompareSquadsCommand.class, LettersCommand.class,
            ImportCommand.class, ExportCommand.class, BackupCommand.class, RestoreCommand.class,
            ExportPersonCommand.class, ErasePersonCommand.class, BlockCommand.class, TrailCommand.class,
            AccountCommand.class, CommandLine.HelpCommand.class})
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

    /** {@code --version}: the version the pom states, the same in the jar and the installed app. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {org.shapetrail.store.AppVersion.named()};
        }
    }

    /**
     * True when the arguments ask for the command line rather than the desktop window: anything but
     * nothing, {@code --db FILE}, or one academy file on its own (what a double click on the file passes).
     */
    public static boolean wantsCommandLine(String[] args) {
        return args.length > 0 && !args[0].startsWith("--db") && academyFileArgument(args) == null;
    }

    /** The file when the only argument names an existing academy file (.shapetrail, .sqlite, .db), else null. */
    public static java.nio.file.Path academyFileArgument(String[] args) {
        if (args.length != 1 || args[0].startsWith("-")) {
            return null;
        }
        String name = args[0].toLowerCase(java.util.Locale.ROOT);
        if (!(name.endsWith(".shapetrail") || name.endsWith(".sqlite") || name.endsWith(".db"))) {
            return null;
        }
        try {
            java.nio.file.Path p = java.nio.file.Path.of(args[0]);
            return java.nio.file.Files.isRegularFile(p) ? p : null;
        } catch (java.nio.file.InvalidPathException e) {
            return null;
        }
    }
}
