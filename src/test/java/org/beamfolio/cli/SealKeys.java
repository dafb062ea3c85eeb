package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Throwaway PKCS#12 keystores made by the JDK's keytool for sealing tests (password secret123); no key is kept in the repository. */
final class SealKeys {
    static final String PASSWORD = "secret123";

    private SealKeys() {}

    /** A self-signed certificate for "Test Engineer PE" under {@code alias}. */
    static Path selfSigned(Path folder, String alias) throws Exception {
        Path file = folder.resolve("self-" + alias + ".p12");
        keytool("-genkeypair", "-alias", alias, "-keyalg", "RSA", "-keysize", "2048", "-dname", "CN=Test Engineer PE, O=Test",
                "-validity", "30", "-storetype", "PKCS12", "-keystore", file.toString(), "-storepass", PASSWORD, "-keypass", PASSWORD);
        return file;
    }

    /** The certificate of a private test authority that nothing trusts (its keystore: {@code ca.p12}, alias ca). */
    static Path authority(Path folder) throws Exception {
        Path ca = folder.resolve("ca.p12");
        if (!ca.toFile().exists()) {
            keytool("-genkeypair", "-alias", "ca", "-keyalg", "RSA", "-keysize", "2048", "-dname", "CN=Test Private Authority, O=Test",
                    "-ext", "bc:c", "-validity", "60", "-storetype", "PKCS12", "-keystore", ca.toString(), "-storepass", PASSWORD,
                    "-keypass", PASSWORD);
        }
        return ca;
    }

    /** A keystore whose key "pe" has a certificate issued by the private test authority, with the chain. */
    static Path issuedByPrivateAuthority(Path folder) throws Exception {
        Path ca = authority(folder);
        Path pe = folder.resolve("issued.p12");
        String store = pe.toString();
        keytool("-genkeypair", "-alias", "pe", "-keyalg", "RSA", "-keysize", "2048", "-dname", "CN=Test Engineer PE, O=Test",
                "-validity", "30", "-storetype", "PKCS12", "-keystore", store, "-storepass", PASSWORD, "-keypass", PASSWORD);
        Path request = folder.resolve("pe.csr");
        Path issued = folder.resolve("pe.cer");
        Path caCert = folder.resolve("ca.cer");
        keytool("-certreq", "-alias", "pe", "-keystore", store, "-storepass", PASSWORD, "-file", request.toString());
        keytool("-gencert", "-alias", "ca", "-keystore", ca.toString(), "-storepass", PASSWORD, "-infile", request.toString(),
                "-outfile", issued.toString(), "-validity", "30", "-ext", "ku:c=digitalSignature,nonRepudiation");
        keytool("-exportcert", "-alias", "ca", "-keystore", ca.toString(), "-storepass", PASSWORD, "-file", caCert.toString());
        keytool("-importcert", "-noprompt", "-alias", "ca", "-keystore", store, "-storepass", PASSWORD, "-file", caCert.toString());
        keytool("-importcert", "-noprompt", "-alias", "pe", "-keystore", store, "-storepass", PASSWORD, "-file", issued.toString());
        return pe;
    }

    private static void keytool(String... arguments) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "keytool").toString()));
        command.addAll(List.of(arguments));
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        String output = new String(p.getInputStream().readAllBytes());
        assertEquals(0, p.waitFor(), "keytool " + String.join(" ", arguments) + ":\n" + output);
    }
}
