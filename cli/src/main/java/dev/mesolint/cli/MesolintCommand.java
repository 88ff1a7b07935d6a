package dev.mesolint.cli;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.text.SafeText;
import java.io.InputStream;
import java.io.PrintWriter;
import java.util.List;
import picocli.AutoComplete;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code mesolint} command: checks training programmes written in YAML. */
@Command(name = "mesolint",
        mixinStandardHelpOptions = true,
        versionProvider = MesolintCommand.Version.class,
        description = "Checks resistance-training programmes written in YAML the way a compiler checks code.",
        footer = {"", ConfigOptions.PRECEDENCE, "",
            MesolintCommand.EXIT_CODES,
            "", "Caution: " + Mesolint.CAUTION})
public final class MesolintCommand implements Runnable {
    /**
     * The subcommands, in the order help lists them. Only the one a run names is modelled (see {@link #subcommandsFor}):
     * picocli builds a command's model from its annotations by reflection, about a tenth of a one-file check's time.
     */
    static final List<Class<?>> SUBCOMMANDS = List.of(CheckCommand.class, DiffCommand.class, MetricsCommand.class,
            BaselineCommand.class, RulesCommand.class, ExplainCommand.class, CatalogueCommand.class,
            SchemaCommand.class, InitCommand.class, AutoComplete.GenerateCompletion.class,
            CommandLine.HelpCommand.class);

    static final int EXIT_USAGE = 2;
    /** Out of memory or stack: the run was stopped, so nothing it printed can be trusted as complete. */
    static final int EXIT_RESOURCE_LIMIT = 3;
    static final String EXIT_CODES = "Exit codes: 0 clean, 1 findings at or above the fail level, 2 usage, "
            + "configuration or internal error, or no file checked, 3 out of memory (a resource limit).";

    /** Standard input, for {@code check -}; a field so that tests can hand in their own. */
    private InputStream in = System.in;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    InputStream in() {
        return in;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    public static void main(String[] args) {
        // Standard output is not flushed line by line (a report of 40,000 findings was 80,000 write calls): each
        // report flushes when it is written, and whatever is left goes out before the exit.
        PrintWriter out = new PrintWriter(System.out, false);
        int code = execute(args, out, new PrintWriter(System.err, true));
        out.flush();
        System.exit(code);
    }

    /** Runs the command line with the given streams; returns the exit code. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        return execute(args, System.in, out, err);
    }

    /** Runs the command line with the given streams, {@code in} standing for standard input; returns the exit code. */
    public static int execute(String[] args, InputStream in, PrintWriter out, PrintWriter err) {
        MesolintCommand top = new MesolintCommand();
        top.in = in;
        CommandLine cli = new CommandLine(top);
        for (Class<?> subcommand : subcommandsFor(args)) {
            cli.addSubcommand(subcommand);
        }
        cli.setOut(out);
        cli.setErr(err);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.setExitCodeExceptionMapper(e -> EXIT_USAGE);
        cli.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            // No stack traces for users: one line with the cause, exit 2.
            commandLine.getErr().println("mesolint: " + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + SafeText.line(e.getMessage())));
            return EXIT_USAGE;
        });
        try {
            return cli.execute(args);
        } catch (OutOfMemoryError | StackOverflowError e) {
            return resourceLimit(e, err);
        } catch (RuntimeException e) {
            // A failure picocli did not route through the handler (in a report writer's thread, say): still no trace.
            Throwable cause = e.getCause() instanceof Error error ? error : e;
            if (cause instanceof OutOfMemoryError || cause instanceof StackOverflowError) {
                return resourceLimit((Error) cause, err);
            }
            err.println("mesolint: internal error: " + SafeText.line(String.valueOf(e.getMessage())));
            return EXIT_USAGE;
        }
    }

    /**
     * The subcommands a run needs: the one its first argument names, or all of them when it names none (help, the
     * version, a completion script, a mistyped name that picocli then suggests a correction for).
     */
    static List<Class<?>> subcommandsFor(String[] args) {
        if (args.length > 0) {
            for (Class<?> subcommand : SUBCOMMANDS) {
                if (subcommand == CommandLine.HelpCommand.class || subcommand == AutoComplete.GenerateCompletion.class) {
                    continue; // both read the other subcommands' models
                }
                Command command = subcommand.getAnnotation(Command.class);
                if (command.name().equals(args[0]) || List.of(command.aliases()).contains(args[0])) {
                    return List.of(subcommand);
                }
            }
        }
        return SUBCOMMANDS;
    }

    /** A clear message for a run that ran out of memory or stack; exit 3 tells CI it was not a finding. */
    static int resourceLimit(Error e, PrintWriter err) {
        err.println("mesolint: the run ran out of " + (e instanceof OutOfMemoryError ? "memory" : "stack")
                + " and was stopped; its results are incomplete. Give Java more memory (e.g. JAVA_TOOL_OPTIONS="
                + "-Xmx1g), or check fewer files at a time, and report the file that caused it.");
        err.flush();
        return EXIT_RESOURCE_LIMIT;
    }

    /** Reads the version from the core jar. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"mesolint " + Mesolint.version(), "rule set " + Mesolint.RULE_SET_VERSION,
                "Java " + System.getProperty("java.version")};
        }
    }
}
