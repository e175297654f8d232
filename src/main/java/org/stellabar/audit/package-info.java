/**
 * Audits of stellar profiles from other codes against a fully ionized ideal gas plus black-body
 * radiation, hydrostatic equilibrium and mass continuity. CGS throughout; units exist only where
 * a file's columns are read.
 *
 * <h2>The way through</h2>
 * <ol>
 *   <li>A {@link org.stellabar.audit.ProfileSource} gives the file's headings and cells:
 *       {@link org.stellabar.audit.CsvProfileSource} for CSV read by
 *       {@code org.stellabar.output.CsvTableReader}, {@link org.stellabar.audit.ColumnarProfileSource}
 *       for binary tables (FITS).</li>
 *   <li>{@link org.stellabar.audit.ProfileLoader} maps columns to quantities
 *       ({@link org.stellabar.audit.ColumnMapping}, {@link org.stellabar.audit.ProfileQuantity}),
 *       converts units, checks every row (bad rows named by their data-row number), decides the
 *       order of the shells, sets each shell's composition
 *       ({@link org.stellabar.audit.CompositionPolicy}) and recognises a vacuum surface row:
 *       a {@link org.stellabar.audit.LoadedProfile} holding a centre-first
 *       {@link org.stellabar.audit.Profile}.</li>
 *   <li>{@link org.stellabar.audit.ProfileAuditor} evaluates the equation of state per
 *       shell, the pressure and Γ1 mismatches and the residuals
 *       ({@link org.stellabar.audit.ShellAudit}), and the star's integrals, stability
 *       (through {@code org.stellabar.structure.StabilityAnalysis}) and standard-model β
 *       ({@link org.stellabar.audit.StarAudit}).</li>
 *   <li>{@link org.stellabar.audit.AuditTables} presents the result as a per-shell table
 *       (columns declared in {@link org.stellabar.audit.AuditColumns}),
 *       {@link org.stellabar.audit.AuditSummary} as a summary, {@link org.stellabar.audit.AuditReport}
 *       as Markdown, with typed inputs and every assumption from
 *       {@link org.stellabar.audit.AuditMetadata} and {@link org.stellabar.audit.AuditAssumptions}.
 *       Column units are read through the unit table {@code org.stellabar.physics.Unit}. Nothing
 *       here writes a file.</li>
 * </ol>
 *
 * <h2>Numerical schemes</h2>
 * Derivatives: three-point Lagrange differences on the profile's non-uniform grid, second order
 * ({@link org.stellabar.numerics.ThreePointDerivative}); mass continuity differenced in r³, the
 * hydrostatic residual at r = 0 taken to its limit in r². Integrals: the piecewise-parabola
 * quadrature (fourth order) where abscissae increase strictly, else trapezoids (both
 * {@link org.stellabar.numerics.TabulatedQuadrature}). The same two schemes serve
 * {@code org.stellabar.structure}; neither is repeated here.
 *
 * <p><b>API and internal.</b> The types of this package that {@link org.stellabar.api} lists are
 * part of the API; the others are internal and may change between versions.
 */
package org.stellabar.audit;
