package org.beamfolio.job;

import java.util.List;
import org.beamfolio.model.Job;
import org.beamfolio.model.ProjectJob;

/**
 * What reading a job file gave: when there were no errors, a single-beam job or a job with
 * members (the other one null); and every diagnostic found.
 */
public record JobReading(String file, String source, Job job, ProjectJob project, List<Diagnostic> diagnostics) {
    public JobReading {
        diagnostics = List.copyOf(diagnostics);
    }

    public JobReading(String file, String source, Job job, List<Diagnostic> diagnostics) {
        this(file, source, job, null, diagnostics);
    }

    public boolean ok() {
        return (job != null || project != null) && diagnostics.isEmpty();
    }

    /** Whether the file is a job with members. */
    public boolean hasMembers() {
        return project != null;
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
