package org.beamfolio.loads;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The take-off of a member's area loads: every application becomes one line load per case of its
 * area load, w = pressure x tributary width (x the live load reduction factor), and the
 * reducible live cases are reduced by the member's tributary area AT, the integral of the widths
 * of the area loads marked reducible over their extents.
 *
 * <p>AT counts only the area loads that may be reduced (marked reducible for the case, not an
 * assembly use, and for L not over 100 psf): a smaller AT gives a larger factor, the
 * conservative reading where a member carries both kinds.
 */
public final class TakeOff {
    /** The case ids that carry ASCE 7's floor live load and roof live load meanings. */
    public static final String FLOOR_LIVE = "L";
    public static final String ROOF_LIVE = "Lr";

    public static final TakeOff EMPTY = new TakeOff(List.of(), List.of(), List.of());

    /** One line load of the take-off, application by application and case by case. */
    public record Line(int application, Tributary tributary, String loadCase, double pressure, double factor) {
        public double unreducedStart() {
            return pressure * tributary.widthStart();
        }

        public double unreducedEnd() {
            return pressure * tributary.widthEnd();
        }

        /** The line load the member carries at {@code from}: pressure x width x factor. */
        public double wStart() {
            return unreducedStart() * factor;
        }

        public double wEnd() {
            return unreducedEnd() * factor;
        }

        public boolean reduced() {
            return factor != 1.0;
        }
    }

    /** The tributary area AT a live case is reduced by, and the applications it sums. */
    public record Area(String loadCase, double area, List<Tributary> counted) {
        public Area {
            counted = List.copyOf(counted);
        }
    }

    /** What the reduction did to one live case of one area load, with its clause. */
    public record Outcome(String areaLoad, String loadCase, String clause, LiveLoadReduction.Reduction reduction) {}

    private final List<Line> lines;
    private final List<Area> areas;
    private final List<Outcome> outcomes;

    private TakeOff(List<Line> lines, List<Area> areas, List<Outcome> outcomes) {
        this.lines = List.copyOf(lines);
        this.areas = List.copyOf(areas);
        this.outcomes = List.copyOf(outcomes);
    }

    public List<Line> lines() {
        return lines;
    }

    public List<Area> areas() {
        return areas;
    }

    public List<Outcome> outcomes() {
        return outcomes;
    }

    public boolean isEmpty() {
        return lines.isEmpty();
    }

    public static TakeOff of(List<Tributary> applications, ReductionSettings settings) {
        Map<String, AreaLoad> used = new LinkedHashMap<>();
        applications.forEach(a -> used.putIfAbsent(a.load().name(), a.load()));
        List<Area> areas = new ArrayList<>();
        for (String liveCase : List.of(FLOOR_LIVE, ROOF_LIVE)) {
            List<Tributary> counted = applications.stream().filter(a -> mayReduce(a.load(), liveCase)).toList();
            if (!counted.isEmpty()) {
                areas.add(new Area(liveCase, counted.stream().mapToDouble(Tributary::area).sum(), counted));
            }
        }
        List<Outcome> outcomes = new ArrayList<>();
        for (AreaLoad load : used.values()) {
            for (String liveCase : List.of(FLOOR_LIVE, ROOF_LIVE)) {
                Double pressure = load.pressures().get(liveCase);
                if (pressure != null) {
                    double at = areas.stream().filter(a -> a.loadCase().equals(liveCase)).mapToDouble(Area::area).findFirst()
                            .orElse(applications.stream().filter(a -> a.load() == load).mapToDouble(Tributary::area).sum());
                    outcomes.add(outcome(load, liveCase, pressure, at, settings));
                }
            }
        }
        List<Line> lines = new ArrayList<>();
        for (int i = 0; i < applications.size(); i++) {
            Tributary t = applications.get(i);
            for (Map.Entry<String, Double> p : t.load().pressures().entrySet()) {
                double factor = outcomes.stream().filter(o -> o.areaLoad().equals(t.load().name()) && o.loadCase().equals(p.getKey()))
                        .mapToDouble(o -> o.reduction().factor()).findFirst().orElse(1.0);
                lines.add(new Line(i, t, p.getKey(), p.getValue(), factor));
            }
        }
        return new TakeOff(lines, areas, outcomes);
    }

    /** Whether an area load's pressure for a live case may be reduced at all (and so counts in AT). */
    private static boolean mayReduce(AreaLoad load, String liveCase) {
        if (!load.reducible().contains(liveCase)) {
            return false;
        }
        if (liveCase.equals(FLOOR_LIVE)) {
            return !load.assembly() && load.pressures().get(liveCase) <= 100 * LiveLoadReduction.PSF * (1 + 1e-12);
        }
        return true;
    }

    private static Outcome outcome(AreaLoad load, String liveCase, double pressure, double at, ReductionSettings s) {
        boolean floor = liveCase.equals(FLOOR_LIVE);
        String clause = floor ? LiveLoadReduction.CLAUSE : RoofLiveLoadReduction.CLAUSE;
        String key = floor ? "design.live_load_reduction" : "design.roof_live_load_reduction";
        double atSqFt = at / LiveLoadReduction.SQ_FT;
        if (!load.reducible().contains(liveCase)) {
            return new Outcome(load.name(), liveCase, clause, none("case " + liveCase + " of area load " + load.name()
                    + " is not marked reducible: not reduced", atSqFt));
        }
        if (floor ? s.kll() == null : s.roofRise() == null) {
            boolean stated = floor ? s.liveStated() : s.roofStated();
            return new Outcome(load.name(), liveCase, clause, none(stated ? key + " is none: not reduced"
                    : "the job asks for no reduction (no " + key + "): not reduced", atSqFt));
        }
        LiveLoadReduction.Reduction r = floor
                ? LiveLoadReduction.of(s.kll(), at, pressure, s.floors(), load.assembly())
                : RoofLiveLoadReduction.of(at, pressure, s.roofRise());
        return new Outcome(load.name(), liveCase, clause, r);
    }

    private static LiveLoadReduction.Reduction none(String why, double atSqFt) {
        return new LiveLoadReduction.Reduction(1.0, Double.NaN, atSqFt, false, why);
    }
}
