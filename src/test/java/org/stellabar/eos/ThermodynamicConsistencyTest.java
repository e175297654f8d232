package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.eos.Samples.near;
import static org.stellabar.eos.Samples.relative;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Thermodynamic identities over seeded log-uniform samples of ρ ∈ [1e-12, 1e9] g/cm3 ×
 * T ∈ [1e3, 1e10] K, the derivatives taken by finite differences of the public API only.
 *
 * <p>Derivatives are central differences in ln ρ or ln T with step h and h/2, combined by
 * Richardson extrapolation, D = (4D(h/2) − D(h))/3, which removes the h² term. With h = 1e-3 the
 * remaining truncation is of order h⁴ f⁽⁵⁾/f′ ≲ 1e-12 × 4⁴ (P_rad ∝ T⁴ is the steepest term), and
 * rounding contributes about ε|f|/(h|f′|) ≲ 1e-13 × 100 (|s|/|∂s/∂ln ρ| reaches about 100):
 * together well below the 1e-7 required, which any formula error (all of order one) exceeds.
 */
class ThermodynamicConsistencyTest {

    private static final double STEP = 1e-3;
    private static final double FD_TOLERANCE = 1e-7;
    /** Identities between fields of one state: a handful of roundings, 1e-13 allows about 500 ulp. */
    private static final double IDENTITY_TOLERANCE = 1e-13;

    /**
     * x ∂f/∂x = ∂f/∂ln x by Richardson-extrapolated central differences in ln x. The points are
     * x e^{±h}, x e^{±h/2} (one rounding each) rather than exp(ln x ± h), whose argument of size
     * up to 30 would carry an error of 30 ulp into the step.
     */
    private static double derivative(DoubleUnaryOperator f, double x, double h) {
        double coarse = (f.applyAsDouble(x * Math.exp(h)) - f.applyAsDouble(x * Math.exp(-h))) / (2 * h);
        double fine = (f.applyAsDouble(x * Math.exp(h / 2)) - f.applyAsDouble(x * Math.exp(-h / 2))) / h;
        return (4 * fine - coarse) / 3;
    }

    private static List<double[]> points(Composition c, long seed) {
        return Samples.plane(seed, c.X() == 0.7 ? 1000 : 250);
    }

