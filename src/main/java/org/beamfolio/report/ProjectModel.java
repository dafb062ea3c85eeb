package org.beamfolio.report;

import java.util.List;

/**
 * What a package of several members prints around their parts, read by project.ftlx as {@code r}
 * with the same names the single-member parts use (sheet, basis, cautions, reviewChecklist,
 * history, appendix), so the shared template parts serve both.
 *
 * @param members each member's own report model and the prefix of its anchors and figures
 * @param schedule one row per member: section, spans, governing check and ratio, result, sheet
 * @param loadPath each reaction one member carries from another, case by case
 * @param failing one line per member with a check that does not meet its limit
 * @param appendices the job file, or each job file of a package gathered from several
 */
public record ProjectModel(ReportModel.Sheet sheet, String scope, List<ReportModel.Row> contents, ReportModel.Basis basis,
                           List<Member> members, ReportModel.Table schedule, List<String> scheduleAnchors,
                           ReportModel.Table loadPath, String loadPathRule, List<String> failing, List<String> cautions,
                           List<String> reviewChecklist, List<List<String>> history, List<ReportModel.Appendix> appendices) {

    /** One member's part: its id, what its title block says, the prefix of its anchors, and its model. */
    public record Member(String id, String title, String ns, ReportModel model) {}
}
