package org.stellabar.scenario;

import java.util.Collection;
import java.util.Collections;
import java.util.EnumSet;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import org.stellabar.eos.Composition;
import org.stellabar.output.TableFormat;
import org.stellabar.physics.BadInputException;

/**
 * One star of a scenario: what to build and what to write. CGS throughout. The scale of the star
 * is fixed by its mass and, depending on {@link #kind()}, its radius (standard model and
 * polytrope) or exactly one of radius, central temperature and entropy per baryon (isentropic).
 * Quantities a kind does not use are empty, never NaN.
 *
 * @param name unique name within the scenario, usable as a file name ({@link Names#RULE})
 * @param note free text shown with the star's results, may be empty
 * @param kind which model
 * @param mass total mass M [g], positive
 * @param radius surface radius R [cm], positive, when given
 * @param centralTemperature central temperature T_c [K], positive; isentropic stars only
 * @param entropyPerBaryon entropy per baryon s m_u/k [k_B], positive; isentropic stars only
 * @param index polytropic index n in [0, 5); polytropes only
 * @param composition the mixture
 * @param points number of points in the profile table, in [{@value #MIN_POINTS}, {@value #MAX_POINTS}]
 * @param outputs profile file formats (may be empty: summary only)
 * @param charts chart groups (may be empty: no charts)
 */
