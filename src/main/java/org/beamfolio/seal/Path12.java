package org.beamfolio.seal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.GeneralSecurityException;
import java.security.KeyStore;

/** A PKCS#12 keystore file, opened with its password. */
public record Path12(Path file) {
    KeyStore load(char[] password) throws SealException {
        if (!Files.isRegularFile(file)) {
            throw new SealException("no keystore file " + file);
        }
        try (InputStream in = Files.newInputStream(file)) {
            KeyStore store = KeyStore.getInstance("PKCS12");
            store.load(in, password);
            return store;
        } catch (IOException e) {
            if (e.getCause() instanceof java.security.UnrecoverableKeyException || String.valueOf(e.getMessage()).contains("password")) {
                throw new SealException("the password does not open the keystore " + file);
            }
            throw new SealException("the keystore " + file + " cannot be read: " + e.getMessage(), e);
        } catch (GeneralSecurityException e) {
            throw new SealException("the keystore " + file + " cannot be read: " + e.getMessage(), e);
        }
    }
}
