package org.beamfolio.report;

import java.util.List;

/**
 * What the package prints, as text ready for the page: every number already rounded for display
 * (by {@link Numbers}) and labelled with its unit; figures by the id of their drawing. Built by
 * {@link ReportModelBuilder}; read by the templates in report-templates/ as {@code r}.
 */
public record ReportModel(Sheet sheet, Cover cover, Revision revision, Basis basis, Loading loading, List<CombinationSheet> analyses,
                          Envelope envelope, Reactions reactions, Stresses stresses, Checks checks, List<String> cautions,
                          List<String> reviewChecklist, List<List<String>> history, Appendix appendix, AreaLoads areaLoads,
                          SteelSheet steel, Timber timber, Selection selection) {

    /** The title block on every sheet. */
    public record Sheet(String title, String number, String subject, String revision, String preparedBy, String date,
                        String checkedBy, String client, String location, String paper, String toolVersion, String jobFile) {}

    public record Cover(String scope, List<Row> contents) {}

    /** A label and its value (or a contents entry: title and anchor). */
    public record Row(String label, String value) {}

    /**
     * A table of display text. {@code failing} flags each row whose check does not meet its limit,
     * and {@code resultColumn} is the column that states it (-1 when the table states none).
     */
    public record Table(List<String> header, List<List<String>> rows, List<Boolean> failing, int resultColumn) {
        public Table {
            header = List.copyOf(header);
            rows = List.copyOf(rows);
            failing = List.copyOf(failing);
        }

        public Table(List<String> header, List<List<String>> rows) {
            this(header, rows, java.util.Collections.nCopies(rows.size(), false), -1);
        }
    }

    public record Figure(String id, String caption, String height) {}

    /** One step of working: what it is, the formula, the numbers put in, the result, the source. */
    public record Equation(String statement, String symbolic, String substituted, String result, String source) {}

    public record Basis(List<String> codes, List<Row> units, List<String> conventions, String conventionSketch,
                        List<String> method, List<String> limitations, String notes, Table materials, Table sections) {}

    public record Loading(List<Row> beam, Table supports, List<Figure> diagrams, Table loads, String combinationSource,
                          Table combinations, List<String> dropped, List<String> patternNote) {}

    /** The take-off of the area loads and the live load reduction worked beneath it; null without area loads. */
    public record AreaLoads(Table takeOff, List<Equation> reduction) {}

    public record CombinationSheet(String anchor, String name, String governs, Table reactions, List<Equation> equilibrium,
                                   List<Figure> figures, Table keyPoints, String method, List<NumberedStep> steps,
                                   List<TitledTable> workTables) {}

    public record TitledTable(String title, Table table) {}

    /** A derivation step as printed: its number, what it finds, the working and the steps it draws on. */
    public record NumberedStep(String number, String statement, String symbolic, String substituted, String result,
                               String source, String uses) {}

    /**
     * Reactions for the supporting structure: unfactored per load case (moments only where a support
     * restrains rotation, else null), their extremes over every combination and arrangement, and uplift.
     */
    public record Reactions(Table byCase, Table momentsByCase, Table extremes, int combinations, List<String> uplift) {}

    public record Envelope(Table extremes, List<Figure> figures, int arrangements, Table equilibrium) {}

    public record SectionSheet(String id, List<Row> properties, Table parts) {}

    public record Stresses(List<SectionSheet> sections, List<Equation> equations) {}

    /** @param failing one line per check that does not meet its limit (id, what, ratio, demand and limit); empty when all pass */
    public record Checks(Table table, String governing, boolean allPass, boolean any, List<String> failing) {}

    /** What changed since the previous revision; null without {@code --previous}. */
    public record Revision(String revisions, Table inputs, Table results, Table checks) {}

    /**
     * The steel design sheet (null without {@code design.steel}): the member, the catalogue row used,
     * compactness, the unbraced segments, and the governing flexure, shear and web bearing worked out.
     */
    public record SteelSheet(String title, List<Row> member, Table catalogueRow, Table compactness, Table segments,
                             String flexureNote, List<Equation> flexure, List<Equation> shear, List<Equation> bearing) {}

    /**
     * The timber design sheet (null without {@code design.timber}): basis, reference values and
     * source, the governing bending check's factors and Fb' worked, and every combination's checks.
     */
    public record Timber(List<String> basis, Table reference, String source, Table factors, List<Equation> fbPrime,
                         Table bending, Table shear, Table bearing, Table longTerm, String shearNote, String creep) {}

    /**
     * The selection sheet of a section the tool chose (null when every section is named): the
     * candidates and the order they were tried in, each tried with its governing check, the outcome.
     */
    public record Selection(String title, String basis, String method, Table tried, String outcome, String notTried,
                            boolean passing) {}

    public record Appendix(List<Row> lines, String digest, String toolVersion, String attachment) {}
}
