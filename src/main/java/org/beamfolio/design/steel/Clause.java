package org.beamfolio.design.steel;

import java.util.List;

/**
 * Where a rule comes from, as data: the edition of AISC 360, the clause, and the equations used.
 * Printed as {@code AISC 360-16 F2.2, Eq. F2-2, F2-5, F2-6}.
 */
public record Clause(Edition edition, String clause, List<String> equations) {
    public Clause {
        equations = List.copyOf(equations);
    }

    public static Clause of(Edition edition, String clause, String... equations) {
        return new Clause(edition, clause, List.of(equations));
    }

    /** The standard, edition and clause without equations: the check's {@code clause} entry. */
    public String reference() {
        return edition.label() + " " + clause;
    }

    @Override
    public String toString() {
        return equations.isEmpty() ? reference() : reference() + ", Eq. " + String.join(", ", equations);
    }
}
