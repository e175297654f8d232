/**
 * The equation of state of a fully ionized ideal gas of ions and electrons mixed with black-body
 * radiation.
 *
 * <p>All quantities are CGS and per unit mass unless their name says otherwise. The gas is
 * classical and non-degenerate, each ion species and the electrons obeying the Sackur–Tetrode
 * entropy; the radiation is a photon gas in equilibrium at the gas temperature, with zero
 * chemical potential. The closed forms for the mixture's response functions and adiabatic
 * exponents are those of Chandrasekhar (1939, <i>An Introduction to the Study of Stellar
 * Structure</i>, ch. II) and Cox &amp; Giuli (1968, <i>Principles of Stellar Structure</i>, §9).
 *
 * <p>Entry points: {@link org.stellabar.eos.Composition} for the mixture,
 * {@link org.stellabar.eos.GasRadiationEos} for a state at (ρ, T) and for many states into
 * primitive arrays, {@link org.stellabar.eos.EosInversion} for states given by other pairs of
 * variables. Every state carries the {@link org.stellabar.eos.ValidityWarning}s of the regime it
 * lies in, because the idealized physics fails quietly otherwise.
 *
 * <p><b>API and internal.</b> The types of this package that {@link org.stellabar.api} lists are
 * part of the API; the others are internal and may change between versions.
 */
package org.stellabar.eos;
