package org.stellabar.survey;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.StarDraft;
import org.stellabar.structure.StarKind;

/**
 * A survey of star models over one or two axes: the kind, its fixed inputs, and the swept ones.
 * Point p (0-based) lies at index {@code p / inner.count} on the first axis and
 * {@code p % inner.count} on the second: the first axis is the outer one.
 *
 * @param name the survey's name (names its files)
 * @param kind the kind of every model
 * @param fixed fixed inputs (CGS): mass, radius, central_temperature, entropy_per_baryon; an
 *     axis's quantity is never also fixed
 * @param index polytropic index for kind polytrope
 * @param composition the mixture (when an axis sweeps X or Z, its X or Z is replaced and Y
 *     follows from the sum)
 * @param points profile rows per model
 * @param axes one or two axes, outer first
 * @param electrons which equation of state treats the electrons of every model
 */
public record SurveyPlan(String name, StarKind kind, Map<AxisQuantity, Double> fixed, OptionalDouble index,
        Composition composition, int points, List<SurveyAxis> axes, Electrons electrons) {

    /** Most points of one survey (10⁶ rows: the largest table the merge is built for). */
    public static final long MAX_POINTS = 1_000_000;

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param name the survey's name (names its files)
     * @param kind the kind of every model
     * @param fixed fixed inputs (CGS): mass, radius, central_temperature, entropy_per_baryon; an
     *     axis's quantity is never also fixed
     * @param index polytropic index for kind polytrope
     * @param composition the mixture (when an axis sweeps X or Z, its X or Z is replaced and Y
     *     follows from the sum)
     * @param points profile rows per model
     * @param axes one or two axes, outer first
     * @param electrons which equation of state treats the electrons of every model
     */
    public SurveyPlan {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(index, "index");
        Objects.requireNonNull(composition, "composition");
        Objects.requireNonNull(electrons, "electrons");
        fixed = fixed.isEmpty() ? Map.of() : new EnumMap<>(fixed);
        axes = List.copyOf(axes);
        if (axes.isEmpty() || axes.size() > 2) {
            throw new BadInputException("a survey has one or two axes, not " + axes.size());
        }
        if (axes.size() == 2 && axes.get(0).quantity() == axes.get(1).quantity()) {
            throw new BadInputException("both axes sweep " + axes.get(0).quantity().word());
        }
        for (SurveyAxis a : axes) {
            if (fixed.containsKey(a.quantity())) {
                throw new BadInputException(a.quantity().word() + " is both fixed and swept");
            }
        }
        long total = 1;
        for (SurveyAxis a : axes) {
            total *= a.count();
        }
        if (total > MAX_POINTS) {
            throw new BadInputException("the survey has " + total + " points; at most " + MAX_POINTS + " are allowed");
        }
    }

    /** @return the number of models */
    public int size() {
        int total = 1;
        for (SurveyAxis a : axes) {
            total *= a.count();
        }
        return total;
    }

    /** @return the first (outer) axis */
    public SurveyAxis outer() {
        return axes.get(0);
    }

    /** @return the number of values of the second axis, 1 for a one-axis survey */
    public int innerCount() {
        return axes.size() == 2 ? axes.get(1).count() : 1;
    }

    /**
     * @param point 0-based point number
     * @return the index of the point on each axis, outer first
     */
    public int[] indices(int point) {
        int inner = innerCount();
        return axes.size() == 2 ? new int[] {point / inner, point % inner} : new int[] {point};
    }

    /**
     * @param point 0-based point number
     * @return the swept values of the point (CGS), one per axis, outer first
     */
    public double[] values(int point) {
        int[] at = indices(point);
        double[] v = new double[axes.size()];
        for (int a = 0; a < v.length; a++) {
            v[a] = axes.get(a).value(at[a]);
        }
        return v;
    }

    /**
     * The star at one point as the user would have written it; {@link StarDraft#toRequest}
     * decides whether it is a valid request.
     *
     * @param point 0-based point number
     * @return the draft
     * @throws BadInputException when the point's composition is impossible (X + Z &gt; 1)
     */
    public StarDraft draft(int point) {
        Map<AxisQuantity, Double> at = new EnumMap<>(AxisQuantity.class);
        at.putAll(fixed);
        double[] v = values(point);
        for (int a = 0; a < v.length; a++) {
            at.put(axes.get(a).quantity(), v[a]);
        }
        Composition mixture = composition;
        if (at.containsKey(AxisQuantity.X) || at.containsKey(AxisQuantity.Z)) {
            double x = at.getOrDefault(AxisQuantity.X, composition.X());
            double z = at.getOrDefault(AxisQuantity.Z, composition.Z());
            mixture = Composition.fromAnyTwo(x, Double.NaN, z, composition.metalMassNumber());
        }
        return new StarDraft(name + "-" + (point + 1), kind, at.getOrDefault(AxisQuantity.mass, Double.NaN),
                optional(at, AxisQuantity.radius), index, optional(at, AxisQuantity.central_temperature),
                optional(at, AxisQuantity.entropy_per_baryon), StarDraft.ANCHORS, mixture, points, electrons);
    }

    private static OptionalDouble optional(Map<AxisQuantity, Double> at, AxisQuantity q) {
        Double v = at.get(q);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }
}
