package org.beamfolio.design.steel;

/** Allowable strength design (Rn / Omega) or load and resistance factor design (phi Rn), AISC 360 B3.1 and B3.2. */
public enum Method {
    ASD,
    LRFD
}
