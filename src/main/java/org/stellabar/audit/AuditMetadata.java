package org.stellabar.audit;

import java.util.Map;
import java.util.OptionalDouble;
import java.util.stream.Collectors;
import org.stellabar.eos.Composition;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.EosQuantities;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;

/**
 * The metadata of an audit's tables, summary and report: its title, every assumption as a note
 * ({@link AuditAssumptions}) and how it was asked for as typed inputs: the file, the columns and
 * units chosen (text), the composition (numbers when given for the whole star, else where it came
 * from), the tolerance (a number) and whether bad rows were skipped.
 */
public final class AuditMetadata {

    /** The flagging tolerance on |P_profile/P_eos − 1|. */
    public static final Quantity TOLERANCE =
            Quantity.dimensionless("tolerance", "|P_profile/P_eos - 1| above which a row is flagged");

    private AuditMetadata() {
    }

    /**
     * @param audit the audit (its columns, composition source and tolerance)
     * @param profile the profile file as the user named it
     * @param units the {@code --units} entries as given, in order (empty if none)
     * @param policy the composition policy; a composition given for the whole star is written as numbers
     * @param givenMu μ as the user gave it, if the composition was given by μ
     * @param skipBadRows whether bad rows were skipped
     * @return the metadata, inputs in a stable order
     */
    public static Metadata of(ProfileAudit audit, String profile, Map<String, String> units, CompositionPolicy policy,
            OptionalDouble givenMu, boolean skipBadRows) {
        LoadedProfile loaded = audit.input();
        Inputs.Builder b = Inputs.builder().text("profile", profile).text("columns", loaded.mapped().stream()
                .map(c -> c.quantity().key() + "=" + c.column()).collect(Collectors.joining(", ")));
        if (!units.isEmpty()) {
            b.text("units", units.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue())
                    .collect(Collectors.joining(", ")));
        }
        Composition c = policy.composition();
        if (!policy.overridesColumns()) {
            b.text("composition", loaded.compositionSource());
        } else if (givenMu.isPresent()) {
            b.number(EosQuantities.MU.withDescription("mean molecular weight, given"), givenMu.getAsDouble());
        } else {
            b.number(EosQuantities.X, c.X()).number(EosQuantities.Y, c.Y()).number(EosQuantities.Z, c.Z());
        }
        if (policy.overridesColumns() && c.metalMassNumber() > 0) {
            b.number(EosQuantities.A_Z, c.metalMassNumber());
        }
        b.number(TOLERANCE, audit.star().tolerance()).text("skip_bad_rows", String.valueOf(skipBadRows));
        if (audit.electrons() != Electrons.classical) {
            b.text("electrons", audit.electrons().name());
        }
        return Metadata.of("audit of " + audit.profile().source() + " against ideal gas + radiation physics"
                + (audit.electrons() == Electrons.classical ? "" : " (electrons of any degeneracy with pairs)"),
                b.build(), AuditAssumptions.of(audit));
    }
}
