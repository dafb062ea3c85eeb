package org.beamfolio.checks.timber;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.WeakHashMap;
import org.beamfolio.analysis.AnalysisResult;
import org.beamfolio.analysis.CombinationResult;
import org.beamfolio.analysis.Extreme;
import org.beamfolio.analysis.Field;
import org.beamfolio.analysis.Polynomial;
import org.beamfolio.analysis.Roots;
import org.beamfolio.analysis.StressCombinations;
import org.beamfolio.analysis.StructureModel;
import org.beamfolio.design.timber.AdjustedValues;
import org.beamfolio.design.timber.BeamStability;
import org.beamfolio.design.timber.Creep;
import org.beamfolio.design.timber.EffectiveLength;
import org.beamfolio.model.timber.Factor;
import org.beamfolio.model.timber.LoadDuration;
import org.beamfolio.model.timber.TimberValues;
import org.beamfolio.model.DeflectionLimit;
import org.beamfolio.model.Material;
import org.beamfolio.model.Section;
import org.beamfolio.model.SectionShape;
import org.beamfolio.model.Support;
import org.beamfolio.model.TimberDesign;

/**
 * Designs a solved timber beam to the NDS (allowable stress design), combination by combination,
 * each combination with the load-duration factor of its shortest-duration case (NDS 2.3.2):
 * bending fb = M / S against Fb' for the face in tension, with CL per unbraced segment of the
 * compression edge and, for glulam, CV over the length between points of zero moment; shear
 * fv = 1.5 V / A against Fv'; bearing at each support given a bearing length; and long-term
 * deflection with creep. The result is found once per analysis and shared.
 */
public final class TimberBeamDesign {
    private TimberBeamDesign() {}

    private static final Map<AnalysisResult, TimberDesignResult> FOUND = Collections.synchronizedMap(new WeakHashMap<>());

    /** The bracing of the compression edge: the beam's own ({@code beam.bracing}). */
    private static final UnbracedSegments BRACING = UnbracedSegments.BY_BRACING;

    /** The design of a job with {@code design.timber}, or null for any other job. */
    public static TimberDesignResult of(AnalysisResult result) {
        if (result.job().timber() == null) {
            return null;
        }
        TimberDesignResult found = FOUND.get(result);
        if (found == null) {
            found = new Run(result, BRACING).design();
            FOUND.put(result, found);
        }
        return found;
    }

    /** One design of one solved beam. */
    private static final class Run {
        private final AnalysisResult result;
        private final UnbracedSegments segments;
        private final TimberDesign design;
        private final StructureModel model;

        Run(AnalysisResult result, UnbracedSegments segments) {
            this.result = result;
            this.segments = segments;
            this.design = result.job().timber();
            this.model = result.model();
        }

        TimberDesignResult design() {
            List<CombinationResult> combinations = StressCombinations.of(result.combinations());
            Map<String, CombinationResult> forShear = new LinkedHashMap<>();
            boolean nearSupports = ShearNearSupports.applies(result.job());
            if (nearSupports) {
                double d = ((SectionShape.Rectangle) result.job().sections().get(result.job().beam().section()).shape()).h();
                ShearNearSupports.solve(result.job(), d).combinations().forEach(c -> forShear.put(c.name(), c));
            }
            List<TimberDesignResult.Bending> bending = new ArrayList<>();
            List<TimberDesignResult.Shear> shear = new ArrayList<>();
            for (CombinationResult c : combinations) {
                TimberDesignResult.Bending b = bending(c);
                if (b != null) {
                    bending.add(b);
                }
                shear.add(shear(c, nearSupports ? forShear.get(c.name()) : c, nearSupports));
            }
            TimberValues values = material(0).timber();
            Factor kcr = Creep.kcr(design.service());
            return new TimberDesignResult(values, bending, shear, bearing(combinations), longTerm(kcr), kcr,
                    adjusted(0).modulus());
        }

        private Material material(int element) {
            return result.job().materials().get(model.materialId(element));
        }

        private Section section(int element) {
            return result.job().sections().get(model.sectionId(element));
        }

        private SectionShape.Rectangle rectangle(int element) {
            return (SectionShape.Rectangle) section(element).shape();
        }

        private AdjustedValues adjusted(int element) {
            SectionShape.Rectangle r = rectangle(element);
            return new AdjustedValues(material(element).timber(), design.service(), r.b(), r.h());
        }

        /** The thickness of one ply (the size factor's thickness): the lumber's, or the whole breadth. */
        private double ply(int element) {
            Section s = section(element);
            return s.lumber() != null ? s.lumber().plyThickness() : rectangle(element).b();
        }

