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
 * A star request is one validated value: {@link org.stellabar.structure.StarRequest}, a sealed type
 * with one record per {@link org.stellabar.structure.StarKind}
 * ({@link org.stellabar.structure.StandardModelRequest}, {@link org.stellabar.structure.PolytropeRequest},
 * {@link org.stellabar.structure.IsentropicRequest} with its {@link org.stellabar.structure.ScaleAnchor}).
 * Command-line options and scenario files both describe a star as a
 * {@link org.stellabar.structure.StarDraft}, whose {@code toRequest()} decides which inputs a kind
 * takes and applies the value rules of {@link org.stellabar.structure.StarRequestRules}, reporting
 * every violation at once, each tagged with the input it is about.
 *
 * <p>{@link org.stellabar.structure.StarBuilder#build} hands a request to its kind's
 * {@link org.stellabar.structure.StarModelBuilder} ({@link org.stellabar.structure.StandardModelBuilder},
 * {@link org.stellabar.structure.PolytropeStarBuilder}, {@link org.stellabar.structure.IsentropicStarBuilder})
 * and returns a {@link org.stellabar.structure.StarModel}: its
 * {@link org.stellabar.structure.StarHeadline} (central state, stability, L_Edd, L/L_Edd, virial
 * check) and a profile table ({@link org.stellabar.structure.ProfileTable}: r, m, ρ, P, P_gas,
 * P_rad, T, β, 1 − β, Γ1, ∇_ad, c_s; for polytropes also the polytropic gradient and a convective
 * flag). {@link org.stellabar.structure.ScaledPolytropeStar} scales a Lane-Emden solution to M and
 * R and finds T at every point from the mixed EOS (the standard model is its n = 3 case);
 * {@link org.stellabar.structure.IsentropicStarFinder} finds the
 * {@link org.stellabar.structure.IsentropicStar} on one adiabat of the mixture
 * ({@link org.stellabar.structure.IsentropicStructureSolver}), shooting on the central β for the
 * mass. {@link org.stellabar.structure.StarSchema} declares the headline fields once, with their
 * units, and presents one star as a summary or many as a table.
 *
 * <p>Units: CGS for physical quantities; Lane-Emden quantities are dimensionless. Every class is
 * immutable or stateless and safe to share between threads. Nothing here reads or writes files.
 *
 * <p><b>API and internal.</b> The types of this package that {@link org.stellabar.api} lists are
 * part of the API; the others are internal and may change between versions.
 */
package org.stellabar.structure;
