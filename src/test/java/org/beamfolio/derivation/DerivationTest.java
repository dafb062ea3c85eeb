package org.beamfolio.derivation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.model.Load;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The derivation agrees with the solver and with itself: support moments and reactions of the
 * three-moment equation equal the stiffness solution to 1e-9, and every printed step, its
 * numbers read back and re-evaluated, gives its printed result.
 */
class DerivationTest {
    static final String LOADS = """
              - { case: D, type: uniform, w: 10 kN/m }
              - { case: D, type: point, P: 25 kN, at: 2.5 m }
              - { case: D, type: linear, w: [0 kN/m, 6 kN/m], from: 3.2 m, to: 5.6 m }
              - { case: D, type: moment, M: 8 kN*m, at: 1.3 m, sense: cw }
            """;

    static Stream<Arguments> continuous() {
        return Stream.of(
                Arguments.of("three equal spans (AISC Manual Table 3-23, three equal spans, uniform load)",
                        "    - { at: 0 m, type: pin }\n    - { at: 2 m, type: roller }\n    - { at: 4 m, type: roller }\n    - { at: 6 m, type: roller }\n"),
                Arguments.of("two spans, both ends fixed", "    - { at: 0 m, type: fixed }\n    - { at: 2.5 m, type: roller }\n    - { at: 6 m, type: fixed }\n"),
                Arguments.of("propped single span", "    - { at: 0 m, type: fixed }\n    - { at: 6 m, type: roller }\n"),
                Arguments.of("overhangs both ends", "    - { at: 0.8 m, type: pin }\n    - { at: 3 m, type: roller }\n    - { at: 5.2 m, type: roller }\n"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("continuous")
    void threeMomentSupportMomentsAndReactionsEqualTheSolver(String name, String supports) {
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", supports, LOADS));
        assertEquals(Derivations.Method.THREE_MOMENT, Derivations.methodFor(r));
        CombinationResult c = r.combinations().get(0);
        ThreeMomentDerivation d = new ThreeMomentDerivation(r, FactoredLoads.of(r, c), new Notation(r), new Steps());
        d.write();
        double scale = Math.abs(c.response().moment().min().value()) + Math.abs(c.response().moment().max().value());
        double forceScale = c.response().shear().max().value() - c.response().shear().min().value();
        var supportsList = r.job().beam().supports();
        for (int j = 0; j < supportsList.size(); j++) {
            double x = supportsList.get(j).at();
            double solver = x == r.job().beam().length() ? c.response().moment().leftOf(x) : c.response().moment().at(x);
            if (x == 0 || x == r.job().beam().length()) {
                // at a fixed end the internal moment is the support's: M(0+) = -M_R, M(L-) = +M_R
                solver = x == 0 ? -c.response().reactionMoment()[j] : c.response().reactionMoment()[j];
            }
            assertEquals(solver, d.solution().supportMoments()[j], 1e-9 * scale, "support moment " + (j + 1));
            assertEquals(c.response().reactionForce()[j], d.solution().reactions()[j], 1e-9 * forceScale, "reaction " + (j + 1));
        }
    }

    @Test
    void twoEqualSpansReproduceThePublishedSupportMoment() {
        // AISC Manual Table 3-23, two equal spans, uniform load: M over the middle support -wl^2/8 (l = 3 m, w = 10 kN/m)
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m",
                "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: roller }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n"));
        CombinationResult c = r.combinations().get(0);
        ThreeMomentDerivation d = new ThreeMomentDerivation(r, FactoredLoads.of(r, c), new Notation(r), new Steps());
        d.write();
        assertEquals(-10e3 * 9 / 8, d.solution().supportMoments()[1], 1e-9 * 10e3);
    }

    @Test
    void staticsReactionsEqualTheSolverAndTheCheckAgrees() {
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", "    - { at: 0.5 m, type: pin }\n    - { at: 4.5 m, type: roller }\n", LOADS));
        assertEquals(Derivations.Method.STATICS, Derivations.methodFor(r));
        Derivation d = Derivations.of(r, r.combinations().get(0));
        List<Step> reactions = d.steps().stream().filter(s -> !Double.isNaN(s.value()) && s.statement().contains("reaction")).toList();
        double rb = reactions.get(0).value();
        double ra = reactions.get(1).value();
        double check = reactions.get(2).value();
        // SI job: kN
        assertEquals(r.combinations().get(0).response().reactionForce()[1] / 1e3, rb, 1e-9 * Math.abs(rb));
        assertEquals(r.combinations().get(0).response().reactionForce()[0] / 1e3, ra, 1e-9 * Math.abs(ra));
        assertEquals(ra, check, 1e-9 * Math.abs(ra), "moments about B agree with vertical equilibrium");
    }

    @Test
    void simpleSpanDeflectionIsWorkedByItsClosedForm() {
        // 5 w L^4 / (384 EI), AISC Manual Table 3-23 case 1: w = 10 kN/m, L = 6 m, EI = 2e7 N*m^2 (TestJobs), by hand
        // 5 x 10,000 x 1,296 / (384 x 2e7) = 0.0084375 m = 8.4375 mm
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n"));
        List<Step> steps = Derivations.of(r, r.combinations().get(0)).steps();
        Step mid = steps.stream().filter(s -> s.statement().startsWith("Deflection at the middle of span 1")).findFirst().orElseThrow();
        assertEquals("δ = 5 w L⁴ / (384 E I)", mid.symbolic());
        assertEquals(8.4375, Arithmetic.evaluate(mid.substituted().substring(4)), 1e-3, mid.substituted());
        assertEquals(8.4375, mid.value(), 1e-9);
        readBack(steps);
    }

    @Test
    void pointLoadClosedFormAgreesWithTheElasticCurve() {
        // P b (3 L^2 - 4 b^2) / (48 EI), AISC Manual Table 3-23 case 8 at mid-span: P = 25 kN, b = 2 m, L = 6 m, by hand
        // 25,000 x 2 x (108 - 16) / (48 x 2e7) = 0.00479167 m = 4.79167 mm
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: point, P: 25 kN, at: 4 m }\n"));
        List<Step> steps = Derivations.of(r, r.combinations().get(0)).steps();
        Step mid = steps.stream().filter(s -> s.statement().startsWith("Deflection at the middle of span 1")).findFirst().orElseThrow();
        assertEquals(4.79167, mid.value(), 1e-4);
        readBack(steps);
    }

