package org.beamfolio.model.timber;

/** The reference design values a beam uses, as the NDS tables name them. */
public enum Property {
    FB("Fb"), FV("Fv"), FC_PERP("Fc_perp"), E("E"), EMIN("Emin");

    private final String symbol;

    Property(String symbol) {
        this.symbol = symbol;
    }

    public String symbol() {
        return symbol;
    }
}
