package org.stellabar.audit;

import java.util.List;
import org.stellabar.table.CellTable;
import org.stellabar.table.ColumnHeading;

/** A CSV table read by {@link org.stellabar.output.CsvTableReader}, seen as a profile source. */
public final class CsvProfileSource implements ProfileSource {

    private final CellTable table;
    private final List<ColumnHeading> headings;
    private int cachedRow = -1;
    private List<String> cachedCells;

    /** @param table the cells as read */
    public CsvProfileSource(CellTable table) {
        this.table = table;
        this.headings = table.header().stream().map(ColumnHeading::parse).toList();
    }

    @Override
    public java.util.Optional<String> recordedComposition() {
        String prefix = "input composition = ";
        return table.comments().stream().filter(c -> c.startsWith(prefix)).map(c -> c.substring(prefix.length()).strip())
                .findFirst();
    }

    @Override
    public String name() {
        return table.source();
    }

    @Override
    public List<ColumnHeading> headings() {
        return headings;
    }

    @Override
    public int rowCount() {
        return table.rows().size();
    }

    @Override
    public int rowNumber(int row) {
        return table.rows().get(row).number();
    }

    @Override
    public String where(int row) {
        CellTable.Row r = table.rows().get(row);
        return "row " + r.number() + " (line " + r.line() + ")";
    }

    @Override
    public int width(int row) {
        return cells(row).size();
    }

    @Override
    public String cell(int row, int column) {
        return cells(row).get(column);
    }

    @Override
    public double number(int row, int column) {
        return NumberCells.parse(cell(row, column));
    }

    /** The cells of one row, unpacked once for the reads of that row (rows are read in order). */
    private List<String> cells(int row) {
        if (row != cachedRow) {
            cachedCells = table.rows().get(row).cells();
            cachedRow = row;
        }
        return cachedCells;
    }
}
