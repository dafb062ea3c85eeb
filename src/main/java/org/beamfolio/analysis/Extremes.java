package org.beamfolio.analysis;

/**
 * The extremes of one response: shear, moment, deflection, top and bottom fibre stress (tension
 * positive) and the largest shear stress (null where a section gives no Q or t).
 */
public record Extremes(Extreme shearMax, Extreme shearMin, Extreme momentMax, Extreme momentMin,
                       Extreme deflectionMax, Extreme deflectionMin, Extreme stressTopMax, Extreme stressTopMin,
                       Extreme stressBottomMax, Extreme stressBottomMin, Extreme shearStressMax) {
}
