package org.beamfolio.model.timber;

/** Sustained service temperature ranges of NDS 2018 Table 2.3.3. */
public enum Temperature {
    NORMAL("T <= 100 F"),
    ELEVATED("100 F < T <= 125 F"),
    HIGH("125 F < T <= 150 F");

    private final String range;

    Temperature(String range) {
        this.range = range;
    }

    public String range() {
        return range;
    }
}