    @Test
    void maxwellRelation() {
        // (∂s/∂ρ)_T = −(1/ρ²)(∂P/∂T)_ρ, i.e. (∂s/∂ln ρ)_T = −(∂P/∂ln T)_ρ/(ρT)
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            for (double[] p : points(c, 101)) {
                double rho = p[0];
                double t = p[1];
                double dsDlnRho = derivative(x -> eos.state(x, t).s(), rho, STEP);
                double dpDlnT = derivative(x -> eos.state(rho, x).P(), t, STEP);
                relative(-dpDlnT / (rho * t), dsDlnRho, FD_TOLERANCE, at("Maxwell", rho, t));
            }
        }
    }

    @Test
    void energyEquation() {
        // (∂u/∂ρ)_T = (P − T(∂P/∂T)_ρ)/ρ², i.e. (∂u/∂ln ρ)_T = (P − (∂P/∂ln T)_ρ)/ρ. Where gas
        // dominates both sides are tiny differences of terms of size P/ρ (u of the ideal gas does
        // not depend on ρ): there the error is measured on the scale P/ρ of the cancelling terms.
        // Where 1 − β ≥ 1e-4 the left side is at least 3e-4 P/ρ, rounding costs at most about
        // 3ε/(h(1 − β)) ≈ 3e-9 of it, and the check is relative.
        int relativeChecks = 0;
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            for (double[] p : points(c, 202)) {
                double rho = p[0];
                double t = p[1];
                EosState s = eos.state(rho, t);
                double duDlnRho = derivative(x -> eos.state(x, t).u(), rho, STEP);
                double dpDlnT = derivative(x -> eos.state(rho, x).P(), t, STEP);
                double expected = (s.P() - dpDlnT) / rho;
                if (s.oneMinusBeta() >= 1e-4) {
                    relative(expected, duDlnRho, FD_TOLERANCE, at("energy equation", rho, t));
                    relativeChecks++;
                } else {
                    near(expected, duDlnRho, FD_TOLERANCE, s.P() / rho, at("energy equation", rho, t));
                }
            }
        }
        assertTrue(relativeChecks > 300, "enough radiation-bearing points: " + relativeChecks);
    }

    @Test
    void heatCapacityAtConstantVolume() {
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            for (double[] p : points(c, 303)) {
                double rho = p[0];
                double t = p[1];
                double duDlnT = derivative(x -> eos.state(rho, x).u(), t, STEP);
                relative(duDlnT / t, eos.state(rho, t).cV(), FD_TOLERANCE, at("c_V", rho, t));
                // also T(∂s/∂T)_ρ, the same heat capacity from the entropy
                double dsDlnT = derivative(x -> eos.state(rho, x).s(), t, STEP);
                relative(dsDlnT, eos.state(rho, t).cV(), FD_TOLERANCE, at("c_V from s", rho, t));
            }
        }
    }

    @Test
    void heatCapacityAtConstantPressure() {
        // c_P = (∂h/∂T)_P with h = u + P/ρ, along the isobar through EosInversion. Near β → 0 the
        // isobar ends at P = aT⁴/3 a distance β/4 away in ln T, so the step is scaled by β (and the
        // sample kept at β ≥ 1e-3, where ρ(P, T) keeps all but log10(1/β) digits).
        int checked = 0;
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            EosInversion inversion = new EosInversion(eos);
            for (double[] p : points(c, 404)) {
                EosState s = eos.state(p[0], p[1]);
                if (s.beta() < 1e-3) {
                    continue;
                }
                double h = STEP * Math.min(1.0, s.beta());
                double dhDlnT = derivative(x -> {
                    EosState on = inversion.atPressureTemperature(s.P(), x);
                    return on.u() + on.P() / on.rho();
                }, s.T(), h);
                relative(dhDlnT / s.T(), s.cP(), FD_TOLERANCE, at("c_P", s.rho(), s.T()));
                checked++;
            }
        }
        assertTrue(checked > 800, "checked " + checked);
    }

    @Test
    void responseFunctions() {
        // χ_ρ and χ_T are logarithmic derivatives of order one; where β ≪ ε the gas pressure is
        // below the rounding of P and (∂ln P/∂ln ρ) = β is invisible to a difference, so the
        // error is measured absolutely, i.e. relative to the order-one scale of these exponents
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            for (double[] p : points(c, 505)) {
                double rho = p[0];
                double t = p[1];
                EosState s = eos.state(rho, t);
                double chiRho = derivative(x -> Math.log(eos.state(x, t).P()), rho, STEP);
                double chiT = derivative(x -> Math.log(eos.state(rho, x).P()), t, STEP);
                near(chiRho, s.chiRho(), FD_TOLERANCE, 1.0, at("chi_rho", rho, t));
                near(chiT, s.chiT(), FD_TOLERANCE, 1.0, at("chi_T", rho, t));
            }
        }
    }

    @Test
    void adiabaticExponentsAlongAnAdiabat() {
        // hold s fixed through EosInversion.atDensityEntropy: Γ1 = (∂ln P/∂ln ρ)_s,
        // Γ3 − 1 = (∂ln T/∂ln ρ)_s, ∇_ad = (∂ln T/∂ln P)_s. The inversion returns T to about
        // 1e-14, which the step turns into 1e-11 in the derivative. States whose Sackur–Tetrode
        // entropy is not positive (deep in the degenerate corner, outside the model) are skipped.
        int checked = 0;
        int skipped = 0;
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            EosInversion inversion = new EosInversion(eos);
            for (double[] p : points(c, 606)) {
                EosState s = eos.state(p[0], p[1]);
                if (s.s() <= 0) {
                    skipped++;
                    continue;
                }
                double gamma1 = derivative(x -> Math.log(inversion.atDensityEntropy(x, s.s()).P()), s.rho(),
                        STEP);
                double gamma3m1 = derivative(x -> Math.log(inversion.atDensityEntropy(x, s.s()).T()),
                        s.rho(), STEP);
                String where = at("adiabat", s.rho(), s.T());
                relative(gamma1, s.Gamma1(), FD_TOLERANCE, "Gamma1 " + where);
                relative(gamma3m1, s.Gamma3() - 1.0, FD_TOLERANCE, "Gamma3 - 1 " + where);
                relative(gamma3m1 / gamma1, s.nablaAd(), FD_TOLERANCE, "nabla_ad " + where);
                checked++;
            }
        }
        assertTrue(checked > 1200 && skipped < checked / 4, "checked " + checked + ", skipped " + skipped);
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void identitiesBetweenFieldsOfOneState(long seed) {
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            for (double[] p : Samples.plane(seed, 2000)) {
                EosState s = eos.state(p[0], p[1]);
                String where = at("identity", s.rho(), s.T());
                double gamma3m1 = s.Gamma3() - 1.0;
                // Γ1 = χ_ρ + χ_T(Γ3 − 1) (Cox & Giuli 1968, §9.13; KWW 2012 ch. 13)
                relative(s.chiRho() + s.chiT() * gamma3m1, s.Gamma1(), IDENTITY_TOLERANCE, "Gamma1 " + where);
                // c_P/c_V = Γ1/χ_ρ
                relative(s.Gamma1() / s.chiRho(), s.cP() / s.cV(), IDENTITY_TOLERANCE, "c_P/c_V " + where);
                // ∇_ad = (Γ3 − 1)/Γ1 = (Γ2 − 1)/Γ2
                relative(gamma3m1 / s.Gamma1(), s.nablaAd(), IDENTITY_TOLERANCE, "nabla_ad " + where);
                relative((s.Gamma2() - 1.0) / s.Gamma2(), s.nablaAd(), IDENTITY_TOLERANCE, "Gamma2 " + where);
                // δ = χ_T/χ_ρ; β + (1 − β) = 1; P = P_gas + P_rad; c_s² = Γ1 P/ρ
                relative(s.chiT() / s.chiRho(), s.delta(), IDENTITY_TOLERANCE, "delta " + where);
                relative(1.0, s.beta() + s.oneMinusBeta(), IDENTITY_TOLERANCE, "beta sum " + where);
                relative(s.Pgas() + s.Prad(), s.P(), IDENTITY_TOLERANCE, "P " + where);
                relative(s.Gamma1() * s.P() / s.rho(), s.soundSpeed() * s.soundSpeed(), IDENTITY_TOLERANCE,
                        "sound speed " + where);
                // c_P − c_V = P χ_T²/(ρ T χ_ρ): a difference of comparable numbers, hence 1e-12
                relative(s.P() * s.chiT() * s.chiT() / (s.rho() * s.T() * s.chiRho()), s.cP() - s.cV(), 1e-12,
                        "c_P - c_V " + where);
                // f = u − Ts and g = f + P/ρ, on the scale of their terms
                near(s.u() - s.T() * s.s(), s.f(), IDENTITY_TOLERANCE, s.u() + s.T() * Math.abs(s.s()), "f " + where);
                near(s.f() + s.P() / s.rho(), s.g(), IDENTITY_TOLERANCE,
                        s.u() + s.T() * Math.abs(s.s()) + s.P() / s.rho(), "g " + where);
            }
        }
    }

    private static String at(String what, double rho, double t) {
        return String.format("%s at rho=%.6g g/cm3, T=%.6g K", what, rho, t);
    }
}
