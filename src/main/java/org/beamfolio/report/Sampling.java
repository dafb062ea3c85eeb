package org.beamfolio.report;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.Field;
import org.beamfolio.report.drawing.Chart;
import org.beamfolio.units.Unit;

/**
 * Points of a field for plotting: each element's ends and evenly spaced interior points, each
 * value evaluated exactly from the element's polynomial. Both sides of every node are kept, so
 * jumps in shear show as vertical steps.
 */
final class Sampling {
    private static final int POINTS = 1200;

    private Sampling() {}

    static Chart.Series series(String name, Field f, Unit xUnit, Unit yUnit) {
        int per = Math.max(1, Math.min(24, POINTS / Math.max(1, f.size())));
        List<double[]> points = new ArrayList<>();
        for (int i = 0; i < f.size(); i++) {
            double length = f.end(i) - f.start(i);
            for (int k = 0; k <= per; k++) {
                double s = length * k / per;
                points.add(new double[] {xUnit.fromSi(f.start(i) + s), yUnit.fromSi(f.piece(i).at(s))});
            }
        }
        double[] x = new double[points.size()];
        double[] y = new double[points.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = points.get(i)[0];
            y[i] = points.get(i)[1] + 0.0;
        }
        return new Chart.Series(name, x, y);
    }

    /** The pointwise largest (sign 1) or smallest (-1) of several fields at the plotted points. */
    static Chart.Series envelope(String name, List<Field> fields, int sign, Unit xUnit, Unit yUnit) {
        Chart.Series first = series(name, fields.get(0), xUnit, yUnit);
        double[] y = first.y().clone();
        for (int j = 1; j < fields.size(); j++) {
            double[] other = series(name, fields.get(j), xUnit, yUnit).y();
            for (int i = 0; i < y.length; i++) {
                y[i] = sign > 0 ? Math.max(y[i], other[i]) : Math.min(y[i], other[i]);
            }
        }
        return new Chart.Series(name, first.x(), y);
    }
}
