package org.beamfolio.job;

import org.beamfolio.model.ReactionLoad;
import org.beamfolio.units.Dimension;

/**
 * Reads a {@code type: reaction} load of a job with members: which member's reaction, at which of
 * its supports, and either the point it bears at or the spacing and range of repeated members
 * smeared into a line load. Its cases are the supporting member's, so it takes no {@code case}.
 */
final class ReactionLoadReader {
    private ReactionLoadReader() {}

    static ReactionLoad read(ReadContext c, ReadContext.Fields f, Double length, Defined<LoadReader.Supporting> members) {
        if (f.has("case")) {
            c.error(f.node().entries().get("case").keyLocation(), f.path("case"), "a reaction load brings every load case of"
                    + " the member it comes from, each kept apart: leave case out");
        }
        String member = BeamReader.reference(c, f, "member", members, "members", true);
        Integer support = support(c, f, member == null ? null : members.get(member));
        YamlNode noteNode = f.optional("note");
        String note = noteNode == null ? "" : c.text(noteNode, f.path("note"));
        boolean point = f.has("at");
        boolean smeared = f.has("spacing");
        Double at = null;
        Double spacing = null;
        Double[] range = null;
        if (point && smeared) {
            c.error(f.node(), f.path("spacing"), "give either at (one reaction as a point load) or spacing with from and to"
                    + " (repeated members smeared as a line load), not both");
        } else if (!point && !smeared) {
            c.error(f.node(), f.path("at"), "missing: a reaction load needs at (one reaction as a point load) or spacing"
                    + " with from and to (repeated members smeared as a line load)");
        } else if (point) {
            at = LoadReader.at(c, f, length);
            for (String key : new String[] {"from", "to"}) {
                if (f.has(key)) {
                    c.error(f.node().entries().get(key).keyLocation(), f.path(key), "a reaction at one point takes no range:"
                            + " leave " + key + " out, or give spacing to smear repeated members over from..to");
                }
            }
        } else {
            YamlNode spacingNode = f.optional("spacing");
            spacing = c.positive(spacingNode, f.path("spacing"), Dimension.LENGTH);
            if (!f.has("from") || !f.has("to")) {
                c.error(spacingNode, f.path("spacing"), "a spacing smears repeated members over a range: give both from and"
                        + " to (where the first and the last of them bear)");
            } else {
                range = LoadReader.range(c, f, length, true);
            }
        }
        f.rejectUnknown(LoadReader.LOAD_KEYS, "member", "support", "at", "spacing", "from", "to", "note", "case");
        if (member == null || support == null || note == null || (point ? at == null : spacing == null || range == null)
                || f.has("case") || point == smeared) {
            return null;
        }
        return point ? new ReactionLoad(member, support, at, null, null, null, note, f.node().location(), 0)
                : new ReactionLoad(member, support, null, spacing, range[0], range[1], note, f.node().location(), 0);
    }

    /** The support's number, counted from 1, within the supporting member's supports. */
    private static Integer support(ReadContext c, ReadContext.Fields f, LoadReader.Supporting member) {
        YamlNode node = f.required("support");
        if (node == null) {
            return null;
        }
        if (!(node instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.INTEGER)) {
            c.error(node, f.path("support"), "expected the support's number, counted from 1 in the member's supports list;"
                    + " got " + node.describe());
            return null;
        }
        int number;
        try {
            number = Integer.parseInt(s.text().strip());
        } catch (NumberFormatException e) {
            number = -1;
        }
        if (number < 1 || (member != null && number > member.supports())) {
            c.error(node, f.path("support"), member == null ? "supports are counted from 1"
                    : "member " + member.id() + " has " + member.supports() + " support" + (member.supports() == 1 ? "" : "s")
                            + ": give a number from 1 to " + member.supports());
            return null;
        }
        return number;
    }
}
