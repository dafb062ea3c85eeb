package org.beamfolio.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.ReactionEnvelope;
import org.beamfolio.analysis.Response;
import org.beamfolio.model.Support;

/**
 * The reactions sheet, for whoever designs what holds the beam up: per support, the unfactored
 * reaction of each load case (and the support moment where the support restrains rotation), and
 * the largest and smallest reaction over every combination and pattern arrangement with the one
 * that gives it. A smallest reaction below zero is uplift, stated on the sheet and in the cautions.
 */
final class ReactionsPart {
    private final AnalysisResult result;
    private final Texts t;

    ReactionsPart(AnalysisResult result, Texts t) {
        this.result = result;
        this.t = t;
    }

    ReportModel.Reactions build() {
        List<Support> supports = result.job().beam().supports();
        List<String> header = new ArrayList<>(List.of("Reaction", "Support", "At"));
        header.addAll(result.cases().keySet());
        List<List<String>> forces = new ArrayList<>();
        List<List<String>> moments = new ArrayList<>();
        for (int i = 0; i < supports.size(); i++) {
            Support s = supports.get(i);
            List<String> row = new ArrayList<>(List.of("R" + (i + 1), s.kind().label(), t.len(s.at())));
            List<String> moment = new ArrayList<>(List.of("M" + (i + 1), s.kind().label(), t.len(s.at())));
            for (Map.Entry<String, Response> c : result.cases().entrySet()) {
                row.add(t.force(c.getValue().reactionForce()[i]));
                moment.add(t.moment(c.getValue().reactionMoment()[i]));
            }
            forces.add(row);
            if (s.kind().restrainsRotation()) {
                moments.add(moment);
            }
        }
        List<List<String>> extremes = new ArrayList<>();
        List<ReactionEnvelope.AtSupport> bounds = result.reactions().supports();
        for (int i = 0; i < bounds.size(); i++) {
            ReactionEnvelope.AtSupport b = bounds.get(i);
            extremes.add(List.of("R" + (i + 1), t.len(supports.get(i).at()), t.force(b.max().force()), b.max().combination(),
                    t.force(b.min().force()), b.min().combination(), b.uplift() ? "UPLIFT" : ""));
        }
        return new ReportModel.Reactions(new ReportModel.Table(header, forces),
                moments.isEmpty() ? null : new ReportModel.Table(header, moments),
                new ReportModel.Table(List.of("Reaction", "At", "Largest (up +)", "Under", "Smallest (up +)", "Under", "Note"), extremes),
                result.combinations().size(), uplift());
    }

    /** One sentence per support that is pulled up under some combination or arrangement. */
    List<String> uplift() {
        List<String> out = new ArrayList<>();
        List<Support> supports = result.job().beam().supports();
        List<ReactionEnvelope.AtSupport> bounds = result.reactions().supports();
        for (int i = 0; i < bounds.size(); i++) {
            ReactionEnvelope.AtSupport b = bounds.get(i);
            if (b.uplift()) {
                Support s = supports.get(i);
                out.add("Uplift at R" + (i + 1) + " (" + s.kind().label() + " at " + t.len(s.at()) + "): the reaction is "
                        + t.force(b.min().force()) + " under " + b.min().combination()
                        + ". The support and its connection must hold the beam down for this force.");
            }
        }
        return out;
    }
}
