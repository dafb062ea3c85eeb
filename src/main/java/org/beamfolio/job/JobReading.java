package org.beamfolio.job;

import java.util.List;
import org.beamfolio.model.Job;

/** What reading a job file gave: a job when there were no errors, and every diagnostic found. */
public record JobReading(String file, String source, Job job, List<Diagnostic> diagnostics) {
    public JobReading {
        diagnostics = List.copyOf(diagnostics);
    }

    public boolean ok() {
        return job != null && diagnostics.isEmpty();
    }

    /** Every diagnostic with its source line and caret, one after another. */
    public String report() {
        StringBuilder out = new StringBuilder();
        for (Diagnostic d : diagnostics) {
            out.append(d.render(source)).append('\n');
        }
        return out.toString();
    }
}
