package org.beamfolio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyStore;
import java.security.cert.Certificate;
import java.security.cert.TrustAnchor;
import java.security.cert.X509Certificate;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;
import java.util.Set;
import org.beamfolio.seal.CertificateTrust;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The certificate concerns that {@code seal} and {@code verify} print, against a chosen set of trusted authorities. */
class CertificateTrustTest {
    @TempDir
    Path temp;

    private static List<X509Certificate> chain(Path p12, String alias) throws Exception {
        KeyStore store = KeyStore.getInstance("PKCS12");
        try (InputStream in = Files.newInputStream(p12)) {
            store.load(in, SealKeys.PASSWORD.toCharArray());
        }
        List<X509Certificate> chain = new ArrayList<>();
        for (Certificate c : store.getCertificateChain(alias)) {
            chain.add((X509Certificate) c);
        }
        return chain;
    }

    @Test
    void aCertificateIssuedByATrustedAuthorityHasNoConcerns() throws Exception {
        List<X509Certificate> issued = chain(SealKeys.issuedByPrivateAuthority(temp), "pe");
        X509Certificate authority = chain(SealKeys.authority(temp), "ca").get(0);
        assertEquals(2, issued.size(), "the keystore holds the chain up to the authority");
        assertEquals(List.of(), CertificateTrust.concerns(issued, new Date(), Set.of(new TrustAnchor(authority, null))),
                "trusted when its authority is");
        List<String> untrusted = CertificateTrust.concerns(issued, new Date());
        assertEquals(1, untrusted.size());
        assertTrue(untrusted.get(0).contains("not issued by a certification authority the system trusts"), untrusted.get(0));
    }

    @Test
    void aSelfSignedCertificateIsNamedAsSuchWhateverIsTrusted() throws Exception {
        List<X509Certificate> self = chain(SealKeys.selfSigned(temp, "pe"), "pe");
        List<String> concerns = CertificateTrust.concerns(self, new Date(), Set.of(new TrustAnchor(self.get(0), null)));
        assertEquals(1, concerns.size());
        assertTrue(concerns.get(0).contains("self-signed"), concerns.get(0));
    }
}
