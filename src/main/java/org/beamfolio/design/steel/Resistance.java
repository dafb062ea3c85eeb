package org.beamfolio.design.steel;

/** The resistance factor phi (LRFD) and safety factor Omega (ASD) of a strength, with their clause. */
public record Resistance(double phi, double omega, Clause clause) {
    /** Available strength: phi Rn for LRFD, Rn / Omega for ASD. */
    public double available(double nominal, Method method) {
        return method == Method.LRFD ? phi * nominal : nominal / omega;
    }
}
