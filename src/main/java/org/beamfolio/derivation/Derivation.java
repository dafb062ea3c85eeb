package org.beamfolio.derivation;

import java.util.List;

/**
 * The worked solution of one combination: the method used and its steps, plus tables a
 * reviewer can re-add (rows of display text).
 */
public record Derivation(String combination, String method, List<Step> steps, List<Table> tables) {
    public Derivation {
        steps = List.copyOf(steps);
        tables = List.copyOf(tables);
    }

    /** A titled table of display text. */
    public record Table(String title, List<String> header, List<List<String>> rows) {
        public Table {
            header = List.copyOf(header);
            rows = List.copyOf(rows);
        }
    }
}