        private TimberDesignResult.Bending bending(CombinationResult c) {
            LoadDuration cd = design.durationOf(c.factors());
            String durationCase = design.governingCase(c.factors());
            Field m = c.response().moment();
            List<Double> zeros = zeros(m);
            TimberDesignResult.Bending best = null;
            for (int sign : new int[] {1, -1}) {
                // sagging (sign 1) puts the top edge in compression and the bottom face in tension
                List<UnbracedSegments.Unbraced> unbraced = segments.of(result, c, sign > 0);
                for (int e = 0; e < model.elements(); e++) {
                    Extreme x = m.extremeOf(e, sign);
                    if (!(sign * x.value() > 0) || isRoundOff(m, x.value())) {
                        continue;
                    }
                    UnbracedSegments.Unbraced seg = segmentOf(unbraced, (m.start(e) + m.end(e)) / 2);
                    SectionShape.Rectangle r = rectangle(e);
                    double s = r.b() * r.h() * r.h() / 6;
                    double fb = Math.abs(x.value()) / s;
                    double[] zeroAround = around(zeros, x.at());
                    EffectiveLength row = null;
                    EffectiveLength.Worked le = null;
                    if (!seg.braced()) {
                        row = SegmentLoading.rowFor(result, c, seg);
                        le = row.of(seg.length(), r.h());
                    }
                    AdjustedValues.Bending fbPrime;
                    try {
                        fbPrime = adjusted(e).bending(cd, sign < 0, ply(e), le == null ? null : le.le(),
                                zeroAround[1] - zeroAround[0]);
                    } catch (BeamStability.SlendernessException ex) {
                        org.beamfolio.units.Lengths.Style style = result.job().report().units()
                                == org.beamfolio.units.UnitSystem.SI
                                ? org.beamfolio.units.Lengths.Style.METRES : org.beamfolio.units.Lengths.Style.FEET_AND_INCHES;
                        throw new TimberInputException(design.beamAt(), "beam", String.format(Locale.ROOT,
                                "under %s the %s edge is in compression from %s to %s, %s: %s, Table 3.3.3 row \"%s\"; %s",
                                c.name(), sign > 0 ? "top" : "bottom", org.beamfolio.units.Lengths.describe(seg.from(), style),
                                org.beamfolio.units.Lengths.describe(seg.to(), style), seg.bracedBy(),
                                le.describe(seg.length(), r.h(), 0.0254, "in"), row.description(), ex.getMessage()));
                    }
                    TimberDesignResult.Bending row1 = new TimberDesignResult.Bending(c.name(), cd, durationCase, x.at(),
                            x.value(), s, fb, fbPrime, seg, row, le, zeroAround[0], zeroAround[1], r.b(), r.h());
                    if (best == null || row1.ratio() > best.ratio()) {
                        best = row1;
                    }
                }
            }
            return best;
        }

        /** A moment within 1e-10 of the largest magnitude along the beam is the round-off of a zero. */
        private static boolean isRoundOff(Field m, double value) {
            double scale = Math.max(Math.abs(m.max().value()), Math.abs(m.min().value()));
            return Math.abs(value) <= 1e-10 * scale;
        }

        private static UnbracedSegments.Unbraced segmentOf(List<UnbracedSegments.Unbraced> unbraced, double x) {
            for (UnbracedSegments.Unbraced u : unbraced) {
                if (x >= u.from() && x <= u.to()) {
                    return u;
                }
            }
            return unbraced.get(unbraced.size() - 1);
        }

        /** Every point where the moment is zero, left to right, with the beam's ends. */
        private List<Double> zeros(Field m) {
            List<Double> out = new ArrayList<>();
            out.add(m.start(0));
            double scale = Math.max(Math.abs(m.max().value()), Math.abs(m.min().value()));
            for (int i = 0; i < m.size(); i++) {
                Polynomial p = m.piece(i);
                double length = m.end(i) - m.start(i);
                if (Math.abs(p.at(0)) <= 1e-10 * scale && Math.abs(p.at(length)) <= 1e-10 * scale) {
                    out.add(m.start(i));
                    out.add(m.end(i));
                    continue;
                }
                if (Math.abs(p.at(0)) <= 1e-10 * scale) {
                    out.add(m.start(i));
                }
                for (double r : Roots.in(p, 0, length)) {
                    out.add(m.start(i) + r);
                }
            }
            out.add(m.end(m.size() - 1));
            Collections.sort(out);
            return out;
        }

        /** The points of zero moment either side of x (the beam's ends where the moment does not vanish first). */
        private static double[] around(List<Double> zeros, double x) {
            double left = zeros.get(0);
            double right = zeros.get(zeros.size() - 1);
            double tol = 1e-9 * (right - left);
            for (double z : zeros) {
                if (z < x - tol) {
                    left = Math.max(left, z);
                } else if (z > x + tol) {
                    right = Math.min(right, z);
                }
            }
            return new double[] {left, right};
        }

