package org.stellabar.structure;

/**
 * What fixes a star's scale besides its mass: its radius (every kind may be fixed so; the
 * standard model and the polytrope only so), or, for an isentropic star, its central temperature
 * or its entropy per baryon instead.
 */
public sealed interface ScaleAnchor {

    /** @return the anchor's value in its CGS unit (cm, K, or k_B per baryon) */
    double value();

    /** @return the request input this anchor is */
    StarRequestException.Component component();

    /**
     * Adds the anchor's own rules to a check.
     *
     * @param rules the check of the whole request
     * @param mass the star's mass M [g], for rules that depend on it
     */
    void check(StarRequestRules rules, double mass);

    /**
     * The star's radius.
     *
     * @param value R [cm]
     */
    record Radius(double value) implements ScaleAnchor {
        @Override
        public StarRequestException.Component component() {
            return StarRequestException.Component.radius;
        }

        @Override
        public void check(StarRequestRules rules, double mass) {
            rules.radius(value, mass);
        }
    }

    /**
     * The central temperature.
     *
     * @param value T_c [K]
     */
    record CentralTemperature(double value) implements ScaleAnchor {
        @Override
        public StarRequestException.Component component() {
            return StarRequestException.Component.centralTemperature;
        }

        @Override
        public void check(StarRequestRules rules, double mass) {
            rules.centralTemperature(value);
        }
    }

    /**
     * The entropy per baryon, the same at every depth.
     *
     * @param value s m_u/k_B
     */
    record Entropy(double value) implements ScaleAnchor {
        @Override
        public StarRequestException.Component component() {
            return StarRequestException.Component.entropy;
        }

        @Override
        public void check(StarRequestRules rules, double mass) {
            rules.entropy(value);
        }
    }
}
