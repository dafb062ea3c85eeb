package org.beamfolio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code new LAYOUT [--units US|SI] [--out FILE]}: a commented starter job file; never overwrites. */
@Command(name = "new", mixinStandardHelpOptions = true,
        description = "Write a commented starter job file for a layout: simple-span, overhang, cantilever or continuous.")
final class NewCommand implements Callable<Integer> {
    @Parameters(paramLabel = "LAYOUT", description = "simple-span, overhang, cantilever or continuous")
    String layout;

    @Option(names = "--units", paramLabel = "US|SI", description = "units of the starter (default: US)")
    String units = "US";

    @Option(names = "--out", paramLabel = "FILE", description = "where to write it (default: LAYOUT.yaml in the current folder)")
    Path out;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter stderr = spec.commandLine().getErr();
        if (!Starter.LAYOUTS.contains(layout)) {
            stderr.println("beamfolio new: unknown layout \"" + layout + "\" (one of: " + String.join(", ", Starter.LAYOUTS) + ")");
            return Main.BAD_INPUT;
        }
        if (!units.equalsIgnoreCase("US") && !units.equalsIgnoreCase("SI")) {
            stderr.println("beamfolio new: --units is US or SI, got \"" + units + "\"");
            return Main.BAD_INPUT;
        }
        Path target = out != null ? out : Path.of(layout + ".yaml");
        try {
            Files.writeString(target, Starter.of(layout, units.equalsIgnoreCase("SI")), StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW);
        } catch (java.nio.file.FileAlreadyExistsException e) {
            stderr.println("beamfolio new: " + target + " exists already; it is left as it is (choose another --out)");
            return Main.BAD_INPUT;
        }
        spec.commandLine().getOut().println("wrote " + target + ": edit it, then run: build " + target);
        return Main.OK;
    }
}
