package org.beamfolio.design.steel;

/**
 * A member the implemented provisions do not cover (an I-shape with a noncompact web, F4 and F5;
 * a rectangular HSS with a slender web; a round HSS with D/t of 0.45 E/Fy or more), named with the
 * clause that would apply. The job reader reports it as bad input.
 */
public final class OutOfScopeException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public OutOfScopeException(String message) {
        super(message);
    }
}
