package org.stellabar.audit;

import static org.stellabar.audit.AuditColumns.BETA;
import static org.stellabar.audit.AuditColumns.GAMMA1_DIFF;
import static org.stellabar.audit.AuditColumns.GAMMA1_EOS;
import static org.stellabar.audit.AuditColumns.HYDROSTATIC_RESIDUAL;
import static org.stellabar.audit.AuditColumns.MASS_CONTINUITY_RESIDUAL;
import static org.stellabar.audit.AuditColumns.M_OVER_M;
import static org.stellabar.audit.AuditColumns.NABLA_AD;
import static org.stellabar.audit.AuditColumns.ONE_MINUS_BETA;
import static org.stellabar.audit.AuditColumns.P_EOS;
import static org.stellabar.audit.AuditColumns.P_GAS;
import static org.stellabar.audit.AuditColumns.P_RAD;
import static org.stellabar.audit.AuditColumns.P_REL_DIFF;
import static org.stellabar.audit.AuditColumns.ROW;
import static org.stellabar.audit.AuditColumns.R_OVER_R;
import static org.stellabar.audit.AuditColumns.SOUND_SPEED;
import static org.stellabar.audit.AuditColumns.WARNINGS;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.stellabar.eos.ValidityWarning.Regime;
import org.stellabar.table.Column;
import org.stellabar.table.Metadata;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/**
 * Presents an audit as a per-shell {@link Table}, in the file's row order with every input column
 * kept. The star's summary is {@link AuditSummary}, the metadata {@link AuditMetadata}.
 */
public final class AuditTables {

    private static final String DERIVED_MASS = " (integrated from r and rho)";
    private static final String DERIVED_RADIUS = " (integrated from m and rho)";

    private AuditTables() {
    }

    /**
     * One row per audited shell, in the file's order: the data-row number, every input column as
     * written, then ours ({@link AuditColumns}).
     *
     * @param audit an audit
     * @param metadata metadata for the table
     * @return the table
     */
    public static Table shells(ProfileAudit audit, Metadata metadata) {
        Profile p = audit.profile();
        ShellAudit s = audit.shells();
        boolean flip = p.surfaceFirst();
        Table.Builder b = new Table.Builder("audit_shells", metadata);
        b.number(ROW, order(Arrays.stream(p.rows()).asDoubleStream().toArray(), flip));
        addInputColumns(b, audit.input());
        add(b, M_OVER_M.withDescription(M_OVER_M.description() + (audit.star().massDerived() ? DERIVED_MASS : "")),
                s.massFraction(), flip);
        add(b, R_OVER_R.withDescription(R_OVER_R.description() + (audit.star().radiusDerived() ? DERIVED_RADIUS
                : "")), s.radiusFraction(), flip);
        add(b, P_EOS, s.P(), flip);
        add(b, P_GAS, s.Pgas(), flip);
        add(b, P_RAD, s.Prad(), flip);
        add(b, BETA, s.beta(), flip);
        add(b, ONE_MINUS_BETA, s.oneMinusBeta(), flip);
        add(b, GAMMA1_EOS, s.gamma1(), flip);
        add(b, NABLA_AD, s.nablaAd(), flip);
        add(b, SOUND_SPEED, s.soundSpeed(), flip);
        add(b, P_REL_DIFF, s.pressureMismatch(), flip);
        add(b, GAMMA1_DIFF, s.gamma1Difference(), flip);
        add(b, HYDROSTATIC_RESIDUAL, s.hydrostaticResidual(), flip);
        add(b, MASS_CONTINUITY_RESIDUAL, s.massContinuityResidual(), flip);
        List<String> codes = warningCodes(s.warnings());
        if (flip) {
            java.util.Collections.reverse(codes);
        }
        return b.text(WARNINGS.name(), WARNINGS.description(), codes).build();
    }

    /** The input columns, already in file order; a name of ours gets "_profile" until it is free. */
    private static void addInputColumns(Table.Builder b, LoadedProfile in) {
        Set<String> taken = new HashSet<>(AuditColumns.ALL.stream().map(Quantity::name).toList());
        for (Column c : in.inputColumns()) {
            String name = c.name();
            while (taken.contains(name)) {
                name = name + "_profile";
            }
            taken.add(name);
            if (c instanceof NumberColumn num) {
                b.number(num.quantity().withName(name), num.values());
            } else {
                b.text(name, c.description(), ((TextColumn) c).values());
            }
        }
    }

    /** Adds a column the profile allows (values not null), in the file's order. */
    private static void add(Table.Builder b, Quantity q, double[] centreFirst, boolean flip) {
        if (centreFirst != null) {
            b.number(q, order(centreFirst, flip));
        }
    }

    /** The codes of each shell's warnings, ';'-separated. */
    private static List<String> warningCodes(int[] masks) {
        List<String> codes = new ArrayList<>(masks.length);
        for (int mask : masks) {
            codes.add(String.join(";", Arrays.stream(Regime.values()).filter(r -> (mask & r.bit()) != 0)
                    .map(Regime::code).toList()));
        }
        return codes;
    }

    /** Centre-first arrays back into the file's order. */
    private static double[] order(double[] centreFirst, boolean flip) {
        if (!flip) {
            return centreFirst;
        }
        double[] out = new double[centreFirst.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = centreFirst[out.length - 1 - i];
        }
        return out;
    }
}
