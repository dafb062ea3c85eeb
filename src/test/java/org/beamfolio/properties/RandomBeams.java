package org.beamfolio.properties;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.beamfolio.TestJobs;
import org.beamfolio.analysis.Stability;
import org.beamfolio.job.JobReading;

/**
 * Random valid beams as job files (invented data for property tests): a length, a support layout
 * (a cantilever, or two to five supports with pins, rollers, springs and maybe a fixed end),
 * up to two hinges where the beam stays stable, and one to eight loads of every kind. Each comes
 * with its mirror image about the beam's middle. Positions fall on a grid of a hundredth of the
 * length, which keeps the elements within a ratio of 100 of each other; badly conditioned beams
 * (a millimetre element beside a 20 m one) have their own tests.
 */
final class RandomBeams {
    private RandomBeams() {}

    record Beam(String text, String mirrored, double length) {
        @Override
        public String toString() {
            return text;
        }
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }

    /** A grid point k L / 100 with k from lo to hi. */
    private static double grid(Random random, double length, int lo, int hi) {
        return (lo + random.nextInt(hi - lo + 1)) * length / 100;
    }

    static Beam next(Random random) {
        while (true) {
            Beam candidate = draw(random);
            JobReading reading = TestJobs.read(candidate.text());
            // a couple right at a hinge acts on the part to its right, so it has no mirror image: not drawn
            if (reading.ok() && Stability.check(reading.job().beam()).isEmpty() && reading.job().loads().stream()
                    .noneMatch(l -> l instanceof org.beamfolio.model.Load.Couple c
                            && reading.job().beam().hinges().stream().anyMatch(h -> h.at() == c.at()))) {
                return candidate;
            }
        }
    }

    private static Beam draw(Random random) {
        double length = 2 + random.nextInt(28);
        StringBuilder supports = new StringBuilder();
        StringBuilder mirrored = new StringBuilder();
        if (random.nextInt(5) == 0) {
            boolean left = random.nextBoolean();
            supports.append("    - { at: ").append(left ? "0" : fmt(length)).append(" m, type: fixed }\n");
            mirrored.append("    - { at: ").append(left ? fmt(length) : "0").append(" m, type: fixed }\n");
        } else {
            int count = 2 + random.nextInt(4);
            List<Double> at = new ArrayList<>();
            while (at.size() < count) {
                double x = grid(random, length, 1, 99);
                if (at.stream().noneMatch(y -> Math.abs(y - x) < 0.005 * length)) {
                    at.add(x);
                }
            }
            at.sort(null);
            for (int i = 0; i < count; i++) {
                String kind;
                double x = at.get(i);
                if (i == 0) {
                    boolean fixed = random.nextInt(3) == 0;
                    kind = fixed ? "fixed" : "pin";
                    x = fixed ? 0 : x;
                } else {
                    kind = random.nextInt(4) == 0 ? "spring, k: " + (1000 + random.nextInt(50_000)) + " kN/m" : "roller";
                }
                supports.append("    - { at: ").append(fmt(x)).append(" m, type: ").append(kind).append(" }\n");
                mirrored.append("    - { at: ").append(fmt(length - x)).append(" m, type: ").append(kind).append(" }\n");
            }
        }
        String hinges = "";
        String mirroredHinges = "";
        int hingeCount = random.nextInt(3);
        if (hingeCount > 0) {
            List<String> h = new ArrayList<>();
            List<String> hm = new ArrayList<>();
            for (int i = 0; i < hingeCount; i++) {
                double x = grid(random, length, 5, 95);
                h.add(fmt(x) + " m");
                hm.add(fmt(length - x) + " m");
            }
            hinges = "  hinges: [ " + String.join(", ", h) + " ]\n";
            mirroredHinges = "  hinges: [ " + String.join(", ", hm) + " ]\n";
        }
        StringBuilder loads = new StringBuilder();
        StringBuilder mirroredLoads = new StringBuilder();
        int count = 1 + random.nextInt(8);
        for (int i = 0; i < count; i++) {
            String c = random.nextBoolean() ? "D" : "L";
            double a = Math.round((-20 + 60 * random.nextDouble()) * 100) / 100.0;
            double b = Math.round((-20 + 60 * random.nextDouble()) * 100) / 100.0;
            int k1 = random.nextInt(95);
            int k2 = k1 + 1 + random.nextInt(100 - k1);
            double x1 = k1 * length / 100;
            double x2 = k2 * length / 100;
            switch (random.nextInt(4)) {
                case 0 -> {
                    loads.append("  - { case: ").append(c).append(", type: point, P: ").append(fmt(a)).append(" kN, at: ").append(fmt(x1)).append(" m }\n");
                    mirroredLoads.append("  - { case: ").append(c).append(", type: point, P: ").append(fmt(a)).append(" kN, at: ").append(fmt(length - x1)).append(" m }\n");
                }
                case 1 -> {
                    String sense = a >= 0 ? "cw" : "ccw";
                    String reverse = a >= 0 ? "ccw" : "cw";
                    loads.append("  - { case: ").append(c).append(", type: moment, M: ").append(fmt(Math.abs(a))).append(" kN*m, at: ").append(fmt(x1))
                            .append(" m, sense: ").append(sense).append(" }\n");
                    mirroredLoads.append("  - { case: ").append(c).append(", type: moment, M: ").append(fmt(Math.abs(a))).append(" kN*m, at: ")
                            .append(fmt(length - x1)).append(" m, sense: ").append(reverse).append(" }\n");
                }
                case 2 -> {
                    loads.append("  - { case: ").append(c).append(", type: uniform, w: ").append(fmt(a)).append(" kN/m, from: ").append(fmt(x1))
                            .append(" m, to: ").append(fmt(x2)).append(" m }\n");
                    mirroredLoads.append("  - { case: ").append(c).append(", type: uniform, w: ").append(fmt(a)).append(" kN/m, from: ")
                            .append(fmt(length - x2)).append(" m, to: ").append(fmt(length - x1)).append(" m }\n");
                }
                default -> {
                    loads.append("  - { case: ").append(c).append(", type: linear, w: [").append(fmt(a)).append(" kN/m, ").append(fmt(b))
                            .append(" kN/m], from: ").append(fmt(x1)).append(" m, to: ").append(fmt(x2)).append(" m }\n");
                    mirroredLoads.append("  - { case: ").append(c).append(", type: linear, w: [").append(fmt(b)).append(" kN/m, ").append(fmt(a))
                            .append(" kN/m], from: ").append(fmt(length - x2)).append(" m, to: ").append(fmt(length - x1)).append(" m }\n");
                }
            }
        }
        String text = TestJobs.text(fmt(length) + " m", supports.toString(), loads.toString()).replace("loads:\n", hinges + "loads:\n");
        String mirror = TestJobs.text(fmt(length) + " m", mirrored.toString(), mirroredLoads.toString())
                .replace("loads:\n", mirroredHinges + "loads:\n");
        return new Beam(text, mirror, length);
    }
}
