package org.beamfolio.design.steel;

import java.util.List;

/**
 * One limit state evaluated: its name ({@code yielding}, {@code lateral-torsional buckling}, ...),
 * its clause, whether it applies, the nominal strength it gives (N*m or N; NaN when it does not
 * apply), the equations worked, and a note saying why it does or does not apply
 * ({@code Lb <= Lp: lateral-torsional buckling does not apply}).
 */
public record LimitStateResult(String limitState, Clause clause, boolean applies, double nominal,
                               List<Equation> equations, String note) {
    public LimitStateResult {
        equations = List.copyOf(equations);
        if (applies == Double.isNaN(nominal)) {
            throw new IllegalArgumentException(limitState + ": a limit state that applies has a strength, one that does not has none");
        }
    }

    static LimitStateResult governs(String limitState, Clause clause, double nominal, Work work, String note) {
        return new LimitStateResult(limitState, clause, true, nominal, work.equations(), note);
    }

    static LimitStateResult doesNotApply(String limitState, Clause clause, Work work, String note) {
        return new LimitStateResult(limitState, clause, false, Double.NaN, work.equations(), note);
    }
}
