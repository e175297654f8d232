package org.stellabar.pipeline;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.stellabar.audit.LogValuedColumnGuard;
import org.stellabar.audit.ProfileSource;
import org.stellabar.eos.Composition;
import org.stellabar.observed.CatalogueEntry;
import org.stellabar.observed.Measurement;
import org.stellabar.observed.ObservedStar;
import org.stellabar.observed.ProblemKind;
import org.stellabar.observed.StarProblem;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Unit;
import org.stellabar.physics.Units;
import org.stellabar.table.ColumnHeading;

/**
 * Reads a catalogue of observed stars from a table (any {@link ProfileSource}: what
 * {@link AuditRun#source} reads, CSV and FITS today) into {@link ObservedStar}s in CGS. Columns are
 * found under the {@link CatalogueQuantity} keys unless {@code --columns} maps them; units come
 * from {@code --units}, else the file's heading, else the quantity's customary unit; {@code --log}
 * names the quantities whose columns hold log10 of the value in that unit.
 *
 * <p>Problems of the options or the header (an unknown key, a column that does not exist, a bad
 * unit, fewer than two of L, Teff, R) are bad input; problems of one row (an unreadable number, a
 * negative error, an impossible composition) become that row's {@link StarProblem}s.
 */
public final class CatalogueReader {

    /** Where each row is in the file, for messages: row number → "file:line". */
    public record Catalogue(List<CatalogueEntry> entries, Map<Integer, String> locations) {
        /**
         * Canonical constructor: copies collections in.
         *
         * @param entries one entry per data row, in file order
         * @param locations row number → "file:line"
         */
        public Catalogue {
            entries = List.copyOf(entries);
            locations = Map.copyOf(locations);
        }
    }

    private record Column(int index, String name, double factor) {
    }

    private final Map<String, String> columns;
    private final Map<String, String> units;
    private final Set<CatalogueQuantity> logarithmic;
    private final Set<CatalogueQuantity> natural;
    private final Composition defaultComposition;

    /**
     * @param columns key → column name ({@code --columns})
     * @param units key → unit ({@code --units})
     * @param logKeys keys of log10 columns ({@code --log})
     * @param defaultComposition composition of rows without X/Z columns or cells
     * @throws BadInputException for an unknown key, or a unit or log given where none applies
     */
    public CatalogueReader(Map<String, String> columns, Map<String, String> units, List<String> logKeys,
            Composition defaultComposition) {
        this(columns, units, logKeys, List.of(), defaultComposition);
    }

    /**
     * @param columns key → column name ({@code --columns})
     * @param units key → unit ({@code --units})
     * @param logKeys keys of log10 columns ({@code --log})
     * @param lnKeys keys of natural-log columns ({@code --ln}); their errors are in e-folds
     * @param defaultComposition composition of rows without X/Z columns or cells
     * @throws BadInputException for an unknown key, a unit or log given where none applies, or a
     *     key given to both --log and --ln
     */
    public CatalogueReader(Map<String, String> columns, Map<String, String> units, List<String> logKeys,
            List<String> lnKeys, Composition defaultComposition) {
        this.columns = new LinkedHashMap<>(columns);
        this.units = new LinkedHashMap<>(units);
        this.defaultComposition = Objects.requireNonNull(defaultComposition, "defaultComposition");
        for (String key : columns.keySet()) {
            quantity("--columns", key);
        }
        for (Map.Entry<String, String> e : units.entrySet()) {
            CatalogueQuantity q = quantity("--units", e.getKey());
            if (q.dimension().isEmpty()) {
                throw new BadInputException("--units " + e.getKey(), "'" + e.getKey()
                        + "' takes no unit; units are for L, Teff, R and M (their error columns follow them)");
            }
        }
        this.logarithmic = EnumSet.noneOf(CatalogueQuantity.class);
        for (String key : logKeys) {
            CatalogueQuantity q = quantity("--log", key);
            if (q.dimension().isEmpty()) {
                throw new BadInputException("--log " + key, "only L, Teff, R and M may be given as log10"
                        + (q == CatalogueQuantity.LOG_G ? " (log_g is always log10 of g in cm/s2)" : ""));
            }
            logarithmic.add(q);
        }
        this.natural = EnumSet.noneOf(CatalogueQuantity.class);
        for (String key : lnKeys) {
            CatalogueQuantity q = quantity("--ln", key);
            if (q.dimension().isEmpty()) {
                throw new BadInputException("--ln " + key, "only L, Teff, R and M may be given as natural logarithms");
            }
            if (logarithmic.contains(q)) {
                throw new BadInputException("--ln " + key, "is also given to --log; a column holds log10 or ln, not both");
            }
            natural.add(q);
        }
    }

