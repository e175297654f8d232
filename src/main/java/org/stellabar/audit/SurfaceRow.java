package org.stellabar.audit;

import static org.stellabar.audit.ProfileQuantity.DENSITY;
import static org.stellabar.audit.ProfileQuantity.MASS;
import static org.stellabar.audit.ProfileQuantity.PRESSURE;
import static org.stellabar.audit.ProfileQuantity.RADIUS;
import static org.stellabar.audit.ProfileQuantity.TEMPERATURE;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Recognises a profile's vacuum surface row: among the rows whose only fault is a zero ρ, T or P,
 * the one at the surface end of the file, beyond every usable row, with ρ = 0 or T = 0, P = 0
 * (when given), a radius beyond every other row's and a mass at least theirs. Such a row closes
 * the star's integrals instead of being a bad row.
 */
final class SurfaceRow {

    private SurfaceRow() {
    }

    /**
     * @param source the table, for the row's position
     * @param usable the indices of the usable rows, in file order
     * @param zeroRows the indices of the rows whose only fault is a zero ρ, T or P
     * @param values each quantity in CGS by row
     * @param order the order of the shells
     * @return the surface point, if there is one
     */
    static Optional<SurfacePoint> find(ProfileSource source, List<Integer> usable, List<Integer> zeroRows,
            Map<ProfileQuantity, double[]> values, ShellOrder order) {
        if (zeroRows.isEmpty() || usable.isEmpty()) {
            return Optional.empty();
        }
        int candidate = -1;
        for (int i : zeroRows) {
            boolean outside = order.surfaceFirst() ? i < usable.get(0) : i > usable.get(usable.size() - 1);
            if (outside && (candidate < 0 || (order.surfaceFirst() ? i < candidate : i > candidate))) {
                candidate = i;
            }
        }
        if (candidate < 0 || !isVacuum(candidate, usable, values)) {
            return Optional.empty();
        }
        double[] r = values.get(RADIUS);
        double[] m = values.get(MASS);
        return Optional.of(new SurfacePoint(source.rowNumber(candidate), source.where(candidate),
                r == null ? Double.NaN : r[candidate], m == null ? Double.NaN : m[candidate],
                values.get(DENSITY)[candidate]));
    }

    private static boolean isVacuum(int candidate, List<Integer> usable, Map<ProfileQuantity, double[]> values) {
        double[] rho = values.get(DENSITY);
        double[] T = values.get(TEMPERATURE);
        double[] P = values.get(PRESSURE);
        double[] r = values.get(RADIUS);
        double[] m = values.get(MASS);
        boolean vacuum = (rho[candidate] == 0.0 || T[candidate] == 0.0) && (P == null || P[candidate] == 0.0);
        for (int i : usable) {
            vacuum &= (r == null || r[candidate] > r[i]) && (m == null || m[candidate] >= m[i]);
        }
        return vacuum;
    }
}
