/**
 * Stellar structure under the standard simple models: Lane-Emden polytropes, Eddington's standard
 * model, and the dynamical stability of any spherical star.
 *
 * <h2>Polytropes</h2>
 * A polytrope P = Kρ^(1+1/n) in hydrostatic equilibrium obeys the Lane-Emden equation
 * θ'' + (2/ξ)θ' + θⁿ = 0 with ρ = ρ_c θⁿ, r = αξ (Chandrasekhar 1939, <i>An Introduction to the
 * Study of Stellar Structure</i>, ch. IV; Horedt 2004, <i>Polytropes</i>). Start with
 * {@link org.stellabar.structure.LaneEmdenSolver#solve(double)}: it returns a
 * {@link org.stellabar.structure.LaneEmdenSolution} with ξ₁, θ'(ξ₁), ω_n, ρ_c/ρ̄, W_n, N_n, the
 * binding-energy coefficient 3/(5−n) and the relativistic structure constant K_n, and a dense
 * θ(ξ) from which {@link org.stellabar.structure.LaneEmdenProfile}s and tables are sampled.
 * Indices 0 ≤ n &lt; 5 have a finite radius; n = 5 (θ = (1+ξ²/3)^(−1/2)) and above do not, and
 * are refused with a message saying so.
 *
 * <h2>Eddington's standard model</h2>
 * {@link org.stellabar.structure.EddingtonStandardModel}: an n = 3 polytrope with β = P_gas/P the
 * same everywhere, β from Eddington's quartic 1 − β = Cμ⁴β⁴(M/M☉)² solved without cancellation
 * at either end of 10⁻² to 10⁸ M☉, central ρ, P, T, L/L_Edd = 1 − β
 * ({@link org.stellabar.structure.StandardModelState}).
 *
 * <h2>Stability</h2>
 * {@link org.stellabar.structure.StabilityAnalysis} takes any
 * {@link org.stellabar.structure.RadialProfile} (r, m, ρ, P, Γ1) and returns a
 * {@link org.stellabar.structure.StabilityResult}: the pressure-weighted ⟨Γ1⟩ against 4/3 (Ledoux
 * 1945), the post-Newtonian criterion ⟨Γ1⟩ − 4/3 &gt; K·2GM/(Rc²) (Chandrasekhar 1964, ApJ 140,
 * 417) with K from the profile's own integrals, the radius and central density at the onset of
 * instability, and a verdict (stable / marginal / unstable, marginal meaning within 5 % of the
 * critical radius). Integrals over tabulated profiles use
 * {@link org.stellabar.numerics.TabulatedQuadrature}.
 *
 * <h2>Physical stars</h2>
 * {@link org.stellabar.structure.StarBuilder#build} turns a
 * {@link org.stellabar.structure.StarRequest} (mass, radius, composition, kind, index, points …)
 * into a {@link org.stellabar.structure.StarModel}: a {@link org.stellabar.structure.StarSummary}
 * (central state, stability, L_Edd, L/L_Edd, virial check) and a profile table
 * ({@link org.stellabar.structure.ProfileTable}: r, m, ρ, P, P_gas, P_rad, T, β, 1 − β, Γ1, ∇_ad,
 * c_s; for polytropes also the polytropic gradient and a convective flag).
 * {@link org.stellabar.structure.ScaledPolytropeStar} scales a Lane-Emden solution to M and R and
 * finds T at every point from the mixed EOS (the standard model is its n = 3 case);
 * {@link org.stellabar.structure.IsentropicStar} solves hydrostatic equilibrium on one adiabat of
 * the mixture ({@link org.stellabar.structure.IsentropicStructureSolver}), shooting on the central
 * β for the mass. {@link org.stellabar.structure.StarModelSummary} presents a model for the
 * writers.
 *
 * <p>Units: CGS for physical quantities; Lane-Emden quantities are dimensionless. Every class is
 * immutable or stateless and safe to share between threads. Nothing here reads or writes files.
 */
package org.stellabar.structure;
