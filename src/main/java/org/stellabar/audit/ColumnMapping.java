package org.stellabar.audit;

import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import org.stellabar.physics.BadInputException;

/**
 * Which column of a profile holds which quantity, and in which unit. A quantity named here is
 * looked up under the given column name; a quantity not named is looked up under stellabar's own
 * name for it ({@link ProfileQuantity#key()}), so our own profiles need no mapping. Units given
 * here (by quantity key or by column name) override the unit the file states.
 */
public final class ColumnMapping {

    private final Map<ProfileQuantity, String> columns;
    private final Map<String, String> units;

    private ColumnMapping(Map<ProfileQuantity, String> columns, Map<String, String> units) {
        Map<ProfileQuantity, String> copy = new EnumMap<>(ProfileQuantity.class);
        copy.putAll(columns);
        this.columns = Collections.unmodifiableMap(copy);
        this.units = Collections.unmodifiableMap(new LinkedHashMap<>(units));
    }

    /** @return the mapping that recognises stellabar's own column names and units only */
    public static ColumnMapping ourNames() {
        return new ColumnMapping(new EnumMap<>(ProfileQuantity.class), Map.of());
    }

    /**
     * A mapping from {@code key=column} entries.
     *
     * @param entries quantity key → column name, in the user's order
     * @return the mapping
     * @throws BadInputException (about {@code --columns}) for an unknown key, an empty name, or a
     *     column named for two quantities
     */
    public static ColumnMapping of(Map<String, String> entries) {
        Map<ProfileQuantity, String> columns = new EnumMap<>(ProfileQuantity.class);
        Map<String, ProfileQuantity> used = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : entries.entrySet()) {
            ProfileQuantity q = ProfileQuantity.ofKey(e.getKey().strip());
            if (q == null) {
                throw new BadInputException("--columns: '" + e.getKey() + "' is not a profile quantity; known: "
                        + ProfileQuantity.keys());
            }
            String name = e.getValue() == null ? "" : e.getValue().strip();
            if (name.isEmpty()) {
                throw new BadInputException("--columns: " + q.key() + "= names no column; write " + q.key()
                        + "=COLUMN_NAME");
            }
            ProfileQuantity before = used.put(name, q);
            if (before != null && before != q) {
                throw new BadInputException("--columns: column '" + name + "' is named for both " + before.key()
                        + " and " + q.key() + "; a column holds one quantity");
            }
            columns.put(q, name);
        }
        return new ColumnMapping(columns, Map.of());
    }

    /**
     * The same mapping with units from {@code key=unit} entries, the key being a quantity key or a
     * column name. Keys are checked against the profile when it is read.
     *
     * @param entries key → unit text, e.g. rho → g/cm3, radius_cm → cm
     * @return a new mapping
     * @throws BadInputException (about {@code --units}) for an empty key
     */
    public ColumnMapping withUnits(Map<String, String> entries) {
        Map<String, String> u = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : entries.entrySet()) {
            String key = e.getKey().strip();
            if (key.isEmpty()) {
                throw new BadInputException("--units: an entry '=" + e.getValue() + "' names no quantity or column;"
                        + " write KEY=UNIT, e.g. rho=g/cm3");
            }
            u.put(key, e.getValue() == null ? "" : e.getValue().strip());
        }
        return new ColumnMapping(columns, u);
    }

    /** @return the column names given explicitly, by quantity */
    public Map<ProfileQuantity, String> columns() {
        return columns;
    }

    /** @return the units given explicitly, by quantity key or column name */
    public Map<String, String> units() {
        return units;
    }

    /**
     * @param quantity a quantity
     * @return the column name to look for: the explicit one, else our own name
     */
    public String columnFor(ProfileQuantity quantity) {
        return columns.getOrDefault(quantity, quantity.key());
    }

    /**
     * @param quantity a quantity
     * @return true if the user named its column
     */
    public boolean isExplicit(ProfileQuantity quantity) {
        return columns.containsKey(quantity);
    }
}
