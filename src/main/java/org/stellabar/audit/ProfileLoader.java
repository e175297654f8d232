package org.stellabar.audit;

import static org.stellabar.audit.ProfileQuantity.DENSITY;
import static org.stellabar.audit.ProfileQuantity.GAMMA1;
import static org.stellabar.audit.ProfileQuantity.HELIUM;
import static org.stellabar.audit.ProfileQuantity.HYDROGEN;
import static org.stellabar.audit.ProfileQuantity.MASS;
import static org.stellabar.audit.ProfileQuantity.METALS;
import static org.stellabar.audit.ProfileQuantity.PRESSURE;
import static org.stellabar.audit.ProfileQuantity.RADIUS;
import static org.stellabar.audit.ProfileQuantity.TEMPERATURE;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Optional;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Collectors;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Unit;
import org.stellabar.table.Column;
import org.stellabar.table.ColumnHeading;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.TextColumn;

/**
 * Reads a {@link ProfileSource} into a {@link Profile}: finds the columns
 * ({@link ColumnResolver}), reads and checks every row ({@link RowParser}), decides the order of
 * the shells ({@link ShellOrder}), recognises a vacuum surface row ({@link SurfaceRow}) and puts
 * the centre first. What is wrong with a row is a typed {@link RowProblem}.
 *
 * <p>A row is bad when it is ragged (another number of cells than the header), when a cell of a
 * quantity in use is empty or not a number, when ρ, T or P is not positive or r or m is negative,
 * when a mass fraction is outside [0, 1] or they do not add up, when it breaks the order of the
 * shells (radius must change strictly monotonically, mass monotonically, in the same direction),
 * or when r = 0 and m &gt; 0 or r &gt; 0 and m = 0. The order is read from the radius, else the
 * mass (increasing from the centre), else the pressure, else the temperature (decreasing from the
 * centre), comparing the first and last usable rows. By default any bad row stops the audit with
 * one line naming the rows; with {@code skipBadRows} they are left out and listed.
 */
public final class ProfileLoader {

    /** Fewest shells the three-point derivatives need. */
    public static final int MIN_SHELLS = 3;
    /** Bad rows quoted in an error message before "and N more". */
    private static final int QUOTED_ROWS = 3;

    private final ColumnResolver resolver;
    private final CompositionPolicy compositionPolicy;
    private final boolean skipBadRows;

    /**
     * @param mapping which column holds which quantity, and units
     * @param compositionPolicy where shells take their composition from
     * @param skipBadRows leave bad rows out (and list them) instead of stopping
     */
    public ProfileLoader(ColumnMapping mapping, CompositionPolicy compositionPolicy, boolean skipBadRows) {
        this.resolver = new ColumnResolver(Objects.requireNonNull(mapping, "mapping"));
        this.compositionPolicy = Objects.requireNonNull(compositionPolicy, "compositionPolicy");
        this.skipBadRows = skipBadRows;
    }

    /**
     * The columns {@link #load} maps, without reading a row: for checks of a whole column
     * ({@link LogValuedColumnGuard}) before the rows are judged one by one.
     *
     * @param source the table
     * @return the mapped columns, in quantity order
     * @throws BadInputException as {@link #load} does for the header, the mapping and the units
     */
    public List<MappedColumn> mappedColumns(ProfileSource source) {
        List<String> names = ColumnResolver.columnNames(source.headings());
        if (names.isEmpty()) {
            throw new BadInputException(source.name() + ": the header row is empty; the first row that is not a comment"
                    + " must name the columns");
        }
        return List.copyOf(resolver.resolve(source, names).values());
    }

