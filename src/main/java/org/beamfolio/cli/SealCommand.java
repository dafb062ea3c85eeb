package org.beamfolio.cli;

import java.io.Console;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Calendar;
import java.util.List;
import java.util.TimeZone;
import java.util.concurrent.Callable;
import org.beamfolio.seal.Path12;
import org.beamfolio.seal.SealException;
import org.beamfolio.seal.Sealer;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code seal PACKAGE.pdf --keystore FILE.p12}: the engineer's digital seal. The password comes
 * from BEAMFOLIO_KEYSTORE_PASSWORD or a prompt, never from the command line.
 */
@Command(name = "seal", mixinStandardHelpOptions = true,
        description = "Digitally seal a package with the key in a PKCS#12 keystore (password from BEAMFOLIO_KEYSTORE_PASSWORD or a prompt).")
final class SealCommand implements Callable<Integer> {
    static final String PASSWORD_VARIABLE = "BEAMFOLIO_KEYSTORE_PASSWORD";

    @Parameters(paramLabel = "PACKAGE.pdf")
    Path pdf;

    @Option(names = "--keystore", required = true, paramLabel = "FILE.p12", description = "the PKCS#12 keystore with the engineer's key")
    Path keystore;

    @Option(names = "--alias", paramLabel = "A", description = "the key to use, when the keystore holds more than one")
    String alias;

    @Option(names = "--reason", description = "printed with the seal, e.g. \"Issued for permit\"")
    String reason;

    @Option(names = "--location", description = "printed with the seal, e.g. a city")
    String location;

    @Option(names = "--sheet", paramLabel = "N", description = "seal on sheet N instead of the cover's seal box")
    int sheet;

    @Option(names = "--out", paramLabel = "FILE", description = "write the sealed package here (default: replace PACKAGE.pdf)")
    Path out;

    @Option(names = "--licence", paramLabel = "NUMBER", description = "the engineer's licence number, printed in the seal")
    String licence;

    @Option(names = "--image", paramLabel = "PNG", description = "the engineer's seal image, placed in the seal box (transparency is flattened onto white)")
    Path image;

    @Option(names = "--accept-failing", description = "seal a package whose checks do not all meet their limits; the seal then says so")
    boolean acceptFailing;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Where the password comes from; tests give their own. */
    static java.util.function.Function<String, String> environment = System::getenv;

    @Override
    public Integer call() throws IOException {
        PrintWriter stderr = spec.commandLine().getErr();
        if (!Files.isRegularFile(pdf)) {
            stderr.println("beamfolio seal: no package " + pdf);
            return Main.BAD_INPUT;
        }
        if (image != null && !Files.isRegularFile(image)) {
            stderr.println("beamfolio seal: no seal image " + image + " (the package is unchanged)");
            return Main.BAD_INPUT;
        }
        char[] password = password(stderr);
        if (password == null) {
            return Main.BAD_INPUT;
        }
        byte[] original = Files.readAllBytes(pdf);
        Sealer.Sealed sealed;
        try {
            Sealer.Request request = new Sealer.Request(alias, reason, location, sheet, licence,
                    image == null ? null : Files.readAllBytes(image), acceptFailing);
            sealed = Sealer.seal(original, new Path12(keystore), password, request, Calendar.getInstance(TimeZone.getTimeZone("UTC")));
        } catch (SealException e) {
            stderr.println("beamfolio seal: " + pdf + ": " + e.getMessage() + " (the package is unchanged)");
            return Main.BAD_INPUT;
        } finally {
            java.util.Arrays.fill(password, '\0');
        }
        Path target = out != null ? out : pdf;
        sealed.warnings().forEach(w -> stderr.println("beamfolio seal: warning: " + w));
        AtomicFiles.writeTogether(List.of(target), List.of(sealed.pdf()));
        spec.commandLine().getOut().println("sealed " + target);
        return Main.OK;
    }

    private char[] password(PrintWriter stderr) {
        String fromEnvironment = environment.apply(PASSWORD_VARIABLE);
        if (fromEnvironment != null) {
            return fromEnvironment.toCharArray();
        }
        Console console = System.console();
        if (console == null) {
            stderr.println("beamfolio seal: give the keystore password in " + PASSWORD_VARIABLE + " or run in a terminal to be asked for it");
            return null;
        }
        return console.readPassword("Keystore password for %s: ", keystore);
    }
}
