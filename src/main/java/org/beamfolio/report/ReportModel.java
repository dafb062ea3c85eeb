package org.beamfolio.report;

import java.util.List;

/**
 * What the package prints, as text ready for the page: every number already rounded for display
 * (by {@link Numbers}) and labelled with its unit. Built from the analysis and checks by
 * {@link ReportModelBuilder}; read by the templates in report-templates/.
 */
public record ReportModel(Project project, String paper, String toolVersion, String digest, String jobFile,
                          List<Row> beam, List<List<String>> supports, List<List<String>> loads,
                          List<String> sectionHeader, List<List<String>> sections,
                          String combinationSource, List<String> droppedCombinations,
                          List<String> reactionHeader, List<List<String>> reactions,
                          List<List<String>> envelope, List<List<String>> checks, String governing,
                          List<String> method, List<String> cautions) {

    public record Project(String title, String number, String client, String location, String subject,
                          String preparedBy, String checkedBy, String date, String revision, String notes) {}

    /** A label and its value. */
    public record Row(String label, String value) {}
}
