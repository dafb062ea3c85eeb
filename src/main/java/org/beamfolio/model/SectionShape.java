package org.beamfolio.model;

import java.util.List;

/** The cross-section shapes of format 1 and catalogue shapes; lengths in metres. */
public sealed interface SectionShape {
    record Rectangle(double b, double h) implements SectionShape {}

    record Circle(double d) implements SectionShape {}

    record Tube(double b, double h, double t) implements SectionShape {}

    record Pipe(double d, double t) implements SectionShape {}

    record IBeam(double d, double bf, double tf, double tw) implements SectionShape {}

    record Tee(double d, double bf, double tf, double tw) implements SectionShape {}

    record Channel(double d, double bf, double tf, double tw) implements SectionShape {}

    /** A built-up section of rectangular plates; y is the height of a plate's bottom. */
    record Plates(List<Plate> plates) implements SectionShape {
        public Plates {
            plates = List.copyOf(plates);
        }
    }

    record Plate(double b, double h, double y) {}

    /** A shape named from the catalogue: its tabulated properties are used, not computed. */
    record Catalogued(org.beamfolio.catalogue.Shape shape) implements SectionShape {}

    /** Properties given by the engineer; optional ones are null. */
    record Given(double I, double depth, double yBottom, Double A, Double Q, Double t) implements SectionShape {}
}
