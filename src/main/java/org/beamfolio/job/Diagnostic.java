package org.beamfolio.job;

import org.beamfolio.model.Location;

/**
 * One thing wrong with a job file, with where it is. Rendered as
 * {@code job.yaml:12:7: beam.length: must be positive, got -20 ft} and the offending line with a
 * caret under the column.
 */
public record Diagnostic(String file, Location location, String keyPath, String message) {
    public String headline() {
        String path = keyPath == null || keyPath.isEmpty() ? "(file)" : keyPath;
        return file + ":" + location.line() + ":" + location.column() + ": " + path + ": " + message;
    }

    /** The headline, then the source line and a caret, when the source is at hand. */
    public String render(String source) {
        StringBuilder out = new StringBuilder(headline());
        if (source != null) {
            String[] lines = source.split("\r?\n", -1);
            int index = location.line() - 1;
            if (index >= 0 && index < lines.length) {
                String line = lines[index].replace('\t', ' ');
                out.append('\n').append("    ").append(line).append('\n').append("    ");
                int col = Math.max(1, Math.min(location.column(), line.length() + 1));
                out.append(" ".repeat(col - 1)).append('^');
            }
        }
        return out.toString();
    }
}
