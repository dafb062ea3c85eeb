package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine.Command;

/**
 * The command line made with only the command a run names still behaves as the full one: the
 * usage lists every command, each command answers to the name its own annotation gives, and
 * {@code help COMMAND} and a mistyped command work as before (picocli 4 manual, "Subcommands").
 */
class MainTest {
    @Test
    void everyCommandIsKnownByItsOwnName() {
        Main.COMMANDS.forEach((name, command) ->
                assertEquals(name, command.get().getClass().getAnnotation(Command.class).name()));
    }

    @Test
    void theUsageListsEveryCommandAndHelp() {
        Run usage = Run.of("--help");
        assertEquals(Main.OK, usage.status());
        for (String name : Main.COMMANDS.keySet()) {
            assertTrue(usage.out().matches("(?s).*\\n  " + name + " .*"), name + " in\n" + usage.out());
        }
        assertTrue(usage.out().contains("\n  help "), usage.out());
    }

    @Test
    void aNamedCommandAndHelpOnItGiveTheSameUsage() {
        for (String name : List.of("check", "seal")) {
            Run direct = Run.of(name, "--help");
            Run viaHelp = Run.of("help", name);
            assertEquals(Main.OK, direct.status());
            assertTrue(direct.out().startsWith("Usage: beamfolio " + name + " "), direct.out());
            assertEquals(direct.out(), viaHelp.out());
        }
    }

    @Test
    void aMistypedCommandIsAUsageErrorNamingTheNearestCommand() {
        Run run = Run.of("chek", "job.yaml");
        assertEquals(Main.BAD_INPUT, run.status());
        assertTrue(run.err().contains("check"), run.err());
    }
}
