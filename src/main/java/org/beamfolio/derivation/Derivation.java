package org.beamfolio.derivation;

import java.util.List;

/**
 * The worked solution of one combination: the method used and its steps, plus tables a
 * reviewer can re-add (rows of display text).
 */
public record Derivation(String combination, String method, List<Step> steps, List<String> tableHeader,
                         List<List<String>> table, String tableTitle) {
    public Derivation {
        steps = List.copyOf(steps);
        tableHeader = List.copyOf(tableHeader);
        table = List.copyOf(table);
    }
}
