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
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;
import org.stellabar.eos.Composition;
import org.stellabar.table.ColumnHeading;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.TextColumn;

/**
 * Reads a {@link ProfileSource} into a {@link Profile}: finds the columns, converts units to
 * CGS, checks every row, decides the order of the shells and puts the centre first.
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

    private final ColumnMapping mapping;
    private final CompositionPolicy compositionPolicy;
    private final boolean skipBadRows;

    /**
     * @param mapping which column holds which quantity, and units
     * @param compositionPolicy where shells take their composition from
     * @param skipBadRows leave bad rows out (and list them) instead of stopping
     */
    public ProfileLoader(ColumnMapping mapping, CompositionPolicy compositionPolicy, boolean skipBadRows) {
        this.mapping = Objects.requireNonNull(mapping, "mapping");
        this.compositionPolicy = Objects.requireNonNull(compositionPolicy, "compositionPolicy");
        this.skipBadRows = skipBadRows;
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
        List<String> names = columnNames(source.headings());
        if (names.isEmpty()) {
            throw new BadInputException(name + ": the header row is empty; the first row that is not a comment must name the columns");
        }
        Map<ProfileQuantity, MappedColumn> columns = resolve(source, names);
        int n = source.rowCount();
        if (n == 0) {
            throw new BadInputException(name + ": no data rows after the header");
        }
        boolean compositionColumns = !compositionPolicy.overridesColumns()
                && (columns.containsKey(HYDROGEN) || columns.containsKey(HELIUM) || columns.containsKey(METALS));

        // every cell is read as a number once: the quantities and the kept input columns share it
        double[][] parsed = parseAll(source, names.size());
        Map<ProfileQuantity, double[]> values = new EnumMap<>(ProfileQuantity.class);
        for (ProfileQuantity q : columns.keySet()) {
            values.put(q, new double[n]);
        }
        Composition[] compositions = new Composition[n];
        Map<Integer, BadRow> bad = new LinkedHashMap<>();
        int width = names.size();
        Map<Integer, String> zeroRows = new LinkedHashMap<>();
        for (int i = 0; i < n; i++) {
            String problem = readRow(source, parsed, i, width, columns, values);
            if (problem != null && problem.startsWith(ZERO)) {
                zeroRows.put(i, problem.substring(ZERO.length()));
                compositions[i] = compositionPolicy.composition();
                continue;
            }
            if (problem == null) {
                try {
                    compositions[i] = compositionColumns
                            ? ShellComposition.of(value(values, HYDROGEN, i), value(values, HELIUM, i),
                                    value(values, METALS, i), compositionPolicy.composition())
                            : compositionPolicy.composition();
                } catch (BadInputException e) {
                    problem = e.getMessage();
                }
            }
            if (problem != null) {
                bad.put(i, new BadRow(source.rowNumber(i), source.where(i), problem));
            }
        }

        List<Integer> usable = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!bad.containsKey(i) && !zeroRows.containsKey(i)) {
                usable.add(i);
            }
        }
        Order order = order(usable, values, columns);
        SurfacePoint surface = surface(source, usable, zeroRows, values, order);
        for (Map.Entry<Integer, String> z : zeroRows.entrySet()) {
            if (surface == null || source.rowNumber(z.getKey()) != surface.row()) {
                bad.put(z.getKey(), new BadRow(source.rowNumber(z.getKey()), source.where(z.getKey()), z.getValue()));
            }
        }
        checkOrder(source, usable, values, order, bad);

        List<BadRow> badRows = new ArrayList<>(bad.values());
        badRows.sort((a, b) -> Integer.compare(a.row(), b.row()));
        if (!badRows.isEmpty() && !skipBadRows) {
            throw new BadInputException(name + ": " + describe(badRows)
                    + "; fix them or give --skip-bad-rows to audit the other rows");
        }
        List<Integer> kept = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!bad.containsKey(i) && !zeroRows.containsKey(i)) {
                kept.add(i);
            }
        }
        if (kept.size() < MIN_SHELLS) {
            String have = kept.size() == 1 ? "1 usable data row" : kept.size() + " usable data rows";
            throw new BadInputException(name + ": " + have + (badRows.isEmpty() ? "" : " (" + badRows.size()
                    + " bad)") + "; an audit needs at least " + MIN_SHELLS
                    + " shells (the derivatives use three points)");
        }

        Profile profile = build(source, kept, values, compositions, order.surfaceFirst, surface);
        List<MappedColumn> mapped = new ArrayList<>(columns.values());
        String compositionSource = compositionColumns
                ? "per shell from the profile's columns " + compositionColumnsNamed(columns)
                        + ", completed from " + describe(compositionPolicy.composition()) + " where missing"
                : (compositionPolicy.overridesColumns() ? "given for the whole star: " : "whole star (default): ")
                        + describe(compositionPolicy.composition())
                        + (compositionPolicy.overridesColumns() && (columns.containsKey(HYDROGEN)
                                || columns.containsKey(HELIUM) || columns.containsKey(METALS))
                                ? "; the profile's composition columns are ignored" : "");
        return new LoadedProfile(profile, mapped, inputColumns(source, parsed, names, kept, columns), badRows,
                order.description, compositionSource);
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

    private static double value(Map<ProfileQuantity, double[]> values, ProfileQuantity q, int i) {
        double[] a = values.get(q);
        return a == null ? Double.NaN : a[i];
    }

    private static List<String> columnNames(List<ColumnHeading> headings) {
        if (headings.size() == 1 && headings.get(0).name().isEmpty()) {
            return List.of();
        }
        List<String> names = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (int j = 0; j < headings.size(); j++) {
            String base = headings.get(j).name().isEmpty() ? "column_" + (j + 1) : headings.get(j).name();
            String unique = base;
            for (int k = 2; !seen.add(unique); k++) {
                unique = base + "_" + k;
            }
            names.add(unique);
        }
        return names;
    }

    private Map<ProfileQuantity, MappedColumn> resolve(ProfileSource source, List<String> names) {
        List<ColumnHeading> headings = source.headings();
        Map<String, Integer> index = new HashMap<>();
        Map<String, Integer> repeats = new HashMap<>();
        for (int j = 0; j < headings.size(); j++) {
            String raw = headings.get(j).name();
            repeats.merge(raw, 1, Integer::sum);
            index.putIfAbsent(raw, j);
        }
        Map<ProfileQuantity, MappedColumn> found = new EnumMap<>(ProfileQuantity.class);
        for (ProfileQuantity q : ProfileQuantity.values()) {
            String wanted = mapping.columnFor(q);
            Integer j = index.get(wanted);
            if (j == null) {
                if (mapping.isExplicit(q)) {
                    throw new BadInputException("--columns " + q.key() + "=" + wanted + ": " + source.name()
                            + " has no column '" + wanted + "'; its columns: " + String.join(", ", names));
                }
                if (q.required()) {
                    throw new BadInputException(source.name() + ": no " + q.label() + " column (looked for '"
                            + wanted + "'); name it with --columns " + q.key() + "=COLUMN; the file's columns: "
                            + String.join(", ", names));
                }
                continue;
            }
            if (repeats.get(wanted) > 1) {
                throw new BadInputException(source.name() + ": column '" + wanted + "' (for " + q.key()
                        + ") appears " + repeats.get(wanted) + " times in the header; the column for a quantity must be unique");
            }
            found.put(q, unitOf(q, j, wanted, headings.get(j)));
        }
        for (String key : mapping.units().keySet()) {
            boolean isQuantity = ProfileQuantity.ofKey(key) != null;
            boolean isColumn = index.containsKey(key);
            if (isQuantity && !found.containsKey(ProfileQuantity.ofKey(key))) {
                throw new BadInputException("--units " + key + ": the profile has no column for " + key
                        + "; give units only for quantities in use");
            }
            if (!isQuantity && !isColumn) {
                throw new BadInputException("--units " + key + ": '" + key + "' is neither a quantity ("
                        + ProfileQuantity.keys() + ") nor a column of " + source.name());
            }
            if (!isQuantity && found.values().stream().noneMatch(c -> c.column().equals(key))) {
                throw new BadInputException("--units " + key + ": column '" + key
                        + "' is not used for any quantity; map it with --columns first");
            }
        }
        return found;
    }

    private MappedColumn unitOf(ProfileQuantity q, int j, String column, ColumnHeading heading) {
        String given = mapping.units().get(q.key());
        if (given == null) {
            for (Map.Entry<String, String> e : mapping.units().entrySet()) {
                if (ProfileQuantity.ofKey(e.getKey()) == q) {
                    given = e.getValue();
                }
            }
        }
        if (given == null) {
            given = mapping.units().get(column);
        }
        if (given != null) {
            double f = UnitSpelling.factor(q, given, "--units " + q.key());
            return new MappedColumn(q, j, column, UnitSpelling.ourSpelling(q, given), f, "from --units");
        }
        if (heading.unit() != null) {
            double f = UnitSpelling.factor(q, heading.unit(), "column '" + column + "' (" + q.key()
                    + "), unit from the file");
            return new MappedColumn(q, j, column, UnitSpelling.ourSpelling(q, heading.unit()), f, "from the file");
        }
        return new MappedColumn(q, j, column, UnitSpelling.ourSpelling(q, ""), 1.0,
                q.dimension() == null ? "dimensionless" : "none stated: CGS assumed");
    }

    /** Reads one row's quantities in CGS; returns what is wrong with it, or null. */
    private static String readRow(ProfileSource source, double[][] parsed, int i, int width,
            Map<ProfileQuantity, MappedColumn> columns, Map<ProfileQuantity, double[]> values) {
        String zero = null;
        int w = source.width(i);
        if (w != width) {
            return "has " + w + (w == 1 ? " cell" : " cells") + " where the header has " + width;
        }
        for (MappedColumn c : columns.values()) {
            String text = source.cell(i, c.index());
            double v = parsed[c.index()][i];
            String label = "column '" + c.column() + "' (" + c.quantity().key() + ")";
            if (Double.isNaN(v)) {
                return text.isBlank() ? label + " is empty" : label + ": '" + text + "' is not a finite number";
            }
            v *= c.factor();
            if (!Double.isFinite(v)) {
                return label + ": '" + text + "' overflows once converted to CGS";
            }
            ProfileQuantity q = c.quantity();
            if ((q == DENSITY || q == TEMPERATURE || q == PRESSURE) && v == 0.0) {
                zero = zero == null ? label + " = " + text + " is 0; the gas + radiation equation of state needs "
                        + q.label() + " > 0 (only the outermost row may be a vacuum surface, rho = 0 or T = 0"
                        + " with P = 0)" : zero;
            } else if ((q == DENSITY || q == TEMPERATURE || q == PRESSURE) && !(v > 0.0)) {
                return label + " = " + text + " is not positive; the gas + radiation equation of state needs "
                        + q.label() + " > 0";
            }
            if ((q == RADIUS || q == MASS) && v < 0.0) {
                return label + " = " + text + " is negative";
            }
            values.get(q)[i] = v;
        }
        return zero == null ? null : ZERO + zero;
    }

    /** Marks a problem that is only a zero ρ, T or P: perhaps the vacuum surface row. */
    private static final String ZERO = "\u0000zero:";

    private record Order(ProfileQuantity by, boolean surfaceFirst, String description) {
    }

    private static Order order(List<Integer> usable, Map<ProfileQuantity, double[]> values,
            Map<ProfileQuantity, MappedColumn> columns) {
        if (usable.size() < 2) {
            return new Order(null, false, "fewer than two usable rows: centre first assumed");
        }
        int first = usable.get(0);
        int last = usable.get(usable.size() - 1);
        for (ProfileQuantity q : List.of(RADIUS, MASS, PRESSURE, TEMPERATURE)) {
            if (!columns.containsKey(q)) {
                continue;
            }
            double[] v = values.get(q);
            boolean growsOutwards = q == RADIUS || q == MASS;
            boolean increasesDown = v[last] > v[first];
            boolean surfaceFirst = growsOutwards != increasesDown;
            if (v[last] == v[first]) {
                continue;
            }
            String how = q.label() + (increasesDown ? " increases" : " decreases") + " down the file: "
                    + (surfaceFirst ? "surface first" : "centre first");
            return new Order(q, surfaceFirst, how);
        }
        return new Order(null, false, "no radius, mass, pressure or temperature trend: centre first assumed");
    }

    /**
     * The vacuum surface row, if the row at the surface end of the file is one: ρ = 0 or T = 0, P = 0
     * (when given), and a radius and mass beyond every other row's.
     */
    private static SurfacePoint surface(ProfileSource source, List<Integer> usable, Map<Integer, String> zeroRows,
            Map<ProfileQuantity, double[]> values, Order order) {
        if (zeroRows.isEmpty() || usable.isEmpty()) {
            return null;
        }
        int candidate = -1;
        for (int i : zeroRows.keySet()) {
            boolean outside = order.surfaceFirst ? i < usable.get(0) : i > usable.get(usable.size() - 1);
            if (outside && (candidate < 0 || (order.surfaceFirst ? i < candidate : i > candidate))) {
                candidate = i;
            }
        }
        if (candidate < 0) {
            return null;
        }
        double[] rho = values.get(DENSITY);
        double[] T = values.get(TEMPERATURE);
        double[] P = values.get(PRESSURE);
        double[] r = values.get(RADIUS);
        double[] m = values.get(MASS);
        boolean vacuum = (rho[candidate] == 0.0 || T[candidate] == 0.0) && (P == null || P[candidate] == 0.0);
        for (int i : usable) {
            vacuum &= (r == null || r[candidate] > r[i]) && (m == null || m[candidate] >= m[i]);
        }
        if (!vacuum) {
            return null;
        }
        return new SurfacePoint(source.rowNumber(candidate), source.where(candidate),
                r == null ? Double.NaN : r[candidate], m == null ? Double.NaN : m[candidate], rho[candidate]);
    }

    /** Walks the usable rows from the centre outwards and marks those that break the order. */
    private static void checkOrder(ProfileSource source, List<Integer> usable, Map<ProfileQuantity, double[]> values,
            Order order, Map<Integer, BadRow> bad) {
        double[] r = values.get(RADIUS);
        double[] m = values.get(MASS);
        if (r == null && m == null) {
            return;
        }
        List<Integer> outwards = new ArrayList<>(usable);
        if (order.surfaceFirst) {
            java.util.Collections.reverse(outwards);
        }
        String direction = order.surfaceFirst ? "decrease down the file" : "increase down the file";
        int previous = -1;
        for (int i : outwards) {
            String problem = null;
            if (r != null && m != null) {
                if (r[i] == 0.0 && m[i] > 0.0) {
                    problem = "m = " + m[i] + " g at r = 0; the mass inside radius 0 must be 0";
                } else if (r[i] > 0.0 && m[i] == 0.0) {
                    problem = "m = 0 at r = " + r[i] + " cm > 0; a shell of positive radius holds mass";
                }
            }
            if (problem == null && previous >= 0) {
                if (r != null && !(r[i] > r[previous])) {
                    problem = String.format(Locale.ROOT, "radius %.10g cm breaks the order (%s has %.10g cm);"
                            + " radius must %s", r[i], source.where(previous), r[previous], direction);
                } else if (m != null && m[i] < m[previous]) {
                    problem = String.format(Locale.ROOT, "mass %.10g g breaks the order (%s has %.10g g);"
                            + " mass must %s", m[i], source.where(previous), m[previous], direction);
                }
            }
            if (problem != null) {
                bad.put(i, new BadRow(source.rowNumber(i), source.where(i), problem));
            } else {
                previous = i;
            }
        }
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
            Composition[] compositions, boolean surfaceFirst, SurfacePoint surface) {
        int n = kept.size();
        List<Integer> outwards = new ArrayList<>(kept);
        if (surfaceFirst) {
            java.util.Collections.reverse(outwards);
        }
        int[] rows = new int[n];
        List<Composition> comps = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            rows[k] = source.rowNumber(outwards.get(k));
            comps.add(compositions[outwards.get(k)]);
        }
        return new Profile(source.name(), rows, pick(values.get(RADIUS), outwards), pick(values.get(MASS), outwards),
                pick(values.get(DENSITY), outwards), pick(values.get(TEMPERATURE), outwards),
                pick(values.get(PRESSURE), outwards), pick(values.get(GAMMA1), outwards), comps, surfaceFirst, surface);
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

    /** Each cell as a number (NaN where it is none, or where a short row has no such cell), by column. */
    private static double[][] parseAll(ProfileSource source, int width) {
        int n = source.rowCount();
        double[][] out = new double[width][n];
        for (int i = 0; i < n; i++) {
            int w = Math.min(width, source.width(i));
            for (int j = 0; j < width; j++) {
                out[j][i] = j < w ? source.number(i, j) : Double.NaN;
            }
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
                out.add(new NumberColumn(names.get(j), unit, description, numbers));
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
