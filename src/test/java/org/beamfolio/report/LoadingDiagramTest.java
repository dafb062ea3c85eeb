package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.job.JobReader;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.report.drawing.Drawing;
import org.beamfolio.report.drawing.LoadingDiagram;
import org.beamfolio.units.ReportUnits;
import org.junit.jupiter.api.Test;

/**
 * The loading diagrams on their own geometry: no label box overlaps another or a load band, no
 * point-load arrow runs through a band, and the bands are to one scale of intensity.
 */
class LoadingDiagramTest {
    /** The size the package draws them at: the text column by 40 mm, in points. */
    private static final double WIDTH = 480;
    private static final double HEIGHT = 40 / 25.4 * 72;

    private static List<LoadingDiagram> diagrams(AnalysisResult r) {
        Map<String, Drawing> drawings = new LinkedHashMap<>();
        new LoadingPart(r, new Texts(ReportUnits.of(r.job().report().units()), ReportSettings.Positions.DECIMAL), drawings).build();
        List<LoadingDiagram> out = new ArrayList<>();
        drawings.values().forEach(d -> out.add((LoadingDiagram) d));
        return out;
    }

    private static FontMetrics metrics() {
        Graphics2D g = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics();
        g.setFont(new java.awt.Font(java.awt.Font.SANS_SERIF, java.awt.Font.PLAIN, 7));
        return g.getFontMetrics();
    }

    private static void assertClear(LoadingDiagram.Layout layout, String what) {
        List<LoadingDiagram.Label> labels = layout.labels();
        for (int i = 0; i < labels.size(); i++) {
            for (int j = i + 1; j < labels.size(); j++) {
                assertFalse(labels.get(i).box().intersects(labels.get(j).box()),
                        what + ": labels \"" + labels.get(i).text() + "\" and \"" + labels.get(j).text() + "\" overlap");
            }
            for (LoadingDiagram.Band b : layout.bands()) {
                assertFalse(b.outline().intersects(labels.get(i).box()), what + ": label \"" + labels.get(i).text() + "\" on a band");
            }
            assertTrue(labels.get(i).box().getMinY() >= 0, what + ": label inside the drawing");
        }
        for (LoadingDiagram.Arrow a : layout.arrows()) {
            for (LoadingDiagram.Label l : labels) {
                var shaft = new java.awt.geom.Rectangle2D.Double(a.x() - 0.5, Math.min(a.top(), a.tip()), 1, Math.abs(a.tip() - a.top()));
                assertFalse(shaft.intersects(l.box()), what + ": label \"" + l.text() + "\" crossed by a point-load arrow");
            }
            for (LoadingDiagram.Band b : layout.bands()) {
                // the shaft, short of its tip, stays out of every band
                var shaft = new java.awt.geom.Rectangle2D.Double(a.x() - 0.01, a.top(), 0.02, a.tip() - a.top() - 0.5);
                assertFalse(b.outline().contains(shaft.getCenterX(), shaft.getCenterY()) || b.outline().intersects(shaft),
                        what + ": a point-load arrow inside a band");
            }
        }
    }

    @Test
    void everyExampleDiagramHasClearLabels() throws Exception {
        int checked = 0;
        try (var files = Files.list(Path.of("example-jobs"))) {
            for (Path job : files.sorted().toList()) {
                for (AnalysisResult r : org.beamfolio.TestJobs.solveEvery(job)) {
                    for (LoadingDiagram d : diagrams(r)) {
                        assertClear(d.layout(WIDTH, HEIGHT, metrics()), job.toString());
                        checked++;
                    }
                }
            }
        }
        assertTrue(checked >= 8, "diagrams checked: " + checked);
    }

    @Test
    void crowdedLoadsStillGetClearLabels() {
        // invented: three line loads over one stretch, point loads inside them and side by side
        String loads = """
                  - { case: D, type: uniform, w: 2 kN/m }
                  - { case: D, type: linear, w: [0 kN/m, 8 kN/m], from: 0 m, to: 3 m }
                  - { case: D, type: linear, w: [8 kN/m, 0 kN/m], from: 3 m, to: 6 m }
                  - { case: D, type: point, P: 10 kN, at: 2.9 m }
                  - { case: D, type: point, P: 12 kN, at: 3 m }
                  - { case: D, type: point, P: 14 kN, at: 3.1 m }
                  - { case: D, type: moment, M: 5 kN*m, at: 3 m, sense: cw }
                """;
        AnalysisResult r = org.beamfolio.TestJobs.solve(org.beamfolio.TestJobs.text("6 m",
                "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n", loads));
        assertClear(diagrams(r).get(0).layout(WIDTH, HEIGHT, metrics()), "crowded");
    }

    @Test
    void bandsAreToOneScale() throws Exception {
        // the lintel's masonry triangle peaks at 6.2 kN/m over a self weight of 1.613 kN/m (both in the job file):
        // the triangle's height over the self weight's thickness is their ratio
        AnalysisResult r = Analysis.run(JobReader.read(Path.of("example-jobs/school-lintel-given-properties.yaml")).job());
        LoadingDiagram.Layout layout = diagrams(r).get(0).layout(WIDTH, HEIGHT, metrics());
        List<Double> thickest = new ArrayList<>();
        for (LoadingDiagram.Band b : layout.bands()) {
            double t = 0;
            for (int k = 0; k < b.xs().length; k++) {
                t = Math.max(t, b.bottoms()[k] - b.tops()[k]);
            }
            thickest.add(t);
        }
        assertEquals(3, thickest.size());
        double selfWeight = 25 * 0.0645; // 25 kN/m^3 x 64,500 mm^2, the job's density and A
        assertEquals(6.2 / selfWeight, thickest.get(0) / thickest.get(2), 1e-9, "triangle to self weight");
        assertEquals(thickest.get(0), thickest.get(1), 1e-9, "the two halves of the triangle");
    }
}
