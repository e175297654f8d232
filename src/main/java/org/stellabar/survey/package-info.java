/**
 * Many computations at once: equation-of-state grids over the ρ–T (or P–T) plane and mass
 * sequences of standard models (audits of profiles from other codes live in
 * {@code org.stellabar.audit}). Work is split into index ranges
 * that are independent of each other, so results are identical however many threads run them
 * (and a range can be given to one job of a cluster job array).
 *
 * <p>{@link org.stellabar.survey.MassSequence} runs the Eddington standard model
 * ({@link org.stellabar.structure.EddingtonStandardModel}) over a log-spaced range of masses and
 * returns β, 1 − β, L/L_Edd, Γ1 − 4/3 and the onset of the post-Newtonian instability
 * (Chandrasekhar 1964, ApJ 140, 417) as one {@link org.stellabar.table.Table}. Each row depends
 * on its index only, so a sub-range can run as one task of a cluster job array and the pieces
 * concatenate to the whole. CGS inside; tables carry solar units where a column says so.
 *
 * <p><b>API and internal.</b> The types of this package that {@link org.stellabar.api} lists are
 * part of the API; the others are internal and may change between versions.
 */
package org.stellabar.survey;
