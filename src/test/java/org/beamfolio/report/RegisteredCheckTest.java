package org.beamfolio.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.checks.Authority;
import org.beamfolio.checks.Check;
import org.beamfolio.checks.CheckKind;
import org.beamfolio.checks.CheckOutcome;
import org.beamfolio.checks.CheckRegistry;
import org.beamfolio.job.JobReader;
import org.beamfolio.job.JobReading;
import org.beamfolio.units.Measure;
import org.junit.jupiter.api.Test;

/**
 * A check written outside the tool's sources and added to the registry reaches the checks table
 * with its clause, and the results' failing flag, with no other change: the registry is the only
 * place a check is listed.
 */
class RegisteredCheckTest {
    /** An invented check of an invented standard, so that nothing else could print its clause. */
    static final class CamberCheck implements Check {
        static final Authority AUTHORITY = new Authority("Example Camber Standard 12-26", "2026", "4.5.6");

        @Override
        public String id() {
            return "camber";
        }

        @Override
        public Authority authority() {
            return AUTHORITY;
        }

        @Override
        public List<CheckOutcome> run(AnalysisResult result) {
            return List.of(new CheckOutcome("camber-1", "Camber against the example limit", 0.002, 0.001, 2, false, "D",
                    result.job().beam().length() / 2, Measure.DEFLECTION, CheckKind.DEFLECTION, AUTHORITY.citation(), "camber", null,
                    Map.of("k", 1.0)));
        }
    }

    @Test
    void aRegisteredCheckAppearsInTheChecksTableWithItsClause() throws Exception {
        JobReading reading = JobReader.read(Path.of("example-jobs/balcony-cantilever.yaml"));
        assertTrue(reading.ok(), reading.report());
        AnalysisResult result = org.beamfolio.analysis.Analysis.run(reading.job());
        CheckRegistry registry = CheckRegistry.standard().with(new CamberCheck());
        List<CheckOutcome> outcomes = registry.run(result);
        assertEquals("camber-1", outcomes.get(outcomes.size() - 1).id());
        try (PDDocument doc = Loader.loadPDF(new PackageRenderer().render(result, outcomes))) {
            String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("Example Camber Standard 12-26 4.5.6"), "the clause in the checks table");
            assertTrue(text.contains("DOES NOT MEET"), "its failure on the cover and the checks sheet");
            assertTrue(text.contains("(demand 2 mm against a limit of 1 mm)"), "its SI values in the report's units");
        }
    }
}