    private static CatalogueQuantity quantity(String option, String key) {
        return CatalogueQuantity.ofKey(key).orElseThrow(() -> new BadInputException(option + " " + key,
                "unknown quantity '" + key + "'; the quantities are " + CatalogueQuantity.keys()));
    }

    /**
     * @param source the catalogue table
     * @param file the file's name, for "file:line" locations
     * @return every row as read
     * @throws BadInputException for a missing or unknown column, a bad unit, or too few columns
     */
    public Catalogue read(ProfileSource source, String file) {
        Map<CatalogueQuantity, Column> found = resolve(source);
        int given = 0;
        for (CatalogueQuantity q : List.of(CatalogueQuantity.L, CatalogueQuantity.TEFF, CatalogueQuantity.R)) {
            given += found.containsKey(q) ? 1 : 0;
        }
        if (given < 2) {
            throw new BadInputException(source.name(), "needs columns for two of L, Teff and R (found " + given
                    + "); map them with --columns, e.g. --columns L=logL,Teff=logTeff; the file's columns: "
                    + headingNames(source));
        }
        if (source.rowCount() == 0) {
            throw new BadInputException(source.name(), "no data rows after the header");
        }
        List<CatalogueEntry> entries = new ArrayList<>();
        Map<Integer, String> locations = new HashMap<>();
        for (int i = 0; i < source.rowCount(); i++) {
            int row = source.rowNumber(i);
            locations.put(row, location(file, source.where(i)));
            entries.add(readRow(source, i, row, found));
        }
        return new Catalogue(entries, locations);
    }

    /**
     * The columns of L, Teff, R and M not declared with {@code --log} whose values look like log10
     * values read as linear (the rules of {@link LogValuedColumnGuard}: Teff below 100 K
     * everywhere; L, R or M negative).
     *
     * @param source the catalogue table
     * @return the findings, in quantity order; empty when none looks so
     * @throws BadInputException as {@link #read} does for the columns and units
     */
    public List<LogValuedColumnGuard.Finding> logLookingColumns(ProfileSource source) {
        List<LogValuedColumnGuard.Finding> findings = new ArrayList<>();
        for (Map.Entry<CatalogueQuantity, Column> e : resolve(source).entrySet()) {
            CatalogueQuantity q = e.getKey();
            if (q.dimension().isPresent() && !logarithmic.contains(q) && !natural.contains(q)) {
                LogValuedColumnGuard.Rule rule = q == CatalogueQuantity.TEFF ? LogValuedColumnGuard.Rule.TEMPERATURE
                        : LogValuedColumnGuard.Rule.POSITIVE;
                Column c = e.getValue();
                LogValuedColumnGuard.judge(rule, source, c.index(), c.factor())
                        .ifPresent(f -> findings.add(new LogValuedColumnGuard.Finding(c.name(), q.key(), f)));
            }
        }
        return findings;
    }

    /** "star.csv:12" from "row 4 (line 12)"; "star.fits row 4" where there are no lines. */
    private static String location(String file, String where) {
        int at = where.indexOf("(line ");
        if (at >= 0) {
            return file + ":" + where.substring(at + 6, where.indexOf(')', at));
        }
        return file + " " + where;
    }

