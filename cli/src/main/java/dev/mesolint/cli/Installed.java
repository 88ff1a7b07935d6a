package dev.mesolint.cli;

import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.engine.InstalledRules;
import java.io.PrintWriter;

/** What the command line shares between commands: the installed rules, and how configuration problems are shown. */
final class Installed {
    private Installed() {
    }

    static InstalledRules rules() throws ConfigProblem {
        return InstalledRules.discover(Installed.class.getClassLoader());
    }

    /** Prints a configuration problem as {@code mesolint: file:line:column: message (fix: ...)}; returns exit 2. */
    static int fail(ConfigProblem problem, PrintWriter err) {
        err.println("mesolint: " + problem.describe());
        err.flush();
        return MesolintCommand.EXIT_USAGE;
    }
}
