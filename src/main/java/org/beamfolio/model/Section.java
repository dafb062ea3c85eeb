package org.beamfolio.model;

import org.beamfolio.catalogue.Lumber;

/**
 * A named section: its shape, and whether it is turned upside down; {@code lumber} is the
 * nominal size a rectangle was dressed from, or null; {@code choice} is the search the section
 * comes from ({@code choose:}), or null for a section the engineer named. Before the search the
 * shape is that of the first candidate; after it, that of the candidate chosen.
 */
public record Section(String id, SectionShape shape, boolean flip, Lumber lumber, SectionChoice choice) {
    public Section(String id, SectionShape shape, boolean flip) {
        this(id, shape, flip, null, null);
    }

    public Section(String id, SectionShape shape, boolean flip, Lumber lumber) {
        this(id, shape, flip, lumber, null);
    }

    /** The section chosen: this id, the candidate's shape and size, and the search that chose it. */
    public Section chosenAs(Section candidate, SectionChoice searched) {
        return new Section(id, candidate.shape(), candidate.flip(), candidate.lumber(), searched);
    }

    /** The name a candidate is known by: its catalogue designation or its lumber size. */
    public String designation() {
        if (lumber != null) {
            return lumber.designation();
        }
        return shape instanceof SectionShape.Catalogued c ? c.shape().designation() : id;
    }
}
