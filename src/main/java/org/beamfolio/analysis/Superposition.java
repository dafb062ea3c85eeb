package org.beamfolio.analysis;

import java.util.Arrays;

/**
 * A combination as its factored terms, sum of k_t r_t: the reactions are summed at once (they are
 * few), the diagrams only when asked for. Extremes need no whole diagram: each piece's
 * coefficients are summed into a small scratch array as they are visited, so a large beam's
 * combinations hold no fields that nobody reads. Summing is in term order, so a piece has the
 * same coefficients here as in the materialised response.
 */
final class Superposition {
    private Response[] terms;
    private double[] factors;
    private int count;

    Superposition(int capacity) {
        terms = new Response[Math.max(capacity, 1)];
        factors = new double[terms.length];
    }

    Superposition addCases(java.util.Map<String, Response> cases, java.util.Map<String, Double> caseFactors) {
        for (java.util.Map.Entry<String, Double> f : caseFactors.entrySet()) {
            Response r = cases.get(f.getKey());
            if (r != null && f.getValue() != 0) {
                add(r, f.getValue());
            }
        }
        return this;
    }

    void add(Response r, double factor) {
        if (count == terms.length) {
            terms = Arrays.copyOf(terms, 2 * count);
            factors = Arrays.copyOf(factors, 2 * count);
        }
        terms[count] = r;
        factors[count++] = factor;
    }

    /** The whole response: every field summed, one array per field. */
    Response response(StructureModel model, String name) {
        return Response.linear(name, terms, factors, count, model.supports().size(), model.elementStarts(), model.elementEnds());
    }

    /** The vertical reactions, summed in term order as {@link #response} sums them, so they are the same to the bit. */
    double[] reactionForces(int supports) {
        double[] rf = new double[supports];
        for (int t = 0; t < count; t++) {
            double k = factors[t];
            double[] r = terms[t].reactionForce();
            for (int i = 0; i < supports; i++) {
                rf[i] = rf[i] + k * r[i];
            }
        }
        return rf;
    }

    /** The deflection alone, summed in term order as {@link #response} sums it: a deflection check needs no other field. */
    Field deflection(StructureModel model) {
        if (count == 0) {
            return Field.zero(model.elementStarts(), model.elementEnds());
        }
        Field[] d = new Field[count];
        for (int t = 0; t < count; t++) {
            d[t] = terms[t].deflection();
        }
        return Field.linear(d, factors, count);
    }

    /** Which field of the terms a piece is summed from. */
    enum Quantity { SHEAR, MOMENT, DEFLECTION }

    /** Piece i of the summed field, six coefficients written to {@code out}. */
    void piece(Quantity quantity, int i, double[] out) {
        Arrays.fill(out, 0, Field.STRIDE, 0.0);
        for (int t = 0; t < count; t++) {
            Response r = terms[t];
            Field f = switch (quantity) {
                case SHEAR -> r.shear();
                case MOMENT -> r.moment();
                case DEFLECTION -> r.deflection();
            };
            f.addPieceTimes(i, factors[t], out);
        }
    }
}
