package org.beamfolio.bench;

import java.nio.charset.StandardCharsets;
import java.util.concurrent.TimeUnit;
import org.beamfolio.job.JobReader;
import org.beamfolio.job.JobReading;
import org.beamfolio.model.Job;
import org.beamfolio.selection.Selection;
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
 * Choosing a section from the whole W family (every W shape of the catalogue) for a three-span
 * continuous beam with live load patterned span by span, designed to AISC 360-16 with deflection
 * limits and self weight, warm. {@code floor}: a floor load that a mid-weight shape carries, so the
 * search stops part-way; {@code heavy}: a load no W shape carries, so every shape is tried and the
 * one with the lowest ratio is kept (the whole family, the worst case). Invented data.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 5, time = 3)
@Measurement(iterations = 5, time = 3)
@Fork(1)
public class SelectionBenchmark {
    @Param({"floor", "heavy"})
    String loading;

    Job job;

    @Setup
    public void setUp() {
        String live = loading.equals("floor") ? "2.5 klf" : "60 klf";
        String text = """
                beamfolio: 1
                project: { title: Selection benchmark, number: B-1 }
                report: { units: US }
                materials:
                  a992: { grade: A992 }
                sections:
                  b1: { choose: { family: W } }
                beam:
                  length: 90 ft
                  section: b1
                  material: a992
                  bracing: { top: continuous, bottom: supports }
                  supports:
                    - { at: 0 ft, type: pin }
                    - { at: 30 ft, type: roller }
                    - { at: 60 ft, type: roller }
                    - { at: 90 ft, type: roller }
                  self_weight: D
                loads:
                  - { case: D, type: uniform, w: 1 klf }
                  - { case: L, type: uniform, w: %s }
                  - { case: L, type: point, P: 10 kip, at: 45 ft }
                combinations: ASCE7-LRFD
                pattern: [ L ]
                design: { steel: AISC360-16 }
                checks:
                  deflection:
                    - { cases: [ L ], limit: L/360 }
                    - { cases: [ D, L ], limit: L/240 }
                """.formatted(live);
        JobReading reading = JobReader.read("bench.yaml", "bench", text.getBytes(StandardCharsets.UTF_8));
        if (!reading.ok()) {
            throw new IllegalStateException(reading.report());
        }
        job = reading.job();
    }

    @Benchmark
    public Job choose() throws Exception {
        return Selection.resolve(job);
    }
}
