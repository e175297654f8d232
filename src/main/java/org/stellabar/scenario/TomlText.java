package org.stellabar.scenario;

import java.util.ArrayList;
import java.util.List;
import org.tomlj.TomlArray;
import org.tomlj.TomlTable;

/** Writes a parsed TOML value back as TOML text for error messages. */
final class TomlText {

    /** Values longer than this are cut, so that an error stays one readable line. */
    private static final int MAX_LENGTH = 80;

    private TomlText() {
    }

    /** @return the value as TOML text, cut to {@value #MAX_LENGTH} characters */
    static String of(Object value) {
        String text = render(value);
        return text.length() > MAX_LENGTH ? text.substring(0, MAX_LENGTH - 3) + "..." : text;
    }

    private static String render(Object value) {
        if (value instanceof String s) {
            return "\"" + s.replace("\\", "\\\\").replace("\"", "\\\"").replace("\n", "\\n").replace("\t", "\\t")
                    + "\"";
        }
        if (value instanceof Double d) {
            if (d.isNaN()) {
                return "nan";
            }
            if (d.isInfinite()) {
                return d > 0 ? "inf" : "-inf";
            }
            return d.toString().replace('E', 'e');
        }
        if (value instanceof TomlArray array) {
            List<String> parts = new ArrayList<>();
            for (int i = 0; i < array.size(); i++) {
                parts.add(render(array.get(i)));
            }
            return "[" + String.join(", ", parts) + "]";
        }
        if (value instanceof TomlTable table) {
            List<String> parts = new ArrayList<>();
            for (String key : table.keySet()) {
                parts.add(key + " = " + render(table.get(List.of(key))));
            }
            return "{" + String.join(", ", parts) + "}";
        }
        return String.valueOf(value);
    }

    /** @return "a string", "an integer", ... for the TOML type of a value */
    static String typeOf(Object value) {
        if (value instanceof String) {
            return "a string";
        }
        if (value instanceof Long) {
            return "an integer";
        }
        if (value instanceof Double) {
            return "a number";
        }
        if (value instanceof Boolean) {
            return "a boolean";
        }
        if (value instanceof TomlArray) {
            return "an array";
        }
        if (value instanceof TomlTable) {
            return "a table";
        }
        return "a date or time";
    }
}
