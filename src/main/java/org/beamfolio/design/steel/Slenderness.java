package org.beamfolio.design.steel;

/**
 * The width-to-thickness ratio of one element against its limits, AISC 360 Table B4.1b.
 *
 * @param element e.g. {@code flange}, {@code web}, {@code stem}, {@code wall}
 * @param ratio how lambda is formed, e.g. {@code bf/2tf}
 * @param tableCase the case of Table B4.1b
 */
public record Slenderness(String element, String ratio, double lambda, double lambdaP, double lambdaR,
                          Compactness compactness, String tableCase) {
    public enum Compactness {
        COMPACT("compact"), NONCOMPACT("noncompact"), SLENDER("slender");

        private final String label;

        Compactness(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    static Slenderness of(String element, String ratio, double lambda, double lambdaP, double lambdaR, String tableCase) {
        Compactness c = lambda <= lambdaP ? Compactness.COMPACT
                : lambda <= lambdaR ? Compactness.NONCOMPACT : Compactness.SLENDER;
        return new Slenderness(element, ratio, lambda, lambdaP, lambdaR, c, tableCase);
    }
}
