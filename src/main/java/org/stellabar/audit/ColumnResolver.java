package org.stellabar.audit;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Unit;
import org.stellabar.physics.Units;
import org.stellabar.table.ColumnHeading;

/**
 * Finds the file's column for each quantity ({@link ColumnMapping}) and the unit its values are
 * written in: from {@code --units}, else from the file's heading, else CGS.
 */
final class ColumnResolver {

    private final ColumnMapping mapping;

    /** @param mapping which column holds which quantity, and units */
    ColumnResolver(ColumnMapping mapping) {
        this.mapping = Objects.requireNonNull(mapping, "mapping");
    }

    /**
     * The file's column names made unique ("T", "T_2"), blanks named by position ("column_3").
     *
     * @param headings the header
     * @return the names, empty if the header row is empty
     */
    static List<String> columnNames(List<ColumnHeading> headings) {
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

    /**
     * @param source the table
     * @param names its unique column names
     * @return the column of each quantity found, in quantity order
     * @throws BadInputException for a missing required or explicitly named column, a column
     *     named twice, an unknown unit, or a key of {@code --units} that matches nothing in use
     */
    Map<ProfileQuantity, MappedColumn> resolve(ProfileSource source, List<String> names) {
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
            found.put(q, unitOf(q, j, wanted, headings.get(j), source.name()));
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

    private MappedColumn unitOf(ProfileQuantity q, int j, String column, ColumnHeading heading, String file) {
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
            return mapped(q, j, column, read(q, given, "--units " + q.key()), "from --units");
        }
        if (heading.unit() != null) {
            return mapped(q, j, column, read(q, heading.unit(), file + ": column '" + column + "' ("
                    + q.key() + "), unit from the file"), "from the file");
        }
        return mapped(q, j, column, q.dimension() == null ? Unit.NONE : Unit.of(q.dimension().cgsUnit()).orElseThrow(),
                q.dimension() == null ? "dimensionless" : "none stated: CGS assumed");
    }

    private static MappedColumn mapped(ProfileQuantity q, int j, String column, Unit unit, String origin) {
        return new MappedColumn(q, j, column, unit.spelling(), unit.cgsFactor(), origin);
    }

    /**
     * A column's unit text as a row of the unit table ({@link Unit#read}: our spellings, the input
     * and FITS spellings). A dimensionless quantity takes no unit, "" or "1"; a dimensional one
     * given none is in CGS.
     *
     * @throws BadInputException for an unknown unit or one of another dimension
     */
    private static Unit read(ProfileQuantity q, String text, String subject) {
        String u = text.strip();
        Dimension d = q.dimension();
        if (d == null) {
            if (u.isEmpty() || u.equals("1")) {
                return Unit.NONE;
            }
            throw new BadInputException(subject, "unit '" + u + "' given for " + q.key() + " (" + q.label()
                    + "), which is dimensionless; leave its unit empty");
        }
        if (u.isEmpty()) {
            return Unit.of(d.cgsUnit()).orElseThrow();
        }
        Optional<Unit> unit = Unit.read(u);
        if (unit.isPresent() && unit.get().dimension().orElse(null) == d) {
            return unit.get();
        }
        throw Units.unknownUnit(subject, unit.map(Unit::spelling).orElse(u), d);
    }
}
