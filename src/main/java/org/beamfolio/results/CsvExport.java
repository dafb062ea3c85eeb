package org.beamfolio.results;

import java.util.ArrayList;
import java.util.List;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Response;
import org.beamfolio.analysis.Stresses;
import org.beamfolio.units.ReportUnits;

/**
 * Diagram ordinates as CSV, for a spreadsheet or another program: for every combination and for
 * the envelope (largest and smallest over the combinations), at each element's ends and evenly
 * between them, x, shear, moment, slope, deflection and the top and bottom fibre stresses, in
 * the report's units, full precision. The header row names the units.
 */
public final class CsvExport {
    private static final int POINTS_PER_ELEMENT = 8;

    private CsvExport() {}

    public static String write(AnalysisResult result) {
        ReportUnits u = ReportUnits.of(result.job().report().units());
        Stresses stresses = new Stresses(result.model());
        StringBuilder out = new StringBuilder();
        out.append("combination,x (").append(u.length().symbol()).append("),V (").append(u.force().symbol()).append("),M (")
                .append(u.moment().symbol()).append("),slope (rad),deflection (").append(u.deflection().symbol())
                .append("; down +),stress_top (").append(u.stress().symbol()).append("; tension +),stress_bottom (")
                .append(u.stress().symbol()).append("; tension +)\n");
        List<double[][]> all = new ArrayList<>();
        for (CombinationResult c : result.combinations()) {
            double[][] rows = rows(c.response(), stresses, u);
            all.add(rows);
            for (double[] row : rows) {
                line(out, c.name(), row);
            }
        }
        if (!all.isEmpty()) {
            int n = all.get(0).length;
            for (int sign : new int[] {1, -1}) {
                for (int i = 0; i < n; i++) {
                    double[] row = all.get(0)[i].clone();
                    for (double[][] other : all) {
                        for (int k = 1; k < row.length; k++) {
                            row[k] = sign > 0 ? Math.max(row[k], other[i][k]) : Math.min(row[k], other[i][k]);
                        }
                    }
                    line(out, sign > 0 ? "envelope: largest" : "envelope: smallest", row);
                }
            }
        }
        return out.toString();
    }

    private static double[][] rows(Response r, Stresses s, ReportUnits u) {
        Field[] fields = {r.shear(), r.moment(), r.slope(), r.deflection(), s.top(r), s.bottom(r)};
        org.beamfolio.units.Unit[] units = {u.force(), u.moment(), null, u.deflection(), u.stress(), u.stress()};
        List<double[]> rows = new ArrayList<>();
        Field v = r.shear();
        for (int e = 0; e < v.size(); e++) {
            double length = v.end(e) - v.start(e);
            for (int k = 0; k <= POINTS_PER_ELEMENT; k++) {
                double sLocal = length * k / POINTS_PER_ELEMENT;
                double[] row = new double[7];
                row[0] = u.length().fromSi(v.start(e) + sLocal);
                for (int f = 0; f < fields.length; f++) {
                    double value = fields[f].piece(e).at(sLocal);
                    row[f + 1] = units[f] == null ? value : units[f].fromSi(value);
                }
                rows.add(row);
            }
        }
        return rows.toArray(new double[0][]);
    }

    private static void line(StringBuilder out, String name, double[] row) {
        out.append(quote(name));
        for (double v : row) {
            out.append(',').append(v + 0.0);
        }
        out.append('\n');
    }

    static String quote(String text) {
        if (text.contains(",") || text.contains("\"") || text.contains("\n")) {
            return "\"" + text.replace("\"", "\"\"") + "\"";
        }
        return text;
    }
}
