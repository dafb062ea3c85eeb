package org.beamfolio.model;

import org.beamfolio.catalogue.Lumber;

/**
 * A named section: its shape, and whether it is turned upside down; {@code lumber} is the
 * nominal size a rectangle was dressed from, or null.
 */
public record Section(String id, SectionShape shape, boolean flip, Lumber lumber) {
    public Section(String id, SectionShape shape, boolean flip) {
        this(id, shape, flip, null);
    }
}
