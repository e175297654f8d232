package org.stellabar.table;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

class QuantityTest {

    private static final Metadata META = Metadata.of("test", Inputs.none(), List.of());
    private static final Quantity RHO = new Quantity("rho", "g/cm3", "density");

    @Test
    void columnAndFieldCarryTheDeclaration() {
        Table t = new Table.Builder("t", META).number(RHO, new double[] {1, 2}).build();
        assertEquals(new NumberColumn("rho", "g/cm3", "density", new double[] {1, 2}).quantity(),
                t.numbers(RHO).quantity());
        assertArrayEquals(new double[] {1, 2}, t.numbers(RHO).values());
        Summary s = new Summary.Builder("s", META).number(RHO, 3.5).build();
        assertEquals(new NumberField("rho", 3.5, "g/cm3", "density"), s.fields().get(0));
        assertEquals(RHO, ((NumberField) s.fields().get(0)).quantity());
    }

    @Test
    void derivedDeclarationsKeepTheUnit() {
        Quantity central = RHO.withName("rho_c").withDescription("central density");
        assertEquals(new Quantity("rho_c", "g/cm3", "central density"), central);
        assertEquals("", Quantity.dimensionless("beta", "fraction").unit());
    }

    @Test
    void declarationsAreComplete() {
        assertThrows(NullPointerException.class, () -> new Quantity("x", null, ""));
        assertThrows(NullPointerException.class, () -> new Quantity("x", "", null));
        assertThrows(IllegalArgumentException.class, () -> new Quantity(" ", "", ""));
        assertThrows(IllegalStateException.class, () -> RHO.field(Double.NaN));
        assertThrows(IllegalStateException.class, () -> RHO.column(new double[] {Double.POSITIVE_INFINITY}));
    }
}
