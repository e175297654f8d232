/**
 * Observed stars: per star of a catalogue (luminosity, effective temperature, perhaps a mass, a
 * radius, a surface gravity and a hydrogen fraction) the radius, surface gravity, Eddington
 * luminosity, electron-scattering Eddington factor and the estimates of Eddington's standard
 * model for that mass and radius. Knows nothing of files: catalogues are read in {@code cli} and
 * {@code pipeline}, results end in {@code table}.
 *
 * <h2>Formulae</h2>
 * <ul>
 * <li>Stefan–Boltzmann: L = 4πR²σT_eff⁴, any two fix the third ({@link StefanBoltzmann}).</li>
 * <li>Surface gravity g = GM/R², log g = log10(g [cm/s²]); M = gR²/G where only log g is given.</li>
 * <li>Eddington factor Γ_e = L/L_Edd = κ_es L/(4πGMc), with the Thomson opacity of a fully ionized
 *     mixture κ_es = σ_T n_e/ρ = σ_T (1 + X)/(2 m_u) ≈ 0.2(1 + X) cm²/g
 *     (Kippenhahn, Weigert &amp; Weiss 2012, §17.2), taken from
 *     {@link org.stellabar.structure.EddingtonStandardModel#electronScatteringOpacity}.</li>
 * <li>Standard model of mass M (β from Eddington's quartic) scaled to the star's R: central ρ, T,
 *     P, ⟨Γ1⟩ and the stability margins, all from
 *     {@link org.stellabar.structure.EddingtonStandardModel#model}; nothing is recomputed here.</li>
 * <li>Mass from luminosity: the M at which the standard model's L = (1 − β(M)) L_Edd(M) equals the
 *     observed L ({@link MassFromLuminosity}), a model-dependent estimate.</li>
 * </ul>
 *
 * <p>A star that cannot be estimated (a missing value, an impossible combination, L above L_Edd,
 * a mass outside the standard model's range) is not an exception: its {@link StarOutcome} carries
 * the {@link StarProblem}s with its row number, and the other stars are estimated as usual.
 * Uncertainties are propagated by Monte Carlo ({@link UncertaintyPropagation}). CGS throughout.
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.observed;
