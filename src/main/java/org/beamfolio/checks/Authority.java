package org.beamfolio.checks;

/**
 * Where a check's rule comes from, as data: the standard as it is cited with its edition
 * ("AISC 360-16", "NDS 2018", "ASCE/SEI 7-22"), the edition's year, and the clause.
 */
public record Authority(String standard, String edition, String clause) {
    /** As the checks table and the results file print it: standard, then clause. */
    public String citation() {
        return clause.isEmpty() ? standard : standard + " " + clause;
    }
}