public record StarSpec(String name, String note, StarKind kind, double mass, OptionalDouble radius,
        OptionalDouble centralTemperature, OptionalDouble entropyPerBaryon, OptionalDouble index,
        Composition composition, int points, Set<TableFormat> outputs, Set<ChartGroup> charts) {

    /** Fewest profile points: a profile needs a centre and a surface. */
    public static final int MIN_POINTS = 2;
    /**
     * Most profile points. 10⁵ rows of ~20 columns is ~30 MB of CSV per star, far past what a
     * smooth polytropic or isentropic profile needs; more is almost certainly a typing mistake.
     */
    public static final int MAX_POINTS = 100_000;
    /** Profile points when none are asked for. */
    public static final int DEFAULT_POINTS = 400;
    /** The polytropic index must be below this (n = 5 has no finite radius). */
    public static final double INDEX_LIMIT = 5.0;
    /**
     * Composition when none is given: X = 0.70, Z = 0.02 (Y = 0.28), a common choice for young
     * solar-metallicity stars (common practice, no source); the command line uses the same.
     */
    public static final Composition DEFAULT_COMPOSITION = Composition.fromAnyTwo(0.70, Double.NaN, 0.02);
    /** Profile formats when none are asked for. */
    public static final Set<TableFormat> DEFAULT_OUTPUTS = Collections.unmodifiableSet(EnumSet.of(TableFormat.CSV, TableFormat.FITS));
    /** Chart groups when none are asked for: all of them. */
    public static final Set<ChartGroup> DEFAULT_CHARTS = Collections.unmodifiableSet(EnumSet.allOf(ChartGroup.class));

    public StarSpec {
        Names.problem(name).ifPresent(p -> {
            throw new BadInputException("star name '" + name + "': " + p);
        });
        note = note == null ? "" : note;
        if (kind == null) {
            throw new BadInputException("star " + name + ": no kind given; use standard, polytrope or isentropic");
        }
        if (composition == null) {
            throw new BadInputException("star " + name + ": no composition given");
        }
        requirePositive(name, "mass", mass, "g");
        radius = checkedOptional(name, "radius", radius, "cm");
        centralTemperature = checkedOptional(name, "central temperature", centralTemperature, "K");
        entropyPerBaryon = checkedOptional(name, "entropy per baryon", entropyPerBaryon, "k_B");
        index = index == null ? OptionalDouble.empty() : index;
        if (kind.takesIndex()) {
            if (index.isEmpty()) {
                throw new BadInputException("star " + name + ": a polytrope needs an index n in [0, 5)");
            }
            double n = index.getAsDouble();
            if (!(n >= 0.0 && n < INDEX_LIMIT)) {
                throw new BadInputException("star " + name + ": index n = " + n
                        + " is not allowed; a polytrope with a finite radius has 0 <= n < 5");
            }
        } else if (index.isPresent()) {
            throw new BadInputException("star " + name + ": an index applies to a polytrope only, not to a "
                    + kind.word() + " star");
        }
        int anchors = (radius.isPresent() ? 1 : 0) + (centralTemperature.isPresent() ? 1 : 0)
                + (entropyPerBaryon.isPresent() ? 1 : 0);
        if (kind.needsRadius()) {
            if (radius.isEmpty() || anchors != 1) {
                throw new BadInputException("star " + name + ": a " + kind.word()
                        + " star is fixed by its mass and radius; give the radius and neither a central"
                        + " temperature nor an entropy");
            }
        } else if (anchors != 1) {
            throw new BadInputException("star " + name + ": an isentropic star needs exactly one of radius,"
                    + " central temperature, entropy per baryon (" + anchors + " given)");
        }
        if (points < MIN_POINTS || points > MAX_POINTS) {
            throw new BadInputException("star " + name + ": points = " + points + " is outside ["
                    + MIN_POINTS + ", " + MAX_POINTS + "]");
        }
        outputs = enumSet(TableFormat.class, outputs);
        charts = enumSet(ChartGroup.class, charts);
    }

    /**
     * An Eddington standard model star with the default points, outputs and charts.
     *
     * @param name the star's name
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @return the specification
     */
    public static StarSpec standard(String name, double mass, double radius, Composition composition) {
        return new StarSpec(name, "", StarKind.STANDARD, mass, OptionalDouble.of(radius), OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), composition, DEFAULT_POINTS, DEFAULT_OUTPUTS,
                DEFAULT_CHARTS);
    }

    /**
     * A polytrope of index n scaled to M and R, with the default points, outputs and charts.
     *
     * @param name the star's name
     * @param index n in [0, 5)
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @return the specification
     */
    public static StarSpec polytrope(String name, double index, double mass, double radius,
            Composition composition) {
        return new StarSpec(name, "", StarKind.POLYTROPE, mass, OptionalDouble.of(radius), OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.of(index), composition, DEFAULT_POINTS, DEFAULT_OUTPUTS,
                DEFAULT_CHARTS);
    }

    /**
     * An isentropic star fixed by mass and radius.
     *
     * @param name the star's name
     * @param mass M [g]
     * @param radius R [cm]
     * @param composition the mixture
     * @return the specification
     */
    public static StarSpec isentropicWithRadius(String name, double mass, double radius, Composition composition) {
        return isentropic(name, mass, OptionalDouble.of(radius), OptionalDouble.empty(), OptionalDouble.empty(),
                composition);
    }

    /**
     * An isentropic star fixed by mass and central temperature.
     *
     * @param name the star's name
     * @param mass M [g]
     * @param centralTemperature T_c [K]
     * @param composition the mixture
     * @return the specification
     */
    public static StarSpec isentropicWithCentralTemperature(String name, double mass, double centralTemperature,
            Composition composition) {
        return isentropic(name, mass, OptionalDouble.empty(), OptionalDouble.of(centralTemperature),
                OptionalDouble.empty(), composition);
    }

    /**
     * An isentropic star fixed by mass and entropy per baryon.
     *
     * @param name the star's name
     * @param mass M [g]
     * @param entropyPerBaryon s m_u/k [k_B]
     * @param composition the mixture
     * @return the specification
     */
    public static StarSpec isentropicWithEntropy(String name, double mass, double entropyPerBaryon,
            Composition composition) {
        return isentropic(name, mass, OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.of(entropyPerBaryon), composition);
    }

    private static StarSpec isentropic(String name, double mass, OptionalDouble radius, OptionalDouble tc,
            OptionalDouble s, Composition composition) {
        return new StarSpec(name, "", StarKind.ISENTROPIC, mass, radius, tc, s, OptionalDouble.empty(), composition,
                DEFAULT_POINTS, DEFAULT_OUTPUTS, DEFAULT_CHARTS);
    }

    /** @return a copy with another number of profile points */
    public StarSpec withPoints(int newPoints) {
        return new StarSpec(name, note, kind, mass, radius, centralTemperature, entropyPerBaryon, index, composition,
                newPoints, outputs, charts);
    }

    /** @return a copy writing the profile in these formats */
    public StarSpec withOutputs(Collection<TableFormat> newOutputs) {
        return new StarSpec(name, note, kind, mass, radius, centralTemperature, entropyPerBaryon, index, composition,
                points, enumSet(TableFormat.class, newOutputs), charts);
    }

    /** @return a copy drawing these chart groups */
    public StarSpec withCharts(Collection<ChartGroup> newCharts) {
        return new StarSpec(name, note, kind, mass, radius, centralTemperature, entropyPerBaryon, index, composition,
                points, outputs, enumSet(ChartGroup.class, newCharts));
    }

    /** @return a copy with another note */
    public StarSpec withNote(String newNote) {
        return new StarSpec(name, newNote, kind, mass, radius, centralTemperature, entropyPerBaryon, index,
                composition, points, outputs, charts);
    }

    private static void requirePositive(String star, String what, double value, String unit) {
        if (!(value > 0.0 && Double.isFinite(value))) {
            throw new BadInputException("star " + star + ": " + what + " = " + value + " " + unit
                    + " is not allowed; it must be positive and finite");
        }
    }

    private static OptionalDouble checkedOptional(String star, String what, OptionalDouble value, String unit) {
        if (value == null) {
            return OptionalDouble.empty();
        }
        value.ifPresent(v -> requirePositive(star, what, v, unit));
        return value;
    }

    static <E extends Enum<E>> Set<E> enumSet(Class<E> type, Collection<E> values) {
        if (values == null) {
            throw new BadInputException("no " + type.getSimpleName().toLowerCase(Locale.ROOT) + " list given");
        }
        EnumSet<E> set = EnumSet.noneOf(type);
        set.addAll(values);
        return Collections.unmodifiableSet(set);
    }
}
