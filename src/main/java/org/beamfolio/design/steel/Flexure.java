package org.beamfolio.design.steel;

import static org.beamfolio.catalogue.ShapeProperty.BF_2TF;
import static org.beamfolio.catalogue.ShapeProperty.B_T;
import static org.beamfolio.catalogue.ShapeProperty.B_TDES;
import static org.beamfolio.catalogue.ShapeProperty.D_T;
import static org.beamfolio.catalogue.ShapeProperty.H_TDES;
import static org.beamfolio.catalogue.ShapeProperty.H_TW;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.beamfolio.catalogue.Shape;

/**
 * The flexural strength of a catalogue shape bent about its major axis, AISC 360 Chapter F: picks
 * the section of the chapter that applies from the shape and the compactness of its elements
 * (Table B4.1b), evaluates every limit state of that section, and takes phi_b = 0.90 and
 * Omega_b = 1.67 (F1).
 */
public final class Flexure {
    private Flexure() {}

    public static Strength strength(SteelMember m, FlexureCase bending) {
        return strength(m, bending, Detail.PRINTED);
    }

    /** As {@link #strength(SteelMember, FlexureCase)}, the limit states' equations kept or not as {@code detail} says. */
    public static Strength strength(SteelMember m, FlexureCase bending, Detail detail) {
        return strength(provisions(m), bending, detail);
    }

    /**
     * The section of Chapter F that applies to a member and the compactness it rests on, which do
     * not depend on the bending: a design works them once and reads them for every segment.
     */
    public record Provisions(SteelMember member, List<Slenderness> compactness, String section) {
        public Provisions {
            compactness = List.copyOf(compactness);
        }
    }

    /**
     * @throws OutOfScopeException when the shape is outside the flexural provisions implemented
     */
    public static Provisions provisions(SteelMember m) {
        List<Slenderness> compactness = compactness(m);
        return new Provisions(m, compactness, section(m, compactness));
    }

    /** The strength for one bending case, by the provisions found for the member. */
    public static Strength strength(Provisions provisions, FlexureCase bending, Detail detail) {
        SteelMember m = provisions.member();
        List<Slenderness> compactness = provisions.compactness();
        String section = provisions.section();
        List<FlexuralLimitState> states = switch (section) {
            case "F2" -> List.of(new F2Yielding(), new F2LateralTorsionalBuckling("F2.2"));
            case "F3" -> List.of(new F2LateralTorsionalBuckling("F3.1"), new F3FlangeLocalBuckling());
            case "F7" -> List.of(new F7Yielding(), new F7FlangeLocalBuckling(), new F7WebLocalBuckling(),
                    new F7LateralTorsionalBuckling());
            case "F8" -> List.of(new F8Yielding(), new F8LocalBuckling());
            default -> List.of(new F9Yielding(), new F9LateralTorsionalBuckling(), new F9FlangeLocalBuckling(),
                    new F9StemLocalBuckling());
        };
        List<LimitStateResult> evaluated = new ArrayList<>();
        for (FlexuralLimitState s : states) {
            evaluated.add(s.evaluate(m, bending, new Work(detail)));
        }
        Map<String, Double> factors = new LinkedHashMap<>();
        factors.put("Lb", bending.lb());
        factors.put("Cb", section.equals("F9") || section.equals("F8") ? 1.0 : bending.cb());
        return new Strength("flexure", Clause.of(m.edition(), section), compactness, evaluated,
                new Resistance(0.90, 1.67, Clause.of(m.edition(), "F1")), factors);
    }

    /** Why the shape is outside the flexural provisions implemented, or empty when it is inside. */
    public static java.util.Optional<String> outOfScope(SteelMember m) {
        try {
            section(m, compactness(m));
            return java.util.Optional.empty();
        } catch (OutOfScopeException e) {
            return java.util.Optional.of(e.getMessage());
        }
    }

    /** The width-to-thickness ratios of the shape's elements in flexure, Table B4.1b. */
    public static List<Slenderness> compactness(SteelMember m) {
        Shape s = m.shape();
        double r = m.rootEOverFy();
        double eOverFy = m.e() / m.fy();
        return switch (s.family().kind()) {
            case I_SHAPE -> List.of(
                    Slenderness.of("flange", "bf/2tf", s.get(BF_2TF), 0.38 * r, 1.0 * r, "10"),
                    Slenderness.of("web", "h/tw", s.get(H_TW), 3.76 * r, 5.70 * r, "15"));
            case CHANNEL -> List.of(
                    Slenderness.of("flange", "b/t", s.get(B_T), 0.38 * r, 1.0 * r, "10"),
                    Slenderness.of("web", "h/tw", s.get(H_TW), 3.76 * r, 5.70 * r, "15"));
            case RECTANGULAR_HSS -> List.of(
                    Slenderness.of("flange", "b/t", s.get(B_TDES), 1.12 * r, 1.40 * r, "17"),
                    Slenderness.of("web", "h/t", s.get(H_TDES), 2.42 * r, 5.70 * r, "19"));
            case ROUND_HSS -> List.of(Slenderness.of("wall", "D/t", s.get(D_T), 0.07 * eOverFy, 0.31 * eOverFy, "20"));
            case TEE -> List.of(
                    Slenderness.of("flange", "bf/2tf", s.get(BF_2TF), 0.38 * r, 1.0 * r, "10"),
                    Slenderness.of("stem", "d/tw", s.get(D_T), 0.84 * r, 1.52 * r, "14"));
        };
    }

    private static String section(SteelMember m, List<Slenderness> compactness) {
        Shape s = m.shape();
        String who = s.designation() + " (Fy = " + Math.round(m.fy() / 1e6) + " MPa): ";
        String edition = m.edition().label();
        switch (s.family().kind()) {
            case I_SHAPE, CHANNEL -> {
                if (compactness.get(1).compactness() != Slenderness.Compactness.COMPACT) {
                    throw new OutOfScopeException(who + "web not compact in flexure; " + edition
                            + " F4 and F5 are not implemented");
                }
                boolean compactFlange = compactness.get(0).compactness() == Slenderness.Compactness.COMPACT;
                if (s.family().kind() == org.beamfolio.catalogue.ShapeFamily.Kind.CHANNEL && !compactFlange) {
                    throw new OutOfScopeException(who + "channel with a noncompact flange; " + edition
                            + " F2 covers channels with compact flanges only");
                }
                return compactFlange ? "F2" : "F3";
            }
            case RECTANGULAR_HSS -> {
                return "F7";
            }
            case ROUND_HSS -> {
                if (!(s.get(D_T) < 0.45 * m.e() / m.fy())) {
                    throw new OutOfScopeException(who + "D/t of 0.45 E/Fy or more; " + edition + " F8 does not apply");
                }
                return "F8";
            }
            default -> {
                return "F9";
            }
        }
    }
}
