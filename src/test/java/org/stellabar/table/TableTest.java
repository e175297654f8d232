package org.stellabar.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.physics.Constants;

class TableTest {

    private static final Metadata META = Metadata.of("test", Inputs.none(), List.of());

    @Nested
    class Numbers {

        @ParameterizedTest
        @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
        void columnRefusesNonFiniteValuesInAnyRow(double bad) {
            for (int row = 0; row < 3; row++) {
                double[] values = {1, 2, 3};
                values[row] = bad;
                IllegalStateException e = assertThrows(IllegalStateException.class,
                        () -> new NumberColumn("P", "dyn/cm2", "pressure", values));
                assertTrue(e.getMessage().contains("row " + (row + 1)), e.getMessage());
            }
        }

        /** A long column is checked in chunks on several threads: every chunk, and the first bad row named. */
        @ParameterizedTest
        @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
        void longColumnRefusesNonFiniteValuesInAnyChunk(double bad) {
            int n = 300_001;
            for (int row : new int[] {0, 65_535, 65_536, 200_000, n - 1}) {
                double[] values = new double[n];
                java.util.Arrays.fill(values, 2.5);
                values[row] = bad;
                if (row < n - 1) {
                    values[n - 1] = Double.NaN; // a later bad row too: the first is named
                }
                IllegalStateException e = assertThrows(IllegalStateException.class,
                        () -> new NumberColumn("P", "dyn/cm2", "pressure", values));
                assertTrue(e.getMessage().contains("row " + (row + 1) + " "), e.getMessage());
            }
            double[] whole = new double[n];
            java.util.Arrays.fill(whole, 3.0);
            whole[150_000] = 3.5;
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> new NumberColumn("k", "", "count", whole, true));
            assertTrue(e.getMessage().contains("row 150001 "), e.getMessage());
        }

        @ParameterizedTest
        @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
        void fieldRefusesNonFiniteNumbers(double bad) {
            assertThrows(IllegalStateException.class, () -> new NumberField("c_P", bad, "erg/g/K", "heat capacity"));
            assertThrows(IllegalStateException.class,
                    () -> new Summary.Builder("s", META).number("c_P", bad, "erg/g/K", "heat capacity"));
        }

        @Test
        void columnCopiesInAndOut() {
            double[] values = {1, 2, 3};
            NumberColumn c = new NumberColumn("rho", "g/cm3", "density", values);
            values[0] = 99;
            assertEquals(1.0, c.get(0));
            c.values()[1] = 99;
            assertEquals(2.0, c.get(1));
            assertEquals(3, c.size());
        }

