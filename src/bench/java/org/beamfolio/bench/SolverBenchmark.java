package org.beamfolio.bench;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.beamfolio.analysis.Analysis;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.model.Beam;
import org.beamfolio.model.Combination;
import org.beamfolio.model.Job;
import org.beamfolio.model.Load;
import org.beamfolio.model.Material;
import org.beamfolio.model.Project;
import org.beamfolio.model.ReportSettings;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.Support;
import org.beamfolio.model.SupportKind;
import org.beamfolio.units.UnitSystem;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Solve and envelope a continuous beam of N equal 4 m spans with 20 loads per span (point and
 * line loads of four cases) and 20 combinations: the solver stage alone, warm. Invented data.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 12, time = 3)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SolverBenchmark {
    @Param({"50", "500", "5000"})
    int spans;

    Job job;

    @Setup
    public void setUp() {
        double span = 4;
        double length = spans * span;
        List<Support> supports = new ArrayList<>();
        supports.add(new Support(0, new SupportKind.Pin(), null));
        for (int i = 1; i <= spans; i++) {
            supports.add(new Support(i * span, new SupportKind.Roller(), null));
        }
        Random random = new Random(5);
        String[] cases = {"D", "L", "S", "W"};
        List<Load> loads = new ArrayList<>();
        for (int i = 0; i < spans * 20; i++) {
            double x = random.nextDouble() * (length - 1);
            String c = cases[i % 4];
            loads.add(i % 2 == 0 ? new Load.Point(c, 1000 + random.nextInt(9000), x, "", null)
                    : new Load.Distributed(c, 500, 500 + random.nextInt(4000), x, x + 1, false, "", null));
        }
        List<Combination> combinations = new ArrayList<>();
        for (int k = 0; k < 20; k++) {
            Map<String, Double> factors = new LinkedHashMap<>();
            factors.put("D", 1.0 + 0.01 * k);
            factors.put(cases[1 + k % 3], 0.5 + 0.05 * k);
            combinations.add(new Combination("C" + k, factors));
        }
        Beam beam = new Beam(length, "s", "m", supports, List.of(), List.of(), null);
        Project project = new Project("Benchmark", "B-1", "", "", "", "", "", "2026-01-01", "A", List.of(), "");
        job = new Job("bench", "", "", project, new ReportSettings(UnitSystem.SI, ReportSettings.Paper.A4),
                Map.of("m", new Material("m", 200e9, null, null, null, null, "")),
                Map.of("s", new Section("s", new SectionShape.Rectangle(0.2, 0.4), false)), beam, loads, Map.of(), null, combinations,
                List.of(), false, List.of(), new byte[0]);
    }

    @Benchmark
    public AnalysisResult solveAndEnvelope() throws Exception {
        return Analysis.run(job);
    }
}
