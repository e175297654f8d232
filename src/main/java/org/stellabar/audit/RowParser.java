package org.stellabar.audit;

import static org.stellabar.audit.ProfileQuantity.DENSITY;
import static org.stellabar.audit.ProfileQuantity.HELIUM;
import static org.stellabar.audit.ProfileQuantity.HYDROGEN;
import static org.stellabar.audit.ProfileQuantity.MASS;
import static org.stellabar.audit.ProfileQuantity.METALS;
import static org.stellabar.audit.ProfileQuantity.PRESSURE;
import static org.stellabar.audit.ProfileQuantity.RADIUS;
import static org.stellabar.audit.ProfileQuantity.TEMPERATURE;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import org.stellabar.audit.RowProblem.Kind;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;

/**
 * Reads every data row's quantities in CGS and each shell's composition, and says what is wrong
 * with a row that cannot be read: ragged, an empty or non-numeric cell, an overflow once
 * converted, a non-positive ρ, T or P, a negative r or m, or mass fractions that do not add up.
 * A row whose only fault is a zero ρ, T or P is kept apart ({@link Kind#ZERO}): it may be the
 * vacuum surface. Every cell is read as a number once.
 */
final class RowParser {

    /**
     * Each row as read.
     *
     * @param cells each cell as a number by column then row (NaN where it is none)
     * @param values each quantity in CGS by row (meaningful only for rows without a problem, or
     *     with a zero problem)
     * @param compositions each row's composition (null for a row with a problem other than zero)
     * @param problems what is wrong with each row that has a problem, by row index, in file order
     */
    record ParsedRows(double[][] cells, Map<ProfileQuantity, double[]> values, Composition[] compositions,
            Map<Integer, RowProblem> problems) {
    }

    private RowParser() {
    }

    /**
     * @param source the table
     * @param width the header's number of columns
     * @param columns the column of each quantity in use
     * @param policy where shells take their composition from
     * @param compositionColumns true if the composition comes from the profile's columns
     * @return the rows as read
     */
    static ParsedRows parse(ProfileSource source, int width, Map<ProfileQuantity, MappedColumn> columns,
            CompositionPolicy policy, boolean compositionColumns) {
        int n = source.rowCount();
        double[][] cells = cells(source, width);
        Map<ProfileQuantity, double[]> values = new EnumMap<>(ProfileQuantity.class);
        for (ProfileQuantity q : columns.keySet()) {
            values.put(q, new double[n]);
        }
        Composition[] compositions = new Composition[n];
        Map<Integer, RowProblem> problems = new LinkedHashMap<>();
        for (int i = 0; i < n; i++) {
            RowProblem problem = readRow(source, cells, i, width, columns, values);
            if (problem == null || problem.mayBeSurface()) {
                try {
                    compositions[i] = problem == null && compositionColumns
                            ? ShellComposition.of(value(values, HYDROGEN, i), value(values, HELIUM, i),
                                    value(values, METALS, i), policy.composition())
                            : policy.composition();
                } catch (BadInputException e) {
                    problem = RowProblem.ofRow(Kind.COMPOSITION, e.getMessage());
                }
            }
            if (problem != null) {
                problems.put(i, problem);
            }
        }
        return new ParsedRows(cells, values, compositions, problems);
    }

    private static double value(Map<ProfileQuantity, double[]> values, ProfileQuantity q, int i) {
        double[] a = values.get(q);
        return a == null ? Double.NaN : a[i];
    }

    /** Reads one row's quantities in CGS; returns what is wrong with it, or null. */
    private static RowProblem readRow(ProfileSource source, double[][] cells, int i, int width,
            Map<ProfileQuantity, MappedColumn> columns, Map<ProfileQuantity, double[]> values) {
        int w = source.width(i);
        if (w != width) {
            return RowProblem.ofRow(Kind.RAGGED, "has " + w + (w == 1 ? " cell" : " cells")
                    + " where the header has " + width);
        }
        RowProblem zero = null;
        for (MappedColumn c : columns.values()) {
            String text = source.cell(i, c.index());
            RowProblem problem = readCell(c, text, cells[c.index()][i]);
            if (problem != null && !problem.mayBeSurface()) {
                return problem;
            }
            if (problem != null && zero == null) {
                zero = problem;
            }
            values.get(c.quantity())[i] = cells[c.index()][i] * c.factor();
        }
        return zero;
    }

    /** What is wrong with one cell of a quantity in use, or null. */
    private static RowProblem readCell(MappedColumn c, String text, double number) {
        String label = "column '" + c.column() + "' (" + c.quantity().key() + ")";
        if (Double.isNaN(number)) {
            return text.isBlank() ? new RowProblem(Kind.EMPTY_CELL, label, text, label + " is empty")
                    : new RowProblem(Kind.NOT_A_NUMBER, label, text, label + ": '" + text + "' is not a finite number");
        }
        double v = number * c.factor();
        if (!Double.isFinite(v)) {
            return new RowProblem(Kind.OVERFLOW, label, text, label + ": '" + text + "' overflows once converted to CGS");
        }
        ProfileQuantity q = c.quantity();
        boolean thermal = q == DENSITY || q == TEMPERATURE || q == PRESSURE;
        if (thermal && v == 0.0) {
            return new RowProblem(Kind.ZERO, label, text, label + " = " + text + " is 0; the gas + radiation equation"
                    + " of state needs " + q.label() + " > 0 (only the outermost row may be a vacuum surface,"
                    + " rho = 0 or T = 0 with P = 0)");
        }
        if (thermal && !(v > 0.0)) {
            return new RowProblem(Kind.NOT_POSITIVE, label, text, label + " = " + text
                    + " is not positive; the gas + radiation equation of state needs " + q.label() + " > 0");
        }
        if ((q == RADIUS || q == MASS) && v < 0.0) {
            return new RowProblem(Kind.NEGATIVE, label, text, label + " = " + text + " is negative");
        }
        return null;
    }

    /** Each cell as a number (NaN where it is none, or where a short row has no such cell), by column. */
    private static double[][] cells(ProfileSource source, int width) {
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
}
