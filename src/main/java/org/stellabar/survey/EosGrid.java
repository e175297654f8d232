package org.stellabar.survey;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.EosArrays;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityCheck;
import org.stellabar.eos.ValidityWarning;
import org.stellabar.eos.fermi.FermiEosInversion;
import org.stellabar.eos.fermi.FermiEosSummary;
import org.stellabar.eos.fermi.FermiGasRadiationEos;
import org.stellabar.numerics.LargeArrays;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * The equation of state over a logarithmic grid of density (or total pressure) and temperature,
 * through the allocation-free array path of {@link GasRadiationEos}.
 *
 * <p>Rows are in a fixed order: the first variable (ρ or P) is the outer index, temperature the
 * inner one, each increasing. The grid is cut into contiguous blocks evaluated in parallel; each
 * point depends on its own inputs only, so the table is identical for any number of threads.
 * On a P–T grid, points with P ≤ aT⁴/3 have no gas density and are left out; their number is
 * recorded in the metadata.
 */
public final class EosGrid {

    /** The variable paired with temperature on the grid. */
    public enum Plane {
        /** density–temperature */
        RHO_T,
        /** total pressure–temperature */
        P_T
    }

    /** Upper bound on grid points, to refuse requests that would exhaust memory (16 columns × 8 B each). */
    public static final long MAX_POINTS = 20_000_000L;

    /**
     * A grid request.
     *
     * @param plane ρ–T or P–T
     * @param firstMin lower end of ρ [g/cm3] or P [dyn/cm2]
     * @param firstMax upper end
     * @param firstPoints number of points along ρ or P
     * @param tMin lower end of T [K]
     * @param tMax upper end of T [K]
     * @param tPoints number of points along T
     * @param composition the mixture
     * @param electrons which equation of state
     */
    public record Spec(Plane plane, double firstMin, double firstMax, int firstPoints, double tMin, double tMax,
            int tPoints, Composition composition, Electrons electrons) {

        /**
         * A grid of the classical mixture.
         *
         * @param plane ρ–T or P–T
         * @param firstMin lower end of ρ or P
         * @param firstMax upper end
         * @param firstPoints points along ρ or P
         * @param tMin lower end of T [K]
         * @param tMax upper end of T [K]
         * @param tPoints points along T
         * @param composition the mixture
         */
        public Spec(Plane plane, double firstMin, double firstMax, int firstPoints, double tMin, double tMax,
                int tPoints, Composition composition) {
            this(plane, firstMin, firstMax, firstPoints, tMin, tMax, tPoints, composition, Electrons.classical);
        }

        /**
         * Canonical constructor: checks ranges and consistency.
         *
         * @param plane ρ–T or P–T
         * @param firstMin lower end of ρ [g/cm3] or P [dyn/cm2]
         * @param firstMax upper end
         * @param firstPoints number of points along ρ or P
         * @param tMin lower end of T [K]
         * @param tMax upper end of T [K]
         * @param tPoints number of points along T
         * @param composition the mixture
         * @param electrons which equation of state treats the electrons
         */
        public Spec {
            java.util.Objects.requireNonNull(electrons, "electrons");
            String first = plane == Plane.RHO_T ? "density" : "pressure";
            checkRange(first, firstMin, firstMax, firstPoints);
            checkRange("temperature", tMin, tMax, tPoints);
            if ((long) firstPoints * tPoints > MAX_POINTS) {
                throw new BadInputException(String.format(Locale.US,
                        "a grid of %d x %d points exceeds the limit of %d points", firstPoints, tPoints, MAX_POINTS));
            }
        }

        private static void checkRange(String name, double lo, double hi, int points) {
            if (!(lo > 0 && Double.isFinite(lo) && hi > 0 && Double.isFinite(hi))) {
                throw new BadInputException(name + " range " + lo + ":" + hi + " is not allowed; both ends must be"
                        + " positive and finite");
            }
            if (points == 1 ? lo != hi : !(lo < hi)) {
                throw new BadInputException(name + " range " + lo + ":" + hi
                        + " is not allowed; the low end must be below the high end");
            }
            if (points < 1) {
                throw new BadInputException(name + " points = " + points + " is not allowed; give at least 1");
            }
        }
    }

