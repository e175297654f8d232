package org.stellabar.validation;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.stream.Stream;
import org.stellabar.physics.BadInputException;

/** Reads a family's tables and compares each row with our value for it. */
final class TableChecks {

    /** Our value for one reference row. */
    @FunctionalInterface
    interface Evaluator {
        /**
         * @param row the reference row
         * @return our value of the row's quantity at its parameters
         * @throws BadInputException for a quantity or parameter this family does not know
         */
        double ours(ReferenceValue row);
    }

    /** The charts of a family, drawn from its tables and its checks. */
    @FunctionalInterface
    interface Charts {
        List<ReportChart> draw(List<ReferenceTable> tables, List<CheckResult> checks);
    }

    /** For a family without charts. */
    static final Charts NO_CHARTS = (tables, checks) -> List.of();

    private TableChecks() {
    }

    /**
     * What every table-backed family does: reads its tables, compares each row with our value and
     * puts the result together with the family's description and charts.
     *
     * @param family the family's identifier, which every table's header must name
     * @param title the heading in the report
     * @param source where the tables are
     * @param files the table file names
     * @param evaluator our value for each row, made once the tables are read (some families need them)
     * @param charts the family's charts
     * @param description paragraphs describing the family and its sources (Markdown), in order
     * @return the family's result
     */
    static FamilyResult run(String family, String title, ReferenceSource source, List<String> files,
            Function<List<ReferenceTable>, Evaluator> evaluator, Charts charts, String... description) {
        List<ReferenceTable> tables = read(family, source, files);
        List<CheckResult> checks = compare(family, tables, evaluator.apply(tables));
        return new FamilyResult(family, title, List.of(description), tables, checks, charts.draw(tables, checks));
    }

    /** @return every row of the tables, in table and row order */
    static Stream<ReferenceValue> rows(List<ReferenceTable> tables) {
        return tables.stream().flatMap(t -> t.rows().stream());
    }

    /**
     * @param family the family's identifier, which every table's header must name
     * @param source where the tables are
     * @param files the table file names
     * @return the tables, checked to belong to the family
     */
    private static List<ReferenceTable> read(String family, ReferenceSource source, List<String> files) {
        List<ReferenceTable> tables = new ArrayList<>();
        for (String file : files) {
            ReferenceTable table = ReferenceTableReader.read(source, file);
            if (!table.family().equals(family)) {
                throw new BadInputException(file + ": header says family \"" + table.family() + "\", expected \""
                        + family + "\"");
            }
            tables.add(table);
        }
        return tables;
    }

    /**
     * @param family the family's identifier
     * @param tables the tables
     * @param evaluator our value for each row
     * @return one result per row, in table and row order
     */
    private static List<CheckResult> compare(String family, List<ReferenceTable> tables, Evaluator evaluator) {
        return rows(tables).map(row -> CheckResult.compare(family, row, ours(evaluator, row))).toList();
    }

    /** Our value for a row; a row our code refuses (n = 7, say) is named by file and line. */
    private static double ours(Evaluator evaluator, ReferenceValue row) {
        try {
            return evaluator.ours(row);
        } catch (BadInputException e) {
            if (e.getMessage().startsWith(row.where())) {
                throw e;
            }
            throw new BadInputException(row.where(), e.getMessage());
        }
    }

    /** @return the error for a quantity the family does not know */
    static BadInputException unknownQuantity(ReferenceValue row, String family, String known) {
        return new BadInputException(row.where() + ": quantity \"" + row.quantity() + "\" is not checked by family "
                + family + " (known: " + known + ")");
    }
}
