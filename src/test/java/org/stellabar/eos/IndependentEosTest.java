package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.eos.Samples.near;
import static org.stellabar.eos.Samples.relative;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.physics.Constants;

/**
 * {@link GasRadiationEos} against {@link ReferenceMixture}, an independent implementation of the
 * same physics, at seeded random points of ρ ∈ [1e-12, 1e9] g/cm3 × T ∈ [1e3, 1e10] K for four
 * compositions; the array path against the record path; 1 − β against exact arithmetic.
 */
class IndependentEosTest {

    /**
     * Both implementations round differently (different constants' last bits, different
     * formulas), each to a few ulp per operation over some 20 operations: 1e-9 leaves a wide
     * margin yet catches any formula error (all are of order one).
     */
    private static final double TOLERANCE = 1e-9;

    @Test
    void agreesWithTheIndependentImplementationAcrossThePlane() {
        int compared = 0;
        for (Composition c : Samples.COMPOSITIONS) {
            GasRadiationEos eos = new GasRadiationEos(c);
            ReferenceMixture reference = ReferenceMixture.of(c);
            for (double[] point : Samples.plane(11 + compared, 500)) {
                double rho = point[0];
                double t = point[1];
                EosState s = eos.state(rho, t);
                ReferenceMixture.Point r = reference.at(rho, t);
                String at = String.format(" at rho=%.4g, T=%.4g, X=%.2f", rho, t, c.X());
                relative(r.P(), s.P(), TOLERANCE, "P" + at);
                relative(r.Pgas(), s.Pgas(), TOLERANCE, "P_gas" + at);
                relative(r.Prad(), s.Prad(), TOLERANCE, "P_rad" + at);
                relative(r.beta(), s.beta(), TOLERANCE, "beta" + at);
                relative(r.oneMinusBeta(), s.oneMinusBeta(), TOLERANCE, "1-beta" + at);
                relative(r.u(), s.u(), TOLERANCE, "u" + at);
                // s is a sum of logarithms that can cancel (degenerate corner): compare on the scale
                // of one k per particle, i.e. 1e-9 k per particle absolute where |s| is small
                double perParticle = r.particlesPerGramTimesK();
                near(r.s(), s.s(), TOLERANCE, Math.max(Math.abs(r.s()), perParticle), "s" + at);
                near(r.sPerBaryon(), s.sPerBaryon(), TOLERANCE, Math.max(Math.abs(r.sPerBaryon()), 1.0),
                        "s per baryon" + at);
                // f = u − Ts and g = f + P/ρ cancel too: scale by the terms
                near(r.f(), s.f(), TOLERANCE, r.u() + t * Math.max(Math.abs(r.s()), perParticle), "f" + at);
                near(r.g(), s.g(), TOLERANCE, r.u() + t * Math.max(Math.abs(r.s()), perParticle) + r.P() / rho,
                        "g" + at);
                relative(r.chiRho(), s.chiRho(), TOLERANCE, "chi_rho" + at);
                relative(r.chiT(), s.chiT(), TOLERANCE, "chi_T" + at);
                relative(r.delta(), s.delta(), TOLERANCE, "delta" + at);
                relative(r.cV(), s.cV(), TOLERANCE, "c_V" + at);
                relative(r.cP(), s.cP(), TOLERANCE, "c_P" + at);
                relative(r.Gamma1(), s.Gamma1(), TOLERANCE, "Gamma1" + at);
                relative(r.Gamma2(), s.Gamma2(), TOLERANCE, "Gamma2" + at);
                relative(r.Gamma3(), s.Gamma3(), TOLERANCE, "Gamma3" + at);
                relative(r.nablaAd(), s.nablaAd(), TOLERANCE, "nabla_ad" + at);
                relative(r.soundSpeed(), s.soundSpeed(), TOLERANCE, "sound speed" + at);
                relative(r.photonDensity(), s.photonDensity(), TOLERANCE, "n_photon" + at);
                relative(r.meanPhotonEnergy(), s.meanPhotonEnergy(), TOLERANCE, "mean photon energy" + at);
                relative(r.photonsPerBaryon(), s.photonsPerBaryon(), TOLERANCE, "photons per baryon" + at);
                assertEquals(c, s.composition());
                assertEquals(rho, s.rho());
                assertEquals(t, s.T());
                compared++;
            }
        }
        assertEquals(2000, compared);
    }

    @Test
    void gasConstantIsBoltzmannOverMuAtomicMass() {
        for (Composition c : Samples.COMPOSITIONS) {
            ReferenceMixture.Point r = ReferenceMixture.of(c).at(1.0, 1.0);
            relative(r.particlesPerGramTimesK(), new GasRadiationEos(c).gasConstant(), 1e-14, "k/(mu m_u)");
        }
    }

    @Nested
    class ArrayPath {

