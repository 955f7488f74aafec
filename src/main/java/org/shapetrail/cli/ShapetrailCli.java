package org.shapetrail.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The command line: {@code java -jar shapetrail.jar COMMAND ...}; see docs/cli.md. */
@Command(name = "shapetrail", mixinStandardHelpOptions = true, versionProvider = ShapetrailCli.Version.class,
        subcommands = {RateCommand.class, PeopleCommand.class, TemCommand.class, ChangesCommand.class,
            GrowthCommand.class, BlockReportCommand.class, CompareSquadsCommand.class, LettersCommand.class,
            ImportCommand.class, ExportCommand.class, BackupCommand.class, RestoreCommand.class,
            ExportPersonCommand.class, ErasePersonCommand.class, BlockCommand.class, TrailCommand.class,
            AccountCommand.class, CommandLine.HelpCommand.class})
public final class ShapetrailCli implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Read before the command runs (see {@link #execute}); declared so that every command accepts it. */
    @CommandLine.Option(names = "--lang", paramLabel = "en|es|pt", scope = CommandLine.ScopeType.INHERIT)
    String lang;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line with the given streams and returns the exit code. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        java.util.Locale before = org.shapetrail.i18n.Messages.current();
        try {
            String lang = languageAsked(args);
            if (lang != null) {
                if (!org.shapetrail.i18n.Messages.LANGUAGES.contains(lang)) {
                    err.println(org.shapetrail.i18n.Messages.tr("cli.lang.bad", lang));
                    err.flush();
                    return 2;
                }
                org.shapetrail.i18n.Messages.use(org.shapetrail.i18n.Messages.localeFor(lang,
                        java.util.Locale.getDefault(java.util.Locale.Category.FORMAT)));
            }
            return run(args, out, err);
        } finally {
            org.shapetrail.i18n.Messages.use(before); // a run in another language leaves the process as it was
        }
    }

    /** The value of {@code --lang} anywhere in the arguments, or null. */
    static String languageAsked(String[] args) {
        String lang = null;
        for (int i = 0; i < args.length; i++) {
            if (args[i].equals("--lang") && i + 1 < args.length) {
                lang = args[i + 1];
            } else if (args[i].startsWith("--lang=")) {
                lang = args[i].substring("--lang=".length());
            }
        }
        return lang;
    }

    private static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new ShapetrailCli());
        // the help texts and messages in the language --lang names, else the system's (Messages.current)
        cl.setResourceBundle(org.shapetrail.i18n.Messages.bundle(org.shapetrail.i18n.Messages.current()));
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
        cl.setParameterExceptionHandler(ShapetrailCli::refuseArguments);
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /**
     * Says what is wrong with the arguments in the command's language (picocli's own words are English),
     * then the command's usage, and exits 2.
     */
    static int refuseArguments(CommandLine.ParameterException ex, String[] args) {
        CommandLine c = ex.getCommandLine();
        PrintWriter err = c.getErr();
        err.println(argumentProblem(ex));
        c.usage(err);
        return c.getCommandSpec().exitCodeOnInvalidInput();
    }

    static String argumentProblem(CommandLine.ParameterException ex) {
        if (ex instanceof CommandLine.UnmatchedArgumentException u) {
            return org.shapetrail.i18n.Messages.tr("cli.parse.unknown", String.join(" ", u.getUnmatched()));
        }
        if (ex instanceof CommandLine.MissingParameterException m) {
            return org.shapetrail.i18n.Messages.tr("cli.parse.missing", String.join(", ", m.getMissing().stream()
                    .map(ShapetrailCli::named).toList()));
        }
        if (ex.getArgSpec() != null && ex.getCause() instanceof CommandLine.TypeConversionException t
                && ex.getArgSpec().converters().length > 0) {
            // our own converter's words, already in the command's language
            return org.shapetrail.i18n.Messages.tr("cli.parse.value", named(ex.getArgSpec()), t.getMessage());
        }
        if (ex.getArgSpec() != null && ex.getCause() instanceof CommandLine.TypeConversionException) {
            // picocli's own conversions (a number, a date) say it in English: say it again in ours
            return org.shapetrail.i18n.Messages.tr("cli.parse.type", named(ex.getArgSpec()),
                    String.valueOf(ex.getValue()), typeWord(ex.getArgSpec().type()));
        }
        if (ex.getArgSpec() != null && ex.getValue() != null) {
            return org.shapetrail.i18n.Messages.tr("cli.parse.value", named(ex.getArgSpec()), ex.getValue());
        }
        return ex.getMessage();
    }

    private static String typeWord(Class<?> type) {
        if (type == java.time.LocalDate.class) {
            return org.shapetrail.i18n.Messages.tr("cli.type.date");
        }
        return org.shapetrail.i18n.Messages.tr(type == int.class || type == Integer.class || type == long.class
                || type == Long.class ? "cli.type.whole" : "cli.type.value");
    }

    private static String named(CommandLine.Model.ArgSpec a) {
        return a instanceof CommandLine.Model.OptionSpec o ? o.longestName() : a.paramLabel();
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
