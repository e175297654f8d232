package org.stellabar.output;

import org.stellabar.table.Field;
import org.stellabar.table.FlagField;
import org.stellabar.table.IntegerField;
import org.stellabar.table.IntegerListField;
import org.stellabar.table.Input;
import org.stellabar.table.NumberInput;
import org.stellabar.table.NestedField;
import org.stellabar.table.NumberField;
import org.stellabar.table.SummaryListField;
import org.stellabar.table.TableField;
import org.stellabar.table.TextField;

/** A field's value as plain text, for writers that show a list item on one line. */
final class FieldText {

    private FieldText() {
    }

    /**
     * @param input a metadata input
     * @return its value on one line, a number's unit in the written spelling ("40.0 solMass")
     */
    static String input(Input input) {
        if (input instanceof NumberInput n && !n.unit().isEmpty()) {
            return n.value() + " " + FitsUnits.written(n.unit());
        }
        return input.text();
    }

    /**
     * @param f a field
     * @return a number as Java prints a double, an integer, text or flag as itself; other kinds as
     *     their value's own text
     */
    static String plain(Field f) {
        if (f instanceof NumberField n) {
            return Double.toString(n.value());
        } else if (f instanceof IntegerField i) {
            return Long.toString(i.value());
        } else if (f instanceof TextField t) {
            return t.value();
        } else if (f instanceof FlagField b) {
            return Boolean.toString(b.value());
        } else if (f instanceof NestedField s) {
            return String.valueOf(s.value());
        } else if (f instanceof SummaryListField list) {
            return String.valueOf(list.value());
        } else if (f instanceof IntegerListField list) {
            return String.valueOf(list.value());
        } else if (f instanceof TableField t) {
            return String.valueOf(t.value());
        }
        throw new IllegalArgumentException("unknown field kind " + f.getClass());
    }
}