        /** The same formulas in the same order: Java's strict IEEE arithmetic makes them bit-identical. */
        @Test
        void evaluateEqualsStateExactlyWithTheSameWarnings() {
            for (Composition c : Samples.COMPOSITIONS) {
                GasRadiationEos eos = new GasRadiationEos(c);
                List<double[]> points = Samples.plane(77, 3000);
                int n = points.size();
                double[] rho = new double[n];
                double[] t = new double[n];
                for (int i = 0; i < n; i++) {
                    rho[i] = points.get(i)[0];
                    t[i] = points.get(i)[1];
                }
                EosArrays out = new EosArrays(n);
                eos.evaluate(rho, t, 0, n, out);
                int flagged = 0;
                for (int i = 0; i < n; i++) {
                    EosState s = eos.state(rho[i], t[i]);
                    assertEquals(s.P(), out.P[i], 0.0);
                    assertEquals(s.Pgas(), out.Pgas[i], 0.0);
                    assertEquals(s.Prad(), out.Prad[i], 0.0);
                    assertEquals(s.beta(), out.beta[i], 0.0);
                    assertEquals(s.oneMinusBeta(), out.oneMinusBeta[i], 0.0);
                    assertEquals(s.u(), out.u[i], 0.0);
                    assertEquals(s.s(), out.s[i], 0.0);
                    assertEquals(s.Gamma1(), out.Gamma1[i], 0.0);
                    assertEquals(s.Gamma3(), out.Gamma3[i], 0.0);
                    assertEquals(s.nablaAd(), out.nablaAd[i], 0.0);
                    assertEquals(s.soundSpeed(), out.soundSpeed[i], 0.0);
                    int mask = 0;
                    for (ValidityWarning w : s.warnings()) {
                        mask |= w.code().bit();
                    }
                    assertEquals(mask, out.warnings[i], "warning mask at point " + i);
                    flagged += mask != 0 ? 1 : 0;
                }
                assertTrue(flagged > 0 && flagged < n, "the sample holds flagged and clean states");
            }
        }

        @Test
        void evaluateFillsOnlyTheRequestedRange() {
            GasRadiationEos eos = new GasRadiationEos(Composition.of(0.7, 0.28, 0.02));
            double[] rho = {1, 2, 3, 4, 5};
            double[] t = {1e7, 2e7, 3e7, 4e7, 5e7};
            EosArrays out = new EosArrays(5);
            java.util.Arrays.fill(out.P, -1.0);
            eos.evaluate(rho, t, 1, 3, out);
            assertEquals(-1.0, out.P[0]);
            assertEquals(eos.state(2, 2e7).P(), out.P[1], 0.0);
            assertEquals(eos.state(3, 3e7).P(), out.P[2], 0.0);
            assertEquals(-1.0, out.P[3]);
            assertEquals(5, out.size());
        }
    }

    @Nested
    class OneMinusBeta {

        /**
         * 1 − β = P_rad/P against exact decimal arithmetic on the very same double inputs (ρ, T, a
         * and k/(μ m_u)): only the rounding of a few products and one quotient separates them, a
         * few 1e-16 relative, whatever the size of 1 − β. Computed as 1 − β it would lose
         * log10(1/(1−β)) digits: 6 of 16 at 1e-10.
         */
        @ParameterizedTest
        @ValueSource(doubles = {1e-3, 1e-6, 1e-10, 1e-12, 1e-14})
        void exactEvenWhenTiny(double target) {
            GasRadiationEos eos = new GasRadiationEos(Composition.of(0.7, 0.28, 0.02));
            double worstNaive = 0.0;
            for (double t : new double[] {1e3, 3.3e4, 1e6, 1.57e7, 4e8, 1e10}) {
                double pRad = Constants.RADIATION_DENSITY * Math.pow(t, 4) / 3.0;
                // P_rad/P = target when P_gas = P_rad (1 − target)/target
                double rho = pRad * (1.0 - target) / (target * eos.gasConstant() * t);
                EosState s = eos.state(rho, t);
                MathContext mc = MathContext.DECIMAL128;
                BigDecimal bigT = new BigDecimal(t);
                BigDecimal exactPgas = new BigDecimal(eos.gasConstant()).multiply(new BigDecimal(rho)).multiply(bigT);
                BigDecimal exactPrad = new BigDecimal(Constants.RADIATION_DENSITY).multiply(bigT.pow(4))
                        .divide(new BigDecimal(3), mc);
                double exact = exactPrad.divide(exactPgas.add(exactPrad), mc).doubleValue();
                relative(exact, s.oneMinusBeta(), 1e-12, "1-beta at T=" + t);
                relative(target, s.oneMinusBeta(), 1e-9, "the sample hits its target");
                worstNaive = Math.max(worstNaive, Math.abs((1.0 - s.beta()) - exact) / exact);
            }
            if (target <= 1e-10) {
                assertTrue(worstNaive > 1e-12, "1 - beta by subtraction would fail this test: " + worstNaive);
            }
        }
    }
}