        /**
         * fv = 1.5 V / A at the largest |V| (NDS Eq. 3.4-2), V from {@code reduced}: the same
         * combination with the loads near the bearings left out ({@link ShearNearSupports}), or
         * the combination itself.
         */
        private TimberDesignResult.Shear shear(CombinationResult c, CombinationResult reduced, boolean nearSupports) {
            LoadDuration cd = design.durationOf(c.factors());
            Field v = reduced.response().shear();
            TimberDesignResult.Shear best = null;
            for (int e = 0; e < model.elements(); e++) {
                for (int sign : new int[] {1, -1}) {
                    Extreme x = v.extremeOf(e, sign);
                    SectionShape.Rectangle r = rectangle(e);
                    double area = r.b() * r.h();
                    double fv = 1.5 * Math.abs(x.value()) / area;
                    TimberDesignResult.Shear row = new TimberDesignResult.Shear(c.name(), cd, design.governingCase(c.factors()),
                            x.at(), x.value(), area, fv, adjusted(e).shear(cd), nearSupports);
                    if (best == null || row.ratio() > best.ratio()) {
                        best = row;
                    }
                }
            }
            return best;
        }

        /**
         * fc_perp = R / (b lb) at each support given a bearing length, under the largest reaction of
         * the combinations (Fc_perp' takes no CD, so one combination governs). The bearing area factor
         * applies to bearings at least 3 in from the member's end (NDS 3.10.4).
         */
        private List<TimberDesignResult.Bearing> bearing(List<CombinationResult> combinations) {
            List<TimberDesignResult.Bearing> out = new ArrayList<>();
            List<Support> supports = result.job().beam().supports();
            double length = result.job().beam().length();
            for (int i = 0; i < supports.size(); i++) {
                Support s = supports.get(i);
                if (s.bearingLength() == null) {
                    continue;
                }
                double reaction = 0;
                String under = combinations.isEmpty() ? "" : combinations.get(0).name();
                for (CombinationResult c : combinations) {
                    double r = c.response().reactionForce()[i];
                    if (r > reaction) {
                        reaction = r;
                        under = c.name();
                    }
                }
                int e = model.elementAt(Math.min(Math.max(s.at(), 1e-9 * length), length * (1 - 1e-9)));
                SectionShape.Rectangle r = rectangle(e);
                double toEnd = Math.min(s.at(), length - s.at()) - s.bearingLength() / 2;
                boolean nearEnd = toEnd < 3 * 0.0254 - 1e-9;
                AdjustedValues.Adjusted fc = adjusted(e).bearing(s.bearingLength(), nearEnd);
                out.add(new TimberDesignResult.Bearing(i + 1, s.at(), reaction, under, r.b(), s.bearingLength(),
                        reaction / (r.b() * s.bearingLength()), fc));
            }
            return out;
        }

        /**
         * For each deflection limit whose cases include one of permanent duration: delta_T = Kcr
         * delta_LT + delta_ST with every region loaded, region by region against the same limit.
         */
        private List<TimberDesignResult.LongTerm> longTerm(Factor kcr) {
            List<TimberDesignResult.LongTerm> out = new ArrayList<>();
            for (DeflectionLimit limit : result.job().deflectionLimits()) {
                List<String> lt = new ArrayList<>();
                List<String> st = new ArrayList<>();
                Map<String, Double> factors = new LinkedHashMap<>();
                for (String c : limit.cases()) {
                    boolean permanent = design.durations().get(c) == LoadDuration.PERMANENT;
                    (permanent ? lt : st).add(c);
                    factors.put(c, permanent ? kcr.value() : 1.0);
                }
                if (lt.isEmpty()) {
                    continue;
                }
                Field delta = result.patterns().deflection(factors, null);
                String name = String.join(" + ", limit.cases());
                List<AnalysisResult.Span> regions = limit.spanRatio() != null ? result.spans() : List.of(whole());
                for (AnalysisResult.Span region : regions) {
                    Extreme worst = delta.largestWithin(region.from(), region.to());
                    double allowed = limit.spanRatio() != null ? region.limitLength() / limit.spanRatio() : limit.maximum();
                    String text = limit.spanRatio() != null ? (region.overhang() ? "2L/" : "L/") + trim(limit.spanRatio()) : "maximum";
                    out.add(new TimberDesignResult.LongTerm(name, lt, st, region.label(), text, worst.at(),
                            Math.abs(worst.value()), allowed));
                }
            }
            return out;
        }

        private AnalysisResult.Span whole() {
            return new AnalysisResult.Span("beam", 0, result.job().beam().length(), false);
        }

        private static String trim(double v) {
            return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
        }
    }
}
