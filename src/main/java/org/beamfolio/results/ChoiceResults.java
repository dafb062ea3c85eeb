package org.beamfolio.results;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionChoice;
import org.beamfolio.units.ReportUnits;

/**
 * The choice of a section the tool chose, inside its {@code sections.<id>} entry: the chosen
 * {@code designation} (or {@code lumber} and {@code plies}), whether it passes every check, and
 * {@code candidates}, every candidate tried in order with its weight per length, governing check
 * and ratio (the checks' own values), whether it passes, and which is chosen.
 */
final class ChoiceResults {
    private ChoiceResults() {}

    static void write(JsonGenerator g, Section section, ReportUnits u) throws IOException {
        SectionChoice choice = section.choice();
        if (choice == null || choice.tried().isEmpty()) {
            return;
        }
        name(g, section, u);
        g.writeBooleanField("chosen_passes", choice.passing());
        g.writeStringField("choice_basis", choice.basis());
        SectionChoice.Trial chosen = choice.chosen();
        g.writeArrayFieldStart("candidates");
        for (SectionChoice.Trial t : choice.tried()) {
            g.writeStartObject();
            name(g, t.section(), u);
            number(g, "weight", Double.isNaN(t.weight()) ? Double.NaN : u.distributed().fromSi(t.weight()));
            number(g, "A", u.area().fromSi(t.area()));
            g.writeStringField("check", t.governing());
            number(g, "ratio", t.ratio());
            g.writeBooleanField("pass", t.pass());
            g.writeBooleanField("chosen", t == chosen);
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private static void name(JsonGenerator g, Section s, ReportUnits u) throws IOException {
        if (s.lumber() == null && s.shape() instanceof org.beamfolio.model.SectionShape.Rectangle r) {
            // a glulam size: its width and depth in the section units
            g.writeNumberField("b", u.sectionLength().fromSi(r.b()));
            g.writeNumberField("d", u.sectionLength().fromSi(r.h()));
        } else if (s.lumber() != null) {
            g.writeStringField("lumber", s.lumber().nominalThickness() + "x" + s.lumber().nominalDepth());
            g.writeNumberField("plies", s.lumber().plies());
        } else {
            g.writeStringField("designation", s.designation());
        }
    }

    /** A number, or null where there is none (no density for the weight, a candidate that could not be checked). */
    private static void number(JsonGenerator g, String key, double value) throws IOException {
        if (Double.isNaN(value)) {
            g.writeNullField(key);
        } else {
            g.writeNumberField(key, value);
        }
    }
}
