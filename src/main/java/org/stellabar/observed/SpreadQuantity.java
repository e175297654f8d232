package org.stellabar.observed;

import java.util.function.ToDoubleFunction;

/** The quantities whose Monte Carlo spread is reported, each read from an estimate (CGS). */
public enum SpreadQuantity {
    /** Γ_e. */
    GAMMA_E(ObservedEstimate::eddingtonFactor),
    /** R [cm]. */
    RADIUS(ObservedEstimate::radius),
    /** log10 g [cm/s²]. */
    LOG_G(ObservedEstimate::logGravity),
    /** M [g]. */
    MASS(ObservedEstimate::mass),
    /** β of the standard model. */
    BETA(e -> e.standard().beta()),
    /** 1 − β of the standard model. */
    ONE_MINUS_BETA(e -> e.standard().oneMinusBeta()),
    /** Γ_e/(1 − β). */
    GAMMA_E_OVER_ONE_MINUS_BETA(ObservedEstimate::eddingtonFactorOverModel),
    /** ρ_c [g/cm3]. */
    RHO_C(e -> e.standard().centralDensity()),
    /** T_c [K]. */
    T_C(e -> e.standard().centralTemperature()),
    /** P_c [dyn/cm2]. */
    P_C(e -> e.standard().centralPressure()),
    /** ⟨Γ1⟩. */
    GAMMA1_MEAN(e -> e.standard().stability().meanGamma1()),
    /** ⟨Γ1⟩ − 4/3. */
    NEWTONIAN_MARGIN(e -> e.standard().stability().newtonianMargin()),
    /** ⟨Γ1⟩ − 4/3 − K·2GM/(Rc²). */
    GR_MARGIN(e -> e.standard().stability().relativisticMargin());

    private final ToDoubleFunction<ObservedEstimate> value;

    SpreadQuantity(ToDoubleFunction<ObservedEstimate> value) {
        this.value = value;
    }

    /**
     * @param estimate one estimate
     * @return this quantity of it
     */
    public double of(ObservedEstimate estimate) {
        return value.applyAsDouble(estimate);
    }
}