    private Map<CatalogueQuantity, Column> resolve(ProfileSource source) {
        List<ColumnHeading> headings = source.headings();
        Map<String, Integer> index = new HashMap<>();
        for (int j = 0; j < headings.size(); j++) {
            index.putIfAbsent(headings.get(j).name(), j);
        }
        Map<CatalogueQuantity, Column> found = new EnumMap<>(CatalogueQuantity.class);
        for (CatalogueQuantity q : CatalogueQuantity.values()) {
            boolean explicit = columns.containsKey(q.key());
            String wanted = explicit ? columns.get(q.key()) : q.key();
            Integer j = index.get(wanted);
            if (j == null) {
                if (explicit) {
                    throw new BadInputException("--columns " + q.key() + "=" + wanted, source.name()
                            + " has no column '" + wanted + "'; its columns: " + headingNames(source));
                }
                continue;
            }
            found.put(q, new Column(j, wanted, factor(q, headings.get(j))));
        }
        for (String key : units.keySet()) {
            if (!found.containsKey(CatalogueQuantity.ofKey(key).orElseThrow())) {
                throw new BadInputException("--units " + key, "the catalogue has no column for " + key
                        + "; give units only for quantities in use");
            }
        }
        for (CatalogueQuantity q : logarithmic) {
            if (!found.containsKey(q)) {
                throw new BadInputException("--log " + q.key(), "the catalogue has no column for " + q.key());
            }
        }
        for (CatalogueQuantity q : natural) {
            if (!found.containsKey(q)) {
                throw new BadInputException("--ln " + q.key(), "the catalogue has no column for " + q.key());
            }
        }
        return found;
    }

    /** CGS factor of a column's unit (of the quantity for an error column; 1 for the rest). */
    private double factor(CatalogueQuantity q, ColumnHeading heading) {
        CatalogueQuantity base = baseOf(q);
        if (base.dimension().isEmpty()) {
            return 1.0;
        }
        Dimension d = base.dimension().get();
        String given = units.get(base.key());
        String subject = "--units " + base.key();
        if (given == null && q == base && heading.unit() != null && !heading.unit().isBlank()) {
            given = heading.unit();
            subject = "column '" + heading.name() + "' (" + q.key() + "), unit from the file";
        }
        if (given == null) {
            return base.customaryUnit().orElseThrow().cgsFactor();
        }
        Optional<Unit> unit = Unit.read(given.strip());
        if (unit.isPresent() && unit.get().dimension().orElse(null) == d) {
            return unit.get().cgsFactor();
        }
        throw Units.unknownUnit(subject, unit.map(Unit::spelling).orElse(given.strip()), d);
    }

    private static CatalogueQuantity baseOf(CatalogueQuantity q) {
        for (CatalogueQuantity m : CatalogueQuantity.values()) {
            if (m.measured() && m.error() == q) {
                return m;
            }
        }
        return q;
    }

