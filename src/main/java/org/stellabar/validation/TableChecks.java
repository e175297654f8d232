package org.stellabar.validation;

import java.util.ArrayList;
import java.util.List;
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

    private TableChecks() {
    }

    /**
     * @param family the family's identifier, which every table's header must name
     * @param source where the tables are
     * @param files the table file names
     * @return the tables, checked to belong to the family
     */
    static List<ReferenceTable> read(String family, ReferenceSource source, List<String> files) {
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
    static List<CheckResult> compare(String family, List<ReferenceTable> tables, Evaluator evaluator) {
        List<CheckResult> results = new ArrayList<>();
        for (ReferenceTable table : tables) {
            for (ReferenceValue row : table.rows()) {
                results.add(CheckResult.compare(family, row, evaluator.ours(row)));
            }
        }
        return results;
    }

    /** @return the error for a quantity the family does not know */
    static BadInputException unknownQuantity(ReferenceValue row, String family, String known) {
        return new BadInputException(row.where() + ": quantity \"" + row.quantity() + "\" is not checked by family "
                + family + " (known: " + known + ")");
    }
}