    private final int threads;

    /** A grid evaluator using every available processor. */
    public EosGrid() {
        this(Runtime.getRuntime().availableProcessors());
    }

    /** @param threads number of parallel blocks (at least 1) */
    public EosGrid(int threads) {
        this.threads = Math.max(1, threads);
    }

    /**
     * Evaluates the grid.
     *
     * @param spec the request
     * @return the table: rho, T, P, P_gas, P_rad, beta, one_minus_beta, u, s, Gamma1, Gamma3,
     *     nabla_ad, sound_speed, warning_mask
     */
    public Table evaluate(Spec spec) {
        return evaluate(spec, 0, spec.firstPoints());
    }

    /**
     * Evaluates the rows whose outer (ρ or P) index lies in [from, to): one part of a grid, e.g. for
     * one task of a cluster job array. The parts of a grid, concatenated in index order, are the
     * whole grid row for row.
     *
     * @param spec the request
     * @param from first outer index, inclusive
     * @param to last outer index, exclusive
     * @return the rows of that part, in the same columns as {@link #evaluate(Spec)}
     */
    public Table evaluate(Spec spec, int from, int to) {
        java.util.Objects.checkFromToIndex(from, to, spec.firstPoints());
        if (spec.electrons() != Electrons.classical) {
            return evaluateFermi(spec, from, to);
        }
        GasRadiationEos eos = new GasRadiationEos(spec.composition());
        EosInversion inversion = new EosInversion(eos);
        double[] first = java.util.Arrays.copyOfRange(logSpaced(spec.firstMin(), spec.firstMax(),
                spec.firstPoints()), from, to);
        double[] temps = logSpaced(spec.tMin(), spec.tMax(), spec.tPoints());
        int total = first.length * temps.length;
        double[][] axes = LargeArrays.doubles(2, total);
        double[] rho = axes[0];
        double[] t = axes[1];
        int kept = 0;
        double a3 = Constants.RADIATION_DENSITY / 3.0;
        for (double f : first) {
            for (double temp : temps) {
                if (spec.plane() == Plane.RHO_T) {
                    rho[kept] = f;
                } else {
                    if (f <= a3 * temp * temp * temp * temp) {
                        continue;
                    }
                    rho[kept] = inversion.density(f, temp);
                }
                t[kept] = temp;
                kept++;
            }
        }
        final int candidates = kept;
        EosArrays all = new EosArrays(candidates);
        int blocks = Math.min(threads, Math.max(1, candidates / 4096));
        IntStream.range(0, blocks).parallel().forEach(b -> {
            int start = (int) ((long) candidates * b / blocks);
            int end = (int) ((long) candidates * (b + 1) / blocks);
            eos.evaluate(rho, t, start, end, all);
        });
        // Far outside stellar conditions some quantity of a state overflows the double range (P at
        // T = 1e80 K, say); `eos` refuses such a state, a grid leaves the point out and counts it.
        EosArrays out = finiteOnly(all, rho, t);
        final int n = out.size();
        int overflowing = candidates - n;
        double[] mask = new double[n];
        for (int i = 0; i < n; i++) {
            mask[i] = out.warnings[i];
        }
        Metadata metadata = metadata(spec, from, to, total, candidates, overflowing);
        return new Table.Builder("grid", metadata)
                .numberTaking(EosQuantities.RHO, trim(rho, n))
                .numberTaking(EosQuantities.T, trim(t, n))
                .numberTaking(EosQuantities.P, out.P)
                .numberTaking(EosQuantities.P_GAS, out.Pgas)
                .numberTaking(EosQuantities.P_RAD, out.Prad)
                .numberTaking(EosQuantities.BETA, out.beta)
                .numberTaking(EosQuantities.ONE_MINUS_BETA, out.oneMinusBeta)
                .numberTaking(EosQuantities.U, out.u)
                .numberTaking(EosQuantities.S, out.s)
                .numberTaking(EosQuantities.GAMMA1, out.Gamma1)
                .numberTaking(EosQuantities.GAMMA3, out.Gamma3)
                .numberTaking(EosQuantities.NABLA_AD, out.nablaAd)
                .numberTaking(EosQuantities.SOUND_SPEED, out.soundSpeed)
                .numberTaking(EosQuantities.WARNING_MASK, mask)
                .build();
    }

