package org.beamfolio.model;

/**
 * What a package and the seal stage agree on: the name of the empty signature field the package
 * places over the cover's seal box, which {@code seal} fills.
 */
public final class PackageSeal {
    public static final String FIELD = "EngineerSeal";

    private PackageSeal() {}
}
