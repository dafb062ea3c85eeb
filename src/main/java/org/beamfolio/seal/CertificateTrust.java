package org.beamfolio.seal;

import java.security.GeneralSecurityException;
import java.security.KeyStore;
import java.security.cert.CertPathValidator;
import java.security.cert.CertPathValidatorException;
import java.security.cert.CertificateFactory;
import java.security.cert.PKIXParameters;
import java.security.cert.TrustAnchor;
import java.security.cert.X509Certificate;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Date;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.net.ssl.TrustManagerFactory;
import javax.net.ssl.X509TrustManager;

/**
 * Whether a seal's certificate was issued by a certification authority that the system trusts
 * (the Java runtime's default trust store), and if not, why: a self-signed certificate proves
 * nothing about who holds the key, so {@code seal} warns and {@code verify} says so. Revocation
 * is not checked (that needs the network and the authority's services).
 */
public final class CertificateTrust {
    private static Set<TrustAnchor> systemAnchors;

    private CertificateTrust() {}

    /** The concerns about a chain (signer first), checked against the system's trusted authorities; empty when none. */
    public static List<String> concerns(List<X509Certificate> chain, Date at) {
        return concerns(chain, at, system());
    }

    /** The same against the given trusted authorities. */
    public static List<String> concerns(List<X509Certificate> chain, Date at, Set<TrustAnchor> anchors) {
        X509Certificate signer = chain.get(0);
        if (selfSigned(signer)) {
            return List.of("the certificate of " + Names.commonName(signer)
                    + " is self-signed: it was not issued by a certification authority, so nothing vouches for who holds the key");
        }
        if (anchors.isEmpty()) {
            return List.of("no trusted certification authorities are available to check the certificate of " + Names.commonName(signer));
        }
        try {
            List<X509Certificate> path = new ArrayList<>(chain);
            // the path handed to the validator stops short of the trust anchor itself
            path.removeIf(c -> selfSigned(c) && c != signer);
            PKIXParameters parameters = new PKIXParameters(anchors);
            parameters.setRevocationEnabled(false);
            parameters.setDate(at);
            CertPathValidator.getInstance("PKIX").validate(CertificateFactory.getInstance("X.509").generateCertPath(path), parameters);
            return List.of();
        } catch (CertPathValidatorException e) {
            return List.of("the certificate of " + Names.commonName(signer) + " (issued by " + signer.getIssuerX500Principal().getName()
                    + ") was not issued by a certification authority the system trusts: " + e.getMessage());
        } catch (GeneralSecurityException e) {
            return List.of("the certificate of " + Names.commonName(signer) + " could not be checked: " + e.getMessage());
        }
    }

    /** A chain from the signer's certificate up through the given certificates, following issuer names. */
    public static List<X509Certificate> chain(X509Certificate signer, Collection<X509Certificate> certificates) {
        List<X509Certificate> chain = new ArrayList<>(List.of(signer));
        X509Certificate current = signer;
        while (!selfSigned(current) && chain.size() <= certificates.size()) {
            X509Certificate child = current;
            X509Certificate issuer = certificates.stream()
                    .filter(c -> c.getSubjectX500Principal().equals(child.getIssuerX500Principal()) && !chain.contains(c))
                    .findFirst().orElse(null);
            if (issuer == null) {
                break;
            }
            chain.add(issuer);
            current = issuer;
        }
        return chain;
    }

    static boolean selfSigned(X509Certificate certificate) {
        if (!certificate.getSubjectX500Principal().equals(certificate.getIssuerX500Principal())) {
            return false;
        }
        try {
            certificate.verify(certificate.getPublicKey());
            return true;
        } catch (GeneralSecurityException e) {
            return false;
        }
    }

    private static synchronized Set<TrustAnchor> system() {
        if (systemAnchors == null) {
            Set<TrustAnchor> anchors = new HashSet<>();
            try {
                TrustManagerFactory factory = TrustManagerFactory.getInstance(TrustManagerFactory.getDefaultAlgorithm());
                factory.init((KeyStore) null);
                for (var manager : factory.getTrustManagers()) {
                    if (manager instanceof X509TrustManager x509) {
                        for (X509Certificate c : x509.getAcceptedIssuers()) {
                            anchors.add(new TrustAnchor(c, null));
                        }
                    }
                }
            } catch (GeneralSecurityException e) {
                // no trust store: every certificate is reported as not vouched for
            }
            systemAnchors = anchors;
        }
        return systemAnchors;
    }
}
