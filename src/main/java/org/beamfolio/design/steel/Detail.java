package org.beamfolio.design.steel;

/**
 * How much of a design's work is kept. {@link #PRINTED}: every equation with the values put in,
 * as the package prints it. {@link #VALUES}: the same values worked from the same templates, in
 * the same order, without recording the equations; for a design no package prints (a candidate
 * tried in the search for a section), so it gives the same strengths and ratios, to the bit.
 */
public enum Detail {
    PRINTED,
    VALUES
}
