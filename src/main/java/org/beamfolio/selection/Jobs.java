package org.beamfolio.selection;

import org.beamfolio.model.Job;
import org.beamfolio.model.Section;

/** A job (or one member of a job with members) with one section replaced, everything else as read. */
final class Jobs {
    private Jobs() {}

    static Job withSection(Job job, Section section) {
        return new Job(job.name(), job.sourceText(), job.sha256(), job.project(), job.report(), job.materials(),
                Selection.sections(job, section), job.beam(), job.loads(), job.cases(), job.combinationSet(),
                job.combinations(), job.pattern(), job.stressCheck(), job.deflectionLimits(), job.sourceBytes(),
                job.takeOff(), job.steelDesign(), job.timber(), job.member(), job.reactionLoads());
    }
}
