package org.stellabar.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The profile's own pressure and Γ1 against ours, shell by shell. Internal to the audit.
 *
 * @param pressureMismatch (P_profile − P_ours)/P_ours at each shell, or null without a pressure
 *     column
 * @param maxPressureMismatch largest |P_profile/P_ours − 1|, empty without a pressure column
 * @param maxPressureMismatchRow the data row where it occurs (0 without a pressure column)
 * @param flaggedRows data rows beyond the tolerance, ascending
 * @param gamma1Difference Γ1_profile − Γ1_ours at each shell, or null without a Γ1 column
 * @param maxGamma1Difference largest |Γ1_profile − Γ1_ours|, empty without a Γ1 column
 */
record Comparison(double[] pressureMismatch, OptionalDouble maxPressureMismatch, int maxPressureMismatchRow,
        List<Integer> flaggedRows, double[] gamma1Difference, OptionalDouble maxGamma1Difference) {

    /**
     * @param p the profile
     * @param ours our states at its shells
     * @param tolerance |P_profile/P_ours − 1| above which a row is flagged
     * @return the comparison
     */
    static Comparison of(Profile p, ShellStates ours, double tolerance) {
        int n = p.size();
        int[] rows = p.rows();
        double[] mismatch = null;
        double maxMismatch = 0.0;
        int maxMismatchRow = 0;
        List<Integer> flagged = new ArrayList<>();
        if (p.hasPressure()) {
            double[] given = p.P();
            double[] P = ours.P();
            mismatch = new double[n];
            for (int i = 0; i < n; i++) {
                // (P_profile − P_ours)/P_ours: the same number as P_profile/P_ours − 1, without the cancellation
                mismatch[i] = (given[i] - P[i]) / P[i];
                if (Math.abs(mismatch[i]) > maxMismatch) {
                    maxMismatch = Math.abs(mismatch[i]);
                    maxMismatchRow = rows[i];
                }
                if (Math.abs(mismatch[i]) > tolerance) {
                    flagged.add(rows[i]);
                }
            }
            flagged.sort(null);
        }
        double[] gamma1Difference = null;
        OptionalDouble maxGamma1Difference = OptionalDouble.empty();
        if (p.hasGamma1()) {
            double[] given = p.gamma1();
            gamma1Difference = new double[n];
            double worst = 0.0;
            for (int i = 0; i < n; i++) {
                gamma1Difference[i] = given[i] - ours.gamma1()[i];
                worst = Math.max(worst, Math.abs(gamma1Difference[i]));
            }
            maxGamma1Difference = OptionalDouble.of(worst);
        }
        return new Comparison(mismatch, p.hasPressure() ? OptionalDouble.of(maxMismatch) : OptionalDouble.empty(),
                maxMismatchRow, flagged, gamma1Difference, maxGamma1Difference);
    }
}
