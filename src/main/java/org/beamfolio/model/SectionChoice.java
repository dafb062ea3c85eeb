package org.beamfolio.model;

import java.util.Comparator;
import java.util.List;

/**
 * A section the tool chooses ({@code choose:} in a section): the candidates in the order they
 * are tried, lightest first, and, once the search has run, every candidate tried with its
 * governing check. The section that carries a choice after the search is the one chosen.
 *
 * @param kind how the candidates were given
 * @param basis the candidates as the selection sheet states them, e.g. "W family, tabulated depth 16 in or less"
 * @param candidates concrete sections (no choice of their own) in the order they are tried
 * @param tried the candidates tried, in order; empty before the search
 */
public record SectionChoice(Kind kind, String basis, List<Section> candidates, List<Trial> tried) {
    /**
     * A list of catalogue designations, a catalogue family with filters, lumber sizes and plies, or
     * glulam widths and depths in whole laminations.
     */
    public enum Kind { LISTED, FAMILY, LUMBER, GLULAM;

        /** Whether the candidates are timber (chosen by area) rather than steel shapes (chosen by weight). */
        public boolean timber() {
            return this == LUMBER || this == GLULAM;
        }
    }

    /**
     * One candidate tried: the whole job analysed and checked with it.
     *
     * @param weight weight per length, N/m (catalogue W; timber density x A), NaN where the material gives no density
     * @param area cross-sectional area, m^2
     * @param governing the id of the check with the largest ratio, or why the candidate could not be checked
     * @param description what that check is, for the sheet
     * @param ratio the governing ratio (the checks' own value); NaN where the candidate could not be checked
     * @param pass whether every check passes
     */
    public record Trial(Section section, double weight, double area, String governing, String description, double ratio,
                        boolean pass) {}

    public SectionChoice {
        candidates = List.copyOf(candidates);
        tried = List.copyOf(tried);
        if (candidates.isEmpty()) {
            throw new IllegalArgumentException("a choice needs at least one candidate");
        }
    }

    /** This choice with the candidates tried. */
    public SectionChoice withTried(List<Trial> trials) {
        return new SectionChoice(kind, basis, candidates, trials);
    }

    /**
     * The candidate the package uses: the first tried that passes (they are tried lightest
     * first), or, when none passes, the one with the lowest governing ratio; null before the search.
     */
    public Trial chosen() {
        return tried.stream().filter(Trial::pass).findFirst()
                .orElseGet(() -> tried.stream().filter(t -> !Double.isNaN(t.ratio()))
                        .min(Comparator.comparingDouble(Trial::ratio)).orElse(null));
    }

    /** Whether the candidate chosen passes every check. */
    public boolean passing() {
        Trial c = chosen();
        return c != null && c.pass();
    }
}