    /**
     * @param source the table
     * @return the profile with its columns, skipped rows and decisions
     * @throws BadInputException for a missing required column, an unknown unit, a key of
     *     {@code --units} that matches nothing, bad rows (unless skipped), or fewer than
     *     {@value #MIN_SHELLS} usable rows
     */
    public LoadedProfile load(ProfileSource source) {
        String name = source.name();
        List<String> names = ColumnResolver.columnNames(source.headings());
        if (names.isEmpty()) {
            throw new BadInputException(name + ": the header row is empty; the first row that is not a comment must name the columns");
        }
        Map<ProfileQuantity, MappedColumn> columns = resolver.resolve(source, names);
        int n = source.rowCount();
        if (n == 0) {
            throw new BadInputException(name + ": no data rows after the header");
        }
        boolean compositionColumns = !compositionPolicy.overridesColumns() && hasCompositionColumns(columns);
        RowParser.ParsedRows parsed = RowParser.parse(source, names.size(), columns, compositionPolicy,
                compositionColumns);
        Map<ProfileQuantity, double[]> values = parsed.values();
        List<Integer> usable = new ArrayList<>();
        List<Integer> zeroRows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            RowProblem problem = parsed.problems().get(i);
            if (problem == null) {
                usable.add(i);
            } else if (problem.mayBeSurface()) {
                zeroRows.add(i);
            }
        }
        ShellOrder order = ShellOrder.detect(usable, values);
        SurfacePoint surface = SurfaceRow.find(source, usable, zeroRows, values, order).orElse(null);
        Map<Integer, RowProblem> problems = new HashMap<>(parsed.problems());
        if (surface != null) {
            problems.keySet().removeIf(i -> source.rowNumber(i) == surface.row());
        }
        Map<Integer, RowProblem> breaches = order.breaches(source, usable, values);
        problems.putAll(breaches);
        List<BadRow> badRows = badRows(source, problems);
        List<Integer> kept = new ArrayList<>(usable);
        kept.removeAll(breaches.keySet());
        checkEnough(name, badRows, kept.size());
        Profile profile = build(source, kept, values, parsed.compositions(), order, surface);
        return new LoadedProfile(profile, new ArrayList<>(columns.values()),
                inputColumns(source, parsed.cells(), names, kept, columns), badRows, order.description(),
                compositionSource(columns, compositionColumns));
    }

    private static boolean hasCompositionColumns(Map<ProfileQuantity, MappedColumn> columns) {
        return columns.containsKey(HYDROGEN) || columns.containsKey(HELIUM) || columns.containsKey(METALS);
    }

    /** The bad rows in file order; stops the audit with one line naming them unless they are skipped. */
    private List<BadRow> badRows(ProfileSource source, Map<Integer, RowProblem> problems) {
        List<BadRow> badRows = new ArrayList<>();
        for (Map.Entry<Integer, RowProblem> e : problems.entrySet()) {
            badRows.add(new BadRow(source.rowNumber(e.getKey()), source.where(e.getKey()), e.getValue()));
        }
        badRows.sort((a, b) -> Integer.compare(a.row(), b.row()));
        if (!badRows.isEmpty() && !skipBadRows) {
            throw new BadInputException(source.name() + ": " + describe(badRows)
                    + "; fix them or give --skip-bad-rows to audit the other rows");
        }
        return badRows;
    }

    private static void checkEnough(String name, List<BadRow> badRows, int kept) {
        if (kept < MIN_SHELLS) {
            String have = kept == 1 ? "1 usable data row" : kept + " usable data rows";
            throw new BadInputException(name + ": " + have + (badRows.isEmpty() ? "" : " (" + badRows.size()
                    + " bad)") + "; an audit needs at least " + MIN_SHELLS
                    + " shells (the derivatives use three points)");
        }
    }

    private String compositionSource(Map<ProfileQuantity, MappedColumn> columns, boolean compositionColumns) {
        if (compositionColumns) {
            return "per shell from the profile's columns " + compositionColumnsNamed(columns)
                    + ", completed from " + describe(compositionPolicy.composition()) + " where missing";
        }
        return (compositionPolicy.overridesColumns() ? "given for the whole star: " : "whole star (" + compositionPolicy.origin() + "): ")
                + describe(compositionPolicy.composition())
                + (compositionPolicy.overridesColumns() && hasCompositionColumns(columns)
                        ? "; the profile's composition columns are ignored" : "");
    }

    private static String compositionColumnsNamed(Map<ProfileQuantity, MappedColumn> columns) {
        return List.of(HYDROGEN, HELIUM, METALS).stream().filter(columns::containsKey)
                .map(q -> q.key() + " = '" + columns.get(q).column() + "'").collect(Collectors.joining(", "));
    }

    private static String describe(Composition c) {
        String s = c.fromMu() ? "mu = " + AuditReport.num(c.mu())
                : "X = " + AuditReport.num(c.X()) + ", Y = " + AuditReport.num(c.Y()) + ", Z = " + AuditReport.num(c.Z())
                        + " (mu = " + AuditReport.num(c.mu()) + ")";
        return c.metalMassNumber() > 0 ? s + ", metal ions of A = " + AuditReport.num(c.metalMassNumber()) : s;
    }

    private static String describe(List<BadRow> rows) {
        StringBuilder s = new StringBuilder();
        s.append(rows.size() == 1 ? "1 bad row: " : rows.size() + " bad rows: ");
        for (int k = 0; k < Math.min(QUOTED_ROWS, rows.size()); k++) {
            if (k > 0) {
                s.append("; ");
            }
            s.append(rows.get(k));
        }
        if (rows.size() > QUOTED_ROWS) {
            s.append("; and ").append(rows.size() - QUOTED_ROWS).append(" more (rows ")
                    .append(rows.stream().skip(QUOTED_ROWS).limit(20).map(b -> String.valueOf(b.row()))
                            .collect(Collectors.joining(", ")))
                    .append(rows.size() > QUOTED_ROWS + 20 ? ", ..." : "").append(")");
        }
        return s.toString();
    }

    private static Profile build(ProfileSource source, List<Integer> kept, Map<ProfileQuantity, double[]> values,
            Composition[] compositions, ShellOrder order, SurfacePoint surface) {
        int n = kept.size();
        List<Integer> outwards = order.outwards(kept);
        int[] rows = new int[n];
        List<Composition> comps = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            rows[k] = source.rowNumber(outwards.get(k));
            comps.add(compositions[outwards.get(k)]);
        }
        return new Profile(source.name(), rows, pick(values.get(RADIUS), outwards), pick(values.get(MASS), outwards),
                pick(values.get(DENSITY), outwards), pick(values.get(TEMPERATURE), outwards),
                pick(values.get(PRESSURE), outwards), pick(values.get(GAMMA1), outwards), comps, order.surfaceFirst(), surface);
    }

    private static double[] pick(double[] all, List<Integer> rows) {
        if (all == null) {
            return null;
        }
        double[] out = new double[rows.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = all[rows.get(k)];
        }
        return out;
    }

    private static List<Column> inputColumns(ProfileSource source, double[][] parsed, List<String> names,
            List<Integer> kept, Map<ProfileQuantity, MappedColumn> columns) {
        List<Column> out = new ArrayList<>();
        List<ColumnHeading> headings = source.headings();
        for (int j = 0; j < names.size(); j++) {
            final int col = j;
            MappedColumn mapped = columns.values().stream().filter(c -> c.index() == col).findFirst().orElse(null);
            // the values stay as written, so the unit is the one they are written in
            String unit = mapped != null ? mapped.unit()
                    : headings.get(j).unit() == null ? "" : headings.get(j).unit();
            String description = "input column " + (j + 1) + (mapped != null ? ", read as " + mapped.quantity().key()
                    + " (" + mapped.quantity().label() + ")" : "");
            double[] numbers = new double[kept.size()];
            boolean numeric = true;
            for (int k = 0; k < kept.size() && numeric; k++) {
                numbers[k] = parsed[j][kept.get(k)];
                numeric = Double.isFinite(numbers[k]);
            }
            if (numeric) {
                // a unit the unit table knows in another spelling ("g cm-3") is kept in ours; one it
                // cannot write (kg/m3, Pa, or unknown) moves into the description, so that every
                // unit the audit writes is one astropy reads; the values stay as written
                Optional<Unit> known = unit.isEmpty() ? Optional.of(Unit.NONE)
                        : Unit.read(unit).filter(u -> u.written().isPresent());
                // the array was made for this column: handed over, not copied (a 10^6-row profile's
                // columns are 8 MB each)
                out.add(known.isPresent() ? NumberColumn.taking(names.get(j), known.get().spelling(), description,
                        numbers, false)
                        : NumberColumn.taking(names.get(j), "", description + " [unit: " + unit + "]", numbers, false));
            } else {
                List<String> text = new ArrayList<>();
                for (int i : kept) {
                    text.add(source.cell(i, j));
                }
                out.add(new TextColumn(names.get(j), description, text));
            }
        }
        return out;
    }
}
