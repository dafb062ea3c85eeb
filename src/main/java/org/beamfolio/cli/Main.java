package org.beamfolio.cli;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;
import org.beamfolio.results.Version;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The command line. {@link #run} takes its streams and returns the exit status, so tests run it
 * in-process: 0 when every package was written (or every job checked) and meets every check, 3 when
 * every package was written but some check does not meet its limit, 2 when any input was invalid
 * (nothing is written for that job), 1 on an internal failure. See {@link ExitStatus} for which wins.
 */
@Command(name = "beamfolio", mixinStandardHelpOptions = true, versionProvider = Main.VersionProvider.class,
        description = "Exact beam analysis and calculation packages for structural engineers.",
        exitCodeListHeading = "%nExit status (over several jobs the first that applies, in this order: 1, 2, 3, 0):%n",
        exitCodeList = {"0:every package written (or job checked); every check meets its limit",
                "3:every package written (or job checked); some check does not meet its limit",
                "2:invalid input; nothing written for that job", "1:internal failure; nothing half-written"})
public final class Main implements Runnable {
    public static final int OK = 0;
    public static final int INTERNAL_FAILURE = 1;
    public static final int BAD_INPUT = 2;
    /** The package was written (or the job checked), and at least one check does not meet its limit. */
    public static final int CHECKS_FAIL = 3;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(run(args, System.out, System.err));
    }

    /**
     * The commands by name, in the order the usage lists them. picocli reads every option of every
     * command it is given by reflection when the command line is made, and loads their classes
     * (the seal command's among them); a run that names its command is given only that one.
     */
    static final Map<String, Supplier<Object>> COMMANDS = commands();

    private static Map<String, Supplier<Object>> commands() {
        Map<String, Supplier<Object>> commands = new LinkedHashMap<>();
        commands.put("build", BuildCommand::new);
        commands.put("check", CheckCommand::new);
        commands.put("watch", WatchCommand::new);
        commands.put("new", NewCommand::new);
        commands.put("seal", SealCommand::new);
        commands.put("verify", VerifyCommand::new);
        return commands;
    }

    public static int run(String[] args, PrintStream out, PrintStream err) {
        CommandLine cli = new CommandLine(new Main());
        Supplier<Object> named = args.length > 0 ? COMMANDS.get(args[0]) : null;
        if (named != null) {
            cli.addSubcommand(args[0], named.get());
        } else {
            COMMANDS.forEach((name, command) -> cli.addSubcommand(name, command.get()));
            cli.addSubcommand(new CommandLine.HelpCommand());
        }
        cli.setOut(new PrintWriter(out, true, StandardCharsets.UTF_8));
        cli.setErr(new PrintWriter(err, true, StandardCharsets.UTF_8));
        cli.setParameterExceptionHandler((e, a) -> {
            e.getCommandLine().getErr().println("beamfolio: " + e.getMessage());
            e.getCommandLine().usage(e.getCommandLine().getErr());
            return BAD_INPUT;
        });
        cli.setExecutionExceptionHandler((e, c, r) -> {
            c.getErr().println("beamfolio: internal failure: " + e);
            return INTERNAL_FAILURE;
        });
        return cli.execute(args);
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    static final class VersionProvider implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"beamfolio " + Version.get()};
        }
    }
}
