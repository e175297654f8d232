/**
 * Validation against the outside world: every published, recalled, computed and closed-form
 * reference value of the project, compared with what stellabar computes, in one report anyone can
 * rerun ({@code stellabar validate}).
 *
 * <p>Reference values live in {@code validation/*.csv} at the top of the project, one table per
 * source or family of checks. Each table's '#' header names its source exactly and says how the
 * values were obtained and what tolerance the printed digits allow; each row carries its own
 * provenance (published, from memory, computed, closed form, common practice). Tables of computed
 * values sit beside the scripts that computed them ({@code validation/scripts}). Maven packages
 * the same files into the jar, so the command also works outside a checkout
 * ({@link org.stellabar.validation.ReferenceSource}).
 *
 * <p>Each {@link org.stellabar.validation.CheckFamily} reads its tables, computes our value for
 * each row with the library (equation of state, Lane-Emden solver, standard model) and compares;
 * {@link org.stellabar.validation.ThermodynamicIdentityFamily} checks identities by finite
 * differences instead. {@link org.stellabar.validation.MarkdownReport} renders the results
 * deterministically and {@link org.stellabar.validation.ReportWriter} writes the report with its
 * charts. Units: CGS, as everywhere in stellabar.
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.validation;
