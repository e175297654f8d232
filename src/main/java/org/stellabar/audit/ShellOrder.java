package org.stellabar.audit;

import static org.stellabar.audit.ProfileQuantity.MASS;
import static org.stellabar.audit.ProfileQuantity.PRESSURE;
import static org.stellabar.audit.ProfileQuantity.RADIUS;
import static org.stellabar.audit.ProfileQuantity.TEMPERATURE;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.stellabar.audit.RowProblem.Kind;

/**
 * The order of a profile's shells: centre first or surface first. It is read from the radius,
 * else the mass (both increase from the centre), else the pressure, else the temperature (both
 * decrease from the centre), comparing the first and last usable rows; without any trend the
 * centre is assumed first.
 *
 * @param surfaceFirst true if the file lists the surface first
 * @param description how the order was decided, one line
 */
record ShellOrder(boolean surfaceFirst, String description) {

    /**
     * @param usable the indices of the usable rows, in file order
     * @param values each quantity in CGS by row
     * @return the order
     */
    static ShellOrder detect(List<Integer> usable, Map<ProfileQuantity, double[]> values) {
        if (usable.size() < 2) {
            return new ShellOrder(false, "fewer than two usable rows: centre first assumed");
        }
        int first = usable.get(0);
        int last = usable.get(usable.size() - 1);
        for (ProfileQuantity q : List.of(RADIUS, MASS, PRESSURE, TEMPERATURE)) {
            double[] v = values.get(q);
            if (v == null || v[last] == v[first]) {
                continue;
            }
            boolean growsOutwards = q == RADIUS || q == MASS;
            boolean increasesDown = v[last] > v[first];
            boolean surfaceFirst = growsOutwards != increasesDown;
            return new ShellOrder(surfaceFirst, q.label() + (increasesDown ? " increases" : " decreases")
                    + " down the file: " + (surfaceFirst ? "surface first" : "centre first"));
        }
        return new ShellOrder(false, "no radius, mass, pressure or temperature trend: centre first assumed");
    }

    /**
     * @param rows row indices in file order
     * @return the same rows from the centre outwards
     */
    List<Integer> outwards(List<Integer> rows) {
        List<Integer> out = new ArrayList<>(rows);
        if (surfaceFirst) {
            Collections.reverse(out);
        }
        return out;
    }

    /**
     * Walks the usable rows from the centre outwards and finds those that break the order: radius
     * must increase strictly and mass must not decrease, r = 0 must hold m = 0 and r &gt; 0 a
     * positive mass.
     *
     * @param source the table, for the rows' positions
     * @param usable the indices of the usable rows, in file order
     * @param values each quantity in CGS by row
     * @return the problem of each row that breaks the order, by row index
     */
    Map<Integer, RowProblem> breaches(ProfileSource source, List<Integer> usable,
            Map<ProfileQuantity, double[]> values) {
        Map<Integer, RowProblem> out = new LinkedHashMap<>();
        double[] r = values.get(RADIUS);
        double[] m = values.get(MASS);
        if (r == null && m == null) {
            return out;
        }
        String direction = surfaceFirst ? "decrease down the file" : "increase down the file";
        int previous = -1;
        for (int i : outwards(usable)) {
            RowProblem problem = r != null && m != null ? centreMass(r[i], m[i]) : null;
            if (problem == null && previous >= 0) {
                if (r != null && !(r[i] > r[previous])) {
                    problem = RowProblem.ofRow(Kind.OUT_OF_ORDER, String.format(Locale.US, "radius %.10g cm breaks"
                            + " the order (%s has %.10g cm); radius must %s", r[i], source.where(previous),
                            r[previous], direction));
                } else if (m != null && m[i] < m[previous]) {
                    problem = RowProblem.ofRow(Kind.OUT_OF_ORDER, String.format(Locale.US, "mass %.10g g breaks"
                            + " the order (%s has %.10g g); mass must %s", m[i], source.where(previous), m[previous],
                            direction));
                }
            }
            if (problem != null) {
                out.put(i, problem);
            } else {
                previous = i;
            }
        }
        return out;
    }

    private static RowProblem centreMass(double r, double m) {
        if (r == 0.0 && m > 0.0) {
            return RowProblem.ofRow(Kind.CENTRE_MASS, "m = " + m + " g at r = 0; the mass inside radius 0 must be 0");
        }
        if (r > 0.0 && m == 0.0) {
            return RowProblem.ofRow(Kind.CENTRE_MASS, "m = 0 at r = " + r + " cm > 0; a shell of positive radius"
                    + " holds mass");
        }
        return null;
    }
}