    @Test
    void stiffnessMethodWritesOutKAndFAndTheyHoldWithTheSolution() {
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m",
                "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: spring, k: 900 kN/m }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n"));
        assertEquals(Derivations.Method.STIFFNESS, Derivations.methodFor(r));
        Derivation d = Derivations.of(r, r.combinations().get(0));
        Derivation.Table k = d.tables().stream().filter(t -> t.title().startsWith("Stiffness equations K d = f")).findFirst().orElseThrow();
        // nodes at 0, 3, 6 m: free unknowns theta1, v2, theta2, theta3
        assertEquals(List.of("Unknown", "θ1", "v2", "θ2", "θ3", "d (m, rad)", "f (kN, kN·m)"), k.header());
        int size = k.rows().size();
        for (List<String> row : k.rows()) {
            double sum = 0;
            double scale = 0;
            for (int j = 0; j < size; j++) {
                double term = number(row.get(1 + j)) * number(k.rows().get(j).get(1 + size));
                sum += term;
                scale += Math.abs(term);
            }
            // four printed figures in each K and d: the row's sum agrees with f to that precision
            assertEquals(number(row.get(2 + size)), sum, 2e-3 * scale + 1e-9, "row " + row.get(0) + " of K d = f");
        }
        // the spring's row carries 12 EI / L^3 twice (two 3 m elements) plus k: 2 x 12 x 2e4 [kN·m²] / 27 [m³] + 900 = 18,677.8 kN/m, by hand
        assertEquals(18677.8, number(k.rows().get(1).get(2)), 0.5, "printed to five figures");
    }

    private static double number(String printed) {
        return Arithmetic.evaluate(printed);
    }

    static Stream<Arguments> everyKindOfBeam() {
        List<Arguments> out = new ArrayList<>();
        out.add(Arguments.of("statics", "    - { at: 0.5 m, type: pin }\n    - { at: 4.5 m, type: roller }\n"));
        out.add(Arguments.of("cantilever", "    - { at: 0 m, type: fixed }\n"));
        out.add(Arguments.of("three-moment", "    - { at: 0 m, type: fixed }\n    - { at: 2.5 m, type: roller }\n    - { at: 6 m, type: roller }\n"));
        out.add(Arguments.of("stiffness (spring)", "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: spring, k: 900 kN/m }\n    - { at: 6 m, type: roller }\n"));
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("everyKindOfBeam")
    void everyPrintedStepReEvaluatesToItsPrintedResult(String name, String supports) {
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", supports, LOADS));
        readBack(Derivations.of(r, r.combinations().get(0)).steps());
    }

    @Test
    void stressStepsReEvaluateInBothUnitSystems() throws Exception {
        // the tee of SectionCalculatorTest, worked by hand there; US: lb*ft to lb*in, SI: kN*m to N*mm
        for (String job : List.of("example-jobs/warehouse-mezzanine-simple-span.yaml", "example-jobs/parking-deck-precast-tee-pattern.yaml",
                "example-jobs/balcony-cantilever.yaml")) {
            AnalysisResult r = org.beamfolio.analysis.Analysis.run(org.beamfolio.job.JobReader.read(java.nio.file.Path.of(job)).job());
            List<Step> steps = StressSteps.of(r);
            assertTrue(steps.size() >= 3, job);
            readBack(steps);
        }
    }

    private static void readBack(List<Step> steps) {
        int checked = 0;
        for (Step s : steps) {
            if (s.substituted().isEmpty() || s.substituted().contains(";") || s.substituted().contains(", ")) {
                continue;
            }
            String rhs = s.substituted().substring(s.substituted().indexOf(" = ") + 3);
            if (rhs.contains(" at ")) {
                rhs = rhs.substring(0, rhs.indexOf(" at "));
            }
            double printed = Double.parseDouble(s.result().split(" ")[0].replace(",", ""));
            double evaluated = Arithmetic.evaluate(rhs);
            // the printed inputs are rounded to four figures; the printed result comes from full precision
            double tolerance = 5e-3 * Math.max(Math.abs(printed), largestNumber(rhs) * 1e-2) + 1e-9;
            assertEquals(printed, evaluated, tolerance, "step " + s.number() + ": " + s.statement() + "\n  " + s.substituted());
            assertEquals(s.value(), printed, 5e-4 * Math.abs(s.value()) + 1e-12, "the printed result rounds the kept value");
            checked++;
        }
        assertTrue(checked >= 3, "steps were checked: " + checked);
    }

    private static double largestNumber(String text) {
        double max = 0;
        for (String token : text.replaceAll("\\[[^\\]0-9]*\\]", "").replaceAll("(?<=\\d),(?=\\d{3})", "").split("[^0-9.e]+")) {
            if (!token.isEmpty() && !token.equals(".") && !token.equals("e")) {
                try {
                    max = Math.max(max, Math.abs(Double.parseDouble(token)));
                } catch (NumberFormatException ignored) {
                    // not a number: skipped
                }
            }
        }
        return max;
    }

    @Test
    void zeroShearIsLocatedByItsEquation() {
        // simple span 6 m, w = 10 kN/m: zero shear at the middle, x = 0 + 30 kN / (10 kN/m) = 3 m (statics)
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n",
                "  - { case: D, type: uniform, w: 10 kN/m }\n"));
        Derivation d = Derivations.of(r, r.combinations().get(0));
        Step zero = d.steps().stream().filter(s -> s.statement().startsWith("Point of zero shear")).findFirst().orElseThrow();
        assertEquals(3.0, zero.value(), 1e-12);
        assertTrue(zero.substituted().contains("30 [kN] / 10 [kN/m]"), zero.substituted());
        Derivation.Table area = d.tables().get(d.tables().size() - 1);
        assertTrue(area.title().contains("area method"));
        assertTrue(area.rows().size() >= 2, "the area-method table has a row per stretch");
    }

    @Test
    void theStiffnessMethodShowsItsNodalLoadsAndDisplacements() {
        // a spring support: no hand method applies; the equivalent nodal loads of a uniform load
        // on an element of length l are w l / 2 and w l^2 / 12 at each end (cubic Hermite element, common practice)
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 3 m, type: spring, k: 900 kN/m }\n"
                + "    - { at: 6 m, type: roller }\n", "  - { case: D, type: uniform, w: 10 kN/m }\n"));
        Derivation d = Derivations.of(r, r.combinations().get(0));
        assertEquals(4, d.tables().size(), "K d = f, nodal loads, displacements, area method");
        Derivation.Table loads = d.tables().get(1);
        assertEquals(List.of("1", "0 to 3", "10", "10", "-15", "-7.5", "-15", "7.5"), loads.rows().get(0), "w l / 2 = 15 kN, w l^2 / 12 = 7.5 kN*m");
        Derivation.Table nodes = d.tables().get(2);
        assertEquals("0", nodes.rows().get(0).get(2), "no deflection at the pin");
    }

    @Test
    void areaMethodTableAddsUp() {
        // The printed table itself, read back: each row re-adds (V right - load = V left, M at From +
        // area = M at To), one row's end carries on into the next across each step, and the numbers
        // agree with statics by hand for the simple span of LOADS (6 m, kN and m):
        //   R_A = (10 * 6 * 3 + 25 * 3.5 + 7.2 * 1.2 - 8) / 6 = 44.69 kN, moments about B; the linear
        //   load 0..6 kN/m over 3.2..5.6 m is 7.2 kN at 4.8 m; the clockwise couple lowers R_A.
        //   M(2.5 m) = 44.69 * 2.5 - 10 * 2.5^2 / 2 + 8 = 88.475 kN*m (the couple at 1.3 m steps M up by 8).
        AnalysisResult r = TestJobs.solve(TestJobs.text("6 m", "    - { at: 0 m, type: pin }\n    - { at: 6 m, type: roller }\n", LOADS));
        CombinationResult c = r.combinations().get(0);
        List<List<String>> rows = new AreaMethod(r, c, FactoredLoads.of(r, c), new Notation(r), new Steps()).rows();
        List<double[]> table = rows.stream().map(row -> row.stream().mapToDouble(DerivationTest::printed).toArray()).toList();
        double vScale = table.stream().mapToDouble(t -> Math.max(Math.abs(t[3]), Math.abs(t[5]))).max().orElseThrow();
        double mScale = table.stream().mapToDouble(t -> Math.max(Math.abs(t[6]), Math.abs(t[8]))).max().orElseThrow();
        // four significant figures on the page: a sum of two printed numbers is good to about 1e-3 of the column
        double vTol = 1e-3 * vScale;
        double mTol = 1e-3 * mScale;
        for (int k = 0; k < table.size(); k++) {
            double[] t = table.get(k);
            assertEquals(t[5], t[3] + t[4], vTol, "row " + k + ": V left of To = V right of From - load");
            assertEquals(t[8], t[6] + t[7], mTol, "row " + k + ": M at To = M at From + area of V");
            if (k + 1 < table.size()) {
                double[] next = table.get(k + 1);
                assertEquals(t[1], next[0], 1e-12, "rows follow on");
                assertEquals(next[3], t[5] + next[2], vTol, "row " + (k + 1) + ": V right = V left of the previous row + the step");
                double couple = Math.abs(next[0] - 1.3) < 1e-9 ? 8 : 0;
                assertEquals(next[6], t[8] + couple, mTol, "row " + (k + 1) + ": M carries on (stepped by a couple only)");
            }
        }
        double ra = (10 * 6 * 3 + 25 * 3.5 + 7.2 * 1.2 - 8) / 6;
        assertEquals(0, table.get(0)[0], 0);
        assertEquals(ra, table.get(0)[2], 0.01, "the first step is R_A");
        double[] toPointLoad = table.stream().filter(t -> Math.abs(t[1] - 2.5) < 1e-9).findFirst().orElseThrow();
        assertEquals(ra * 2.5 - 10 * 2.5 * 2.5 / 2 + 8, toPointLoad[8], 0.01, "M at the point load");
        assertEquals(0, table.get(table.size() - 1)[8], mTol, "no moment at the roller end");
    }

    /** A number as the table prints it (4 significant figures, thousands grouped, minus as a hyphen or U+2212). */
    private static double printed(String cell) {
        return Double.parseDouble(cell.replace(",", "").replace("\u2212", "-"));
    }
}
