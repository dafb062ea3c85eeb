package org.beamfolio.model.timber;

/**
 * Which size factor rule applies to sawn lumber: dimension lumber 2 to 4 in thick (NDS Supplement
 * Table 4A footnotes), timbers 5 in and thicker (NDS 4.3.6.2), or none (the engineer's reference
 * values already include it, or another table applies).
 */
public enum SizeClass {
    DIMENSION, TIMBER, NONE
}
