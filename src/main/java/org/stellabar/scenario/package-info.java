/**
 * Scenario files: a set of stars to build and write in one run, read from TOML with every mistake
 * reported at once, each on one line with its file, line and column.
 *
 * <h2>Reading</h2>
 * {@link org.stellabar.scenario.ScenarioReader#read(java.nio.file.Path)} and
 * {@link org.stellabar.scenario.ScenarioReader#read(String, String)} return a
 * {@link org.stellabar.scenario.Scenario} of {@link org.stellabar.scenario.ScenarioStar}s, or throw one
 * {@link org.stellabar.scenario.ScenarioException} (a {@code BadInputException}, exit status 2)
 * whose message has one line per problem:
 * <pre>
 * demo.toml:14:8: star[3].mass = "45 Msol": unit 'Msol' is unknown; a mass accepts g, kg, Msun
 * demo.toml:17:1: star[3].radus: unknown key; did you mean 'radius'? the keys of a star are ...
 * </pre>
 * Stars count from 1 in keys ({@code star[1]} is the first {@code [[star]]} table). A problem with
 * a value points at the value; an unknown or misplaced key at the key; a missing key at the start
 * of its table. The list is also available as {@link org.stellabar.scenario.ScenarioError}
 * records with a {@link org.stellabar.scenario.ScenarioError.Kind}. TOML syntax errors (positions
 * from the tomlj parser) are reported on their own, since a file that did not parse whole would
 * add spurious follow-up errors.
 * {@link org.stellabar.scenario.ScenarioReader#builtInDemo()} reads the demo cluster packaged in
 * the jar from {@code profiles/demo-cluster.toml}.
 *
 * <h2>Format</h2>
 * All keys are lower case except the mass fractions X, Y, Z; unknown keys are errors.
 * <table>
 * <caption>Top level</caption>
 * <tr><th>key</th><th>type</th><th>meaning</th><th>default</th></tr>
 * <tr><td>name</td><td>string</td><td>scenario name, names the output folder</td>
 *     <td>the file name without extension</td></tr>
 * <tr><td>description</td><td>string</td><td>free text</td><td>""</td></tr>
 * <tr><td>chart_formats</td><td>array of "png", "svg", "pdf"</td><td>chart image formats</td>
 *     <td>["png", "svg"]</td></tr>
 * <tr><td>notebook</td><td>boolean</td><td>also write a notebook reloading the profiles</td>
 *     <td>true</td></tr>
 * <tr><td>[defaults]</td><td>table</td><td>composition, points, outputs, charts for every star
 *     that does not give its own</td><td>see below</td></tr>
 * <tr><td>[[star]]</td><td>array of tables</td><td>one per star, at least one</td><td></td></tr>
 * </table>
 * <table>
 * <caption>A star</caption>
 * <tr><th>key</th><th>type</th><th>meaning</th><th>default</th></tr>
 * <tr><td>name</td><td>string</td><td>required; unique ignoring case; 1–64 of A–Z a–z 0–9 space
 *     . _ + - (it names files)</td><td></td></tr>
 * <tr><td>kind</td><td>"standard" | "polytrope" | "isentropic"</td><td>the model
 *     ({@link org.stellabar.structure.StarKind})</td><td>"standard"</td></tr>
 * <tr><td>mass</td><td>quantity (mass)</td><td>required, positive</td><td></td></tr>
 * <tr><td>radius</td><td>quantity (length)</td><td>required for standard and polytrope</td>
 *     <td></td></tr>
 * <tr><td>central_temperature</td><td>quantity (temperature)</td><td>isentropic only</td>
 *     <td></td></tr>
 * <tr><td>entropy_per_baryon</td><td>number, in k_B</td><td>isentropic only</td><td></td></tr>
 * <tr><td>index</td><td>number in [0, 5)</td><td>polytrope only, required there</td><td></td></tr>
 * <tr><td>composition</td><td>table</td><td>replaces the default composition</td>
 *     <td>[defaults] or X = 0.70, Z = 0.02</td></tr>
 * <tr><td>points</td><td>integer in [3, 100000]</td><td>profile points</td>
 *     <td>[defaults] or 400</td></tr>
 * <tr><td>outputs</td><td>array of "csv", "fits", "json"</td><td>profile files; [] for none</td>
 *     <td>[defaults] or ["csv"]</td></tr>
 * <tr><td>charts</td><td>array of "structure", "support", "exponents", "gradients"</td>
 *     <td>chart groups ({@link org.stellabar.scenario.ChartGroup}); [] for none</td>
 *     <td>[defaults] or all four</td></tr>
 * <tr><td>note</td><td>string</td><td>free text shown with the results</td><td>""</td></tr>
 * </table>
 * An isentropic star takes exactly one of radius, central_temperature and entropy_per_baryon;
 * standard and polytropic stars are fixed by mass and radius alone.
 *
 * <p>A <em>quantity</em> is a TOML number, taken as CGS (g, cm, K), or a string with a unit as
 * read by {@link org.stellabar.physics.Units#parse}: {@code "40 Msun"}, {@code "12 Rsun"},
 * {@code "3.5e7 K"}, {@code "35 MK"}, {@code "2e31 kg"}, {@code "6e6 km"}.
 *
 * <p>A <em>composition</em> is a table with two or three of the mass fractions {@code X},
 * {@code Y}, {@code Z} (each in [0, 1]; the third is derived; three must add up to 1 within
 * 1e-9), or {@code mu} alone (in [0.5, 2]); {@code metal_mass_number} (≥ 2, or 0) counts metal
 * ions with the mass fractions (see {@link org.stellabar.eos.Composition}). A star's composition
 * replaces the default as a whole; the keys are not merged.
 *
 * <pre>
 * name = "two-stars"
 * [defaults]
 * composition = { X = 0.70, Z = 0.02 }
 *
 * [[star]]
 * name = "Vesper"
 * mass = "40 Msun"
 * radius = "10 Rsun"
 *
 * [[star]]
 * name = "Orrin"
 * kind = "polytrope"
 * index = 1.5
 * mass = "15 Msun"
 * radius = "6 Rsun"
 * outputs = ["csv", "fits"]
 * </pre>
 *
 * <p>This package checks input only; it computes no physics. Values are CGS throughout.
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.scenario;
