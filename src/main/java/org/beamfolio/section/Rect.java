package org.beamfolio.section;

/** A rectangle of width b and height h whose bottom is y above the section's bottom. */
record Rect(double b, double h, double y) {
    double area() {
        return b * h;
    }

    double centroid() {
        return y + h / 2;
    }

    double top() {
        return y + h;
    }
}
