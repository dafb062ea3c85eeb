package org.beamfolio.catalogue;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/**
 * One row of the shape catalogue: its designations, family and tabulated properties. The table's
 * text is kept as printed (for the row the package shows) and converted to SI once on request.
 */
public final class Shape {
    private final String designation;
    private final String ediName;
    private final String metricDesignation;
    private final ShapeFamily family;
    private final Map<ShapeProperty, String> tabulated;

    Shape(String designation, String ediName, String metricDesignation, ShapeFamily family,
          Map<ShapeProperty, String> tabulated) {
        this.designation = designation;
        this.ediName = ediName;
        this.metricDesignation = metricDesignation;
        this.family = family;
        this.tabulated = Collections.unmodifiableMap(new EnumMap<>(tabulated));
    }

    /** The AISC Manual label, e.g. {@code W18X50}, {@code HSS10X6X3/16}. */
    public String designation() {
        return designation;
    }

    /** The EDI standard nomenclature (HSS thickness in decimals, e.g. {@code HSS10X6X.188}). */
    public String ediName() {
        return ediName;
    }

    /** The metric designation of the same shape, e.g. {@code W460X74}. */
    public String metricDesignation() {
        return metricDesignation;
    }

    public ShapeFamily family() {
        return family;
    }

    public boolean has(ShapeProperty p) {
        return tabulated.containsKey(p);
    }

    /** The property in SI (m, m^2, ... , N/m for weight); a property the row does not tabulate is a programming error. */
    public double get(ShapeProperty p) {
        String text = tabulated.get(p);
        if (text == null) {
            throw new IllegalStateException(designation + " tabulates no " + p.column());
        }
        return p.toSi(Double.parseDouble(text));
    }

    /** The value exactly as the catalogue prints it, in its US units. */
    public String tabulated(ShapeProperty p) {
        String text = tabulated.get(p);
        if (text == null) {
            throw new IllegalStateException(designation + " tabulates no " + p.column());
        }
        return text;
    }

    /** Every tabulated value of the row, in the catalogue's column order (for printing the row used). */
    public Map<ShapeProperty, String> row() {
        return tabulated;
    }

    @Override
    public String toString() {
        return designation;
    }
}
