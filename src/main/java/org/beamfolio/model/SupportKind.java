package org.beamfolio.model;

/** How a support restrains the beam. Stiffnesses in N/m and N*m/rad. */
public sealed interface SupportKind {
    String label();

    /** Whether the support restrains horizontal movement (a pin or a fixed end). */
    default boolean restrainsHorizontally() {
        return false;
    }

    /** Whether the support restrains rotation, and so carries a support moment (fixed, or a spring with kr). */
    default boolean restrainsRotation() {
        return this instanceof Fixed || (this instanceof Spring s && s.kr() > 0);
    }

    record Pin() implements SupportKind {
        public String label() {
            return "pin";
        }

        @Override
        public boolean restrainsHorizontally() {
            return true;
        }
    }

    record Roller() implements SupportKind {
        public String label() {
            return "roller";
        }
    }

    record Fixed() implements SupportKind {
        public String label() {
            return "fixed";
        }

        @Override
        public boolean restrainsHorizontally() {
            return true;
        }
    }

    /** A vertical spring, with an optional rotational one (0 when absent). */
    record Spring(double k, double kr) implements SupportKind {
        public Spring {
            if (!(k > 0) || kr < 0) {
                throw new IllegalArgumentException("spring stiffness must be positive");
            }
        }

        public String label() {
            return "spring";
        }
    }
}
