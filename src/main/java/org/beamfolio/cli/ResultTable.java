package org.beamfolio.cli;

import java.util.List;

/** A plain-text table with columns padded to their widest cell. */
final class ResultTable {
    private ResultTable() {}

    static String of(List<String> header, List<String[]> rows) {
        int[] width = new int[header.size()];
        for (int c = 0; c < width.length; c++) {
            width[c] = header.get(c).length();
            for (String[] row : rows) {
                width[c] = Math.max(width[c], row[c].length());
            }
        }
        StringBuilder out = new StringBuilder();
        line(out, header.toArray(new String[0]), width);
        for (String[] row : rows) {
            line(out, row, width);
        }
        return out.toString();
    }

    private static void line(StringBuilder out, String[] cells, int[] width) {
        for (int c = 0; c < cells.length; c++) {
            out.append(c == 0 ? "" : "  ").append(String.format("%-" + width[c] + "s", cells[c]));
        }
        out.append('\n');
    }
}
