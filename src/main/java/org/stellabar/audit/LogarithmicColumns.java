package org.stellabar.audit;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.ColumnHeading;

/**
 * A profile source whose mapped columns hold logarithms: {@code --log rho,T,P} (base 10) and
 * {@code --ln ...} (natural) name quantity keys; their columns' numbers are handed on as
 * 10<sup>x</sup> or e<sup>x</sup>, in the unit the column is read in ({@code --units rho=g/cm3}
 * for a column of log10 of g/cm3). The cells' text stays as written, so messages quote the file.
 * A logarithm too large for a double becomes infinite, which the row reader reports as an
 * overflow naming the row and column.
 */
public final class LogarithmicColumns implements ProfileSource {

    /** The base of a column's logarithms. */
    public enum Base {
        /** log10, {@code --log} */
        TEN("--log"),
        /** natural log, {@code --ln} */
        E("--ln");

        private final String option;

        Base(String option) {
            this.option = option;
        }

        double antilog(double x) {
            return this == TEN ? Math.pow(10.0, x) : Math.exp(x);
        }
    }

    private final ProfileSource source;
    private final Base[] bases;

    private LogarithmicColumns(ProfileSource source, Base[] bases) {
        this.source = source;
        this.bases = bases;
    }

    /**
     * @param source the file's table
     * @param mapping which column holds which quantity
     * @param log10 quantity keys whose columns hold log10 values
     * @param ln quantity keys whose columns hold natural logs
     * @return the source with those columns as plain values (the source itself when none is named)
     * @throws BadInputException (about --log or --ln) for an unknown key, a key named in both, or a
     *     key whose column the file does not have
     */
    public static ProfileSource of(ProfileSource source, ColumnMapping mapping, List<String> log10, List<String> ln) {
        if (log10.isEmpty() && ln.isEmpty()) {
            return source;
        }
        Map<ProfileQuantity, Base> wanted = new LinkedHashMap<>();
        add(wanted, log10, Base.TEN);
        add(wanted, ln, Base.E);
        List<ColumnHeading> headings = source.headings();
        Base[] bases = new Base[headings.size()];
        for (Map.Entry<ProfileQuantity, Base> e : wanted.entrySet()) {
            String column = mapping.columnFor(e.getKey());
            int index = index(headings, column);
            if (index < 0) {
                throw new BadInputException(e.getValue().option + " " + e.getKey().key() + ": " + source.name()
                        + " has no column '" + column + "' (map it with --columns " + e.getKey().key() + "=COLUMN)");
            }
            bases[index] = e.getValue();
        }
        return new LogarithmicColumns(source, bases);
    }

    private static void add(Map<ProfileQuantity, Base> wanted, List<String> keys, Base base) {
        for (String key : keys) {
            ProfileQuantity q = ProfileQuantity.ofKey(key.strip());
            if (q == null) {
                throw new BadInputException(base.option + " " + key + ": not a profile quantity; known: "
                        + ProfileQuantity.keys());
            }
            Base before = wanted.put(q, base);
            if (before != null && before != base) {
                throw new BadInputException(base.option + " " + key + ": also named by " + before.option
                        + "; a column holds one kind of logarithm");
            }
        }
    }

    /** The column of this name: exactly, else ignoring case (as the column resolver looks). */
    private static int index(List<ColumnHeading> headings, String column) {
        for (int i = 0; i < headings.size(); i++) {
            if (headings.get(i).name().equals(column)) {
                return i;
            }
        }
        for (int i = 0; i < headings.size(); i++) {
            if (headings.get(i).name().equalsIgnoreCase(column)) {
                return i;
            }
        }
        return -1;
    }

    @Override
    public double number(int row, int column) {
        double x = source.number(row, column);
        return column < bases.length && bases[column] != null && !Double.isNaN(x) ? bases[column].antilog(x) : x;
    }

    @Override
    public String name() {
        return source.name();
    }

    @Override
    public List<ColumnHeading> headings() {
        return source.headings();
    }

    @Override
    public int rowCount() {
        return source.rowCount();
    }

    @Override
    public int rowNumber(int row) {
        return source.rowNumber(row);
    }

    @Override
    public String where(int row) {
        return source.where(row);
    }

    @Override
    public int width(int row) {
        return source.width(row);
    }

    @Override
    public String cell(int row, int column) {
        return source.cell(row, column);
    }

    @Override
    public java.util.Optional<String> recordedComposition() {
        return source.recordedComposition();
    }
}
