package org.stellabar.structure;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * What a {@link StarModelBuilder} makes of a request.
 *
 * @param structure the star's structure
 * @param stability its dynamical stability estimate
 * @param luminosityRatio L/L_Edd: 1 − β for the standard model; for kinds that do not fix L, the
 *     standard-model value for the same M and μ (see {@code luminosityRatioMeaning})
 * @param luminosityRatioMeaning one line saying which of the two {@code luminosityRatio} is
 * @param polytropeIndex n when the structure is a polytrope (the profile then compares ∇_ad with
 *     1/(n+1)), else empty
 * @param assumptions the kind's own assumptions, one line each, for metadata
 */
public record BuiltStar(StarStructure structure, StabilityResult stability, double luminosityRatio,
        String luminosityRatioMeaning, OptionalDouble polytropeIndex, List<String> assumptions) {

    /**
     * Canonical constructor: no component may be null; copies collections in.
     *
     * @param structure the star's structure
     * @param stability its dynamical stability estimate
     * @param luminosityRatio L/L_Edd: 1 − β for the standard model; for kinds that do not fix L, the
     *        standard-model value for the same M and μ (see {@code luminosityRatioMeaning})
     * @param luminosityRatioMeaning one line saying which of the two {@code luminosityRatio} is
     * @param polytropeIndex n when the structure is a polytrope (the profile then compares ∇_ad with
     *        1/(n+1)), else empty
     * @param assumptions the kind's own assumptions, one line each, for metadata
     */
    public BuiltStar {
        Objects.requireNonNull(structure, "structure");
        Objects.requireNonNull(stability, "stability");
        Objects.requireNonNull(luminosityRatioMeaning, "luminosityRatioMeaning");
        Objects.requireNonNull(polytropeIndex, "polytropeIndex");
        assumptions = List.copyOf(assumptions);
    }
}
