package org.stellabar.survey;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.table.Table;

class EosGridTest {

    private static final Composition SOLAR_LIKE = Composition.fromAnyTwo(0.7, Double.NaN, 0.02);

    @Test
    void rowsAreDensityOuterTemperatureInnerAndMatchSingleStates() {
        EosGrid.Spec spec = new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e-6, 1e2, 5, 1e4, 1e8, 7, SOLAR_LIKE);
        Table t = new EosGrid(2).evaluate(spec);
        assertEquals(35, t.rowCount());
        double[] rho = t.numbers("rho").values();
        double[] temp = t.numbers("T").values();
        double[] gamma1 = t.numbers("Gamma1").values();
        GasRadiationEos eos = new GasRadiationEos(SOLAR_LIKE);
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 7; j++) {
                int row = i * 7 + j;
                // log spacing, exact at the ends: 10^(-6 + 2i), 10^(4 + 4j/6)
                assertEquals(Math.pow(10, -6 + 2.0 * i), rho[row], 1e-12 * rho[row]);
                assertEquals(Math.pow(10, 4 + 4.0 * j / 6), temp[row], 1e-12 * temp[row]);
                EosState s = eos.state(rho[row], temp[row]);
                // the array path and the record path compute the same expressions
                assertEquals(s.Gamma1(), gamma1[row], 0.0);
                assertEquals(s.P(), t.numbers("P").get(row), 0.0);
            }
        }
    }

    @Test
    void resultDoesNotDependOnThreadCount() {
        EosGrid.Spec spec = new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e-10, 1e8, 150, 1e3, 1e10, 120, SOLAR_LIKE);
        Table one = new EosGrid(1).evaluate(spec);
        Table four = new EosGrid(4).evaluate(spec);
        for (String c : new String[] {"P", "beta", "one_minus_beta", "s", "warning_mask"}) {
            assertArrayEquals(one.numbers(c).values(), four.numbers(c).values(), c);
        }
    }

    @Test
    void partsOfTheOuterAxisConcatenateToTheWholeGrid() {
        EosGrid.Spec spec = new EosGrid.Spec(EosGrid.Plane.P_T, 1e8, 1e20, 13, 1e4, 1e9, 9, SOLAR_LIKE);
        Table whole = new EosGrid(2).evaluate(spec);
        java.util.List<Double> joined = new java.util.ArrayList<>();
        // parts 0-3, 4-8, 9-12 of the 13 pressures, some with points left out below aT^4/3
        int[][] parts = {{0, 4}, {4, 9}, {9, 13}};
        for (int[] p : parts) {
            for (double v : new EosGrid(1).evaluate(spec, p[0], p[1]).numbers("s").values()) {
                joined.add(v);
            }
        }
        double[] all = whole.numbers("s").values();
        assertEquals(all.length, joined.size());
        for (int i = 0; i < all.length; i++) {
            assertEquals(all[i], joined.get(i), 0.0, "row " + i);
        }
    }

    /**
     * The fermi grid is computed temperature by temperature in interleaved blocks: its table must not
     * depend on that, nor on the number of threads, nor on which part of the outer axis is computed,
     * and every row must be the single state at its (ρ, T) bit for bit.
     */
    @Test
    void fermiGridIsTheSameForAnyThreadsPartsAndOrder() {
        Composition oxygen = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);
        EosGrid.Spec spec = new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e-8, 1e9, 23, 1e4, 3e10, 17, oxygen,
                org.stellabar.eos.Electrons.fermi);
        Table one = new EosGrid(1).evaluate(spec);
        Table three = new EosGrid(3).evaluate(spec);
        String[] columns = {"rho", "T", "P", "s", "Gamma1", "eta", "n_positron", "warning_mask"};
        for (String c : columns) {
            assertArrayEquals(one.numbers(c).values(), three.numbers(c).values(), c);
        }
        java.util.List<Double> joined = new java.util.ArrayList<>();
        for (int[] p : new int[][] {{0, 7}, {7, 8}, {8, 23}}) {
            for (double v : new EosGrid(2).evaluate(spec, p[0], p[1]).numbers("Gamma1").values()) {
                joined.add(v);
            }
        }
        double[] whole = one.numbers("Gamma1").values();
        assertEquals(whole.length, joined.size());
        for (int i = 0; i < whole.length; i++) {
            assertEquals(whole[i], joined.get(i), 0.0, "row " + i);
        }
        org.stellabar.eos.fermi.FermiGasRadiationEos eos = new org.stellabar.eos.fermi.FermiGasRadiationEos(oxygen);
        double[] rho = one.numbers("rho").values();
        double[] temp = one.numbers("T").values();
        for (int row = rho.length - 1; row >= 0; row -= 5) {
            org.stellabar.eos.fermi.FermiGasRadiationEos.FermiState fs = eos.fermiState(rho[row], temp[row]);
            assertEquals(fs.common().P(), one.numbers("P").get(row), 0.0, "row " + row);
            assertEquals(fs.eta(), one.numbers("eta").get(row), 0.0, "row " + row);
        }
    }

    @Test
    void pressureTemperatureGridLeavesOutPointsBelowRadiationPressure() {
        EosGrid.Spec spec = new EosGrid.Spec(EosGrid.Plane.P_T, 1e10, 1e20, 11, 1e6, 1e9, 10, SOLAR_LIKE);
        Table t = new EosGrid(2).evaluate(spec);
        int expected = 0;
        for (double p : EosGrid.logSpaced(1e10, 1e20, 11)) {
            for (double temp : EosGrid.logSpaced(1e6, 1e9, 10)) {
                if (p > Constants.RADIATION_DENSITY * Math.pow(temp, 4) / 3) {
                    expected++;
                }
            }
        }
        assertTrue(expected > 0 && expected < 110);
        assertEquals(expected, t.rowCount());
        double[] p = t.numbers("P").values();
        double[] given = EosGrid.logSpaced(1e10, 1e20, 11);
        // every row's recomputed total pressure is one of the requested pressures to rounding
        for (double v : p) {
            double nearest = Double.MAX_VALUE;
            for (double g : given) {
                nearest = Math.min(nearest, Math.abs(v / g - 1));
            }
            assertTrue(nearest < 1e-12, "P = " + v);
        }
        assertTrue(t.metadata().notes().stream().anyMatch(n -> n.contains("omitted")));
    }

    @Test
    void badRangesAreBadInput() {
        assertThrows(BadInputException.class,
                () -> new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e2, 1e-2, 5, 1e4, 1e8, 5, SOLAR_LIKE));
        assertThrows(BadInputException.class,
                () -> new EosGrid.Spec(EosGrid.Plane.RHO_T, -1, 1, 5, 1e4, 1e8, 5, SOLAR_LIKE));
        assertThrows(BadInputException.class,
                () -> new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e-2, 1, 100_000, 1e4, 1e8, 100_000, SOLAR_LIKE));
    }
}
