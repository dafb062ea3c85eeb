package org.beamfolio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.beamfolio.checks.ChecksVerdict;
import org.beamfolio.seal.SealException;
import org.beamfolio.seal.Verifier;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code verify PACKAGE.pdf}: is the package intact, who sealed it and when. Exit 0 when intact, 2 otherwise. */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = "Check a package's seal, whether bytes were added after sealing, and the attached job file's digest.")
final class VerifyCommand implements Callable<Integer> {
    @Parameters(paramLabel = "PACKAGE.pdf")
    Path pdf;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!Files.isRegularFile(pdf)) {
            err.println("beamfolio verify: no package " + pdf);
            return Main.BAD_INPUT;
        }
        Verifier.Report r;
        try {
            r = Verifier.verify(Files.readAllBytes(pdf));
        } catch (SealException e) {
            err.println("beamfolio verify: " + pdf + ": " + e.getMessage());
            return Main.BAD_INPUT;
        }
        out.println(pdf + ":");
        out.println("  sealed:              " + (r.sealed() ? "yes, by " + (r.signer() == null ? "(a signer that cannot be read)" : r.signer()) + " at " + r.when() : "no"));
        if (r.sealed()) {
            out.println("  signature:           " + (r.signatureValid() ? "matches the sealed bytes" : "DOES NOT MATCH"));
            out.println("  added after sealing: " + (r.coversWholeFile() ? "nothing" : "YES, bytes follow the sealed part"));
        }
        out.println("  job file digest:     " + (r.attachedDigest() != null && r.attachedDigest().equals(r.printedDigest())
                ? "attached file matches the printed SHA-256 " + r.printedDigest() : "MISMATCH or missing"));
        out.println("  checks:              " + checks(r.checksFlag()));
        if (r.sealed()) {
            out.println("  certificate:         " + (r.certificateConcerns().isEmpty()
                    ? "issued by a certification authority the system trusts" : "NOT vouched for by a trusted authority"));
            r.certificateConcerns().forEach(c -> out.println("  warning: " + c));
        }
        r.problems().forEach(p -> out.println("  problem: " + p));
        out.println(r.intact() ? "  verdict: intact" : "  verdict: NOT intact");
        return r.intact() ? Main.OK : Main.BAD_INPUT;
    }

    private static String checks(String flag) {
        if (flag == null) {
            return "not recorded in the package";
        }
        if (ChecksVerdict.failing(flag)) {
            return "FAIL, the package has checks that do not meet their limits: " + flag.substring("fail: ".length());
        }
        return flag.equals("pass") ? "every check meets its limit" : "no checks were requested";
    }
}