    private CatalogueEntry readRow(ProfileSource source, int i, int row, Map<CatalogueQuantity, Column> found) {
        List<StarProblem> problems = new ArrayList<>();
        Map<CatalogueQuantity, Measurement> values = new EnumMap<>(CatalogueQuantity.class);
        for (CatalogueQuantity q : CatalogueQuantity.values()) {
            if (!q.measured() || !found.containsKey(q)) {
                continue;
            }
            Column c = found.get(q);
            OptionalNumber v = number(source, i, c, q, problems, row);
            if (v.value == null) {
                continue;
            }
            double error = 0.0;
            Column ec = found.get(q.error());
            if (ec != null) {
                OptionalNumber e = number(source, i, ec, q.error(), problems, row);
                if (e.value != null) {
                    if (!(e.value >= 0.0)) {
                        problems.add(new StarProblem(row, ProblemKind.impossible_combination, "column '" + ec.name
                                + "' (" + q.error().key() + ") = " + e.value + ": an error must be >= 0"));
                        continue;
                    }
                    error = e.value;
                }
            }
            boolean ln = natural.contains(q);
            boolean log = q == CatalogueQuantity.LOG_G || logarithmic.contains(q) || ln;
            // a natural-log column: e^v, and its error in e-folds becomes dex (÷ ln 10), as log10 columns carry
            double value = ln ? Math.exp(v.value) * c.factor
                    : log ? Math.pow(10.0, v.value) * c.factor : v.value * c.factor;
            if (ln) {
                error = error / Math.log(10.0);
            }
            if (!Double.isFinite(value)) {
                problems.add(new StarProblem(row, ProblemKind.out_of_range, "column '" + c.name + "' (" + q.key()
                        + ") = " + v.value + " overflows"));
                continue;
            }
            values.put(q, log ? new Measurement(value, error, true) : new Measurement(value, error * c.factor, false));
        }
        Composition composition = composition(source, i, found, problems, row);
        String name = "row-" + row;
        if (found.containsKey(CatalogueQuantity.NAME) && i < source.rowCount()
                && found.get(CatalogueQuantity.NAME).index < source.width(i)) {
            String cell = source.cell(i, found.get(CatalogueQuantity.NAME).index).strip();
            if (!cell.isEmpty()) {
                name = cell;
            }
        }
        ObservedStar star = new ObservedStar(name, row, opt(values, CatalogueQuantity.L), opt(values, CatalogueQuantity.TEFF),
                opt(values, CatalogueQuantity.R), opt(values, CatalogueQuantity.M), opt(values, CatalogueQuantity.LOG_G),
                composition);
        return new CatalogueEntry(star, problems);
    }

    private static Optional<Measurement> opt(Map<CatalogueQuantity, Measurement> values, CatalogueQuantity q) {
        return Optional.ofNullable(values.get(q));
    }

    private Composition composition(ProfileSource source, int i, Map<CatalogueQuantity, Column> found,
            List<StarProblem> problems, int row) {
        Double x = found.containsKey(CatalogueQuantity.X)
                ? number(source, i, found.get(CatalogueQuantity.X), CatalogueQuantity.X, problems, row).value : null;
        Double z = found.containsKey(CatalogueQuantity.Z)
                ? number(source, i, found.get(CatalogueQuantity.Z), CatalogueQuantity.Z, problems, row).value : null;
        if (x == null && z == null) {
            return defaultComposition;
        }
        try {
            return Composition.fromAnyTwo(x == null ? defaultComposition.X() : x, Double.NaN,
                    z == null ? defaultComposition.Z() : z);
        } catch (BadInputException e) {
            problems.add(new StarProblem(row, ProblemKind.impossible_combination, "composition: " + e.getMessage()));
            return defaultComposition;
        }
    }

    /** A cell as a number; null when blank or a missing-value marker; a problem when unreadable. */
    private record OptionalNumber(Double value) {
    }

    private static OptionalNumber number(ProfileSource source, int i, Column c, CatalogueQuantity q,
            List<StarProblem> problems, int row) {
        if (c.index >= source.width(i)) {
            problems.add(new StarProblem(row, ProblemKind.missing_value, "the row has " + source.width(i)
                    + " cells; column '" + c.name + "' (" + q.key() + ") is number " + (c.index + 1)));
            return new OptionalNumber(null);
        }
        String text = source.cell(i, c.index).strip();
        String lower = text.toLowerCase(Locale.ROOT);
        if (text.isEmpty() || lower.equals("nan") || lower.equals("--") || lower.equals("null")) {
            return new OptionalNumber(null);
        }
        double v = source.number(i, c.index);
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            problems.add(new StarProblem(row, ProblemKind.missing_value, "column '" + c.name + "' (" + q.key()
                    + "): '" + text + "' is not a finite number"));
            return new OptionalNumber(null);
        }
        return new OptionalNumber(v);
    }

    private static String headingNames(ProfileSource source) {
        return String.join(", ", source.headings().stream().map(ColumnHeading::name).toList());
    }
}