    /**
     * The grid on the Fermi–Dirac equation of state: one full state per point (no array path), the
     * same columns as the classical grid plus η and n₊; on a P–T grid ρ by
     * {@link FermiEosInversion#density}. A point with no state (outside the inversion's range, or
     * beyond the integrals' range) is left out and counted in the metadata.
     *
     * <p>The points are computed temperature by temperature (each block takes every
     * {@code blocks}-th temperature): the integrals keep their θ-only work per temperature
     * ({@code FermiDiracIntegrals}), which a row of a thousand temperatures would evict from its
     * small table at every point, and interleaved temperatures give each block a like share of the
     * costly degenerate states. A state depends on its (ρ, T) alone and the tables return the
     * numbers a fresh evaluation would, so the table is the same for any order and any number of
     * blocks; each value lands in its row's place.
     */
    private Table evaluateFermi(Spec spec, int from, int to) {
        FermiGasRadiationEos eos = new FermiGasRadiationEos(spec.composition());
        FermiEosInversion inversion = new FermiEosInversion(eos);
        double[] first = java.util.Arrays.copyOfRange(logSpaced(spec.firstMin(), spec.firstMax(),
                spec.firstPoints()), from, to);
        double[] temps = logSpaced(spec.tMin(), spec.tMax(), spec.tPoints());
        int total = first.length * temps.length;
        int columns = 16;
        double[][] col = LargeArrays.doubles(columns, total);
        boolean[] kept = new boolean[total];
        int blocks = Math.min(threads, Math.max(1, Math.min(temps.length, total / 1024)));
        IntStream.range(0, blocks).parallel().forEach(b -> {
            for (int j = b; j < temps.length; j += blocks) {
                double temp = temps[j];
                for (int i = 0; i < first.length; i++) {
                    int k = i * temps.length + j;
                    kept[k] = fermiRow(eos, inversion, spec.plane(), first[i], temp, col, k);
                }
            }
        });
        int n = 0;
        for (int k = 0; k < total; k++) {
            if (kept[k]) {
                for (int c = 0; c < columns; c++) {
                    col[c][n] = col[c][k];
                }
                n++;
            }
        }
        for (int c = 0; c < columns; c++) {
            col[c] = trim(col[c], n);
        }
        Metadata metadata = metadata(spec, from, to, total, total, total - n);
        return new Table.Builder("grid", metadata)
                .numberTaking(EosQuantities.RHO, col[0])
                .numberTaking(EosQuantities.T, col[1])
                .numberTaking(EosQuantities.P, col[2])
                .numberTaking(EosQuantities.P_GAS.withDescription("ion + electron + positron pressure"), col[3])
                .numberTaking(EosQuantities.P_RAD, col[4])
                .numberTaking(EosQuantities.BETA, col[5])
                .numberTaking(EosQuantities.ONE_MINUS_BETA, col[6])
                .numberTaking(EosQuantities.U, col[7])
                .numberTaking(EosQuantities.S.withDescription("specific entropy (ions Sackur-Tetrode + e+e- Fermi gas"
                        + " + radiation)"), col[8])
                .numberTaking(EosQuantities.GAMMA1, col[9])
                .numberTaking(EosQuantities.GAMMA3, col[10])
                .numberTaking(EosQuantities.NABLA_AD, col[11])
                .numberTaking(EosQuantities.SOUND_SPEED, col[12])
                .numberTaking(FermiEosSummary.ETA, col[13])
                .numberTaking(FermiEosSummary.N_POSITRON, col[14])
                .numberTaking(EosQuantities.WARNING_MASK, col[15])
                .build();
    }

