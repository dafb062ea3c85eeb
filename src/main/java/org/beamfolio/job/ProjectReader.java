package org.beamfolio.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.beamfolio.model.Project;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.units.UnitSystem;

/** Reads the project block and the report settings. */
final class ProjectReader {
    /** The keys of one entry of project.history: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> HISTORY_KEYS = Set.of("rev", "date", "by", "note");

    /** The keys of the project block: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> PROJECT_KEYS = Set.of("title", "number", "client", "location", "subject", "prepared_by", "checked_by", "date", "revision", "notes", "history");

    /** The keys of the report block: the reader rejects any other, and the JSON Schema is tested against them. */
    static final Set<String> REPORT_KEYS = Set.of("units", "paper", "positions");

    private ProjectReader() {}

    static Project read(ReadContext context, YamlNode node) {
        if (node == null) {
            return null;
        }
        ReadContext.Fields f = context.fields(node, "project");
        if (f == null) {
            return null;
        }
        String title = text(context, f, "title", true);
        String number = text(context, f, "number", false);
        String client = text(context, f, "client", false);
        String location = text(context, f, "location", false);
        String subject = text(context, f, "subject", false);
        String preparedBy = text(context, f, "prepared_by", false);
        String checkedBy = text(context, f, "checked_by", false);
        String date = text(context, f, "date", false);
        String revision = text(context, f, "revision", false);
        String notes = text(context, f, "notes", false);
        List<Project.Revision> history = new ArrayList<>();
        List<YamlNode> items = JobReader.listOrEmpty(context, f.optional("history"), f.path("history"));
        if (items != null) {
            for (int i = 0; i < items.size(); i++) {
                ReadContext.Fields h = context.fields(items.get(i), f.path("history") + "[" + i + "]");
                if (h != null) {
                    history.add(new Project.Revision(text(context, h, "rev", true), text(context, h, "date", false),
                            text(context, h, "by", false), text(context, h, "note", false)));
                    h.rejectUnknown(HISTORY_KEYS);
                }
            }
        }
        if (date != null && !date.isEmpty() && !date.matches("\\d{4}-\\d{2}-\\d{2}")) {
            context.error(f.optional("date"), f.path("date"), "expected a date as YYYY-MM-DD, got \"" + date + "\"");
        }
        f.rejectUnknown(PROJECT_KEYS);
        if (title == null) {
            return null;
        }
        return new Project(title, number, client, location, subject, preparedBy, checkedBy, date, revision, history, notes);
    }

    private static String text(ReadContext context, ReadContext.Fields f, String key, boolean required) {
        YamlNode node = required ? f.required(key) : f.optional(key);
        if (node == null) {
            return required ? null : "";
        }
        String value = context.text(node, f.path(key));
        return value == null ? "" : value;
    }

    /** The report settings; {@code units} when the job does not give report.units. */
    static ReportSettings report(ReadContext context, YamlNode node, UnitSystem unitsByDefault) {
        UnitSystem units = unitsByDefault;
        ReportSettings.Paper paper = ReportSettings.Paper.LETTER;
        if (node == null) {
            return new ReportSettings(units, paper);
        }
        ReadContext.Fields f = context.fields(node, "report");
        if (f == null) {
            return new ReportSettings(units, paper);
        }
        YamlNode u = f.optional("units");
        if (u != null) {
            String value = context.choice(u, f.path("units"), List.of("US", "SI"));
            if (value != null) {
                units = UnitSystem.valueOf(value);
            }
        }
        YamlNode p = f.optional("paper");
        if (p != null) {
            String value = context.choice(p, f.path("paper"), List.of("letter", "a4"));
            if (value != null) {
                paper = value.equals("a4") ? ReportSettings.Paper.A4 : ReportSettings.Paper.LETTER;
            }
        }
        ReportSettings.Positions positions = ReportSettings.Positions.DECIMAL;
        YamlNode at = f.optional("positions");
        if (at != null) {
            String value = context.choice(at, f.path("positions"), List.of("decimal", "ft-in"));
            if ("ft-in".equals(value)) {
                if (units == UnitSystem.US) {
                    positions = ReportSettings.Positions.FEET_INCHES;
                } else {
                    context.error(at, f.path("positions"), "feet and inches need US units (report.units: US); SI positions print in m");
                }
            }
        }
        f.rejectUnknown(REPORT_KEYS);
        return new ReportSettings(units, paper, positions);
    }
}
