package org.beamfolio.analysis;

import java.util.Arrays;

/**
 * The beam's response to one load case, combination or arrangement: reactions (force up
 * positive, moment counter-clockwise positive, per support in order along the beam) and the
 * fields shear, moment (sagging positive), slope (counter-clockwise positive) and deflection
 * (downward positive). Responses add: superposition is exact for this linear model.
 */
public record Response(String name, double[] reactionForce, double[] reactionMoment, Field shear, Field moment,
                       Field slope, Field deflection, double pivotRatio) {
    public Response {
        reactionForce = reactionForce.clone();
        reactionMoment = reactionMoment.clone();
    }

    public Response plus(Response o, String newName) {
        double[] rf = new double[reactionForce.length];
        double[] rm = new double[reactionMoment.length];
        for (int i = 0; i < rf.length; i++) {
            rf[i] = reactionForce[i] + o.reactionForce[i];
            rm[i] = reactionMoment[i] + o.reactionMoment[i];
        }
        return new Response(newName, rf, rm, shear.plus(o.shear), moment.plus(o.moment), slope.plus(o.slope),
                deflection.plus(o.deflection), Math.min(pivotRatio, o.pivotRatio));
    }

    public Response times(double k, String newName) {
        double[] rf = Arrays.stream(reactionForce).map(v -> v * k).toArray();
        double[] rm = Arrays.stream(reactionMoment).map(v -> v * k).toArray();
        return new Response(newName, rf, rm, shear.times(k), moment.times(k), slope.times(k), deflection.times(k), pivotRatio);
    }

    /**
     * The sum of factors[t] * terms[t] (the first {@code count} of them) in one pass per field,
     * added in order: the same numbers as adding the terms one by one to a zero response.
     */
    static Response linear(String name, Response[] terms, double[] factors, int count, int supports, double[] starts, double[] ends) {
        if (count == 0) {
            return zero(name, supports, starts, ends);
        }
        double[] rf = new double[supports];
        double[] rm = new double[supports];
        double pivot = 1.0;
        Field[] v = new Field[count];
        Field[] m = new Field[count];
        Field[] theta = new Field[count];
        Field[] d = new Field[count];
        for (int t = 0; t < count; t++) {
            Response r = terms[t];
            double k = factors[t];
            for (int i = 0; i < supports; i++) {
                rf[i] = rf[i] + k * r.reactionForce[i];
                rm[i] = rm[i] + k * r.reactionMoment[i];
            }
            pivot = Math.min(pivot, r.pivotRatio);
            v[t] = r.shear;
            m[t] = r.moment;
            theta[t] = r.slope;
            d[t] = r.deflection;
        }
        return new Response(name, rf, rm, Field.linear(v, factors, count), Field.linear(m, factors, count),
                Field.linear(theta, factors, count), Field.linear(d, factors, count), pivot);
    }

    public static Response zero(String name, int supports, double[] starts, double[] ends) {
        Field z = Field.zero(starts, ends);
        return new Response(name, new double[supports], new double[supports], z, z, z, z, 1.0);
    }
}
