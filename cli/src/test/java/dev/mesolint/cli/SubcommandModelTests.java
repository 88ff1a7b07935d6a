package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine.Command;

/** Only the subcommand a run names is modelled; help, completion and mistyped names still see every one. */
class SubcommandModelTests {
    @Test
    void aNamedSubcommandIsTheOnlyOneModelled() {
        assertEquals(List.of(CheckCommand.class), MesolintCommand.subcommandsFor(new String[] {"check", "x.yaml"}));
        assertEquals(List.of(RulesCommand.class), MesolintCommand.subcommandsFor(new String[] {"rules"}));
    }

    @Test
    void helpCompletionVersionAndUnknownNamesGetEverySubcommand() {
        for (String[] args : List.of(new String[] {}, new String[] {"help", "check"}, new String[] {"--version"},
                new String[] {"generate-completion"}, new String[] {"chek"})) {
            assertEquals(MesolintCommand.SUBCOMMANDS, MesolintCommand.subcommandsFor(args), String.join(" ", args));
        }
    }

    @Test
    void theTopLevelHelpListsEverySubcommandInOrder() {
        StringWriter out = new StringWriter();
        assertEquals(0, MesolintCommand.execute(new String[] {"--help"}, new PrintWriter(out), new PrintWriter(
                new StringWriter())));
        int last = -1;
        for (Class<?> subcommand : MesolintCommand.SUBCOMMANDS) {
            Command command = subcommand.getAnnotation(Command.class);
            if (command.hidden()) {
                continue;
            }
            int at = out.toString().indexOf("\n  " + command.name() + " ");
            assertTrue(at > last, command.name() + " listed after the one before it in: " + out);
            last = at;
        }
    }

    @Test
    void aMistypedSubcommandIsRefusedWithASuggestion() {
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(new String[] {"chek"}, new PrintWriter(new StringWriter()),
                new PrintWriter(err));
        assertEquals(MesolintCommand.EXIT_USAGE, exit);
        assertTrue(err.toString().contains("Did you mean: mesolint check"), err.toString());
    }
}