        /** A column made by taking its array is checked like any other and equals a copied one. */
        @Test
        void takenColumnIsCheckedAndEqualsACopiedOne() {
            double[] values = {1, 2, 3};
            NumberColumn copied = new NumberColumn("rho", "g/cm3", "density", values.clone(), false);
            NumberColumn taken = NumberColumn.taking("rho", "g/cm3", "density", values, false);
            assertEquals(copied, taken);
            assertEquals(copied.hashCode(), taken.hashCode());
            taken.values()[0] = 99;
            assertEquals(1.0, taken.get(0));
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> NumberColumn.taking("P", "dyn/cm2", "pressure", new double[] {1, Double.NaN}, false));
            assertTrue(e.getMessage().contains("row 2"), e.getMessage());
            assertThrows(IllegalStateException.class,
                    () -> NumberColumn.taking("k", "", "count", new double[] {1, 2.5}, true));
            Quantity q = new Quantity("k", "", "count", true);
            Table t = new Table.Builder("t", META).numberTaking(q, new double[] {4, 5}).build();
            assertEquals(q, t.numbers("k").quantity());
            assertEquals(5L, t.numbers("k").getLong(1));
        }

        /** Equality is by name, unit, description, kind and every value (bit for bit). */
        @Test
        void columnsAreEqualByContent() {
            NumberColumn a = new NumberColumn("x", "", "d", new double[] {0.0, 1});
            assertEquals(a, new NumberColumn("x", "", "d", new double[] {0.0, 1}));
            assertNotEquals(a, new NumberColumn("x", "", "d", new double[] {-0.0, 1}));
            assertNotEquals(a, new NumberColumn("y", "", "d", new double[] {0.0, 1}));
            assertNotEquals(a, new NumberColumn("x", "K", "d", new double[] {0.0, 1}));
            assertNotEquals(a, new NumberColumn("x", "", "d", new double[] {0.0, 1}, true));
        }

        @Test
        void extremeFiniteValuesAreKept() {
            NumberColumn c = new NumberColumn("x", "", "", new double[] {Double.MAX_VALUE, Double.MIN_VALUE, -0.0});
            assertEquals(Double.MAX_VALUE, c.get(0));
            assertEquals(Double.MIN_VALUE, c.get(1));
        }
    }

    @Nested
    class Fields {

        @Test
        void supportedValueTypes() {
            Table t = new Table.Builder("t", META).number("x", "", "", new double[] {1}).build();
            Summary inner = new Summary.Builder("inner", META).number("a", 1, "", "").build();
            Summary s = new Summary.Builder("s", META).number("d", 1.5, "K", "").integer("n", 3, "").text("t", "x", "")
                    .flag("b", true, "").nested("inner", inner, "").summaries("list", List.of(inner), "")
                    .integers("rows", List.of(4L, 9L), "").table("table", t, "").build();
            assertEquals(8, s.fields().size());
            assertEquals(1.5, s.number("d"));
            assertEquals(3.0, s.number("n"));
            assertTrue(s.field("missing").isEmpty());
            assertThrows(IllegalArgumentException.class, () -> s.number("missing"));
            assertThrows(IllegalArgumentException.class, () -> s.number("t"), "text is not a number");
            assertEquals(t, s.table("table"));
            assertThrows(IllegalArgumentException.class, () -> s.table("d"));
            // each kind is its own type: writers match on it, nobody casts a value
            assertEquals(List.of(NumberField.class, IntegerField.class, TextField.class, FlagField.class,
                    NestedField.class, SummaryListField.class, IntegerListField.class, TableField.class),
                    s.fields().stream().map(Object::getClass).toList());
            assertEquals("K", s.field("d").orElseThrow().unit());
            assertEquals("", s.field("n").orElseThrow().unit());
            assertEquals(List.of(true, true, true, true, false, false, false, false),
                    s.fields().stream().map(Field::scalar).toList());
        }

        @Test
        void missingValuesAreRefused() {
            Summary.Builder b = new Summary.Builder("s", META);
            assertThrows(NullPointerException.class, () -> b.text("n", null, ""));
            assertThrows(NullPointerException.class, () -> b.nested("n", null, ""));
            assertThrows(NullPointerException.class, () -> new TextField("t", null, ""));
            assertThrows(NullPointerException.class, () -> new NestedField("s", null, ""));
        }

        @Test
        void listIsCopied() {
            Summary inner = new Summary.Builder("inner", META).build();
            List<Summary> list = new ArrayList<>(List.of(inner));
            SummaryListField f = new SummaryListField("l", list, "");
            List<Long> rows = new ArrayList<>(List.of(1L, 2L));
            IntegerListField g = new IntegerListField("r", rows, "");
            list.clear();
            rows.clear();
            assertEquals(1, f.value().size());
            assertEquals(2, g.value().size());
        }

        @Test
        void duplicateNamesAreRefused() {
            assertThrows(IllegalArgumentException.class,
                    () -> new Summary.Builder("s", META).number("a", 1, "", "").number("a", 2, "", "").build());
        }
    }

    @Nested
    class Tables {

        @Test
        void columnsOfOneLengthWithUniqueNames() {
            Table t = new Table.Builder("grid", META).number("rho", "g/cm3", "density", new double[] {1, 2})
                    .text("name", "label", List.of("a", "b")).build();
            assertEquals(2, t.rowCount());
            assertEquals("g/cm3", t.numbers("rho").unit());
            assertEquals("", t.column("name").orElseThrow().unit());
            assertThrows(IllegalArgumentException.class, () -> t.numbers("name"));
            assertThrows(IllegalArgumentException.class, () -> t.numbers("missing"));
            assertThrows(IllegalArgumentException.class, () -> new Table.Builder("t", META)
                    .number("x", "", "", new double[] {1, 2}).number("y", "", "", new double[] {1}).build());
            assertThrows(IllegalArgumentException.class, () -> new Table.Builder("t", META)
                    .number("x", "", "", new double[] {1}).number("x", "", "", new double[] {1}).build());
            assertEquals(0, new Table.Builder("empty", META).build().rowCount());
        }
    }

    @Test
    void metadataIsStampedAndImmutable() {
        List<Input> inputs = new ArrayList<>(List.of(new NumberInput("rho", 1, "g/cm3", "density"),
                new NumberInput("T", 1e7, "K", ""), new IntegerInput("points", 3, ""), new TextInput("kind", "standard")));
        Metadata m = Metadata.of("one state", new Inputs(inputs), List.of("note one"));
        inputs.add(new TextInput("late", "x"));
        assertEquals(List.of("rho", "T", "points", "kind"), m.inputs().list().stream().map(Input::name).toList());
        assertEquals(List.of("1.0 g/cm3", "1.0E7 K", "3", "standard"),
                m.inputs().list().stream().map(Input::text).toList());
        assertEquals(Constants.RELEASE, m.constants());
        assertEquals(Version.current(), m.toolVersion());
        assertThrows(UnsupportedOperationException.class, () -> m.inputs().list().add(new TextInput("x", "y")));
        assertEquals(new NumberInput("T", 1e7, "K", ""), m.inputs().get("T").orElseThrow());
        Map<String, String> seen = new LinkedHashMap<>();
        m.inputs().forEach(seen::put);
        assertEquals("1.0 g/cm3", seen.get("rho"));
        assertThrows(IllegalArgumentException.class, () -> Inputs.builder().text("a", "x").integer("a", 1, "").build());
        assertThrows(IllegalStateException.class, () -> new NumberInput("x", Double.NaN, "", ""));
        assertEquals(List.of("note one", "note two"), m.withNote("note two").notes());
        assertEquals(List.of("note one"), m.notes());
    }
}