    /**
     * One point of the fermi grid into row {@code k} of the columns.
     *
     * @return false where the point has no finite state (the row is then left out)
     */
    private static boolean fermiRow(FermiGasRadiationEos eos, FermiEosInversion inversion, Plane plane, double f,
            double temp, double[][] col, int k) {
        FermiGasRadiationEos.FermiState fs;
        double rho;
        try {
            rho = plane == Plane.RHO_T ? f : inversion.density(f, temp);
            fs = eos.fermiState(rho, temp);
        } catch (BadInputException | ConvergenceException e) {
            return false;
        }
        EosState s = fs.common();
        int mask = 0;
        for (ValidityWarning w : s.warnings()) {
            mask |= w.code().bit();
        }
        double[] row = {rho, temp, s.P(), s.Pgas(), s.Prad(), s.beta(), s.oneMinusBeta(), s.u(), s.s(),
            s.Gamma1(), s.Gamma3(), s.nablaAd(), s.soundSpeed(), fs.eta(), fs.nPositron(), mask};
        for (double v : row) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        for (int c = 0; c < row.length; c++) {
            col[c][k] = row[c];
        }
        return true;
    }

    /** The grid's inputs and notes; {@code omitted} counts points with no finite state. */
    /**
     * The metadata of the whole grid, as {@link #evaluate(Spec)} writes it, from the number of rows
     * its parts hold (for a merge of parts, which computes no state): the points a P–T grid leaves
     * out are counted again from the grid's nodes, and the rest of the missing rows are the states
     * that overflowed or had no solution.
     *
     * @param spec the grid
     * @param rows the rows of the whole grid
     * @return the metadata
     */
    public static Metadata wholeMetadata(Spec spec, int rows) {
        int total = spec.firstPoints() * spec.tPoints();
        int candidates = total;
        if (spec.electrons() == Electrons.classical && spec.plane() == Plane.P_T) {
            double a3 = Constants.RADIATION_DENSITY / 3.0;
            candidates = 0;
            for (double f : logSpaced(spec.firstMin(), spec.firstMax(), spec.firstPoints())) {
                for (double temp : logSpaced(spec.tMin(), spec.tMax(), spec.tPoints())) {
                    // the same test as evaluate's, on the same nodes
                    if (!(f <= a3 * temp * temp * temp * temp)) {
                        candidates++;
                    }
                }
            }
        }
        return metadata(spec, 0, spec.firstPoints(), total, candidates, candidates - rows);
    }

    private static Metadata metadata(Spec spec, int from, int to, int total, int candidates, int overflowing) {
        boolean fermi = spec.electrons() != Electrons.classical;
        Quantity axis = spec.plane() == Plane.RHO_T ? EosQuantities.RHO : EosQuantities.P;
        String firstName = axis.name();
        Inputs.Builder inputs = Inputs.builder()
                .number(firstName + "_min", spec.firstMin(), axis.unit(), "lowest " + axis.description())
                .number(firstName + "_max", spec.firstMax(), axis.unit(), "highest " + axis.description())
                .number("T_min", spec.tMin(), "K", "lowest temperature")
                .number("T_max", spec.tMax(), "K", "highest temperature")
                .integer(firstName + "_points", spec.firstPoints(), "log-spaced values of " + firstName)
                .integer("T_points", spec.tPoints(), "log-spaced temperatures");
        inputs.text("composition", String.format(Locale.US, "X = %s, Y = %s, Z = %s, mu = %s",
                spec.composition().X(), spec.composition().Y(), spec.composition().Z(), spec.composition().mu())
                + (spec.composition().fromMu() ? " (" + spec.composition().muImplication() + ")" : ""));
        if (fermi) {
            inputs.text("electrons", spec.electrons().name());
        }
        List<String> notes = new ArrayList<>();
        notes.add("rows: " + firstName + " outer, T inner, both increasing (log-spaced)");
        if (from > 0 || to < spec.firstPoints()) {
            notes.add("part of the grid: " + firstName + " indices " + from + " to " + (to - 1) + " of 0 to "
                    + (spec.firstPoints() - 1));
        }
        notes.add("warning_mask bits: " + ValidityCheck.maskLegend());
        if (candidates < total) {
            notes.add((total - candidates) + " of " + total
                    + " points with P <= aT^4/3 have no gas density and are omitted");
        }
        if (overflowing > 0 && !fermi) {
            notes.add(overflowing + " of " + total + " points are outside the range of double precision (a quantity"
                    + " of the state overflows) and are omitted");
        }
        if (fermi) {
            if (overflowing > 0) {
                notes.add(overflowing + " of " + total + " points have no state of the fermi EOS (outside the"
                        + " inversion's range, beyond the Fermi-Dirac integrals' range, or a quantity overflows) and"
                        + " are omitted");
            }
            notes.add("equation of state: fermi (classical ions, electrons of any degeneracy and relativity with e+e-"
                    + " pairs, Fermi-Dirac integrals; black-body radiation); Gamma1 < 4/3 where pairs soften the gas");
            notes.add("energy convention: " + FermiEosSummary.ENERGY_CONVENTION);
        }
        return Metadata.of((fermi ? "ions + electron-positron gas of any degeneracy + radiation"
                : "gas + radiation equation of state") + " on a "
                + (spec.plane() == Plane.RHO_T ? "rho-T" : "P-T") + " grid", inputs.build(), notes);
    }

