package org.beamfolio.seal;

import java.security.cert.X509Certificate;
import javax.naming.InvalidNameException;
import javax.naming.ldap.LdapName;
import javax.naming.ldap.Rdn;

/** The name to print for a certificate's subject: its common name, or the whole subject. */
final class Names {
    private Names() {}

    static String commonName(X509Certificate certificate) {
        String subject = certificate.getSubjectX500Principal().getName();
        try {
            for (Rdn rdn : new LdapName(subject).getRdns()) {
                if (rdn.getType().equalsIgnoreCase("CN")) {
                    return rdn.getValue().toString();
                }
            }
        } catch (InvalidNameException e) {
            return subject;
        }
        return subject;
    }
}
