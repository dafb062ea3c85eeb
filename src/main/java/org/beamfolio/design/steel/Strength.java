package org.beamfolio.design.steel;

import java.util.Comparator;
import java.util.List;
import java.util.Map;

/**
 * A strength worked to the specification: the section of it that applies ({@code F2}, {@code G2.1},
 * ...), the compactness of the elements, every limit state evaluated, and the resistance factors.
 * The nominal strength is the least of the limit states that apply, and that one governs.
 *
 * @param kind {@code flexure}, {@code shear}, {@code web local yielding}, {@code web local crippling}
 * @param factors the factors the strength was worked with, e.g. {@code Cb}, {@code Lb} (SI)
 */
public record Strength(String kind, Clause section, List<Slenderness> compactness,
                       List<LimitStateResult> evaluated, Resistance resistance, Map<String, Double> factors) {
    public Strength {
        compactness = List.copyOf(compactness);
        evaluated = List.copyOf(evaluated);
        factors = Map.copyOf(factors);
        if (evaluated.stream().noneMatch(LimitStateResult::applies)) {
            throw new IllegalArgumentException(kind + ": no limit state applies");
        }
    }

    /** The limit state with the least nominal strength among those that apply (the first on a tie). */
    public LimitStateResult governing() {
        return evaluated.stream().filter(LimitStateResult::applies)
                .min(Comparator.comparingDouble(LimitStateResult::nominal)).orElseThrow();
    }

    /** Mn, Vn or Rn (N*m or N). */
    public double nominal() {
        return governing().nominal();
    }

    /** phi Rn (LRFD) or Rn / Omega (ASD). */
    public double available(Method method) {
        return resistance.available(nominal(), method);
    }

    /** Demand over available strength. */
    public double ratio(double demand, Method method) {
        return Math.abs(demand) / available(method);
    }
}