    /**
     * The points whose every quantity is finite, moved to the front of {@code rho} and {@code t}
     * (which keep their order); the arrays themselves when all are.
     */
    private static EosArrays finiteOnly(EosArrays all, double[] rho, double[] t) {
        int n = all.size();
        boolean[] finite = new boolean[n];
        // in chunks on all cores: on one, a 10^6-point grid's check kept the other core idle
        int chunk = 1 << 16;
        int kept = IntStream.range(0, (n + chunk - 1) / chunk).parallel().map(c -> {
            int count = 0;
            for (int i = c * chunk, end = Math.min(n, (c + 1) * chunk); i < end; i++) {
                finite[i] = Double.isFinite(all.P[i]) && Double.isFinite(all.Pgas[i]) && Double.isFinite(all.Prad[i])
                        && Double.isFinite(all.beta[i]) && Double.isFinite(all.oneMinusBeta[i])
                        && Double.isFinite(all.u[i]) && Double.isFinite(all.s[i]) && Double.isFinite(all.Gamma1[i])
                        && Double.isFinite(all.Gamma3[i]) && Double.isFinite(all.nablaAd[i])
                        && Double.isFinite(all.soundSpeed[i]);
                count += finite[i] ? 1 : 0;
            }
            return count;
        }).sum();
        if (kept == n) {
            return all;
        }
        EosArrays out = new EosArrays(kept);
        int j = 0;
        for (int i = 0; i < n; i++) {
            if (!finite[i]) {
                continue;
            }
            rho[j] = rho[i];
            t[j] = t[i];
            out.P[j] = all.P[i];
            out.Pgas[j] = all.Pgas[i];
            out.Prad[j] = all.Prad[i];
            out.beta[j] = all.beta[i];
            out.oneMinusBeta[j] = all.oneMinusBeta[i];
            out.u[j] = all.u[i];
            out.s[j] = all.s[i];
            out.Gamma1[j] = all.Gamma1[i];
            out.Gamma3[j] = all.Gamma3[i];
            out.nablaAd[j] = all.nablaAd[i];
            out.soundSpeed[j] = all.soundSpeed[i];
            out.warnings[j] = all.warnings[i];
            j++;
        }
        return out;
    }

    /**
     * Logarithmically spaced values, exact at both ends.
     *
     * @param lo first value (positive)
     * @param hi last value
     * @param n number of values
     * @return the values
     */
    public static double[] logSpaced(double lo, double hi, int n) {
        double[] v = new double[n];
        if (n == 1) {
            v[0] = lo;
            return v;
        }
        double a = Math.log10(lo);
        double b = Math.log10(hi);
        for (int i = 0; i < n; i++) {
            v[i] = Math.pow(10.0, a + (b - a) * i / (n - 1));
        }
        v[0] = lo;
        v[n - 1] = hi;
        return v;
    }

    private static double[] trim(double[] a, int n) {
        return a.length == n ? a : java.util.Arrays.copyOf(a, n);
    }
}
