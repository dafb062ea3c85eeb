package org.beamfolio.checks;

import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Polynomial;

/**
 * Deflection relative to the supports' movement: in a span, the deflection less the straight
 * line (chord) between its two supports' deflections; in an overhang, less the adjacent span's
 * chord extended to the free end (the rigid-body movement the springs give the beam); from a
 * single support, less that support's settlement. On rigid supports the chord is zero and the
 * relative deflection is the absolute one. The line is subtracted piece by piece, so the result
 * is again an exact polynomial field (common practice: span limits such as L/360 are meant for
 * the member's own bending, not for the settlement of what holds it up).
 */
final class SupportChord {
    private SupportChord() {}

    /** The field with the chord subtracted over the region's pieces (the rest left as it is). */
    static Field relative(Field deflection, AnalysisResult.Span region, List<Double> supportsAt) {
        double[] line = line(deflection, region, supportsAt);
        double x1 = line[0];
        double y1 = line[1];
        double slope = line[2];
        double[] starts = new double[deflection.size()];
        double[] ends = new double[deflection.size()];
        Polynomial[] pieces = new Polynomial[deflection.size()];
        for (int i = 0; i < pieces.length; i++) {
            starts[i] = deflection.start(i);
            ends[i] = deflection.end(i);
            Polynomial p = deflection.piece(i);
            if (deflection.pieceWithin(i, region.from(), region.to())) {
                // chord(x) = y1 + slope (x - x1), with x = start + s in the piece's local coordinate
                p = p.plus(Polynomial.of(-(y1 + slope * (starts[i] - x1)), -slope));
            }
            pieces[i] = p;
        }
        return new Field(starts, ends, pieces);
    }

    /** {x1, y1, slope} of the line the region's deflection is measured from. */
    private static double[] line(Field d, AnalysisResult.Span region, List<Double> at) {
        double x1;
        double x2;
        int n = at.size();
        if (n == 1) {
            return new double[] {at.get(0), d.at(at.get(0)), 0};
        } else if (region.to() <= at.get(0)) {
            x1 = at.get(0);
            x2 = at.get(1);
        } else if (region.from() >= at.get(n - 1)) {
            x1 = at.get(n - 2);
            x2 = at.get(n - 1);
        } else {
            x1 = region.from();
            x2 = region.to();
        }
        double y1 = d.at(x1);
        return new double[] {x1, y1, (d.at(x2) - y1) / (x2 - x1)};
    }
}
