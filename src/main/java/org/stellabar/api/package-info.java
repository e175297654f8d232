/**
 * The API: what scripts and other codes may call and hold on to. Everything public outside this
 * list is internal: public only because Java packages need it, and free to change between
 * versions. The command line uses the same classes, so the API gives the same numbers as the tool.
 *
 * <h2>Why a documented list rather than a module descriptor</h2>
 * The records the API returns live beside the physics that builds them ({@code eos},
 * {@code structure}, {@code audit} …), in packages that also hold internal classes, so exporting
 * packages would export the internals too, and moving the records would change every import of
 * the tree. A module's {@code exports} also hold only on the module path, while most embedding
 * (scripts, notebooks, build tools' default class path) uses the class path, where they enforce
 * nothing. So the boundary is this list: the Javadoc pages put {@code org.stellabar.api} in a
 * group of its own, every other package's description says what of it is API, and
 * {@code ApiBoundaryTest} checks that this list is exactly the set of stellabar types the entry
 * points take or return (through record components, public getters and sealed subtypes).
 *
 * <h2>Entry points</h2>
 * {@link org.stellabar.api.Stellabar}: one static method per job. Stars take masses in M☉ and
 * radii in R☉ (IAU 2015 B3 nominal values), the equation of state takes CGS; every result is in
 * CGS, as each record states. A request that cannot be answered throws
 * {@link org.stellabar.physics.BadInputException} (one line: the input, its value, what is
 * allowed); an iteration that exhausts its bound throws
 * {@link org.stellabar.physics.ConvergenceException}.
 *
 * <h2>Types the entry points take and return</h2>
 * <ul>
 *   <li>Equation of state: {@link org.stellabar.eos.Composition}, {@link org.stellabar.eos.Electrons},
 *       {@link org.stellabar.eos.EosState},
 *       {@link org.stellabar.eos.ValidityWarning}, {@link org.stellabar.eos.ValidityWarning.Regime},
 *       {@link org.stellabar.physics.Dimension}.</li>
 *   <li>Polytropes and stars: {@link org.stellabar.structure.LaneEmdenSolution},
 *       {@link org.stellabar.structure.LaneEmdenCurve}, {@link org.stellabar.structure.BetaSolution},
 *       {@link org.stellabar.structure.StarModel}, {@link org.stellabar.structure.StarHeadline},
 *       {@link org.stellabar.structure.StarStructure}, {@link org.stellabar.structure.StarProfile},
 *       {@link org.stellabar.structure.RadialProfile}, {@link org.stellabar.structure.StabilityResult},
 *       {@link org.stellabar.structure.StabilityVerdict}, {@link org.stellabar.structure.StarKind}, the
 *       requests {@link org.stellabar.structure.StarRequest},
 *       {@link org.stellabar.structure.StandardModelRequest},
 *       {@link org.stellabar.structure.PolytropeRequest},
 *       {@link org.stellabar.structure.IsentropicRequest}, with
 *       {@link org.stellabar.structure.ScaleAnchor}, {@link org.stellabar.structure.ScaleAnchor.Radius},
 *       {@link org.stellabar.structure.ScaleAnchor.CentralTemperature},
 *       {@link org.stellabar.structure.ScaleAnchor.Entropy} and
 *       {@link org.stellabar.structure.StarRequestException.Component}.</li>
 *   <li>Sequences: {@link org.stellabar.survey.SequenceRow}.</li>
 *   <li>Audits: {@link org.stellabar.audit.ProfileAudit}, {@link org.stellabar.audit.ShellAudit},
 *       {@link org.stellabar.audit.StarAudit}, {@link org.stellabar.audit.StarTotals},
 *       {@link org.stellabar.audit.FailureZone}, {@link org.stellabar.audit.LoadedProfile},
 *       {@link org.stellabar.audit.Profile}, {@link org.stellabar.audit.MappedColumn},
 *       {@link org.stellabar.audit.ProfileQuantity}, {@link org.stellabar.audit.BadRow},
 *       {@link org.stellabar.audit.RowProblem}, {@link org.stellabar.audit.RowProblem.Kind},
 *       {@link org.stellabar.audit.SurfacePoint}.</li>
 *   <li>Tables (a star's profile, an audit's input): {@link org.stellabar.table.Table},
 *       {@link org.stellabar.table.Column}, {@link org.stellabar.table.NumberColumn},
 *       {@link org.stellabar.table.TextColumn}, {@link org.stellabar.table.Quantity},
 *       {@link org.stellabar.table.Metadata}, {@link org.stellabar.table.Inputs},
 *       {@link org.stellabar.table.Input}, {@link org.stellabar.table.NumberInput},
 *       {@link org.stellabar.table.IntegerInput}, {@link org.stellabar.table.TextInput}.</li>
 * </ul>
 */
package org.stellabar.api;
